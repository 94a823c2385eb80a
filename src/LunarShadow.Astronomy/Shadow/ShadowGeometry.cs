using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Shadow;

/// <summary>
/// The Moon relative to the Earth's shadow at one instant, seen from the Earth's centre: the Moon's centre in gnomonic
/// coordinates about the shadow axis (the apparent antisolar direction), east and north of date, and the two distances
/// that set the shadow's and the Moon's apparent sizes.
/// </summary>
/// <param name="XiRadians">Eastward offset of the Moon's centre from the axis (tangent-plane units, ≈ radians).</param>
/// <param name="EtaRadians">Northward offset of the Moon's centre from the axis.</param>
/// <param name="MoonDistanceKm">Geocentric distance of the Moon, km.</param>
/// <param name="SunDistanceKm">Geocentric distance of the Sun, km.</param>
/// <param name="AxisDeclinationRadians">Declination of the shadow axis (true equator of date).</param>
public readonly record struct ShadowGeometry(
    double XiRadians,
    double EtaRadians,
    double MoonDistanceKm,
    double SunDistanceKm,
    double AxisDeclinationRadians)
{
    /// <summary>Angle east of the shadow axis (ξ is its tangent), as a diagram of the shadow draws it.</summary>
    public Angle EastOfAxis => Angle.FromRadians(Math.Atan(XiRadians));

    /// <summary>Angle north of the shadow axis (η is its tangent).</summary>
    public Angle NorthOfAxis => Angle.FromRadians(Math.Atan(EtaRadians));

    /// <summary>Angular distance of the Moon's centre from the shadow axis.</summary>
    public Angle Separation => Angle.FromRadians(Math.Atan(Math.Sqrt(XiRadians * XiRadians + EtaRadians * EtaRadians)));

    /// <summary>Position angle of the Moon's centre seen from the shadow axis, from north through east.</summary>
    public Angle DirectionFromAxis => Angle.FromRadians(Math.Atan2(XiRadians, EtaRadians)).NormalizedPositive();

    /// <summary>The Moon's equatorial horizontal parallax π☾.</summary>
    public Angle MoonParallax => BodyDisc.HorizontalParallax(MoonDistanceKm);

    /// <summary>The Sun's equatorial horizontal parallax π☉.</summary>
    public Angle SunParallax => BodyDisc.HorizontalParallax(SunDistanceKm);

    /// <summary>The Moon's geocentric semi-diameter s☾.</summary>
    public Angle MoonSemiDiameter => BodyDisc.MoonSemiDiameter(MoonDistanceKm);

    /// <summary>The Sun's semi-diameter s☉.</summary>
    public Angle SunSemiDiameter => BodyDisc.SunSemiDiameter(SunDistanceKm);

    // Five Millennium Canon of Lunar Eclipses (Espenak & Meeus 2009), §1: gamma is the Moon's least distance from the
    // shadow axis in Earth equatorial radii, positive when the Moon passes north of the axis.
    /// <summary>The Moon centre's distance from the shadow axis in Earth equatorial radii, signed north positive.</summary>
    public double DistanceFromAxisInEarthRadii =>
        Math.Sign(EtaRadians) * Math.Sin(Separation.Radians) * MoonDistanceKm / GeodeticLocation.EquatorialRadiusKm;
}
