using LunarShadow.Api.Formatting;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Api.Tests.Formatting;

public class TimeFormatsTests
{
    // Meeus (1998), ch. 7: JD 2299160.5 is 1582 October 15 (Gregorian), the day after 1582 October 4 (Julian).
    [Fact]
    public void The_calendar_switches_from_julian_to_gregorian_in_October_1582()
    {
        Assert.Equal("1582-10-15T00:00:00.000Z", TimeFormats.Utc(new JulianDate(2299160.5).ToUtcInstant()));
        Assert.Equal("1582-10-04T00:00:00.000Z", TimeFormats.Utc(new JulianDate(2299159.5).ToUtcInstant()));
    }

    // Meeus (1998), Example 7.c: JD 1507900.13 is −584 May 28.63 (Julian calendar).
    [Fact]
    public void Negative_years_are_written_in_astronomical_numbering()
    {
        Assert.StartsWith("-0584-05-28T15:07", TimeFormats.Tt(TtInstant.FromJulianDate(1507900.13)), StringComparison.Ordinal);
    }

    // Meeus (1998), ch. 7: JD 2451545.0 is 2000 January 1, 12h; 2025 March 14 is 9204 days later, and 06:58 is 5 h 2 min
    // before noon: 2460749.0 − 0.2097222 = 2460748.7902778. The 1582 value follows from JD 2299160.5 (above) less half a day.
    [Theory]
    [InlineData("2025-03-14T06:58:00Z", 2460748.7902777777)]
    [InlineData("2025-03-14T07:58:00+01:00", 2460748.7902777777)]
    [InlineData("-0584-05-28T15:07:12Z", 1507900.13)]
    [InlineData("1582-10-04T12:00:00Z", 2299160.0)]
    public void Instants_are_read_in_the_astronomers_calendar(string text, double julianDate)
    {
        Assert.True(TimeFormats.TryParseInstant(text, out var instant));
        Assert.Equal(julianDate, instant.ToJulianDate(), 6);
    }

    [Theory]
    [InlineData("1582-10-10T00:00:00Z")]
    [InlineData("2025-02-29T00:00:00Z")]
    [InlineData("2025-03-14T24:00:00Z")]
    [InlineData("2025-03-14T06:58:00")]
    [InlineData("2025-03-14 06:58:00Z")]
    public void Impossible_or_zoneless_instants_are_refused(string text)
    {
        Assert.False(TimeFormats.TryParseInstant(text, out _));
    }

    [Fact]
    public void Round_trip_through_text_keeps_the_millisecond()
    {
        var random = new Random(7);
        for (var i = 0; i < 500; i++)
        {
            var jd = SupportedRange.Start.Day + random.NextDouble() * (SupportedRange.End.Day - SupportedRange.Start.Day);
            var instant = TimeFormats.ToMillisecond(new JulianDate(jd).ToUtcInstant());
            Assert.True(TimeFormats.TryParseInstant(TimeFormats.Utc(instant), out var back));
            Assert.Equal(instant, back);
        }
    }

    // ISO 8601 (a local time with its offset names the same instant): written from the same rounded instant, the local
    // time minus its offset is the UTC to the millisecond, at every sub-millisecond phase, in zones with odd offsets.
    [Theory]
    [InlineData("Asia/Kathmandu")]
    [InlineData("Pacific/Chatham")]
    [InlineData("Australia/Adelaide")]
    [InlineData("America/St_Johns")]
    public void Local_and_utc_times_agree_to_the_millisecond(string zoneId)
    {
        var zone = DateTimeZoneProviders.Tzdb[zoneId];
        var random = new Random(11);
        for (var i = 0; i < 2000; i++)
        {
            var ticks = Instant.FromUtc(1900, 1, 1, 0, 0).ToUnixTimeTicks() + (long)(random.NextDouble() * 200 * 365.25 * 864_000_000_000L);
            ticks = ticks / 10_000 * 10_000 + (i % 4 == 0 ? 5_000 : random.Next(10_000)); // a quarter of them on the half millisecond
            var instant = Instant.FromUnixTimeTicks(ticks);
            var utc = DateTimeOffset.Parse(TimeFormats.Utc(instant), System.Globalization.CultureInfo.InvariantCulture);
            var local = DateTimeOffset.Parse(TimeFormats.Local(instant, zone).Text, System.Globalization.CultureInfo.InvariantCulture);
            Assert.Equal(utc.UtcTicks, local.UtcTicks);
            // Offsets carry whole minutes in ISO 8601: a local-mean-time offset (before standard time) is rounded.
            Assert.Equal(TimeSpan.FromMinutes(Math.Round(zone.GetUtcOffset(instant).Seconds / 60.0, MidpointRounding.AwayFromZero)), local.Offset);
            Assert.InRange(Math.Abs(utc.UtcTicks - instant.ToDateTimeUtc().Ticks), 0, 5_000);
        }
    }
}
