using System.Globalization;
using System.Threading.RateLimiting;

namespace LunarShadow.Api.Hosting;

/// <summary>Per-client limits, from configuration section "RateLimiting".</summary>
internal sealed class RateLimitOptions
{
    /// <summary>Requests a client may make per second, sustained (default 50; a fraction for less than one a second).</summary>
    public double PermitsPerSecond { get; set; } = 50;

    /// <summary>Requests a client may make in a burst (default 200).</summary>
    public int Burst { get; set; } = 200;

    /// <summary>
    /// The bucket's refill period, in seconds (default 1): PermitsPerSecond for each second, rounded to whole tokens (at
    /// least 1). Within a partitioned limiter the tokens flow in continuously at that rate, not in steps, so a slow test
    /// that must see no refill sets a rate of one token an hour (PermitsPerSecond 1/3600, ReplenishmentSeconds 3600).
    /// </summary>
    public int ReplenishmentSeconds { get; set; } = 1;

    /// <summary>Expensive requests (searches, catalogue ranges, batches) one client may have running at once (default 1).</summary>
    public int ExpensivePerClient { get; set; } = 1;

    /// <summary>Expensive requests of one client that may wait for their turn (default 2); more get 429.</summary>
    public int ExpensiveQueuePerClient { get; set; } = 2;

    /// <summary>
    /// Expensive requests running at once over all clients (default: one fewer than the processor count, at least 1),
    /// so that a core is always left for the cheap and cached answers.
    /// </summary>
    public int ExpensiveTotal { get; set; } = Math.Max(1, Environment.ProcessorCount - 1);

    /// <summary>Expensive requests over all clients that may wait for their turn (default 16); more get 429.</summary>
    public int ExpensiveQueueTotal { get; set; } = 16;

    /// <summary>
    /// Threads one eclipse search may use at once (default: one fewer than the processor count, at least 1). With
    /// <see cref="ExpensiveTotal"/> this keeps searches off a core, however the work inside one search is split.
    /// </summary>
    public int ThreadsPerSearch { get; set; } = Math.Max(1, Environment.ProcessorCount - 1);

    /// <summary>
    /// Threads one eclipse search may use while it is the only request the service is working on (default: the
    /// processor count). The search asks again every 128 lunations, so it falls back to <see cref="ThreadsPerSearch"/>
    /// within milliseconds of another request arriving.
    /// </summary>
    public int ThreadsPerSearchWhenAlone { get; set; } = Environment.ProcessorCount;

    /// <summary>Observation writes one key (or, without a key, one client) may make per minute, sustained (default 60).</summary>
    public int WritesPerMinute { get; set; } = 60;

    /// <summary>Observation writes one key or client may make in a burst (default 30).</summary>
    public int WriteBurst { get; set; } = 30;
}

/// <summary>
/// Limits per client — by address, which behind a trusted proxy is the forwarded client address (see
/// <see cref="ForwardedHeaders"/>). A token bucket over every API request runs before the output cache (a stored answer
/// still costs a token); for the expensive endpoints a concurrency limit per client and over all clients runs after it
/// (<see cref="ExpensiveWorkMiddleware"/>), so that a stored answer never waits behind searches, and one caller's long
/// searches cannot starve everyone's cheap answers. Rejected requests get 429, a Retry-After and a problem response.
/// </summary>
internal static class RateLimiting
{
    /// <summary>True for the requests whose cost grows with what they ask for.</summary>
    public static bool IsExpensive(HttpRequest request)
    {
        var path = request.Path;
        if (IsObservationWrite(request)) return false; // cheap, and limited by their own bucket
        if (path.StartsWithSegments("/api/v1/sites/upcoming")) return true;
        if (path.Equals("/api/v1/eclipses", StringComparison.OrdinalIgnoreCase) || path.Equals("/api/v1/eclipses/", StringComparison.OrdinalIgnoreCase)) return true;
        if (path.StartsWithSegments("/api/v1/eclipses") && path.Value!.EndsWith("/visibility-map", StringComparison.OrdinalIgnoreCase)) return true;
        return HttpMethods.IsPost(request.Method) && path.StartsWithSegments("/api");
    }

    /// <summary>True for a POST of observations, which has its own limit per key.</summary>
    public static bool IsObservationWrite(HttpRequest request) =>
        HttpMethods.IsPost(request.Method) && request.Path.StartsWithSegments("/api/v1/eclipses")
        && request.Path.Value!.TrimEnd('/').EndsWith("/observations", StringComparison.OrdinalIgnoreCase);

    /// <summary>
    /// What a write is counted against: its bearer key (by a hash, so the key never sits in memory as a partition
    /// name), or the client's address when it sends none.
    /// </summary>
    public static string WriterKey(HttpContext context)
    {
        var authorization = context.Request.Headers.Authorization.ToString();
        return authorization.Length > 0
            ? "key:" + Convert.ToHexString(System.Security.Cryptography.SHA256.HashData(System.Text.Encoding.UTF8.GetBytes(authorization)))[..32]
            : "client:" + ClientKey(context);
    }

