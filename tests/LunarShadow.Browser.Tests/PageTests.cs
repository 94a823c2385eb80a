using System.Net.Http.Json;
using System.Text.Json;
using Microsoft.Playwright;

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

public class PageTests(BrowserFixture fixture) : IClassFixture<BrowserFixture>
{
    // An invented site for the page: the Saltmarsh Bay Planetarium's roof, at New York's coordinates.
    private const string Site = "lat=40.71&lon=-74.0&tz=America/New_York";

    private async Task<(IPage Page, List<string> Errors)> OpenAsync(string path)
    {
        var context = await fixture.Chromium.Browser!.NewContextAsync(new BrowserNewContextOptions { AcceptDownloads = true, ViewportSize = new ViewportSize { Width = 1200, Height = 1800 } });
        var page = await context.NewPageAsync();
        var errors = new List<string>();
        page.Console += (_, message) => { if (message.Type == "error") errors.Add(message.Text); };
        page.PageError += (_, error) => errors.Add(error);
        await page.GotoAsync(new Uri(fixture.Service.BaseAddress, path).ToString());
        return (page, errors);
    }

    [SkippableFact]
    public async Task The_page_loads_without_console_errors_and_lists_coming_eclipses()
    {
        Chromium.RequireOrSkip();
        var (page, errors) = await OpenAsync("/");
        await page.WaitForFunctionAsync("document.querySelectorAll('#eclipse option').length > 3");
        Assert.Empty(errors);
        Assert.Equal("LunarShadow — lunar eclipses from where you stand", await page.TitleAsync());
        Assert.True(await page.Locator("label[for=lat]").IsVisibleAsync());
    }

    [SkippableFact]
    public async Task A_site_and_an_eclipse_give_the_contact_table_and_three_charts_with_the_right_times()
    {
        Chromium.RequireOrSkip();
        var (page, errors) = await OpenAsync("/");
        await page.FillAsync("#lat", "40.71");
        await page.FillAsync("#lon", "-74.0");
        await page.FillAsync("#tz", "America/New_York");
        await page.FillAsync("#eclipse-date", "2025-03-14");
        await page.ClickAsync("#show");
        await page.WaitForFunctionAsync("document.querySelectorAll('#contacts tbody tr').length === 7");

        using var http = new HttpClient { BaseAddress = fixture.Service.BaseAddress };
        var local = await http.GetFromJsonAsync<JsonElement>($"/api/v1/eclipses/2025-03-14/local?{Site}");
        var expected = local.GetProperty("contacts").EnumerateArray().Select(c => c.GetProperty("local").GetString()![11..19]).ToList();
        var shown = await page.Locator("#contacts tbody tr td:nth-child(2)").AllInnerTextsAsync();
        Assert.Equal(expected, shown.Select(s => s[..8]));
        Assert.StartsWith("23:57", shown[0], StringComparison.Ordinal); // P1 on the evening before, EDT

        Assert.Equal(1, await page.Locator("#timeline-chart polyline.moon-altitude").CountAsync());
        Assert.Equal(7, await page.Locator("#timeline-chart line.contact-mark").CountAsync());
        Assert.Equal(1, await page.Locator("#shadow-diagram circle.umbra").CountAsync());
        Assert.Equal(7, await page.Locator("#shadow-diagram circle.moon-disc").CountAsync());
        Assert.True(await page.Locator("#world-map polygon.land").CountAsync() > 50);
        Assert.True(await page.Locator("#world-map g.region-whole-eclipse polygon").CountAsync() > 50);
        Assert.Contains("whole total eclipse is visible", await page.InnerTextAsync("#summary"), StringComparison.Ordinal);
        Assert.Empty(errors);

        var artefacts = Path.Combine(AppContext.BaseDirectory, "artifacts");
        Directory.CreateDirectory(artefacts);
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(artefacts, "page-2025-03-14-new-york.png"), FullPage = true });
    }

    [SkippableFact]
    public async Task Export_links_download_valid_files()
    {
        Chromium.RequireOrSkip();
        var (page, _) = await OpenAsync($"/?{Site}&date=2025-03-14");
        await page.WaitForFunctionAsync("document.querySelectorAll('#exports a').length === 4");
        var csv = await page.RunAndWaitForDownloadAsync(() => page.ClickAsync("text=Contacts as CSV"));
        var csvText = await File.ReadAllTextAsync((await csv.PathAsync())!);
        Assert.StartsWith("kind,name,local_date,utc,local,", csvText, StringComparison.Ordinal);
        Assert.Equal(7, csvText.Split("\r\n", StringSplitOptions.RemoveEmptyEntries).Count(l => l.StartsWith("contact,", StringComparison.Ordinal)));
        var ics = await page.RunAndWaitForDownloadAsync(() => page.ClickAsync("text=Add to calendar (iCalendar)"));
        var icsText = await File.ReadAllTextAsync((await ics.PathAsync())!);
        Assert.StartsWith("BEGIN:VCALENDAR\r\n", icsText, StringComparison.Ordinal);
        Assert.Contains("BEGIN:VEVENT", icsText, StringComparison.Ordinal);
        Assert.Contains("/embed.html?", await page.InputValueAsync("#embed-code"), StringComparison.Ordinal);
    }

    [SkippableFact]
    public async Task The_embed_card_shows_the_site_summary_in_the_chosen_theme()
    {
        Chromium.RequireOrSkip();
        var (page, errors) = await OpenAsync($"/embed.html?{Site}&date=2025-03-14&theme=light");
        await page.WaitForFunctionAsync("document.querySelectorAll('#contacts tbody tr').length === 7");
        Assert.Contains("Total lunar eclipse", await page.InnerTextAsync("#embed-title"), StringComparison.Ordinal);
        Assert.True(await page.EvaluateAsync<bool>("document.body.classList.contains('light')"));
        Assert.Empty(errors);
    }
}
