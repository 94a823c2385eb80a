using Microsoft.Playwright;

namespace LunarShadow.Browser.Tests;

/// <summary>One browser page at a given viewport, collecting console errors, with screenshots saved as test artifacts.</summary>
public sealed class PageSession(IBrowserContext context, IPage page) : IAsyncDisposable
{
    public IPage Page { get; } = page;

    /// <summary>Console errors and uncaught exceptions. Failed HTTP requests the page expects (4xx) are reported separately.</summary>
    public List<string> Errors { get; } = [];

    public static async Task<PageSession> OpenAsync(BrowserFixture fixture, string path, int width, int height = 900)
    {
        var context = await fixture.Chromium.Browser!.NewContextAsync(new BrowserNewContextOptions
        {
            AcceptDownloads = true,
            ViewportSize = new ViewportSize { Width = width, Height = height },
            DeviceScaleFactor = 1,
            // The tests' own probes (WaitForFunction with a string) are evaluated in the page; the page's policy forbids eval.
            BypassCSP = true,
        });
        var page = await context.NewPageAsync();
        var session = new PageSession(context, page);
        page.Console += (_, message) =>
        {
            // Chromium logs every 4xx answer as a console error; the error states are meant to get them.
            if (message.Type == "error" && !message.Text.Contains("status of 4", StringComparison.Ordinal)) session.Errors.Add($"{message.Text} ({message.Location})");
        };
        page.PageError += (_, error) => session.Errors.Add(error);
        await page.GotoAsync(new Uri(fixture.Service.BaseAddress, path).ToString());
        return session;
    }

    /// <summary>Saves a full-page screenshot under the test output's artifacts/ folder (not committed).</summary>
    public async Task ScreenshotAsync(string name)
    {
        var folder = Path.Combine(AppContext.BaseDirectory, "artifacts");
        Directory.CreateDirectory(folder);
        await Page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(folder, name + ".png"), FullPage = true });
    }

    /// <summary>Saves one element's screenshot.</summary>
    public async Task ScreenshotAsync(string name, string selector)
    {
        var folder = Path.Combine(AppContext.BaseDirectory, "artifacts");
        Directory.CreateDirectory(folder);
        await Page.Locator(selector).ScreenshotAsync(new LocatorScreenshotOptions { Path = Path.Combine(folder, name + ".png") });
    }

    public async ValueTask DisposeAsync() => await context.CloseAsync();
}
