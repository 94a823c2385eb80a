using LunarShadow.Astronomy.Numerics;
using LunarShadow.Astronomy.Shadow;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// Fits the umbra's enlargement to one eclipse's crater timings. Each timing is reduced on the eclipse's
/// <see cref="FeatureShadowCrossings"/> geometry: at the observed instant, the feature's distance from the shadow axis (at
/// its own distance along the axis) is the observed umbral radius, and its ratio to the bare geometric umbral radius there
/// gives the enlargement that timing measures. The fit is their weighted mean, weighted as a least-squares fit of the
/// instants (each timing's weight is the square of how fast its enlargement changes per second over its stated
/// uncertainty), with iterative 3σ rejection on a median-absolute-deviation scale. Accuracy: the reduction follows the
/// passage's geometry (better than 0.1″, about 0.2 s of time, and 0.01 % of the umbra); predicted instants are solved to
/// 1 ms; the stated σ is the external error from the scatter of the timings kept, which observers' timing errors dominate.
/// </summary>
public static class UmbralEnlargementFit
{
    /// <summary>Fewest timings the fit is made from (a median absolute deviation from fewer is not a usable scale).</summary>
    public const int MinimumTimings = 6;

    /// <summary>Uncertainty assumed for a timing that states none, seconds (visual timings of the fuzzy edge: common practice).</summary>
    public const double DefaultUncertaintySeconds = 30;

    /// <summary>Least uncertainty a timing is credited with, seconds (the umbra's edge is not sharper: common practice).</summary>
    public const double LeastUncertaintySeconds = 5;

    /// <summary>Timings further from the fit than this many robust standard deviations are rejected.</summary>
    public const double RejectionSigmas = 3;

    // Least robust scale, in units of each timing's own uncertainty: without it, perfect timings would reject each other.
    private const double LeastScale = 0.1;

    private const double StepSeconds = 30;
    private const int MaxIterations = 20;

    /// <summary>The fitted enlargement, or null when fewer than <see cref="MinimumTimings"/> timings can be reduced.</summary>
    // Herald & Sinnott (2014), J. Br. Astron. Assoc. 124, 247, and the crater-timing reductions it builds on (Soulsby: E% = (Ro − Rc)/Rc per timing, mean with its mean error), with Hampel's (1974) MAD scale for the 3σ rejection.
    public static UmbralEnlargement? Fit(LunarEclipse eclipse, IReadOnlyList<CraterTiming> timings)
    {
        var crossings = new FeatureShadowCrossings(eclipse);
        var passage = eclipse.Passage;
        var reduced = timings.Select(t => Reduce(crossings, passage, t)).ToArray();
        var usable = Enumerable.Range(0, reduced.Length).Where(i => reduced[i] is not null).ToArray();
        if (usable.Length < MinimumTimings) return null;

        var kept = usable;
        var percent = WeightedMean(reduced, kept);
        for (var iteration = 0; iteration < MaxIterations; iteration++)
        {
            var p = percent;
            double Normalized(int i) => (reduced[i]!.Value.Percent - p) / reduced[i]!.Value.PercentPerSecond / reduced[i]!.Value.SigmaSeconds;
            var scale = Math.Max(LeastScale, RobustScale.SigmaFromMedianAbsoluteDeviation(kept.Select(Normalized).ToArray()));
            var next = usable.Where(i => Math.Abs(Normalized(i)) <= RejectionSigmas * scale).ToArray();
            if (next.Length * 2 < usable.Length || next.SequenceEqual(kept)) break; // the MAD's breakdown point: keep at least half
            kept = next;
            percent = WeightedMean(reduced, kept);
        }

        var sigma = ExternalSigma(reduced, kept, percent);
        var height = EquivalentLayer(reduced, kept, percent);
        var heightSigma = height is null ? null
            : EquivalentLayer(reduced, kept, percent + sigma) is { } up && EquivalentLayer(reduced, kept, percent - sigma) is { } down
                ? Math.Abs(up - down) / 2 : (double?)null;
        var keptSet = kept.ToHashSet();
        var residuals = timings.Select((t, i) => Residual(crossings, passage, t, reduced[i], percent, !keptSet.Contains(i))).ToList();
        return new UmbralEnlargement(percent, sigma, height, height is null ? null : heightSigma, residuals);
    }

    /// <summary>The enlargement a feature's distance from the axis at some hours from the passage's centre represents, percent.</summary>
    public static double EnlargementAt(FeatureShadowCrossings crossings, LunarFeature feature, double hours)
    {
        var g = crossings.At(feature, hours).Geometry;
        var geometric = ShadowCrossSection.Radii(ShadowModel.Geometric, g, g.DirectionFromAxis).Umbra.Radians;
        return (g.Separation.Radians / geometric - 1) * 100;
    }

