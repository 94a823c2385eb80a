using LunarShadow.Api.Observations;
using Microsoft.AspNetCore.OpenApi;
using Microsoft.OpenApi;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Documents the observation write's body from the same parameter table its reader uses: one observation object (its
/// fields and a site object) or an array of them.
/// </summary>
internal sealed class ObservationBodyTransformer : IOpenApiOperationTransformer
{
    public Task TransformAsync(OpenApiOperation operation, OpenApiOperationTransformerContext context, CancellationToken cancellationToken)
    {
        var marker = context.Description.ActionDescriptor.EndpointMetadata.OfType<ObservationBodyMetadata>().LastOrDefault();
        if (marker is null) return Task.CompletedTask;
        var site = ObjectOf(ObservationParameters.Site);
        site.Description = "Where the observation was made (WGS84).";
        var item = ObjectOf(ObservationParameters.Fields);
        item.Properties![ObservationParameters.SiteName] = site;
        item.Required!.Add(ObservationParameters.SiteName);
        item.Description = "A crater timing (kind crater-timing: feature and crossing required; uncertaintySeconds, optics, observer optional) or a Danjon estimate (kind danjon: value required; observer optional).";
        operation.RequestBody = new OpenApiRequestBody
        {
            Required = true,
            Description = $"One observation, or an array of 1 to {marker.MaxItems} stored all together or not at all.",
            Content = new Dictionary<string, OpenApiMediaType>
            {
                ["application/json"] = new()
                {
                    Schema = new OpenApiSchema
                    {
                        OneOf = [item, new OpenApiSchema { Type = JsonSchemaType.Array, Items = item, MinItems = 1, MaxItems = marker.MaxItems }],
                    },
                },
            },
        };
        return Task.CompletedTask;
    }

    private static OpenApiSchema ObjectOf(IEnumerable<Validation.Parameter> fields)
    {
        var schema = new OpenApiSchema
        {
            Type = JsonSchemaType.Object,
            Properties = new Dictionary<string, IOpenApiSchema>(StringComparer.Ordinal),
            Required = new HashSet<string>(StringComparer.Ordinal),
            AdditionalPropertiesAllowed = false,
        };
        foreach (var p in fields)
        {
            var property = ParameterTableTransformer.SchemaOf(p);
            property.Description = p.Description + (p.Type == Validation.ParameterType.Number ? $" {p.RangeText}." : "");
            schema.Properties[p.Name] = property;
            if (p.Required) schema.Required.Add(p.Name);
        }
        return schema;
    }
}
