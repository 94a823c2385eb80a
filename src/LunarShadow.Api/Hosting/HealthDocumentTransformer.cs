using Microsoft.AspNetCore.OpenApi;
using Microsoft.OpenApi;

namespace LunarShadow.Api.Hosting;

/// <summary>Documents the two health endpoints, which are mapped as health checks rather than route handlers.</summary>
internal sealed class HealthDocumentTransformer : IOpenApiDocumentTransformer
{
    public Task TransformAsync(OpenApiDocument document, OpenApiDocumentTransformerContext context, CancellationToken cancellationToken)
    {
        document.Paths ??= new OpenApiPaths();
        document.Paths[Pipeline.LivePath] = Probe("GetLiveness", "Liveness: the process answers",
            "200 with the text Healthy whenever the process can serve requests; it checks nothing else (for restart decisions).");
        document.Paths[Pipeline.ReadyPath] = Probe("GetReadiness", "Readiness: the embedded ephemeris loads and evaluates",
            "200 Healthy once the embedded ephemeris tables load and give a plausible lunar distance; 503 Unhealthy otherwise (for load-balancer decisions).");
        return Task.CompletedTask;
    }

    private static OpenApiPathItem Probe(string id, string summary, string description) => new()
    {
        Operations = new Dictionary<HttpMethod, OpenApiOperation>
        {
            [HttpMethod.Get] = new()
            {
                OperationId = id,
                Summary = summary,
                Description = description,
                Tags = new HashSet<OpenApiTagReference> { new("Health") },
                Responses = new OpenApiResponses
                {
                    ["200"] = Text("Healthy."),
                    ["503"] = Text("Unhealthy."),
                },
            },
        },
    };

    private static OpenApiResponse Text(string description) => new()
    {
        Description = description,
        Content = new Dictionary<string, OpenApiMediaType>
        {
            ["text/plain"] = new() { Schema = new OpenApiSchema { Type = JsonSchemaType.String, Enum = [System.Text.Json.Nodes.JsonValue.Create("Healthy"), System.Text.Json.Nodes.JsonValue.Create("Degraded"), System.Text.Json.Nodes.JsonValue.Create("Unhealthy")] } },
        },
    };
}
