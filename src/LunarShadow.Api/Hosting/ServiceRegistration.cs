using System.Text.Json.Serialization;
using Serilog;

namespace LunarShadow.Api.Hosting;

/// <summary>Registers the services the web host needs.</summary>
internal static class ServiceRegistration
{
    public static WebApplicationBuilder AddLunarShadowServices(this WebApplicationBuilder builder)
    {
        builder.Services.AddSerilog((services, configuration) => configuration
            .ReadFrom.Configuration(builder.Configuration)
            .ReadFrom.Services(services)
            .Enrich.FromLogContext());
        builder.Services.AddSingleton<NodaTime.IClock>(NodaTime.SystemClock.Instance);
        builder.Services.AddProblemDetails();
        // Numbers are written and read as JSON numbers only, so the OpenAPI schema shows them as such.
        builder.Services.ConfigureHttpJsonOptions(options => options.SerializerOptions.NumberHandling = JsonNumberHandling.Strict);
        builder.Services.AddOpenApi("v1", options => options.AddDocumentTransformer((document, _, _) =>
        {
            document.Info.Title = "LunarShadow";
            document.Info.Description = "Lunar eclipses for your own site and time zone: ephemeris, shadow, eclipses, local circumstances and photography plans, computed from ELP/MPP02 and VSOP87 at request time.";
            return Task.CompletedTask;
        }));
        return builder;
    }
}
