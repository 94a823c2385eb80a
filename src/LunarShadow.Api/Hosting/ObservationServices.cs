using LunarShadow.Api.Common;
using LunarShadow.Api.Observations;
using Microsoft.Extensions.DependencyInjection.Extensions;

namespace LunarShadow.Api.Hosting;

/// <summary>The read side of the observers' log and what the endpoints derive from it.</summary>
internal static class ObservationServices
{
    public static IServiceCollection AddObservationReading(this IServiceCollection services)
    {
        // The empty default only when no storage backend registered a reader (before or after this call, the backend wins:
        // a later AddSingleton is the one resolved).
        services.TryAddSingleton<IObservationReader, NoObservations>();
        services.TryAddSingleton<IObservedNight, ObservedNightFromLog>();
        return services;
    }
}
