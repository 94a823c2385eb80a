using System.Text.Json.Nodes;
using Microsoft.Playwright;

namespace LunarShadow.Browser.Tests;

/// <summary>The night chart's sky shading comes from the service's classification, not from a copy in the page.</summary>
[Collection("browser")]
public class SkyShadingTests(BrowserFixture fixture)
{
    // The page's own colour for the served state "day" (js/timeline.js).
    private const string DayColour = "#5a6fa8";

    [SkippableFact]
    public async Task The_night_chart_shades_each_sample_by_the_sky_state_the_service_serves()
    {
        Chromium.RequireOrSkip();
        await using var s = await PageSession.OpenAsync(fixture, "/health/live", 1400);
        var served = 0;
        // Serve the real answer with every sample's state replaced by "day" while its Sun altitude still says night: a
        // page that classified the altitude itself would shade most of the chart dark.
        await s.Page.RouteAsync("**/api/v1/eclipses/*/local?**", async route =>
        {
            var response = await route.FetchAsync();
            var json = JsonNode.Parse(await response.TextAsync())!;
            if (json["track"] is JsonArray track)
            {
                foreach (var point in track) point!["sky"] = "day";
                served++;
            }
            // The body is re-encoded as plain JSON, so the answer's compression and length headers no longer apply.
            var headers = response.Headers.Where(h => h.Key is not ("content-encoding" or "content-length")).ToDictionary(h => h.Key, h => h.Value);
            await route.FulfillAsync(new RouteFulfillOptions { Status = response.Status, Headers = headers, Body = json.ToJsonString() });
        });
        await s.Page.GotoAsync(new Uri(fixture.Service.BaseAddress, "/").ToString());
        await s.Page.WaitForFunctionAsync("document.querySelectorAll('#timeline-chart rect.sky').length > 10", null, new PageWaitForFunctionOptions { Timeout = 120_000 });
        Assert.True(served > 0);
        var fills = await s.Page.EvaluateAsync<string[]>("[...document.querySelectorAll('#timeline-chart rect.sky')].map((r) => r.getAttribute('fill'))");
        Assert.All(fills, fill => Assert.Equal(DayColour, fill));
        Assert.Empty(s.Errors);
    }
}
