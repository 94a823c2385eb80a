using NodaTime;

namespace LunarShadow.Astronomy.Time;

/// <summary>
/// TAI − UTC since 1972 from the IERS leap-second table (IERS Bulletin C). Before 1972 UTC is not
/// an atomic scale that this table describes; LunarShadow then treats UTC as UT1 (see docs/methods.md).
/// </summary>
public static class LeapSecondTable
{
    // IERS Bulletin C history of TAI − UTC (the table the IERS publishes as Leap_Second.dat):
    // each row is the UTC date from which the offset holds.
    private static readonly (Instant From, int TaiMinusUtcSeconds)[] Steps =
    [
        (Utc(1972, 1, 1), 10), (Utc(1972, 7, 1), 11), (Utc(1973, 1, 1), 12), (Utc(1974, 1, 1), 13),
        (Utc(1975, 1, 1), 14), (Utc(1976, 1, 1), 15), (Utc(1977, 1, 1), 16), (Utc(1978, 1, 1), 17),
        (Utc(1979, 1, 1), 18), (Utc(1980, 1, 1), 19), (Utc(1981, 7, 1), 20), (Utc(1982, 7, 1), 21),
        (Utc(1983, 7, 1), 22), (Utc(1985, 7, 1), 23), (Utc(1988, 1, 1), 24), (Utc(1990, 1, 1), 25),
        (Utc(1991, 1, 1), 26), (Utc(1992, 7, 1), 27), (Utc(1993, 7, 1), 28), (Utc(1994, 7, 1), 29),
        (Utc(1996, 1, 1), 30), (Utc(1997, 7, 1), 31), (Utc(1999, 1, 1), 32), (Utc(2006, 1, 1), 33),
        (Utc(2009, 1, 1), 34), (Utc(2012, 7, 1), 35), (Utc(2015, 7, 1), 36), (Utc(2017, 1, 1), 37),
    ];

    /// <summary>Start of the table: 1972 January 1, 0h UTC.</summary>
    public static Instant Start { get; } = Steps[0].From;

    /// <summary>
    /// End of the span the table is known to cover: the IERS announces each leap second about six months
    /// ahead, and the latest Bulletin C we carry announced none before 2026 July 1 (from memory: Bulletin C 71).
    /// After this instant the future UTC is taken as UT1 = TT − ΔT, as eclipse predictions conventionally do.
    /// </summary>
    public static Instant KnownUntil { get; } = Utc(2026, 7, 1);

    /// <summary>True when TAI − UTC at this UTC instant is given by the table.</summary>
    public static bool Covers(Instant utc) => utc >= Start && utc < KnownUntil;

    /// <summary>TAI − UTC in seconds at a UTC instant covered by the table.</summary>
    public static int TaiMinusUtcSeconds(Instant utc)
    {
        if (!Covers(utc)) throw new ArgumentOutOfRangeException(nameof(utc), utc, "The leap-second table covers 1972-01-01 until its announced horizon only.");
        var lo = 0;
        var hi = Steps.Length - 1;
        while (lo < hi)
        {
            var mid = (lo + hi + 1) / 2;
            if (Steps[mid].From <= utc) lo = mid;
            else hi = mid - 1;
        }
        return Steps[lo].TaiMinusUtcSeconds;
    }

    private static Instant Utc(int year, int month, int day) => Instant.FromUtc(year, month, day, 0, 0);
}
