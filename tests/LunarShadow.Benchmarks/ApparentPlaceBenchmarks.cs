using BenchmarkDotNet.Attributes;
using LunarShadow.Astronomy.Ephemeris;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Benchmarks;

/// <summary>Cost of one apparent place of the Moon and the Sun together (target ≤ 50 µs on one core).</summary>
[MemoryDiagnoser]
public class ApparentPlaceBenchmarks
{
    private readonly ApparentPlaceCalculator _calculator = ApparentPlaceCalculator.Default;
    private TtInstant _tt = TtInstant.FromJulianDate(2460748.79);
    private int _step;

    [Benchmark(Description = "Moon+Sun apparent place")]
    public GeocentricSky MoonAndSunApparentPlace()
    {
        // Step through a month so caches and branch predictors see varying arguments.
        _tt = TtInstant.FromJulianDate(2460748.79 + (_step++ % 4096) * 0.0073);
        return _calculator.Geocentric(_tt, Ut1Instant.FromJulianDate(_tt.JulianDate.Day - 69.2 / 86400));
    }

    [Benchmark(Description = "ELP/MPP02 truncated, position+velocity")]
    public EclipticState Moon() => LunarTheory.Truncated.GeocentricState(_tt);

    [Benchmark(Description = "VSOP87B Earth, position+velocity")]
    public EclipticState Sun() => EarthOrbitTheory.Vsop87B.GeocentricSun(_tt);
}
