using System.Net;
using System.Net.Http.Headers;
using System.Text;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Sites;

public class LocalEndpointTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    // NASA eclipse predictions (F. Espenak), 2025 March 14 (from memory): whole eclipse visible from the Americas; the
    // Moon sets during the eclipse in western Europe. Moonset at London (51.5 N, 0.12 W) 06:22:55 UTC by astronomy-engine
    // 2.1.19 (tools/reference-values/moon-rise-set.mjs).
    [Fact]
    public async Task A_site_gets_contacts_events_visible_phases_and_a_summary_with_the_agreed_names()
    {
        var l = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2025-03-14/local?lat=51.5&lon=-0.12&tz=Europe/London&name=Hollowmere%20Hill"));
        Assert.Equal("Hollowmere Hill", l.GetProperty("site").GetProperty("name").GetString());
        Assert.Equal("total", l.GetProperty("eclipse").GetProperty("kind").GetString());
        var contacts = l.GetProperty("contacts").EnumerateArray().ToList();
        Assert.Equal(["P1", "U1", "U2", "greatest", "U3", "U4", "P4"], contacts.Select(c => c.GetProperty("name").GetString()));
        foreach (var c in contacts)
            foreach (var field in new[] { "utc", "local", "altitudeDegrees", "azimuthDegrees", "visible", "sunAltitudeDegrees", "sky", "zenithPositionAngleDegrees" })
                Assert.True(c.TryGetProperty(field, out _), field);
        Assert.True(contacts[0].GetProperty("visible").GetBoolean());
        Assert.False(contacts[2].GetProperty("visible").GetBoolean());
        var set = l.GetProperty("moonEvents").EnumerateArray().First(e => e.GetProperty("type").GetString() == "set");
        Assert.StartsWith("2025-03-14T06:22:5", set.GetProperty("utc").GetString(), StringComparison.Ordinal);
        var phases = l.GetProperty("visiblePhases").EnumerateArray().ToList();
        Assert.Equal(set.GetProperty("utc").GetString(), phases.Single(p => p.GetProperty("phase").GetString() == "partial").GetProperty("endUtc").GetString());
        Assert.Equal(0, l.GetProperty("visibleTotalityMinutes").GetDouble());
        Assert.True(l.GetProperty("greatestVisibleUmbralMagnitude").GetProperty("value").GetDouble() < 1);
        Assert.Equal(l.GetProperty("greatestVisibleUmbralMagnitude").GetRawText(), l.GetProperty("maxVisibleUmbralMagnitude").GetRawText()); // former name, one release
        Assert.Contains("lost from view", l.GetProperty("summary").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Without_a_time_zone_local_times_are_UTC_with_a_hint()
    {
        var l = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74"));
        Assert.Equal("UTC", l.GetProperty("site").GetProperty("timeZone").GetString());
        Assert.Contains("tz=", l.GetProperty("site").GetProperty("hint").GetString(), StringComparison.Ordinal);
        Assert.EndsWith("+00:00", l.GetProperty("contacts")[0].GetProperty("local").GetString(), StringComparison.Ordinal);
    }

    // IANA tzdb: New York is on EDT (UTC−4) from 2025-03-09, so P1 at 03:57 UTC on the 14th is 23:57 on the 13th.
    [Fact]
    public async Task Local_times_carry_their_offset_and_may_fall_on_the_day_before()
    {
        var l = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74&tz=America/New_York"));
        Assert.StartsWith("2025-03-13T23:57", l.GetProperty("contacts")[0].GetProperty("local").GetString(), StringComparison.Ordinal);
        Assert.EndsWith("-04:00", l.GetProperty("contacts")[0].GetProperty("local").GetString(), StringComparison.Ordinal);
    }

    // IANA tzdb: Santiago de Chile set clocks back from UTC−3 to UTC−4 at 2025-04-06 00:00 local, so 23:00–24:00 on
    // April 5 occurs twice. The eclipse of 2025-03-14 is too early; the local-time labeller is checked directly.
    [Fact]
    public void A_local_time_that_occurs_twice_is_labelled()
    {
        var zone = NodaTime.DateTimeZoneProviders.Tzdb["America/Santiago"];
        var (text, note) = LunarShadow.Api.Formatting.TimeFormats.Local(NodaTime.Instant.FromUtc(2025, 4, 6, 2, 30), zone);
        Assert.StartsWith("2025-04-05T23:30", text, StringComparison.Ordinal);
        Assert.Contains("occurs twice", note, StringComparison.Ordinal);
        Assert.Null(LunarShadow.Api.Formatting.TimeFormats.Local(NodaTime.Instant.FromUtc(2025, 6, 1, 2, 30), zone).Note);
    }

    [Fact]
    public async Task Opening_hours_give_a_public_night_plan()
    {
        var l = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74&tz=America/New_York&open=22:00-05:00"));
        var plan = l.GetProperty("publicNight");
        Assert.StartsWith("2025-03-13T22:00", plan.GetProperty("opens").GetString(), StringComparison.Ordinal);
        Assert.True(plan.GetProperty("session").GetProperty("moonAltitudeAtOpenDegrees").GetDouble() > 40);
        var outside = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74&tz=America/New_York&open=19:00-23:30"));
        Assert.Contains("entirely outside", outside.GetProperty("publicNight").GetProperty("note").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_horizon_profile_adds_its_events()
    {
        var l = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74&horizon=190:0,200:30,260:30,270:0"));
        Assert.Contains(l.GetProperty("moonEvents").EnumerateArray(), e => e.GetProperty("type").GetString() == "hidden-by-horizon-profile");
        Assert.Equal(4, l.GetProperty("site").GetProperty("horizon").GetArrayLength());
    }

    // RFC 5545: CRLF lines of at most 75 octets, BEGIN/END pairs, one VEVENT per visible phase, a VALARM on the first.
    [Fact]
    public async Task ICalendar_has_one_event_per_visible_phase_with_an_alarm()
    {
        var request = new HttpRequestMessage(HttpMethod.Get, "/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74&tz=America/New_York&name=Saltmarsh%20Bay%20Planetarium");
        request.Headers.Accept.Add(new MediaTypeWithQualityHeaderValue("text/calendar"));
        var response = await _client.SendAsync(request);
        Assert.Equal("text/calendar", response.Content.Headers.ContentType?.MediaType);
        var text = await response.Content.ReadAsStringAsync();
        var lines = text.Split("\r\n");
        Assert.Equal("BEGIN:VCALENDAR", lines[0]);
        Assert.Equal("END:VCALENDAR", lines[^2]);
        Assert.All(lines, line => Assert.True(Encoding.UTF8.GetByteCount(line) <= 75, line));
        Assert.Equal(3, lines.Count(l => l == "BEGIN:VEVENT"));
        Assert.Equal(1, lines.Count(l => l == "BEGIN:VALARM"));
        Assert.Contains("LOCATION:Saltmarsh Bay Planetarium", lines);
        Assert.Contains(lines, l => l.StartsWith("GEO:40.7", StringComparison.Ordinal) && l.Contains(";-74", StringComparison.Ordinal));
    }

    [Fact]
    public async Task Csv_gives_the_contact_table_with_events_phases_and_the_summary_as_rows_of_their_own_kind()
    {
        var text = await (await _client.GetAsync("/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74&format=csv")).Content.ReadAsStringAsync();
        var lines = text.Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith("kind,name,local_date,utc,local,", lines[0], StringComparison.Ordinal);
        Assert.Equal(7, lines.Count(l => l.StartsWith("contact,", StringComparison.Ordinal)));
        Assert.Single(lines, l => l.StartsWith("summary,", StringComparison.Ordinal));
    }

    [Fact]
    public async Task Many_sites_come_back_one_row_each_in_order()
    {
        var body = new StringContent("""{"sites":[{"lat":51.5,"lon":-0.12,"name":"Quay"},{"lat":"40.7","lon":-74,"tz":"America/New_York","horizon":[[200,30],[260,30]]}]}""", Encoding.UTF8, "application/json");
        var batch = await JsonAssert.OkJson(await _client.PostAsync("/api/v1/eclipses/2025-03-14/local", body));
        Assert.Equal(2, batch.GetProperty("count").GetInt32());
        Assert.Equal("Quay", batch.GetProperty("sites")[0].GetProperty("site").GetProperty("name").GetString());
        Assert.Equal("America/New_York", batch.GetProperty("sites")[1].GetProperty("site").GetProperty("timeZone").GetString());
        var csv = new StringContent("""{"sites":[{"lat":51.5,"lon":-0.12},{"lat":40.7,"lon":-74}]}""", Encoding.UTF8, "application/json");
        var text = await (await _client.PostAsync("/api/v1/eclipses/2025-03-14/local?format=csv", csv)).Content.ReadAsStringAsync();
        Assert.Equal(3, text.Split("\r\n", StringSplitOptions.RemoveEmptyEntries).Length);
    }

    [Fact]
    public async Task Batches_over_500_sites_are_413_and_non_JSON_bodies_415()
    {
        var sites = string.Join(',', Enumerable.Repeat("""{"lat":1,"lon":2}""", 501));
        var tooMany = await _client.PostAsync("/api/v1/eclipses/2025-03-14/local", new StringContent($$"""{"sites":[{{sites}}]}""", Encoding.UTF8, "application/json"));
        Assert.Equal(HttpStatusCode.RequestEntityTooLarge, tooMany.StatusCode);
        var text = await _client.PostAsync("/api/v1/eclipses/2025-03-14/local", new StringContent("lat=1", Encoding.UTF8, "text/plain"));
        Assert.Equal(HttpStatusCode.UnsupportedMediaType, text.StatusCode);
    }

    [Theory]
    [InlineData("{\"sites\":[{\"lat\":95,\"lon\":0}]}", "sites[0].lat")]
    [InlineData("{\"sites\":[{\"lat\":10}]}", "sites[0].lon")]
    [InlineData("{\"sites\":[{\"lat\":10,\"lon\":0,\"tz\":\"Mars/Olympus\"}]}", "sites[0].tz")]
    [InlineData("{\"sites\":[{\"lat\":10,\"lon\":0,\"lat2\":1},{\"lat\":10,\"lon\":0,\"open\":\"25:00-26:00\"}]}", "sites[1].open")]
    [InlineData("{\"sites\":[{\"lat\":{\"x\":1},\"lon\":0}]}", "sites[0].lat")]
    [InlineData("{\"sites\":[]}", "sites")]
    [InlineData("{\"places\":[]}", "sites")]
    [InlineData("{not json", "body")]
    public async Task Bad_batch_bodies_get_a_problem_naming_the_field(string json, string field)
    {
        await JsonAssert.ProblemNaming(await _client.PostAsync("/api/v1/eclipses/2025-03-14/local", new StringContent(json, Encoding.UTF8, "application/json")), field);
    }

    [Theory]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lon=0", "lat")]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=0&lon=200", "lon")]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=0&lon=0&tz=Nowhere/Town", "tz")]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=0&lon=0&horizon=90:5,abc", "horizon")]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=0&lon=0&horizon=400:5", "horizon")]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=0&lon=0&minAltitude=75", "minAltitude")]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=0&lon=0&open=7pm-11pm", "open")]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=0&lon=0&format=pdf", "format")]
    [InlineData("/api/v1/eclipses/-1997-05-06/local?lat=0&lon=0&format=ics", "format")]
    [InlineData("/api/v1/sites/upcoming?lat=0", "lon")]
    [InlineData("/api/v1/sites/upcoming?lat=0&lon=0&count=51", "count")]
    [InlineData("/api/v1/sites/upcoming?lat=0&lon=0&count=2.5", "count")]
    [InlineData("/api/v1/sites/upcoming?lat=0&lon=0&phase=annular", "phase")]
    [InlineData("/api/v1/sites/upcoming?lat=0&lon=0&night=maybe", "night")]
    [InlineData("/api/v1/sites/upcoming?lat=0&lon=0&from=3000-06-01", "from")]
    [InlineData("/api/v1/sites/upcoming?lat=0&lon=0&years=0", "years")]
    [InlineData("/api/v1/sites/upcoming?lat=0&lon=0&years=1001", "years")]
    [InlineData("/api/v1/sites/upcoming?lat=0&lon=0&years=2.5", "years")]
    public async Task Bad_site_input_gets_a_problem_naming_the_field(string url, string field)
    {
        await JsonAssert.ProblemNaming(await _client.GetAsync(url), field);
    }

    [Fact]
    public async Task A_date_without_an_eclipse_is_404_for_sites_too()
    {
        Assert.Equal(HttpStatusCode.NotFound, (await _client.GetAsync("/api/v1/eclipses/2025-03-15/local?lat=0&lon=0")).StatusCode);
    }

    // Five Millennium Canon and NASA visibility maps (from memory): from New York, the totalities of 2025 March 14 and
    // 2026 March 3 are both (at least partly) visible; no total eclipse falls in between.
    [Fact]
    public async Task Upcoming_lists_the_next_visible_eclipses_in_order()
    {
        var u = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/sites/upcoming?lat=40.7&lon=-74&tz=America/New_York&from=2025-01-01&count=3&phase=total"));
        Assert.Equal(3, u.GetProperty("count").GetInt32());
        var dates = u.GetProperty("eclipses").EnumerateArray().Select(e => e.GetProperty("date").GetString()).ToList();
        Assert.Equal(["2025-03-14", "2026-03-03"], dates.Take(2));
        Assert.All(u.GetProperty("eclipses").EnumerateArray(), e => Assert.True(e.GetProperty("qualifyingMinutes").GetDouble() > 0));
        var ics = await _client.GetAsync("/api/v1/sites/upcoming?lat=40.7&lon=-74&from=2025-01-01&count=3&phase=total&format=ics");
        Assert.Equal("text/calendar", ics.Content.Headers.ContentType?.MediaType);
        // The count was reached well inside the default 100 years: no limit to report.
        Assert.Equal(100, u.GetProperty("criteria").GetProperty("years").GetInt32());
        Assert.Equal("2125-01-01", u.GetProperty("searchedUntil").GetString());
        Assert.False(u.GetProperty("searchLimitReached").GetBoolean());
    }

    // Same source as above: from New York the total eclipses of 2025 and 2026 are seen, and none falls in between or
    // later in 2026, so two years hold exactly two.
    [Fact]
    public async Task Upcoming_says_when_its_search_stopped_at_the_year_limit_so_none_found_is_not_none_exist()
    {
        var u = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/sites/upcoming?lat=40.7&lon=-74&from=2025-01-01&count=5&phase=total&years=2"));
        Assert.Equal(["2025-03-14", "2026-03-03"], u.GetProperty("eclipses").EnumerateArray().Select(e => e.GetProperty("date").GetString()));
        Assert.Equal(2, u.GetProperty("criteria").GetProperty("years").GetInt32());
        Assert.Equal("2027-01-01", u.GetProperty("searchedUntil").GetString());
        Assert.True(u.GetProperty("searchLimitReached").GetBoolean());
        Assert.Contains("ask for more years", u.GetProperty("note").GetString(), StringComparison.Ordinal);
    }

    // The supported range ends with the year 3000 (docs/accuracy.md): a search that runs into it has searched everything.
    [Fact]
    public async Task Upcoming_that_runs_to_the_end_of_the_supported_range_does_not_claim_a_limit()
    {
        var u = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/sites/upcoming?lat=40.7&lon=-74&from=2990-01-01&count=50&phase=total"));
        Assert.True(u.GetProperty("count").GetInt32() < 50);
        Assert.Equal("3000-12-31", u.GetProperty("searchedUntil").GetString());
        Assert.False(u.GetProperty("searchLimitReached").GetBoolean());
        Assert.Contains("end of the supported range", u.GetProperty("note").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_track_of_the_night_comes_on_request()
    {
        var l = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74&track=10&horizon=0:5,180:5"));
        var track = l.GetProperty("track").EnumerateArray().ToList();
        Assert.Equal(97, track.Count); // 16 hours every 10 minutes, both ends included
        Assert.All(track, t => Assert.Equal(5, t.GetProperty("horizonAltitudeDegrees").GetDouble(), 6));
        Assert.Contains(track, t => t.GetProperty("sunAltitudeDegrees").GetDouble() > 0);
        // Explanatory Supplement (2013), ch. 15: day above −0°50′, then civil, nautical and astronomical twilight to −6°,
        // −12° and −18°, night below. Each sample carries its state, so the page needs no copy of the thresholds (away from
        // the limits, where the rounded altitude could fall on either side).
        string Expected(double sun) => sun > -50.0 / 60 ? "day" : sun > -6 ? "civil-twilight" : sun > -12 ? "nautical-twilight" : sun > -18 ? "astronomical-twilight" : "night";
        foreach (var t in track.Where(t => new[] { -50.0 / 60, -6, -12, -18 }.All(limit => Math.Abs(t.GetProperty("sunAltitudeDegrees").GetDouble() - limit) > 0.01)))
            Assert.Equal(Expected(t.GetProperty("sunAltitudeDegrees").GetDouble()), t.GetProperty("sky").GetString());
        Assert.Equal(5, track.Select(t => t.GetProperty("sky").GetString()).Distinct().Count());
        await JsonAssert.ProblemNaming(await _client.GetAsync("/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74&track=1"), "track");
    }
}
