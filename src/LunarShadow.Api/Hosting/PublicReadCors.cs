namespace LunarShadow.Api.Hosting;

/// <summary>
/// Cross-origin reading of the API: any site's page (a planetarium's own schedule, say) may GET the public, read-only
/// answers, with <c>Access-Control-Allow-Origin: *</c> and no credentials. POST bodies are not offered cross-origin.
/// </summary>
internal static class PublicReadCors
{
    public const string PolicyName = "public-read";

    public static IServiceCollection AddPublicReadCors(this IServiceCollection services) =>
        services.AddCors(options => options.AddPolicy(PolicyName, policy => policy
            .AllowAnyOrigin()
            .WithMethods("GET", "HEAD")
            .WithHeaders("Accept", "If-None-Match", "X-Correlation-Id")
            .WithExposedHeaders("ETag", "X-Correlation-Id", "Retry-After", "Content-Disposition")
            .SetPreflightMaxAge(TimeSpan.FromHours(1))));

    /// <summary>Applies the policy to GET and HEAD requests of the API and to their preflights.</summary>
    public static WebApplication UsePublicReadCors(this WebApplication app)
    {
        app.UseWhen(context => context.Request.Path.StartsWithSegments("/api")
            && (HttpMethods.IsGet(context.Request.Method) || HttpMethods.IsHead(context.Request.Method) || HttpMethods.IsOptions(context.Request.Method)),
            branch => branch.UseCors(PolicyName));
        return app;
    }
}
