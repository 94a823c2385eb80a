using LunarShadow.Api.Observations;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.AspNetCore.TestHost;
using Microsoft.Extensions.DependencyInjection;

namespace LunarShadow.Api.Tests.Observations;

/// <summary>An unthrottled in-memory host whose observers' log is an <see cref="InMemoryObservations"/> the test fills.</summary>
public sealed class ObservationsApiFactory : WebApplicationFactory<Program>
{
    public InMemoryObservations Log { get; } = new();

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        builder.UseSetting("RateLimiting:PermitsPerSecond", "1000000");
        builder.UseSetting("RateLimiting:Burst", "1000000");
        builder.UseSetting("RateLimiting:ExpensivePerClient", "64");
        builder.UseSetting("RateLimiting:ExpensiveQueuePerClient", "100000");
        builder.UseSetting("RateLimiting:ExpensiveTotal", "64");
        builder.UseSetting("RateLimiting:ExpensiveQueueTotal", "100000");
        builder.UseSetting("RequestTimeoutSeconds", "300");
        builder.ConfigureTestServices(services => services.AddSingleton<IObservationReader>(Log));
    }
}
