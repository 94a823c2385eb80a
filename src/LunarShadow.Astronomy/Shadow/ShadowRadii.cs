using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Shadow;

/// <summary>The angular radii of umbra and penumbra at the Moon's distance, in the direction of the Moon's centre.</summary>
/// <param name="Umbra">Umbral radius.</param>
/// <param name="Penumbra">Penumbral radius.</param>
public readonly record struct ShadowRadii(Angle Umbra, Angle Penumbra);
