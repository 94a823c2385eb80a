using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Common;

/// <summary>
/// What the observers' log says about one eclipse, as the endpoints that use it (<c>shadow=measured</c>,
/// <c>danjonL=reported</c>) ask for it. Implemented beside the log's reader (Observations), registered by Hosting.
/// </summary>
internal interface IObservedNight
{
    /// <summary>The enlargement fitted to the eclipse's crater timings so far (instants taken to TT with <paramref name="time"/>).</summary>
    Task<MeasuredShadow> ShadowAsync(LunarEclipse eclipse, CalendarDate date, TimeScaleConverter time, CancellationToken cancellationToken);

    /// <summary>The Danjon estimates reported for the eclipse so far.</summary>
    Task<IReadOnlyList<double>> DanjonValuesAsync(CalendarDate date, CancellationToken cancellationToken);
}

/// <summary>The crater timings of one eclipse and the enlargement fitted to them.</summary>
/// <param name="Timings">How many crater timings are stored for the eclipse.</param>
/// <param name="Fit">The fit, or null with fewer than <see cref="UmbralEnlargementFit.MinimumTimings"/> usable timings.</param>
internal sealed record MeasuredShadow(int Timings, UmbralEnlargement? Fit);

/// <summary>The measured shadow a response used (with <c>shadow=measured</c>).</summary>
/// <param name="Timings">Crater timings stored for the eclipse.</param>
/// <param name="Used">Timings the fit kept.</param>
/// <param name="Rejected">Timings it left out as outliers (or could not reduce).</param>
/// <param name="EnlargementPercent">Fitted umbral enlargement, percent of the geometric umbra's radius.</param>
/// <param name="EnlargementPercentSigma">Its one-sigma uncertainty, percent.</param>
/// <param name="EquivalentLayerKm">The opaque-layer height giving the same umbra, km.</param>
/// <param name="EquivalentLayerKmSigma">Its one-sigma uncertainty, km.</param>
public sealed record MeasuredShadowEcho(int Timings, int Used, int Rejected, double EnlargementPercent, double EnlargementPercentSigma,
    double? EquivalentLayerKm, double? EquivalentLayerKmSigma)
{
    /// <summary>The echo of a fit.</summary>
    internal static MeasuredShadowEcho Of(int timings, UmbralEnlargement fit) => new(timings, fit.Used, fit.Rejected,
        Math.Round(fit.EnlargementPercent, 4), Math.Round(fit.EnlargementPercentSigma, 4),
        fit.EquivalentLayerKm is { } h ? Math.Round(h, 1) : null, fit.EquivalentLayerKmSigma is { } s ? Math.Round(s, 1) : null);
}
