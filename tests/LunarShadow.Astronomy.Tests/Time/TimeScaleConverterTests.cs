using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Tests.Time;

public class TimeScaleConverterTests
{
    private static readonly TimeScaleConverter Converter = TimeScaleConverter.Default;

    // IERS Conventions (2010), ch. 10: TT = TAI + 32.184 s; Bulletin C: TAI − UTC = 37 s since 2017.
    [Fact]
    public void TT_is_UTC_plus_69_184_seconds_since_2017()
    {
        var utc = Instant.FromUtc(2025, 3, 14, 6, 58, 0);
        var tt = Converter.ToTerrestrialTime(utc);
        Assert.Equal(69.184, (tt.JulianDate.Day - utc.ToJulianDate()) * 86400, 3);
    }

    // Common practice: J2000.0 = 2000 January 1, 11:58:55.816 UTC (TT − UTC = 32 + 32.184 s then).
    [Fact]
    public void J2000_falls_at_11_58_55_816_UTC()
    {
        var tt = Converter.ToTerrestrialTime(Instant.FromUtc(2000, 1, 1, 11, 58, 55).PlusNanoseconds(816_000_000));
        Assert.Equal(JulianDate.J2000.Day, tt.JulianDate.Day, 8);
    }

    [Fact]
    public void UTC_to_TT_and_back_round_trips_across_the_supported_span()
    {
        var random = new Random(20261201);
        for (var i = 0; i < 2000; i++)
        {
            var jd = SupportedRange.Start.Day + 1 + random.NextDouble() * (SupportedRange.End.Day - SupportedRange.Start.Day - 2);
            var utc = Instant.FromJulianDate(jd);
            var back = Converter.ToUtc(Converter.ToTerrestrialTime(utc));
            Assert.True(Math.Abs((back - utc).TotalMilliseconds) < 2, $"round trip off by {(back - utc).TotalMilliseconds} ms at JD {jd}");
        }
    }

    [Fact]
    public void Before_1972_UTC_is_taken_as_UT1()
    {
        var utc = Instant.FromUtc(1917, 12, 28, 9, 46, 12);
        var tt = Converter.ToTerrestrialTime(utc);
        var ut1 = Converter.ToUniversalTime(tt);
        Assert.Equal(utc.ToJulianDate(), ut1.JulianDate.Day, 8);
    }

    [Fact]
    public void A_fixed_delta_t_defines_UTC_as_TT_minus_delta_t()
    {
        // Meeus (1998), ch. 7: JD 2457116.5 is 2015 April 4, 0h; with ΔT fixed at 69 s (and no leap-second table in
        // play for a fixed ΔT), UTC is 69 s earlier: 2015 April 3, 23:58:51 (hand calculation).
        var converter = new TimeScaleConverter(new FixedDeltaT(69));
        var utc = converter.ToUtc(TtInstant.FromJulianDate(2457116.5));
        Assert.InRange(Math.Abs((utc - Instant.FromUtc(2015, 4, 3, 23, 58, 51)).TotalMilliseconds), 0, 1);
    }

    [Fact]
    public void Instants_outside_the_supported_years_are_refused_clearly()
    {
        var ex = Assert.Throws<OutsideSupportedRangeException>(() => Converter.ToTerrestrialTime(Instant.FromUtc(3001, 1, 2, 0, 0)));
        Assert.Contains("-1999", ex.Message, StringComparison.Ordinal);
    }
}
