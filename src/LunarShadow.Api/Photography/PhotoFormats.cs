using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Astronomy.Photography;
using NodaTime;

namespace LunarShadow.Api.Photography;

/// <summary>
/// The photo plan as an iCalendar file: one event per stretch of the timeline in one phase, carrying that stretch's
/// exposure plan (shutter range, ISO, aperture, bracket). CSV and the camera sequence are in <see cref="PhotoMapping"/>.
/// </summary>
internal static class PhotoFormats
{
    /// <summary>The calendar, or null when an instant falls outside the years iCalendar can carry here.</summary>
    public static string? ICalendar(PhotoPlan plan, PhotoPlanResponse response, Instant generated)
    {
        var rows = plan.Timeline.Select((r, i) => (Row: r, Shown: response.Timeline[i])).Where(r => r.Row.Phase != MoonPhaseState.Uneclipsed).ToList();
        if (rows.Any(r => !ICalendarWriter.CanWrite(r.Row.Utc))) return null;
        var site = plan.Local.Site;
        var zone = site.TimeZone;
        var calendar = new ICalendarWriter($"Photo plan: {SiteWording.LocalCalendarName(response.Eclipse.Date, site)}", generated);
        var step = Duration.FromSeconds(plan.Settings.IntervalMinutes * 60);
        var counts = new Dictionary<MoonPhaseState, int>();
        var first = true;
        for (var i = 0; i < rows.Count;)
        {
            var j = i;
            while (j + 1 < rows.Count && rows[j + 1].Row.Phase == rows[i].Row.Phase) j++;
            var stretch = rows.Skip(i).Take(j - i + 1).ToList();
            var start = stretch[0].Row.Utc;
            var end = j + 1 < rows.Count ? rows[j + 1].Row.Utc : stretch[^1].Row.Utc;
            if (end <= start) end = start + step;
            var stage = WireNames.Of(stretch[0].Row.Phase);
            var n = counts[stretch[0].Row.Phase] = counts.GetValueOrDefault(stretch[0].Row.Phase) + 1;
            var exposures = stretch.Select(r => r.Shown.Exposure).ToList();
            var description = SiteWording.PhotoEventDescription(zone, stage, start, end,
                (exposures.Min(e => e.ShutterSeconds), exposures.Max(e => e.ShutterSeconds)),
                (exposures.Min(e => e.Iso), exposures.Max(e => e.Iso)),
                (exposures.Min(e => e.Aperture), exposures.Max(e => e.Aperture)),
                plan.Settings.BracketStops,
                (exposures.SelectMany(e => e.BracketShutterSeconds).DefaultIfEmpty(exposures[0].ShutterSeconds).Min(),
                    exposures.SelectMany(e => e.BracketShutterSeconds).DefaultIfEmpty(exposures[0].ShutterSeconds).Max()),
                (stretch.Min(r => r.Shown.MoonAltitudeDegrees), stretch.Max(r => r.Shown.MoonAltitudeDegrees)));
            calendar.Event(LocalFormats.Uid(response.Eclipse.Date, $"photo-{stage}-{n}", site), start, end, SiteWording.PhotoEventTitle(stage),
                description, SiteWording.Where(site), (site.Location.Latitude.Degrees, site.Location.Longitude.Degrees), first ? LocalFormats.AlarmMinutes : null);
            first = false;
            i = j + 1;
        }
        return calendar.Finish();
    }

    /// <summary>e.g. lunar-eclipse-2028-12-31-tokyo-photo-plan.ics.</summary>
    public static string FileName(PhotoPlanResponse r, OutputFormat format, string kind) =>
        Downloads.FileName(format, "lunar-eclipse", r.Eclipse.Date, Downloads.SiteSlug(r.Site.Name, r.Site.LatitudeDegrees, r.Site.LongitudeDegrees), kind);
}
