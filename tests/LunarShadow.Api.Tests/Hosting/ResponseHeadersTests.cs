using System.Net;
using System.Net.Http.Headers;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Hosting;

/// <summary>Headers for shared caches, browsers and other sites' pages.</summary>
public class ResponseHeadersTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    public static TheoryData<string> Everywhere => ["/api/v1/eclipses/2025-03-14", "/api/v1/eclipses/2025-03-14?format=csv", "/", "/embed.html", "/js/app.js", "/health/live", "/api/v1/eclipses/nope"];

    // WHATWG Fetch §3.5 (X-Content-Type-Options): nosniff stops browsers guessing a type other than the one sent.
    [Theory]
    [MemberData(nameof(Everywhere))]
    public async Task Every_answer_says_nosniff(string url) =>
        Assert.Equal("nosniff", (await _client.GetAsync(url)).Headers.GetValues("X-Content-Type-Options").Single());

    // RFC 9110 §12.5.5: a response chosen by the Accept header must list Accept in Vary, or a shared cache may hand a
    // CSV body to a caller that asked for JSON.
    [Theory]
    [InlineData("/api/v1/eclipses/2025-03-14", "text/csv")]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=47.07&lon=15.44", "text/calendar")]
    [InlineData("/api/v1/sites/upcoming?lat=47.07&lon=15.44&from=2025-01-01&count=2", "text/csv")]
    [InlineData("/api/v1/eclipses?from=2025-01-01&to=2026-12-31", "application/json")]
    public async Task Negotiated_answers_vary_by_Accept(string url, string accept)
    {
        var request = new HttpRequestMessage(HttpMethod.Get, url);
        request.Headers.Accept.Add(new MediaTypeWithQualityHeaderValue(accept));
        var response = await _client.SendAsync(request);
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal(accept, response.Content.Headers.ContentType?.MediaType);
        Assert.Contains("Accept", response.Headers.Vary);
        Assert.Contains("public", response.Headers.CacheControl!.ToString(), StringComparison.Ordinal);
    }

    // CSP Level 3, frame-ancestors: 'none' forbids framing the page; * lets any site embed the card.
    [Fact]
    public async Task The_page_may_not_be_framed_and_runs_only_its_own_scripts()
    {
        var page = await _client.GetAsync("/");
        Assert.Equal(HttpStatusCode.OK, page.StatusCode);
        var policy = page.Headers.GetValues("Content-Security-Policy").Single();
        Assert.Contains("frame-ancestors 'none'", policy, StringComparison.Ordinal);
        Assert.Contains("script-src 'self'", policy, StringComparison.Ordinal);
        // Scripts come only from the site itself; inline style attributes (the charts' own) are allowed, inline scripts not.
        Assert.Contains("script-src 'self';", policy, StringComparison.Ordinal);
        Assert.DoesNotContain("unsafe-eval", policy, StringComparison.Ordinal);
        Assert.Equal("DENY", page.Headers.GetValues("X-Frame-Options").Single());
        Assert.Contains("frame-ancestors 'none'", (await _client.GetAsync("/index.html")).Headers.GetValues("Content-Security-Policy").Single(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_embed_card_may_be_framed_by_any_site()
    {
        var card = await _client.GetAsync("/embed.html");
        Assert.Equal(HttpStatusCode.OK, card.StatusCode);
        var policy = card.Headers.GetValues("Content-Security-Policy").Single();
        Assert.Contains("frame-ancestors *", policy, StringComparison.Ordinal);
        Assert.Contains("script-src 'self'", policy, StringComparison.Ordinal);
        Assert.False(card.Headers.Contains("X-Frame-Options"));
    }

    // Fetch standard, CORS protocol: a simple cross-origin GET needs Access-Control-Allow-Origin; a preflight for GET
    // is answered with the allowed method; POST is not offered to other origins.
    [Fact]
    public async Task Other_sites_pages_may_read_the_GET_API()
    {
        var get = new HttpRequestMessage(HttpMethod.Get, "/api/v1/eclipses/2025-03-14");
        get.Headers.Add("Origin", "https://planetarium.example");
        var answer = await _client.SendAsync(get);
        Assert.Equal(HttpStatusCode.OK, answer.StatusCode);
        Assert.Equal("*", answer.Headers.GetValues("Access-Control-Allow-Origin").Single());
        Assert.Contains("ETag", answer.Headers.GetValues("Access-Control-Expose-Headers").Single(), StringComparison.Ordinal);

        var preflight = new HttpRequestMessage(HttpMethod.Options, "/api/v1/eclipses/2025-03-14/local?lat=1&lon=1");
        preflight.Headers.Add("Origin", "https://planetarium.example");
        preflight.Headers.Add("Access-Control-Request-Method", "GET");
        var allowed = await _client.SendAsync(preflight);
        Assert.True(allowed.IsSuccessStatusCode, ((int)allowed.StatusCode).ToString(System.Globalization.CultureInfo.InvariantCulture));
        Assert.Equal("*", allowed.Headers.GetValues("Access-Control-Allow-Origin").Single());
        Assert.Contains("GET", allowed.Headers.GetValues("Access-Control-Allow-Methods").Single(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Other_sites_pages_may_not_POST()
    {
        var preflight = new HttpRequestMessage(HttpMethod.Options, "/api/v1/eclipses/2025-03-14/local");
        preflight.Headers.Add("Origin", "https://planetarium.example");
        preflight.Headers.Add("Access-Control-Request-Method", "POST");
        preflight.Headers.Add("Access-Control-Request-Headers", "content-type");
        var refused = await _client.SendAsync(preflight);
        // The browser enforces the allowed methods: POST is not among them.
        var methods = refused.Headers.TryGetValues("Access-Control-Allow-Methods", out var m) ? string.Join(",", m) : "";
        Assert.DoesNotContain("POST", methods, StringComparison.OrdinalIgnoreCase);

        var post = new HttpRequestMessage(HttpMethod.Post, "/api/v1/eclipses/2025-03-14/local") { Content = new StringContent("{\"sites\":[{\"lat\":1,\"lon\":1}]}", System.Text.Encoding.UTF8, "application/json") };
        post.Headers.Add("Origin", "https://planetarium.example");
        Assert.False((await _client.SendAsync(post)).Headers.Contains("Access-Control-Allow-Origin"));
    }
}
