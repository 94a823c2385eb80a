using System.Net.Http.Json;
using System.Text.Json;

namespace LunarShadow.Browser.Tests;

public sealed class BrowserFixture : IAsyncLifetime
{
    public ServiceOnKestrel Service { get; } = new();

    public Chromium Chromium { get; } = new();

    public async Task InitializeAsync()
    {
        if (!Chromium.Available && !Chromium.InCi) return;
        await Service.InitializeAsync();
        await Chromium.InitializeAsync();
    }

    public async Task DisposeAsync()
    {
        await Chromium.DisposeAsync();
        await Service.DisposeAsync();
    }
}

[CollectionDefinition("browser")]
public sealed class BrowserGroup : ICollectionFixture<BrowserFixture>;

/// <summary>The page at a desktop width (1400 px) and a phone width (390 px).</summary>
[Collection("browser")]
public class PageTests(BrowserFixture fixture)
{
    // Invented sites (demo-requests/lunarshadow.http): the Saltmarsh Bay Planetarium, a coastal dome, and the
    // Harbourlight rooftop club at 40.71 N 74.0 W.
    private const string SaltmarshBay = "lat=-36.84&lon=174.76&tz=Pacific/Auckland";
    private const string Harbourlight = "lat=40.71&lon=-74.0&tz=America/New_York";

    private const string ContactsDrawn = "document.querySelectorAll('#contacts tbody tr').length >= 2 && document.querySelectorAll('#timeline-chart .hour-tick').length > 0";

    private Task<PageSession> Open(string path, int width, int height = 900) => PageSession.OpenAsync(fixture, path, width, height);

    [SkippableTheory]
    [InlineData(1400)]
    [InlineData(390)]
    public async Task The_first_visit_draws_the_example_with_an_hour_axis_a_zone_and_the_list_in_step_with_the_date(int width)
    {
        Chromium.RequireOrSkip();
        await using var s = await Open("/", width);
        await s.Page.WaitForFunctionAsync(ContactsDrawn);
        await s.Page.WaitForFunctionAsync("[...document.querySelectorAll('#eclipse option')].some((o) => o.textContent.includes('visible'))");
        Assert.True(await s.Page.IsVisibleAsync("#example-note"));
        Assert.Equal("2029-12-20", await s.Page.InputValueAsync("#eclipse-date"));
        Assert.Equal("2029-12-20", await s.Page.InputValueAsync("#eclipse"));
        // The night runs from about 19:40 to 02:40 local: every full hour has a tick, and midnight is marked.
        Assert.True(await s.Page.Locator("#timeline-chart .hour-tick").CountAsync() >= 7);
        Assert.Equal(1, await s.Page.Locator("#timeline-chart .midnight-line").CountAsync());
        Assert.Contains("CET", await s.Page.TextContentAsync("#timeline-chart .zone-label"), StringComparison.Ordinal);
        Assert.Contains("21 Dec", await s.Page.TextContentAsync("#timeline-chart"), StringComparison.Ordinal);
        Assert.Equal(1, await s.Page.Locator("#timeline-chart .open-bar").CountAsync());
        Assert.Contains("greatest", await s.Page.TextContentAsync("#timeline-chart"), StringComparison.Ordinal);
        Assert.DoesNotContain("max", await s.Page.InnerTextAsync("#result"), StringComparison.Ordinal);
        var selected = await s.Page.EvaluateAsync<string>("document.querySelector('#eclipse').selectedOptions[0].textContent");
        Assert.Contains("Thu 20 Dec 2029", selected, StringComparison.Ordinal);
        Assert.Contains("✓ visible", selected, StringComparison.Ordinal);
        // Choosing another eclipse from the list puts its date in the field.
        var other = await s.Page.EvaluateAsync<string>("[...document.querySelectorAll('#eclipse option')].map((o) => o.value).find((v) => v && v !== '2029-12-20')");
        await s.Page.SelectOptionAsync("#eclipse", other);
        Assert.Equal(other, await s.Page.InputValueAsync("#eclipse-date"));
        // The site marker sits at the map's centre column, inside the frame.
        Assert.True(await s.Page.EvaluateAsync<bool>("""
            (() => { const m = document.querySelector('#world-map .site').getBoundingClientRect(), f = document.querySelector('#world-map').getBoundingClientRect();
              return m.left >= f.left && m.right <= f.right && m.top >= f.top && m.bottom <= f.bottom && Math.abs((m.left + m.right) / 2 - (f.left + f.right) / 2) < 2; })()
            """));
        // The long totality (54 min): no label overlaps another in any chart.
        await AssertNoLabelOverlapsAsync(s, width, "2029-12-20");
        Assert.Empty(s.Errors);
        await s.ScreenshotAsync($"first-visit-{width}");
        await s.ScreenshotAsync($"timeline-{width}", "#timeline-chart");
        await s.ScreenshotAsync($"map-{width}", "#world-map");
    }

