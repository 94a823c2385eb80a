using System.Diagnostics;
using System.Net;
using System.Net.Sockets;
using System.Security.Cryptography;

namespace LunarShadow.Benchmarks;

/// <summary>
/// The cold catalogue, end to end: a fresh service process (Release build) once ready (/health/ready, as a deployment routes traffic), and the time of its first
/// GET /api/v1/eclipses?from=1900-01-01&amp;to=2100-12-31 (target ≤ 0.2 s), then the whole span −1999…+3000 as five
/// 1000-year requests on another fresh process (target ≤ 5 s). Side by side, in the same run and rounds, the lunar-eclipse
/// search of astronomy-engine 2.1.19 (npm; installed into a temporary folder, only as a reference) over 1900–2100 in a
/// fresh node process, and the ratio ours / theirs (target ≤ 0.3). Each figure is given for every round, with the best
/// and the median, since the machine is shared. The SHA-256 of our 1900–2100 body shows the answer did not change.
/// </summary>
internal static class ColdCatalogueTiming
{
    private const string Span = "from=1900-01-01&to=2100-12-31";
    private static readonly string[] WholeSpan =
    [
        "from=-1999-01-01&to=-1000-12-31", "from=-0999-01-01&to=0000-12-31", "from=0001-01-01&to=1000-12-31",
        "from=1001-01-01&to=2000-12-31", "from=2001-01-01&to=3000-12-31",
    ];

    public static void Run(int rounds, string? serviceDll = null)
    {
        var root = RepositoryRoot();
        var api = serviceDll is not null ? Path.GetFullPath(serviceDll) : Path.Combine(root, "src", "LunarShadow.Api", "bin", "Release", "net10.0", "LunarShadow.Api.dll");
        if (!File.Exists(api)) throw new FileNotFoundException("Build the service first: dotnet build -c Release src/LunarShadow.Api", api);
        var script = Path.Combine(root, "tests", "LunarShadow.Benchmarks", "ColdCatalogue", "astronomy-engine-search.mjs");
        var package = InstallAstronomyEngine();
        try
        {
            var ours = new List<double>();
            var theirs = new List<double>();
            var whole = new List<double>();
            for (var round = 1; round <= rounds; round++)
            {
                var (seconds, hash, bytes) = FirstRequest(api, [Span])[0];
                var (count, theirSeconds) = AstronomyEngine(script, package);
                var wholeSeconds = FirstRequest(api, WholeSpan).Sum(r => r.Seconds);
                ours.Add(seconds);
                theirs.Add(theirSeconds);
                whole.Add(wholeSeconds);
                Console.WriteLine($"round {round}: ours 1900-2100 {seconds * 1000:F0} ms ({bytes} bytes, sha256 {hash[..16]}); " +
                    $"astronomy-engine {count} eclipses {theirSeconds * 1000:F0} ms; ratio {seconds / theirSeconds:F2}; " +
                    $"ours -1999..+3000 {wholeSeconds:F2} s; load average {LoadAverage()}");
            }
            Console.WriteLine($"1900-2100 cold request: best {ours.Min() * 1000:F0} ms, median {Median(ours) * 1000:F0} ms (target <= 200 ms)");
            Console.WriteLine($"astronomy-engine 1900-2100: best {theirs.Min() * 1000:F0} ms, median {Median(theirs) * 1000:F0} ms");
            Console.WriteLine($"ratio ours/astronomy-engine: best-to-best {ours.Min() / theirs.Min():F2}, median of rounds " +
                $"{Median(ours.Zip(theirs, (a, b) => a / b).ToList()):F2} (target <= 0.3)");
            Console.WriteLine($"-1999..+3000 on a fresh process: best {whole.Min():F2} s, median {Median(whole):F2} s (target <= 5 s)");
        }
        finally
        {
            Directory.Delete(package, recursive: true);
        }
    }

