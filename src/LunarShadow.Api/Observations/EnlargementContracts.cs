namespace LunarShadow.Api.Observations;

/// <summary>The umbral enlargement measured from the crater timings stored for one eclipse.</summary>
/// <param name="Date">UTC date of greatest eclipse.</param>
/// <param name="Status">measured, or too-few-timings (fewer than <paramref name="MinimumTimings"/> usable timings: no fit yet).</param>
/// <param name="MinimumTimings">Fewest timings a fit is made from.</param>
/// <param name="Observations">Crater timings stored for the eclipse.</param>
/// <param name="Rejected">Timings the fit left out (outliers, or instants it cannot reduce).</param>
/// <param name="EnlargementPercent">The umbra's enlargement over the bare geometric umbra (shadow none), percent of its radius; null without a fit.</param>
/// <param name="EnlargementPercentSigma">Its one-sigma uncertainty from the scatter of the timings kept, percent.</param>
/// <param name="EquivalentLayerKm">The opaque-layer height (shadow=layer) whose umbra, at the timings kept, has the same mean radius, km.</param>
/// <param name="EquivalentLayerKmSigma">Its one-sigma uncertainty, km.</param>
/// <param name="DeltaTModel">ΔT model used to take the observed UTC to TT (or "fixed").</param>
/// <param name="DeltaTSeconds">ΔT used, seconds.</param>
/// <param name="Method">How the fit is made, in words, with its sources.</param>
/// <param name="Residuals">Every stored timing, oldest first, against the fitted umbra.</param>
public sealed record EnlargementResponse(
    string Date,
    string Status,
    int MinimumTimings,
    int Observations,
    int Rejected,
    double? EnlargementPercent,
    double? EnlargementPercentSigma,
    double? EquivalentLayerKm,
    double? EquivalentLayerKmSigma,
    string DeltaTModel,
    double DeltaTSeconds,
    string Method,
    IReadOnlyList<EnlargementResidualResponse> Residuals);

/// <summary>One timing against the fitted umbra.</summary>
/// <param name="Feature">The feature's name.</param>
/// <param name="Crossing">immersion or emersion.</param>
/// <param name="ObservedUtc">The observed instant, UTC.</param>
/// <param name="PredictedUtc">When the fitted umbra's edge crosses the feature, UTC (null without a fit or for a timing that cannot be reduced).</param>
/// <param name="ResidualSeconds">Observed minus predicted, seconds.</param>
/// <param name="Rejected">Whether the fit left it out.</param>
/// <param name="MeasuredPercent">The enlargement this timing alone gives, percent.</param>
public sealed record EnlargementResidualResponse(
    string Feature, string Crossing, string ObservedUtc, string? PredictedUtc, double? ResidualSeconds, bool Rejected, double? MeasuredPercent);
