using Microsoft.AspNetCore.OpenApi;
using Microsoft.OpenApi;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Describes the API's instants in the OpenAPI document: the contracts carry them as ISO 8601 text that LunarShadow
/// writes itself (so that dates before 1582 follow the astronomers' calendar), and this marks which is which — UTC and
/// local times as date-time, TT as Terrestrial Time without a zone, and eclipse ids as dates.
/// </summary>
internal sealed class TimeSchemaTransformer : IOpenApiSchemaTransformer
{
    public Task TransformAsync(OpenApiSchema schema, OpenApiSchemaTransformerContext context, CancellationToken cancellationToken)
    {
        if (schema.Properties is null) return Task.CompletedTask;
        foreach (var (name, property) in schema.Properties)
        {
            if (property is not OpenApiSchema s) continue;
            var lower = name.ToLowerInvariant();
            if (lower is "utc" or "instant" || lower.EndsWith("utc", StringComparison.Ordinal))
            {
                s.Format = "date-time";
                s.Description = (s.Description is null ? "" : s.Description + " ") + "ISO 8601 UTC with Z (Julian calendar before 1582-10-15, astronomical year numbering).";
            }
            else if (lower is "local" or "startlocal" or "endlocal" or "opens" or "closes" or "doorsopen" or "doorsclose" || lower.EndsWith("local", StringComparison.Ordinal))
            {
                s.Format = "date-time";
                s.Description = (s.Description is null ? "" : s.Description + " ") + "ISO 8601 local time with its UTC offset.";
            }
            else if (lower == "tt")
            {
                s.Description = (s.Description is null ? "" : s.Description + " ") + "Terrestrial Time (TT): ISO 8601 date and time without a zone designator.";
                s.Pattern = @"^-?\d{4,5}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}$";
            }
            else if (lower == "date")
            {
                s.Description = (s.Description is null ? "" : s.Description + " ") + "YYYY-MM-DD (Julian calendar before 1582-10-15, astronomical year numbering).";
                s.Pattern = @"^-?\d{4,5}-\d{2}-\d{2}$";
            }
        }
        return Task.CompletedTask;
    }
}