    // Starts the service, waits until it is ready, then times each query in turn (wall clock, whole body read).
    private static List<(double Seconds, string Hash, int Bytes)> FirstRequest(string api, string[] queries)
    {
        var port = FreePort();
        // A build (not a publish) has no wwwroot beside it, and the service is ready only with the page's files: point it at
        // the project's own.
        var webRoot = Path.Combine(Path.GetDirectoryName(api)!, "wwwroot");
        if (!Directory.Exists(webRoot)) webRoot = Path.Combine(RepositoryRoot(), "src", "LunarShadow.Api", "wwwroot");
        var start = new ProcessStartInfo("dotnet", [api, "--urls", $"http://127.0.0.1:{port}", "--webroot", webRoot])
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            WorkingDirectory = Path.GetDirectoryName(api)!,
        };
        start.Environment["Serilog__MinimumLevel__Default"] = "Warning";
        start.Environment["RateLimiting__PermitsPerSecond"] = "1000000";
        start.Environment["RateLimiting__Burst"] = "1000000";
        start.Environment["RequestTimeoutSeconds"] = "600"; // a loaded machine must not turn a slow answer into a 503
        using var service = Process.Start(start)!;
        service.OutputDataReceived += (_, _) => { };
        service.ErrorDataReceived += (_, _) => { };
        service.BeginOutputReadLine();
        service.BeginErrorReadLine();
        try
        {
            using var http = new HttpClient { BaseAddress = new Uri($"http://127.0.0.1:{port}"), Timeout = TimeSpan.FromMinutes(2) };
            var deadline = Stopwatch.StartNew();
            while (true)
            {
                try
                {
                    if (http.GetAsync("/health/ready").Result.IsSuccessStatusCode) break;
                }
                catch (AggregateException) when (deadline.Elapsed < TimeSpan.FromSeconds(60))
                {
                }
                Thread.Sleep(50);
            }
            var results = new List<(double, string, int)>();
            foreach (var query in queries)
            {
                var watch = Stopwatch.StartNew();
                var body = http.GetByteArrayAsync($"/api/v1/eclipses?{query}").Result;
                results.Add((watch.Elapsed.TotalSeconds, Convert.ToHexStringLower(SHA256.HashData(body)), body.Length));
            }
            return results;
        }
        finally
        {
            service.Kill(entireProcessTree: true);
            service.WaitForExit();
        }
    }

    private static string InstallAstronomyEngine()
    {
        var folder = Directory.CreateTempSubdirectory("lunarshadow-astronomy-engine-").FullName;
        Run("npm", ["install", "--silent", "--no-audit", "--no-fund", "--prefix", folder, "astronomy-engine@2.1.19"]);
        return folder;
    }

    private static (int Count, double Seconds) AstronomyEngine(string script, string package)
    {
        var line = Run("node", [script, package, "1900", "2100"]);
        using var json = System.Text.Json.JsonDocument.Parse(line);
        return (json.RootElement.GetProperty("count").GetInt32(), json.RootElement.GetProperty("ms").GetDouble() / 1000);
    }

    private static string Run(string file, string[] arguments)
    {
        using var process = Process.Start(new ProcessStartInfo(file, arguments) { RedirectStandardOutput = true })!;
        var output = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        if (process.ExitCode != 0) throw new InvalidOperationException($"{file} exited with {process.ExitCode}");
        return output.Trim();
    }

    private static int FreePort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }

    private static string RepositoryRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "LunarShadow.sln"))) return dir.FullName;
        throw new InvalidOperationException("Run from inside the repository.");
    }

    private static string LoadAverage() =>
        File.Exists("/proc/loadavg") ? string.Join(' ', File.ReadAllText("/proc/loadavg").Split(' ').Take(3)) : "n/a";

    private static double Median(List<double> values)
    {
        var sorted = values.Order().ToList();
        return sorted.Count % 2 == 1 ? sorted[sorted.Count / 2] : (sorted[sorted.Count / 2 - 1] + sorted[sorted.Count / 2]) / 2;
    }
}
