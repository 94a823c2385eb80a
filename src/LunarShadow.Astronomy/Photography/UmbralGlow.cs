namespace LunarShadow.Astronomy.Photography;

/// <summary>
/// An estimate of the light refracted into the umbra by the Earth's atmosphere, by the expected Danjon luminosity L (0
/// very dark to 4 bright copper-red), as magnitudes below the uneclipsed Moon at a given depth in the umbra.
/// </summary>
/// <remarks>
/// Calibration (an estimate, uncertain by 1–2 stops): at the umbra's edge the refracted light is some 8 magnitudes below
/// the uneclipsed Moon, and toward the centre it falls off to give, for a central totality, a whole Moon of about V ≈ −3
/// for L = 4 and V ≈ +4 for L = 0 (the brightness ranges associated with the Danjon scale; radial profiles as computed
/// and measured by Hernitschek, Schmidt &amp; Vollmer 2008, Appl. Opt. 47, H62, and Vollmer &amp; Gedzelman 2008, Appl.
/// Opt. 47, H52 — values from memory). Real eclipses vary with volcanic aerosol and cloud along the terminator.
/// </remarks>
public static class UmbralGlow
{
    /// <summary>Default expected Danjon luminosity.</summary>
    public const double DefaultDanjon = 2.0;

    /// <summary>One-sigma uncertainty of the estimate, stops.</summary>
    public const double UncertaintyStops = 1.5;

    /// <summary>
    /// Magnitudes below the uneclipsed Moon at fractional depth d = ρ/ρᵤ in the umbra (1 at the edge, 0 at the axis).
    /// </summary>
    public static double DimmingMagnitudes(double depthFraction, double danjon)
    {
        var l = Math.Clamp(danjon, 0, 4);
        var edge = 7.5 + 0.5 * (4 - l);
        var center = 10.5 + 1.75 * (4 - l);
        var d = Math.Clamp(depthFraction, 0, 1);
        // Brightness falls off from the edge inward, fastest just inside the edge (profile ∝ (1 − d)^0.6).
        return edge + (center - edge) * Math.Pow(1 - d, 0.6);
    }
}
