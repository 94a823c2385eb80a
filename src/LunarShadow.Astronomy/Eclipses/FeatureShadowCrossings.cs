using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Numerics;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;
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
    // 10 minutes brackets every crossing; a graze between samples is caught by refining the least distance.
    private const double StepHours = 10.0 / 60;

    // The largest amount by which the distance from the edge can fall between two samples: 0.6″/s over half a step, with margin.
    private static readonly double MaxDipRadians = Angle.FromArcseconds(0.6 * StepHours * 3600 / 2 * 1.5).Radians;

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
    public IReadOnlyList<FeatureTiming> Compute(IEnumerable<LunarFeature> features)
    {
        // The feature can be in the penumbra only between P1 and P4 (give or take the 3-D sphere); search a margin beyond.
        var passage = _eclipse.Passage;
        var first = _eclipse.Contact(ContactName.P1) is { } p1 ? passage.HoursFromCenter(p1.Tt) : -passage.HalfWidthHours;
        var last = _eclipse.Contact(ContactName.P4) is { } p4 ? passage.HoursFromCenter(p4.Tt) : passage.HalfWidthHours;
        var from = Math.Max(-passage.HalfWidthHours, first - 0.1);
        var to = Math.Min(passage.HalfWidthHours, last + 0.1);
        var count = Math.Max(2, (int)Math.Ceiling((to - from) / StepHours));
        var hours = Enumerable.Range(0, count + 1).Select(i => from + (to - from) * i / count).ToArray();
        var frames = hours.Select(FrameAt).ToArray();
        return features.Select(f => Timing(f, hours, frames)).ToList();
    }

    /// <summary>A feature relative to the shadow at some hours from the passage's centre.</summary>
    /// <returns>
    /// The feature's geometry about the axis (its gnomonic offsets and its distance along the axis in place of the Moon's),
    /// its position angle on the disc seen from the Earth's centre, and whether it faces the Earth.
    /// </returns>
    public (ShadowGeometry Geometry, Angle PositionAngle, bool FacesEarth) At(LunarFeature feature, double hours) => At(feature, FrameAt(hours));

    /// <summary>
    /// Where a feature lies relative to the shadow axis at an instant within the passage: east and north of the axis in
    /// the same gnomonic frame as <see cref="ShadowDiagram"/>, so it can be drawn on the diagram's Moon.
    /// </summary>
    public (Angle East, Angle North, bool FacesEarth) OffsetFromAxisAt(LunarFeature feature, TtInstant tt)
    {
        var (geometry, _, facesEarth) = At(feature, _eclipse.Passage.HoursFromCenter(tt));
        return (geometry.EastOfAxis, geometry.NorthOfAxis, facesEarth);
    }

    /// <summary>How far a feature lies outside a shadow's edge (negative inside), radians, at some hours from the centre.</summary>
    public double DistanceOutside(LunarFeature feature, double hours, bool umbra) => DistanceOutside(feature, FrameAt(hours), umbra);

    // Everything about one instant that does not depend on the feature: the Moon, the axis frame, the Moon's orientation.
    private readonly record struct Frame(ShadowGeometry Moon, CartesianVector MoonKm, CartesianVector Axis, CartesianVector East, CartesianVector North, RotationMatrix ToDate);

    private Frame FrameAt(double hours)
    {
        var passage = _eclipse.Passage;
        var g = passage.At(hours);
        var moon = passage.MoonDirectionOfDate(hours) * g.MoonDistanceKm;
        var (axis, east, north) = AxisFrame(g, moon);
        var orientation = MoonOrientation.At(passage.InstantAt(hours), _nutation, _meanObliquity);
        return new Frame(g, moon, axis, east, north, orientation.ToTrueEquatorOfDate);
    }

    private static (ShadowGeometry Geometry, Angle PositionAngle, bool FacesEarth) At(LunarFeature feature, in Frame frame)
    {
        var offset = frame.ToDate * feature.Location.ToVector(MoonRadiusKm);
        var position = frame.MoonKm + offset;
        var along = position.Dot(frame.Axis);
        var geometry = new ShadowGeometry(position.Dot(frame.East) / along, position.Dot(frame.North) / along, along,
            frame.Moon.SunDistanceKm, frame.Moon.AxisDeclinationRadians);
        return (geometry, MoonOrientation.PositionAngle(offset, frame.MoonKm), offset.Dot(frame.MoonKm) < 0);
    }

    private (double Umbra, double Penumbra) Gaps(LunarFeature feature, in Frame frame)
    {
        var geometry = At(feature, frame).Geometry;
        var radii = ShadowCrossSection.Radii(_eclipse.Model, geometry, geometry.DirectionFromAxis);
        var separation = geometry.Separation.Radians;
        return (separation - radii.Umbra.Radians, separation - radii.Penumbra.Radians);
    }

    private double DistanceOutside(LunarFeature feature, in Frame frame, bool umbra)
    {
        var (u, p) = Gaps(feature, frame);
        return umbra ? u : p;
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

    private FeatureTiming Timing(LunarFeature feature, double[] hours, Frame[] frames)
    {
        // One sampling serves both edges.
        var umbraGaps = new double[hours.Length];
        var penumbraGaps = new double[hours.Length];
        for (var i = 0; i < hours.Length; i++) (umbraGaps[i], penumbraGaps[i]) = Gaps(feature, frames[i]);
        var (umbraIn, umbraOut) = Crossings(feature, hours, umbraGaps, umbra: true);
        var (penumbraIn, penumbraOut) = Crossings(feature, hours, penumbraGaps, umbra: false);
        return new FeatureTiming(feature, umbraIn, umbraOut, penumbraIn, penumbraOut);
    }

    private (FeatureCrossing? In, FeatureCrossing? Out) Crossings(LunarFeature feature, double[] hours, double[] gaps, bool umbra)
    {
        double Gap(double h) => DistanceOutside(feature, h, umbra);
        var last = hours.Length - 1;
        if (gaps[0] <= 0 || gaps[last] <= 0) return (null, null); // inside at the ends of the window: cannot happen between P1 and P4
        // The gap falls to one least value and rises again. Between samples it can dip below the sampled values by at
        // most the Moon's motion over half a step (under 0.6″/s); a least sample further out than that means no crossing.
        var least = Array.IndexOf(gaps, gaps.Min());
        if (gaps[least] > MaxDipRadians) return (null, null);
        double start, end;
        if (gaps[least] < 0)
        {
            var before = least;
            while (gaps[before] < 0) before--;
            var after = least;
            while (gaps[after] < 0) after++;
            start = RootFinder.Brent(Gap, hours[before], hours[before + 1], ToleranceHours);
            end = RootFinder.Brent(Gap, hours[after - 1], hours[after], ToleranceHours);
        }
        else
        {
            // A graze between samples: find the least distance, and the crossings either side of it.
            var (lo, hi) = (hours[Math.Max(0, least - 1)], hours[Math.Min(last, least + 1)]);
            var deepest = RootFinder.Minimum(Gap, lo, hi, ToleranceHours);
            if (Gap(deepest) >= 0) return (null, null);
            start = RootFinder.Brent(Gap, lo, deepest, ToleranceHours);
            end = RootFinder.Brent(Gap, deepest, hi, ToleranceHours);
        }
        return (Crossing(feature, start), Crossing(feature, end));
    }

    private FeatureCrossing Crossing(LunarFeature feature, double hours)
    {
        var (_, positionAngle, facesEarth) = At(feature, hours);
        return new FeatureCrossing(_eclipse.Passage.InstantAt(hours), positionAngle, facesEarth);
    }
}
