using LunarShadow.Astronomy.Shadow;

namespace LunarShadow.Api.Validation;

/// <summary>The shared shadow-model query pair: <c>shadow</c> and <c>layerKm</c>.</summary>
internal static class ShadowQuery
{
    public const double MinLayerKm = 0, MaxLayerKm = 500;

    public const string ShadowDescription = "Shadow enlargement model: danjon (default; 1.01·π☾ + π☉ ± s☉), chauvenet (1.02 × (0.998340·π☾ + π☉ ± s☉)), none (geometric cones), or layer (an opaque atmosphere of height layerKm above the WGS84 ellipsoid: elliptical shadow).";
    public const string LayerDescription = "Opaque-layer height for shadow=layer, km, 0 to 500 (default 87, after Herald & Sinnott 2014).";

    public static ShadowModel Read(QueryReader reader, string? shadow, string? layerKm)
    {
        var name = reader.OneOf("shadow", shadow, ShadowModel.Names) ?? "danjon";
        var height = reader.Number("layerKm", layerKm, MinLayerKm, MaxLayerKm, "km") ?? ShadowModel.DefaultLayerHeightKm;
        if (!string.IsNullOrWhiteSpace(layerKm) && name != "layer")
            reader.Fail("layerKm", "layerKm applies only with shadow=layer.");
        ShadowModel.TryParse(name, Math.Round(height, 1), out var model);
        return model;
    }
}
