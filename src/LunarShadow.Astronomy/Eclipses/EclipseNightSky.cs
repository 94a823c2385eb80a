using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Numerics;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// The Moon and Sun over the whole night of an eclipse — ±13 hours about greatest eclipse — as Chebyshev fits of their
/// apparent geocentric vectors in the true equator and equinox of date, with the nutation needed for sidereal time.
/// Computed once per eclipse, so that every site's rising, setting and altitudes follow from polynomials.
/// </summary>
public sealed class EclipseNightSky
{
    /// <summary>Half-width of the fitted night, hours.</summary>
    public const double HalfWidthHours = 13.0;

    // The Moon moves about 7° in 13 hours, so its vector's Chebyshev coefficients fall below 10⁻¹² of the distance well
    // before the thirteenth (tested against the ephemeris to 0.01″).
    private const int NodeCount = 13;
    private readonly ChebyshevVector _moon;
    private readonly ChebyshevVector _sun;

    private EclipseNightSky(TtInstant center, ChebyshevVector moon, ChebyshevVector sun, Nutation nutation, Angle meanObliquity)
    {
        Center = center;
        _moon = moon;
        _sun = sun;
        Nutation = nutation;
        MeanObliquity = meanObliquity;
    }

    /// <summary>The centre of the fit (greatest eclipse).</summary>
    public TtInstant Center { get; }

    /// <summary>Nutation at the centre (it changes by under 0.01″ in a night).</summary>
    public Nutation Nutation { get; }

    /// <summary>Mean obliquity at the centre.</summary>
    public Angle MeanObliquity { get; }

    /// <summary>Samples the ephemeris over the night and fits it.</summary>
    public static EclipseNightSky Compute(ApparentPlaceCalculator calculator, TtInstant center)
    {
        var nodes = ChebyshevSeries.Nodes(-HalfWidthHours, HalfWidthHours, NodeCount);
        var moon = new CartesianVector[NodeCount];
        var sun = new CartesianVector[NodeCount];
        for (var i = 0; i < NodeCount; i++)
        {
            var tt = center.PlusSeconds(nodes[i] * 3600);
            var toDate = ApparentPlaceCalculator.ToTrueEquatorOfDate(tt).Matrix;
            var (moonJ2000, sunJ2000) = calculator.ApparentVectorsJ2000Ecliptic(tt);
            moon[i] = toDate * moonJ2000;
            sun[i] = toDate * sunJ2000;
        }
        var (_, nutation, meanObliquity) = ApparentPlaceCalculator.ToTrueEquatorOfDate(center);
        return new EclipseNightSky(center, new ChebyshevVector(-HalfWidthHours, HalfWidthHours, moon),
            new ChebyshevVector(-HalfWidthHours, HalfWidthHours, sun), nutation, meanObliquity);
    }

    /// <summary>Hours from the centre to an instant.</summary>
    public double HoursFromCenter(TtInstant tt) => tt.SecondsSince(Center) / 3600;

    /// <summary>The instant some hours from the centre.</summary>
    public TtInstant InstantAt(double hours) => Center.PlusSeconds(hours * 3600);

    /// <summary>The Moon's apparent geocentric vector of date, km.</summary>
    public CartesianVector MoonKm(double hours) => _moon.Value(hours);

    /// <summary>The Sun's apparent geocentric vector of date, km.</summary>
    public CartesianVector SunKm(double hours) => _sun.Value(hours);

    /// <summary>Greenwich apparent sidereal time at an instant given in TT and UT1.</summary>
    public Angle SiderealTime(TtInstant tt, Ut1Instant ut1) => EarthRotation.GreenwichApparentSiderealTime(ut1, tt, Nutation, MeanObliquity);
}
