using Microsoft.AspNetCore.Http.HttpResults;

namespace LunarShadow.Api.Validation;

/// <summary>RFC 9457 problem responses of this API.</summary>
internal static class Problems
{
    /// <summary>The problem type of every invalid-input response.</summary>
    public const string InvalidRequestType = "https://lunarshadow.invalid/problems/invalid-request";

    /// <summary>400 listing every invalid field with the value given and the allowed range.</summary>
    public static ValidationProblem InvalidQuery(QueryReader reader) => TypedResults.ValidationProblem(
        reader.Errors,
        detail: string.Join(" ", reader.Errors.SelectMany(e => e.Value)),
        title: "One or more request values are out of range or malformed.",
        type: InvalidRequestType);
}
