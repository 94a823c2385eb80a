using System.ComponentModel;
using System.Text.Json;
using LunarShadow.Api.Eclipses;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Sites;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Photography;

namespace LunarShadow.Api.Photography;

/// <summary>GET and POST /api/v1/eclipses/{date}/photo-plan.</summary>
internal static class PhotoEndpoints
{
    private const int MaxBodyBytes = 64 * 1024;
    private static readonly OutputFormat[] Formats = [OutputFormat.Json, OutputFormat.Csv, OutputFormat.Calendar, OutputFormat.Sequence];

    public static IEndpointRouteBuilder MapPhotoEndpoints(this IEndpointRouteBuilder routes)
    {
        var group = routes.MapGroup("/api/v1/eclipses/{date}/photo-plan").WithTags("Photography");
        group.MapGet("/", Get)
            .WithName("GetPhotoPlan")
            .WithSummary("Exposure and framing timeline for one eclipse, site and camera")
            .WithDescription("Rows at every visible contact and every interval: phase, umbral and penumbral fraction, Moon altitude, air mass, predicted brightness in stops, suggested exposure and bracket, warnings; plus framing and sequences. JSON, CSV (timeline), iCalendar (shooting windows with alarms) or format=sequence (a plain list of exposures for a camera-control script).")
            .Produces<PhotoPlanResponse>(StatusCodes.Status200OK, "application/json", "text/csv", "text/calendar", "application/vnd.lunarshadow.sequence+json")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status406NotAcceptable);
        group.MapPost("/", Post)
            .WithName("PostPhotoPlan")
            .WithSummary("The same, with the site and camera profile in a JSON body")
            .WithDescription("Body: a JSON object with the same field names as the query, e.g. {\"lat\": 46.52, \"lon\": 7.96, \"tz\": \"Europe/Zurich\", \"sensor\": \"36x24\", \"pixelPitch\": 4.3, \"focalLength\": 600, \"aperture\": 6.3, \"iso\": 800, \"mount\": \"sidereal\", \"danjon\": 2.5}.")
            .Accepts<JsonElement>("application/json")
            .Produces<PhotoPlanResponse>(StatusCodes.Status200OK, "application/json", "text/csv", "text/calendar", "application/vnd.lunarshadow.sequence+json")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        return routes;
    }

    internal static IResult Get(
        HttpRequest request,
        [Description("UTC date of greatest eclipse, YYYY-MM-DD (Julian calendar before 1582-10-15).")] string date,
        [AsParameters] PhotoParameters photo,
        [AsParameters] ModelParameters computation,
        [Description("Response format: json (default), csv, ics or sequence; overrides the Accept header.")] string? format) =>
        Plan(request, date, name => photo[name], computation, format, new QueryReader());

    internal static async Task<IResult> Post(
        HttpRequest request,
        [Description("UTC date of greatest eclipse, YYYY-MM-DD (Julian calendar before 1582-10-15).")] string date,
        [Description("Response format: json (default), csv, ics or sequence; overrides the Accept header.")] string? format)
    {
        if (!(request.ContentType?.StartsWith("application/json", StringComparison.OrdinalIgnoreCase) ?? false))
            return Problems.UnsupportedMediaType("Send the site and camera as application/json.");
        var reader = new QueryReader();
        var fields = await JsonFields.ReadAsync(request, reader, MaxBodyBytes);
        if (fields is null) return reader.IsValid ? Problems.TooLarge($"The body may be at most {MaxBodyBytes / 1024} KiB.") : Problems.InvalidQuery(reader);
        var computation = new ModelParameters(fields.GetValueOrDefault("shadow"), fields.GetValueOrDefault("layerKm"),
            fields.GetValueOrDefault("deltaT"), fields.GetValueOrDefault("deltaTModel"));
        return Plan(request, date, name => fields.GetValueOrDefault(name), computation, format, reader);
    }

    private static IResult Plan(HttpRequest request, string date, Func<string, string?> field, ModelParameters computation, string? format, QueryReader reader)
    {
        var day = reader.Date("date", date);
        var (model, time) = computation.Read(reader);
        var (site, camera, settings) = PhotoRequest.Read(reader, field, time);
        var output = ContentNegotiation.Choose(request, format, Formats, reader);
        if (EclipseLookup.Resolve(reader, day, date, output, Formats, request.FinderFor(model), time, out var eclipse) is { } problem) return problem;

        var plan = PhotoPlanner.Plan(eclipse, site!, camera!, settings!, time);
        var response = PhotoMapping.ToResponse(plan, time);
        return output switch
        {
            OutputFormat.Csv => Results.Text(PhotoMapping.Csv(response), ContentNegotiation.MediaType(OutputFormat.Csv)),
            OutputFormat.Calendar => LocalFormats.Calendar(plan.Local, LocalMapping.ToResponse(plan.Local, time, null), reader),
            OutputFormat.Sequence => Results.Json(PhotoMapping.Sequence(response), contentType: ContentNegotiation.MediaType(OutputFormat.Sequence)),
            _ => TypedResults.Ok(response),
        };
    }
}
