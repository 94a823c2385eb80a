using LunarShadow.Api.Formatting;

namespace LunarShadow.Api.Observations;

/// <summary>The enlargement as CSV: one row per timing, the fit repeated on each row so that every row stands alone.</summary>
internal static class EnlargementFormats
{
    public static string Csv(EnlargementResponse r)
    {
        using var csv = new CsvWriter();
        csv.Row("feature", "crossing", "observed_utc", "predicted_utc", "residual_s", "rejected", "measured_percent",
            "status", "enlargement_percent", "enlargement_percent_sigma", "equivalent_layer_km", "equivalent_layer_km_sigma");
        foreach (var x in r.Residuals)
        {
            csv.Row(x.Feature, x.Crossing, x.ObservedUtc, x.PredictedUtc, x.ResidualSeconds, x.Rejected, x.MeasuredPercent,
                r.Status, r.EnlargementPercent, r.EnlargementPercentSigma, r.EquivalentLayerKm, r.EquivalentLayerKmSigma);
        }
        return csv.ToString();
    }
}
