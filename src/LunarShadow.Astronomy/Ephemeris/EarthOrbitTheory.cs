using LunarShadow.Astronomy.Embedded;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Ephemeris;

/// <summary>
/// The heliocentric Earth from VSOP87B (Bretagnon &amp; Francou 1988, A&amp;A 202, 309), all published terms,
/// in the J2000 dynamical ecliptic; from it the geometric geocentric Sun.
/// </summary>
public sealed class EarthOrbitTheory
{
    /// <summary>The astronomical unit in km (IAU 2012 Resolution B2).</summary>
    public const double AstronomicalUnitKm = 149_597_870.7;

    private readonly PolynomialPhaseSeries _longitude, _latitude, _radius;

    private EarthOrbitTheory(BlockFile file, double minimumContribution = 0)
    {
        // Time spans up to 4 millennia from J2000 over the supported years.
        const double millennia = 4;
        _longitude = PolynomialPhaseSeries.FromBlocks(file, "L", PolynomialPhaseSeries.TermShape.Cosine, minimumContribution, millennia);
        _latitude = PolynomialPhaseSeries.FromBlocks(file, "B", PolynomialPhaseSeries.TermShape.Cosine, minimumContribution, millennia);
        _radius = PolynomialPhaseSeries.FromBlocks(file, "R", PolynomialPhaseSeries.TermShape.Cosine, minimumContribution, millennia);
    }

    /// <summary>The embedded series.</summary>
    public static EarthOrbitTheory Vsop87B { get; } = new(BlockFile.FromResource(EmbeddedDataSet.EarthVsop87B));

    private static readonly Lazy<EarthOrbitTheory> ScreeningSeries = new(() => new EarthOrbitTheory(BlockFile.FromResource(EmbeddedDataSet.EarthVsop87B), 1e-6));

    /// <summary>The same theory keeping only terms that reach 10⁻⁶ (rad or AU) over the supported years, for screening.</summary>
    public static EarthOrbitTheory Screening => ScreeningSeries.Value;

    /// <summary>Number of periodic terms.</summary>
    public int TermCount => _longitude.TermCount + _latitude.TermCount + _radius.TermCount;

    // Bretagnon & Francou (1988): L, B (rad), R (AU) = Σₖ τᵏ Σ A·cos(B + C·τ), τ in Julian millennia of TDB from J2000.
    /// <summary>Heliocentric longitude, latitude (radians) and radius (AU) of the Earth, with their rates per millennium.</summary>
    public (double L, double B, double R, double LRate, double BRate, double RRate) HeliocentricSpherical(TtInstant tt)
    {
        var tau = tt.JulianDate.JulianMillenniaSinceJ2000;
        var (l, lRate) = _longitude.Evaluate(tau);
        var (b, bRate) = _latitude.Evaluate(tau);
        var (r, rRate) = _radius.Evaluate(tau);
        return (l, b, r, lRate, bRate, rRate);
    }

    /// <summary>The geometric geocentric Sun (the negated heliocentric Earth), km and km/day.</summary>
    public EclipticState GeocentricSun(TtInstant tt)
    {
        var (l, b, r, lRate, bRate, rRate) = HeliocentricSpherical(tt);
        var (sinL, cosL) = Math.SinCos(l);
        var (sinB, cosB) = Math.SinCos(b);
        var earth = new CartesianVector(r * cosB * cosL, r * cosB * sinL, r * sinB) * AstronomicalUnitKm;
        var earthRate = new CartesianVector(
            rRate * cosB * cosL - r * sinB * bRate * cosL - r * cosB * sinL * lRate,
            rRate * cosB * sinL - r * sinB * bRate * sinL + r * cosB * cosL * lRate,
            rRate * sinB + r * cosB * bRate) * (AstronomicalUnitKm / 365250.0);
        return new EclipticState(-earth, -earthRate);
    }

}
