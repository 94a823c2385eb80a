using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Observations;

/// <summary>
/// The reader used when no observation store is registered: every eclipse has no timings and no Danjon estimates yet.
/// Registered with TryAdd, so a storage backend's reader replaces it.
/// </summary>
internal sealed class NoObservations : IObservationReader
{
    /// <inheritdoc/>
    public Task<IReadOnlyList<CraterTimingObservation>> CraterTimingsAsync(CalendarDate eclipse, CancellationToken cancellationToken) =>
        Task.FromResult<IReadOnlyList<CraterTimingObservation>>([]);

    /// <inheritdoc/>
    public Task<IReadOnlyList<DanjonObservation>> DanjonEstimatesAsync(CalendarDate eclipse, CancellationToken cancellationToken) =>
        Task.FromResult<IReadOnlyList<DanjonObservation>>([]);
}
