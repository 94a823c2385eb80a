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
            .Takes(new EndpointParameters([Parameters.EclipseDate, .. Parameters.Site, .. PhotoParameters.Camera, .. Parameters.Model, Formats.Parameter]))
            .WithSummary("Exposure and framing timeline for one eclipse, site and camera")
            .WithDescription("Rows at every visible contact and every interval: phase, umbral and penumbral fraction, Moon altitude, air mass, predicted brightness in stops, suggested exposure and bracket, warnings; plus framing and sequences. JSON, CSV (timeline), iCalendar (shooting windows with alarms) or format=sequence (a plain list of exposures for a camera-control script).")
            .Produces<PhotoPlanResponse>(StatusCodes.Status200OK, "application/json", "text/csv", "text/calendar", "application/vnd.lunarshadow.sequence+json")
            .ProducesEclipseProblems();
        group.MapPost("/", Post)
            .WithName("PostPhotoPlan")
            .Takes(new EndpointParameters([Parameters.EclipseDate, Formats.Parameter], [.. Parameters.Site, .. PhotoParameters.Camera, .. Parameters.Model]))
            .WithSummary("The same, with the site and camera profile in a JSON body")
            .WithDescription("Body: a JSON object with the same field names as the query, e.g. {\"lat\": 46.52, \"lon\": 7.96, \"tz\": \"Europe/Zurich\", \"sensor\": \"36x24\", \"pixelPitch\": 4.3, \"focalLength\": 600, \"aperture\": 6.3, \"iso\": 800, \"mount\": \"sidereal\", \"danjonL\": 2.5}.")
            .Accepts<JsonElement>("application/json")
            .Produces<PhotoPlanResponse>(StatusCodes.Status200OK, "application/json", "text/csv", "text/calendar", "application/vnd.lunarshadow.sequence+json")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        return routes;
    }

    internal static IResult Get(HttpRequest request) => Plan(request, RequestFields.FromQuery(request, new QueryReader()));

    internal static async Task<IResult> Post(HttpRequest request)
    {
        if (!(request.ContentType?.StartsWith("application/json", StringComparison.OrdinalIgnoreCase) ?? false))
            return Problems.UnsupportedMediaType("Send the site and camera as application/json.");
        var reader = new QueryReader();
        var fields = await JsonFields.ReadAsync(request, reader, MaxBodyBytes);
        if (fields is null) return reader.IsValid ? Problems.TooLarge($"The body may be at most {MaxBodyBytes / 1024} KiB.") : Problems.InvalidQuery(reader);
        return Plan(request, RequestFields.FromBody(request, fields, reader));
    }

    private static IResult Plan(HttpRequest request, RequestFields f)
    {
        var query = EclipseLookup.Read(request, f, Formats);
        var site = SiteParameters.Read(f);
        var (camera, settings) = PhotoRequest.Read(f, query.Time);
        if (EclipseLookup.Resolve(f, query, Formats, out var eclipse) is { } problem) return problem;

        var plan = PhotoPlanner.Plan(eclipse, site!.Site, camera!, settings!, query.Time);
        var response = PhotoMapping.ToResponse(plan, query.Time);
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
