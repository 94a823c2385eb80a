using System.Text.Json.Nodes;
using LunarShadow.Api.Common;
using LunarShadow.Api.Eclipses;
using LunarShadow.Api.Photography;
using LunarShadow.Api.Sites;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Sites;
using Microsoft.AspNetCore.OpenApi;
using Microsoft.OpenApi;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Lists the allowed values of the responses' named states as enums in the OpenAPI document. The names come from
/// <see cref="WireNames"/>, the same policy the mappings write them with, so the document cannot list other values.
/// </summary>
internal sealed class ResponseEnumTransformer : IOpenApiSchemaTransformer
{
    private static readonly Dictionary<(Type Contract, string Property), IReadOnlyList<string>> Choices = new()
    {
        [(typeof(EclipseResponse), "kind")] = WireNames.All<EclipseKind>(),
        [(typeof(EclipseBrief), "kind")] = WireNames.All<EclipseKind>(),
        [(typeof(UpcomingItem), "kind")] = WireNames.All<EclipseKind>(),
        [(typeof(VisibilityMapDocument), "kind")] = WireNames.All<EclipseKind>(),
        [(typeof(ContactResponse), "name")] = Enum.GetValues<ContactName>().Select(WireNames.Of).ToList(),
        [(typeof(PathPointResponse), "name")] = WireNames.Contacts,
        [(typeof(LocalContactResponse), "name")] = WireNames.Contacts,
        [(typeof(LocalContactResponse), "sky")] = WireNames.All<SkyState>(),
        [(typeof(TrackPointResponse), "sky")] = WireNames.All<SkyState>(),
        [(typeof(MoonEventResponse), "type")] = WireNames.All<MoonEventType>(),
        [(typeof(LocalResponse), "moonHorizon")] = WireNames.All<MoonHorizonState>(),
        [(typeof(VisiblePhaseResponse), "phase")] = WireNames.All<EclipsePhase>(),
        [(typeof(UpcomingCriteriaEcho), "phase")] = WireNames.All<EclipsePhase>(),
        [(typeof(TimelineRowResponse), "phase")] = WireNames.All<MoonPhaseState>(),
        [(typeof(TimelineRowResponse), "contact")] = WireNames.Contacts,
        [(typeof(WarningResponse), "code")] = WireNames.All<PhotoWarningCode>(),
        [(typeof(CameraEcho), "mount")] = [.. PhotoParameters.Mounts.Keys],
    };

    public Task TransformAsync(OpenApiSchema schema, OpenApiSchemaTransformerContext context, CancellationToken cancellationToken)
    {
        if (schema.Properties is null) return Task.CompletedTask;
        foreach (var (name, property) in schema.Properties)
        {
            if (property is OpenApiSchema s && Choices.TryGetValue((context.JsonTypeInfo.Type, name), out var allowed))
            {
                s.Enum = allowed.Select(a => (JsonNode)JsonValue.Create(a)).ToList();
                if (s.Type is { } type && type.HasFlag(JsonSchemaType.Null)) s.Enum.Add(null!);
            }
        }
        return Task.CompletedTask;
    }
}
