using System.Diagnostics;
using System.Globalization;
using System.Net;
using System.Net.Sockets;
using System.Text;

// A bounded load test against a LunarShadow service on this machine (loopback only).
//   dotnet run -c Release --project tests/LunarShadow.LoadTest -- [baseUrl] [seconds] [concurrency] [throughput|abuse]
// Defaults: http://127.0.0.1:5080, 20 s per scenario (at most 200,000 requests), 32 connections, throughput.
//
// throughput: start the service with limits raised, e.g.
//   RateLimiting__PermitsPerSecond=1000000 RateLimiting__Burst=1000000 RateLimiting__ExpensivePerClient=64 \
//   RateLimiting__ExpensiveQueuePerClient=1000 RateLimiting__ExpensiveTotal=64 RateLimiting__ExpensiveQueueTotal=1000 \
//   dotnet run -c Release --project src/LunarShadow.Api
// and each scenario is reported on its own: answers the output cache holds, and answers that must be computed
// (random sites to 4 decimals, random photo plans, random catalogue slices: no two requests alike).
//
// abuse: start the service with its default limits. One client (from 127.0.0.2) sends, inside its rate limit, the most
// expensive requests it may: searches no site can satisfy over the longest span allowed (years=1000) with a 360-point
// horizon, each on a new layer height (a cold eclipse finder), and batches of 50 sites; another (127.0.0.3) asks for a
// cached answer. The figure is the second client's latency. quiet: the same without the abusive client.
// Every run prints the machine's load average (1, 5, 15 min) at its start and end: figures taken on a busy machine
// must say so.
var baseUrl = new Uri(args.Length > 0 ? args[0] : "http://127.0.0.1:5080");
if (!IPAddress.TryParse(baseUrl.Host, out var address) ? baseUrl.Host != "localhost" : !IPAddress.IsLoopback(address))
{
    Console.Error.WriteLine("Refusing: this load test only targets services on this machine (loopback).");
    return 2;
}
var seconds = args.Length > 1 ? Math.Clamp(int.Parse(args[1], CultureInfo.InvariantCulture), 1, 120) : 20;
var concurrency = args.Length > 2 ? Math.Clamp(int.Parse(args[2], CultureInfo.InvariantCulture), 1, 256) : 32;
var mode = args.Length > 3 ? args[3] : "throughput";
const int MaxRequests = 200_000;

// The load average from /proc/loadavg (Linux), or "n/a".
static string LoadAverage() =>
    File.Exists("/proc/loadavg") ? string.Join(' ', File.ReadAllText("/proc/loadavg").Split(' ').Take(3)) : "n/a";

Console.WriteLine($"{mode}, {seconds} s per scenario, {concurrency} connections, {Environment.ProcessorCount} cores; load average at start {LoadAverage()}");

// A client whose connections come from a given loopback address, so the service sees it as its own client.
HttpClient ClientFrom(string local, int connections) => new(new SocketsHttpHandler
{
    MaxConnectionsPerServer = connections,
    PooledConnectionLifetime = TimeSpan.FromMinutes(5),
    ConnectCallback = async (context, token) =>
    {
        var socket = new Socket(SocketType.Stream, ProtocolType.Tcp) { NoDelay = true };
        socket.Bind(new IPEndPoint(IPAddress.Parse(local), 0));
        await socket.ConnectAsync(context.DnsEndPoint, token);
        return new NetworkStream(socket, ownsSocket: true);
    },
})
{ BaseAddress = baseUrl, Timeout = TimeSpan.FromSeconds(60) };

