using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>Altitude above the horizon and azimuth from north through east.</summary>
/// <param name="Altitude">Altitude above the astronomical horizon.</param>
/// <param name="Azimuth">Azimuth, 0° north, 90° east.</param>
public readonly record struct HorizontalCoordinates(Angle Altitude, Angle Azimuth)
{
    // Meeus (1998), ch. 13, eqs. 13.5–13.6, with azimuth counted from the north.
    /// <summary>Horizontal coordinates from the local hour angle and declination at a geodetic latitude.</summary>
    public static HorizontalCoordinates FromHourAngle(Angle hourAngle, Angle declination, Angle latitude)
    {
        var (sinH, cosH) = Math.SinCos(hourAngle.Radians);
        var (sinD, cosD) = Math.SinCos(declination.Radians);
        var (sinP, cosP) = Math.SinCos(latitude.Radians);
        var altitude = Math.Asin(Math.Clamp(sinP * sinD + cosP * cosD * cosH, -1, 1));
        var azimuth = Math.Atan2(-cosD * sinH, sinD * cosP - cosD * sinP * cosH);
        return new HorizontalCoordinates(Angle.FromRadians(altitude), Angle.FromRadians(azimuth).NormalizedPositive());
    }
}
