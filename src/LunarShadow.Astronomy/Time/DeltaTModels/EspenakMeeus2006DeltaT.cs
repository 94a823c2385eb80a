namespace LunarShadow.Astronomy.Time;

/// <summary>
/// The ΔT polynomials of Espenak &amp; Meeus (2006), as used by the Five Millennium Canon of Lunar Eclipses
/// (Espenak &amp; Meeus 2009), with the canon's correction for the lunar secular acceleration. Beyond its last data
/// (2005) the uncertainty is that of a trend forecast in hindcasts on the measured record.
/// </summary>
public sealed class EspenakMeeus2006DeltaT : IDeltaTModel
{
    /// <summary>The public name of this model.</summary>
    public const string ModelName = "espenak-meeus-2006";

    /// <summary>The last year of data behind the polynomials; later values are forecasts.</summary>
    public const double LastDataYear = 2005;

    // Years of record behind the trend forecast's rate (the span Espenak & Meeus fitted, 2000–2005).
    private const double TrendYears = 5;

    // Morrison & Stephenson (2004): the long-term parabola ΔT = −20 + 32·u² s, u in centuries, curves by 32 s/cy² = 0.0032 s/yr².
    private const double ParabolaCurvatureSecondsPerYearSquared = 0.0032;

    private static readonly Lazy<DeltaTForecastUncertainty> Forecast = new(() => DeltaTHindcast.FitPowerLaw(
        DeltaTHindcast.Run(MeasuredDeltaTSeries.WholeRecord, TrendForecast, MeasuredDeltaTSeries.WholeRecord.FirstYear + TrendYears)));

    /// <inheritdoc />
    public string Name => ModelName;

    /// <summary>σ of this model's forecast N years beyond <see cref="LastDataYear"/>, from hindcasts on the measured record.</summary>
    public static DeltaTForecastUncertainty ForecastUncertainty => Forecast.Value;

    /// <inheritdoc />
    public DeltaT At(double decimalYear) =>
        new(Polynomial(decimalYear) + LunarAccelerationCorrection(decimalYear), Uncertainty(decimalYear), ModelName);

    // Espenak & Meeus (2006), "Polynomial expressions for Delta T", NASA eclipse web site; Five Millennium Canon (2009) §2.
    internal static double Polynomial(double y)
    {
        double u, t;
        switch (y)
        {
            case < -500:
                u = (y - 1820) / 100;
                return -20 + 32 * u * u;
            case < 500:
                u = y / 100;
                return Horner(u, 10583.6, -1014.41, 33.78311, -5.952053, -0.1798452, 0.022174192, 0.0090316521);
            case < 1600:
                u = (y - 1000) / 100;
                return Horner(u, 1574.2, -556.01, 71.23472, 0.319781, -0.8503463, -0.005050998, 0.0083572073);
            case < 1700:
                t = y - 1600;
                return Horner(t, 120, -0.9808, -0.01532, 1.0 / 7129);
            case < 1800:
                t = y - 1700;
                return Horner(t, 8.83, 0.1603, -0.0059285, 0.00013336, -1.0 / 1174000);
            case < 1860:
                t = y - 1800;
                return Horner(t, 13.72, -0.332447, 0.0068612, 0.0041116, -0.00037436, 0.0000121272, -0.0000001699, 0.000000000875);
            case < 1900:
                t = y - 1860;
                return Horner(t, 7.62, 0.5737, -0.251754, 0.01680668, -0.0004473624, 1.0 / 233174);
            case < 1920:
                t = y - 1900;
                return Horner(t, -2.79, 1.494119, -0.0598939, 0.0061966, -0.000197);
            case < 1941:
                t = y - 1920;
                return Horner(t, 21.20, 0.84493, -0.076100, 0.0020936);
            case < 1961:
                t = y - 1950;
                return Horner(t, 29.07, 0.407, -1.0 / 233, 1.0 / 2547);
            case < 1986:
                t = y - 1975;
                return Horner(t, 45.45, 1.067, -1.0 / 260, -1.0 / 718);
            case < 2005:
                t = y - 2000;
                return Horner(t, 63.86, 0.3345, -0.060374, 0.0017275, 0.000651814, 0.00002373599);
            case < 2050:
                t = y - 2000;
                return Horner(t, 62.92, 0.32217, 0.005589);
            case < 2150:
                u = (y - 1820) / 100;
                return -20 + 32 * u * u - 0.5628 * (2150 - y);
            default:
                u = (y - 1820) / 100;
                return -20 + 32 * u * u;
        }
    }

    // Espenak & Meeus (2009), Five Millennium Canon of Lunar Eclipses, §2.3: c = −0.000012932·(y − 1955)² s,
    // for the lunar ephemeris's secular acceleration (−25.858″/cy²) against the −26″/cy² behind the polynomials.
    internal static double LunarAccelerationCorrection(double y) => -0.000012932 * (y - 1955) * (y - 1955);

    // Espenak & Meeus (2006) continue the recent trend and bend onto the long-term parabola; as a reproducible stand-in
    // for hindcasts: the record's value at the start year, its mean rate over the five years before, and the parabola's curvature.
    internal static double TrendForecast(MeasuredDeltaTSeries record, double startYear, double targetYear)
    {
        var now = record.At(startYear);
        var rate = (now - record.At(startYear - TrendYears)) / TrendYears;
        var n = targetYear - startYear;
        return now + rate * n + ParabolaCurvatureSecondsPerYearSquared * n * n;
    }

    // Morrison & Stephenson (2004), J. Hist. Astron. 35, 327: standard error ≈ 0.8·t² s, t in centuries from 1820
    // (from memory); never less than 0.1 s. After the last data, that of 2005 and the hindcast σ in quadrature.
    internal static double Uncertainty(double y)
    {
        var past = PastUncertainty(Math.Min(y, LastDataYear));
        if (y <= LastDataYear) return past;
        var forecast = Forecast.Value.SecondsAfter(y - LastDataYear);
        return Math.Sqrt(past * past + forecast * forecast);
    }

    private static double PastUncertainty(double y)
    {
        var t = (y - 1820) / 100;
        return Math.Max(0.8 * t * t, 0.1);
    }

    private static double Horner(double x, params ReadOnlySpan<double> c)
    {
        var r = 0.0;
        for (var i = c.Length - 1; i >= 0; i--) r = r * x + c[i];
        return r;
    }
}
