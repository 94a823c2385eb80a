using System.Globalization;
using System.Threading.RateLimiting;
using Microsoft.AspNetCore.RateLimiting;

namespace LunarShadow.Api.Hosting;

/// <summary>Per-client limits, from configuration section "RateLimiting".</summary>
internal sealed class RateLimitOptions
{
    /// <summary>Requests a client may make per second, sustained (default 50).</summary>
    public int PermitsPerSecond { get; set; } = 50;

    /// <summary>Requests a client may make in a burst (default 200).</summary>
    public int Burst { get; set; } = 200;
}

/// <summary>A token bucket per client address; rejected requests get 429, a Retry-After and a problem response.</summary>
internal static class RateLimiting
{
    public static IServiceCollection AddLunarShadowRateLimiting(this IServiceCollection services, IConfiguration configuration)
    {
        var options = configuration.GetSection("RateLimiting").Get<RateLimitOptions>() ?? new RateLimitOptions();
        services.AddRateLimiter(limiter =>
        {
            limiter.GlobalLimiter = PartitionedRateLimiter.Create<HttpContext, string>(context =>
                context.Request.Path.StartsWithSegments("/api")
                    ? RateLimitPartition.GetTokenBucketLimiter(context.Connection.RemoteIpAddress?.ToString() ?? "unknown", _ => new TokenBucketRateLimiterOptions
                    {
                        TokenLimit = Math.Max(1, options.Burst),
                        TokensPerPeriod = Math.Max(1, options.PermitsPerSecond),
                        ReplenishmentPeriod = TimeSpan.FromSeconds(1),
                        QueueLimit = 0,
                        AutoReplenishment = true,
                    })
                    : RateLimitPartition.GetNoLimiter("unlimited"));
            limiter.OnRejected = async (context, token) =>
            {
                var response = context.HttpContext.Response;
                response.StatusCode = StatusCodes.Status429TooManyRequests;
                var retryAfter = context.Lease.TryGetMetadata(MetadataName.RetryAfter, out var wait) ? Math.Max(1, (int)Math.Ceiling(wait.TotalSeconds)) : 1;
                response.Headers.RetryAfter = retryAfter.ToString(CultureInfo.InvariantCulture);
                await Results.Problem(
                    detail: $"Too many requests from this client: at most {options.PermitsPerSecond} per second (bursts of {options.Burst}). Retry after {retryAfter} s.",
                    statusCode: StatusCodes.Status429TooManyRequests, title: "Too many requests.",
                    type: "https://lunarshadow.invalid/problems/too-many-requests").ExecuteAsync(context.HttpContext);
            };
        });
        return services;
    }
}
