using LunarShadow.Api.Observations;
using LunarShadow.Api.Tests.Support;
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
        UnthrottledApiFactory.RaiseLimits(builder);
        builder.ConfigureTestServices(services => services.AddSingleton<IObservationReader>(Log));
    }
}
