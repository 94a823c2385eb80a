using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Numerics;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// When the edges of the umbra and penumbra cross named features on the Moon. The feature stands on the Moon's sphere
/// (radius k·a) turned by <see cref="MoonOrientation"/>; at each instant its geocentric position is referred to the shadow
/// axis of the eclipse's <see cref="ShadowPassage"/>, and the shadow's radius is taken from <see cref="ShadowCrossSection"/>
/// at the feature's own distance along the axis (where the cone is a little wider or narrower than at the Moon's centre)
/// and, for the layer model, in the feature's own direction from the axis.
/// </summary>
public sealed class FeatureShadowCrossings
{
    // Brent tolerance, hours (3.6 ms; the shadow's edge moves over the Moon at about 0.5″ per second).
    private const double ToleranceHours = 1e-6;

    // Sampling step of the search, hours: the distance from the edge is smooth (nearly a parabola in time), so a step of
    // 5 minutes brackets every crossing; a graze between samples is caught by refining the least distance.
    private const double StepHours = 5.0 / 60;

    private static readonly double MoonRadiusKm = BodyDisc.MoonRadiusRatio * GeodeticLocation.EquatorialRadiusKm;

    private readonly LunarEclipse _eclipse;
    private readonly Nutation _nutation;
    private readonly Angle _meanObliquity;

    /// <summary>The crossings of one eclipse (under the shadow model it was found with).</summary>
    public FeatureShadowCrossings(LunarEclipse eclipse)
    {
        _eclipse = eclipse;
        // The passage is fitted in the true equator of the centre instant (one matrix for the whole passage), so the
        // Moon's orientation is referred to the same frame.
        var center = eclipse.Passage.Center;
        _nutation = NutationIau2000B.At(center);
        _meanObliquity = Obliquity.Mean(center);
    }

    /// <summary>The eclipse.</summary>
    public LunarEclipse Eclipse => _eclipse;

    /// <summary>The timings of each feature, in the given order.</summary>
    public IReadOnlyList<FeatureTiming> Compute(IEnumerable<LunarFeature> features) => features.Select(Timing).ToList();

    /// <summary>A feature relative to the shadow at some hours from the passage's centre.</summary>
    /// <returns>
    /// The feature's geometry about the axis (its gnomonic offsets and its distance along the axis in place of the Moon's),
    /// its position angle on the disc seen from the Earth's centre, and whether it faces the Earth.
    /// </returns>
    public (ShadowGeometry Geometry, Angle PositionAngle, bool FacesEarth) At(LunarFeature feature, double hours)
    {
        var passage = _eclipse.Passage;
        var g = passage.At(hours);
        var moon = passage.MoonDirectionOfDate(hours) * g.MoonDistanceKm;
        var (axis, east, north) = AxisFrame(g, moon);
        var orientation = MoonOrientation.At(passage.InstantAt(hours), _nutation, _meanObliquity);
        var offset = orientation.ToTrueEquatorOfDate * feature.Location.ToVector(MoonRadiusKm);
        var position = moon + offset;
        var along = position.Dot(axis);
        var geometry = new ShadowGeometry(position.Dot(east) / along, position.Dot(north) / along, along, g.SunDistanceKm, g.AxisDeclinationRadians);
        return (geometry, MoonOrientation.PositionAngle(offset, moon), offset.Dot(moon) < 0);
    }

    /// <summary>How far a feature lies outside a shadow's edge (negative inside), radians, at some hours from the centre.</summary>
    public double DistanceOutside(LunarFeature feature, double hours, bool umbra)
    {
        var geometry = At(feature, hours).Geometry;
        var radii = ShadowCrossSection.Radii(_eclipse.Model, geometry, geometry.DirectionFromAxis);
        return geometry.Separation.Radians - (umbra ? radii.Umbra : radii.Penumbra).Radians;
    }

