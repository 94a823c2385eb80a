using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>
/// The Moon's orientation at one instant: the rotation from the true equator and equinox of date to the selenographic
/// frame (x toward the mean sub-Earth point, z to the north pole, y toward 90° east), from the IAU rotation elements
/// with the physical librations as Meeus gives them. Everything the Moon's physical ephemeris reports — librations,
/// position angle of the axis, sub-solar point, where a crater stands on the disc — is read from this one matrix.
/// Accuracy: that of Meeus' series, about 0.01° on the librations (his statement, ch. 53).
/// </summary>
public sealed class MoonOrientation
{
    // Meeus (1998), ch. 53: inclination of the mean lunar equator to the ecliptic, I = 1.54242° (IAU).
    private static readonly double Inclination = Angle.FromDegrees(1.54242).Radians;

    private MoonOrientation(RotationMatrix fromTrueEquatorOfDate) => FromTrueEquatorOfDate = fromTrueEquatorOfDate;

    /// <summary>The rotation taking a vector of the true equator and equinox of date into the selenographic frame.</summary>
    public RotationMatrix FromTrueEquatorOfDate { get; }

    /// <summary>The rotation taking a selenographic vector into the true equator and equinox of date.</summary>
    public RotationMatrix ToTrueEquatorOfDate => FromTrueEquatorOfDate.Transposed();

    /// <summary>The orientation at an instant, with the nutation and mean obliquity of date the caller already has.</summary>
    public static MoonOrientation At(TtInstant tt, Nutation nutation, Angle meanObliquity)
    {
        var trueObliquity = meanObliquity + nutation.InObliquity;
        // True equator of date → true ecliptic of date → longitudes from the mean equinox (λ − Δψ, as Meeus' W uses).
        var toMeanEquinoxEcliptic = RotationMatrix.AboutZ(nutation.InLongitude.Radians) * RotationMatrix.AboutX(trueObliquity.Radians);
        return new MoonOrientation(SelenographicFromMeanEquinoxEcliptic(tt) * toMeanEquinoxEcliptic);
    }

    /// <summary>The orientation at an instant, computing nutation and obliquity itself.</summary>
    public static MoonOrientation At(TtInstant tt) => At(tt, NutationIau2000B.At(tt), Obliquity.Mean(tt));

    // Meeus (1998), ch. 53, eqs. 53.1 and the physical librations ρ, σ, τ (IAU rotation elements): the lunar equator,
    // inclined I + ρ, has its ascending node at Ω + σ/sin I (the orbit's descending node, Cassini's laws), and the prime
    // meridian lies F + 180° + τ − σ/sin I beyond that node. Written as one rotation; to first order it reproduces
    // Meeus' l = l′ + l″, b = b′ + b″ and P exactly (tested against his Example 53.a).
    /// <summary>The rotation from the ecliptic of date (longitudes from the mean equinox) into the selenographic frame.</summary>
    public static RotationMatrix SelenographicFromMeanEquinoxEcliptic(TtInstant tt)
    {
        var (d, m, mPrime, f, omega, e, t) = MeanArguments(tt);
        var (rho, sigma, tau) = PhysicalLibrations(d, m, mPrime, f, omega, e, t);
        var nodeShift = sigma / Math.Sin(Inclination);
        return RotationMatrix.AboutZ(f + Math.PI + tau - nodeShift)
            * RotationMatrix.AboutX(-(Inclination + rho))
            * RotationMatrix.AboutZ(omega + nodeShift);
    }

    /// <summary>The selenographic point toward which a vector of the true equator of date points from the Moon's centre.</summary>
    public SelenographicPoint PointToward(CartesianVector trueEquatorOfDate) => SelenographicPoint.Toward(FromTrueEquatorOfDate * trueEquatorOfDate);

    /// <summary>The Moon's north pole as a unit vector of the true equator of date.</summary>
    public CartesianVector NorthPole => ToTrueEquatorOfDate * new CartesianVector(0, 0, 1);

    // Meeus (1998), eq. 53.x reduced to vectors: the position angle on the sky of a direction on the disc, from the
    // north point through east, for a line of sight along lineOfSight (both in the true equator of date).
    /// <summary>Position angle, from celestial north through east, of an offset from the Moon's centre seen along a line of sight.</summary>
    public static Angle PositionAngle(CartesianVector offset, CartesianVector lineOfSight)
    {
        var d = lineOfSight.Normalized();
        var east = new CartesianVector(-d.Y, d.X, 0).Normalized();
        var north = d.Cross(east);
        return Angle.FromRadians(Math.Atan2(offset.Dot(east), offset.Dot(north))).NormalizedPositive();
    }

