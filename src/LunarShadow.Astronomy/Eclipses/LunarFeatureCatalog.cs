using System.Text.Json;
using LunarShadow.Astronomy.Frames;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// The features timed at eclipses, read from the embedded list <c>Eclipses/Data/lunar-features.json</c> (coordinates
/// from the IAU/USGS Gazetteer of Planetary Nomenclature; the file states its source and which values were checked).
/// </summary>
public static class LunarFeatureCatalog
{
    private static readonly Lazy<(IReadOnlyList<LunarFeature> Features, string Source)> Loaded = new(Load);

    /// <summary>Every feature, in the order of the list (west to east).</summary>
    public static IReadOnlyList<LunarFeature> All => Loaded.Value.Features;

    /// <summary>Where the coordinates come from, as the list states it.</summary>
    public static string Source => Loaded.Value.Source;

    /// <summary>A feature by name, ignoring case and diacritics-free spelling differences only in case; null when unknown.</summary>
    public static LunarFeature? Find(string name) =>
        All.FirstOrDefault(f => string.Equals(f.Name, name.Trim(), StringComparison.OrdinalIgnoreCase))
        ?? All.FirstOrDefault(f => string.Equals(Plain(f.Name), Plain(name.Trim()), StringComparison.OrdinalIgnoreCase));

    private static string Plain(string name) => name.Replace('ö', 'o').Replace('Ö', 'O');

    private static (IReadOnlyList<LunarFeature>, string) Load()
    {
        using var stream = typeof(LunarFeatureCatalog).Assembly.GetManifestResourceStream("LunarShadow.Eclipses.lunar-features.json")
            ?? throw new InvalidOperationException("The embedded feature list is missing.");
        using var document = JsonDocument.Parse(stream);
        var root = document.RootElement;
        var features = root.GetProperty("features").EnumerateArray().Select(f => new LunarFeature(
            f.GetProperty("name").GetString()!,
            SelenographicPoint.FromDegrees(f.GetProperty("latitudeDegrees").GetDouble(), f.GetProperty("longitudeDegrees").GetDouble()),
            f.GetProperty("description").GetString()!,
            f.GetProperty("checked").ValueKind == JsonValueKind.String ? f.GetProperty("checked").GetString() : null)).ToList();
        return (features, root.GetProperty("source").GetString()!);
    }
}
