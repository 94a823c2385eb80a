using System.Threading.RateLimiting;

namespace LunarShadow.Api.Hosting;

/// <summary>The host's one concurrency limiter for expensive requests (per client, then over all clients).</summary>
/// <param name="limiter">The chained limiter, disposed with the host.</param>
internal sealed class ExpensiveWorkLimiter(PartitionedRateLimiter<HttpContext> limiter) : IDisposable
{
    /// <summary>The chained limiter.</summary>
    public PartitionedRateLimiter<HttpContext> Limiter { get; } = limiter;

    /// <inheritdoc />
    public void Dispose() => Limiter.Dispose();
}

/// <summary>
/// Lets an expensive request (see <see cref="RateLimiting.IsExpensive"/>) run only when its client and the whole service
/// have a turn free, waiting in a bounded queue otherwise (429 past it). It sits after the output cache, so that a stored
/// answer is sent at once and never waits behind searches; the wait counts against the request's deadline.
/// </summary>
internal sealed class ExpensiveWorkMiddleware(RequestDelegate next, ExpensiveWorkLimiter limiter, RateLimitOptions options)
{
    public async Task InvokeAsync(HttpContext context)
    {
        if (!RateLimiting.IsLimited(context) || !RateLimiting.IsExpensive(context.Request))
        {
            await next(context);
            return;
        }
        using var lease = await limiter.Limiter.AcquireAsync(context, 1, context.RequestAborted);
        if (!lease.IsAcquired)
        {
            await RateLimiting.RejectAsync(context, lease, options);
            return;
        }
        await next(context);
    }
}