    // One timing at the observed instant: its enlargement, how fast that changes (percent per second), its uncertainty,
    // and the geometry the layer-height solution needs. Null when outside the fitted passage or too slow to time.
    private static Reduction? Reduce(FeatureShadowCrossings crossings, ShadowPassage passage, CraterTiming t)
    {
        var hours = passage.HoursFromCenter(t.Observed);
        var step = StepSeconds / 3600;
        if (Math.Abs(hours) > passage.HalfWidthHours - step) return null;
        var percent = EnlargementAt(crossings, t.Feature, hours);
        var rate = (EnlargementAt(crossings, t.Feature, hours + step) - EnlargementAt(crossings, t.Feature, hours - step)) / (2 * StepSeconds);
        if (Math.Abs(rate) < 1e-6 || !double.IsFinite(percent)) return null; // a graze: the edge barely moves over it
        var sigma = Math.Max(LeastUncertaintySeconds, t.UncertaintySeconds ?? DefaultUncertaintySeconds);
        var g = crossings.At(t.Feature, hours).Geometry;
        return new Reduction(hours, percent, rate, sigma, g);
    }

    private static double Weight(Reduction r) => r.PercentPerSecond * r.PercentPerSecond / (r.SigmaSeconds * r.SigmaSeconds);

    private static double WeightedMean(Reduction?[] reduced, int[] kept) =>
        kept.Sum(i => Weight(reduced[i]!.Value) * reduced[i]!.Value.Percent) / kept.Sum(i => Weight(reduced[i]!.Value));

    // The mean error from the scatter about the mean with relative weights: √(Σw(E − Ē)² / ((n − 1)·Σw)).
    private static double ExternalSigma(Reduction?[] reduced, int[] kept, double mean)
    {
        if (kept.Length < 2) return double.NaN;
        var sum = kept.Sum(i => Weight(reduced[i]!.Value) * Math.Pow(reduced[i]!.Value.Percent - mean, 2));
        return Math.Sqrt(sum / ((kept.Length - 1) * kept.Sum(i => Weight(reduced[i]!.Value))));
    }

    // The layer height whose umbra, at the kept timings' geometries and directions, has the same weighted mean radius as
    // the geometric umbra enlarged by the fitted percentage (solved, not approximated).
    private static double? EquivalentLayer(Reduction?[] reduced, int[] kept, double percent)
    {
        double Gap(double heightKm) => kept.Sum(i =>
        {
            var r = reduced[i]!.Value;
            var layer = ShadowCrossSection.Radii(ShadowModel.Layer(heightKm), r.Geometry, r.Geometry.DirectionFromAxis).Umbra.Radians;
            var geometric = ShadowCrossSection.Radii(ShadowModel.Geometric, r.Geometry, r.Geometry.DirectionFromAxis).Umbra.Radians;
            return Weight(r) * (layer - geometric * (1 + percent / 100));
        });
        const double lowest = -1000, highest = 3000;
        if (Math.Sign(Gap(lowest)) == Math.Sign(Gap(highest))) return null;
        return RootFinder.Brent(Gap, lowest, highest, 1e-4);
    }

    // Newton's method on the enlargement at the feature, from the observed instant to where it equals the fitted value.
    private static TimingResidual Residual(FeatureShadowCrossings crossings, ShadowPassage passage, CraterTiming t, Reduction? r, double percent, bool rejected)
    {
        if (r is not { } reduction) return new TimingResidual(t, null, null, null, true);
        var hours = reduction.Hours;
        var step = StepSeconds / 3600;
        for (var i = 0; i < 8; i++)
        {
            var value = EnlargementAt(crossings, t.Feature, hours);
            var slope = (EnlargementAt(crossings, t.Feature, hours + step) - EnlargementAt(crossings, t.Feature, hours - step)) / (2 * step);
            var next = hours - (value - percent) / slope;
            if (!double.IsFinite(next) || Math.Abs(next) > passage.HalfWidthHours - step)
            {
                next = reduction.Hours - (reduction.Percent - percent) / reduction.PercentPerSecond / 3600; // the linear step
                hours = next;
                break;
            }
            var done = Math.Abs(next - hours) < 1e-3 / 3600;
            hours = next;
            if (done) break;
        }
        var predicted = passage.InstantAt(hours);
        return new TimingResidual(t, reduction.Percent, predicted, t.Observed.SecondsSince(predicted), rejected);
    }

    private readonly record struct Reduction(double Hours, double Percent, double PercentPerSecond, double SigmaSeconds, ShadowGeometry Geometry);
}
