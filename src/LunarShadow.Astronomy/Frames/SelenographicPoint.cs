using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>
/// A point on the Moon in selenographic coordinates (IAU mean-Earth/polar-axis frame as Meeus uses it): latitude north
/// positive, longitude east positive (toward Mare Crisium), −180° to +180°.
/// </summary>
/// <param name="Latitude">Selenographic latitude.</param>
/// <param name="Longitude">Selenographic longitude, east positive.</param>
public readonly record struct SelenographicPoint(Angle Latitude, Angle Longitude)
{
    /// <summary>A point from degrees.</summary>
    public static SelenographicPoint FromDegrees(double latitudeDegrees, double longitudeDegrees) =>
        new(Angle.FromDegrees(latitudeDegrees), Angle.FromDegrees(longitudeDegrees));

    /// <summary>The point in the direction of a selenocentric vector given in the selenographic frame.</summary>
    public static SelenographicPoint Toward(CartesianVector selenographic) =>
        new(selenographic.Latitude, selenographic.Longitude.NormalizedSigned());

    /// <summary>The selenocentric vector of the point on a sphere of the given radius, in the selenographic frame.</summary>
    public CartesianVector ToVector(double radius) => CartesianVector.FromSpherical(Longitude.Radians, Latitude.Radians, radius);
}
