namespace LunarShadow.Astronomy.Time;

/// <summary>The span over which LunarShadow computes: the years −1999 to +3000 (astronomical numbering).</summary>
public static class SupportedRange
{
    /// <summary>First supported year.</summary>
    public const int FirstYear = -1999;

    /// <summary>Last supported year.</summary>
    public const int LastYear = 3000;

    /// <summary>−1999 January 1, 0h (Julian calendar).</summary>
    public static JulianDate Start { get; } = JulianDate.FromCalendar(FirstYear, 1, 1.0);

    /// <summary>+3001 January 1, 0h (Gregorian), the first instant past the range.</summary>
    public static JulianDate End { get; } = JulianDate.FromCalendar(LastYear + 1, 1, 1.0);

    /// <summary>True when the date lies in the supported years.</summary>
    public static bool Contains(JulianDate date) => date >= Start && date < End;

    /// <summary>Throws <see cref="OutsideSupportedRangeException"/> when the date lies outside the supported years.</summary>
    public static void EnsureContains(JulianDate date)
    {
        if (!Contains(date)) throw new OutsideSupportedRangeException(date);
    }
}

/// <summary>Thrown for an instant outside the years −1999 to +3000.</summary>
public sealed class OutsideSupportedRangeException(JulianDate date) : ArgumentOutOfRangeException(
    nameof(date),
    FormattableString.Invariant($"JD {date.Day:0.#####} lies outside the supported years {SupportedRange.FirstYear} to +{SupportedRange.LastYear}."))
{
    /// <summary>The offending date.</summary>
    public JulianDate Date { get; } = date;
}
