using System.Diagnostics;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Sends one real request through the service's own pipeline over loopback before the service calls itself ready, so
/// that the first caller finds the endpoint, its middleware and the response writers compiled (with tiered compilation
/// off, that first compile costs some 100 ms). The request asks for a date with no eclipse within two lunations, so it
/// caches nothing anyone would ask for. Where the server has no plain-HTTP address to call (the in-memory test server, a
/// socket file), nothing is sent; a failure is logged and never makes the service unready.
/// </summary>
internal sealed partial class PipelineWarmUp(IServer server, ILogger<PipelineWarmUp> logger)
{
    /// <summary>The request sent: a catalogue day with no eclipse near it (the full Moons of 2000 Aug–Oct are not eclipsed).</summary>
    public const string PathAndQuery = "/api/v1/eclipses?from=2000-10-01&to=2000-10-01";

    /// <summary>The correlation id the request carries, so its log line says what it is.</summary>
    public const string CorrelationId = "readiness-warm-up";

    private Lazy<Task>? _once;

    /// <summary>Runs the warm-up the first time it is asked for; later calls wait for that one run.</summary>
    public Task RunOnceAsync() => LazyInitializer.EnsureInitialized(ref _once, () => new Lazy<Task>(RunAsync)).Value;

    private async Task RunAsync()
    {
        var addresses = server.Features.Get<IServerAddressesFeature>()?.Addresses ?? [];
        if (addresses.Select(LoopbackBase).FirstOrDefault(a => a is not null) is not { } baseAddress) return;
        try
        {
            using var client = new HttpClient { BaseAddress = baseAddress, Timeout = TimeSpan.FromSeconds(20) };
            using var request = new HttpRequestMessage(HttpMethod.Get, PathAndQuery);
            request.Headers.Add(CorrelationIdMiddleware.Header, CorrelationId);
            var watch = Stopwatch.StartNew();
            using var response = await client.SendAsync(request);
            _ = await response.Content.ReadAsByteArrayAsync();
            Warmed(logger, PathAndQuery, (int)response.StatusCode, watch.ElapsedMilliseconds);
        }
        catch (Exception e) when (e is HttpRequestException or TaskCanceledException)
        {
            NotWarmed(logger, e, baseAddress);
        }
    }

    [LoggerMessage(Level = LogLevel.Information, Message = "Warmed the request pipeline: GET {Path} answered {Status} in {Milliseconds} ms")]
    private static partial void Warmed(ILogger logger, string path, int status, long milliseconds);

    [LoggerMessage(Level = LogLevel.Warning, Message = "Could not warm the request pipeline through {Address}")]
    private static partial void NotWarmed(ILogger logger, Exception exception, Uri address);

    /// <summary>
    /// The loopback address that reaches a listening address: a wildcard host (+, *, 0.0.0.0, [::]) becomes 127.0.0.1;
    /// null for anything but plain HTTP on a port (https, a unix socket).
    /// </summary>
    internal static Uri? LoopbackBase(string address)
    {
        var normalised = address.Replace("://+", "://wildcard", StringComparison.Ordinal).Replace("://*", "://wildcard", StringComparison.Ordinal);
        if (!Uri.TryCreate(normalised, UriKind.Absolute, out var uri) || uri.Scheme != Uri.UriSchemeHttp || uri.Host == "unix") return null;
        var host = uri.Host is "wildcard" or "0.0.0.0" or "[::]" ? "127.0.0.1" : uri.Host;
        return new UriBuilder(Uri.UriSchemeHttp, host, uri.Port).Uri;
    }
}
