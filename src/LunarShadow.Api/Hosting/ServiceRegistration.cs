using System.Text.Json.Serialization;
using Serilog;

namespace LunarShadow.Api.Hosting;

/// <summary>Registers the services the web host needs.</summary>
internal static class ServiceRegistration
{
    public static WebApplicationBuilder AddLunarShadowServices(this WebApplicationBuilder builder)
    {
        // One logger per host, never the static Log.Logger: hosts started side by side (the API tests run several at
        // once) must not share, replace or freeze a global logger.
        builder.Services.AddSerilog((services, configuration) => configuration
            .ReadFrom.Configuration(builder.Configuration)
            .ReadFrom.Services(services)
            .Enrich.FromLogContext(), preserveStaticLogger: true);
        builder.Services.AddSingleton<NodaTime.IClock>(NodaTime.SystemClock.Instance);
        builder.Services.AddLunarShadowForwardedHeaders(builder.Configuration);
        // The eclipse caches, one set per host; a range search splits its work over every core the options allow while it is
        // the only request, and over ThreadsPerSearch as soon as another request is in flight.
        var inFlight = new RequestsInFlight(RateLimiting.Options(builder.Configuration));
        WorkerThreadFloor.Apply();
        builder.Services.AddSingleton(inFlight);
        builder.Services.AddSingleton(new LunarShadow.Astronomy.Eclipses.EclipseFinders(model =>
            LunarShadow.Astronomy.Eclipses.EclipseFinder.OnEmbeddedEphemerides(model, inFlight.ThreadsForNextSearchStep)));
        builder.Services.AddObservationStorage(builder.Configuration);
        builder.Services.AddObservationReading();
        builder.Services.AddLunarShadowRateLimiting(builder.Configuration);
        builder.Services.AddPublicReadCors();
        builder.Services.AddSingleton<PipelineWarmUp>();
        builder.Services.AddHealthChecks().AddCheck<ReadinessCheck>("ephemeris", tags: ["ready"]);
        builder.Services.AddResponseCompression(options =>
        {
            options.EnableForHttps = true;
            options.MimeTypes = Microsoft.AspNetCore.ResponseCompression.ResponseCompressionDefaults.MimeTypes.Concat(
                ["text/csv", "text/calendar", "application/geo+json", "application/problem+json", "application/vnd.lunarshadow.sequence+json"]);
        });
        builder.Services.AddOutputCache(options =>
        {
            options.AddBasePolicy(policy => policy.With(c => c.HttpContext.Request.Path.StartsWithSegments("/api"))
                .SetVaryByQuery("*").SetVaryByHeader("Accept").Expire(TimeSpan.FromHours(1)));
            options.AddBasePolicy(new LiveObservationsPolicy());
            options.SizeLimit = builder.Configuration.GetValue("OutputCacheMegabytes", 128L) * 1024 * 1024;
        });
        builder.Services.AddProblemDetails();
        // Numbers are written and read as JSON numbers only, so the OpenAPI schema shows them as such; a NaN or an
        // infinity throws rather than becoming null.
        // Enum values are written under the one naming policy the mappings and the OpenAPI enums use.
        builder.Services.ConfigureHttpJsonOptions(options =>
        {
            Formatting.FiniteNumbers.Configure(options.SerializerOptions);
            options.SerializerOptions.Converters.Add(new JsonStringEnumConverter(Common.WireNames.Policy, allowIntegerValues: false));
        });
        // Parameters, bodies and response enums come from the same tables the handlers and mappings use.
        builder.Services.AddOpenApi("v1", options => options.AddSchemaTransformer<TimeSchemaTransformer>()
            .AddSchemaTransformer<ResponseEnumTransformer>()
            .AddOperationTransformer<ParameterTableTransformer>()
            .AddOperationTransformer<ObservationBodyTransformer>()
            .AddDocumentTransformer<BearerSecurityTransformer>()
            .AddDocumentTransformer<HealthDocumentTransformer>()
            .AddDocumentTransformer((document, _, _) =>
        {
            document.Info.Title = "LunarShadow";
            document.Info.Description = "Lunar eclipses for your own site and time zone: ephemeris, shadow, eclipses, local circumstances and photography plans, computed from ELP/MPP02 and VSOP87 at request time.";
            return Task.CompletedTask;
        }));
        return builder;
    }
}
