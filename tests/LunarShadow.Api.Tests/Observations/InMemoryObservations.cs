using LunarShadow.Api.Observations;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Tests.Observations;

/// <summary>An observers' log in memory, standing in for the storage backends behind the read seam.</summary>
public sealed class InMemoryObservations : IObservationReader
{
    private readonly Lock _gate = new();
    private readonly List<CraterTimingObservation> _timings = [];
    private readonly List<DanjonObservation> _danjon = [];

    public void Add(CraterTimingObservation timing)
    {
        lock (_gate) _timings.Add(timing with { Id = _timings.Count + 1 });
    }

    public void Add(DanjonObservation estimate)
    {
        lock (_gate) _danjon.Add(estimate with { Id = _danjon.Count + 1 });
    }

    public void Clear()
    {
        lock (_gate)
        {
            _timings.Clear();
            _danjon.Clear();
        }
    }

    public Task<IReadOnlyList<CraterTimingObservation>> CraterTimingsAsync(CalendarDate eclipse, CancellationToken cancellationToken)
    {
        lock (_gate) return Task.FromResult<IReadOnlyList<CraterTimingObservation>>(_timings.Where(t => t.Eclipse.ToIsoDateString() == eclipse.ToIsoDateString()).ToList());
    }

    public Task<IReadOnlyList<DanjonObservation>> DanjonEstimatesAsync(CalendarDate eclipse, CancellationToken cancellationToken)
    {
        lock (_gate) return Task.FromResult<IReadOnlyList<DanjonObservation>>(_danjon.Where(d => d.Eclipse.ToIsoDateString() == eclipse.ToIsoDateString()).ToList());
    }
}
