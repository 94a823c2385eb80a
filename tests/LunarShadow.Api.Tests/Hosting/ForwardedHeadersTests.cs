using System.Net;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;

namespace LunarShadow.Api.Tests.Hosting;

/// <summary>
/// Behind a reverse proxy each visitor gets its own rate-limit bucket, keyed on the address the proxy forwards in
/// X-Forwarded-For (de-facto standard; RFC 7239 describes the same information) — but only when the operator says the
/// proxy is trusted, so that a directly exposed service cannot be fooled by a forged header.
/// </summary>
public class ForwardedHeadersTests
{
    /// <summary>Makes every request arrive from one peer address, as a proxy's connections do.</summary>
    private sealed class FromPeer(string address) : IStartupFilter
    {
        public Action<IApplicationBuilder> Configure(Action<IApplicationBuilder> next) => app =>
        {
            app.Use((context, nextMiddleware) =>
            {
                context.Connection.RemoteIpAddress = IPAddress.Parse(address);
                return nextMiddleware(context);
            });
            next(app);
        };
    }

    private static WebApplicationFactory<Program> Host(Action<IWebHostBuilder> configure) => new WebApplicationFactory<Program>().WithWebHostBuilder(b =>
    {
        b.UseSetting("RateLimiting:PermitsPerSecond", "0.000277778");
        b.UseSetting("RateLimiting:Burst", "2");
        b.UseSetting("RateLimiting:ReplenishmentSeconds", "3600"); // one token an hour (it flows in continuously): no refill during the test, however slow the machine
        configure(b);
    });

    // Each of two visitors sends three requests within their burst of 2: the third of each is refused only when
    // every visitor has a bucket of its own; with one shared bucket the second visitor is refused at once.
    private static async Task<(List<HttpStatusCode> First, List<HttpStatusCode> Second)> TwoVisitors(WebApplicationFactory<Program> factory)
    {
        var client = factory.CreateClient();
        async Task<List<HttpStatusCode>> Visit(string address)
        {
            var statuses = new List<HttpStatusCode>();
            for (var i = 0; i < 2; i++)
            {
                var request = new HttpRequestMessage(HttpMethod.Get, "/api/v1/eclipses/2025-03-14");
                request.Headers.Add("X-Forwarded-For", address);
                statuses.Add((await client.SendAsync(request)).StatusCode);
            }
            return statuses;
        }
        return (await Visit("203.0.113.7"), await Visit("198.51.100.23"));
    }

    [Fact]
    public async Task Without_a_trusted_proxy_X_Forwarded_For_is_ignored_and_the_peer_is_the_client()
    {
        await using var factory = Host(_ => { });
        var (first, second) = await TwoVisitors(factory);
        Assert.Equal([HttpStatusCode.OK, HttpStatusCode.OK], first);
        Assert.Equal([HttpStatusCode.TooManyRequests, HttpStatusCode.TooManyRequests], second);
    }

    [Fact]
    public async Task Under_the_ASPNETCORE_FORWARDEDHEADERS_ENABLED_convention_each_forwarded_client_has_its_own_bucket()
    {
        await using var factory = Host(b => b.UseSetting("ForwardedHeaders_Enabled", "true"));
        var (first, second) = await TwoVisitors(factory);
        Assert.Equal([HttpStatusCode.OK, HttpStatusCode.OK], first);
        Assert.Equal([HttpStatusCode.OK, HttpStatusCode.OK], second);
    }

    [Fact]
    public async Task A_configured_known_proxy_is_believed_and_each_forwarded_client_has_its_own_bucket()
    {
        await using var factory = Host(b =>
        {
            b.UseSetting("ForwardedHeaders:KnownProxies:0", "10.1.2.3");
            b.ConfigureServices(s => s.AddSingleton<IStartupFilter>(new FromPeer("10.1.2.3")));
        });
        var (first, second) = await TwoVisitors(factory);
        Assert.Equal([HttpStatusCode.OK, HttpStatusCode.OK], first);
        Assert.Equal([HttpStatusCode.OK, HttpStatusCode.OK], second);
    }

    [Fact]
    public async Task A_peer_outside_the_configured_networks_is_not_believed()
    {
        await using var factory = Host(b =>
        {
            b.UseSetting("ForwardedHeaders:KnownNetworks:0", "10.0.0.0/8");
            b.ConfigureServices(s => s.AddSingleton<IStartupFilter>(new FromPeer("192.0.2.99")));
        });
        var (first, second) = await TwoVisitors(factory);
        Assert.Equal([HttpStatusCode.OK, HttpStatusCode.OK], first);
        Assert.Equal([HttpStatusCode.TooManyRequests, HttpStatusCode.TooManyRequests], second);
    }
}
