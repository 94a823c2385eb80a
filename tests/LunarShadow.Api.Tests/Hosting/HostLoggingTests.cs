using System.Net;
using Microsoft.AspNetCore.Mvc.Testing;

namespace LunarShadow.Api.Tests.Hosting;

/// <summary>Each host has its own logger, so hosts started side by side (as the test runner does) never collide.</summary>
public class HostLoggingTests
{
    [Fact]
    public async Task Hosts_started_side_by_side_each_log_with_their_own_logger_and_leave_the_static_logger_alone()
    {
        var before = Serilog.Log.Logger;
        var factories = Enumerable.Range(0, 6).Select(_ => new WebApplicationFactory<Program>()).ToList();
        try
        {
            // Start all hosts at once; a shared bootstrap logger would be frozen by the first and make the others throw.
            var statuses = await Task.WhenAll(factories.Select(f => Task.Run(async () =>
                (await f.CreateClient().GetAsync("/api/v1/eclipses/2025-03-14")).StatusCode)));
            Assert.All(statuses, s => Assert.Equal(HttpStatusCode.OK, s));
            Assert.Same(before, Serilog.Log.Logger);
        }
        finally
        {
            foreach (var f in factories) await f.DisposeAsync();
        }
        Assert.Same(before, Serilog.Log.Logger);
    }
}