    /// <summary>The client a request is counted against: its (possibly forwarded) address.</summary>
    public static string ClientKey(HttpContext context) => context.Connection.RemoteIpAddress?.ToString() ?? "unknown";

    /// <summary>True for the requests the limits apply to: the API and the OpenAPI document.</summary>
    public static bool IsLimited(HttpContext context) =>
        context.Request.Path.StartsWithSegments("/api") || context.Request.Path.StartsWithSegments("/openapi");

    /// <summary>The limits as configured (section "RateLimiting"), or the defaults.</summary>
    public static RateLimitOptions Options(IConfiguration configuration) =>
        configuration.GetSection("RateLimiting").Get<RateLimitOptions>() ?? new RateLimitOptions();

    public static IServiceCollection AddLunarShadowRateLimiting(this IServiceCollection services, IConfiguration configuration)
    {
        var options = Options(configuration);
        services.AddSingleton(options);
        services.AddSingleton(_ => new ExpensiveWorkLimiter(ExpensiveLimiter(options)));
        services.AddRateLimiter(limiter =>
        {
            var perClient = PartitionedRateLimiter.Create<HttpContext, string>(context =>
                IsLimited(context)
                    ? RateLimitPartition.GetTokenBucketLimiter(ClientKey(context), _ => new TokenBucketRateLimiterOptions
                    {
                        TokenLimit = Math.Max(1, options.Burst),
                        TokensPerPeriod = Math.Max(1, (int)Math.Round(options.PermitsPerSecond * Math.Max(1, options.ReplenishmentSeconds))),
                        ReplenishmentPeriod = TimeSpan.FromSeconds(Math.Max(1, options.ReplenishmentSeconds)),
                        QueueLimit = 0,
                        AutoReplenishment = true,
                    })
                    : RateLimitPartition.GetNoLimiter("unlimited"));
            var writes = PartitionedRateLimiter.Create<HttpContext, string>(context =>
                IsObservationWrite(context.Request)
                    ? RateLimitPartition.GetTokenBucketLimiter(WriterKey(context), _ => new TokenBucketRateLimiterOptions
                    {
                        TokenLimit = Math.Max(1, options.WriteBurst),
                        TokensPerPeriod = Math.Max(1, options.WritesPerMinute),
                        ReplenishmentPeriod = TimeSpan.FromMinutes(1),
                        QueueLimit = 0,
                        AutoReplenishment = true,
                    })
                    : RateLimitPartition.GetNoLimiter("unlimited"));
            limiter.GlobalLimiter = PartitionedRateLimiter.CreateChained(perClient, writes);
            limiter.OnRejected = (context, _) => RejectAsync(context.HttpContext, context.Lease, options);
        });
        return services;
    }

    // Expensive requests: at most ExpensivePerClient running per client, and ExpensiveTotal over all clients.
    private static PartitionedRateLimiter<HttpContext> ExpensiveLimiter(RateLimitOptions options)
    {
        var perClient = PartitionedRateLimiter.Create<HttpContext, string>(context =>
            RateLimitPartition.GetConcurrencyLimiter(ClientKey(context), _ => new ConcurrencyLimiterOptions
            {
                PermitLimit = Math.Max(1, options.ExpensivePerClient),
                QueueLimit = Math.Max(0, options.ExpensiveQueuePerClient),
                QueueProcessingOrder = QueueProcessingOrder.OldestFirst,
            }));
        var total = PartitionedRateLimiter.Create<HttpContext, string>(_ =>
            RateLimitPartition.GetConcurrencyLimiter("all-clients", _ => new ConcurrencyLimiterOptions
            {
                PermitLimit = Math.Max(1, options.ExpensiveTotal),
                QueueLimit = Math.Max(0, options.ExpensiveQueueTotal),
                QueueProcessingOrder = QueueProcessingOrder.OldestFirst,
            }));
        return PartitionedRateLimiter.CreateChained(perClient, total);
    }

    /// <summary>Answers a refused request: 429, Retry-After, no-store and a problem response.</summary>
    public static async ValueTask RejectAsync(HttpContext context, RateLimitLease lease, RateLimitOptions options)
    {
        var response = context.Response;
        response.StatusCode = StatusCodes.Status429TooManyRequests;
        var retryAfter = lease.TryGetMetadata(MetadataName.RetryAfter, out var wait) ? Math.Max(1, (int)Math.Ceiling(wait.TotalSeconds)) : 1;
        response.Headers.RetryAfter = retryAfter.ToString(CultureInfo.InvariantCulture);
        response.Headers.CacheControl = "no-store";
        await Results.Problem(
            detail: FormattableString.Invariant($"Too many requests from this client: at most {options.PermitsPerSecond} per second (bursts of {options.Burst}), and at most {options.ExpensivePerClient} search, catalogue range, map or batch at a time ({options.ExpensiveQueuePerClient} waiting), and at most {options.WritesPerMinute} observation writes a minute per key (bursts of {options.WriteBurst}). Retry after {retryAfter} s."),
            statusCode: StatusCodes.Status429TooManyRequests, title: "Too many requests.",
            type: "https://lunarshadow.invalid/problems/too-many-requests").ExecuteAsync(context);
    }
}
