using System.Collections.Concurrent;
using LunarShadow.Astronomy.Ephemeris;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Numerics;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// Finds lunar eclipses under one shadow model: every full Moon is screened cheaply (mean argument of latitude, then
/// the opposition found on amplitude-truncated series), the survivors get an exact <see cref="ShadowPassage"/> from
/// which greatest eclipse, magnitudes and contacts are solved. Results are cached per lunation; thread-safe.
/// </summary>
public sealed class EclipseFinder
{
    // Meeus (1998), ch. 54: no lunar eclipse when |sin F| > 0.36 at the mean full Moon; 0.45 keeps a wide margin.
    private const double SinArgumentOfLatitudeLimit = 0.45;

    // The screening series are good to some 20″; the least separation is at least 0.99 of that at opposition (the
    // relative orbit is inclined about 5.5°). Screen with a margin of 0.05°.
    private static readonly double ScreeningMarginRadians = Angle.FromDegrees(0.05).Radians;

    private static readonly ConcurrentDictionary<ShadowModel, EclipseFinder> Finders = new();

    private readonly ApparentPlaceCalculator _accurate;
    private readonly ApparentPlaceCalculator _screening;
    private readonly ConcurrentDictionary<long, LunarEclipse?> _byLunation = new();
    private readonly ConcurrentDictionary<int, long> _firstMemberOfSeries = new();

    /// <summary>A finder on the given ephemerides.</summary>
    public EclipseFinder(ShadowModel model, ApparentPlaceCalculator accurate, ApparentPlaceCalculator screening)
    {
        Model = model;
        _accurate = accurate;
        _screening = screening;
    }

    // Layer heights are the caller's choice; keep the finders (and their caches) of at most this many at once.
    private const int MaxLayerFinders = 8;

    /// <summary>The shared finder for a model, on the embedded ephemerides.</summary>
    public static EclipseFinder For(ShadowModel model)
    {
        if (Finders.TryGetValue(model, out var known)) return known;
        if (model.Kind == ShadowModelKind.Layer && Finders.Keys.Count(k => k.Kind == ShadowModelKind.Layer) >= MaxLayerFinders)
        {
            foreach (var stale in Finders.Keys.Where(k => k.Kind == ShadowModelKind.Layer && k.LayerHeightKm != ShadowModel.DefaultLayerHeightKm))
                Finders.TryRemove(stale, out _);
        }
        return Finders.GetOrAdd(model, m =>
            new EclipseFinder(m, ApparentPlaceCalculator.Default, new ApparentPlaceCalculator(LunarTheory.Screening, EarthOrbitTheory.Screening)));
    }

    /// <summary>The shadow model.</summary>
    public ShadowModel Model { get; }

    /// <summary>Every eclipse whose greatest eclipse falls in [from, to), in time order; stops when cancelled.</summary>
    public IEnumerable<LunarEclipse> Between(TtInstant from, TtInstant to, CancellationToken cancellationToken = default)
    {
        var first = MeanLunation.LastFullMoonAtOrBefore(from) - 1;
        var last = MeanLunation.LastFullMoonAtOrBefore(to) + 1;
        for (var k = first; k <= last; k++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var eclipse = AtLunation(k);
            if (eclipse is not null && eclipse.GreatestEclipse >= from && eclipse.GreatestEclipse < to) yield return eclipse;
        }
    }

    /// <summary>The eclipse at the full Moon of lunation k, or null when that full Moon is not eclipsed.</summary>
    public LunarEclipse? AtLunation(long k) => _byLunation.GetOrAdd(k, Compute);

    private LunarEclipse? Compute(long k)
    {
        if (Screen(k) is not { } screen) return null;
        var passage = ShadowPassage.Compute(_accurate, screen.Opposition);
        return Solve(k, passage);
    }

    /// <summary>
    /// Whether the full Moon of lunation k is eclipsed. The least separation cannot exceed the separation at opposition,
    /// so where that is already well inside the penumbra (by more than the screening series' error) the answer is yes
    /// without the exact computation; only doubtful cases are computed in full.
    /// </summary>
    internal bool IsEclipsed(long k)
    {
        if (_byLunation.TryGetValue(k, out var known)) return known is not null;
        if (Screen(k) is not { } screen) return false;
        return screen.ClearlyEclipsed || AtLunation(k) is not null;
    }

    // Screening: the opposition in longitude on the truncated series, and the separation there against the penumbra.
    private (TtInstant Opposition, bool ClearlyEclipsed)? Screen(long k)
    {
        var f = Angle.FromDegrees(MeanLunation.ArgumentOfLatitudeDegrees(k)).Radians;
        if (Math.Abs(Math.Sin(f)) > SinArgumentOfLatitudeLimit) return null;

        var t = MeanLunation.FullMoon(k);
        double Elongation(TtInstant at)
        {
            var (moon, sun) = _screening.ApparentVectorsJ2000Ecliptic(at);
            return Angle.FromRadians(Math.Atan2(moon.Y, moon.X) - Math.Atan2(sun.Y, sun.X) - Math.PI).NormalizedSigned().Radians;
        }
        // Secant iteration on the elongation from opposition; the mean relative motion (≈12.2°/day) starts it.
        var x0 = 0.0;
        var f0 = Elongation(t);
        var x1 = -f0 / 0.2129;
        for (var i = 0; i < 8 && Math.Abs(x1 - x0) > 1e-5; i++)
        {
            var f1 = Elongation(t.PlusSeconds(x1 * 86400));
            var next = x1 - f1 * (x1 - x0) / (f1 - f0);
            (x0, f0, x1) = (x1, f1, next);
        }
        var opposition = t.PlusSeconds(x1 * 86400);

        var (m, s) = _screening.ApparentVectorsJ2000Ecliptic(opposition);
        var axis = (-s).Normalized();
        var separation = Math.Atan2(m.Normalized().Cross(axis).Length, m.Normalized().Dot(axis));
        var geometry = new ShadowGeometry(0, separation, m.Length, s.Length, 0);
        var largestRadius = ShadowCrossSection.Radii(Model, geometry, Angle.Zero).Penumbra.Radians
            + (Model.Kind == ShadowModelKind.Layer ? Angle.FromArcseconds(30).Radians : 0);
        var reach = largestRadius + geometry.MoonSemiDiameter.Radians;
        if (0.99 * separation > reach + ScreeningMarginRadians) return null;
        return (opposition, separation < reach - ScreeningMarginRadians);
    }

