using LunarShadow.Api.Common;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Observations;

/// <summary>The observers' log read through <see cref="IObservationReader"/>, fitted and summarised for the endpoints.</summary>
internal sealed class ObservedNightFromLog(IObservationReader reader) : IObservedNight
{
    /// <inheritdoc/>
    public async Task<MeasuredShadow> ShadowAsync(LunarEclipse eclipse, CalendarDate date, TimeScaleConverter time, CancellationToken cancellationToken)
    {
        var stored = await reader.CraterTimingsAsync(date, cancellationToken);
        return new MeasuredShadow(stored.Count, UmbralEnlargementFit.Fit(eclipse, Timings(stored, time).Select(t => t.Timing).ToList()));
    }

    /// <inheritdoc/>
    public async Task<IReadOnlyList<double>> DanjonValuesAsync(CalendarDate date, CancellationToken cancellationToken) =>
        (await reader.DanjonEstimatesAsync(date, cancellationToken)).Select(d => d.Value).ToList();

    /// <summary>The stored timings of known features as the fit takes them, each with the stored record it came from.</summary>
    public static IReadOnlyList<(CraterTimingObservation Stored, CraterTiming Timing)> Timings(IReadOnlyList<CraterTimingObservation> stored, TimeScaleConverter time) =>
        stored.Select(o => (o, Feature: LunarFeatureCatalog.Find(o.Feature)))
            .Where(x => x.Feature is not null)
            .Select(x => (x.o, new CraterTiming(x.Feature!, x.o.Crossing == CrossingDirection.Immersion,
                time.ToTerrestrialTime(NodaTime.Instant.FromDateTimeOffset(x.o.Utc)), x.o.UncertaintySeconds)))
            .ToList();
}
