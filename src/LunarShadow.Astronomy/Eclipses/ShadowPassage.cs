using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Numerics;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// The compact description of one passage of the Moon through the Earth's shadow: Chebyshev fits, over some hours about
/// the full Moon, of the Moon's position relative to the shadow axis, of both distances, of the axis' declination and of
/// the Moon's apparent direction of date — sampled from the full ephemeris at a few nodes. Everything about the eclipse
/// (greatest eclipse, contacts, magnitudes, and later what each site sees) is then solved on these polynomials.
/// </summary>
public sealed class ShadowPassage
{
    /// <summary>Default half-width of the fitted interval, hours: wider than half the longest penumbral eclipse (≈3.2 h).</summary>
    public const double DefaultHalfWidthHours = 5.0;

    /// <summary>Default number of ephemeris samples.</summary>
    public const int DefaultNodeCount = 7;

    private readonly ChebyshevSeries _xi, _eta, _moonDistance, _sunDistance, _axisDeclination, _moonX, _moonY, _moonZ;

    private ShadowPassage(TtInstant center, double halfWidthHours, ChebyshevSeries[] fits)
    {
        Center = center;
        HalfWidthHours = halfWidthHours;
        (_xi, _eta, _moonDistance, _sunDistance, _axisDeclination, _moonX, _moonY, _moonZ) =
            (fits[0], fits[1], fits[2], fits[3], fits[4], fits[5], fits[6], fits[7]);
    }

    /// <summary>The instant the fit is centred on (hour 0).</summary>
    public TtInstant Center { get; }

    /// <summary>Half-width of the fitted interval, hours.</summary>
    public double HalfWidthHours { get; }

    /// <summary>Samples the ephemeris and fits the passage about <paramref name="center"/>.</summary>
    public static ShadowPassage Compute(ApparentPlaceCalculator calculator, TtInstant center,
        double halfWidthHours = DefaultHalfWidthHours, int nodeCount = DefaultNodeCount)
    {
        // Precession and nutation change by well under 0.1″ in a few hours, so one matrix serves the whole passage.
        var toDate = ApparentPlaceCalculator.ToTrueEquatorOfDate(center).Matrix;
        var nodes = ChebyshevSeries.Nodes(-halfWidthHours, halfWidthHours, nodeCount);
        var samples = new double[8][];
        for (var f = 0; f < samples.Length; f++) samples[f] = new double[nodeCount];
        for (var i = 0; i < nodeCount; i++)
        {
            var (moonJ2000, sunJ2000) = calculator.ApparentVectorsJ2000Ecliptic(center.PlusSeconds(nodes[i] * 3600));
            var moon = toDate * moonJ2000;
            var sun = toDate * sunJ2000;
            var axis = (-sun).Normalized();
            var (sinRa, cosRa) = Math.SinCos(Math.Atan2(axis.Y, axis.X));
            var axisDeclination = Math.Asin(axis.Z);
            var (sinDec, cosDec) = Math.SinCos(axisDeclination);
            var east = new CartesianVector(-sinRa, cosRa, 0);
            var north = new CartesianVector(-sinDec * cosRa, -sinDec * sinRa, cosDec);
            var moonDistance = moon.Length;
            var m = moon / moonDistance;
            var along = m.Dot(axis);
            samples[0][i] = m.Dot(east) / along;
            samples[1][i] = m.Dot(north) / along;
            samples[2][i] = moonDistance;
            samples[3][i] = sun.Length;
            samples[4][i] = axisDeclination;
            samples[5][i] = m.X;
            samples[6][i] = m.Y;
            samples[7][i] = m.Z;
        }
        var fits = samples.Select(s => ChebyshevSeries.Fit(-halfWidthHours, halfWidthHours, s)).ToArray();
        return new ShadowPassage(center, halfWidthHours, fits);
    }

    /// <summary>The instant at some hours from the centre.</summary>
    public TtInstant InstantAt(double hours) => Center.PlusSeconds(hours * 3600);

    /// <summary>Hours from the centre to an instant.</summary>
    public double HoursFromCenter(TtInstant tt) => tt.SecondsSince(Center) / 3600;

    /// <summary>The Moon relative to the shadow at some hours from the centre.</summary>
    public ShadowGeometry At(double hours) => new(
        _xi.Value(hours), _eta.Value(hours), _moonDistance.Value(hours), _sunDistance.Value(hours), _axisDeclination.Value(hours));

    /// <summary>
    /// Half the rate of change of the squared separation, ξξ′ + ηη′ (radians² per hour): negative while the Moon
    /// approaches the axis, zero at greatest eclipse.
    /// </summary>
    public double ApproachRate(double hours) =>
        _xi.Value(hours) * _xi.Derivative(hours) + _eta.Value(hours) * _eta.Derivative(hours);

    /// <summary>The Moon's apparent geocentric direction (unit vector, true equator and equinox of date).</summary>
    public CartesianVector MoonDirectionOfDate(double hours) =>
        new CartesianVector(_moonX.Value(hours), _moonY.Value(hours), _moonZ.Value(hours)).Normalized();
}
