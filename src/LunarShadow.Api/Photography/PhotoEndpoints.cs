using System.Text.Json;
using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Photography;
using NodaTime;

namespace LunarShadow.Api.Photography;

/// <summary>GET and POST /api/v1/eclipses/{date}/photo-plan.</summary>
internal static class PhotoEndpoints
{
    private const int MaxBodyBytes = 64 * 1024;
    private static readonly FormatOffer Formats = new(OutputFormat.Json, OutputFormat.Csv, OutputFormat.Calendar, OutputFormat.Sequence);

    public static IEndpointRouteBuilder MapPhotoEndpoints(this IEndpointRouteBuilder routes)
    {
        var group = routes.MapGroup("/api/v1/eclipses/{date}/photo-plan").WithTags("Photography");
        group.MapGet("/", Get)
            .WithName("GetPhotoPlan")
            .Takes(new EndpointParameters([Parameters.EclipseDate, .. Parameters.Site, .. PhotoParameters.Camera, .. Parameters.MeasurableModel, Formats.Parameter]))
            .WithSummary("Exposure and framing timeline for one eclipse, site and camera")
            .WithDescription("Rows at every visible contact and every interval: phase, umbral and penumbral fraction, Moon altitude, air mass, predicted brightness in stops, suggested exposure and bracket, warnings; plus framing and sequences. JSON, CSV (timeline), iCalendar (shooting windows with alarms) or format=sequence (a plain list of exposures for a camera-control script). shadow=measured uses the enlargement fitted to this eclipse's stored crater timings (409 with too few); danjonL=reported the median of the stored Danjon estimates (the default L, said so, when there are none).")
            .Produces<PhotoPlanResponse>(StatusCodes.Status200OK, "application/json", "text/csv", "text/calendar", "application/vnd.lunarshadow.sequence+json")
            .ProducesEclipseProblems()
            .ProducesProblem(StatusCodes.Status409Conflict);
        group.MapPost("/", Post)
            .WithName("PostPhotoPlan")
            .Takes(new EndpointParameters([Parameters.EclipseDate, Formats.Parameter], [.. Parameters.Site, .. PhotoParameters.Camera, .. Parameters.MeasurableModel]))
            .WithSummary("The same, with the site and camera profile in a JSON body")
            .WithDescription("Body: a JSON object with the same field names as the query, e.g. {\"lat\": 46.52, \"lon\": 7.96, \"tz\": \"Europe/Zurich\", \"sensor\": \"36x24\", \"pixelPitch\": 4.3, \"focalLength\": 600, \"aperture\": 6.3, \"iso\": 800, \"mount\": \"sidereal\", \"danjonL\": 2.5}.")
            .Accepts<JsonElement>("application/json")
            .Produces<PhotoPlanResponse>(StatusCodes.Status200OK, "application/json", "text/csv", "text/calendar", "application/vnd.lunarshadow.sequence+json")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status409Conflict)
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        return routes;
    }

    internal static Task<IResult> Get(HttpRequest request) => Plan(request, RequestFields.FromQuery(request, new QueryReader()));

    internal static async Task<IResult> Post(HttpRequest request)
    {
        if (!(request.ContentType?.StartsWith("application/json", StringComparison.OrdinalIgnoreCase) ?? false))
            return Problems.UnsupportedMediaType("Send the site and camera as application/json.");
        var reader = new QueryReader();
        var fields = await JsonFields.ReadAsync(request, reader, MaxBodyBytes);
        if (fields is null) return reader.IsValid ? Problems.TooLarge($"The body may be at most {MaxBodyBytes / 1024} KiB.") : Problems.InvalidQuery(reader);
        return await Plan(request, RequestFields.FromBody(request, fields, reader));
    }

    private static async Task<IResult> Plan(HttpRequest request, RequestFields f)
    {
        var query = EclipseLookup.ReadMeasurable(request, f, Formats);
        var site = SiteParameters.Read(f);
        var (camera, settings, danjonReported) = PhotoRequest.Read(f, query.Time);
        var (problem, eclipse, measured) = await EclipseLookup.ResolveAsync(request, f, query, Formats);
        if (problem is not null) return problem;
        DanjonReportsEcho? reports = null;
        if (danjonReported)
        {
            var values = await request.HttpContext.RequestServices.GetRequiredService<IObservedNight>().DanjonValuesAsync(query.Day!.Value, request.HttpContext.RequestAborted);
            reports = DanjonReportsEcho.Of(values);
            settings = settings! with { Danjon = reports.UsedL };
        }

        var plan = PhotoPlanner.Plan(eclipse, site!.Site, camera!, settings!, query.Time);
        var response = PhotoMapping.ToResponse(plan, query.Time) with { MeasuredShadow = measured };
        if (reports is not null) response = response with { Model = response.Model with { Reported = reports } };
        if (query.Output == OutputFormat.Calendar)
        {
            if (PhotoFormats.ICalendar(plan, response, request.HttpContext.RequestServices.GetRequiredService<IClock>().GetCurrentInstant()) is { } calendar)
                return Results.Text(calendar, ContentNegotiation.MediaType(OutputFormat.Calendar)).AsAttachment(PhotoFormats.FileName(response, OutputFormat.Calendar, "photo-plan"));
            f.Reader.Fail("format", "iCalendar covers Gregorian dates from 1583 to 9999 only; ask for json or csv.");
            return Problems.InvalidQuery(f.Reader);
        }
        return query.Output switch
        {
            OutputFormat.Csv => Results.Text(PhotoMapping.Csv(response), ContentNegotiation.MediaType(OutputFormat.Csv))
                .AsAttachment(PhotoFormats.FileName(response, OutputFormat.Csv, "photo-plan")),
            OutputFormat.Sequence => Results.Json(PhotoMapping.Sequence(response), contentType: ContentNegotiation.MediaType(OutputFormat.Sequence))
                .AsAttachment(PhotoFormats.FileName(response, OutputFormat.Sequence, "photo-sequence")),
            _ => TypedResults.Ok(response),
        };
    }
}
