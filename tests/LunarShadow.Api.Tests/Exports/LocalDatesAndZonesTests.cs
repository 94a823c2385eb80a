using System.Globalization;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Tests.Support;
using NodaTime;
using Calendar = Ical.Net.Calendar;

namespace LunarShadow.Api.Tests.Exports;

/// <summary>Local dates, zone names and repeated local times, at sites chosen for their zones.</summary>
[Collection(ExportHost.Name)]
public class LocalDatesAndZonesTests(UnthrottledApiFactory factory)
{
    private readonly HttpClient _client = factory.CreateClient();

    // NASA eclipse predictions (F. Espenak), 2028 December 31 (from memory): greatest eclipse about 16:52 UTC. IANA
    // tzdb: Japan is UTC+09:00 (JST) all year, so that is 01:52 on Monday 1 January 2029 (a Monday by the Gregorian
    // calendar, common knowledge).
    [Fact]
    public async Task Tokyo_sees_the_eclipse_of_2028_12_31_in_the_night_of_31_December_to_1_January()
    {
        var l = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2028-12-31/local?lat=35.68&lon=139.77&tz=Asia/Tokyo"));
        Assert.Equal("2028-12-31", l.GetProperty("night").GetProperty("evening").GetString());
        Assert.Equal("2029-01-01", l.GetProperty("night").GetProperty("morning").GetString());
        Assert.Equal(["JST"], l.GetProperty("site").GetProperty("timeZoneAbbreviations").EnumerateArray().Select(a => a.GetString()));
        var summary = l.GetProperty("summary").GetString()!;
        Assert.Contains("in the night of Sunday 31 December 2028 to Monday 1 January 2029 (JST)", summary, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("deepest at 01:5", summary, StringComparison.Ordinal);
        Assert.Contains(" JST", summary, StringComparison.Ordinal);
    }

    // IANA tzdb: Kiritimati (Line Islands) is UTC+14:00 and Pago Pago (American Samoa) UTC−11:00, so at almost the same
    // solar time the two sides of the date line name the night a day apart. Greatest eclipse 2028-12-31 16:52 UTC is
    // 06:52 on 1 January at Kiritimati and 05:52 on 31 December at Pago Pago; the Moon is low in the west before dawn.
    [Fact]
    public async Task Either_side_of_the_date_line_the_same_eclipse_falls_in_nights_a_day_apart()
    {
        var east = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2028-12-31/local?lat=1.87&lon=-157.4&tz=Pacific/Kiritimati"));
        var west = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2028-12-31/local?lat=-14.28&lon=-170.7&tz=Pacific/Pago_Pago"));
        Assert.Equal("2028-12-31", east.GetProperty("night").GetProperty("evening").GetString());
        Assert.Equal("2028-12-30", west.GetProperty("night").GetProperty("evening").GetString());
        Assert.Equal(["UTC+14:00"], east.GetProperty("site").GetProperty("timeZoneAbbreviations").EnumerateArray().Select(a => a.GetString()));
        Assert.Equal(["SST"], west.GetProperty("site").GetProperty("timeZoneAbbreviations").EnumerateArray().Select(a => a.GetString()));
        Assert.EndsWith("+14:00", east.GetProperty("contacts")[3].GetProperty("local").GetString(), StringComparison.Ordinal);
        Assert.EndsWith("-11:00", west.GetProperty("contacts")[3].GetProperty("local").GetString(), StringComparison.Ordinal);
    }

    // IANA tzdb: South Australia left daylight time (ACDT, UTC+10:30) for ACST (UTC+09:30) at 03:00 on 2015-04-05; NASA
    // (from memory): greatest eclipse of 2015-04-04 at 12:00 UTC, i.e. 22:30 ACDT on the 4th.
    [Fact]
    public async Task A_half_hour_zone_on_the_night_its_clocks_go_back_names_both_abbreviations()
    {
        var l = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2015-04-04/local?lat=-34.93&lon=138.6&tz=Australia/Adelaide"));
        Assert.StartsWith("2015-04-04T22:", l.GetProperty("contacts")[3].GetProperty("local").GetString(), StringComparison.Ordinal);
        Assert.EndsWith("+10:30", l.GetProperty("contacts")[3].GetProperty("local").GetString(), StringComparison.Ordinal);
        Assert.Equal(["ACDT", "ACST"], l.GetProperty("site").GetProperty("timeZoneAbbreviations").EnumerateArray().Select(a => a.GetString()));
        Assert.Contains("(ACDT/ACST)", l.GetProperty("summary").GetString(), StringComparison.Ordinal);
    }

    // IANA tzdb: the EU left summer time at 01:00 UTC on 2023-10-29 (CEST → CET), during the night after the partial
    // eclipse of 2023-10-28 (greatest about 20:14 UTC, NASA, from memory).
    [Fact]
    public async Task A_northern_night_with_the_clocks_going_back_names_both_abbreviations_and_says_which_closing_time()
    {
        var l = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2023-10-28/local?lat=52.52&lon=13.4&tz=Europe/Berlin&open=20:00-02:30"));
        Assert.Equal(["CEST", "CET"], l.GetProperty("site").GetProperty("timeZoneAbbreviations").EnumerateArray().Select(a => a.GetString()));
        Assert.Equal("2023-10-28", l.GetProperty("night").GetProperty("evening").GetString());
        var note = l.GetProperty("publicNight").GetProperty("note").GetString()!;
        Assert.Contains("The closing time 02:30 on 2023-10-29 occurs twice (clocks go back); the second, at UTC+01:00, is used.", note, StringComparison.Ordinal);
        Assert.EndsWith("+01:00", l.GetProperty("publicNight").GetProperty("closes").GetString(), StringComparison.Ordinal);
    }

    // IANA tzdb: New Zealand left daylight time at 03:00 NZDT on 2015-04-05 (14:00 UTC on the 4th), so 02:00–02:59
    // occurred twice. NASA (from memory): U4 of 2015-04-04 near 13:45 UTC, i.e. 02:45 NZDT, the first of the two.
    [Fact]
    public async Task On_a_southern_night_with_a_repeated_hour_contacts_session_notes_and_calendar_say_which_one()
    {
        var url = "/api/v1/eclipses/2015-04-04/local?lat=-36.85&lon=174.76&tz=Pacific/Auckland&open=20:00-05:00";
        var l = await JsonAssert.OkJson(await _client.GetAsync(url));
        Assert.Equal(["NZDT", "NZST"], l.GetProperty("site").GetProperty("timeZoneAbbreviations").EnumerateArray().Select(a => a.GetString()));
        var u4 = l.GetProperty("contacts").EnumerateArray().Single(c => c.GetProperty("name").GetString() == "U4");
        Assert.StartsWith("2015-04-05T02:4", u4.GetProperty("local").GetString(), StringComparison.Ordinal);
        Assert.Contains("the first one, at UTC+13:00", u4.GetProperty("localNote").GetString(), StringComparison.Ordinal);

        var session = l.GetProperty("publicNight").GetProperty("session");
        var close = DateTimeOffset.Parse(session.GetProperty("doorsCloseUtc").GetString()!, CultureInfo.InvariantCulture);
        var zone = DateTimeZoneProviders.Tzdb["Pacific/Auckland"];
        Assert.Equal(2, zone.MapLocal(Instant.FromDateTimeOffset(close).InZone(zone).LocalDateTime).Count); // doors close in the repeated hour
        Assert.Contains("NZDT (UTC+13:00, the first of the two 02:", l.GetProperty("publicNight").GetProperty("note").GetString(), StringComparison.Ordinal);

        var calendar = Calendar.Load(await _client.GetStringAsync(url + "&format=ics"))!;
        var sessionEvent = calendar.Events.Single(e => e.Uid!.Contains("public-session", StringComparison.Ordinal));
        Assert.Contains("the first of the two 02:", sessionEvent.Description, StringComparison.Ordinal);
        var csv = await _client.GetStringAsync(url + "&format=csv");
        Assert.Contains("the first one, at UTC+13:00", csv, StringComparison.Ordinal);
    }

    // IANA tzdb: in the EU clocks went back at 01:00 UTC on 2023-10-29, so 02:30 local happened at 00:30 UTC (CEST) and
    // again at 01:30 UTC (CET).
    [Fact]
    public void A_repeated_clock_reading_names_its_zone_offset_and_which_of_the_two()
    {
        var berlin = DateTimeZoneProviders.Tzdb["Europe/Berlin"];
        Assert.Equal("02:30 CEST (UTC+02:00, the first of the two 02:30s as clocks go back)", SiteWording.Clock(Instant.FromUtc(2023, 10, 29, 0, 30), berlin));
        Assert.Equal("02:30 CET (UTC+01:00, the second of the two 02:30s as clocks go back)", SiteWording.Clock(Instant.FromUtc(2023, 10, 29, 1, 30), berlin));
        Assert.Equal("03:30 CET", SiteWording.Clock(Instant.FromUtc(2023, 10, 29, 2, 30), berlin));
    }

    // A summary that misses the umbral phase says so: the partial eclipse of 2028-07-06 (NASA, from memory: greatest
    // near 18:20 UTC) is seen along a belt of longitudes where the Moon rises or sets between U4 and P4 (or P1 and U1).
    [Fact]
    public async Task Summaries_say_plainly_when_the_umbral_phase_is_missed()
    {
        var missed = 0;
        for (var lon = -180.0; lon < 180; lon += 7.5)
        {
            foreach (var lat in new[] { -40.0, 0.0, 40.0 })
            {
                var l = await JsonAssert.OkJson(await _client.GetAsync(FormattableString.Invariant($"/api/v1/eclipses/2028-07-06/local?lat={lat}&lon={lon}")));
                var phases = l.GetProperty("visiblePhases").EnumerateArray().Select(p => p.GetProperty("phase").GetString()).ToList();
                var summary = l.GetProperty("summary").GetString()!;
                if (phases.Contains("penumbral") && !phases.Contains("partial"))
                {
                    missed++;
                    Assert.Contains("the umbral phase happens while the Moon is below your horizon", summary, StringComparison.Ordinal);
                }
                else
                {
                    Assert.DoesNotContain("umbral phase happens", summary, StringComparison.Ordinal);
                }
            }
        }
        Assert.True(missed > 0, "the grid found no site that misses the umbral phase");
    }
}
