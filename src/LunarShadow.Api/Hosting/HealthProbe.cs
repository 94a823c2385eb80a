namespace LunarShadow.Api.Hosting;

/// <summary>A one-shot health probe for container runtimes that have no HTTP client of their own.</summary>
internal static class HealthProbe
{
    public static async Task<int> RunAsync(Uri url)
    {
        if (!url.IsLoopback) return 2;
        try
        {
            using var client = new HttpClient { Timeout = TimeSpan.FromSeconds(3) };
            using var response = await client.GetAsync(url);
            return response.IsSuccessStatusCode ? 0 : 1;
        }
        catch (HttpRequestException)
        {
            return 1;
        }
        catch (TaskCanceledException)
        {
            return 1;
        }
    }
}
