using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>A place on the WGS84 ellipsoid: geodetic latitude, east longitude and height above the ellipsoid.</summary>
/// <param name="Latitude">Geodetic latitude, north positive, −90° to +90°.</param>
/// <param name="Longitude">Longitude, east positive.</param>
/// <param name="ElevationMeters">Height above the ellipsoid in metres.</param>
public readonly record struct GeodeticLocation(Angle Latitude, Angle Longitude, double ElevationMeters)
{
    /// <summary>WGS84 equatorial radius in km (NIMA TR8350.2).</summary>
    public const double EquatorialRadiusKm = 6378.137;

    /// <summary>WGS84 flattening (NIMA TR8350.2).</summary>
    public const double Flattening = 1 / 298.257223563;

    /// <summary>A location from degrees and metres.</summary>
    public static GeodeticLocation FromDegrees(double latitudeDegrees, double longitudeDegrees, double elevationMeters = 0) =>
        new(Angle.FromDegrees(latitudeDegrees), Angle.FromDegrees(longitudeDegrees), elevationMeters);

    // Standard geodetic-to-Cartesian conversion on an ellipsoid (e.g. Explanatory Supplement 2013, §7.3.3 / SOFA iauGd2gce).
    /// <summary>The position in the Earth-fixed frame (x to the Greenwich meridian, z to the north pole), km.</summary>
    public CartesianVector EarthFixedKm()
    {
        var e2 = Flattening * (2 - Flattening);
        var (sinLat, cosLat) = Math.SinCos(Latitude.Radians);
        var (sinLon, cosLon) = Math.SinCos(Longitude.Radians);
        var n = EquatorialRadiusKm / Math.Sqrt(1 - e2 * sinLat * sinLat);
        var h = ElevationMeters / 1000.0;
        return new CartesianVector((n + h) * cosLat * cosLon, (n + h) * cosLat * sinLon, (n * (1 - e2) + h) * sinLat);
    }
}
