using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Common;

/// <summary>
/// The step every per-eclipse endpoint shares: read the date, the computation choices and the format; refuse bad input
/// and unacceptable formats; find the eclipse or 404.
/// </summary>
internal static class EclipseLookup
{
    /// <summary>The date, shadow model, time scales and format of a per-eclipse request (problems on the reader).</summary>
    public static EclipseRequest Read(HttpRequest request, RequestFields f, FormatOffer offer)
    {
        var day = f.Date(Parameters.EclipseDate);
        var (model, time) = ModelChoice.Read(f);
        return new EclipseRequest(day, model, time, offer.Choose(request, f), request.FinderFor(model));
    }

    /// <summary>As <see cref="Read"/>, for the endpoints that also take shadow=measured (resolve them with <see cref="ResolveAsync"/>).</summary>
    public static EclipseRequest ReadMeasurable(HttpRequest request, RequestFields f, FormatOffer offer)
    {
        var day = f.Date(Parameters.EclipseDate);
        var (model, measured, time) = ModelChoice.ReadMeasurable(f);
        return new EclipseRequest(day, model, time, offer.Choose(request, f), request.FinderFor(model), measured);
    }

    /// <summary>
    /// As <see cref="Resolve"/>; with shadow=measured, fits the eclipse's stored crater timings and finds the eclipse again
    /// under the fitted enlargement (a 409 problem with too few timings), returning what was used.
    /// </summary>
    public static async Task<EclipseResolution> ResolveAsync(HttpRequest request, RequestFields f, EclipseRequest r, FormatOffer offer)
    {
        if (Resolve(f, r, offer, out var eclipse) is { } problem) return new EclipseResolution(problem, null!, null);
        if (!r.Measured) return new EclipseResolution(null, eclipse, null);
        var night = request.HttpContext.RequestServices.GetRequiredService<IObservedNight>();
        var measured = await night.ShadowAsync(eclipse, r.Day!.Value, r.Time, request.HttpContext.RequestAborted);
        if (measured.Fit is not { } fit)
            return new EclipseResolution(Problems.NotYet(
                $"shadow=measured needs at least {UmbralEnlargementFit.MinimumTimings} crater timings of the eclipse of {r.Day.Value.ToIsoDateString()} that can be reduced; {measured.Timings} stored so far (see its /enlargement and /observations). Use shadow=danjon, chauvenet, none or layer until then."),
                null!, null);
        // The enlargement is rounded to 0.001 % (0.02″ on the umbra, a few hundredths of a second) so that nearby fits share a cache.
        var model = ShadowModel.Enlarged(Math.Round(fit.EnlargementPercent, 3));
        if (request.FinderFor(model).OnUtcDate(r.Day.Value, r.Time) is not { } found)
            return new EclipseResolution(Problems.NotFound(FormattableString.Invariant($"Under the measured enlargement of {model.EnlargementPercent:0.###} % no lunar eclipse has its greatest phase on {r.Day.Value.ToIsoDateString()} (UTC).")), null!, null);
        return new EclipseResolution(null, found, MeasuredShadowEcho.Of(measured.Timings, fit));
    }

    /// <summary>A problem response to return, or null with the eclipse found.</summary>
    public static IResult? Resolve(RequestFields f, EclipseRequest r, FormatOffer offer, out LunarEclipse eclipse)
    {
        eclipse = null!;
        if (!f.Reader.IsValid || r.Day is null) return Problems.InvalidQuery(f.Reader);
        if (r.Output is null) return Problems.NotAcceptable(offer.Formats);
        var found = r.Finder.OnUtcDate(r.Day.Value, r.Time);
        if (found is null)
            return Problems.NotFound($"No lunar eclipse has its greatest phase on {r.Day.Value.ToIsoDateString()} (UTC) under the {r.Model.Name} shadow model. List nearby eclipses with /api/v1/eclipses?from=…&to=….");
        eclipse = found;
        return null;
    }
}

/// <summary>A per-eclipse request as read.</summary>
/// <param name="Day">The eclipse's date, or null when invalid.</param>
/// <param name="Model">The shadow model.</param>
/// <param name="Time">The time scales.</param>
/// <param name="Output">The representation chosen, or null when the Accept header admits none.</param>
/// <param name="Finder">The host's eclipse finder for the model.</param>
/// <param name="Measured">Whether shadow=measured was asked for (the model is then danjon until resolved).</param>
internal sealed record EclipseRequest(CalendarDate? Day, ShadowModel Model, TimeScaleConverter Time, OutputFormat? Output, EclipseFinder Finder, bool Measured = false);

/// <summary>A per-eclipse request resolved: a problem to return, or the eclipse with the measured shadow it used.</summary>
/// <param name="Problem">The problem response, or null.</param>
/// <param name="Eclipse">The eclipse (unset with a problem).</param>
/// <param name="Measured">What shadow=measured used, or null for a named model.</param>
internal sealed record EclipseResolution(IResult? Problem, LunarEclipse Eclipse, MeasuredShadowEcho? Measured);
