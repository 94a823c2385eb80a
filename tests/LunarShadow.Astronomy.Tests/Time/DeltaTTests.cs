using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Time;

public class DeltaTTests
{
    private static readonly EspenakMeeus2006DeltaT Polynomials = new();
    private static readonly BestDeltaT Best = new();

    // Espenak & Meeus (2009), Five Millennium Canon of Lunar Eclipses (NASA/TP-2009-214172): the ΔT printed with each
    // eclipse (rounded to the second), at the year of greatest eclipse.
    [Theory]
    [InlineData(-1999, 6, 26, 46437)]
    [InlineData(-1997, 5, 6, 46392)]
    [InlineData(1917, 12, 28, 20)]
    [InlineData(1956, 5, 24, 32)]
    [InlineData(1969, 8, 27, 40)]
    [InlineData(2000, 1, 21, 64)]
    [InlineData(2011, 6, 15, 67)]
    [InlineData(2015, 4, 4, 69)]
    [InlineData(2022, 11, 8, 73)]
    [InlineData(2025, 3, 14, 75)]
    [InlineData(2027, 7, 18, 76)]
    [InlineData(2070, 4, 25, 135)]
    [InlineData(2100, 8, 19, 204)]
    public void Polynomial_model_reproduces_the_canon_delta_t(int year, int month, int day, double canonSeconds)
    {
        var y = JulianDate.FromCalendar(year, month, day).DecimalYear;
        Assert.Equal(canonSeconds, Polynomials.At(y).Seconds, 0.6);
    }

    // USNO/IERS measured ΔT (Astronomical Almanac table K9 / USNO deltat.data), from memory, at the start of each year.
    [Theory]
    [InlineData(1980, 50.54)]
    [InlineData(1990, 56.86)]
    [InlineData(2000, 63.83)]
    [InlineData(2010, 66.07)]
    [InlineData(2017, 68.59)]
    [InlineData(2020, 69.36)]
    public void Best_model_uses_measured_values_in_the_atomic_era(int year, double expected)
    {
        var y = JulianDate.FromCalendar(year, 1, 1.0).DecimalYear;
        Assert.Equal(expected, Best.At(y).Seconds, 0.05);
    }

    // Morrison et al. (2021), Table S15.2020: the spline's node values a0 at its segment starts.
    [Theory]
    [InlineData(-720, 20371.848)]
    [InlineData(400, 6535.116)]
    [InlineData(1000, 1650.393)]
    [InlineData(1600, 109.127)]
    [InlineData(1800, 18.367)]
    [InlineData(1900, -1.977)]
    public void Best_model_follows_the_published_spline_before_1955(double year, double expected)
    {
        Assert.Equal(expected, Best.At(year).Seconds, 0.001);
    }

    [Fact]
    public void Best_model_has_no_jump_anywhere_in_the_supported_span()
    {
        // Common practice: ΔT changes by at most a few seconds per year even in antiquity (the long-term parabola's slope
        // at −2000 is about 24 s/yr), so a step of 0.01 yr must change it by well under a second.
        var previous = Best.At(SupportedRange.FirstYear).Seconds;
        for (var y = SupportedRange.FirstYear + 0.01; y <= SupportedRange.LastYear + 1; y += 0.01)
        {
            var current = Best.At(y).Seconds;
            Assert.True(Math.Abs(current - previous) < 0.5, $"ΔT jumps by {current - previous:F3} s at {y:F2}");
            previous = current;
        }
    }

    [Fact]
    public void Best_model_joins_the_measurements_at_both_ends_of_the_measured_series()
    {
        var last = Best.LastMeasuredYear;
        Assert.Equal(Best.At(last - 1e-6).Seconds, Best.At(last + 1e-6).Seconds, 0.001);
        Assert.Equal(Best.At(1955.0 - 1e-6).Seconds, Best.At(1955.0 + 1e-6).Seconds, 0.01);
    }

    // HM Nautical Almanac Office uncertainty table for the SMH 2016/2021 solution: ±1080 s at −2000, ±15 s at 1000,
    // ±100 s at 2500; the Morrison & Stephenson (2004) rule 0.8·t² s for the polynomials.
    [Fact]
    public void Every_value_carries_its_documented_uncertainty()
    {
        Assert.Equal(1080, Best.At(-2000).UncertaintySeconds, 1);
        Assert.Equal(15, Best.At(1000).UncertaintySeconds, 0.01);
        Assert.Equal(0.05, Best.At(2000).UncertaintySeconds, 0.001);
        Assert.Equal(100, Best.At(2500).UncertaintySeconds, 0.01);
        Assert.True(Best.At(3000).UncertaintySeconds > 100);
        Assert.Equal(0.8 * 1.8 * 1.8, Polynomials.At(2000).UncertaintySeconds, 1e-9);
    }

    [Fact]
    public void A_fixed_delta_t_is_returned_unchanged()
    {
        Assert.Equal(69.0, new FixedDeltaT(69.0).At(2015.3).Seconds);
    }

    [Theory]
    [InlineData("best", "best")]
    [InlineData("ESPENAK-MEEUS-2006", "espenak-meeus-2006")]
    public void Models_are_found_by_name(string name, string expected)
    {
        Assert.True(DeltaTModelCatalog.TryGet(name, out var model));
        Assert.Equal(expected, model.Name);
    }

    [Fact]
    public void Unknown_model_names_are_refused()
    {
        Assert.False(DeltaTModelCatalog.TryGet("guess", out _));
    }
}
