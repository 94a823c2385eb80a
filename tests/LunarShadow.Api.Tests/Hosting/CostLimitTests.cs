using System.Net;
using Microsoft.AspNetCore.Mvc.Testing;

namespace LunarShadow.Api.Tests.Hosting;

/// <summary>What one client can cost the service is bounded, not only how often it may ask.</summary>
public class CostLimitTests
{
    // A search nothing satisfies over the longest scan allowed (1000 years), on a finder no other test warms (its own
    // layer height): seconds of work.
    private static string Hopeless(string layerKm) => $"/api/v1/sites/upcoming?lat=89.9&lon=0&from=-1999-01-01&years=1000&phase=total&night=true&count=50&shadow=layer&layerKm={layerKm}";

    // A host where the request rate never limits, and each client has one expensive turn and no queue.
    private static WebApplicationFactory<Program> OneExpensiveTurnPerClient() => new WebApplicationFactory<Program>().WithWebHostBuilder(b =>
    {
        b.UseSetting("RateLimiting:PermitsPerSecond", "1000");
        b.UseSetting("RateLimiting:Burst", "1000");
        b.UseSetting("RateLimiting:ExpensivePerClient", "1");
        b.UseSetting("RateLimiting:ExpensiveQueuePerClient", "0");
        b.UseSetting("RequestTimeoutSeconds", "15");
    });

    [Fact]
    public async Task A_client_runs_one_expensive_request_at_a_time_while_its_cheap_requests_still_get_through()
    {
        await using var factory = OneExpensiveTurnPerClient();
        var client = factory.CreateClient();
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/api/v1/eclipses/2025-03-14")).StatusCode); // host started
        var first = client.GetAsync(Hopeless("234.5"));
        // Long enough for the first to take its turn on a slow machine, short enough that a quiet one has not finished it
        // (either way exactly one of the two runs and the other is refused).
        await Task.Delay(50);
        var second = client.GetAsync(Hopeless("234.6"));
        // While one search runs, the same client's cheap requests still get through.
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/api/v1/eclipses/2025-03-14/local?lat=47.07&lon=15.44")).StatusCode);
        var statuses = new[] { (await first).StatusCode, (await second).StatusCode };
        // One was refused at once with 429; the other ran (to its end, or to its 15 s deadline on a slow machine).
        Assert.Single(statuses, HttpStatusCode.TooManyRequests);
        Assert.Single(statuses, s => s is HttpStatusCode.OK or HttpStatusCode.ServiceUnavailable);
    }

    [Fact]
    public async Task A_stored_search_answer_is_served_at_once_even_while_the_client_has_a_search_running()
    {
        await using var factory = OneExpensiveTurnPerClient();
        var client = factory.CreateClient();
        const string Stored = "/api/v1/sites/upcoming?lat=47.07&lon=15.44&from=2025-01-01&count=1";
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync(Stored)).StatusCode);
        var running = client.GetAsync(Hopeless("345.6"));
        await Task.Delay(500);
        // The client's one expensive turn is taken and it may not queue, yet the stored answer comes from the output
        // cache (which answers before the concurrency limit), not a 429. RFC 9111 §5.1: a cache sends Age.
        var again = await client.GetAsync(Stored);
        Assert.Equal(HttpStatusCode.OK, again.StatusCode);
        Assert.NotNull(again.Headers.Age);
        // And a new search from the same client is still refused while the first runs (or has run to its deadline).
        var other = await client.GetAsync(Hopeless("345.7"));
        Assert.True(other.StatusCode == HttpStatusCode.TooManyRequests || running.IsCompleted, $"{(int)other.StatusCode}");
        Assert.True((await running).StatusCode is HttpStatusCode.OK or HttpStatusCode.ServiceUnavailable);
    }

    [Fact]
    public async Task The_OpenAPI_document_is_built_once_and_counts_against_the_rate_limit()
    {
        await using var factory = new WebApplicationFactory<Program>().WithWebHostBuilder(b =>
        {
            b.UseSetting("RateLimiting:PermitsPerSecond", "0.000277778");
            b.UseSetting("RateLimiting:Burst", "2");
            b.UseSetting("RateLimiting:ReplenishmentSeconds", "3600"); // one token an hour (it flows in continuously): no refill during the test, however slow the machine
        });
        var client = factory.CreateClient();
        var first = await client.GetAsync("/openapi/v1.json");
        var second = await client.GetAsync("/openapi/v1.json");
        Assert.Equal(HttpStatusCode.OK, first.StatusCode);
        Assert.Equal(HttpStatusCode.OK, second.StatusCode);
        Assert.Equal(await first.Content.ReadAsStringAsync(), await second.Content.ReadAsStringAsync());
        // RFC 9111 §5.1: Age is sent by a cache; the output cache sends it when it answers from what it stored.
        Assert.NotNull(second.Headers.Age);
        // A burst of 2 with one token a second: quick repeats of the (now cached) document run out.
        var statuses = new List<HttpStatusCode>();
        for (var i = 0; i < 6; i++) statuses.Add((await client.GetAsync("/openapi/v1.json")).StatusCode);
        Assert.Contains(HttpStatusCode.TooManyRequests, statuses);
    }
}
