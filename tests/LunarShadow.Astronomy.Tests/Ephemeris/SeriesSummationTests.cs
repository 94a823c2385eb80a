using System.Runtime.Intrinsics;
using LunarShadow.Astronomy.Embedded;
using LunarShadow.Astronomy.Ephemeris;

namespace LunarShadow.Astronomy.Tests.Ephemeris;

// The series are summed eight, four or one term at a time, whichever the hardware runs natively. The widths only
// reorder the same additions and reduce the phases (some 10⁶ rad at the ends of the span) by another route, so they
// must agree to rounding of those phases (common practice for vectorised sums): here within 10 µas for both bodies, some four orders below the 0.1″ the truncated series keeps to. The reference is the
// one-term-at-a-time sum with Math.IEEERemainder and Math.SinCos.
public class SeriesSummationTests
{
    public static TheoryData<string, string, bool, double, double, double> Series => new()
    {
        // Moon (ELP/MPP02): arcseconds for L and B, km for R (10 µas at the Moon is 0.02 m); t in Julian centuries,
        // −40 to +10 over the supported years.
        // Rates (per century) within 0.05 units: 0.05 km per century is 16 nm/s.
        { EmbeddedDataSet.LunarTruncated, "L", true, 40, 1e-5, 0.05 },
        { EmbeddedDataSet.LunarTruncated, "B", true, 40, 1e-5, 0.05 },
        { EmbeddedDataSet.LunarTruncated, "R", true, 40, 2e-5, 0.05 },
        // Earth (VSOP87B): radians for L and B (5·10⁻¹¹ rad is 10 µas), au for R; t in Julian millennia, −4 to +1.
        // Rates (per millennium) within 10⁻⁸: 2 µas a year.
        { EmbeddedDataSet.EarthVsop87B, "L", false, 4, 5e-11, 1e-8 },
        { EmbeddedDataSet.EarthVsop87B, "B", false, 4, 5e-11, 1e-8 },
        { EmbeddedDataSet.EarthVsop87B, "R", false, 4, 5e-11, 1e-8 },
    };

    [Theory]
    [MemberData(nameof(Series))]
    public void Every_vector_width_the_hardware_runs_gives_the_one_term_at_a_time_sum(string resource, string coordinate,
        bool sineTerms, double unitsBeforeJ2000, double tolerance, double rateTolerance)
    {
        var shape = sineTerms ? PolynomialPhaseSeries.TermShape.Sine : PolynomialPhaseSeries.TermShape.Cosine;
        var series = PolynomialPhaseSeries.FromBlocks(BlockFile.FromResource(resource), coordinate, shape);
        var widths = new List<PolynomialPhaseSeries.SumWidth> { PolynomialPhaseSeries.SumWidth.Widest };
        if (Vector256.IsHardwareAccelerated) widths.Add(PolynomialPhaseSeries.SumWidth.Vector256);
        if (Vector512.IsHardwareAccelerated) widths.Add(PolynomialPhaseSeries.SumWidth.Vector512);
        // Across the supported years, in about 70 steps.
        for (var t = -unitsBeforeJ2000; t <= unitsBeforeJ2000 / 4; t += unitsBeforeJ2000 / 55.3)
        {
            var (value, rate) = series.Evaluate(t, PolynomialPhaseSeries.SumWidth.Scalar);
            foreach (var width in widths)
            {
                var (v, r) = series.Evaluate(t, width);
                Assert.True(Math.Abs(v - value) <= tolerance, $"{coordinate} at t = {t}, {width}: {v} against {value}");
                Assert.True(Math.Abs(r - rate) <= rateTolerance, $"{coordinate} rate at t = {t}, {width}: {r} against {rate}");
            }
        }
    }
}
