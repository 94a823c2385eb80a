using Microsoft.AspNetCore.OutputCaching;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Keeps answers that depend on the observers' log out of the output cache, so that a new timing or Danjon estimate
/// shows at once: the enlargement, and any request with shadow=measured or danjonL=reported (or its former name danjon).
/// </summary>
internal sealed class LiveObservationsPolicy : IOutputCachePolicy
{
    /// <summary>Whether a request's answer depends on the stored observations.</summary>
    public static bool DependsOnObservations(HttpRequest request) =>
        request.Path.Value?.EndsWith("/enlargement", StringComparison.OrdinalIgnoreCase) == true
        || Is(request, "shadow", "measured") || Is(request, "danjonL", "reported") || Is(request, "danjon", "reported");

    private static bool Is(HttpRequest request, string name, string value) =>
        request.Query.TryGetValue(name, out var values) && values.Any(v => string.Equals(v?.Trim(), value, StringComparison.OrdinalIgnoreCase));

    /// <inheritdoc/>
    public ValueTask CacheRequestAsync(OutputCacheContext context, CancellationToken cancellation)
    {
        if (DependsOnObservations(context.HttpContext.Request))
        {
            context.AllowCacheLookup = false;
            context.AllowCacheStorage = false;
        }
        return ValueTask.CompletedTask;
    }

    /// <inheritdoc/>
    public ValueTask ServeFromCacheAsync(OutputCacheContext context, CancellationToken cancellation) => ValueTask.CompletedTask;

    /// <inheritdoc/>
    public ValueTask ServeResponseAsync(OutputCacheContext context, CancellationToken cancellation) => ValueTask.CompletedTask;
}
