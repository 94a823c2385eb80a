using LunarShadow.Astronomy.Embedded;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Ephemeris;

/// <summary>
/// The geocentric Moon from the lunar theory ELP/MPP02 (Chapront &amp; Francou 2003, A&amp;A 404, 735) with the
/// constants fitted to DE405, evaluated from the published series carried by astronomia@4.2.0.
/// </summary>
public sealed class LunarTheory
{
    private readonly double[] _meanLongitude;
    private readonly PolynomialPhaseSeries _longitude, _latitude, _distance;

    private LunarTheory(BlockFile file, double minimumArcseconds = 0, double minimumKm = 0)
    {
        // Time spans up to 40 centuries from J2000 over the supported years.
        const double centuries = 40;
        _meanLongitude = file["W1"][0];
        _longitude = PolynomialPhaseSeries.FromBlocks(file, "L", PolynomialPhaseSeries.TermShape.Sine, minimumArcseconds, centuries);
        _latitude = PolynomialPhaseSeries.FromBlocks(file, "B", PolynomialPhaseSeries.TermShape.Sine, minimumArcseconds, centuries);
        _distance = PolynomialPhaseSeries.FromBlocks(file, "R", PolynomialPhaseSeries.TermShape.Sine, minimumKm, centuries);
    }

    /// <summary>The truncated series (within 0.1″ of the full one), used for all computation.</summary>
    public static LunarTheory Truncated { get; } = new(BlockFile.FromResource(EmbeddedDataSet.LunarTruncated));

    private static readonly Lazy<LunarTheory> FullSeries = new(() => new LunarTheory(BlockFile.FromResource(EmbeddedDataSet.LunarFull)));

    /// <summary>All published terms; slower, for verification.</summary>
    public static LunarTheory Full => FullSeries.Value;

    private static readonly Lazy<LunarTheory> ScreeningSeries = new(() => new LunarTheory(BlockFile.FromResource(EmbeddedDataSet.LunarTruncated), 2.0, 2.0));

    /// <summary>
    /// The same theory keeping only terms that reach 2″ (or 2 km) over the supported years: good to some 20″, and some
    /// twenty times cheaper, for screening full Moons before the exact computation.
    /// </summary>
    public static LunarTheory Screening => ScreeningSeries.Value;

    /// <summary>Number of periodic terms in this series.</summary>
    public int TermCount => _longitude.TermCount + _latitude.TermCount + _distance.TermCount;

    // Chapront & Francou (2003), ELP/MPP02 with DE405 constants: V = W1 + ΣL, U = ΣB, r = ΣR; then the rotation
    // from the mean ecliptic of date to the inertial mean ecliptic of J2000 with Laskar's (1986) P and Q.
    /// <summary>The geometric geocentric Moon at an instant of TT (TDB, which differs by under 2 ms).</summary>
    public EclipticState GeocentricState(TtInstant tt)
    {
        var t = tt.JulianCenturiesSinceJ2000;
        var (w1, w1Rate) = Polynomial(_meanLongitude, t);
        var (l, lRate) = _longitude.Evaluate(t);
        var (b, bRate) = _latitude.Evaluate(t);
        var (r, rRate) = _distance.Evaluate(t);
        var v = w1 + l * Angle.RadiansPerArcsecond;
        var vRate = w1Rate + lRate * Angle.RadiansPerArcsecond;
        var u = b * Angle.RadiansPerArcsecond;
        var uRate = bRate * Angle.RadiansPerArcsecond;

        var (sinV, cosV) = Math.SinCos(v);
        var (sinU, cosU) = Math.SinCos(u);
        var ofDate = new CartesianVector(r * cosU * cosV, r * cosU * sinV, r * sinU);
        var ofDateRate = new CartesianVector(
            rRate * cosU * cosV - r * sinU * uRate * cosV - r * cosU * sinV * vRate,
            rRate * cosU * sinV - r * sinU * uRate * sinV + r * cosU * cosV * vRate,
            rRate * sinU + r * cosU * uRate);
        var toJ2000 = LaskarEclipticRotation(t);
        return new EclipticState(toJ2000 * ofDate, toJ2000 * ofDateRate / 36525.0);
    }

    // Laskar (1986) via Chapront & Francou (2003), ELP/MPP02 notice: P and Q of the ecliptic of date, and the matrix
    // taking ecliptic-of-date rectangular coordinates to the inertial mean ecliptic and equinox of J2000.
    private static RotationMatrix LaskarEclipticRotation(double t)
    {
        var p = t * (0.10180391e-4 + t * (0.47020439e-6 + t * (-0.5417367e-9 + t * (-0.2507948e-11 + t * 0.463486e-14))));
        var q = t * (-0.113469002e-3 + t * (0.12372674e-6 + t * (0.12654170e-8 + t * (-0.1371808e-11 + t * -0.320334e-14))));
        var s = Math.Sqrt(1 - p * p - q * q);
        return new RotationMatrix(
            1 - 2 * p * p, 2 * p * q, 2 * p * s,
            2 * p * q, 1 - 2 * q * q, -2 * q * s,
            -2 * p * s, 2 * q * s, 1 - 2 * p * p - 2 * q * q);
    }

    private static (double Value, double Rate) Polynomial(double[] c, double t)
    {
        double value = 0, rate = 0;
        for (var i = c.Length - 1; i >= 0; i--)
        {
            rate = rate * t + value;
            value = value * t + c[i];
        }
        return (value, rate);
    }

}