    public static TheoryData<int, string, string> Totalities => new()
    {
        // 2155-09-11: 2.3 min of totality, the shortest in 2000-2999 on the danjon model (the long totality of
        // 2029-12-20, 54 min, is checked on the first visit).
        { 1400, "2155-09-11", SaltmarshBay },
        { 390, "2155-09-11", SaltmarshBay },
    };

    [SkippableTheory]
    [MemberData(nameof(Totalities))]
    public async Task No_two_labels_overlap_in_any_chart_and_none_leaves_its_chart(int width, string date, string site)
    {
        Chromium.RequireOrSkip();
        await using var s = await Open($"/?{site}&date={date}", width);
        await s.Page.WaitForFunctionAsync(ContactsDrawn);
        await AssertNoLabelOverlapsAsync(s, width, date);
        Assert.Empty(s.Errors);
        await s.ScreenshotAsync($"labels-{date}-{width}");
        await s.ScreenshotAsync($"labels-timeline-{date}-{width}", "#timeline-chart");
        await s.ScreenshotAsync($"labels-shadow-{date}-{width}", "#shadow-diagram");
    }

    private static async Task AssertNoLabelOverlapsAsync(PageSession s, int width, string date)
    {
        // The shadow diagram is complete once the crater timings have put the features on it.
        await s.Page.WaitForFunctionAsync("document.querySelector('#shadow-diagram .feature-dot') && document.querySelector('#world-map .land')");
        foreach (var chart in new[] { "#timeline-chart", "#shadow-diagram", "#world-map" })
        {
            var problems = await s.Page.EvaluateAsync<string[]>(PageScripts.OverlappingLabels, chart);
            Assert.True(problems.Length == 0, $"{chart} at {width} px for {date}: {string.Join("; ", problems)}");
        }
        Assert.Equal(7, await s.Page.Locator("#timeline-chart .contact-label").CountAsync());
        Assert.Equal(7, await s.Page.Locator("#shadow-diagram .contact-label").CountAsync());
    }

    [SkippableFact]
    public async Task Below_the_horizon_the_Moon_is_drawn_dashed_not_clamped()
    {
        Chromium.RequireOrSkip();
        // At Saltmarsh Bay the Moon rises during the 2155-09-11 eclipse.
        await using var s = await Open($"/?{SaltmarshBay}&date=2155-09-11", 1400);
        await s.Page.WaitForFunctionAsync(ContactsDrawn);
        Assert.True(await s.Page.Locator("#timeline-chart polyline.moon-below").CountAsync() >= 1);
        Assert.True(await s.Page.Locator("#timeline-chart polyline.moon-altitude").CountAsync() >= 1);
        Assert.Empty(s.Errors);
    }

