using Microsoft.Playwright;

namespace LunarShadow.Browser.Tests;

/// <summary>Debian's chromium driven by Playwright, headless. Missing locally: the tests skip with a message; in CI: they fail.</summary>
public sealed class Chromium : IAsyncLifetime
{
    public const string ExecutablePath = "/usr/bin/chromium";

    private IPlaywright? _playwright;

    public IBrowser? Browser { get; private set; }

    public static bool Available => File.Exists(ExecutablePath);

    public static bool InCi => string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);

    /// <summary>Skips the calling test when the browser is missing, unless running in CI, where that is a failure.</summary>
    public static void RequireOrSkip()
    {
        if (Available) return;
        if (InCi) Assert.Fail($"Chromium is missing at {ExecutablePath}; CI must install it (apt-get install -y chromium).");
        Skip.If(true, $"Browser tests skipped: no chromium at {ExecutablePath} (install it with: apt-get install -y chromium).");
    }

    public async Task InitializeAsync()
    {
        if (!Available) return;
        _playwright = await Playwright.CreateAsync();
        Browser = await _playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
        {
            ExecutablePath = ExecutablePath,
            Headless = true,
            Args = ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
        });
    }

    public async Task DisposeAsync()
    {
        if (Browser is not null) await Browser.CloseAsync();
        _playwright?.Dispose();
    }
}
