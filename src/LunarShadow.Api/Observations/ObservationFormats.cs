using LunarShadow.Api.Formatting;

namespace LunarShadow.Api.Observations;

/// <summary>The observation list as CSV: one row per observation, text cells neutralised by the project's CSV writer.</summary>
internal static class ObservationFormats
{
    public static string Csv(ObservationListResponse list)
    {
        using var csv = new CsvWriter();
        csv.Row("eclipse", "id", "kind", "feature", "crossing", "value", "utc", "lat", "lon", "elevation", "uncertaintySeconds", "optics", "observer", "observatory", "receivedUtc");
        foreach (var o in list.Observations)
            csv.Row(list.Eclipse, o.Id, o.Kind, o.Feature, o.Crossing, o.Value, o.Utc, o.Site.Lat, o.Site.Lon, o.Site.Elevation, o.UncertaintySeconds, o.Optics, o.Observer, o.Observatory, o.ReceivedUtc);
        return csv.ToString();
    }
}
