using LunarShadow.Api.Observations;
using Microsoft.AspNetCore.OpenApi;
using Microsoft.OpenApi;

namespace LunarShadow.Api.Hosting;

/// <summary>Declares the observatory key as an HTTP bearer scheme and requires it on the write operation only (reads are public).</summary>
internal sealed class BearerSecurityTransformer : IOpenApiDocumentTransformer
{
    /// <summary>The scheme's name in the document.</summary>
    public const string SchemeName = "observatoryKey";

    public Task TransformAsync(OpenApiDocument document, OpenApiDocumentTransformerContext context, CancellationToken cancellationToken)
    {
        document.Components ??= new OpenApiComponents();
        document.Components.SecuritySchemes ??= new Dictionary<string, IOpenApiSecurityScheme>();
        document.Components.SecuritySchemes[SchemeName] = new OpenApiSecurityScheme
        {
            Type = SecuritySchemeType.Http,
            Scheme = "bearer",
            BearerFormat = "lsk_ followed by 43 base64url characters",
            Description = "An observatory key, issued on the host with `keys add \"Name\"`; needed to post observations.",
        };
        foreach (var operation in (document.Paths ?? []).Values.SelectMany(p => p.Operations ?? []).Select(o => o.Value))
        {
            if (operation.OperationId != ObservationEndpoints.WriteOperation) continue;
            operation.Security = [new OpenApiSecurityRequirement { [new OpenApiSecuritySchemeReference(SchemeName, document)] = [] }];
        }
        return Task.CompletedTask;
    }
}
