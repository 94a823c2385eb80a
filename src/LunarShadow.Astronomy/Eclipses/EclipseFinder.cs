using System.Collections.Concurrent;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Numerics;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// Finds lunar eclipses under one shadow model: every full Moon is screened cheaply (mean argument of latitude, then
/// the opposition found on amplitude-truncated series), the survivors get an exact <see cref="ShadowPassage"/> from
/// which greatest eclipse, magnitudes and contacts are solved. Results are cached per lunation, each computed once
/// even when many threads ask for it at the same time; thread-safe. Hold one per model for the process, through
/// <see cref="EclipseFinders"/>.
/// </summary>
public sealed class EclipseFinder
{
    // Meeus (1998), ch. 54: no lunar eclipse when |sin F| > 0.36 at the mean full Moon; 0.45 keeps a wide margin.
    private const double SinArgumentOfLatitudeLimit = 0.45;

    /// <summary>Lunations per step of a range search: each step's full Moons are solved on the threads allowed, then read in order.</summary>
    public const int LunationsPerStep = 128;

    // Lunations in one Saros.
    private const long SarosLunations = 223;

    // The screening series are good to some 20″; the least separation is at least 0.99 of that at opposition (the
    // relative orbit is inclined about 5.5°). Screen with a margin of 0.05°.
    private static readonly double ScreeningMarginRadians = Angle.FromDegrees(0.05).Radians;

    private readonly ApparentPlaceCalculator _accurate;
    private readonly ApparentPlaceCalculator _screening;
    private readonly Func<int> _threadsForNextStep;

    // Per lunation, the solved passage without its Saros member (null: not eclipsed); what IsEclipsed reads.
    private readonly ConcurrentDictionary<long, Lazy<EclipseSolution?>> _solved = new();

    // Per lunation, the finished eclipse with its Saros member.
    private readonly ConcurrentDictionary<long, Lazy<LunarEclipse?>> _eclipses = new();

    // Per eclipsed lunation, the first member of the unbroken run of its Saros series that ends there. A pure function
    // of the lunation, so a value written twice under a race is the same value.
    private readonly ConcurrentDictionary<long, long> _firstMemberOfRun = new();

    /// <summary>A finder on the given ephemerides.</summary>
    /// <param name="model">The shadow model.</param>
    /// <param name="accurate">The ephemeris the eclipses are solved on.</param>
    /// <param name="screening">A cheaper ephemeris for screening full Moons (good to some 20″).</param>
    /// <param name="maxParallelism">Most threads one range search uses (default: the processor count; 1 for none).</param>
    public EclipseFinder(ShadowModel model, ApparentPlaceCalculator accurate, ApparentPlaceCalculator screening, int? maxParallelism = null)
        : this(model, accurate, screening, Fixed(maxParallelism ?? Environment.ProcessorCount))
    {
    }

    /// <summary>
    /// A finder whose range searches ask, before each step of <see cref="LunationsPerStep"/> lunations, how many threads
    /// that step may use (values below 1 count as 1): a host can lend a search every core while nothing else runs and
    /// take them back as soon as other work arrives.
    /// </summary>
    /// <param name="model">The shadow model.</param>
    /// <param name="accurate">The ephemeris the eclipses are solved on.</param>
    /// <param name="screening">A cheaper ephemeris for screening full Moons (good to some 20″).</param>
    /// <param name="threadsForNextStep">Asked once per step of a range search; called from the searching thread.</param>
    public EclipseFinder(ShadowModel model, ApparentPlaceCalculator accurate, ApparentPlaceCalculator screening, Func<int> threadsForNextStep)
    {
        ArgumentNullException.ThrowIfNull(threadsForNextStep);
        Model = model;
        _accurate = accurate;
        _screening = screening;
        _threadsForNextStep = threadsForNextStep;
    }

