using System.Diagnostics;
using System.Net;
using System.Text;

// A bounded load test against a LunarShadow service on this machine (loopback only).
//   dotnet run -c Release --project tests/LunarShadow.LoadTest -- [baseUrl] [seconds] [concurrency]
// Defaults: http://127.0.0.1:5080, 20 s per scenario (at most 200,000 requests), 32 connections.
// Start the service first, with limits raised for the test, e.g.:
//   RateLimiting__PermitsPerSecond=1000000 RateLimiting__Burst=1000000 dotnet run -c Release --project src/LunarShadow.Api
var baseUrl = new Uri(args.Length > 0 ? args[0] : "http://127.0.0.1:5080");
if (!IPAddress.TryParse(baseUrl.Host, out var address) ? baseUrl.Host != "localhost" : !IPAddress.IsLoopback(address))
{
    Console.Error.WriteLine("Refusing: this load test only targets services on this machine (loopback).");
    return 2;
}
var seconds = args.Length > 1 ? Math.Clamp(int.Parse(args[1], System.Globalization.CultureInfo.InvariantCulture), 1, 120) : 20;
var concurrency = args.Length > 2 ? Math.Clamp(int.Parse(args[2], System.Globalization.CultureInfo.InvariantCulture), 1, 256) : 32;
const int MaxRequests = 200_000;

using var client = new HttpClient(new SocketsHttpHandler { MaxConnectionsPerServer = concurrency, PooledConnectionLifetime = TimeSpan.FromMinutes(5) }) { BaseAddress = baseUrl, Timeout = TimeSpan.FromSeconds(30) };

var batchBody = "{\"sites\":[" + string.Join(',', Enumerable.Range(0, 50).Select(i => $"{{\"lat\":{-60 + i * 2.4:0.0},\"lon\":{-170 + i * 6.8:0.0}}}")) + "]}";
var scenarios = new (string Name, Func<int, HttpRequestMessage> Request)[]
{
    ("cached local circumstances", _ => new HttpRequestMessage(HttpMethod.Get, "/api/v1/eclipses/2025-03-14/local?lat=47.31&lon=11.42&tz=Europe/Vienna")),
    ("mixed: catalogue, local (varied sites), batch of 50", i => (i % 10) switch
    {
        < 3 => new HttpRequestMessage(HttpMethod.Get, $"/api/v1/eclipses?from={2000 + i % 50}-01-01&to={2010 + i % 50}-12-31"),
        < 9 => new HttpRequestMessage(HttpMethod.Get, $"/api/v1/eclipses/2025-03-14/local?lat={(i * 37 % 170) - 85}&lon={(i * 53 % 360) - 180}"),
        _ => new HttpRequestMessage(HttpMethod.Post, "/api/v1/eclipses/2025-03-14/local") { Content = new StringContent(batchBody, Encoding.UTF8, "application/json") },
    }),
};

foreach (var (name, make) in scenarios)
{
    // Warm up caches and the JIT.
    for (var i = 0; i < 200; i++) (await client.SendAsync(make(i))).Dispose();

    var latencies = new List<double>[concurrency];
    var errors = 0;
    var issued = 0;
    var stop = Stopwatch.StartNew();
    var workers = Enumerable.Range(0, concurrency).Select(async w =>
    {
        var mine = latencies[w] = new List<double>();
        while (stop.Elapsed.TotalSeconds < seconds)
        {
            var n = Interlocked.Increment(ref issued);
            if (n > MaxRequests) break;
            var t = Stopwatch.GetTimestamp();
            try
            {
                using var response = await client.SendAsync(make(n));
                await response.Content.CopyToAsync(Stream.Null);
                if ((int)response.StatusCode >= 400) Interlocked.Increment(ref errors);
            }
            catch (HttpRequestException)
            {
                Interlocked.Increment(ref errors);
            }
            mine.Add(Stopwatch.GetElapsedTime(t).TotalMilliseconds);
        }
    }).ToArray();
    await Task.WhenAll(workers);
    var elapsed = stop.Elapsed.TotalSeconds;
    var all = latencies.SelectMany(l => l).OrderBy(x => x).ToArray();
    double P(double q) => all[Math.Min(all.Length - 1, (int)Math.Floor(q * all.Length))];
    Console.WriteLine($"{name}: {all.Length} requests in {elapsed:F1} s = {all.Length / elapsed:F0} req/s; latency p50 {P(0.50):F1} ms, p99 {P(0.99):F1} ms, max {all[^1]:F1} ms; errors {errors}");
}
return 0;
