namespace LunarShadow.Astronomy.Shadow;

/// <summary>The rules for enlarging the Earth's shadow by its atmosphere, by public name.</summary>
public enum ShadowModelKind
{
    /// <summary>Danjon's rule: the Earth's radius enlarged by 1/85; radii 1.01·π☾ + π☉ ± s☉.</summary>
    Danjon,

    /// <summary>The traditional almanac rule: 1.02 × (0.998340·π☾ + π☉ ± s☉).</summary>
    Chauvenet,

    /// <summary>The bare geometric cones of the oblate Earth's mean radius: 0.998340·π☾ + π☉ ± s☉.</summary>
    None,

    /// <summary>An opaque layer of given height above the WGS84 ellipsoid: an elliptical cross-section.</summary>
    Layer,

    /// <summary>
    /// The geometric umbra enlarged by a given percentage of its own radius (as crater timings measure it); the penumbra
    /// grows by the same angle, as both cones are tangent to the same enlarged Earth.
    /// </summary>
    Enlarged,
}

/// <summary>A shadow model with its parameter.</summary>
/// <param name="Kind">Which rule.</param>
/// <param name="LayerHeightKm">Height of the opaque layer, km (used by <see cref="ShadowModelKind.Layer"/> only).</param>
/// <param name="EnlargementPercent">Umbral enlargement over the geometric umbra, percent of its radius (used by <see cref="ShadowModelKind.Enlarged"/> only).</param>
public sealed record ShadowModel(ShadowModelKind Kind, double LayerHeightKm = ShadowModel.DefaultLayerHeightKm, double EnlargementPercent = 0)
{
    /// <summary>Default opaque-layer height, 87 km, after Herald &amp; Sinnott (2014), J. Br. Astron. Assoc. 124, 247.</summary>
    public const double DefaultLayerHeightKm = 87;

    /// <summary>Danjon's rule, the default (as the Five Millennium Canon uses).</summary>
    public static ShadowModel Danjon { get; } = new(ShadowModelKind.Danjon);

    /// <summary>The almanac rule.</summary>
    public static ShadowModel Chauvenet { get; } = new(ShadowModelKind.Chauvenet);

    /// <summary>No atmosphere.</summary>
    public static ShadowModel Geometric { get; } = new(ShadowModelKind.None);

    /// <summary>An opaque layer of the given height.</summary>
    public static ShadowModel Layer(double heightKm = DefaultLayerHeightKm) => new(ShadowModelKind.Layer, heightKm);

    /// <summary>The geometric umbra enlarged by <paramref name="percent"/> of its radius (a measured enlargement).</summary>
    public static ShadowModel Enlarged(double percent) => new(ShadowModelKind.Enlarged, DefaultLayerHeightKm, percent);

    /// <summary>The public names a caller may choose by name (an enlarged model is made from a measurement, not by name).</summary>
    public static IReadOnlyList<string> Names { get; } = ["danjon", "chauvenet", "none", "layer"];

    /// <summary>The model's public name.</summary>
    public string Name => Kind switch
    {
        ShadowModelKind.Danjon => "danjon",
        ShadowModelKind.Chauvenet => "chauvenet",
        ShadowModelKind.None => "none",
        ShadowModelKind.Enlarged => "enlarged",
        _ => "layer",
    };

    /// <summary>A model by public name; false for an unknown name.</summary>
    public static bool TryParse(string name, double layerHeightKm, out ShadowModel model)
    {
        model = name.Trim().ToLowerInvariant() switch
        {
            "danjon" => Danjon,
            "chauvenet" => Chauvenet,
            "none" => Geometric,
            "layer" => Layer(layerHeightKm),
            _ => Danjon,
        };
        return Names.Contains(name.Trim().ToLowerInvariant());
    }
}
