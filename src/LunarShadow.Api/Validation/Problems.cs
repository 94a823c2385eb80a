using Microsoft.AspNetCore.Http.HttpResults;

namespace LunarShadow.Api.Validation;

/// <summary>RFC 9457 problem responses of this API.</summary>
internal static class Problems
{
    /// <summary>The problem type of every invalid-input response.</summary>
    public const string InvalidRequestType = "https://lunarshadow.invalid/problems/invalid-request";

    /// <summary>404 with an explanation.</summary>
    public static ProblemHttpResult NotFound(string detail) => TypedResults.Problem(
        detail: detail, statusCode: StatusCodes.Status404NotFound, title: "Not found.", type: "https://lunarshadow.invalid/problems/not-found");

    /// <summary>406 naming the representations on offer.</summary>
    public static ProblemHttpResult NotAcceptable(IEnumerable<Formatting.OutputFormat> offered) => TypedResults.Problem(
        detail: "This resource is available as " + string.Join(", ", offered.Select(Formatting.ContentNegotiation.MediaType)) + "; ask with Accept or ?format=.",
        statusCode: StatusCodes.Status406NotAcceptable, title: "No acceptable representation.", type: "https://lunarshadow.invalid/problems/not-acceptable");

    /// <summary>401 for a write without a valid key (the caller adds the WWW-Authenticate challenge).</summary>
    public static ProblemHttpResult Unauthorized(string detail) => TypedResults.Problem(
        detail: detail, statusCode: StatusCodes.Status401Unauthorized, title: "A valid observatory key is required.", type: "https://lunarshadow.invalid/problems/unauthorized");

    /// <summary>409 for a write that repeats one already stored, naming the item in the request.</summary>
    public static ProblemHttpResult Conflict(string detail, string field) => TypedResults.Problem(
        detail: detail, statusCode: StatusCodes.Status409Conflict, title: "Already stored.", type: "https://lunarshadow.invalid/problems/duplicate",
        extensions: new Dictionary<string, object?> { ["field"] = field });
    /// <summary>409 for a request the service cannot answer yet in its present state (e.g. too few observations).</summary>
    public static ProblemHttpResult NotYet(string detail) => TypedResults.Problem(
        detail: detail, statusCode: StatusCodes.Status409Conflict, title: "Not possible yet.", type: "https://lunarshadow.invalid/problems/not-yet");

    /// <summary>413 for a body or batch over the limit.</summary>
    public static ProblemHttpResult TooLarge(string detail) => TypedResults.Problem(
        detail: detail, statusCode: StatusCodes.Status413PayloadTooLarge, title: "Request too large.", type: "https://lunarshadow.invalid/problems/too-large");

    /// <summary>415 for a body that is not JSON.</summary>
    public static ProblemHttpResult UnsupportedMediaType(string detail) => TypedResults.Problem(
        detail: detail, statusCode: StatusCodes.Status415UnsupportedMediaType, title: "Unsupported media type.", type: "https://lunarshadow.invalid/problems/unsupported-media-type");

    /// <summary>400 listing every invalid field with the value given and the allowed range.</summary>
    public static ValidationProblem InvalidQuery(QueryReader reader) => TypedResults.ValidationProblem(
        reader.Errors,
        detail: string.Join(" ", reader.Errors.SelectMany(e => e.Value)),
        title: "One or more request values are out of range or malformed.",
        type: InvalidRequestType);
}
