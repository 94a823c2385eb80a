using LunarShadow.Astronomy.Embedded;
using LunarShadow.Astronomy.Ephemeris;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace LunarShadow.Api.Hosting;

/// <summary>Ready once the embedded ephemeris tables load and evaluate.</summary>
internal sealed class ReadinessCheck : IHealthCheck
{
    public Task<HealthCheckResult> CheckHealthAsync(HealthCheckContext context, CancellationToken cancellationToken = default)
    {
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
