using NodaTime;

namespace LunarShadow.Astronomy.Time;

/// <summary>
/// A Julian date: days and fraction since −4712 January 1, 12h, on whatever time scale its holder
/// names (<see cref="TtInstant"/>, <see cref="Ut1Instant"/>).
/// </summary>
public readonly record struct JulianDate(double Day) : IComparable<JulianDate>
{
    /// <summary>The standard epoch J2000.0, JD 2451545.0.</summary>
    public static JulianDate J2000 => new(2451545.0);

    /// <summary>The first day of the Gregorian calendar, 1582 October 15, 0h (JD 2299160.5).</summary>
    public static JulianDate GregorianReform => new(2299160.5);

    /// <summary>Julian centuries of 36525 days since J2000.0.</summary>
    public double JulianCenturiesSinceJ2000 => (Day - 2451545.0) / 36525.0;

    /// <summary>Julian millennia of 365250 days since J2000.0 (the VSOP87 time argument).</summary>
    public double JulianMillenniaSinceJ2000 => (Day - 2451545.0) / 365250.0;

    /// <summary>Julian epoch: Julian years of 365.25 days, 2000.0 at J2000.0.</summary>
    public double JulianEpoch => 2000.0 + (Day - 2451545.0) / 365.25;

    /// <summary>
    /// The calendar year with the elapsed fraction of it (Julian calendar before 1582 October 15, Gregorian after), the
    /// argument of ΔT models as the Five Millennium Canon reckons it: 2000 July 2, 12h is 2000.5.
    /// </summary>
    public double DecimalYear
    {
        get
        {
            var year = ToCalendar().Year;
            var start = FromCalendar(year, 1, 1.0).Day;
            var end = FromCalendar(year + 1, 1, 1.0).Day;
            return year + (Day - start) / (end - start);
        }
    }

    // Meeus (1998), ch. 7: JD counts days of 86 400 s from −4712 January 1, 12h, NodaTime's Julian-date epoch; an Instant
    // counts UTC without leap seconds, as a Julian date of UTC does. NodaTime's own conversion, so that every UTC the
    // service has ever written stays the same to the millisecond.
    /// <summary>
    /// The one JD → UTC conversion: the instant this date names when read as a Julian date of UTC (good to about 25 µs
    /// near the present: the double's resolution of a Julian date).
    /// </summary>
    public Instant ToUtcInstant() => Instant.FromJulianDate(Day);

    /// <summary>The Julian date of UTC of an instant (the inverse of <see cref="ToUtcInstant"/>).</summary>
    public static JulianDate OfUtc(Instant utc) => new(utc.ToJulianDate());

    /// <summary>This date shifted by a number of SI seconds.</summary>
    public JulianDate PlusSeconds(double seconds) => new(Day + seconds / 86400.0);

    /// <summary>This date shifted by a number of days.</summary>
    public JulianDate PlusDays(double days) => new(Day + days);

    // Meeus, Astronomical Algorithms 2nd ed. (1998), ch. 7, eq. 7.1: calendar date to Julian day.
    /// <summary>
    /// The Julian date of a calendar date, the Julian calendar before 1582 October 15 and the Gregorian
    /// calendar from then on, as astronomers reckon; years in astronomical numbering (1 BC = year 0).
    /// </summary>
    public static JulianDate FromCalendar(int year, int month, double day)
    {
        if (month is < 1 or > 12) throw new ArgumentOutOfRangeException(nameof(month), month, "Month must be 1 to 12.");
        var gregorian = year > 1582 || (year == 1582 && (month > 10 || (month == 10 && day >= 15)));
        return FromCalendar(year, month, day, gregorian);
    }

    /// <summary>The Julian date of a date in the named calendar (Meeus 1998, eq. 7.1).</summary>
    public static JulianDate FromCalendar(int year, int month, double day, bool gregorian)
    {
        int y = year, m = month;
        if (m <= 2)
        {
            y -= 1;
            m += 12;
        }
        var b = 0.0;
        if (gregorian)
        {
            var a = Math.Floor(y / 100.0);
            b = 2 - a + Math.Floor(a / 4);
        }
        return new JulianDate(Math.Floor(365.25 * (y + 4716)) + Math.Floor(30.6001 * (m + 1)) + day + b - 1524.5);
    }

    // Meeus, Astronomical Algorithms 2nd ed. (1998), ch. 7: Julian day to calendar date (valid for JD ≥ 0).
    /// <summary>The calendar date, Julian calendar before 1582 October 15 and Gregorian from then on.</summary>
    public CalendarDate ToCalendar()
    {
        var z = Math.Floor(Day + 0.5);
        var f = Day + 0.5 - z;
        double a;
        if (z < 2299161)
        {
            a = z;
        }
        else
        {
            var alpha = Math.Floor((z - 1867216.25) / 36524.25);
            a = z + 1 + alpha - Math.Floor(alpha / 4);
        }
        var b = a + 1524;
        var c = Math.Floor((b - 122.1) / 365.25);
        var d = Math.Floor(365.25 * c);
        var e = Math.Floor((b - d) / 30.6001);
        var day = b - d - Math.Floor(30.6001 * e) + f;
        var month = (int)(e < 14 ? e - 1 : e - 13);
        var year = (int)(month > 2 ? c - 4716 : c - 4715);
        return new CalendarDate(year, month, day, z >= 2299161);
    }

    /// <inheritdoc />
    public int CompareTo(JulianDate other) => Day.CompareTo(other.Day);

    /// <summary>Ordering.</summary>
    public static bool operator <(JulianDate a, JulianDate b) => a.Day < b.Day;

    /// <summary>Ordering.</summary>
    public static bool operator >(JulianDate a, JulianDate b) => a.Day > b.Day;

    /// <summary>Ordering.</summary>
    public static bool operator <=(JulianDate a, JulianDate b) => a.Day <= b.Day;

    /// <summary>Ordering.</summary>
    public static bool operator >=(JulianDate a, JulianDate b) => a.Day >= b.Day;
}
