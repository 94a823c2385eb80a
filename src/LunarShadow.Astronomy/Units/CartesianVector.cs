namespace LunarShadow.Astronomy.Units;

/// <summary>A three-component Cartesian vector; its unit and frame are stated by whoever holds it.</summary>
public readonly record struct CartesianVector(double X, double Y, double Z)
{
    /// <summary>Euclidean length.</summary>
    public double Length => Math.Sqrt(X * X + Y * Y + Z * Z);

    /// <summary>Scalar product.</summary>
    public double Dot(CartesianVector other) => X * other.X + Y * other.Y + Z * other.Z;

    /// <summary>Vector product.</summary>
    public CartesianVector Cross(CartesianVector o) => new(Y * o.Z - Z * o.Y, Z * o.X - X * o.Z, X * o.Y - Y * o.X);

    /// <summary>The unit vector in the same direction.</summary>
    public CartesianVector Normalized() => this / Length;

    /// <summary>The vector from spherical coordinates: longitude, latitude and radius.</summary>
    public static CartesianVector FromSpherical(double longitudeRadians, double latitudeRadians, double radius)
    {
        var (sinLat, cosLat) = Math.SinCos(latitudeRadians);
        var (sinLon, cosLon) = Math.SinCos(longitudeRadians);
        return new CartesianVector(radius * cosLat * cosLon, radius * cosLat * sinLon, radius * sinLat);
    }

    /// <summary>Longitude (right ascension) of the direction, in [0, 2π).</summary>
    public Angle Longitude => Angle.FromRadians(Math.Atan2(Y, X)).NormalizedPositive();

    /// <summary>Latitude (declination) of the direction.</summary>
    public Angle Latitude => Angle.FromRadians(Math.Atan2(Z, Math.Sqrt(X * X + Y * Y)));

    /// <summary>Sum.</summary>
    public static CartesianVector operator +(CartesianVector a, CartesianVector b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);

    /// <summary>Difference.</summary>
    public static CartesianVector operator -(CartesianVector a, CartesianVector b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);

    /// <summary>Negation.</summary>
    public static CartesianVector operator -(CartesianVector a) => new(-a.X, -a.Y, -a.Z);

    /// <summary>Scaling.</summary>
    public static CartesianVector operator *(CartesianVector a, double f) => new(a.X * f, a.Y * f, a.Z * f);

    /// <summary>Scaling.</summary>
    public static CartesianVector operator *(double f, CartesianVector a) => a * f;

    /// <summary>Division by a scalar.</summary>
    public static CartesianVector operator /(CartesianVector a, double d) => new(a.X / d, a.Y / d, a.Z / d);
}
