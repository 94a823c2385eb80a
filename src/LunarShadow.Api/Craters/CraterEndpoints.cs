using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Sites;

namespace LunarShadow.Api.Craters;

/// <summary>GET /api/v1/eclipses/{date}/craters: when the shadow's edge crosses named features on the Moon.</summary>
internal static class CraterEndpoints
{
    /// <summary>Most features in one iCalendar download (an event per crossing of every feature would be too many).</summary>
    public const int MaxCalendarFeatures = 10;

    private static readonly FormatOffer Formats = new(OutputFormat.Json, OutputFormat.Csv, OutputFormat.Calendar);

    public static readonly Parameter Features = new("features", ParameterType.ChoiceList,
        "Comma-separated feature names to keep (e.g. Tycho,Plato); default: all. Required for format=ics, at most 10 then.")
    {
        Allowed = LunarFeatureCatalog.All.Select(f => f.Name).ToList(),
    };

    public static readonly Parameter Penumbra = new("penumbra", ParameterType.Boolean, "true adds the crossings of the penumbra's outer edge.")
    {
        Default = false,
    };

    public static IEndpointRouteBuilder MapCraterEndpoints(this IEndpointRouteBuilder routes)
    {
        routes.MapGet("/api/v1/eclipses/{date}/craters", Get)
            .WithName("GetCraterTimings")
            .WithTags("Eclipses")
            .Takes(new EndpointParameters([Parameters.EclipseDate, Features, Penumbra, .. Parameters.Site, .. Parameters.MeasurableModel, Formats.Parameter]))
            .WithSummary("When the umbra's edge crosses named features on the Moon")
            .WithDescription("For about fifty features that observers time (coordinates from the IAU/USGS Gazetteer of Planetary Nomenclature), the instants the umbra's edge reaches them (immersion) and leaves them (emersion), under the chosen shadow model evaluated at each feature's own distance along the shadow, in UTC and TT with ΔT's uncertainty, with the feature's position angle on the disc; in the order the umbra reaches them, features it never reaches last. A crossing is the same instant for every observer: a site (lat, lon, tz) adds only whether the Moon is up and the sky state. penumbra=true adds the penumbra's crossings. shadow=measured uses the enlargement fitted to the timings observers have stored for this eclipse (409 with too few). JSON, CSV, or iCalendar for a few features (features=Tycho,Plato).")
            .Produces<CraterTimingsResponse>(StatusCodes.Status200OK, "application/json", "text/csv", "text/calendar")
            .ProducesEclipseProblems()
            .ProducesProblem(StatusCodes.Status409Conflict);
        return routes;
    }

    internal static async Task<IResult> Get(HttpRequest request)
    {
        var f = RequestFields.FromQuery(request, new QueryReader());
        var reader = f.Reader;
        var query = EclipseLookup.ReadMeasurable(request, f, Formats);
        var chosen = ReadFeatures(reader, f.Raw(Features));
        var withPenumbra = f.Boolean(Penumbra);
        var site = SiteParameters.ReadSite(f, required: false);
        var output = query.Output;
        if (output == OutputFormat.Calendar && reader.IsValid)
        {
            if (chosen is null) reader.Fail("features", $"An iCalendar download needs features=Name,Name (1 to {MaxCalendarFeatures} features), e.g. features=Tycho,Plato.");
            else if (chosen.Count > MaxCalendarFeatures) reader.Fail("features", $"An iCalendar download takes at most {MaxCalendarFeatures} features; got {chosen.Count}.");
        }
        var (problem, eclipse, measured) = await EclipseLookup.ResolveAsync(request, f, query, Formats);
        if (problem is not null) return problem;
        var time = query.Time;

        var list = chosen ?? LunarFeatureCatalog.All;
        var crossings = new FeatureShadowCrossings(eclipse);
        var timings = crossings.Compute(list);
        var response = CraterMapping.ToResponse(crossings, timings, time, site, withPenumbra) with { MeasuredShadow = measured };
        switch (output)
        {
            case OutputFormat.Csv:
                return Results.Text(CraterFormats.Csv(response), ContentNegotiation.MediaType(OutputFormat.Csv));
            case OutputFormat.Calendar:
                var toUtc = NightClock.For(eclipse, time);
                var instants = timings.ToDictionary(t => t.Feature.Name, t => (In: t.UmbraImmersion is { } i ? toUtc(i.Tt) : (NodaTime.Instant?)null, Out: t.UmbraEmersion is { } o ? toUtc(o.Tt) : (NodaTime.Instant?)null));
                if (!CraterFormats.CanWriteCalendar(instants.Values.SelectMany(v => new[] { v.In, v.Out }).OfType<NodaTime.Instant>()))
                {
                    reader.Fail("format", "iCalendar covers Gregorian dates from 1583 to 9999 only; ask for json or csv.");
                    return Problems.InvalidQuery(reader);
                }
                var events = response.Features.Select(f => (f, instants[f.Name].In, instants[f.Name].Out)).ToList();
                return Results.Text(CraterFormats.Calendar(response, events), ContentNegotiation.MediaType(OutputFormat.Calendar));
            default:
                return TypedResults.Ok(response);
        }
    }

    private static List<LunarFeature>? ReadFeatures(QueryReader reader, string? raw)
    {
        if (string.IsNullOrWhiteSpace(raw)) return null;
        var chosen = new List<LunarFeature>();
        foreach (var part in raw.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            if (LunarFeatureCatalog.Find(part) is { } feature)
            {
                if (!chosen.Contains(feature)) chosen.Add(feature);
                continue;
            }
            var shown = part.Length <= 64 ? part : part[..64] + "…";
            reader.Fail("features", $"features must be names from the list ({string.Join(", ", LunarFeatureCatalog.All.Select(f => f.Name))}); got '{shown}'.");
            return null;
        }
        if (chosen.Count == 0) reader.Fail("features", "features must name at least one feature, e.g. features=Tycho,Plato.");
        return chosen;
    }
}
