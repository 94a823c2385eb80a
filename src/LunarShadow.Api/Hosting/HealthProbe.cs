namespace LunarShadow.Api.Hosting;

/// <summary>A one-shot health probe for container runtimes that have no HTTP client of their own.</summary>
internal static class HealthProbe
{
    public static async Task<int> RunAsync(Uri url)
    {
        if (!url.IsLoopback) return 2;
        try
        {
            // Within the HEALTHCHECK's --timeout=10s, with room for the process to start on a busy node.
            using var client = new HttpClient { Timeout = TimeSpan.FromSeconds(8) };
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
