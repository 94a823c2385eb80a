using System.Diagnostics;
using System.Net;
using System.Net.Sockets;
using System.Text.RegularExpressions;

namespace LunarShadow.Api.Tests.Hosting;

/// <summary>
/// The published service, started with exactly the environment deploy/Containerfile gives it (no container engine is
/// needed), answers on the container's port — liveness, readiness, the page and the API — and the Kubernetes manifest
/// probes what the image serves.
/// </summary>
[Collection(LunarShadow.Api.Tests.Support.RunsAlone.Name)]
public partial class ContainerTests
{
#if DEBUG
    private const string Configuration = "Debug";
#else
    private const string Configuration = "Release";
#endif

    private static readonly string Root = FindRoot();

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "LunarShadow.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("LunarShadow.sln not found above the test's folder.");
    }

    /// <summary>The ENV and EXPOSE instructions of the Containerfile's final stage.</summary>
    private static (Dictionary<string, string> Environment, int Port) ReadContainerfile()
    {
        var text = File.ReadAllText(Path.Combine(Root, "deploy", "Containerfile")).Replace("\\\n", " ", StringComparison.Ordinal);
        var finalStage = text[text.LastIndexOf("\nFROM ", StringComparison.Ordinal)..];
        var environment = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var line in finalStage.Split('\n').Where(l => l.StartsWith("ENV ", StringComparison.Ordinal)))
            foreach (Match m in Assignment().Matches(line[4..]))
                environment[m.Groups["k"].Value] = m.Groups["v"].Value;
        var port = int.Parse(Expose().Match(finalStage).Groups["p"].Value, System.Globalization.CultureInfo.InvariantCulture);
        return (environment, port);
    }

    private static bool PortIsFree(int port)
    {
        try
        {
            var listener = new TcpListener(IPAddress.Any, port);
            listener.Start();
            listener.Stop();
            return true;
        }
        catch (SocketException)
        {
            return false;
        }
    }

    private static async Task<(int ExitCode, string Output)> Run(string file, IEnumerable<string> arguments, string workingDirectory, TimeSpan limit)
    {
        var start = new ProcessStartInfo(file, arguments) { WorkingDirectory = workingDirectory, RedirectStandardOutput = true, RedirectStandardError = true };
        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        using var cancel = new CancellationTokenSource(limit);
        await process.WaitForExitAsync(cancel.Token);
        return (process.ExitCode, await output + await error);
    }

    [Fact]
    public async Task The_published_service_with_the_Containerfile_environment_answers_on_the_container_port()
    {
        var (environment, port) = ReadContainerfile();
        Assert.Equal($"http://+:{port}", environment["ASPNETCORE_URLS"]);
        var app = Directory.CreateTempSubdirectory("lunarshadow-published-");
        Process? service = null;
        try
        {
            var publish = await Run("dotnet", ["publish", Path.Combine(Root, "src", "LunarShadow.Api"), "-c", Configuration, "--no-build", "-o", app.FullName, "--nologo"], Root, TimeSpan.FromMinutes(3));
            Assert.True(publish.ExitCode == 0, publish.Output);
            Assert.True(File.Exists(Path.Combine(app.FullName, "wwwroot", "index.html")), "the page's files are published");

            // Exactly the Containerfile's ENV (plus what the runtime base image sets); nothing inherited from this shell.
            var start = new ProcessStartInfo("dotnet", [Path.Combine(app.FullName, "LunarShadow.Api.dll")])
            {
                WorkingDirectory = app.FullName, RedirectStandardOutput = true, RedirectStandardError = true,
            };
            foreach (var key in start.Environment.Keys.Where(k => k.StartsWith("ASPNETCORE_", StringComparison.Ordinal) || k.StartsWith("DOTNET_", StringComparison.Ordinal) && k != "DOTNET_ROOT").ToList())
                start.Environment.Remove(key);
            start.Environment["DOTNET_RUNNING_IN_CONTAINER"] = "true"; // set by the aspnet base image
            foreach (var (key, value) in environment) start.Environment[key] = value;
            // A shared machine may already use the port; then only the port moves, and the rest stays as written.
            var listenPort = PortIsFree(port) ? port : FreePort();
            if (listenPort != port) start.Environment["ASPNETCORE_URLS"] = $"http://+:{listenPort}";
            service = Process.Start(start)!;
            var log = new System.Text.StringBuilder();
            service.OutputDataReceived += (_, e) => { lock (log) log.AppendLine(e.Data); };
            service.ErrorDataReceived += (_, e) => { lock (log) log.AppendLine(e.Data); };
            service.BeginOutputReadLine();
            service.BeginErrorReadLine();

            using var client = new HttpClient { BaseAddress = new Uri($"http://127.0.0.1:{listenPort}"), Timeout = TimeSpan.FromSeconds(60) }; // a cold first answer on a busy machine
            var live = await WaitForLive(client, service, TimeSpan.FromSeconds(90));
            Assert.True(live, "no answer on the container port: " + log);
            Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/health/ready")).StatusCode);
            // Readiness sent one request through the whole pipeline on the container's own port first.
            lock (log) Assert.Contains($"GET {LunarShadow.Api.Hosting.PipelineWarmUp.PathAndQuery} answered 200", log.ToString(), StringComparison.Ordinal);
            Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/")).StatusCode);
            Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/api/v1/eclipses/2025-03-14")).StatusCode);
            // The image's HEALTHCHECK command, as the container runtime runs it: healthy when one of 3 tries (--retries=3)
            // exits 0. (Each try starts a new process with 8 s for the request, which a heavily loaded machine can miss.)
            var probes = new List<int>();
            for (var i = 0; i < 3 && !probes.Contains(0); i++)
                probes.Add((await Run("dotnet", [Path.Combine(app.FullName, "LunarShadow.Api.dll"), "--health-probe", $"http://127.0.0.1:{listenPort}/health/ready"], app.FullName, TimeSpan.FromMinutes(1))).ExitCode);
            Assert.Contains(0, probes);
        }
        finally
        {
            if (service is { HasExited: false }) service.Kill(entireProcessTree: true);
            service?.Dispose();
            app.Delete(recursive: true);
        }
    }

    private static int FreePort()
    {
        var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        var port = ((IPEndPoint)listener.LocalEndpoint).Port;
        listener.Stop();
        return port;
    }

    private static async Task<bool> WaitForLive(HttpClient client, Process service, TimeSpan limit)
    {
        var until = DateTime.UtcNow + limit;
        while (DateTime.UtcNow < until && !service.HasExited)
        {
            try
            {
                if ((await client.GetAsync("/health/live")).StatusCode == HttpStatusCode.OK) return true;
            }
            catch (HttpRequestException)
            {
            }
            catch (TaskCanceledException)
            {
            }
            await Task.Delay(250);
        }
        return false;
    }

    [Fact]
    public void The_Kubernetes_manifest_probes_the_image_port_with_a_pinned_tag_a_disruption_budget_and_no_token()
    {
        var (_, port) = ReadContainerfile();
        var manifest = File.ReadAllText(Path.Combine(Root, "deploy", "kubernetes.yaml"));
        Assert.Contains($"containerPort: {port}", manifest, StringComparison.Ordinal);
        Assert.Contains("path: /health/ready", manifest, StringComparison.Ordinal);
        Assert.Contains("path: /health/live", manifest, StringComparison.Ordinal);
        Assert.Matches(@"image: lunarshadow:\d+\.\d+\.\d+", manifest);
        Assert.DoesNotContain(":latest", manifest, StringComparison.Ordinal);
        Assert.Contains("kind: PodDisruptionBudget", manifest, StringComparison.Ordinal);
        Assert.Contains("automountServiceAccountToken: false", manifest, StringComparison.Ordinal);
        Assert.True(File.Exists(Path.Combine(Root, ".dockerignore")));
        var ignored = File.ReadAllLines(Path.Combine(Root, ".dockerignore"));
        Assert.Contains("**/bin/", ignored);
        Assert.Contains("**/obj/", ignored);
        Assert.Contains(".git/", ignored);
        // appsettings.json must not pin the address: it would override ASPNETCORE_URLS inside the container.
        Assert.DoesNotContain("\"Urls\"", File.ReadAllText(Path.Combine(Root, "src", "LunarShadow.Api", "appsettings.json")), StringComparison.OrdinalIgnoreCase);
    }

    [GeneratedRegex(@"(?<k>[A-Za-z_][A-Za-z0-9_]*)=(?<v>\S+)")]
    private static partial Regex Assignment();

    [GeneratedRegex(@"\nEXPOSE (?<p>[0-9]+)")]
    private static partial Regex Expose();
}
