using LunarShadow.Astronomy.Shadow;

namespace LunarShadow.Astronomy.Photography;

/// <summary>
/// The brightness of the eclipsed Moon relative to the uneclipsed Moon (both above the atmosphere): direct sunlight past
/// the Earth's limb (from the shadow geometry, with solar limb darkening) plus light refracted into the umbra.
/// </summary>
public static class EclipsedMoonBrightness
{
    private const int DiscRings = 5;
    private const int DiscSectors = 14;

    /// <summary>
    /// Relative brightness of a point of the Moon at angular distance ρ (radians) from the shadow axis. The shadow radii
    /// fix the geometry: seen from that point the Earth's disc has radius E = (ρᵤ + ρₚ)/2 − π☉, the Sun's S = (ρₚ − ρᵤ)/2,
    /// and their centres are ρ − π☉ apart. The light refracted by the atmosphere does not stop at the umbra's edge: it
    /// lights the limb at U2 and U3, where the direct sunlight is just gone, and outside the umbra it is held at its edge
    /// value (some 8 magnitudes below the direct light, so it matters only where that light vanishes). The brightness is
    /// therefore continuous and strictly positive through every contact.
    /// </summary>
    public static double AtPoint(double rho, ShadowRadii radii, double sunParallax, double danjon)
    {
        var (u, p) = (radii.Umbra.Radians, radii.Penumbra.Radians);
        var earth = 0.5 * (u + p) - sunParallax;
        var sun = 0.5 * (p - u);
        var direct = 1 - SolarDiscOcculting.HiddenFraction(earth, sun, Math.Abs(rho - sunParallax));
        var refracted = u > 0 ? Math.Pow(10, -0.4 * UmbralGlow.DimmingMagnitudes(rho / u, danjon)) : 0;
        return direct + refracted;
    }

    /// <summary>The brightest point of the limb: the one farthest from the shadow axis (what one exposes for in partial phases).</summary>
    public static double SunlitLimb(ShadowGeometry g, ShadowRadii radii, double danjon) =>
        AtPoint(g.Separation.Radians + g.MoonSemiDiameter.Radians, radii, g.SunParallax.Radians, danjon);

    /// <summary>The mean over the Moon's disc (equal-area rings and sectors), what one exposes for in totality.</summary>
    public static double WholeDisc(ShadowGeometry g, ShadowRadii radii, double danjon)
    {
        var d = g.Separation.Radians;
        var s = g.MoonSemiDiameter.Radians;
        var sunParallax = g.SunParallax.Radians;
        double sum = 0;
        var count = 0;
        for (var i = 0; i < DiscRings; i++)
        {
            var r = s * Math.Sqrt((i + 0.5) / DiscRings);
            for (var j = 0; j < DiscSectors; j++)
            {
                var angle = 2 * Math.PI * (j + 0.5 * (i % 2)) / DiscSectors;
                var x = d + r * Math.Cos(angle);
                var y = r * Math.Sin(angle);
                sum += AtPoint(Math.Sqrt(x * x + y * y), radii, sunParallax, danjon);
                count++;
            }
        }
        return sum / count;
    }
}
