using System.ComponentModel;
using System.Text.Json;
using LunarShadow.Api.Eclipses;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Sites;

/// <summary>GET and POST /api/v1/eclipses/{date}/local: what one site, or many, sees of an eclipse.</summary>
internal static class LocalEndpoints
{
    /// <summary>Most sites in one batch request.</summary>
    public const int MaxSitesPerBatch = 500;

    /// <summary>Largest batch body accepted, bytes.</summary>
    public const int MaxBatchBodyBytes = 1024 * 1024;

    private static readonly OutputFormat[] SingleFormats = [OutputFormat.Json, OutputFormat.Csv, OutputFormat.Calendar];
    private static readonly OutputFormat[] BatchFormats = [OutputFormat.Json, OutputFormat.Csv];

    public static IEndpointRouteBuilder MapLocalEndpoints(this IEndpointRouteBuilder routes)
    {
        var group = routes.MapGroup("/api/v1/eclipses/{date}/local").WithTags("Sites");
        group.MapGet("/", Get)
            .WithName("GetLocalCircumstances")
            .WithSummary("What one site sees of an eclipse")
            .WithDescription("Contacts in UTC and local time with the Moon's altitude and azimuth, visibility, the Sun's altitude and sky state; moonrise, moonset and horizon-profile events; the visible part of each phase; the largest visible umbral magnitude; a plain summary; and with open=, a public-night plan. JSON, CSV (contact table) or iCalendar (one event per visible phase) by Accept or format=.")
            .Produces<LocalResponse>(StatusCodes.Status200OK, "application/json", "text/csv", "text/calendar")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status406NotAcceptable);
        group.MapPost("/", Post)
            .WithName("GetLocalCircumstancesForManySites")
            .WithSummary("What many sites (up to 500) see of an eclipse")
            .WithDescription("Body: {\"sites\": [{\"lat\": 47.1, \"lon\": 15.4, \"elevation\": 380, \"tz\": \"Europe/Vienna\", \"minAltitude\": 5, \"horizon\": \"90:5,180:12\", \"name\": \"…\", \"open\": \"19:00-23:30\"}, …], \"shadow\": \"danjon\", \"deltaTModel\": \"best\"}. One entry per site in request order; CSV gives one row per site.")
            .Accepts<JsonElement>("application/json")
            .Produces<LocalBatchResponse>(StatusCodes.Status200OK, "application/json", "text/csv")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        return routes;
    }

    internal static IResult Get(
        HttpRequest request,
        [Description("UTC date of greatest eclipse, YYYY-MM-DD (Julian calendar before 1582-10-15).")] string date,
        [Description(SiteQuery.LatitudeDescription)] string? lat,
        [Description(SiteQuery.LongitudeDescription)] string? lon,
        [Description(SiteQuery.ElevationDescription)] string? elevation,
        [Description(SiteQuery.TimeZoneDescription)] string? tz,
        [Description(SiteQuery.MinAltitudeDescription)] string? minAltitude,
        [Description(SiteQuery.HorizonDescription)] string? horizon,
        [Description(SiteQuery.PressureDescription)] string? pressure,
        [Description(SiteQuery.TemperatureDescription)] string? temperature,
        [Description(SiteQuery.NameDescription)] string? name,
        [Description(OpeningQuery.Description)] string? open,
        [Description("Add the Moon's and Sun's altitude through the night, sampled every this many minutes, 5 to 60, over 8 hours either side of greatest eclipse.")] string? track,
        [AsParameters] ModelParameters computation,
        [Description("Response format: json (default), csv or ics; overrides the Accept header.")] string? format)
    {
        var reader = new QueryReader();
        var day = reader.Date("date", date);
        var site = SiteQuery.Read(reader, new SiteFields(lat, lon, elevation, tz, minAltitude, horizon, pressure, temperature, name), required: true);
        var hours = OpeningQuery.Read(reader, open);
        var trackMinutes = reader.Number("track", track, 5, 60, "minutes");
        var (model, time) = computation.Read(reader);
        var output = ContentNegotiation.Choose(request, format, SingleFormats, reader);
        if (site is null && reader.IsValid) reader.Fail("lat", "lat and lon are required.");
        if (EclipseLookup.Resolve(reader, day, date, output, SingleFormats, request.FinderFor(model), time, out var eclipse) is { } problem) return problem;

        var local = LocalCircumstancesCalculator.Compute(eclipse, site!, time);
        var plan = hours is null ? null : PublicNightPlanner.Plan(local, hours, time);
        var response = LocalMapping.ToResponse(local, time, plan);
        if (trackMinutes is { } step) response = response with { Track = LocalMapping.Track(local, step, time) };
        return output switch
        {
            OutputFormat.Csv => Results.Text(LocalFormats.ContactsCsv(response), ContentNegotiation.MediaType(OutputFormat.Csv)),
            OutputFormat.Calendar => LocalFormats.Calendar(local, response, reader),
            _ => TypedResults.Ok(response),
        };
    }

    internal static async Task<IResult> Post(
        HttpRequest request,
        [Description("UTC date of greatest eclipse, YYYY-MM-DD (Julian calendar before 1582-10-15).")] string date,
        [Description("Response format: json (default) or csv (one row per site); overrides the Accept header.")] string? format)
    {
        if (!(request.ContentType?.StartsWith("application/json", StringComparison.OrdinalIgnoreCase) ?? false))
            return Problems.UnsupportedMediaType("Send the sites as application/json.");
        if (request.ContentLength > MaxBatchBodyBytes) return Problems.TooLarge($"The body may be at most {MaxBatchBodyBytes / 1024} KiB.");
        var reader = new QueryReader();
        var day = reader.Date("date", date);
        var output = ContentNegotiation.Choose(request, format, BatchFormats, reader);
        var body = await BatchBody.ReadAsync(request, reader, MaxBatchBodyBytes, MaxSitesPerBatch);
        if (body.TooLarge is { } tooLarge) return Problems.TooLarge(tooLarge);
        if (body.Sites is null && reader.IsValid) reader.Fail("sites", "sites must hold at least one site.");
        var time = new TimeScaleConverter(body.DeltaT ?? Astronomy.Time.DeltaTModelCatalog.Default);
        if (EclipseLookup.Resolve(reader, day, date, output, BatchFormats, request.FinderFor(body.Model ?? Astronomy.Shadow.ShadowModel.Danjon), time, out var eclipse) is { } problem) return problem;

        var rows = body.Sites!.Select(s =>
        {
            var local = LocalCircumstancesCalculator.Compute(eclipse, s.Site, time);
            return LocalMapping.ToResponse(local, time, s.Hours is null ? null : PublicNightPlanner.Plan(local, s.Hours, time));
        }).ToList();
        return output == OutputFormat.Csv
            ? Results.Text(LocalFormats.SitesCsv(rows), ContentNegotiation.MediaType(OutputFormat.Csv))
            : TypedResults.Ok(new LocalBatchResponse(rows.Count, rows));
    }


}
