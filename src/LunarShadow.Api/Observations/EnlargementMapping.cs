using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Observations;

/// <summary>The fit as the wire shows it.</summary>
internal static class EnlargementMapping
{
    public static EnlargementResponse ToResponse(LunarEclipse eclipse, CalendarDate date, int stored, IReadOnlyList<(CraterTimingObservation Stored, CraterTiming Timing)> timings,
        UmbralEnlargement? fit, TimeScaleConverter time)
    {
        var residuals = timings.Select((t, i) =>
        {
            var r = fit?.Residuals[i];
            return new EnlargementResidualResponse(
                t.Timing.Feature.Name,
                WireNames.Of(t.Stored.Crossing),
                TimeFormats.Utc(NodaTime.Instant.FromDateTimeOffset(t.Stored.Utc)),
                r?.Predicted is { } p ? TimeFormats.Utc(time.ToUtc(p)) : null,
                r?.ResidualSeconds is { } s ? TimeFormats.Round(s, 1) : null,
                r?.Rejected ?? false,
                r?.MeasuredPercent is { } m ? TimeFormats.Round(m, 4) : null);
        }).ToList();
        var echo = fit is null ? null : MeasuredShadowEcho.Of(stored, fit);
        var deltaT = time.DeltaTAt(eclipse.GreatestEclipse);
        return new EnlargementResponse(
            date.ToIsoDateString(),
            fit is null ? "too-few-timings" : "measured",
            UmbralEnlargementFit.MinimumTimings,
            stored,
            fit?.Rejected ?? 0,
            echo?.EnlargementPercent,
            echo?.EnlargementPercentSigma,
            echo?.EquivalentLayerKm,
            echo?.EquivalentLayerKmSigma,
            time.DeltaTModel.Name,
            TimeFormats.Round(deltaT.Seconds, 1),
            EnlargementEndpoints.Method,
            residuals);
    }
}
