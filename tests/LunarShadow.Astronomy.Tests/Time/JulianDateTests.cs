using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Tests.Time;

public class JulianDateTests
{
    // Meeus, Astronomical Algorithms 2nd ed. (1998), ch. 7: Examples 7.a and 7.b and Table 7.a (values from the book).
    [Theory]
    [InlineData(1957, 10, 4.81, 2436116.31)]
    [InlineData(333, 1, 27.5, 1842713.0)]
    [InlineData(2000, 1, 1.5, 2451545.0)]
    [InlineData(1999, 1, 1.0, 2451179.5)]
    [InlineData(1987, 1, 27.0, 2446822.5)]
    [InlineData(1987, 6, 19.5, 2446966.0)]
    [InlineData(1988, 1, 27.0, 2447187.5)]
    [InlineData(1988, 6, 19.5, 2447332.0)]
    [InlineData(1900, 1, 1.0, 2415020.5)]
    [InlineData(1600, 1, 1.0, 2305447.5)]
    [InlineData(1600, 12, 31.0, 2305812.5)]
    [InlineData(837, 4, 10.3, 2026871.8)]
    [InlineData(-123, 12, 31.0, 1676496.5)]
    [InlineData(-122, 1, 1.0, 1676497.5)]
    [InlineData(-1000, 7, 12.5, 1356001.0)]
    [InlineData(-1000, 2, 29.0, 1355866.5)]
    [InlineData(-1001, 8, 17.9, 1355671.4)]
    [InlineData(-4712, 1, 1.5, 0.0)]
    public void Calendar_date_gives_the_Julian_day_of_Meeus_table_7a(int year, int month, double day, double expected)
    {
        Assert.Equal(expected, JulianDate.FromCalendar(year, month, day).Day, 6);
    }

    // Meeus (1998), Example 7.c and the converse of Table 7.a.
    [Theory]
    [InlineData(2436116.31, 1957, 10, 4.81)]
    [InlineData(1842713.0, 333, 1, 27.5)]
    [InlineData(1507900.13, -584, 5, 28.63)]
    [InlineData(1356001.0, -1000, 7, 12.5)]
    public void Julian_day_gives_the_calendar_date_of_Meeus_example_7c(double jd, int year, int month, double day)
    {
        var date = new JulianDate(jd).ToCalendar();
        Assert.Equal((year, month), (date.Year, date.Month));
        Assert.Equal(day, date.Day, 6);
    }

    // Common practice (the Gregorian reform, Inter gravissimas 1582): Thursday 1582 October 4 (Julian) is followed by
    // Friday 1582 October 15 (Gregorian); the two dates are consecutive Julian days.
    [Fact]
    public void The_day_after_1582_October_4_is_October_15()
    {
        var october4 = JulianDate.FromCalendar(1582, 10, 4.0);
        var october15 = JulianDate.FromCalendar(1582, 10, 15.0);
        Assert.Equal(1.0, october15.Day - october4.Day, 9);
        Assert.Equal(2299160.5, october15.Day, 9); // Meeus (1998), ch. 7
        Assert.False(october4.ToCalendar().IsGregorian);
        Assert.True(october15.ToCalendar().IsGregorian);
    }

    [Fact]
    public void Calendar_round_trip_holds_every_37_days_over_the_supported_span()
    {
        for (var jd = SupportedRange.Start.Day; jd < SupportedRange.End.Day; jd += 37.123)
        {
            var c = new JulianDate(jd).ToCalendar();
            Assert.Equal(jd, JulianDate.FromCalendar(c.Year, c.Month, c.Day, c.IsGregorian).Day, 6);
        }
    }

    [Fact]
    public void Negative_years_are_written_with_a_minus_sign_and_four_digits()
    {
        Assert.Equal("-0584-05-28", new JulianDate(1507900.13).ToCalendar().ToIsoDateString());
        Assert.Equal("2000-01-01", JulianDate.J2000.ToCalendar().ToIsoDateString());
    }

    // Meeus (1998), ch. 7: JD 2451545.0 is 2000 January 1, 12h; Example 7.a: 1957 October 4.81 is JD 2436116.31
    // (19:26:24); eq. 7.1 gives JD 2440587.5 for 1970 January 1, 0h, the Unix epoch. Read as Julian dates of UTC.
    [Theory]
    [InlineData(2451545.0, 2000, 1, 1, 12, 0, 0)]
    [InlineData(2436116.31, 1957, 10, 4, 19, 26, 24)]
    [InlineData(2440587.5, 1970, 1, 1, 0, 0, 0)]
    public void A_julian_date_of_UTC_names_the_instant_of_its_calendar_date(double day, int year, int month, int dayOfMonth, int hour, int minute, int second)
    {
        var expected = Instant.FromUtc(year, month, dayOfMonth, hour, minute, second);
        Assert.True(Math.Abs((new JulianDate(day).ToUtcInstant() - expected).TotalMilliseconds) < 0.1);
        Assert.Equal(day, JulianDate.OfUtc(expected).Day, 9);
    }

    // The conversion and its inverse agree to well under a millisecond (the double's resolution) over the supported years (−1999 to +3000).
    [Fact]
    public void Julian_date_and_UTC_instant_convert_back_and_forth_within_the_doubles_resolution()
    {
        var random = new Random(12);
        for (var i = 0; i < 1000; i++)
        {
            var days = SupportedRange.Start.Day - 2440587.5 + random.NextDouble() * (SupportedRange.End.Day - SupportedRange.Start.Day);
            var instant = Instant.FromUnixTimeTicks((long)(days * NodaConstants.TicksPerDay));
            Assert.True(Math.Abs((JulianDate.OfUtc(instant).ToUtcInstant() - instant).TotalMilliseconds) < 0.1);
        }
    }
}
