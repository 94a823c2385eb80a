using System.Text.Json.Serialization;
using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Sites;

namespace LunarShadow.Api.Eclipses;

/// <summary>GET /api/v1/eclipses/{date}/visibility-map: GeoJSON of where the eclipse can be seen.</summary>
internal static class VisibilityMapEndpoints
{
    private static readonly FormatOffer Formats = new(OutputFormat.GeoJson, OutputFormat.Json);

    public static IEndpointRouteBuilder MapVisibilityMapEndpoints(this IEndpointRouteBuilder routes)
    {
        routes.MapGet("/api/v1/eclipses/{date}/visibility-map", Get)
            .WithTags("Eclipses")
            .WithName("GetVisibilityMap")
            .Takes(new EndpointParameters([Parameters.EclipseDate, .. Parameters.Model, Formats.Parameter]))
            .WithSummary("Where on Earth the eclipse can be seen, as GeoJSON")
            .WithDescription("An RFC 7946 FeatureCollection: for each contact (and greatest eclipse) a MultiPolygon of where the Moon is above the horizon then, plus 'whole-eclipse' (above the horizon at both P1 and P4) and 'whole-totality' (at both U2 and U3). Computed on a 1° grid on a spherical Earth at sea level with standard refraction; the cells are merged and their outlines simplified to within 0.75° (pieces split at ±180° meet exactly there).")
            .Produces<VisibilityMapDocument>(StatusCodes.Status200OK, "application/geo+json", "application/json")
            .ProducesEclipseProblems();
        return routes;
    }

    internal static IResult Get(HttpRequest request)
    {
        var f = RequestFields.FromQuery(request, new QueryReader());
        var query = EclipseLookup.Read(request, f, Formats);
        if (EclipseLookup.Resolve(f, query, Formats, out var eclipse) is { } problem) return problem;
        var (model, time) = (query.Model, query.Time);

        var regions = VisibilityMap.Compute(eclipse, time.DeltaTAt(eclipse.GreatestEclipse).Seconds);
        var features = regions.Select(r => new GeoJsonFeature(
            new GeoJsonMultiPolygon(VisibilityOutlines.Outline(r.Boxes, VisibilityMap.ResolutionDegrees)),
            new VisibilityProperties(r.Name, Describe(r.Name), r.Tt is { } tt ? TimeFormats.Utc(time.ToUtc(tt)) : null, VisibilityMap.ResolutionDegrees))).ToList();
        var collection = new VisibilityMapDocument(features, WireNames.Of(eclipse.Kind), TimeFormats.UtcDate(time.ToUtc(eclipse.GreatestEclipse)), model.Name);
        var json = Results.Json(collection, contentType: ContentNegotiation.MediaType(query.Output!.Value));
        return query.Output == OutputFormat.GeoJson
            ? json.AsAttachment(Downloads.FileName(OutputFormat.GeoJson, "lunar-eclipse", collection.Date, "visibility-map"))
            : json;
    }

    private static string Describe(string name) => name switch
    {
        "whole-eclipse" => "The Moon is above the horizon at both P1 and P4: the whole eclipse can be seen.",
        "whole-totality" => "The Moon is above the horizon at both U2 and U3: the whole of totality can be seen.",
        "greatest" => "The Moon is above the horizon at greatest eclipse.",
        _ => $"The Moon is above the horizon at {name}.",
    };
}

/// <summary>An RFC 7946 FeatureCollection.</summary>
/// <param name="Features">The regions.</param>
/// <param name="Kind">The eclipse's kind.</param>
/// <param name="Date">The eclipse's date.</param>
/// <param name="ShadowModel">The shadow model.</param>
public sealed record VisibilityMapDocument(IReadOnlyList<GeoJsonFeature> Features, string Kind, string Date, string ShadowModel)
{
    /// <summary>Always "FeatureCollection".</summary>
    [JsonPropertyOrder(-1)]
    public string Type => "FeatureCollection";
}

/// <summary>An RFC 7946 Feature.</summary>
/// <param name="Geometry">Its MultiPolygon.</param>
/// <param name="Properties">What it is.</param>
public sealed record GeoJsonFeature(GeoJsonMultiPolygon Geometry, VisibilityProperties Properties)
{
    /// <summary>Always "Feature".</summary>
    [JsonPropertyOrder(-1)]
    public string Type => "Feature";
}

/// <summary>An RFC 7946 MultiPolygon: polygons of rings of [longitude, latitude] positions, exterior rings counterclockwise.</summary>
/// <param name="Coordinates">The polygons.</param>
public sealed record GeoJsonMultiPolygon(IReadOnlyList<double[][][]> Coordinates)
{
    /// <summary>Always "MultiPolygon".</summary>
    [JsonPropertyOrder(-1)]
    public string Type => "MultiPolygon";
}

/// <summary>What a region means.</summary>
/// <param name="Name">P1, U1, U2, greatest, U3, U4, P4, whole-eclipse or whole-totality.</param>
/// <param name="Description">In words.</param>
/// <param name="Utc">The instant, for a contact.</param>
/// <param name="ResolutionDegrees">Grid resolution, degrees.</param>
public sealed record VisibilityProperties(string Name, string Description, string? Utc, double ResolutionDegrees);