    private LunarEclipse? Solve(long k, ShadowPassage passage)
    {
        var half = passage.HalfWidthHours;
        const double toleranceHours = 1e-6;
        if (RootFinder.FirstCrossing(passage.ApproachRate, -half, half, 20, toleranceHours) is not { } greatest) return null;

        var g = passage.At(greatest);
        var radii = ShadowCrossSection.RadiiTowardMoon(Model, g);
        var moonRadius = g.MoonSemiDiameter.Radians;
        var separation = g.Separation.Radians;
        var penumbralMagnitude = (radii.Penumbra.Radians + moonRadius - separation) / (2 * moonRadius);
        if (penumbralMagnitude <= 0) return null;
        var umbralMagnitude = (radii.Umbra.Radians + moonRadius - separation) / (2 * moonRadius);

        var contacts = new List<EclipseContact>(6);
        void AddPair(ContactName before, ContactName after, Func<ShadowGeometry, double> reach, bool internalContact)
        {
            double Gap(double hours)
            {
                var at = passage.At(hours);
                return at.Separation.Radians - reach(at);
            }
            if (Gap(greatest) >= 0) return;
            var start = RootFinder.FirstCrossing(Gap, greatest, -half, 40, toleranceHours);
            var end = RootFinder.FirstCrossing(Gap, greatest, half, 40, toleranceHours);
            if (start is null || end is null) return;
            contacts.Add(Contact(before, start.Value, internalContact));
            contacts.Add(Contact(after, end.Value, internalContact));
        }
        EclipseContact Contact(ContactName name, double hours, bool internalContact)
        {
            // The point of contact lies on the line of centres: toward the shadow's centre for an external contact,
            // away from it for an internal one.
            var direction = passage.At(hours).DirectionFromAxis;
            var positionAngle = internalContact ? direction : (direction + Angle.FromDegrees(180)).NormalizedPositive();
            return new EclipseContact(name, passage.InstantAt(hours), positionAngle);
        }

        AddPair(ContactName.P1, ContactName.P4, at => ShadowCrossSection.RadiiTowardMoon(Model, at).Penumbra.Radians + at.MoonSemiDiameter.Radians, false);
        AddPair(ContactName.U1, ContactName.U4, at => ShadowCrossSection.RadiiTowardMoon(Model, at).Umbra.Radians + at.MoonSemiDiameter.Radians, false);
        AddPair(ContactName.U2, ContactName.U3, at => ShadowCrossSection.RadiiTowardMoon(Model, at).Umbra.Radians - at.MoonSemiDiameter.Radians, true);
        if (contacts.Count == 0) return null;
        contacts.Sort((a, b) => a.Tt.CompareTo(b.Tt));

        double? Minutes(ContactName from, ContactName to)
        {
            var a = contacts.FirstOrDefault(c => c.Name == from);
            var b = contacts.FirstOrDefault(c => c.Name == to);
            return a is null || b is null ? null : b.Tt.SecondsSince(a.Tt) / 60;
        }
        var kind = contacts.Any(c => c.Name == ContactName.U2) ? EclipseKind.Total
            : contacts.Any(c => c.Name == ContactName.U1) ? EclipseKind.Partial : EclipseKind.Penumbral;
        var durations = new PhaseDurations(Minutes(ContactName.P1, ContactName.P4) ?? 0, Minutes(ContactName.U1, ContactName.U4), Minutes(ContactName.U2, ContactName.U3));

        var moonDirection = passage.MoonDirectionOfDate(greatest);
        var moonPlace = new GeocentricMoonPlace(moonDirection.Longitude, moonDirection.Latitude, g.MoonDistanceKm, g.MoonSemiDiameter);
        return new LunarEclipse(k, kind, passage.InstantAt(greatest), g.DistanceFromAxisInEarthRadii, penumbralMagnitude, umbralMagnitude,
            contacts, durations, SarosOf(k), radii, moonPlace, Model, passage);
    }

    // The member index counts back along the series (223 lunations a step) to its first eclipse under this model.
    private SarosMember SarosOf(long k)
    {
        var series = SarosNumbering.SeriesOf(k);
        var first = _firstMemberOfSeries.GetOrAdd(series, _ =>
        {
            var member = k;
            while (IsEclipsed(member - 223)) member -= 223;
            return member;
        });
        if (first > k)
        {
            // Found from a later member before an earlier one was known: extend backwards.
            var member = k;
            while (IsEclipsed(member - 223)) member -= 223;
            first = _firstMemberOfSeries.AddOrUpdate(series, member, (_, old) => Math.Min(old, member));
        }
        return new SarosMember(series, (int)((k - first) / 223) + 1);
    }
}
