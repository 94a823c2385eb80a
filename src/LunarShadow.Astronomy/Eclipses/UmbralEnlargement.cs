using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Eclipses;

/// <summary>
/// The umbra's enlargement measured from one eclipse's crater timings: a percentage of the bare geometric umbra's radius
/// (shadow model <c>none</c>), with its one-sigma uncertainty from the scatter of the timings kept, the opaque-layer
/// height that gives the same umbra, and every timing's residual.
/// </summary>
/// <param name="EnlargementPercent">The fitted enlargement, percent of the geometric umbral radius.</param>
/// <param name="EnlargementPercentSigma">Its one-sigma uncertainty, percent.</param>
/// <param name="EquivalentLayerKm">The height of the opaque layer whose umbra, at the timings kept, has the same mean radius; null when none within −1000 to 3000 km.</param>
/// <param name="EquivalentLayerKmSigma">Its one-sigma uncertainty, km (from the enlargement's); null with the height.</param>
/// <param name="Residuals">One per timing, in the order given.</param>
public sealed record UmbralEnlargement(
    double EnlargementPercent,
    double EnlargementPercentSigma,
    double? EquivalentLayerKm,
    double? EquivalentLayerKmSigma,
    IReadOnlyList<TimingResidual> Residuals)
{
    /// <summary>How many timings were kept in the fit.</summary>
    public int Used => Residuals.Count(r => !r.Rejected);

    /// <summary>How many timings the outlier rejection (or an instant outside the passage) left out.</summary>
    public int Rejected => Residuals.Count(r => r.Rejected);

    /// <summary>The shadow model of the fitted enlargement.</summary>
    public ShadowModel Model => ShadowModel.Enlarged(EnlargementPercent);
}

/// <summary>One timing against the fitted umbra.</summary>
/// <param name="Timing">The timing.</param>
/// <param name="MeasuredPercent">The enlargement this timing alone gives (its observed umbral radius over the geometric one, less 1, in percent).</param>
/// <param name="Predicted">When the fitted umbra's edge crosses the feature (nearest the observed instant), TT; null when it cannot be reduced.</param>
/// <param name="ResidualSeconds">Observed minus predicted, seconds; null when it cannot be reduced.</param>
/// <param name="Rejected">Whether the fit left it out.</param>
public sealed record TimingResidual(CraterTiming Timing, double? MeasuredPercent, TtInstant? Predicted, double? ResidualSeconds, bool Rejected);
