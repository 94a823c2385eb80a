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
        var offsetDays = OffsetDays(center, time);
        var early = center.PlusSeconds(-EclipseNightSky.HalfWidthHours * 3600);
        var late = center.PlusSeconds(EclipseNightSky.HalfWidthHours * 3600);
        var steady = Math.Abs(OffsetDays(early, time) - offsetDays) < 1e-3 / 86400 && Math.Abs(OffsetDays(late, time) - offsetDays) < 1e-3 / 86400;
        return steady ? tt => tt.JulianDate.PlusDays(-offsetDays).ToUtcInstant() : time.ToUtc;
    }

    // TT − UTC at an instant, in days.
    private static double OffsetDays(TtInstant tt, TimeScaleConverter time) => tt.JulianDate.Day - JulianDate.OfUtc(time.ToUtc(tt)).Day;
}
