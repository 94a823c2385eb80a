namespace LunarShadow.Astronomy.Time;

/// <summary>
/// A date in the astronomers' calendar: Julian before 1582 October 15, Gregorian from then on,
/// years in astronomical numbering (year 0 is 1 BC, year −1 is 2 BC).
/// </summary>
/// <param name="Year">Astronomical year number.</param>
/// <param name="Month">Month 1–12.</param>
/// <param name="Day">Day of the month with its fraction (1.5 is the 1st at noon).</param>
/// <param name="IsGregorian">True when the date is reckoned in the Gregorian calendar.</param>
public readonly record struct CalendarDate(int Year, int Month, double Day, bool IsGregorian)
{
    /// <summary>The whole day of the month.</summary>
    public int DayOfMonth => (int)Math.Floor(Day);

    /// <summary>The Julian date of this date's start (its day fraction included), in its own calendar (Meeus 1998, eq. 7.1).</summary>
    public JulianDate ToJulianDate() => JulianDate.FromCalendar(Year, Month, Day, IsGregorian);

    /// <summary>The date as YYYY-MM-DD, with a minus sign and at least four digits for negative years.</summary>
    public string ToIsoDateString() => Year < 0
        ? FormattableString.Invariant($"-{-Year:0000}-{Month:00}-{DayOfMonth:00}")
        : FormattableString.Invariant($"{Year:0000}-{Month:00}-{DayOfMonth:00}");
}
