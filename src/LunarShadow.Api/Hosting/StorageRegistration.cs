using LunarShadow.Api.Observations;
using LunarShadow.Api.Observations.Keys;
using LunarShadow.Api.Observations.Storage;

namespace LunarShadow.Api.Hosting;

/// <summary>Registers the observers' log: the configured database, its migrations at start-up, the keys and the store.</summary>
internal static class StorageRegistration
{
    public static IServiceCollection AddObservationStorage(this IServiceCollection services, IConfiguration configuration)
    {
        services.AddSingleton(_ => StorageDialect.From(StorageOptions.From(configuration)));
        services.AddHostedService<StorageMigrator>();
        services.AddSingleton<KeyStore>();
        services.AddSingleton<ObservationStore>();
        services.AddSingleton<IObservationReader>(s => s.GetRequiredService<ObservationStore>());
        return services;
    }
}
