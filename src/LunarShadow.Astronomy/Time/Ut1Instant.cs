namespace LunarShadow.Astronomy.Time;

/// <summary>An instant in Universal Time UT1, the time scale of the Earth's rotation angle.</summary>
public readonly record struct Ut1Instant(JulianDate JulianDate) : IComparable<Ut1Instant>
{
    /// <summary>An instant from a Julian date in UT1.</summary>
    public static Ut1Instant FromJulianDate(double day) => new(new JulianDate(day));

    /// <inheritdoc />
    public int CompareTo(Ut1Instant other) => JulianDate.CompareTo(other.JulianDate);

    /// <summary>Ordering.</summary>
    public static bool operator <(Ut1Instant a, Ut1Instant b) => a.JulianDate < b.JulianDate;

    /// <summary>Ordering.</summary>
    public static bool operator >(Ut1Instant a, Ut1Instant b) => a.JulianDate > b.JulianDate;

    /// <summary>Ordering.</summary>
    public static bool operator <=(Ut1Instant a, Ut1Instant b) => a.JulianDate <= b.JulianDate;

    /// <summary>Ordering.</summary>
    public static bool operator >=(Ut1Instant a, Ut1Instant b) => a.JulianDate >= b.JulianDate;
}
