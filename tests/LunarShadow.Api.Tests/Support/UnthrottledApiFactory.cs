using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;

namespace LunarShadow.Api.Tests.Support;

/// <summary>An in-memory host whose rate limit is raised, for tests that walk many eclipses and sites.</summary>
public sealed class UnthrottledApiFactory : WebApplicationFactory<Program>
{
    protected override void ConfigureWebHost(IWebHostBuilder builder) => RaiseLimits(builder);

    /// <summary>Raises the rate and cost limits and the request deadline far above anything a test sends.</summary>
    public static void RaiseLimits(IWebHostBuilder builder)
    {
        builder.UseSetting("RateLimiting:PermitsPerSecond", "1000000");
        builder.UseSetting("RateLimiting:Burst", "1000000");
        builder.UseSetting("RateLimiting:ExpensivePerClient", "64");
        builder.UseSetting("RateLimiting:ExpensiveQueuePerClient", "100000");
        builder.UseSetting("RateLimiting:ExpensiveTotal", "64");
        builder.UseSetting("RateLimiting:ExpensiveQueueTotal", "100000");
        builder.UseSetting("RequestTimeoutSeconds", "300");
    }
}

/// <summary>The export tests share one unthrottled host (one start-up, one logger).</summary>
[CollectionDefinition(Name)]
public sealed class ExportHost : ICollectionFixture<UnthrottledApiFactory>
{
    public const string Name = "exports";
}
