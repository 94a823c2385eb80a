namespace LunarShadow.Astronomy.Time;

/// <summary>
/// The default ΔT model: measured values where they exist (1955 to the last USNO/IERS monthly value),
/// the Stephenson–Morrison–Hohenkerk spline (2016, revised 2021) from −720 to 1955, and their long-term
/// length-of-day model before −720 and after the last measurement, each joined without a jump. Beyond the last
/// measurement the uncertainty is that of this forecast method in hindcasts on the measured record.
/// </summary>
public sealed class BestDeltaT : IDeltaTModel
{
    /// <summary>The public name of this model.</summary>
    public const string ModelName = "best";

    // Width of the linear blend from the spline into the measured series, in years.
    private const double BlendYears = 1.0;

    private readonly MeasuredDeltaTSeries _measured = MeasuredDeltaTSeries.Embedded;
    private readonly double _pastConstant;
    private readonly DeltaTForecastUncertainty _forecastUncertainty;

    /// <summary>Creates the model over the embedded measured series.</summary>
    public BestDeltaT()
    {
        var first = StephensonMorrisonHohenkerkSpline.FirstYear;
        _pastConstant = StephensonMorrisonHohenkerkSpline.Spline(first) - StephensonMorrisonHohenkerkSpline.IntegratedLengthOfDay(first);
        _forecastUncertainty = DeltaTHindcast.FitPowerLaw(
            DeltaTHindcast.Run(MeasuredDeltaTSeries.WholeRecord, LengthOfDayForecast, double.NegativeInfinity));
    }

    /// <summary>σ of this model's forecast N years beyond <see cref="LastMeasuredYear"/>, from hindcasts on the measured record.</summary>
    public DeltaTForecastUncertainty ForecastUncertainty => _forecastUncertainty;

    /// <summary>Last year with a measured value; predictions start here.</summary>
    public double LastMeasuredYear => _measured.LastYear;

    /// <inheritdoc />
    public string Name => ModelName;

    /// <inheritdoc />
    public DeltaT At(double decimalYear) => new(Seconds(decimalYear), Uncertainty(decimalYear), ModelName);

    private double Seconds(double y)
    {
        if (y < StephensonMorrisonHohenkerkSpline.FirstYear)
            return StephensonMorrisonHohenkerkSpline.IntegratedLengthOfDay(y) + _pastConstant;
        if (y > _measured.LastYear)
            return LengthOfDayForecast(_measured, _measured.LastYear, y);
        var start = _measured.FirstYear;
        if (y >= start) return _measured.At(y);
        var spline = StephensonMorrisonHohenkerkSpline.Spline(y);
        if (y < start - BlendYears) return spline;
        var offsetAtStart = _measured.At(start) - StephensonMorrisonHohenkerkSpline.Spline(start);
        return spline + offsetAtStart * (y - (start - BlendYears)) / BlendYears;
    }

    // Morrison et al. (2021): the forecast beyond the data follows the integrated long-term length-of-day model from the
    // last measured value (the record's value at the start year, so hindcasts use exactly this method).
    internal static double LengthOfDayForecast(MeasuredDeltaTSeries record, double startYear, double targetYear) =>
        record.At(startYear) + StephensonMorrisonHohenkerkSpline.IntegratedLengthOfDay(targetYear)
        - StephensonMorrisonHohenkerkSpline.IntegratedLengthOfDay(startYear);

    // One-sigma uncertainty in the measured era (common practice: ΔT from IERS UT1 − UTC is known to well under 0.1 s).
    private const double MeasuredUncertaintySeconds = 0.05;

    // One-sigma uncertainty of ΔT published with the SMH 2016 / 2021 solution by HM Nautical Almanac Office
    // ("Delta T" pages of the lvm project), interpolated linearly between its tabulated years; 0.05 s in the
    // past; 0.74·t² s before −2000, t in centuries from 1825. Only the past rows are used: the future is the hindcast σ.
    private static readonly (double Year, double Seconds)[] UncertaintyTable =
    [
        (-2000, 1080), (-1600, 720), (-900, 360), (-720, 180), (-700, 170), (-600, 160), (-500, 150), (-400, 130),
        (-300, 120), (-200, 110), (-100, 100), (0, 90), (100, 80), (200, 70), (300, 60), (400, 50), (500, 40),
        (700, 30), (800, 25), (900, 20), (1000, 15), (1620, 20), (1660, 15), (1670, 10), (1680, 5), (1730, 2),
        (1770, 1), (1800, 0.5), (1802, 0.4), (1805, 0.3), (1809, 0.2), (1831, 0.1), (1870, 0.05), (1955, 0.05),
    ];

    private double Uncertainty(double y)
    {
        if (_measured.Covers(y)) return MeasuredUncertaintySeconds;
        if (y > _measured.LastYear)
        {
            var forecast = _forecastUncertainty.SecondsAfter(y - _measured.LastYear);
            return Math.Sqrt(MeasuredUncertaintySeconds * MeasuredUncertaintySeconds + forecast * forecast);
        }
        var t = (y - 1825) / 100;
        if (y < UncertaintyTable[0].Year) return 0.74 * t * t;
        var i = 1;
        while (UncertaintyTable[i].Year < y) i++;
        var (y0, s0) = UncertaintyTable[i - 1];
        var (y1, s1) = UncertaintyTable[i];
        return s0 + (s1 - s0) * (y - y0) / (y1 - y0);
    }
}