    [SkippableFact]
    public async Task On_a_phone_every_text_is_at_least_11_px_and_nothing_scrolls_sideways()
    {
        Chromium.RequireOrSkip();
        await using var s = await Open("/", 390);
        await s.Page.WaitForFunctionAsync(ContactsDrawn);
        var small = await s.Page.EvaluateAsync<string[]>(PageScripts.SmallTexts, 11);
        Assert.True(small.Length == 0, string.Join("; ", small.Take(10)));
        Assert.True(await s.Page.EvaluateAsync<bool>("document.documentElement.scrollWidth <= window.innerWidth"), "the page scrolls sideways");
        // The contact table reflows into one card per contact.
        Assert.Equal("grid", await s.Page.EvaluateAsync<string>("getComputedStyle(document.querySelector('#contacts tbody tr')).display"));
        await s.ScreenshotAsync("phone-390");
    }

    [SkippableTheory]
    [InlineData(1400)]
    [InlineData(390)]
    public async Task The_URL_round_trips(int width)
    {
        Chromium.RequireOrSkip();
        await using var s = await Open("/", width);
        await s.Page.WaitForFunctionAsync(ContactsDrawn);
        await s.Page.FillAsync("#lat", "-36.84");
        await s.Page.FillAsync("#lon", "174.76");
        await s.Page.FillAsync("#elevation", "12");
        await s.Page.FillAsync("#tz", "Pacific/Auckland");
        await s.Page.FillAsync("#open", "19:00-23:30");
        await s.Page.FillAsync("#eclipse-date", "2025-03-14");
        await s.Page.ClickAsync("#show");
        await s.Page.WaitForFunctionAsync("location.search.includes('date=2025-03-14') && document.querySelector('#contacts tbody th')");
        await s.Page.WaitForFunctionAsync("document.querySelector('#result-when').textContent.includes('Pacific/Auckland')");
        var url = s.Page.Url;
        var firstRow = await s.Page.InnerTextAsync("#contacts tbody tr");
        Assert.Contains("lat=-36.84", url, StringComparison.Ordinal);
        Assert.Contains("tz=Pacific%2FAuckland", url, StringComparison.Ordinal);
        Assert.Contains("open=19%3A00-23%3A30", url, StringComparison.Ordinal);

        await using var again = await PageSession.OpenAsync(fixture, new Uri(url).PathAndQuery, width);
        await again.Page.WaitForFunctionAsync("document.querySelector('#result-when').textContent.includes('Pacific/Auckland')");
        Assert.Equal("-36.84", await again.Page.InputValueAsync("#lat"));
        Assert.Equal("174.76", await again.Page.InputValueAsync("#lon"));
        Assert.Equal("12", await again.Page.InputValueAsync("#elevation"));
        Assert.Equal("Pacific/Auckland", await again.Page.InputValueAsync("#tz"));
        Assert.Equal("19:00-23:30", await again.Page.InputValueAsync("#open"));
        Assert.Equal("2025-03-14", await again.Page.InputValueAsync("#eclipse-date"));
        Assert.False(await again.Page.IsVisibleAsync("#example-note"));
        Assert.Equal(firstRow, await again.Page.InnerTextAsync("#contacts tbody tr"));
        Assert.Empty(s.Errors);
        Assert.Empty(again.Errors);
        await again.ScreenshotAsync($"round-trip-{width}");
    }

    [SkippableFact]
    public async Task Every_bad_value_is_shown_as_an_error_naming_the_field_and_the_charts_are_hidden()
    {
        Chromium.RequireOrSkip();
        await using var s = await Open("/?lat=123&lon=11.42&tz=Europe/Vienna&date=2029-12-20", 1400);
        await AssertErrorAsync(s, "bad-latitude-on-load", "#lat", "lat");
        var cases = new (string Name, string Input, string Value, string Field)[]
        {
            ("bad-longitude", "#lon", "200", "lon"),
            ("unknown-zone", "#tz", "Europe/Atlantis", "tz"),
            ("bad-horizon", "#horizon", "90:95", "horizon"),
            ("bad-opening-hours", "#open", "25:00-26:00", "open"),
            ("malformed-date", "#eclipse-date", "2029-13-45", "date"),
            ("bad-height", "#elevation", "99999", "elevation"),
            ("missing-latitude", "#lat", "", "lat"),
        };
        foreach (var (name, input, value, field) in cases)
        {
            // Start from a good request each time, then spoil one field.
            foreach (var (id, good) in new[] { ("#lat", "47.31"), ("#lon", "11.42"), ("#elevation", "1120"), ("#tz", "Europe/Vienna"), ("#horizon", ""), ("#open", ""), ("#eclipse-date", "2029-12-20") })
                await s.Page.FillAsync(id, good);
            await s.Page.ClickAsync("#show");
            await s.Page.WaitForSelectorAsync("#result:not([hidden])");
            await s.Page.FillAsync(input, value);
            await s.Page.ClickAsync("#show");
            await AssertErrorAsync(s, name, input, field);
        }
        Assert.Empty(s.Errors);
    }

