using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Shadow;

/// <summary>The size of the Earth's umbra and penumbra at the Moon's distance under each shadow model.</summary>
public static class ShadowCrossSection
{
    /// <summary>Ratio of the oblate Earth's mean radius to its equatorial radius used by the classical rules.</summary>
    public const double MeanRadiusRatio = 0.998340;

    /// <summary>The radii in the direction of the Moon's centre (which matters only for the elliptical layer model).</summary>
    public static ShadowRadii RadiiTowardMoon(ShadowModel model, ShadowGeometry g) => Radii(model, g, g.DirectionFromAxis);

    // Meeus (1998), ch. 54 (magnitudes of a lunar eclipse): m = (ρ + s − d) / (2s), the fraction of the Moon's
    // diameter inside a shadow of radius ρ, with s the Moon's semi-diameter and d its centre's distance from the axis.
    /// <summary>The magnitude of the Moon in a shadow of the given radius (negative when outside it), all in radians.</summary>
    public static double Magnitude(double shadowRadiusRadians, double moonSemiDiameterRadians, double separationRadians) =>
        (shadowRadiusRadians + moonSemiDiameterRadians - separationRadians) / (2 * moonSemiDiameterRadians);

    /// <summary>The radii in a given direction from the axis (position angle from north through east).</summary>
    public static ShadowRadii Radii(ShadowModel model, ShadowGeometry g, Angle direction)
    {
        var moonParallax = g.MoonParallax.Radians;
        var sunParallax = g.SunParallax.Radians;
        var sunRadius = g.SunSemiDiameter.Radians;
        return model.Kind switch
        {
            ShadowModelKind.Danjon => Danjon(moonParallax, sunParallax, sunRadius),
            ShadowModelKind.Chauvenet => Chauvenet(moonParallax, sunParallax, sunRadius),
            ShadowModelKind.None => Geometric(moonParallax, sunParallax, sunRadius),
            ShadowModelKind.Enlarged => Enlarged(Geometric(moonParallax, sunParallax, sunRadius), model.EnlargementPercent),
            _ => OpaqueLayer(moonParallax, sunParallax, sunRadius, model.LayerHeightKm, g.AxisDeclinationRadians, direction.Radians),
        };
    }

    // Danjon (1951) as used by Espenak & Meeus (2009), Five Millennium Canon §1.3: ρ = 1.01·π☾ + π☉ ∓ s☉.
    private static ShadowRadii Danjon(double moonParallax, double sunParallax, double sunRadius) => new(
        Angle.FromRadians(1.01 * moonParallax + sunParallax - sunRadius),
        Angle.FromRadians(1.01 * moonParallax + sunParallax + sunRadius));

    // Chauvenet (1891), Manual of Spherical and Practical Astronomy, as in the Explanatory Supplement (1961):
    // ρ = 1.02·(0.998340·π☾ + π☉ ∓ s☉).
    private static ShadowRadii Chauvenet(double moonParallax, double sunParallax, double sunRadius) => new(
        Angle.FromRadians(1.02 * (MeanRadiusRatio * moonParallax + sunParallax - sunRadius)),
        Angle.FromRadians(1.02 * (MeanRadiusRatio * moonParallax + sunParallax + sunRadius)));

    // Common practice: the bare geometric cones of a sphere of the oblate Earth's mean radius.
    private static ShadowRadii Geometric(double moonParallax, double sunParallax, double sunRadius) => new(
        Angle.FromRadians(MeanRadiusRatio * moonParallax + sunParallax - sunRadius),
        Angle.FromRadians(MeanRadiusRatio * moonParallax + sunParallax + sunRadius));

    // Soulsby's crater-timing reductions (E% = (Ro − Rc)/Rc, Rc the geometric umbral radius), inverted: the umbra is
    // Rc·(1 + E/100); the penumbra grows by the same angle, as under Danjon's rule and the opaque layer.
    private static ShadowRadii Enlarged(ShadowRadii geometric, double percent)
    {
        var growth = geometric.Umbra.Radians * percent / 100;
        return new ShadowRadii(Angle.FromRadians(geometric.Umbra.Radians + growth), Angle.FromRadians(geometric.Penumbra.Radians + growth));
    }

    // Herald & Sinnott (2014), J. Br. Astron. Assoc. 124, 247: an opaque layer of height h above the ellipsoid. The
    // limb seen along the shadow axis (declination δ) is an ellipse with semi-axes a + h (east–west) and
    // √((a + h)²·sin²δ + (b + h)²·cos²δ) (north–south); its radius R toward the Moon scales the cones: ρ = (R/a)(π☾ + π☉) ∓ s☉.
    private static ShadowRadii OpaqueLayer(double moonParallax, double sunParallax, double sunRadius, double heightKm, double axisDeclination, double direction)
    {
        const double a = GeodeticLocation.EquatorialRadiusKm;
        var b = a * (1 - GeodeticLocation.Flattening);
        var eastWest = a + heightKm;
        var (sinDec, cosDec) = Math.SinCos(axisDeclination);
        var northSouth = Math.Sqrt(eastWest * eastWest * sinDec * sinDec + (b + heightKm) * (b + heightKm) * cosDec * cosDec);
        var (sinDir, cosDir) = Math.SinCos(direction);
        var radius = 1 / Math.Sqrt(sinDir * sinDir / (eastWest * eastWest) + cosDir * cosDir / (northSouth * northSouth));
        var cone = radius / a * (moonParallax + sunParallax);
        return new ShadowRadii(Angle.FromRadians(cone - sunRadius), Angle.FromRadians(cone + sunRadius));
    }
}
