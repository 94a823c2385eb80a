using System.Globalization;
using LunarShadow.Astronomy.Numerics;
using LunarShadow.Astronomy.Photography;

namespace LunarShadow.Api.Photography;

/// <summary>The Danjon estimates observers reported for an eclipse, as a photo plan with danjonL=reported used them.</summary>
/// <param name="Reports">How many estimates are stored.</param>
/// <param name="MedianL">Their median L (null when there are none).</param>
/// <param name="SpreadL">Their spread: 1.4826 × the median absolute deviation, a robust standard deviation (null with fewer than two).</param>
/// <param name="LowestL">The lowest estimate (null when none).</param>
/// <param name="HighestL">The highest estimate (null when none).</param>
/// <param name="FellBack">True when there were none and the plan used the default L instead.</param>
/// <param name="Note">What was used, in words.</param>
public sealed record DanjonReportsEcho(int Reports, double? MedianL, double? SpreadL, double? LowestL, double? HighestL, bool FellBack, string Note)
{
    /// <summary>The L a plan uses: the median, or the default when there are no reports.</summary>
    public double UsedL => MedianL ?? UmbralGlow.DefaultDanjon;

    /// <summary>The summary of the stored estimates.</summary>
    internal static DanjonReportsEcho Of(IReadOnlyList<double> values)
    {
        if (values.Count == 0)
        {
            return new DanjonReportsEcho(0, null, null, null, null, true, string.Create(CultureInfo.InvariantCulture,
                $"No Danjon estimates are stored for this eclipse yet: the plan uses the default L = {UmbralGlow.DefaultDanjon:0.0#} (a typical totality), not a report."));
        }
        var median = RobustScale.Median(values);
        double? spread = values.Count > 1 ? Math.Round(RobustScale.SigmaFromMedianAbsoluteDeviation(values), 2) : null;
        return new DanjonReportsEcho(values.Count, median, spread, values.Min(), values.Max(), false, string.Create(CultureInfo.InvariantCulture,
            $"The plan uses L = {median:0.0#}, the median of {values.Count} reported estimate{(values.Count == 1 ? "" : "s")} (from {values.Min():0.0} to {values.Max():0.0}{(spread is { } s ? $", robust spread ±{s:0.0#}" : "")})."));
    }
}
