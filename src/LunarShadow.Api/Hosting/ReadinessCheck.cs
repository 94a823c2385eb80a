using LunarShadow.Astronomy.Embedded;
using LunarShadow.Astronomy.Ephemeris;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace LunarShadow.Api.Hosting;

/// <summary>Ready once the embedded ephemeris tables load and evaluate and the page's files are there to serve.</summary>
internal sealed class ReadinessCheck(IWebHostEnvironment environment) : IHealthCheck
{
    /// <summary>The files the page cannot work without, relative to wwwroot.</summary>
    public static readonly string[] PageFiles = ["index.html", "embed.html", "styles.css", "js/app.js", "js/api.js", "js/embed.js"];

    public Task<HealthCheckResult> CheckHealthAsync(HealthCheckContext context, CancellationToken cancellationToken = default)
    {
        var missing = PageFiles.Where(f => !environment.WebRootFileProvider.GetFileInfo(f).Exists).ToList();
        if (missing.Count > 0)
            return Task.FromResult(HealthCheckResult.Unhealthy("the page's files are missing from wwwroot: " + string.Join(", ", missing)));
        try
        {
            var moon = LunarTheory.Truncated.GeocentricState(Astronomy.Time.TtInstant.FromJulianDate(2451545.0)).PositionKm.Length;
            return Task.FromResult(moon is > 350_000 and < 410_000
                ? HealthCheckResult.Healthy($"ephemeris data {EmbeddedDataSet.VersionTag} loaded")
                : HealthCheckResult.Unhealthy("the lunar series gave an impossible distance"));
        }
        catch (InvalidOperationException e)
        {
            return Task.FromResult(HealthCheckResult.Unhealthy("embedded data missing", e));
        }
    }
}
