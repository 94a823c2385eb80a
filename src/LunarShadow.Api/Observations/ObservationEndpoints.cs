using System.Text.Json;
using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Observations.Keys;
using LunarShadow.Api.Observations.Storage;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Observations;

/// <summary>
/// POST and GET /api/v1/eclipses/{date}/observations: observatories post crater timings and Danjon estimates with their
/// key; anyone may read them.
/// </summary>
internal static class ObservationEndpoints
{
    /// <summary>The route of the log of one eclipse.</summary>
    public const string Route = "/api/v1/eclipses/{date}/observations";

    /// <summary>Most observations in one request.</summary>
    public const int MaxPerRequest = 500;

    /// <summary>Largest body accepted, bytes.</summary>
    public const int MaxBodyBytes = 256 * 1024;

    /// <summary>The operation that needs a key (the OpenAPI document marks it with the bearer scheme).</summary>
    public const string WriteOperation = "AddObservations";

    /// <summary>The shadow model observations are checked under.</summary>
    public static readonly ShadowModel CheckModel = ShadowModel.Danjon;

    private static readonly FormatOffer ListFormats = new(OutputFormat.Json, OutputFormat.Csv);

    public static IEndpointRouteBuilder MapObservationEndpoints(this IEndpointRouteBuilder routes)
    {
        routes.MapPost(Route, Post)
            .WithName(WriteOperation)
            .WithTags("Observations")
            .Takes(new EndpointParameters([Parameters.EclipseDate]))
            .WithMetadata(new ObservationBodyMetadata(MaxPerRequest))
            .WithSummary("Post crater timings and Danjon estimates (observatory key required)")
            .WithDescription($"Body: one observation or an array of up to {MaxPerRequest} (at most {MaxBodyBytes / 1024} KiB). A crater timing {{\"kind\": \"crater-timing\", \"feature\": \"Tycho\", \"crossing\": \"immersion\", \"utc\": \"…Z\", \"site\": {{\"lat\": …, \"lon\": …, \"elevation\": …}}, \"uncertaintySeconds\": 5, \"optics\": \"…\", \"observer\": \"…\"}} or a Danjon estimate {{\"kind\": \"danjon\", \"value\": 2.5, \"utc\": \"…Z\", \"site\": {{…}}, \"observer\": \"…\"}}. Each instant must lie between P1 and P4, a timing within {ObservationChecks.CrossingWindowMinutes} minutes of the predicted crossing (danjon shadow model), and the Moon must be above the site's horizon then. A batch is stored whole or not at all: a 400 names each bad field with its index ([2].utc), a 409 names the item that repeats one this key already stored. Needs Authorization: Bearer <observatory key>.")
            .Accepts<JsonElement>("application/json")
            .Produces<ObservationsStoredResponse>(StatusCodes.Status201Created)
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status401Unauthorized)
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status409Conflict)
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        routes.MapGet(Route, Get)
            .WithName("GetObservations")
            .WithTags("Observations")
            .Takes(new EndpointParameters([Parameters.EclipseDate, ObservationParameters.KindFilter, ListFormats.Parameter]))
            .WithSummary("The observations posted for an eclipse")
            .WithDescription("Every crater timing and Danjon estimate stored for the eclipse, in the order they were stored, with the observatory's display name (never its key). Public. JSON or CSV by Accept or format=.")
            .Produces<ObservationListResponse>(StatusCodes.Status200OK, "application/json", "text/csv")
            .ProducesEclipseProblems()
            .CacheOutput(policy => policy.NoCache()); // the log grows: never served from the output cache
        return routes;
    }

    internal static async Task<IResult> Post(HttpRequest request, KeyStore keys, ObservationStore store, NodaTime.IClock clock)
    {
        var (key, refusal) = await BearerKey.AuthenticateAsync(request, keys);
        if (refusal is not null) return refusal;
        if (!(request.ContentType?.StartsWith("application/json", StringComparison.OrdinalIgnoreCase) ?? false))
            return Problems.UnsupportedMediaType("Send the observations as application/json.");
        var reader = new QueryReader();
        var f = RequestFields.FromQuery(request, reader);
        var day = f.Date(Parameters.EclipseDate);
        var (document, tooLarge) = await JsonFields.ReadDocumentAsync(request, reader, MaxBodyBytes, maxDepth: 8);
        if (tooLarge) return Problems.TooLarge($"The body may be at most {MaxBodyBytes / 1024} KiB.");
        if (document is null || day is null) return Problems.InvalidQuery(reader);
        IReadOnlyList<ObservationInput>? inputs;
        using (document)
        {
            if (document.RootElement.ValueKind == JsonValueKind.Array && document.RootElement.GetArrayLength() > MaxPerRequest)
                return Problems.TooLarge($"A request may hold at most {MaxPerRequest} observations; got {document.RootElement.GetArrayLength()}.");
            inputs = ObservationBody.Read(document.RootElement, reader);
        }
        if (inputs is null || !reader.IsValid) return Problems.InvalidQuery(reader);
        var time = TimeScaleConverter.Default;
        if (Find(request, day.Value, time) is not { } eclipse) return NoEclipse(day.Value);
        var drafts = ObservationChecks.Check(eclipse, time, inputs, reader);
        if (drafts is null) return Problems.InvalidQuery(reader);

        var outcome = await store.AddAsync(key!, day.Value, drafts, clock.GetCurrentInstant().ToDateTimeOffset(), request.HttpContext.RequestAborted);
        if (outcome.DuplicateIndex is { } index)
        {
            var field = inputs[index].Prefix.Length == 0 ? "body" : inputs[index].Prefix.TrimEnd('.');
            return Problems.Conflict($"{field} repeats an observation this key has already stored (or an earlier one in the same request); nothing was stored.", field);
        }
        var date = day.Value.ToIsoDateString();
        return TypedResults.Created($"/api/v1/eclipses/{date}/observations", new ObservationsStoredResponse(date, outcome.Ids!.Count, outcome.Ids, key!.Name));
    }

    internal static async Task<IResult> Get(HttpRequest request, ObservationStore store)
    {
        var f = RequestFields.FromQuery(request, new QueryReader());
        var day = f.Date(Parameters.EclipseDate);
        var kind = f.Choice(ObservationParameters.KindFilter);
        var output = ListFormats.Choose(request, f);
        if (!f.Reader.IsValid || day is null) return Problems.InvalidQuery(f.Reader);
        if (output is null) return Problems.NotAcceptable(ListFormats.Formats);
        if (Find(request, day.Value, TimeScaleConverter.Default) is null) return NoEclipse(day.Value);

        var stored = await store.ListAsync(day.Value, kind, request.HttpContext.RequestAborted);
        var list = new ObservationListResponse(day.Value.ToIsoDateString(), stored.Count, stored.Select(ObservationMapping.ToResponse).ToList());
        return output == OutputFormat.Csv
            ? Results.Text(ObservationFormats.Csv(list), ContentNegotiation.MediaType(OutputFormat.Csv))
                .AsAttachment(Downloads.FileName(OutputFormat.Csv, "lunar-eclipse", list.Eclipse, "observations"))
            : TypedResults.Ok(list);
    }

    private static LunarEclipse? Find(HttpRequest request, CalendarDate day, TimeScaleConverter time) =>
        request.FinderFor(CheckModel).OnUtcDate(day, time);

    private static Microsoft.AspNetCore.Http.HttpResults.ProblemHttpResult NoEclipse(CalendarDate day) => Problems.NotFound(
        $"No lunar eclipse has its greatest phase on {day.ToIsoDateString()} (UTC) under the {CheckModel.Name} shadow model. List eclipses with /api/v1/eclipses?from=…&to=….");
}

/// <summary>Marks the write endpoint for the OpenAPI document: its body is one observation or an array of them.</summary>
/// <param name="MaxItems">Most observations in one request.</param>
internal sealed record ObservationBodyMetadata(int MaxItems);
