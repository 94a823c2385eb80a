using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Observations;

/// <summary>GET /api/v1/eclipses/{date}/enlargement: the umbra's enlargement measured from the stored crater timings.</summary>
internal static class EnlargementEndpoints
{
    private static readonly FormatOffer Formats = new(OutputFormat.Json, OutputFormat.Csv);

    /// <summary>The method in words, as the response states it.</summary>
    public static readonly string Method = string.Create(System.Globalization.CultureInfo.InvariantCulture,
        $"Each timing's feature is placed on the shadow at the observed instant (at its own distance along the axis); its distance from the axis is the observed umbral radius, and its ratio to the geometric umbral radius there the enlargement that timing measures (as in the crater-timing reductions that Herald & Sinnott 2014, J. Br. Astron. Assoc. 124, 247, build on). The fit is their least-squares mean in time (weights from each timing's uncertainty, {UmbralEnlargementFit.DefaultUncertaintySeconds:0} s when not stated, at least {UmbralEnlargementFit.LeastUncertaintySeconds:0} s), rejecting timings beyond {UmbralEnlargementFit.RejectionSigmas:0} robust standard deviations (1.4826 × median absolute deviation, Hampel 1974) until none change. σ is from the scatter of the timings kept. Predicted instants are where the fitted umbra's edge crosses each feature.");

    public static IEndpointRouteBuilder MapEnlargementEndpoints(this IEndpointRouteBuilder routes)
    {
        routes.MapGet("/api/v1/eclipses/{date}/enlargement", Get)
            .WithName("GetUmbralEnlargement")
            .WithTags("Observations")
            .Takes(new EndpointParameters([Parameters.EclipseDate, Parameters.DeltaT, Parameters.DeltaTModel, Formats.Parameter]))
            .WithSummary("The umbra's enlargement measured from the crater timings observers have stored")
            .WithDescription($"Fits the umbral enlargement (percent of the bare geometric umbra's radius, shadow none) to this eclipse's stored crater timings, with its one-sigma uncertainty, the equivalent opaque-layer height, and every timing's residual (observed − predicted under the fit) and whether it was rejected. Always 200 for an eclipse: with fewer than {UmbralEnlargementFit.MinimumTimings} usable timings status is too-few-timings and the fitted values are null. Never cached: each new timing shows at once. JSON or CSV.")
            .Produces<EnlargementResponse>(StatusCodes.Status200OK, "application/json", "text/csv")
            .ProducesEclipseProblems();
        return routes;
    }

    internal static async Task<IResult> Get(HttpRequest request)
    {
        var f = RequestFields.FromQuery(request, new QueryReader());
        // The fit is relative to the geometric umbra whatever model found the eclipse: only the date and ΔT are read.
        var query = new EclipseRequest(f.Date(Parameters.EclipseDate), ShadowModel.Danjon, new TimeScaleConverter(ModelChoice.DeltaT(f)),
            Formats.Choose(request, f), request.FinderFor(ShadowModel.Danjon));
        if (EclipseLookup.Resolve(f, query, Formats, out var eclipse) is { } problem) return problem;

        var services = request.HttpContext.RequestServices;
        var stored = await services.GetRequiredService<IObservationReader>().CraterTimingsAsync(query.Day!.Value, request.HttpContext.RequestAborted);
        var timings = ObservedNightFromLog.Timings(stored, query.Time);
        var fit = UmbralEnlargementFit.Fit(eclipse, timings.Select(t => t.Timing).ToList());
        var response = EnlargementMapping.ToResponse(eclipse, query.Day.Value, stored.Count, timings, fit, query.Time);
        return query.Output == OutputFormat.Csv
            ? Results.Text(EnlargementFormats.Csv(response), ContentNegotiation.MediaType(OutputFormat.Csv))
                .AsAttachment(Downloads.FileName(OutputFormat.Csv, "lunar-eclipse", response.Date, "enlargement"))
            : TypedResults.Ok(response);
    }
}
