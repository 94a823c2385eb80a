using System.Diagnostics;
using System.Net;
using System.Net.Sockets;

namespace LunarShadow.Browser.Tests;

/// <summary>The built service, started as its own process on a free loopback port (a real Kestrel), for the browser.</summary>
public sealed class ServiceOnKestrel : IAsyncLifetime
{
    private Process? _process;

    public Uri BaseAddress { get; private set; } = new("http://127.0.0.1");

    public async Task InitializeAsync()
    {
        var repo = new DirectoryInfo(AppContext.BaseDirectory);
        while (repo is not null && !File.Exists(Path.Combine(repo.FullName, "LunarShadow.sln"))) repo = repo.Parent;
        if (repo is null) throw new InvalidOperationException("LunarShadow.sln not found above the test folder.");
        var configuration = AppContext.BaseDirectory.Contains($"{Path.DirectorySeparatorChar}Release{Path.DirectorySeparatorChar}", StringComparison.Ordinal) ? "Release" : "Debug";
        var api = Path.Combine(repo.FullName, "src", "LunarShadow.Api");
        var dll = Path.Combine(api, "bin", configuration, "net10.0", "LunarShadow.Api.dll");
        var port = FreePort();
        BaseAddress = new Uri($"http://127.0.0.1:{port}");
        var start = new ProcessStartInfo("dotnet", [dll, "--urls", BaseAddress.ToString().TrimEnd('/'), "--contentRoot", api])
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.Environment["RateLimiting__PermitsPerSecond"] = "10000";
        start.Environment["RateLimiting__Burst"] = "10000";
        // The browser tests check the page, not the latency of a busy test machine: no 503 from the request timeout.
        start.Environment["RequestTimeoutSeconds"] = "300";
        _process = Process.Start(start) ?? throw new InvalidOperationException("Could not start the service.");
        _process.OutputDataReceived += (_, _) => { };
        _process.ErrorDataReceived += (_, _) => { };
        _process.BeginOutputReadLine();
        _process.BeginErrorReadLine();

        using var client = new HttpClient { BaseAddress = BaseAddress };
        var deadline = DateTime.UtcNow.AddSeconds(60);
        while (DateTime.UtcNow < deadline)
        {
            try
            {
                if ((await client.GetAsync("/health/ready")).StatusCode == HttpStatusCode.OK)
                {
                    // Warm the engine once (JIT and the eclipse caches) so that the first page does not pay for it.
                    await client.GetAsync($"/api/v1/eclipses?from={DateTime.UtcNow:yyyy-MM-dd}&to={DateTime.UtcNow.AddYears(15):yyyy-MM-dd}");
                    await client.GetAsync("/api/v1/eclipses/2029-12-20/local?lat=47.31&lon=11.42&tz=Europe/Vienna&track=10");
                    return;
                }
            }
            catch (HttpRequestException)
            {
            }
            await Task.Delay(250);
        }
        throw new TimeoutException($"The service did not become ready at {BaseAddress} within 60 s.");
    }

    public Task DisposeAsync()
    {
        if (_process is { HasExited: false }) _process.Kill(entireProcessTree: true);
        _process?.Dispose();
        return Task.CompletedTask;
    }

    private static int FreePort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }
}
