using System.Security.Cryptography;
using LunarShadow.Astronomy.Embedded;
using Microsoft.Net.Http.Headers;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Makes GET answers of the API cacheable: a strong ETag from the response bytes (as encoded) and the versions of the
/// ephemeris data and the tzdb, Cache-Control so that shared caches may keep them, and 304 for a matching If-None-Match.
/// Every answer is a pure function of the request, the embedded data and the tzdb, except "upcoming" without a start
/// date, which depends on today and is cached briefly, and answers from the observers' log (the enlargement,
/// shadow=measured, danjonL=reported), which caches must revalidate every time (no-cache: the ETag makes that cheap).
/// </summary>
internal sealed class EntityTagMiddleware(RequestDelegate next)
{
    /// <summary>Seconds shared caches may keep a deterministic answer.</summary>
    public const int MaxAgeSeconds = 86_400;

    private static readonly string Versions = EmbeddedDataSet.VersionTag + "-" + NodaTime.DateTimeZoneProviders.Tzdb.VersionId.Replace(' ', '_');

    public async Task InvokeAsync(HttpContext context)
    {
        if (!HttpMethods.IsGet(context.Request.Method) && !HttpMethods.IsHead(context.Request.Method)
            || !context.Request.Path.StartsWithSegments("/api"))
        {
            await next(context);
            return;
        }
        var original = context.Response.Body;
        using var buffer = new MemoryStream();
        context.Response.Body = buffer;
        try
        {
            await next(context);
        }
        finally
        {
            context.Response.Body = original;
        }
        // A request that ran out of time or lost its client is never tagged or sent as if it were whole: the deadline
        // middleware answers it.
        context.RequestAborted.ThrowIfCancellationRequested();
        if (context.Response.StatusCode != StatusCodes.Status200OK)
        {
            buffer.Position = 0;
            await buffer.CopyToAsync(original, context.RequestAborted);
            return;
        }
        var hash = Convert.ToHexStringLower(SHA256.HashData(buffer.GetBuffer().AsSpan(0, (int)buffer.Length)))[..32];
        var tag = $"\"{hash}-{Versions}\"";
        context.Response.Headers[HeaderNames.ETag] = tag;
        var dependsOnToday = context.Request.Path.StartsWithSegments("/api/v1/sites/upcoming") && string.IsNullOrEmpty(context.Request.Query["from"]);
        context.Response.Headers[HeaderNames.CacheControl] = LiveObservationsPolicy.DependsOnObservations(context.Request) ? "public, no-cache"
            : dependsOnToday ? "public, max-age=600" : $"public, max-age={MaxAgeSeconds}";
        var ifNoneMatch = context.Request.GetTypedHeaders().IfNoneMatch;
        if (ifNoneMatch.Any(t => t.Tag.ToString() == tag || t.Equals(EntityTagHeaderValue.Any)))
        {
            context.Response.StatusCode = StatusCodes.Status304NotModified;
            context.Response.ContentLength = null;
            context.Response.Headers.Remove(HeaderNames.ContentType);
            return;
        }
        context.Response.ContentLength = buffer.Length;
        buffer.Position = 0;
        await buffer.CopyToAsync(original, context.RequestAborted);
    }
}
