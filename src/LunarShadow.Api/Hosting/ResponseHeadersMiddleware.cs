using Microsoft.Net.Http.Headers;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Headers every answer carries: <c>X-Content-Type-Options: nosniff</c>; <c>Vary: Accept</c> on the API, whose
/// representation is negotiated from the Accept header (so shared caches keep one copy per format); and a
/// Content-Security-Policy on the pages — the page may not be framed anywhere, the embed card may be framed by any site.
/// </summary>
internal sealed class ResponseHeadersMiddleware(RequestDelegate next)
{
    /// <summary>The page's policy: its own scripts, styles and data only; never inside a frame.</summary>
    public const string PagePolicy =
        "default-src 'self'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data:; connect-src 'self'; font-src 'self'; " +
        "object-src 'none'; base-uri 'none'; form-action 'self'; frame-ancestors 'none'";

    /// <summary>The embed card's policy: the same, except that any site may frame it.</summary>
    public const string EmbedPolicy =
        "default-src 'self'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data:; connect-src 'self'; font-src 'self'; " +
        "object-src 'none'; base-uri 'none'; form-action 'self'; frame-ancestors *";

    public Task InvokeAsync(HttpContext context)
    {
        var path = context.Request.Path;
        context.Response.OnStarting(() =>
        {
            var headers = context.Response.Headers;
            headers[HeaderNames.XContentTypeOptions] = "nosniff";
            if (path.StartsWithSegments("/api"))
            {
                var vary = headers.Vary.ToString();
                if (!vary.Split(',', StringSplitOptions.TrimEntries).Contains("Accept", StringComparer.OrdinalIgnoreCase))
                    headers.Vary = string.IsNullOrEmpty(vary) ? "Accept" : vary + ", Accept";
            }
            else if (path.StartsWithSegments("/embed.html"))
            {
                headers[HeaderNames.ContentSecurityPolicy] = EmbedPolicy;
            }
            else if (!path.StartsWithSegments("/docs") && !path.StartsWithSegments("/openapi") && !path.StartsWithSegments("/health"))
            {
                // The page and its files (the Swagger UI under /docs brings inline scripts of its own and keeps its defaults).
                headers[HeaderNames.ContentSecurityPolicy] = PagePolicy;
                headers[HeaderNames.XFrameOptions] = "DENY";
            }
            return Task.CompletedTask;
        });
        return next(context);
    }
}