    // The shadow axis and the east and north directions about it, recovered from the passage: the Moon's centre lies at
    // gnomonic (ξ, η) from the axis of declination δ, so its right ascension exceeds the axis' by atan2(ξ, cos δ − η sin δ).
    private static (CartesianVector Axis, CartesianVector East, CartesianVector North) AxisFrame(ShadowGeometry g, CartesianVector moon)
    {
        var declination = g.AxisDeclinationRadians;
        var (sinDec, cosDec) = Math.SinCos(declination);
        var rightAscension = Math.Atan2(moon.Y, moon.X) - Math.Atan2(g.XiRadians, cosDec - g.EtaRadians * sinDec);
        var (sinRa, cosRa) = Math.SinCos(rightAscension);
        return (new CartesianVector(cosDec * cosRa, cosDec * sinRa, sinDec),
            new CartesianVector(-sinRa, cosRa, 0),
            new CartesianVector(-sinDec * cosRa, -sinDec * sinRa, cosDec));
    }

    private FeatureTiming Timing(LunarFeature feature)
    {
        // The feature can be in the penumbra only between P1 and P4 (give or take the 3-D sphere); search a margin beyond.
        var passage = _eclipse.Passage;
        var first = _eclipse.Contact(ContactName.P1) is { } p1 ? passage.HoursFromCenter(p1.Tt) : -passage.HalfWidthHours;
        var last = _eclipse.Contact(ContactName.P4) is { } p4 ? passage.HoursFromCenter(p4.Tt) : passage.HalfWidthHours;
        var from = Math.Max(-passage.HalfWidthHours, first - 0.1);
        var to = Math.Min(passage.HalfWidthHours, last + 0.1);

        // One sampling serves both edges.
        var count = Math.Max(2, (int)Math.Ceiling((to - from) / StepHours));
        var step = (to - from) / count;
        var hours = new double[count + 1];
        var umbraGaps = new double[count + 1];
        var penumbraGaps = new double[count + 1];
        for (var i = 0; i <= count; i++)
        {
            hours[i] = from + i * step;
            var geometry = At(feature, hours[i]).Geometry;
            var radii = ShadowCrossSection.Radii(_eclipse.Model, geometry, geometry.DirectionFromAxis);
            umbraGaps[i] = geometry.Separation.Radians - radii.Umbra.Radians;
            penumbraGaps[i] = geometry.Separation.Radians - radii.Penumbra.Radians;
        }
        var (umbraIn, umbraOut) = Crossings(feature, hours, umbraGaps, umbra: true);
        var (penumbraIn, penumbraOut) = Crossings(feature, hours, penumbraGaps, umbra: false);
        return new FeatureTiming(feature, umbraIn, umbraOut, penumbraIn, penumbraOut);
    }

    private (FeatureCrossing? In, FeatureCrossing? Out) Crossings(LunarFeature feature, double[] hours, double[] gaps, bool umbra)
    {
        double Gap(double h) => DistanceOutside(feature, h, umbra);
        var last = hours.Length - 1;
        // The gap falls to one least value and rises again: bracket its least value, refine it, and find the two
        // crossings either side when it is negative.
        var least = Array.IndexOf(gaps, gaps.Min());
        var deepest = gaps[least] < 0 ? hours[least]
            : RootFinder.Minimum(Gap, hours[Math.Max(0, least - 1)], hours[Math.Min(last, least + 1)], ToleranceHours);
        if (Gap(deepest) >= 0) return (null, null);
        if (gaps[0] <= 0 || gaps[last] <= 0) return (null, null); // inside at the ends of the window: cannot happen between P1 and P4
        var start = RootFinder.Brent(Gap, hours[0], deepest, ToleranceHours);
        var end = RootFinder.Brent(Gap, deepest, hours[last], ToleranceHours);
        return (Crossing(feature, start), Crossing(feature, end));
    }

    private FeatureCrossing Crossing(LunarFeature feature, double hours)
    {
        var (_, positionAngle, facesEarth) = At(feature, hours);
        return new FeatureCrossing(_eclipse.Passage.InstantAt(hours), positionAngle, facesEarth);
    }
}
