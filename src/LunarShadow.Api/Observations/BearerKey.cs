using LunarShadow.Api.Observations.Keys;
using LunarShadow.Api.Validation;
using Microsoft.Net.Http.Headers;

namespace LunarShadow.Api.Observations;

/// <summary>
/// The observatory key of a write, from <c>Authorization: Bearer &lt;key&gt;</c> (RFC 6750 §2.1). No key, an unknown key
/// or a revoked key gets 401 with a Bearer challenge.
/// </summary>
internal static class BearerKey
{
    /// <summary>The active key of the request, or the 401 to return.</summary>
    public static async Task<(ObservatoryKey? Key, IResult? Refusal)> AuthenticateAsync(HttpRequest request, KeyStore keys)
    {
        var header = request.Headers.Authorization.ToString();
        if (!header.StartsWith("Bearer ", StringComparison.OrdinalIgnoreCase))
            return (null, Challenge("Writing needs an observatory key: send Authorization: Bearer <key>. Keys are issued by the service's operator.", "invalid_request"));
        var key = await keys.FindAsync(header["Bearer ".Length..].Trim(), request.HttpContext.RequestAborted);
        if (key is null) return (null, Challenge("The observatory key is not known.", "invalid_token"));
        if (!key.IsActive) return (null, Challenge("The observatory key has been revoked.", "invalid_token"));
        return (key, null);
    }

    private static ChallengeResult Challenge(string detail, string error) => new(detail, error);

    private sealed class ChallengeResult(string detail, string error) : IResult
    {
        public Task ExecuteAsync(HttpContext httpContext)
        {
            httpContext.Response.Headers[HeaderNames.WWWAuthenticate] = $"Bearer realm=\"observations\", error=\"{error}\"";
            return Problems.Unauthorized(detail).ExecuteAsync(httpContext);
        }
    }
}
