namespace LunarShadow.Astronomy.Units;

/// <summary>
/// A plane angle. Constructed from a named unit and read in a named unit, so that degrees,
/// radians, arc-seconds and hours of right ascension cannot be mixed up by accident.
/// </summary>
public readonly record struct Angle : IComparable<Angle>
{
    private const double DegreesPerRadian = 180.0 / Math.PI;

    /// <summary>Radians in one arc-second, π / 648000: the one conversion the series and models scale by.</summary>
    public const double RadiansPerArcsecond = Math.PI / (180.0 * 3600.0);

    private Angle(double radians) => Radians = radians;

    /// <summary>The angle in radians.</summary>
    public double Radians { get; }

    /// <summary>The angle in degrees.</summary>
    public double Degrees => Radians * DegreesPerRadian;

    /// <summary>The angle in seconds of arc.</summary>
    public double Arcseconds => Degrees * 3600.0;

    /// <summary>The angle in hours (15° to the hour), as right ascension and hour angle are given.</summary>
    public double Hours => Degrees / 15.0;

    /// <summary>Zero.</summary>
    public static Angle Zero => default;

    /// <summary>An angle from radians.</summary>
    public static Angle FromRadians(double radians) => new(radians);

    /// <summary>An angle from degrees.</summary>
    public static Angle FromDegrees(double degrees) => new(degrees / DegreesPerRadian);

    /// <summary>An angle from seconds of arc.</summary>
    public static Angle FromArcseconds(double arcseconds) => FromDegrees(arcseconds / 3600.0);

    /// <summary>An angle from hours (15° to the hour).</summary>
    public static Angle FromHours(double hours) => FromDegrees(hours * 15.0);

    /// <summary>The same direction reduced to [0, 2π).</summary>
    public Angle NormalizedPositive()
    {
        var r = Math.IEEERemainder(Radians, 2 * Math.PI);
        return new Angle(r < 0 ? r + 2 * Math.PI : r);
    }

    /// <summary>The same direction reduced to [−π, π).</summary>
    public Angle NormalizedSigned()
    {
        var r = NormalizedPositive().Radians;
        return new Angle(r >= Math.PI ? r - 2 * Math.PI : r);
    }

    /// <inheritdoc />
    public int CompareTo(Angle other) => Radians.CompareTo(other.Radians);

    /// <summary>Sum of two angles.</summary>
    public static Angle operator +(Angle a, Angle b) => new(a.Radians + b.Radians);

    /// <summary>Difference of two angles.</summary>
    public static Angle operator -(Angle a, Angle b) => new(a.Radians - b.Radians);

    /// <summary>Negation.</summary>
    public static Angle operator -(Angle a) => new(-a.Radians);

    /// <summary>Scaling.</summary>
    public static Angle operator *(Angle a, double factor) => new(a.Radians * factor);

    /// <summary>Ordering.</summary>
    public static bool operator <(Angle a, Angle b) => a.Radians < b.Radians;

    /// <summary>Ordering.</summary>
    public static bool operator >(Angle a, Angle b) => a.Radians > b.Radians;

    /// <summary>Ordering.</summary>
    public static bool operator <=(Angle a, Angle b) => a.Radians <= b.Radians;

    /// <summary>Ordering.</summary>
    public static bool operator >=(Angle a, Angle b) => a.Radians >= b.Radians;

    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant($"{Degrees:0.######}°");
}
