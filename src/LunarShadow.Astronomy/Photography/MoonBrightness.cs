using LunarShadow.Astronomy.Ephemeris;

namespace LunarShadow.Astronomy.Photography;

/// <summary>The uneclipsed Moon's brightness.</summary>
public static class MoonBrightness
{
    // Allen's Astrophysical Quantities, 4th ed. (Cox 2000), §12: the Moon's V(1,0) = +0.21, with the phase law
    // ΔV = 0.026·|α| + 4.0·10⁻⁹·α⁴ (α in degrees), which gives V = −12.74 for a full Moon at mean distance.
    /// <summary>The Moon's apparent V magnitude above the atmosphere.</summary>
    public static double VisualMagnitude(double sunMoonDistanceKm, double earthMoonDistanceKm, double phaseAngleDegrees)
    {
        var r = sunMoonDistanceKm / EarthOrbitTheory.AstronomicalUnitKm;
        var delta = earthMoonDistanceKm / EarthOrbitTheory.AstronomicalUnitKm;
        var a = Math.Abs(phaseAngleDegrees);
        return 0.21 + 5 * Math.Log10(r * delta) + 0.026 * a + 4.0e-9 * a * a * a * a;
    }

    // Surface brightness μ = V + 2.5·log₁₀(area in arcsec²) for a uniformly bright disc (common practice).
    /// <summary>Mean surface brightness of the disc, magnitudes per square arc-second.</summary>
    public static double SurfaceBrightness(double visualMagnitude, double semiDiameterArcsec) =>
        visualMagnitude + 2.5 * Math.Log10(Math.PI * semiDiameterArcsec * semiDiameterArcsec);

    // Common practice (photometric conversion): L[cd/m²] = 10.8·10⁴ · 10^(−0.4·μ_V).
    /// <summary>Luminance of a surface of V surface brightness μ, cd/m².</summary>
    public static double Luminance(double surfaceBrightness) => 10.8e4 * Math.Pow(10, -0.4 * surfaceBrightness);
}
