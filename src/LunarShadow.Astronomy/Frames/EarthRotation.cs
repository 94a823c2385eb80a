using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>The Earth's rotation: Earth rotation angle and Greenwich sidereal time (IAU 2006).</summary>
public static class EarthRotation
{

    // IERS Conventions (2010), eq. 5.15 (Capitaine et al. 2000): θ = 2π(0.7790572732640 + 1.00273781191135448·Du).
    /// <summary>The Earth rotation angle at an instant of UT1.</summary>
    public static Angle EarthRotationAngle(Ut1Instant ut1)
    {
        var du = ut1.JulianDate.Day - 2451545.0;
        var turns = 0.7790572732640 + 0.00273781191135448 * du + (du - Math.Floor(du));
        return Angle.FromRadians(2 * Math.PI * (turns - Math.Floor(turns)));
    }

    // Capitaine, Wallace & Chapront (2003), A&A 412, 567, eq. 42; IERS Conventions (2010), eq. 5.32: GMST = ERA + polynomial.
    /// <summary>Greenwich mean sidereal time (IAU 2006), from UT1 and the TT of the same instant.</summary>
    public static Angle GreenwichMeanSiderealTime(Ut1Instant ut1, TtInstant tt)
    {
        var t = tt.JulianCenturiesSinceJ2000;
        var polynomial = 0.014506 + t * (4612.156534 + t * (1.3915817 + t * (-0.00000044 + t * (-0.000029956 + t * -0.0000000368))));
        return (EarthRotationAngle(ut1) + Angle.FromArcseconds(polynomial)).NormalizedPositive();
    }

    // IERS Conventions (2010), eq. 5.35 and Table 5.2e (largest terms): EE = Δψ·cos ε_A + 0.00264096″ sin Ω + 0.00006352″ sin 2Ω.
    /// <summary>The equation of the equinoxes.</summary>
    public static Angle EquationOfEquinoxes(TtInstant tt, Nutation nutation, Angle meanObliquity)
    {
        var omega = NutationIau2000B.MoonNodeRadians(tt.JulianCenturiesSinceJ2000);
        var complementary = (0.00264096 * Math.Sin(omega) + 0.00006352 * Math.Sin(2 * omega)) * Angle.RadiansPerArcsecond;
        return Angle.FromRadians(nutation.InLongitude.Radians * Math.Cos(meanObliquity.Radians) + complementary);
    }

    /// <summary>Greenwich apparent sidereal time: GMST plus the equation of the equinoxes.</summary>
    public static Angle GreenwichApparentSiderealTime(Ut1Instant ut1, TtInstant tt, Nutation nutation, Angle meanObliquity) =>
        (GreenwichMeanSiderealTime(ut1, tt) + EquationOfEquinoxes(tt, nutation, meanObliquity)).NormalizedPositive();
}
