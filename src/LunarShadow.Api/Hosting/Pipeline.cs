using LunarShadow.Api.Eclipses;
using LunarShadow.Api.Ephemeris;
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
        app.UseMiddleware<CorrelationIdMiddleware>();
        app.UseSerilogRequestLogging();
        app.UseExceptionHandler();
        app.UseStatusCodePages();
        app.UseRateLimiter();
        app.UseMiddleware<EntityTagMiddleware>();
        app.UseResponseCompression();
        app.UseRequestTimeouts();
        app.UseOutputCache();
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
        return app;
    }
}
