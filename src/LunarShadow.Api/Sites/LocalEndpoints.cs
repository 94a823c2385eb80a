using System.Text.Json;
using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Api.Sites;

/// <summary>GET and POST /api/v1/eclipses/{date}/local: what one site, or many, sees of an eclipse.</summary>
internal static class LocalEndpoints
{
    /// <summary>Most sites in one batch request.</summary>
    public const int MaxSitesPerBatch = 500;

    /// <summary>Largest batch body accepted, bytes.</summary>
    public const int MaxBatchBodyBytes = 1024 * 1024;

    private static readonly FormatOffer SingleFormats = new(OutputFormat.Json, OutputFormat.Csv, OutputFormat.Calendar);
    private static readonly FormatOffer BatchFormats = new(OutputFormat.Json, OutputFormat.Csv);

    public static readonly Parameter Track = new("track", ParameterType.Number,
        "Add the Moon's and Sun's altitude through the night, sampled every this many minutes over 8 hours either side of greatest eclipse.")
    {
        Unit = "minutes", Minimum = 5, Maximum = 60,
    };

    public static IEndpointRouteBuilder MapLocalEndpoints(this IEndpointRouteBuilder routes)
    {
        var group = routes.MapGroup("/api/v1/eclipses/{date}/local").WithTags("Sites");
        group.MapGet("/", Get)
            .WithName("GetLocalCircumstances")
            .Takes(new EndpointParameters([Parameters.EclipseDate, .. Parameters.Site, Track, .. Parameters.MeasurableModel, SingleFormats.Parameter]))
            .WithSummary("What one site sees of an eclipse")
            .WithDescription("Contacts in UTC and local time with the Moon's altitude and azimuth, visibility, the Sun's altitude and sky state; moonrise, moonset and horizon-profile events; the visible part of each phase; the largest visible umbral magnitude; a plain summary; and with open=, a public-night plan. JSON, CSV (contacts, moon events, visible phases and the public-night plan as rows of their own kind) or iCalendar (one event per visible phase, and the public session with open=) by Accept or format=. shadow=measured uses the enlargement fitted to this eclipse's stored crater timings (409 with too few).")
            .Produces<LocalResponse>(StatusCodes.Status200OK, "application/json", "text/csv", "text/calendar")
            .ProducesEclipseProblems()
            .ProducesProblem(StatusCodes.Status409Conflict);
        group.MapPost("/", Post)
            .WithName("GetLocalCircumstancesForManySites")
            .Takes(new EndpointParameters([Parameters.EclipseDate, BatchFormats.Parameter], Parameters.MeasurableModel, BatchBody.SitesName, Parameters.Site, MaxSitesPerBatch))
            .WithSummary("What many sites (up to 500) see of an eclipse")
            .WithDescription("Body: {\"sites\": [{\"lat\": 47.1, \"lon\": 15.4, \"elevation\": 380, \"tz\": \"Europe/Vienna\", \"minAltitude\": 5, \"horizon\": \"90:5,180:12\", \"name\": \"…\", \"open\": \"19:00-23:30\"}, …], \"shadow\": \"danjon\", \"deltaTModel\": \"best\"}. One entry per site in request order; CSV gives one row per site.")
            .Accepts<JsonElement>("application/json")
            .Produces<LocalBatchResponse>(StatusCodes.Status200OK, "application/json", "text/csv")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status409Conflict)
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        return routes;
    }

    internal static async Task<IResult> Get(HttpRequest request)
    {
        var f = RequestFields.FromQuery(request, new QueryReader());
        var query = EclipseLookup.ReadMeasurable(request, f, SingleFormats);
        var site = SiteParameters.Read(f);
        var trackMinutes = f.Number(Track);
        var (problem, eclipse, measured) = await EclipseLookup.ResolveAsync(request, f, query, SingleFormats);
        if (problem is not null) return problem;

        var response = Describe(eclipse, site!, query.Time, out var local, out var plan) with { MeasuredShadow = measured };
        if (trackMinutes is { } step) response = response with { Track = LocalMapping.Track(local, step, query.Time) };
        return query.Output switch
        {
            OutputFormat.Csv => Results.Text(LocalFormats.Csv(response), ContentNegotiation.MediaType(OutputFormat.Csv))
                .AsAttachment(LocalFormats.FileName(response, OutputFormat.Csv, "local")),
            OutputFormat.Calendar => LocalFormats.Calendar(local, plan, response, request.HttpContext.RequestServices.GetRequiredService<IClock>().GetCurrentInstant(), f.Reader),
            _ => TypedResults.Ok(response),
        };
    }

    internal static async Task<IResult> Post(HttpRequest request)
    {
        if (!(request.ContentType?.StartsWith("application/json", StringComparison.OrdinalIgnoreCase) ?? false))
            return Problems.UnsupportedMediaType("Send the sites as application/json.");
        var reader = new QueryReader();
        var body = await BatchBody.ReadAsync(request, reader, MaxBatchBodyBytes, MaxSitesPerBatch);
        if (body.TooLarge is { } tooLarge) return Problems.TooLarge(tooLarge);
        var f = RequestFields.FromBody(request, body.Fields, reader);
        var query = EclipseLookup.ReadMeasurable(request, f, BatchFormats);
        if (body.Sites is null && reader.IsValid) reader.Fail(BatchBody.SitesName, "sites must hold at least one site.");
        var (problem, eclipse, measured) = await EclipseLookup.ResolveAsync(request, f, query, BatchFormats);
        if (problem is not null) return problem;

        var aborted = request.HttpContext.RequestAborted;
        var rows = body.Sites!.Select(s =>
        {
            aborted.ThrowIfCancellationRequested(); // stop at the deadline or when the client goes away, per site
            return Describe(eclipse, s, query.Time, out _, out _) with { MeasuredShadow = measured };
        }).ToList();
        return query.Output == OutputFormat.Csv
            ? Results.Text(LocalFormats.BatchCsv(rows), ContentNegotiation.MediaType(OutputFormat.Csv))
                .AsAttachment(Downloads.FileName(OutputFormat.Csv, "lunar-eclipse", rows.Count > 0 ? rows[0].Eclipse.Date : null, "sites"))
            : TypedResults.Ok(new LocalBatchResponse(rows.Count, rows));
    }

    // What one site sees, with its public-night plan when opening hours were given.
    private static LocalResponse Describe(LunarEclipse eclipse, SiteParameters site, TimeScaleConverter time, out LocalCircumstances local, out PublicNightPlan? plan)
    {
        local = LocalCircumstancesCalculator.Compute(eclipse, site.Site, time);
        plan = site.Hours is null ? null : PublicNightPlanner.Plan(local, site.Hours, time);
        return LocalMapping.ToResponse(local, time, plan);
    }
}
