using System.Net.Http.Json;
using System.Text.Json;

namespace LunarShadow.Browser.Tests;

/// <summary>The crater timings on the page: the table, the disc chart, and the features on the shadow diagram.</summary>
[Collection("browser")]
public class CraterTests(BrowserFixture fixture)
{
    // The invented Hollowmere Hill Public Observatory (the page's own example) and its 2029-12-20 total eclipse.
    private const string Hollowmere = "lat=47.31&lon=11.42&elevation=1120&tz=Europe/Vienna";

    private const string CratersDrawn = "document.querySelectorAll('#crater-table tbody tr').length > 40 && document.querySelector('#shadow-diagram .feature-dot')";

    [SkippableTheory]
    [InlineData(1400)]
    [InlineData(390)]
    public async Task The_crater_table_lists_the_features_in_time_order_in_local_time_and_no_chart_label_overlaps(int width)
    {
        Chromium.RequireOrSkip();
        await using var s = await PageSession.OpenAsync(fixture, $"/?{Hollowmere}&date=2029-12-20", width);
        await s.Page.WaitForFunctionAsync(CratersDrawn);

        // The API's answer, asked directly: the table must show its order and its local times.
        using var http = new HttpClient { BaseAddress = fixture.Service.BaseAddress };
        var answer = await http.GetFromJsonAsync<JsonElement>($"/api/v1/eclipses/2029-12-20/craters?{Hollowmere}");
        var features = answer.GetProperty("features").EnumerateArray().ToList();
        var names = await s.Page.Locator("#crater-table tbody tr td:nth-child(1)").AllInnerTextsAsync();
        var immersions = await s.Page.Locator("#crater-table tbody tr td:nth-child(2)").AllInnerTextsAsync();
        Assert.Equal(features.Select(f => f.GetProperty("name").GetString()), names);

        // Time order: every reached feature's immersion (UTC) is no earlier than the one above it; unreached ones last.
        var reached = features.TakeWhile(f => f.GetProperty("reachedByUmbra").GetBoolean()).ToList();
        Assert.True(reached.Count >= 40, $"{reached.Count} features reached in a total eclipse");
        Assert.All(features.Skip(reached.Count), f => Assert.False(f.GetProperty("reachedByUmbra").GetBoolean()));
        var utc = reached.Select(f => DateTimeOffset.Parse(f.GetProperty("immersion").GetProperty("utc").GetString()!, System.Globalization.CultureInfo.InvariantCulture)).ToList();
        Assert.Equal(utc.OrderBy(t => t), utc);

        // Local times: CET is UTC+1 in December, so each shown time is the API's local clock, an hour after UTC.
        for (var i = 0; i < reached.Count; i++)
        {
            var local = reached[i].GetProperty("immersion").GetProperty("local").GetString()!;
            Assert.EndsWith("+01:00", local, StringComparison.Ordinal);
            Assert.Equal(local[11..19], immersions[i]);
            Assert.Equal(utc[i].ToOffset(TimeSpan.FromHours(1)).ToString("HH:mm:ss", System.Globalization.CultureInfo.InvariantCulture), immersions[i]);
        }
        Assert.Contains("Europe/Vienna", await s.Page.InnerTextAsync("#craters"), StringComparison.Ordinal);

        // The disc chart names ten well-known features; the shadow diagram names a few on the Moon at greatest.
        Assert.Equal(10, await s.Page.Locator("#crater-disc .crater-name").CountAsync());
        Assert.Equal(width < 500 ? 6 : 8, await s.Page.Locator("#shadow-diagram .feature-label").CountAsync());
        foreach (var chart in new[] { "#crater-disc", "#shadow-diagram" })
        {
            var problems = await s.Page.EvaluateAsync<string[]>(PageScripts.OverlappingLabels, chart);
            Assert.True(problems.Length == 0, $"{chart} at {width} px: {string.Join("; ", problems)}");
        }

        // Every feature dot lies on the enlarged Moon at greatest eclipse below the shadow diagram.
        var offDisc = await s.Page.EvaluateAsync<string[]>("""
            () => {
              const moon = document.querySelector('#shadow-diagram .moon-enlarged');
              const [cx, cy, r] = ['cx', 'cy', 'r'].map((k) => +moon.getAttribute(k));
              return [...document.querySelectorAll('#shadow-diagram .feature-dot')]
                .filter((d) => Math.hypot(+d.getAttribute('cx') - cx, +d.getAttribute('cy') - cy) > r + 0.5)
                .map((d) => d.textContent);
            }
            """);
        Assert.True(offDisc.Length == 0, "off the Moon: " + string.Join(", ", offDisc));
        if (width < 500)
        {
            var small = await s.Page.EvaluateAsync<string[]>(PageScripts.SmallTexts, 11);
            Assert.True(small.Length == 0, string.Join("; ", small.Take(10)));
            Assert.True(await s.Page.EvaluateAsync<bool>("document.documentElement.scrollWidth <= window.innerWidth"), "the page scrolls sideways");
        }
        // The table fits its panel: no column hidden behind a sideways scroll.
        Assert.True(await s.Page.EvaluateAsync<bool>("(() => { const w = document.querySelector('#crater-table').parentElement; return w.scrollWidth <= w.clientWidth + 1; })()"), "the crater table scrolls sideways");
        Assert.Empty(s.Errors);
        await s.ScreenshotAsync($"craters-{width}", "#craters");
        await s.ScreenshotAsync($"shadow-features-{width}", "#shadow-diagram");
    }

    [SkippableFact]
    public async Task A_page_error_hides_the_crater_timings()
    {
        Chromium.RequireOrSkip();
        await using var s = await PageSession.OpenAsync(fixture, $"/?{Hollowmere}&date=2029-12-20", 1400);
        await s.Page.WaitForFunctionAsync(CratersDrawn);
        await s.Page.FillAsync("#lat", "123");
        await s.Page.ClickAsync("#show");
        await s.Page.WaitForSelectorAsync("#error:not([hidden])");
        Assert.False(await s.Page.IsVisibleAsync("#craters"));
        Assert.Empty(s.Errors);
    }
}
