using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Units;
using NodaTime;

namespace LunarShadow.Astronomy.Sites;

/// <summary>An observing site.</summary>
/// <param name="Location">Where on the WGS84 ellipsoid.</param>
/// <param name="TimeZone">The site's time zone (IANA tzdb).</param>
/// <param name="Horizon">The local horizon profile.</param>
/// <param name="MinimumAltitude">Lowest useful altitude of the Moon's upper limb (default 0°).</param>
/// <param name="Air">Pressure and temperature for refraction.</param>
/// <param name="Name">A free-text name, echoed back.</param>
/// <param name="SeaHorizonDip">
/// False (default): the almanac convention — rise and set when the upper limb stands at 0° apparent altitude, with
/// refraction and no dip. True: the site looks out over a sea horizon, depressed by the dip for its height.
/// </param>
public sealed record Site(
    GeodeticLocation Location,
    DateTimeZone TimeZone,
    HorizonProfile Horizon,
    Angle MinimumAltitude,
    AirConditions Air,
    string? Name = null,
    bool SeaHorizonDip = false)
{
    /// <summary>A site at sea level in UTC with a flat horizon and standard air.</summary>
    public static Site At(double latitudeDegrees, double longitudeDegrees, double elevationMeters = 0, DateTimeZone? zone = null) =>
        new(GeodeticLocation.FromDegrees(latitudeDegrees, longitudeDegrees, elevationMeters), zone ?? DateTimeZone.Utc,
            HorizonProfile.Flat, Angle.Zero, AirConditions.Standard);

    // Common practice (e.g. Explanatory Supplement 2013, §7.3; the nautical almanacs): dip of the sea horizon
    // ≈ 1.76′·√(height in metres), refraction included.
    /// <summary>Depression of the sea horizon seen from the site's height (whether or not the site asks for it).</summary>
    public Angle SeaHorizonDipAngle => Angle.FromDegrees(1.76 / 60 * Math.Sqrt(Math.Max(0, Location.ElevationMeters)));

    /// <summary>The dip applied to rise, set and visibility: the sea-horizon dip when asked for, otherwise none.</summary>
    public Angle HorizonDip => SeaHorizonDip ? SeaHorizonDipAngle : Angle.Zero;
}
