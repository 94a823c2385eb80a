using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Tests.Time;

public class LeapSecondTableTests
{
    // IERS Bulletin C / Leap_Second.dat: TAI − UTC from each date.
    [Theory]
    [InlineData(1972, 1, 1, 10)]
    [InlineData(1972, 7, 1, 11)]
    [InlineData(1981, 7, 1, 20)]
    [InlineData(1999, 1, 1, 32)]
    [InlineData(2006, 1, 1, 33)]
    [InlineData(2012, 7, 1, 35)]
    [InlineData(2015, 7, 1, 36)]
    [InlineData(2017, 1, 1, 37)]
    [InlineData(2025, 3, 14, 37)]
    public void Tai_minus_utc_follows_IERS_bulletin_C(int year, int month, int day, int expected)
    {
        Assert.Equal(expected, LeapSecondTable.TaiMinusUtcSeconds(Instant.FromUtc(year, month, day, 0, 0)));
    }

    // IERS Bulletin C 52 (2016): a positive leap second at the end of 2016 December 31.
    [Fact]
    public void The_last_second_of_2016_still_has_36_seconds()
    {
        Assert.Equal(36, LeapSecondTable.TaiMinusUtcSeconds(Instant.FromUtc(2016, 12, 31, 23, 59, 59)));
    }

    [Fact]
    public void Dates_before_1972_are_not_covered()
    {
        Assert.False(LeapSecondTable.Covers(Instant.FromUtc(1971, 12, 31, 23, 0)));
    }
}
