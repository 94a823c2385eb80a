using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Sites;

/// <summary>
/// TT → UTC for the instants of one eclipse night. TT − UTC is constant through the night unless a leap second falls
/// in it, so one full conversion at greatest eclipse serves every instant; when the ends of the night disagree, each
/// instant is converted in full.
/// </summary>
public static class NightClock
{
    /// <summary>The conversion for the night of an eclipse.</summary>
    public static Func<TtInstant, Instant> For(LunarEclipse eclipse, TimeScaleConverter time)
    {
        var center = eclipse.GreatestEclipse;
        var offset = center.JulianDate.Day - time.ToUtc(center).ToJulianDate();
        var early = center.PlusSeconds(-EclipseNightSky.HalfWidthHours * 3600);
        var late = center.PlusSeconds(EclipseNightSky.HalfWidthHours * 3600);
        var steady = Math.Abs(early.JulianDate.Day - time.ToUtc(early).ToJulianDate() - offset) < 1e-3 / 86400
            && Math.Abs(late.JulianDate.Day - time.ToUtc(late).ToJulianDate() - offset) < 1e-3 / 86400;
        return steady
            ? tt => Instant.FromUnixTimeTicks((long)Math.Round((tt.JulianDate.Day - offset - 2440587.5) * 864_000_000_000.0))
            : time.ToUtc;
    }
}
