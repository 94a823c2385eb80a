using System.Net;
using System.Net.Http.Headers;
using LunarShadow.Api.Tests.Support;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;

namespace LunarShadow.Api.Tests.Hosting;

public class ServiceBehaviourTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    // RFC 9110 §13.1.2: a GET with If-None-Match naming the current strong ETag is answered 304 Not Modified.
    [Fact]
    public async Task Answers_carry_a_strong_ETag_and_a_matching_If_None_Match_gets_304()
    {
        var first = await _client.GetAsync("/api/v1/eclipses/2025-03-14");
        var tag = first.Headers.ETag;
        Assert.NotNull(tag);
        Assert.False(tag!.IsWeak);
        Assert.Contains(LunarShadow.Astronomy.Embedded.EmbeddedDataSet.VersionTag, tag.Tag, StringComparison.Ordinal);
        Assert.Contains("public", first.Headers.CacheControl!.ToString(), StringComparison.Ordinal);
        var again = new HttpRequestMessage(HttpMethod.Get, "/api/v1/eclipses/2025-03-14");
        again.Headers.IfNoneMatch.Add(tag);
        var second = await _client.SendAsync(again);
        Assert.Equal(HttpStatusCode.NotModified, second.StatusCode);
        Assert.Empty(await second.Content.ReadAsByteArrayAsync());
        var other = await _client.GetAsync("/api/v1/eclipses/2025-09-07");
        Assert.NotEqual(tag, other.Headers.ETag);
    }

    // Two fresh hosts, each computing the answer itself (neither can serve the other's output cache), must agree to the byte.
    [Fact]
    public async Task The_same_request_gives_the_same_bytes_from_two_fresh_hosts()
    {
        const string path = "/api/v1/eclipses/2022-11-08/local?lat=10&lon=20&tz=Africa/Lagos";
        await using var first = new ApiFactory();
        await using var second = new ApiFactory();
        var a = await first.CreateClient().GetByteArrayAsync(path);
        var b = await second.CreateClient().GetByteArrayAsync(path);
        Assert.NotEmpty(a);
        Assert.Equal(a, b);
    }

    [Fact]
    public async Task The_correlation_id_is_echoed_or_made()
    {
        var request = new HttpRequestMessage(HttpMethod.Get, "/api/v1/eclipses/2025-03-14");
        request.Headers.Add("X-Correlation-Id", "hollowmere-42");
        Assert.Equal("hollowmere-42", (await _client.SendAsync(request)).Headers.GetValues("X-Correlation-Id").Single());
        var made = (await _client.GetAsync("/api/v1/eclipses/2025-03-14")).Headers.GetValues("X-Correlation-Id").Single();
        Assert.False(string.IsNullOrWhiteSpace(made));
        var bad = new HttpRequestMessage(HttpMethod.Get, "/api/v1/eclipses/2025-03-14");
        bad.Headers.TryAddWithoutValidation("X-Correlation-Id", "<script>");
        Assert.NotEqual("<script>", (await _client.SendAsync(bad)).Headers.GetValues("X-Correlation-Id").Single());
    }

    [Fact]
    public async Task Health_endpoints_answer()
    {
        Assert.Equal(HttpStatusCode.OK, (await _client.GetAsync("/health/live")).StatusCode);
        var ready = await _client.GetAsync("/health/ready");
        Assert.Equal(HttpStatusCode.OK, ready.StatusCode);
        Assert.Equal("Healthy", await ready.Content.ReadAsStringAsync());
    }

    [Fact]
    public async Task Large_answers_are_compressed_on_request()
    {
        var request = new HttpRequestMessage(HttpMethod.Get, "/api/v1/eclipses?from=2000-01-01&to=2030-12-31");
        request.Headers.AcceptEncoding.Add(new StringWithQualityHeaderValue("gzip"));
        var response = await _client.SendAsync(request);
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains("gzip", response.Content.Headers.ContentEncoding);
    }
}

/// <summary>The limiter, with limits lowered through configuration as an operator would.</summary>
public class RateLimitTests
{
    [Fact]
    public async Task A_client_over_its_limit_gets_429_with_Retry_After()
    {
        await using var factory = new WebApplicationFactory<Program>().WithWebHostBuilder(b =>
        {
            b.UseSetting("RateLimiting:PermitsPerSecond", "0.000277778");
            b.UseSetting("RateLimiting:Burst", "3");
            b.UseSetting("RateLimiting:ReplenishmentSeconds", "3600"); // one token an hour (it flows in continuously): no refill during the test, however slow the machine
        });
        var client = factory.CreateClient();
        var statuses = new List<HttpStatusCode>();
        HttpResponseMessage? limited = null;
        for (var i = 0; i < 6; i++)
        {
            var response = await client.GetAsync("/api/v1/eclipses/2025-03-14");
            statuses.Add(response.StatusCode);
            if (response.StatusCode == HttpStatusCode.TooManyRequests) limited = response;
        }
        Assert.Contains(HttpStatusCode.OK, statuses);
        Assert.NotNull(limited);
        Assert.True(limited!.Headers.RetryAfter is not null);
        Assert.Equal("application/problem+json", limited.Content.Headers.ContentType?.MediaType);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/health/live")).StatusCode); // health is never limited
    }
}

/// <summary>Readiness covers what the service serves: the ephemeris and the page's files.</summary>
public class ReadinessTests
{
    private sealed class EmptyWebRoot(string path) : Microsoft.AspNetCore.Hosting.IStartupFilter
    {
        public Action<Microsoft.AspNetCore.Builder.IApplicationBuilder> Configure(Action<Microsoft.AspNetCore.Builder.IApplicationBuilder> next) => app =>
        {
            var environment = app.ApplicationServices.GetRequiredService<IWebHostEnvironment>();
            environment.WebRootPath = path;
            environment.WebRootFileProvider = new Microsoft.Extensions.FileProviders.PhysicalFileProvider(path);
            next(app);
        };
    }

    [Fact]
    public async Task Readiness_fails_when_the_page_files_are_missing_while_liveness_holds()
    {
        var empty = Directory.CreateTempSubdirectory("lunarshadow-no-wwwroot-");
        try
        {
            // The page's files gone from the web root, as in an image built without them.
            await using var factory = new WebApplicationFactory<Program>().WithWebHostBuilder(b =>
                b.ConfigureServices(s => s.AddSingleton<Microsoft.AspNetCore.Hosting.IStartupFilter>(new EmptyWebRoot(empty.FullName))));
            var client = factory.CreateClient();
            Assert.Equal(HttpStatusCode.ServiceUnavailable, (await client.GetAsync("/health/ready")).StatusCode);
            Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/health/live")).StatusCode);
        }
        finally
        {
            empty.Delete(recursive: true);
        }
    }
}
