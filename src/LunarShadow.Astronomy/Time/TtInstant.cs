namespace LunarShadow.Astronomy.Time;

/// <summary>An instant in Terrestrial Time (TT), the time argument of the ephemerides.</summary>
public readonly record struct TtInstant(JulianDate JulianDate) : IComparable<TtInstant>
{
    /// <summary>An instant from a Julian date in TT.</summary>
    public static TtInstant FromJulianDate(double day) => new(new JulianDate(day));

    /// <summary>Julian centuries of TT since J2000.0.</summary>
    public double JulianCenturiesSinceJ2000 => JulianDate.JulianCenturiesSinceJ2000;

    /// <summary>This instant shifted by SI seconds.</summary>
    public TtInstant PlusSeconds(double seconds) => new(JulianDate.PlusSeconds(seconds));

    /// <summary>Seconds from <paramref name="other"/> to this instant.</summary>
    public double SecondsSince(TtInstant other) => (JulianDate.Day - other.JulianDate.Day) * 86400.0;

    /// <inheritdoc />
    public int CompareTo(TtInstant other) => JulianDate.CompareTo(other.JulianDate);

    /// <summary>Ordering.</summary>
    public static bool operator <(TtInstant a, TtInstant b) => a.JulianDate < b.JulianDate;

    /// <summary>Ordering.</summary>
    public static bool operator >(TtInstant a, TtInstant b) => a.JulianDate > b.JulianDate;

    /// <summary>Ordering.</summary>
    public static bool operator <=(TtInstant a, TtInstant b) => a.JulianDate <= b.JulianDate;

    /// <summary>Ordering.</summary>
    public static bool operator >=(TtInstant a, TtInstant b) => a.JulianDate >= b.JulianDate;
}
