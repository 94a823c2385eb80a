using System.Text.Json;
using LunarShadow.Api.Eclipses;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Embedded;
using LunarShadow.Astronomy.Ephemeris;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;
using Microsoft.Extensions.Diagnostics.HealthChecks;
using Microsoft.Extensions.Options;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Ready once the embedded tables load and evaluate, the computing path has run once, one request has gone through the
/// whole pipeline (<see cref="PipelineWarmUp"/>), and the page's files are there to serve.
/// </summary>
internal sealed class ReadinessCheck(IWebHostEnvironment environment, IOptions<Microsoft.AspNetCore.Http.Json.JsonOptions> json, PipelineWarmUp pipeline) : IHealthCheck
{
    /// <summary>The files the page cannot work without, relative to wwwroot.</summary>
    public static readonly string[] PageFiles = ["index.html", "embed.html", "styles.css", "js/app.js", "js/api.js", "js/embed.js"];

    // Run once per process, whoever asks first; the others wait for it.
    private static Lazy<bool>? _warmedUp;

    public async Task<HealthCheckResult> CheckHealthAsync(HealthCheckContext context, CancellationToken cancellationToken = default)
    {
        var missing = PageFiles.Where(f => !environment.WebRootFileProvider.GetFileInfo(f).Exists).ToList();
        if (missing.Count > 0)
            return HealthCheckResult.Unhealthy("the page's files are missing from wwwroot: " + string.Join(", ", missing));
        try
        {
            var moon = LunarTheory.Truncated.GeocentricState(TtInstant.FromJulianDate(2451545.0)).PositionKm.Length;
            if (moon is not (> 350_000 and < 410_000)) return HealthCheckResult.Unhealthy("the lunar series gave an impossible distance");
            var options = json.Value.SerializerOptions;
            if (!LazyInitializer.EnsureInitialized(ref _warmedUp, () => new Lazy<bool>(() => WarmUp(options))).Value)
                return HealthCheckResult.Unhealthy("the eclipse of 2000 January 21 was not found");
        }
        catch (InvalidOperationException e)
        {
            return HealthCheckResult.Unhealthy("embedded data missing", e);
        }
        await pipeline.RunOnceAsync().WaitAsync(cancellationToken);
        return HealthCheckResult.Healthy($"ephemeris data {EmbeddedDataSet.VersionTag} loaded");
    }

    // Loads the tables every computation reads (screening and full series, ΔT) and takes one eclipse through search,
    // mapping and JSON on a private finder that is then dropped: the first request finds the code compiled and the tables
    // in memory, but nothing of any answer cached (the service's own finders stay empty).
    private static bool WarmUp(JsonSerializerOptions options)
    {
        var j2000 = TtInstant.FromJulianDate(2451545.0);
        _ = ApparentPlaceCalculator.Default.ApparentVectorsJ2000Ecliptic(j2000);
        _ = ApparentPlaceCalculator.Screening.ApparentVectorsJ2000Ecliptic(j2000);
        var time = TimeScaleConverter.Default;
        // Five Millennium Canon of Lunar Eclipses (Espenak & Meeus 2009): a total eclipse on 2000 January 21.
        var eclipse = EclipseFinder.OnEmbeddedEphemerides(ShadowModel.Danjon, maxParallelism: 1).OnUtcDate(new CalendarDate(2000, 1, 21, true), time);
        if (eclipse is null) return false;
        _ = JsonSerializer.Serialize(EclipseMapping.ToResponse(eclipse, time), options);
        return true;
    }
}
