using LunarShadow.Api.Craters;
using LunarShadow.Api.Eclipses;
using LunarShadow.Api.Ephemeris;
using LunarShadow.Api.Observations;
using LunarShadow.Api.Photography;
using LunarShadow.Api.Sites;
using Serilog;

namespace LunarShadow.Api.Hosting;

/// <summary>The request pipeline and the endpoint map.</summary>
internal static class Pipeline
{
    /// <summary>The liveness probe's path.</summary>
    public const string LivePath = "/health/live";

    /// <summary>The readiness probe's path.</summary>
    public const string ReadyPath = "/health/ready";

    public static WebApplication UseLunarShadowPipeline(this WebApplication app)
    {
        app.UseLunarShadowForwardedHeaders();
        app.UseMiddleware<RequestsInFlightMiddleware>();
        app.UseMiddleware<CorrelationIdMiddleware>();
        app.UseSerilogRequestLogging();
        app.UseExceptionHandler();
        app.UseStatusCodePages();
        app.UseMiddleware<ResponseHeadersMiddleware>();
        app.UsePublicReadCors();
        // The deadline wraps the limiters (a wait for a turn counts against it) and everything that may buffer, tag or
        // cache a body, so that nothing is tagged or kept from a request that did not finish.
        app.UseMiddleware<RequestDeadlineMiddleware>();
        app.UseRateLimiter(); // per-client token bucket: every API request, stored answers included
        app.UseMiddleware<EntityTagMiddleware>();
        app.UseResponseCompression();
        app.UseOutputCache();
        // Only requests the output cache could not answer wait for a turn at the expensive work.
        app.UseMiddleware<ExpensiveWorkMiddleware>();
        return app;
    }

    public static WebApplication MapLunarShadowEndpoints(this WebApplication app)
    {
        // The document is built once per process and then served from the output cache.
        app.MapOpenApi("/openapi/{documentName}.json").CacheOutput(policy => policy.Expire(TimeSpan.FromDays(365)));
        app.UseSwaggerUI(options =>
        {
            options.RoutePrefix = "docs";
            options.SwaggerEndpoint("/openapi/v1.json", "LunarShadow v1");
            options.DocumentTitle = "LunarShadow API";
        });
        app.UseDefaultFiles();
        app.UseStaticFiles(new StaticFileOptions
        {
            ContentTypeProvider = new Microsoft.AspNetCore.StaticFiles.FileExtensionContentTypeProvider { Mappings = { [".geojson"] = "application/geo+json" } },
        });
        app.MapHealthChecks(LivePath, new Microsoft.AspNetCore.Diagnostics.HealthChecks.HealthCheckOptions { Predicate = _ => false });
        app.MapHealthChecks(ReadyPath, new Microsoft.AspNetCore.Diagnostics.HealthChecks.HealthCheckOptions { Predicate = c => c.Tags.Contains("ready") });
        app.MapEphemerisEndpoints();
        app.MapEclipseEndpoints();
        app.MapVisibilityMapEndpoints();
        app.MapLocalEndpoints();
        app.MapUpcomingEndpoints();
        app.MapPhotoEndpoints();
        app.MapCraterEndpoints();
        app.MapObservationEndpoints();
        app.MapEnlargementEndpoints();
        return app;
    }
}
