using System.Net;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Reading the client's address behind a reverse proxy, so that logs and per-client limits see the visitor rather than
/// the proxy. Two ways, both off by default (a directly exposed service must not believe X-Forwarded-For):
/// <list type="bullet">
/// <item><c>ASPNETCORE_FORWARDEDHEADERS_ENABLED=true</c>, ASP.NET Core's own convention: X-Forwarded-For and
/// X-Forwarded-Proto are taken from any peer. For a pod behind an ingress that nothing else can reach.</item>
/// <item><c>ForwardedHeaders:KnownProxies</c> (addresses) and/or <c>ForwardedHeaders:KnownNetworks</c> (CIDR ranges):
/// only those peers are believed. For production behind a proxy at a known address. These win over the convention.</item>
/// </list>
/// One proxy hop is read (the address the nearest trusted proxy appended); set <c>ForwardedHeaders:ForwardLimit</c> for more.
/// </summary>
internal static class ForwardedHeaders
{
    /// <summary>The configuration key of ASP.NET Core's convention (from the environment variable ASPNETCORE_FORWARDEDHEADERS_ENABLED).</summary>
    public const string ConventionKey = "ForwardedHeaders_Enabled";

    private static bool ConventionEnabled(IConfiguration configuration) =>
        string.Equals(configuration[ConventionKey], "true", StringComparison.OrdinalIgnoreCase);

    private static (string[] Proxies, string[] Networks) Known(IConfiguration configuration) => (
        configuration.GetSection("ForwardedHeaders:KnownProxies").Get<string[]>() ?? [],
        configuration.GetSection("ForwardedHeaders:KnownNetworks").Get<string[]>() ?? []);

    public static IServiceCollection AddLunarShadowForwardedHeaders(this IServiceCollection services, IConfiguration configuration)
    {
        var (proxies, networks) = Known(configuration);
        if (proxies.Length == 0 && networks.Length == 0) return services;
        var parsedProxies = proxies.Select(p => IPAddress.TryParse(p.Trim(), out var a) ? a
            : throw new InvalidOperationException($"ForwardedHeaders:KnownProxies holds '{p}', which is not an IP address.")).ToList();
        var parsedNetworks = networks.Select(n => System.Net.IPNetwork.TryParse(n.Trim(), out var net) ? net
            : throw new InvalidOperationException($"ForwardedHeaders:KnownNetworks holds '{n}', which is not a CIDR range such as 10.0.0.0/8.")).ToList();
        var limit = configuration.GetValue<int?>("ForwardedHeaders:ForwardLimit") ?? 1;
        // PostConfigure runs after the framework's own (which, under the convention, trusts every peer), so these win.
        services.PostConfigure<ForwardedHeadersOptions>(options =>
        {
            options.ForwardedHeaders = Microsoft.AspNetCore.HttpOverrides.ForwardedHeaders.XForwardedFor | Microsoft.AspNetCore.HttpOverrides.ForwardedHeaders.XForwardedProto;
            options.ForwardLimit = Math.Max(1, limit);
            options.KnownProxies.Clear();
            options.KnownIPNetworks.Clear();
            foreach (var p in parsedProxies) options.KnownProxies.Add(p);
            foreach (var n in parsedNetworks) options.KnownIPNetworks.Add(n);
        });
        return services;
    }

    /// <summary>
    /// Reads the forwarded headers when known proxies or networks are configured. (Under the convention alone the
    /// framework already does this first thing in the pipeline, with the options above if any.)
    /// </summary>
    public static WebApplication UseLunarShadowForwardedHeaders(this WebApplication app)
    {
        var (proxies, networks) = Known(app.Configuration);
        if ((proxies.Length > 0 || networks.Length > 0) && !ConventionEnabled(app.Configuration)) app.UseForwardedHeaders();
        return app;
    }
}