string D(double v, int digits) => v.ToString("F" + digits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

if (mode is "abuse" or "quiet")
{
    var code = await Abuse(abusive: mode == "abuse");
    Console.WriteLine($"load average at end {LoadAverage()}");
    return code;
}

using var client = ClientFrom("127.0.0.1", concurrency);
var batchBody = "{\"sites\":[" + string.Join(',', Enumerable.Range(0, 50).Select(i => $"{{\"lat\":{D(-60 + i * 2.4, 1)},\"lon\":{D(-170 + i * 6.8, 1)}}}")) + "]}";
string[] eclipses = ["2025-03-14", "2025-09-07", "2026-03-03", "2028-12-31", "2029-06-26", "2029-12-20"];
var scenarios = new (string Name, Func<Random, HttpRequestMessage> Request)[]
{
    ("cached: one local-circumstances URL", _ => new HttpRequestMessage(HttpMethod.Get, "/api/v1/eclipses/2025-03-14/local?lat=47.31&lon=11.42&tz=Europe/Vienna")),
    ("uncached: local circumstances at random sites", r => new HttpRequestMessage(HttpMethod.Get,
        $"/api/v1/eclipses/{eclipses[r.Next(eclipses.Length)]}/local?lat={D(r.NextDouble() * 170 - 85, 4)}&lon={D(r.NextDouble() * 360 - 180, 4)}")),
    ("uncached: photo plans at random sites", r => new HttpRequestMessage(HttpMethod.Get,
        $"/api/v1/eclipses/{eclipses[r.Next(eclipses.Length)]}/photo-plan?lat={D(r.NextDouble() * 170 - 85, 4)}&lon={D(r.NextDouble() * 360 - 180, 4)}&iso={100 * (1 + r.Next(32))}&focalLength={50 + r.Next(1200)}")),
    ("uncached: catalogue slices (random 1-20 years, -1999..+2980)", r =>
    {
        var year = r.Next(-1999, 2980);
        return new HttpRequestMessage(HttpMethod.Get, $"/api/v1/eclipses?from={year:0000;-0000}-{1 + r.Next(12):00}-{1 + r.Next(28):00}&to={year + 1 + r.Next(20):0000;-0000}-{1 + r.Next(12):00}-{1 + r.Next(28):00}");
    }),
    ("uncached: batches of 50 sites", r => new HttpRequestMessage(HttpMethod.Post, $"/api/v1/eclipses/{eclipses[r.Next(eclipses.Length)]}/local")
        { Content = new StringContent(batchBody.Replace("\"lat\":", $"\"elevation\":{r.Next(3000)},\"lat\":", StringComparison.Ordinal), Encoding.UTF8, "application/json") }),
};

foreach (var (name, make) in scenarios)
{
    // Warm up the JIT and the per-eclipse caches (not the output cache: uncached scenarios never repeat a URL).
    var warm = new Random(1);
    for (var i = 0; i < 100; i++) (await client.SendAsync(make(warm))).Dispose();
    var result = await Measure(client, make, concurrency, seconds, seed: 42);
    Console.WriteLine($"{name}: {result}");
}
Console.WriteLine($"load average at end {LoadAverage()}");
return 0;

// quiet: the same measurement with no abusive client, for comparison on a machine others share.
async Task<int> Abuse(bool abusive)
{
    using var abuser = ClientFrom("127.0.0.2", 8);
    using var victim = ClientFrom("127.0.0.3", 4);
    var cheap = "/api/v1/eclipses/2025-03-14/local?lat=47.31&lon=11.42&tz=Europe/Vienna";
    for (var i = 0; i < 100; i++) (await victim.GetAsync(cheap)).Dispose();
    var stop = new CancellationTokenSource(TimeSpan.FromSeconds(seconds));
    var statuses = new System.Collections.Concurrent.ConcurrentDictionary<int, int>();
    var layer = 0;
    var horizon = string.Join(',', Enumerable.Range(0, 360).Select(a => $"{a}:{1 + a % 7}"));
    var batch = "{\"sites\":[" + string.Join(',', Enumerable.Range(0, 50).Select(i => $"{{\"lat\":{D(-60 + i * 2.4, 1)},\"lon\":{D(-170 + i * 6.8, 1)}}}")) + "]}";
    // 8 connections, paced to 40 requests a second in all: inside the default limit of 50 per second. Three in four are
    // hopeless searches, one in four a batch of 50 sites.
    var abusers = Enumerable.Range(0, abusive ? 8 : 0).Select(async w =>
    {
        while (!stop.IsCancellationRequested)
        {
            var started = Stopwatch.GetTimestamp();
            var n = Interlocked.Increment(ref layer);
            var km = 100 + n % 4000 / 10.0;
            using var request = n % 4 == 0
                ? new HttpRequestMessage(HttpMethod.Post, "/api/v1/eclipses/2029-12-20/local")
                { Content = new StringContent(batch.Replace("]}", $"],\"shadow\":\"layer\",\"layerKm\":{D(km, 1)}}}", StringComparison.Ordinal), Encoding.UTF8, "application/json") }
                : new HttpRequestMessage(HttpMethod.Get, "/api/v1/sites/upcoming?lat=89.9&lon=0&from=-1999-01-01&years=1000&phase=total&night=true&count=50"
                    + $"&shadow=layer&layerKm={D(km, 1)}&horizon={horizon}");
            try
            {
                using var response = await abuser.SendAsync(request, stop.Token);
                statuses.AddOrUpdate((int)response.StatusCode, 1, (_, seen) => seen + 1);
            }
            catch (OperationCanceledException)
            {
                break;
            }
            var wait = TimeSpan.FromMilliseconds(200) - Stopwatch.GetElapsedTime(started);
            if (wait > TimeSpan.Zero) await Task.Delay(wait, CancellationToken.None);
        }
    }).ToArray();
    // The other client stays inside its own limit too: 4 connections, one request each every 100 ms (40 per second).
    var result = await Measure(victim, _ => new HttpRequestMessage(HttpMethod.Get, cheap), 4, seconds, seed: 7, pace: TimeSpan.FromMilliseconds(100));
    await stop.CancelAsync();
    await Task.WhenAll(abusers);
    Console.WriteLine($"abusive client (8 connections, ≤ 40 requests/s: 1000-year hopeless searches with a 360-point horizon on new layer heights, and 50-site batches): answers {string.Join(", ", statuses.OrderBy(s => s.Key).Select(s => $"{s.Key}×{s.Value}"))}");
    Console.WriteLine($"meanwhile, a cached request from another client (40 per second): {result}");
    return 0;
}

static async Task<string> Measure(HttpClient client, Func<Random, HttpRequestMessage> make, int concurrency, int seconds, int seed, TimeSpan? pace = null)
{
    var latencies = new List<double>[concurrency];
    var errors = 0;
    var issued = 0;
    var stop = Stopwatch.StartNew();
    var workers = Enumerable.Range(0, concurrency).Select(async w =>
    {
        var random = new Random(seed + w);
        var mine = latencies[w] = new List<double>();
        while (stop.Elapsed.TotalSeconds < seconds)
        {
            if (Interlocked.Increment(ref issued) > MaxRequests) break;
            using var request = make(random);
            var t = Stopwatch.GetTimestamp();
            try
            {
                using var response = await client.SendAsync(request);
                await response.Content.CopyToAsync(Stream.Null);
                if ((int)response.StatusCode >= 400) Interlocked.Increment(ref errors);
            }
            catch (HttpRequestException)
            {
                Interlocked.Increment(ref errors);
            }
            var took = Stopwatch.GetElapsedTime(t);
            mine.Add(took.TotalMilliseconds);
            if (pace is { } p && p > took) await Task.Delay(p - took);
        }
    }).ToArray();
    await Task.WhenAll(workers);
    var elapsed = stop.Elapsed.TotalSeconds;
    var all = latencies.SelectMany(l => l).OrderBy(x => x).ToArray();
    double P(double q) => all[Math.Min(all.Length - 1, (int)Math.Floor(q * all.Length))];
    return $"{all.Length} requests in {elapsed:F1} s = {all.Length / elapsed:F0} req/s; latency p50 {P(0.50):F1} ms, p95 {P(0.95):F1} ms, p99 {P(0.99):F1} ms, max {all[^1]:F1} ms; errors {errors}";
}
