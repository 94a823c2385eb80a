using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>Altitude above the horizon and azimuth from north through east.</summary>
/// <param name="Altitude">Altitude above the astronomical horizon.</param>
/// <param name="Azimuth">Azimuth, 0° north, 90° east.</param>
public readonly record struct HorizontalCoordinates(Angle Altitude, Angle Azimuth)
{
    // Meeus (1998), ch. 13, eqs. 13.5–13.6, with azimuth counted from the north: tan A = east / north, sin h = up / |v|.
    /// <summary>
    /// The one home of altitude and azimuth: a direction from its components toward the local north, east and zenith
    /// (any common length; exact to rounding).
    /// </summary>
    public static HorizontalCoordinates FromLocalComponents(double north, double east, double up)
    {
        var altitude = Math.Atan2(up, Math.Sqrt(north * north + east * east));
        var azimuth = Math.Atan2(east, north);
        return new HorizontalCoordinates(Angle.FromRadians(altitude), Angle.FromRadians(azimuth).NormalizedPositive());
    }

    // Meeus (1998), ch. 13, eqs. 13.5–13.6: the hour angle and declination give the local components of the direction.
    /// <summary>Horizontal coordinates from the local hour angle and declination at a geodetic latitude.</summary>
    public static HorizontalCoordinates FromHourAngle(Angle hourAngle, Angle declination, Angle latitude)
    {
        var (sinH, cosH) = Math.SinCos(hourAngle.Radians);
        var (sinD, cosD) = Math.SinCos(declination.Radians);
        var (sinP, cosP) = Math.SinCos(latitude.Radians);
        return FromLocalComponents(sinD * cosP - cosD * sinP * cosH, -cosD * sinH, sinP * sinD + cosP * cosD * cosH);
    }

    /// <summary>The unit vector of this direction, x toward the north, y toward the east, z toward the zenith.</summary>
    public CartesianVector LocalUnitVector()
    {
        var (sinAlt, cosAlt) = Math.SinCos(Altitude.Radians);
        var (sinAz, cosAz) = Math.SinCos(Azimuth.Radians);
        return new CartesianVector(cosAlt * cosAz, cosAlt * sinAz, sinAlt);
    }
}
