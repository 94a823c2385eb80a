using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Frames;

/// <summary>
/// Long-term precession of Vondrák, Capitaine &amp; Wallace (2011, A&amp;A 534, A22; corrigendum 2012, A&amp;A 541, C1):
/// agrees with IAU 2006 near J2000 and stays sound over ±200 millennia.
/// </summary>
public static class VondrakPrecession
{

    /// <summary>The IAU 2006 obliquity of the ecliptic at J2000.0, 84381.406″.</summary>
    public static Angle ObliquityAtJ2000 { get; } = Angle.FromArcseconds(84381.406);

    // Vondrák et al. (2011), Table 1: periods (Julian centuries) and cosine/sine coefficients (″) of P_A and Q_A.
    private static readonly double[,] EclipticPeriodic =
    {
        { 708.15, -5486.751211, -684.661560, 667.666730, -5523.863691 },
        { 2309.00, -17.127623, 2446.283880, -2354.886252, -549.747450 },
        { 1620.00, -617.517403, 399.671049, -428.152441, -310.998056 },
        { 492.20, 413.442940, -356.652376, 376.202861, 421.535876 },
        { 1183.00, 78.614193, -186.387003, 184.778874, -36.776172 },
        { 622.00, -180.732815, -316.800070, 335.321713, -145.278396 },
        { 882.00, -87.676083, 198.296701, -185.138669, -34.744450 },
        { 547.00, 46.140315, 101.135679, -120.972830, 22.885731 },
    };

    // Vondrák et al. (2011), eq. 8: polynomial parts of P_A and Q_A (″).
    private static readonly double[] EclipticPPolynomial = [5851.607687, -0.1189000, -0.00028913, 0.000000101];
    private static readonly double[] EclipticQPolynomial = [-1600.886300, 1.1689818, -0.00000020, -0.000000437];

    // Vondrák et al. (2011), Table 2: periods and cosine/sine coefficients (″) of X_A and Y_A.
    private static readonly double[,] EquatorPeriodic =
    {
        { 256.75, -819.940624, 75004.344875, 81491.287984, 1558.515853 },
        { 708.15, -8444.676815, 624.033993, 787.163481, 7774.939698 },
        { 274.20, 2600.009459, 1251.136893, 1251.296102, -2219.534038 },
        { 241.45, 2755.175630, -1102.212834, -1257.950837, -2523.969396 },
        { 2309.00, -167.659835, -2660.664980, -2966.799730, 247.850422 },
        { 492.20, 871.855056, 699.291817, 639.744522, -846.485643 },
        { 396.10, 44.769698, 153.167220, 131.600209, -1393.124055 },
        { 288.90, -512.313065, -950.865637, -445.040117, 368.526116 },
        { 231.10, -819.415595, 499.754645, 584.522874, 749.045012 },
        { 1610.00, -538.071099, -145.188210, -89.756563, 444.704518 },
        { 620.00, -189.793622, 558.116553, 524.429630, 235.934465 },
        { 157.87, -402.922932, -23.923029, -13.549067, 374.049623 },
        { 220.30, 179.516345, -165.405086, -210.157124, -171.330180 },
        { 1200.00, -9.814756, 9.344131, -44.919798, -22.899655 },
    };

    // Vondrák et al. (2011), eq. 9: polynomial parts of X_A and Y_A (″).
    private static readonly double[] EquatorXPolynomial = [5453.282155, 0.4252841, -0.00037173, -0.000000152];
    private static readonly double[] EquatorYPolynomial = [-73750.930350, -0.7675452, -0.00018725, 0.000000231];

    // Vondrák et al. (2011), §2 and eq. 7: the ecliptic pole from P_A, Q_A, in the J2000 mean equatorial frame.
    /// <summary>Unit vector of the mean ecliptic pole of date, in the J2000.0 mean equator and equinox.</summary>
    public static CartesianVector EclipticPole(TtInstant tt)
    {
        var (p, q) = Sum(tt.JulianCenturiesSinceJ2000, EclipticPeriodic, EclipticPPolynomial, EclipticQPolynomial);
        var z = Math.Sqrt(Math.Max(0, 1 - p * p - q * q));
        var (s, c) = Math.SinCos(ObliquityAtJ2000.Radians);
        return new CartesianVector(p, -q * c - z * s, -q * s + z * c);
    }

    // Vondrák et al. (2011), §3: the equator pole from X_A, Y_A, in the J2000 mean equatorial frame.
    /// <summary>Unit vector of the mean equator pole of date, in the J2000.0 mean equator and equinox.</summary>
    public static CartesianVector EquatorPole(TtInstant tt)
    {
        var (x, y) = Sum(tt.JulianCenturiesSinceJ2000, EquatorPeriodic, EquatorXPolynomial, EquatorYPolynomial);
        return new CartesianVector(x, y, Math.Sqrt(Math.Max(0, 1 - x * x - y * y)));
    }

    // Vondrák et al. (2011), §4: precession matrix rows = equinox, equator-pole × equinox, equator pole.
    /// <summary>The matrix from the J2000.0 mean equator and equinox to the mean equator and equinox of date.</summary>
    public static RotationMatrix Matrix(TtInstant tt)
    {
        var equatorPole = EquatorPole(tt);
        var equinox = equatorPole.Cross(EclipticPole(tt)).Normalized();
        return RotationMatrix.FromRows(equinox, equatorPole.Cross(equinox), equatorPole);
    }

    /// <summary>The mean obliquity of date: the angle between the mean equator and ecliptic poles of this model.</summary>
    public static Angle MeanObliquity(TtInstant tt)
    {
        var equatorPole = EquatorPole(tt);
        var eclipticPole = EclipticPole(tt);
        return Angle.FromRadians(Math.Atan2(equatorPole.Cross(eclipticPole).Length, equatorPole.Dot(eclipticPole)));
    }

    private static (double First, double Second) Sum(double t, double[,] periodic, double[] first, double[] second)
    {
        double a = 0, b = 0;
        var w = 2 * Math.PI * t;
        for (var i = 0; i < periodic.GetLength(0); i++)
        {
            var (s, c) = Math.SinCos(w / periodic[i, 0]);
            a += c * periodic[i, 1] + s * periodic[i, 3];
            b += c * periodic[i, 2] + s * periodic[i, 4];
        }
        var power = 1.0;
        for (var i = 0; i < first.Length; i++, power *= t)
        {
            a += first[i] * power;
            b += second[i] * power;
        }
        return (a * Angle.RadiansPerArcsecond, b * Angle.RadiansPerArcsecond);
    }
}
