namespace LunarShadow.Astronomy.Time;

/// <summary>
/// Hindcasts of a ΔT forecast method on the measured record: from each whole start year Y of the record, forecast
/// Y + N for N = 1, 2, … years by the method and compare with what was measured then. The errors give the forecast's
/// honest uncertainty (docs/methods.md, "ΔT forecast uncertainty").
/// </summary>
internal static class DeltaTHindcast
{
    /// <summary>Forecasts up to this many years ahead are fitted; longer ones have too few independent start years.</summary>
    public const int LongestFittedYears = 200;

    // A forecast length is fitted only when at least this many start years reach it.
    private const int FewestStartsPerLength = 10;

    /// <summary>A forecast method: ΔT at the target year from the record up to the start year, seconds.</summary>
    public delegate double ForecastMethod(MeasuredDeltaTSeries record, double startYear, double targetYear);

    /// <summary>One hindcast: the forecast's length in years and its error (measured − forecast), seconds.</summary>
    public readonly record struct Error(int YearsAhead, double Seconds);

    /// <summary>Every hindcast of the method over the record, from the first start year the method can use.</summary>
    public static IReadOnlyList<Error> Run(MeasuredDeltaTSeries record, ForecastMethod method, double firstStartYear)
    {
        var errors = new List<Error>();
        for (var start = Math.Ceiling(Math.Max(firstStartYear, record.FirstYear)); start + 1 <= record.LastYear; start++)
            for (var n = 1; start + n <= record.LastYear; n++)
                errors.Add(new Error(n, record.At(start + n) - method(record, start, start + n)));
        return errors;
    }

    /// <summary>
    /// Fits σ(N) = a·N^b by least squares on log(rms error) against log N, for each N up to <see cref="LongestFittedYears"/>
    /// that at least ten start years reach.
    /// </summary>
    public static DeltaTForecastUncertainty FitPowerLaw(IReadOnlyList<Error> errors)
    {
        var points = errors.Where(e => e.YearsAhead <= LongestFittedYears)
            .GroupBy(e => e.YearsAhead)
            .Where(g => g.Count() >= FewestStartsPerLength)
            .Select(g => (X: Math.Log(g.Key), Y: Math.Log(Math.Sqrt(g.Average(e => e.Seconds * e.Seconds)))))
            .ToArray();
        var meanX = points.Average(p => p.X);
        var meanY = points.Average(p => p.Y);
        var slope = points.Sum(p => (p.X - meanX) * (p.Y - meanY)) / points.Sum(p => (p.X - meanX) * (p.X - meanX));
        var longest = errors.Where(e => e.YearsAhead <= LongestFittedYears).Max(e => e.YearsAhead);
        return new DeltaTForecastUncertainty(Math.Exp(meanY - slope * meanX), slope, longest);
    }

    /// <summary>The share of hindcasts up to <see cref="LongestFittedYears"/> whose error lies within the stated σ.</summary>
    public static double Coverage(IReadOnlyList<Error> errors, DeltaTForecastUncertainty sigma)
    {
        var fitted = errors.Where(e => e.YearsAhead <= LongestFittedYears).ToArray();
        return fitted.Count(e => Math.Abs(e.Seconds) <= sigma.SecondsAfter(e.YearsAhead)) / (double)fitted.Length;
    }
}
