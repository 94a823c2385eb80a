using BenchmarkDotNet.Attributes;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Benchmarks;

/// <summary>
/// Local circumstances with the eclipse already computed (target ≤ 100 µs per site), a 500-site batch (≤ 50 ms), and
/// "upcoming 10" for one site with the eclipses cached as on a running server (≤ 300 ms), and a full photo plan (≤ 5 ms).
/// </summary>
[MemoryDiagnoser]
public class SiteBenchmarks
{
    private LunarEclipse _eclipse = null!;
    private Site[] _sites = null!;
    private readonly TimeScaleConverter _time = TimeScaleConverter.Default;
    private readonly Site _newYork = Site.At(40.71, -74.0, 0, DateTimeZoneProviders.Tzdb["America/New_York"]);

    [GlobalSetup]
    public void Setup()
    {
        _eclipse = EclipseFinder.For(ShadowModel.Danjon).Between(TtInstant.FromJulianDate(2460748), TtInstant.FromJulianDate(2460750)).Single();
        _ = _eclipse.NightSky;
        var random = new Random(500);
        _sites = Enumerable.Range(0, 500).Select(_ => Site.At(random.NextDouble() * 140 - 70, random.NextDouble() * 360 - 180)).ToArray();
        _ = Upcoming10();
    }

    [Benchmark(Description = "Local circumstances, one site")]
    public LocalCircumstances OneSite() => LocalCircumstancesCalculator.Compute(_eclipse, _newYork, _time);

    [Benchmark(Description = "Local circumstances, 500 sites")]
    public int FiveHundredSites()
    {
        var visible = 0;
        foreach (var site in _sites)
            if (LocalCircumstancesCalculator.Compute(_eclipse, site, _time).AnyVisible) visible++;
        return visible;
    }

    [Benchmark(Description = "Photo plan, one site and camera")]
    public int PhotoPlan() => LunarShadow.Astronomy.Photography.PhotoPlanner.Plan(_eclipse, _newYork,
        new LunarShadow.Astronomy.Photography.Camera(36, 24, 4.3, 400, 1, LunarShadow.Astronomy.Photography.Mount.FixedTripod, 400, 8),
        new LunarShadow.Astronomy.Photography.PhotoSettings(), _time).Timeline.Count;

    [Benchmark(Description = "Upcoming 10 total eclipses, one site")]
    public int Upcoming10() => UpcomingEclipses.From(EclipseFinder.For(ShadowModel.Danjon), _newYork, _time,
        TtInstant.FromJulianDate(2460676.5), new UpcomingCriteria(EclipsePhase.Total)).Take(10).Count();
}
