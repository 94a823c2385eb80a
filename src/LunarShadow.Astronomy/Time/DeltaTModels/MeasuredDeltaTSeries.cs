using LunarShadow.Astronomy.Embedded;

namespace LunarShadow.Astronomy.Time;

/// <summary>
/// Measured ΔT: USNO half-yearly values (from 1657 in the whole record, from 1955, the atomic-clock era, in the series
/// the models use) and the USNO/IERS monthly series from 1973, as imported from the astronomia@4.2.0 package by
/// tools/ephemeris-import.
/// </summary>
internal sealed class MeasuredDeltaTSeries
{
    private readonly double[] _years;
    private readonly double[] _seconds;

    private MeasuredDeltaTSeries(double[] years, double[] seconds)
    {
        _years = years;
        _seconds = seconds;
    }

    // Start of the atomic-clock era, where the models take over the measurements.
    private const double AtomicEraStartYear = 1955.0;

    /// <summary>The series embedded in this build, from the atomic-clock era (1955) on.</summary>
    public static MeasuredDeltaTSeries Embedded { get; } = Load(AtomicEraStartYear);

    /// <summary>The whole embedded record, from the first telescopic half-yearly value (1657) on: the hindcasts' record.</summary>
    public static MeasuredDeltaTSeries WholeRecord { get; } = Load(double.NegativeInfinity);

    /// <summary>First year of the series.</summary>
    public double FirstYear => _years[0];

    /// <summary>Last year of the series.</summary>
    public double LastYear => _years[^1];

    /// <summary>Whether the year lies within the series.</summary>
    public bool Covers(double year) => year >= FirstYear && year <= LastYear;

    /// <summary>ΔT in seconds, interpolated linearly between tabulated values.</summary>
    public double At(double year)
    {
        if (!Covers(year)) throw new ArgumentOutOfRangeException(nameof(year));
        var i = Array.BinarySearch(_years, year);
        if (i >= 0) return _seconds[i];
        i = ~i;
        var f = (year - _years[i - 1]) / (_years[i] - _years[i - 1]);
        return _seconds[i - 1] + f * (_seconds[i] - _seconds[i - 1]);
    }

    private static MeasuredDeltaTSeries Load(double firstHalfYear)
    {
        var file = BlockFile.FromResource(EmbeddedDataSet.MeasuredDeltaT);
        var monthly = file["MONTHLY_MJD"].Select(r => (Year: new JulianDate(r[0] + 2400000.5).DecimalYear, Seconds: r[1])).ToList();
        var firstMonthly = monthly[0].Year;
        var halfYearly = file["HALFYEAR_YEAR"]
            .Where(r => r[0] >= firstHalfYear && r[0] < firstMonthly)
            .Select(r => (Year: r[0], Seconds: r[1]));
        var all = halfYearly.Concat(monthly).ToArray();
        return new MeasuredDeltaTSeries(all.Select(p => p.Year).ToArray(), all.Select(p => p.Seconds).ToArray());
    }
}
