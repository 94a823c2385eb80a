using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>The obliquity of the ecliptic.</summary>
public static class Obliquity
{
    // Capitaine, Wallace & Chapront (2003), A&A 412, 567, eq. 39 (IAU 2006): ε_A in arcseconds.
    /// <summary>The IAU 2006 mean obliquity polynomial, for dates near the present.</summary>
    public static Angle MeanIau2006(TtInstant tt)
    {
        var t = tt.JulianCenturiesSinceJ2000;
        return Angle.FromArcseconds(84381.406 + t * (-46.836769 + t * (-0.0001831 + t * (0.00200340 + t * (-0.000000576 + t * -0.0000000434)))));
    }

    /// <summary>The mean obliquity used throughout LunarShadow: that of the Vondrák et al. (2011) long-term model.</summary>
    public static Angle Mean(TtInstant tt) => VondrakPrecession.MeanObliquity(tt);

    /// <summary>The true obliquity: mean obliquity plus nutation in obliquity.</summary>
    public static Angle True(TtInstant tt, Nutation nutation) => Mean(tt) + nutation.InObliquity;
}
