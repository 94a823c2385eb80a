using System.Net;
using System.Text.RegularExpressions;

namespace LunarShadow.Browser.Tests;

/// <summary>The embeddable card, at the size its own snippet suggests, in both themes.</summary>
[Collection("browser")]
public partial class EmbedTests(BrowserFixture fixture)
{
    [GeneratedRegex("""src="([^"]+)" width="(\d+)" height="(\d+)"\s""")]
    private static partial Regex FrameAttributes();

    [SkippableTheory]
    [InlineData("dark")]
    [InlineData("light")]
    public async Task The_card_at_its_suggested_size_shows_every_row_the_date_and_zone_in_the_chosen_theme_with_AA_contrast(string theme)
    {
        Chromium.RequireOrSkip();
        await using var page = await PageSession.OpenAsync(fixture, "/?lat=47.31&lon=11.42&elevation=1120&tz=Europe/Vienna&date=2029-12-20", 1400);
        await page.Page.WaitForFunctionAsync("document.querySelector('#embed-code').value.includes('embed.html')");
        await page.Page.SelectOptionAsync("#embed-theme", theme);
        var snippet = await page.Page.InputValueAsync("#embed-code");
        var m = FrameAttributes().Match(snippet);
        Assert.True(m.Success, snippet);
        var src = WebUtility.HtmlDecode(m.Groups[1].Value);
        Assert.Single(Regex.Matches(src, "theme="));
        var (width, height) = (int.Parse(m.Groups[2].Value), int.Parse(m.Groups[3].Value));

        await using var card = await PageSession.OpenAsync(fixture, new Uri(src).PathAndQuery, width, height);
        await card.Page.WaitForFunctionAsync("document.querySelectorAll('#contacts tbody tr').length === 7");
        Assert.Equal(theme == "light", await card.Page.EvaluateAsync<bool>("document.body.classList.contains('light')"));
        Assert.Contains("20 Dec 2029", await card.Page.InnerTextAsync("#embed-title"), StringComparison.Ordinal);
        Assert.Contains("CET", await card.Page.InnerTextAsync("#embed-when"), StringComparison.Ordinal);
        // Every row, every cell and the link below the table lie fully inside the frame; nothing scrolls.
        var outside = await card.Page.EvaluateAsync<string[]>("""
            () => [...document.querySelectorAll('#contacts tr, #contacts td, #contacts th, #more')]
              .filter((e) => { const r = e.getBoundingClientRect(); return r.bottom > innerHeight || r.right > innerWidth || r.left < 0; })
              .map((e) => e.textContent)
            """);
        Assert.True(outside.Length == 0, "outside the frame: " + string.Join(", ", outside));
        Assert.True(await card.Page.EvaluateAsync<bool>("document.documentElement.scrollWidth <= innerWidth && document.documentElement.scrollHeight <= innerHeight"));
        var low = await card.Page.EvaluateAsync<string[]>(PageScripts.LowContrast, 4.5);
        Assert.True(low.Length == 0, string.Join("; ", low));
        Assert.Empty(card.Errors);
        await card.ScreenshotAsync($"embed-{theme}-{width}x{height}");
    }

    [SkippableFact]
    public async Task The_card_reports_its_height_to_the_host_page()
    {
        Chromium.RequireOrSkip();
        await using var host = await PageSession.OpenAsync(fixture, "/embed.html", 600);
        var height = await host.Page.EvaluateAsync<int>("""
            () => new Promise((resolve) => {
              addEventListener('message', (e) => { if (e.data && e.data.type === 'lunarshadow:height' && e.data.height > 200) resolve(e.data.height); });
              const f = document.createElement('iframe');
              f.src = '/embed.html?lat=47.31&lon=11.42&tz=Europe/Vienna&date=2029-12-20';
              document.body.appendChild(f);
            })
            """);
        Assert.InRange(height, 200, 800);
    }

    [SkippableFact]
    public async Task Without_parameters_the_card_explains_what_it_needs()
    {
        Chromium.RequireOrSkip();
        await using var card = await PageSession.OpenAsync(fixture, "/embed.html", 420, 470);
        await card.Page.WaitForSelectorAsync("#needs:not([hidden])");
        var text = await card.Page.InnerTextAsync("#needs");
        foreach (var word in new[] { "date", "lat", "lon", "tz", "theme" }) Assert.Contains(word, text, StringComparison.Ordinal);
        Assert.DoesNotContain("Not Found", await card.Page.InnerTextAsync("body"), StringComparison.Ordinal);
        Assert.Empty(card.Errors);
        await card.ScreenshotAsync("embed-no-parameters");
    }

    // The main page has one theme (dark); the only theme switch on it is the embed snippet's, checked above for both
    // of the card's themes. Here: the page with every section drawn, and the error panel, at both widths.
    [SkippableTheory]
    [InlineData(1400)]
    [InlineData(390)]
    public async Task The_main_page_text_passes_AA_contrast(int width)
    {
        Chromium.RequireOrSkip();
        await using var page = await PageSession.OpenAsync(fixture, "/", width);
        await page.Page.WaitForFunctionAsync("document.querySelectorAll('#timeline-chart .hour-tick').length > 0 && document.querySelectorAll('#crater-table tbody tr').length > 40 && document.querySelector('#shadow-diagram .feature-label')");
        var low = await page.Page.EvaluateAsync<string[]>(PageScripts.LowContrast, 4.5);
        Assert.True(low.Length == 0, string.Join("; ", low.Take(10)));
        await page.ScreenshotAsync($"contrast-page-{width}");

        await using var error = await PageSession.OpenAsync(fixture, "/?lat=123&lon=11.42&tz=Europe/Vienna&date=2029-12-20", width);
        await error.Page.WaitForSelectorAsync("#error:not([hidden])");
        var lowError = await error.Page.EvaluateAsync<string[]>(PageScripts.LowContrast, 4.5);
        Assert.True(lowError.Length == 0, string.Join("; ", lowError.Take(10)));
        Assert.Empty(page.Errors);
        Assert.Empty(error.Errors);
        await error.ScreenshotAsync($"contrast-error-{width}");
    }
}