    private static async Task AssertErrorAsync(PageSession s, string name, string input, string field)
    {
        await s.Page.WaitForSelectorAsync("#error:not([hidden])");
        Assert.False(await s.Page.IsVisibleAsync("#result"), name);
        Assert.False(await s.Page.IsVisibleAsync("#timeline-chart"), name);
        Assert.Contains(field, await s.Page.InnerTextAsync("#error"), StringComparison.Ordinal);
        Assert.Equal("true", await s.Page.GetAttributeAsync(input, "aria-invalid"));
        // Styled as an error: its own border colour, not the panel's.
        Assert.NotEqual(
            await s.Page.EvaluateAsync<string>("getComputedStyle(document.querySelector('#plan')).borderTopColor"),
            await s.Page.EvaluateAsync<string>("getComputedStyle(document.querySelector('#error')).borderTopColor"));
        await s.ScreenshotAsync($"error-{name}");
    }

    [SkippableFact]
    public async Task A_date_without_an_eclipse_offers_the_nearest_eclipses_as_links_that_work()
    {
        Chromium.RequireOrSkip();
        await using var s = await Open("/?lat=47.31&lon=11.42&tz=Europe/Vienna&date=2029-12-21", 390);
        await s.Page.WaitForSelectorAsync("#nearest:not([hidden])");
        Assert.False(await s.Page.IsVisibleAsync("#result"));
        var links = await s.Page.Locator("#nearest-list a").AllInnerTextsAsync();
        Assert.Contains(links, l => l.StartsWith("2029-12-20", StringComparison.Ordinal));
        Assert.Contains(links, l => l.StartsWith("2030-06-15", StringComparison.Ordinal)); // the next one, a partial eclipse
        await s.ScreenshotAsync("error-no-eclipse-390");
        await s.Page.ClickAsync("#nearest-list a >> text=2029-12-20");
        await s.Page.WaitForFunctionAsync(ContactsDrawn);
        Assert.False(await s.Page.IsVisibleAsync("#error"));
        Assert.Empty(s.Errors);
    }

    [SkippableFact]
    public async Task The_contact_table_shows_the_same_local_times_as_the_API()
    {
        Chromium.RequireOrSkip();
        await using var s = await Open($"/?{Harbourlight}&date=2025-03-14", 1400);
        await s.Page.WaitForFunctionAsync("document.querySelectorAll('#contacts tbody tr').length === 7");
        using var http = new HttpClient { BaseAddress = fixture.Service.BaseAddress };
        var local = await http.GetFromJsonAsync<JsonElement>($"/api/v1/eclipses/2025-03-14/local?{Harbourlight}");
        var expected = local.GetProperty("contacts").EnumerateArray().Select(c => c.GetProperty("local").GetString()![11..19]).ToList();
        var shown = await s.Page.Locator("#contacts tbody tr td:nth-child(2)").AllInnerTextsAsync();
        Assert.Equal(expected, shown.Select(t => t[..8]));
        Assert.StartsWith("23:57", shown[0], StringComparison.Ordinal); // P1 on the evening before, EDT
        Assert.Contains("14 Mar", shown[1], StringComparison.Ordinal); // U1 after midnight carries its date
        Assert.Empty(s.Errors);
    }

