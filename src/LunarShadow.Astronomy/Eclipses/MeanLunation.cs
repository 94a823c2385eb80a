using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// Mean phases of the Moon by lunation number (Meeus 1998, ch. 49): lunation 0 is the new Moon of 2000 January 6, and
/// the full Moon of lunation k falls half a lunation after its new Moon.
/// </summary>
public static class MeanLunation
{
    /// <summary>The mean synodic month, days (Meeus 1998, eq. 49.1).</summary>
    public const double SynodicMonthDays = 29.530588861;

    // Meeus (1998), eq. 49.1, with k + 0.5 for the full Moon.
    /// <summary>The mean full Moon of lunation k, as an instant of TT.</summary>
    public static TtInstant FullMoon(long k)
    {
        var kk = k + 0.5;
        var t = kk / 1236.85;
        return TtInstant.FromJulianDate(2451550.09766 + SynodicMonthDays * kk + t * t * (0.00015437 + t * (-0.000000150 + t * 0.00000000073)));
    }

    // Meeus (1998), ch. 49: the Moon's argument of latitude F at the mean phase.
    /// <summary>The Moon's mean argument of latitude at the mean full Moon of lunation k, degrees.</summary>
    public static double ArgumentOfLatitudeDegrees(long k)
    {
        var kk = k + 0.5;
        var t = kk / 1236.85;
        return 160.7108 + 390.67050284 * kk + t * t * (-0.0016118 + t * (-0.00000227 + t * 0.000000011));
    }

    /// <summary>The lunation whose mean full Moon is the last one at or before the instant.</summary>
    public static long LastFullMoonAtOrBefore(TtInstant tt)
    {
        var k = (long)Math.Floor((tt.JulianDate.Day - 2451550.09766) / SynodicMonthDays - 0.5);
        while (FullMoon(k + 1) <= tt) k++;
        while (FullMoon(k) > tt) k--;
        return k;
    }
}
