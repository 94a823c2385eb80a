using LunarShadow.Astronomy.Frames;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>A named feature on the Moon that observers time as the shadow crosses it.</summary>
/// <param name="Name">The IAU name.</param>
/// <param name="Location">Selenographic centre coordinates.</param>
/// <param name="Description">Where it lies and why it is timed.</param>
/// <param name="CoordinatesCheckedAgainst">The published copy of the Gazetteer value the coordinates were compared with, or null when from memory.</param>
public sealed record LunarFeature(string Name, SelenographicPoint Location, string Description, string? CoordinatesCheckedAgainst);
