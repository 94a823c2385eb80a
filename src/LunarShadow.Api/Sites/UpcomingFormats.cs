using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Astronomy.Sites;
using NodaTime;

namespace LunarShadow.Api.Sites;

/// <summary>CSV and iCalendar (subscription feed) representations of the upcoming eclipses a site can see.</summary>
internal static class UpcomingFormats
{
    /// <summary>How often a subscribed calendar should fetch the feed again.</summary>
    public static readonly Duration RefreshInterval = Duration.FromHours(12);

    /// <summary>The columns of the CSV.</summary>
    public static readonly string[] CsvColumns =
    [
        "date", "kind", "local_date", "morning_date", "greatest_utc", "greatest_local", "qualifying_minutes",
        "first_qualifying_utc", "first_qualifying_local", "last_qualifying_utc", "last_qualifying_local",
        "greatest_visible_umbral_magnitude", "summary",
        // Deprecated: the former name of greatest_visible_umbral_magnitude, last, written for one more release.
        "max_visible_umbral_magnitude",
    ];

    /// <summary>One row per eclipse: the UTC date that names it, and the local evening date of the night it is seen in.</summary>
    public static string Csv(IEnumerable<UpcomingItem> items)
    {
        var csv = new CsvWriter().Row(CsvColumns);
        foreach (var i in items)
        {
            var first = i.Qualifying.Count > 0 ? i.Qualifying.MinBy(q => q.StartUtc, StringComparer.Ordinal) : null;
            var last = i.Qualifying.Count > 0 ? i.Qualifying.MaxBy(q => q.EndUtc, StringComparer.Ordinal) : null;
            csv.Row(i.Date, i.Kind, i.Night.Evening, i.Night.Morning, i.GreatestEclipseUtc, i.GreatestEclipseLocal, i.QualifyingMinutes,
                first?.StartUtc, first?.StartLocal, last?.EndUtc, last?.EndLocal, i.GreatestVisibleUmbralMagnitude?.Value, i.Summary,
                i.GreatestVisibleUmbralMagnitude?.Value);
        }
        return csv.ToString();
    }

    /// <summary>
    /// A subscription feed: one event per eclipse spanning the stretches that meet the criteria, whose description says
    /// so and then gives the whole picture; refreshed every <see cref="RefreshInterval"/>. Null when an instant falls
    /// outside the years iCalendar can carry here.
    /// </summary>
    public static string? ICalendar(IReadOnlyList<UpcomingEclipse> found, IReadOnlyList<UpcomingItem> items, Site site, string criteria, Instant generated)
    {
        if (found.Any(u => u.Qualifying.Any(q => !ICalendarWriter.CanWrite(q.StartUtc) || !ICalendarWriter.CanWrite(q.EndUtc)))) return null;
        var calendar = new ICalendarWriter(SiteWording.UpcomingCalendarName(site), generated, RefreshInterval);
        for (var n = 0; n < found.Count; n++)
        {
            var u = found[n];
            if (u.Qualifying.Count == 0) continue;
            calendar.Event(LocalFormats.Uid(items[n].Date, "visible", site), u.Qualifying.Min(q => q.StartUtc), u.Qualifying.Max(q => q.EndUtc),
                SiteWording.UpcomingEventTitle(u.Local.Eclipse.Kind), SiteWording.UpcomingEventDescription(u.Local, u.Qualifying, criteria),
                SiteWording.Where(site), (site.Location.Latitude.Degrees, site.Location.Longitude.Degrees), LocalFormats.AlarmMinutes);
        }
        return calendar.Finish();
    }

    /// <summary>e.g. lunar-eclipses-visible-from-tokyo-science-hall.ics.</summary>
    public static string FileName(SiteEcho site, OutputFormat format) =>
        Downloads.FileName(format, "lunar-eclipses-visible-from", Downloads.SiteSlug(site.Name, site.LatitudeDegrees, site.LongitudeDegrees));
}