    [SkippableFact]
    public async Task Export_links_download_valid_files()
    {
        Chromium.RequireOrSkip();
        await using var s = await Open($"/?{Harbourlight}&date=2025-03-14", 1400);
        await s.Page.WaitForFunctionAsync("document.querySelectorAll('#exports a').length === 5");
        var csv = await s.Page.RunAndWaitForDownloadAsync(() => s.Page.ClickAsync("text=Contacts as CSV"));
        var csvText = await File.ReadAllTextAsync((await csv.PathAsync())!);
        Assert.StartsWith("kind,name,local_date,utc,local,", csvText, StringComparison.Ordinal);
        Assert.Equal(7, csvText.Split("\r\n", StringSplitOptions.RemoveEmptyEntries).Count(l => l.StartsWith("contact,", StringComparison.Ordinal)));
        var ics = await s.Page.RunAndWaitForDownloadAsync(() => s.Page.ClickAsync("text=Add to calendar (iCalendar)"));
        var icsText = await File.ReadAllTextAsync((await ics.PathAsync())!);
        Assert.StartsWith("BEGIN:VCALENDAR\r\n", icsText, StringComparison.Ordinal);
        Assert.Contains("BEGIN:VEVENT", icsText, StringComparison.Ordinal);
        Assert.Contains("/embed.html?", await s.Page.InputValueAsync("#embed-code"), StringComparison.Ordinal);
    }

    [SkippableFact]
    public async Task The_photographers_view_draws_the_exposure_timeline_framing_and_downloads()
    {
        Chromium.RequireOrSkip();
        // A partial eclipse the Hollowmere Hill site sees whole.
        await using var s = await Open("/?lat=47.31&lon=11.42&elevation=1120&tz=Europe/Vienna&date=2028-01-12", 1400);
        await s.Page.WaitForSelectorAsync("#photo:not([hidden])");
        await s.Page.FillAsync("#focal", "800");
        await s.Page.SelectOptionAsync("#mount", "sidereal");
        await s.Page.ClickAsync("#plan-photo");
        await s.Page.WaitForFunctionAsync("document.querySelector('#framing').textContent.includes('800 mm')");
        Assert.Equal(1, await s.Page.Locator("#exposure-chart polyline.exposure-line").CountAsync());
        Assert.Equal(1, await s.Page.Locator("#exposure-chart polygon.bracket-band").CountAsync());
        Assert.True(await s.Page.Locator("#exposure-chart .hour-tick").CountAsync() >= 2);
        var framing = await s.Page.InnerTextAsync("#framing");
        Assert.Contains("Field of view", framing, StringComparison.Ordinal);
        Assert.Contains("leaves a fixed frame", framing, StringComparison.Ordinal);
        Assert.Equal(3, await s.Page.Locator("#photo-downloads a").CountAsync());
        var csv = await s.Page.RunAndWaitForDownloadAsync(() => s.Page.ClickAsync("text=Exposure timeline as CSV"));
        Assert.StartsWith("utc,local,contact,phase", await File.ReadAllTextAsync((await csv.PathAsync())!), StringComparison.Ordinal);
        var problems = await s.Page.EvaluateAsync<string[]>(PageScripts.OverlappingLabels, "#exposure-chart");
        Assert.True(problems.Length == 0, string.Join("; ", problems));
        Assert.Empty(s.Errors);
        await s.ScreenshotAsync("photo-1400", "#photo");
    }

    [SkippableFact]
    public async Task A_bad_camera_value_is_shown_as_an_error_in_the_photographers_view()
    {
        Chromium.RequireOrSkip();
        await using var s = await Open("/?lat=47.31&lon=11.42&elevation=1120&tz=Europe/Vienna&date=2029-12-20", 390);
        await s.Page.WaitForSelectorAsync("#photo:not([hidden])");
        await s.Page.FillAsync("#focal", "0");
        await s.Page.ClickAsync("#plan-photo");
        await s.Page.WaitForSelectorAsync("#photo-error:not([hidden])");
        Assert.Contains("focalLength", await s.Page.InnerTextAsync("#photo-error"), StringComparison.Ordinal);
        Assert.False(await s.Page.IsVisibleAsync("#photo-result"));
        var low = await s.Page.EvaluateAsync<string[]>(PageScripts.LowContrast, 4.5);
        Assert.True(low.Length == 0, string.Join("; ", low.Take(10)));
        Assert.Empty(s.Errors);
        await s.ScreenshotAsync("error-photo-focal-390", "#photo");
    }