    /// <summary>The position angle of the Moon's axis (its north pole) seen along a line of sight from the observer to the Moon.</summary>
    public Angle AxisPositionAngle(CartesianVector lineOfSight) => PositionAngle(NorthPole, lineOfSight);

    // Meeus (1998), eqs. 47.2–47.6 and 47.6 (E): D, M, M′, F, Ω in radians, with the eccentricity factor and T.
    private static (double D, double M, double MPrime, double F, double Omega, double E, double T) MeanArguments(TtInstant tt)
    {
        var t = tt.JulianCenturiesSinceJ2000;
        double Rad(double degrees) => Angle.FromDegrees(degrees % 360.0).Radians;
        var d = 297.8501921 + t * (445267.1114034 + t * (-0.0018819 + t * (1.0 / 545868 - t / 113065000)));
        var m = 357.5291092 + t * (35999.0502909 + t * (-0.0001536 + t / 24490000));
        var mPrime = 134.9633964 + t * (477198.8675055 + t * (0.0087414 + t * (1.0 / 69699 - t / 14712000)));
        var f = 93.2720950 + t * (483202.0175233 + t * (-0.0036539 + t * (-1.0 / 3526000 + t / 863310000)));
        var omega = 125.0445479 + t * (-1934.1362891 + t * (0.0020754 + t * (1.0 / 467441 - t / 60616000)));
        var e = 1 - t * (0.002516 + t * 0.0000074);
        return (Rad(d), Rad(m), Rad(mPrime), Rad(f), Rad(omega), e, t);
    }

    // Meeus (1998), ch. 53: the physical librations ρ, σ, τ (degrees in the book; radians here).
    private static (double Rho, double Sigma, double Tau) PhysicalLibrations(double d, double m, double mp, double f, double omega, double e, double t)
    {
        var k1 = Angle.FromDegrees(119.75 + 131.849 * t).Radians;
        var k2 = Angle.FromDegrees(72.56 + 20.186 * t).Radians;
        var rho = -0.02752 * Math.Cos(mp) - 0.02245 * Math.Sin(f) + 0.00684 * Math.Cos(mp - 2 * f) - 0.00293 * Math.Cos(2 * f)
            - 0.00085 * Math.Cos(2 * f - 2 * d) - 0.00054 * Math.Cos(mp - 2 * d) - 0.00020 * Math.Sin(mp + f)
            - 0.00020 * Math.Cos(mp + 2 * f) - 0.00020 * Math.Cos(mp - f) + 0.00014 * Math.Cos(mp + 2 * f - 2 * d);
        var sigma = -0.02816 * Math.Sin(mp) + 0.02244 * Math.Cos(f) - 0.00682 * Math.Sin(mp - 2 * f) - 0.00279 * Math.Sin(2 * f)
            - 0.00083 * Math.Sin(2 * f - 2 * d) + 0.00069 * Math.Sin(mp - 2 * d) + 0.00040 * Math.Cos(mp + f)
            - 0.00025 * Math.Sin(2 * mp) - 0.00023 * Math.Sin(mp + 2 * f) + 0.00020 * Math.Cos(mp - f)
            + 0.00019 * Math.Sin(mp - f) + 0.00013 * Math.Sin(mp + 2 * f - 2 * d) - 0.00010 * Math.Cos(mp - 3 * f);
        var tau = 0.02520 * e * Math.Sin(m) + 0.00473 * Math.Sin(2 * mp - 2 * f) - 0.00467 * Math.Sin(mp) + 0.00396 * Math.Sin(k1)
            + 0.00276 * Math.Sin(2 * mp - 2 * d) + 0.00196 * Math.Sin(omega) - 0.00183 * Math.Cos(mp - f)
            + 0.00115 * Math.Sin(mp - 2 * d) - 0.00096 * Math.Sin(mp - d) + 0.00046 * Math.Sin(2 * f - 2 * d)
            - 0.00039 * Math.Sin(mp - f) - 0.00032 * Math.Sin(mp - m - d) + 0.00027 * Math.Sin(2 * mp - m - 2 * d)
            + 0.00023 * Math.Sin(k2) - 0.00014 * Math.Sin(2 * d) + 0.00014 * Math.Cos(2 * mp - 2 * f)
            - 0.00012 * Math.Sin(mp - 2 * f) - 0.00012 * Math.Sin(2 * mp) + 0.00011 * Math.Sin(2 * mp - 2 * m - 2 * d);
        return (Angle.FromDegrees(rho).Radians, Angle.FromDegrees(sigma).Radians, Angle.FromDegrees(tau).Radians);
    }
}