    private static Func<int> Fixed(int maxParallelism)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(maxParallelism, 1, nameof(maxParallelism));
        return () => maxParallelism;
    }

    /// <summary>A finder for a model on the embedded ephemerides (truncated series for screening).</summary>
    public static EclipseFinder OnEmbeddedEphemerides(ShadowModel model, int? maxParallelism = null) =>
        new(model, ApparentPlaceCalculator.Default, ApparentPlaceCalculator.Screening, maxParallelism);

    /// <summary>A finder for a model on the embedded ephemerides whose searches ask per step how many threads to use.</summary>
    public static EclipseFinder OnEmbeddedEphemerides(ShadowModel model, Func<int> threadsForNextStep) =>
        new(model, ApparentPlaceCalculator.Default, ApparentPlaceCalculator.Screening, threadsForNextStep);

    /// <summary>The finder for a model from the process-wide default set, for use without dependency injection.</summary>
    public static EclipseFinder For(ShadowModel model) => EclipseFinders.Shared.For(model);

    /// <summary>The shadow model.</summary>
    public ShadowModel Model { get; }

    // How many exact passages this finder has computed (each lunation at most once): for tests of the cache.
    private long _passagesComputed;

    internal long PassagesComputed => Interlocked.Read(ref _passagesComputed);

    /// <summary>Every eclipse whose greatest eclipse falls in [from, to), in time order; stops when cancelled.</summary>
    public IEnumerable<LunarEclipse> Between(TtInstant from, TtInstant to, CancellationToken cancellationToken = default)
    {
        var first = MeanLunation.LastFullMoonAtOrBefore(from) - 1;
        var last = MeanLunation.LastFullMoonAtOrBefore(to) + 1;
        for (var stepStart = first; stepStart <= last; stepStart += LunationsPerStep)
        {
            var stepEnd = Math.Min(last, stepStart + LunationsPerStep - 1);
            cancellationToken.ThrowIfCancellationRequested();
            SolveInParallel(stepStart, stepEnd, cancellationToken);
            for (var k = stepStart; k <= stepEnd; k++)
            {
                cancellationToken.ThrowIfCancellationRequested();
                var eclipse = AtLunation(k);
                if (eclipse is not null && eclipse.GreatestEclipse >= from && eclipse.GreatestEclipse < to) yield return eclipse;
            }
        }
    }

    /// <summary>
    /// Every eclipse whose greatest eclipse falls on the UTC calendar dates <paramref name="firstDate"/> to
    /// <paramref name="lastDate"/> (both included), in time order.
    /// </summary>
    public IEnumerable<LunarEclipse> OnUtcDates(CalendarDate firstDate, CalendarDate lastDate, TimeScaleConverter time,
        CancellationToken cancellationToken = default)
    {
        var startDay = firstDate.ToJulianDate().Day;
        var endDay = lastDate.ToJulianDate().Day + 1;
        // ΔT reaches about 13 hours at the ends of the span; search a day beyond each end, then keep by UTC.
        foreach (var e in Between(TtInstant.FromJulianDate(startDay - 1), TtInstant.FromJulianDate(endDay + 1), cancellationToken))
        {
            var utc = JulianDate.OfUtc(time.ToUtc(e.GreatestEclipse)).Day;
            if (utc >= startDay && utc < endDay) yield return e;
        }
    }

    /// <summary>The eclipse whose greatest eclipse falls on the given UTC calendar date, or null when there is none.</summary>
    public LunarEclipse? OnUtcDate(CalendarDate date, TimeScaleConverter time) => OnUtcDates(date, date, time).FirstOrDefault();

    /// <summary>The eclipse at the full Moon of lunation k, or null when that full Moon is not eclipsed.</summary>
    public LunarEclipse? AtLunation(long k) => Once(_eclipses, k, WithSaros);

    // The value for a key, computed by exactly one caller even under concurrent first requests (the others wait for it).
    private static T? Once<T>(ConcurrentDictionary<long, Lazy<T?>> cache, long k, Func<long, T?> compute) where T : class =>
        cache.GetOrAdd(k, key => new Lazy<T?>(() => compute(key), LazyThreadSafetyMode.ExecutionAndPublication)).Value;

    // Solves the lunations of one step of a range on several threads; each is cached, so the ordered read that follows
    // only collects them. The answers do not depend on the order: each lunation's result is a function of k alone.
    private void SolveInParallel(long first, long last, CancellationToken cancellationToken)
    {
        if (last - first < 8) return;
        var threads = _threadsForNextStep();
        if (threads <= 1) return;
        Parallel.For(first, last + 1, new ParallelOptions { MaxDegreeOfParallelism = threads, CancellationToken = cancellationToken }, k => AtLunation(k));
    }

    private EclipseSolution? Solved(long k) => Once(_solved, k, Compute);

    private EclipseSolution? Compute(long k)
    {
        if (Screen(k) is not { } screen) return null;
        Interlocked.Increment(ref _passagesComputed);
        var passage = ShadowPassage.Compute(_accurate, screen.Opposition);
        return Solve(k, passage);
    }

    private LunarEclipse? WithSaros(long k) => Solved(k) is { } e
        ? new LunarEclipse(k, e.Kind, e.GreatestEclipse, e.Gamma, e.PenumbralMagnitude, e.UmbralMagnitude, e.Contacts,
            e.Durations, SarosOf(k), e.RadiiAtGreatest, e.MoonAtGreatest, Model, e.Passage)
        : null;

    // An eclipse as solved from its passage, before its Saros member is counted.
    private sealed record EclipseSolution(long Lunation, EclipseKind Kind, TtInstant GreatestEclipse, double Gamma,
        double PenumbralMagnitude, double UmbralMagnitude, IReadOnlyList<EclipseContact> Contacts, PhaseDurations Durations,
        ShadowRadii RadiiAtGreatest, GeocentricMoonPlace MoonAtGreatest, ShadowPassage Passage);

    /// <summary>
    /// Whether the full Moon of lunation k is eclipsed. The least separation cannot exceed the separation at opposition,
    /// so where that is already well inside the penumbra (by more than the screening series' error) the answer is yes
    /// without the exact computation; only doubtful cases are computed in full.
    /// </summary>
    internal bool IsEclipsed(long k)
    {
        if (_solved.TryGetValue(k, out var known) && known.IsValueCreated) return known.Value is not null;
        if (Screen(k) is not { } screen) return false;
        return screen.ClearlyEclipsed || Solved(k) is not null;
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

    private EclipseSolution? Solve(long k, ShadowPassage passage)
    {
        var half = passage.HalfWidthHours;
        const double toleranceHours = 1e-6;
        if (RootFinder.FirstCrossing(passage.ApproachRate, -half, half, 20, toleranceHours) is not { } greatest) return null;

        var g = passage.At(greatest);
        var radii = ShadowCrossSection.RadiiTowardMoon(Model, g);
        var moonRadius = g.MoonSemiDiameter.Radians;
        var separation = g.Separation.Radians;
        var penumbralMagnitude = ShadowCrossSection.Magnitude(radii.Penumbra.Radians, moonRadius, separation);
        if (penumbralMagnitude <= 0) return null;
        var umbralMagnitude = ShadowCrossSection.Magnitude(radii.Umbra.Radians, moonRadius, separation);

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
        return new EclipseSolution(k, kind, passage.InstantAt(greatest), g.DistanceFromAxisInEarthRadii, penumbralMagnitude, umbralMagnitude,
            contacts, durations, radii, moonPlace, passage);
    }

    // The member index counts back along the series (223 lunations a step) to the first eclipse of its unbroken run
    // under this model. Reads only the solved passages, never the finished eclipses, so it cannot re-enter AtLunation.
    private SarosMember SarosOf(long k) =>
        new(SarosNumbering.SeriesOf(k), (int)((k - FirstMemberOfRun(k)) / SarosLunations) + 1);

    private long FirstMemberOfRun(long k)
    {
        var walked = new List<long>();
        var member = k;
        long first;
        while (!_firstMemberOfRun.TryGetValue(member, out first))
        {
            walked.Add(member);
            if (!IsEclipsed(member - SarosLunations))
            {
                first = member;
                break;
            }
            member -= SarosLunations;
        }
        foreach (var m in walked) _firstMemberOfRun.TryAdd(m, first);
        return first;
    }
}