    [SkippableTheory]
    [InlineData(1400)]
    [InlineData(390)]
    public async Task The_photographers_view_plans_a_total_eclipse(int width)
    {
        Chromium.RequireOrSkip();
        // The page's example: a total eclipse (54 min of totality) the Hollowmere Hill site sees whole.
        await using var s = await Open("/?lat=47.31&lon=11.42&elevation=1120&tz=Europe/Vienna&date=2029-12-20", width);
        await s.Page.WaitForSelectorAsync("#photo:not([hidden])");
        await s.Page.SelectOptionAsync("#mount", "lunar");
        await s.Page.ClickAsync("#plan-photo");
        await s.Page.WaitForFunctionAsync("document.querySelector('#framing').textContent.includes('400 mm') && document.querySelector('#exposure-chart polyline.exposure-line')");
        Assert.Equal(1, await s.Page.Locator("#exposure-chart polygon.bracket-band").CountAsync());
        Assert.True(await s.Page.Locator("#exposure-chart .hour-tick").CountAsync() >= 3);
        // The total phase is drawn behind the curve.
        Assert.True(await s.Page.Locator("#exposure-chart rect.band-total").CountAsync() >= 1);
        var problems = await s.Page.EvaluateAsync<string[]>(PageScripts.OverlappingLabels, "#exposure-chart");
        Assert.True(problems.Length == 0, string.Join("; ", problems));
        if (width < 500)
        {
            var small = await s.Page.EvaluateAsync<string[]>(PageScripts.SmallTexts, 11);
            Assert.True(small.Length == 0, string.Join("; ", small.Take(10)));
            Assert.True(await s.Page.EvaluateAsync<bool>("document.documentElement.scrollWidth <= window.innerWidth"), "the page scrolls sideways");
        }
        Assert.Equal(3, await s.Page.Locator("#photo-downloads a").CountAsync());
        Assert.Empty(s.Errors);
        await s.ScreenshotAsync($"photo-total-{width}", "#photo");
    }

    [SkippableTheory]
    [InlineData(1400)]
    [InlineData(390)]
    public async Task Near_the_antimeridian_no_outline_crosses_the_map_and_the_site_stays_in_the_frame(int width)
    {
        Chromium.RequireOrSkip();
        // An invented island station at 17.8 S 178.0 E; the total eclipse of 2026-03-03 is seen all over the Pacific, so
        // its visibility outlines and several coastlines cross ±180°.
        await using var s = await Open("/?lat=-17.8&lon=178.0&elevation=10&tz=Pacific/Fiji&date=2026-03-03", width);
        await s.Page.WaitForFunctionAsync(ContactsDrawn + " && document.querySelector('#world-map .outline-eclipse')");
        var jumps = await s.Page.EvaluateAsync<string[]>(PageScripts.MapJumps);
        Assert.True(jumps.Length == 0, string.Join("; ", jumps.Take(10)));
        Assert.True(await s.Page.EvaluateAsync<bool>("""
            (() => { const m = document.querySelector('#world-map .site').getBoundingClientRect(), f = document.querySelector('#world-map').getBoundingClientRect();
              return m.left >= f.left && m.right <= f.right && m.top >= f.top && m.bottom <= f.bottom && Math.abs((m.left + m.right) / 2 - (f.left + f.right) / 2) < 2; })()
            """));
        Assert.Empty(s.Errors);
        await s.ScreenshotAsync($"antimeridian-map-{width}", "#world-map");
    }
}
