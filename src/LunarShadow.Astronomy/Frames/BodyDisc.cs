using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>Apparent semi-diameters and horizontal parallaxes of the Sun and Moon.</summary>
public static class BodyDisc
{
    /// <summary>Ratio of the Moon's mean radius to the Earth's equatorial radius, k = 0.2725076 (IAU 1982; used in eclipse work).</summary>
    public const double MoonRadiusRatio = 0.2725076;

    /// <summary>The Sun's semi-diameter at 1 AU, 959.63″ (Auwers; Meeus 1998, ch. 55).</summary>
    public const double SunSemiDiameterAtOneAuArcseconds = 959.63;

    /// <summary>Equatorial horizontal parallax of a body at a distance: asin(a / Δ), a the WGS84 equatorial radius.</summary>
    public static Angle HorizontalParallax(double distanceKm) =>
        Angle.FromRadians(Math.Asin(GeodeticLocation.EquatorialRadiusKm / distanceKm));

    // Meeus (1998), ch. 55: s = asin(k·sin π) for the Moon.
    /// <summary>The Moon's geocentric semi-diameter at a distance.</summary>
    public static Angle MoonSemiDiameter(double distanceKm) =>
        Angle.FromRadians(Math.Asin(MoonRadiusRatio * GeodeticLocation.EquatorialRadiusKm / distanceKm));

    // Meeus (1998), ch. 40 (topocentric semi-diameter): sin s′ = sin s · Δ / Δ′ for a spherical body.
    /// <summary>The semi-diameter of a body seen at another distance, from its semi-diameter at a known one.</summary>
    public static Angle AtDistance(Angle semiDiameter, double distanceKm, double newDistanceKm) =>
        Angle.FromRadians(Math.Asin(Math.Sin(semiDiameter.Radians) * distanceKm / newDistanceKm));

    // Meeus (1998), ch. 55: s = 959.63″ / Δ(AU).
    /// <summary>The Sun's semi-diameter at a distance.</summary>
    public static Angle SunSemiDiameter(double distanceKm) =>
        Angle.FromArcseconds(SunSemiDiameterAtOneAuArcseconds * Ephemeris.EarthOrbitTheory.AstronomicalUnitKm / distanceKm);
}
