namespace LunarShadow.Astronomy.Numerics;

/// <summary>The median and a scale that a few wild values cannot move.</summary>
public static class RobustScale
{
    /// <summary>The median of the values (the mean of the middle two for an even count); NaN for none.</summary>
    public static double Median(IEnumerable<double> values)
    {
        var sorted = values.Order().ToArray();
        if (sorted.Length == 0) return double.NaN;
        var middle = sorted.Length / 2;
        return sorted.Length % 2 == 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
    }

    // Hampel (1974), J. Am. Stat. Assoc. 69, 383: σ ≈ 1.4826 · median|x − median(x)| for normally distributed x.
    /// <summary>The standard deviation estimated from the median absolute deviation; NaN for none.</summary>
    public static double SigmaFromMedianAbsoluteDeviation(IReadOnlyCollection<double> values)
    {
        var median = Median(values);
        return 1.4826 * Median(values.Select(v => Math.Abs(v - median)));
    }
}
