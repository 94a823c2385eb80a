namespace LunarShadow.Api.Hosting;

/// <summary>
/// How many requests the host is working on now, and from that how many threads the next step of an eclipse search may
/// use: every core the options allow while that search is the only request, fewer as soon as any other arrives (asked
/// again every step of 128 lunations, so a search gives the core back within some 10 ms).
/// </summary>
internal sealed class RequestsInFlight(RateLimitOptions options)
{
    private int _count;

    /// <summary>Requests between entering and leaving the pipeline.</summary>
    public int Count => Volatile.Read(ref _count);

    /// <summary>Threads for the next step of a search made by one of the requests in flight.</summary>
    public int ThreadsForNextSearchStep() =>
        Math.Max(1, Count <= 1 ? options.ThreadsPerSearchWhenAlone : options.ThreadsPerSearch);

    /// <summary>Counts a request from now until the returned scope is disposed.</summary>
    public Scope Enter()
    {
        Interlocked.Increment(ref _count);
        return new Scope(this);
    }

    /// <summary>One counted request.</summary>
    public readonly struct Scope(RequestsInFlight owner) : IDisposable
    {
        /// <inheritdoc />
        public void Dispose() => Interlocked.Decrement(ref owner._count);
    }
}

/// <summary>Counts each request in <see cref="RequestsInFlight"/> for as long as the pipeline works on it.</summary>
internal sealed class RequestsInFlightMiddleware(RequestDelegate next, RequestsInFlight inFlight)
{
    public async Task InvokeAsync(HttpContext context)
    {
        using (inFlight.Enter())
            await next(context);
    }
}
