using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Sites;
using NodaTime;

namespace LunarShadow.Api.Common;

/// <summary>
/// CSV and iCalendar representations of local circumstances. Entry points: <see cref="Csv"/> (one site),
/// <see cref="BatchCsv"/> (many sites), <see cref="ICalendar"/> (one site's calendar file).
/// </summary>
internal static class LocalFormats
{
    /// <summary>Alarm lead before the first visible phase and before the public session, minutes.</summary>
    public const int AlarmMinutes = 30;

    /// <summary>The columns of the one-site CSV.</summary>
    public static readonly string[] CsvColumns =
    [
        "kind", "name", "local_date", "utc", "local", "local_zone", "end_utc", "end_local", "end_local_zone", "minutes",
        "moon_altitude_deg", "end_moon_altitude_deg", "moon_azimuth_deg", "visible", "sun_altitude_deg", "sky",
        "zenith_position_angle_deg", "umbral_magnitude", "note",
    ];

    /// <summary>
    /// One site as CSV, one row per item, its kind in the first column: contact, moon-event, visible-phase,
    /// deepest-visible, opening-hours, public-phase, session, summary. Every instant has a UTC and a local column;
    /// local_date is the evening date of the night.
    /// </summary>
    public static string Csv(LocalResponse r)
    {
        var zone = Zone(r.Site.TimeZone);
        var csv = new CsvWriter().Row(CsvColumns);
        var night = r.Night.Evening;
        void Row(string kind, string name, string? utc, string? local, string? endUtc = null, string? endLocal = null, double? minutes = null,
            double? altitude = null, double? endAltitude = null, double? azimuth = null, bool? visible = null, double? sun = null, string? sky = null,
            double? zenithAngle = null, double? magnitude = null, string? note = null) =>
            csv.Row(kind, name, night, utc, local, Abbreviation(utc, zone), endUtc, endLocal, Abbreviation(endUtc, zone), minutes,
                altitude, endAltitude, azimuth, visible, sun, sky, zenithAngle, magnitude, note);

        foreach (var c in r.Contacts)
            Row("contact", c.Name, c.Utc, c.Local, altitude: c.AltitudeDegrees, azimuth: c.AzimuthDegrees, visible: c.Visible,
                sun: c.SunAltitudeDegrees, sky: c.Sky, zenithAngle: c.ZenithPositionAngleDegrees, note: c.LocalNote);
        foreach (var e in r.MoonEvents)
            Row("moon-event", e.Type, e.Utc, e.Local, azimuth: e.AzimuthDegrees);
        foreach (var p in r.VisiblePhases)
            Row("visible-phase", p.Phase, p.StartUtc, p.StartLocal, p.EndUtc, p.EndLocal, p.Minutes);
        if (r.GreatestVisibleUmbralMagnitude is { } m)
            Row("deepest-visible", "greatest-visible", m.Utc, m.Local, altitude: m.AltitudeDegrees, magnitude: m.Value);
        if (r.PublicNight is { } plan)
        {
            Row("opening-hours", "opening-hours", plan.OpensUtc, plan.Opens, plan.ClosesUtc, plan.Closes, note: plan.Note);
            foreach (var p in plan.Phases)
                Row("public-phase", p.Phase, p.StartUtc, p.StartLocal, p.EndUtc, p.EndLocal, p.Minutes);
            if (plan.Session is { } s)
                Row("session", "suggested-session", s.DoorsOpenUtc, s.DoorsOpen, s.DoorsCloseUtc, s.DoorsClose,
                    altitude: s.MoonAltitudeAtOpenDegrees, endAltitude: s.MoonAltitudeAtCloseDegrees);
        }
        Row("summary", "summary", null, null, note: r.Summary);
        return csv.ToString();
    }

    /// <summary>The columns of the many-sites CSV.</summary>
    public static readonly string[] BatchCsvColumns =
    [
        "name", "lat_deg", "lon_deg", "tz", "tz_abbreviations", "eclipse_date", "local_date", "morning_date", "visible",
        "first_visible_utc", "first_visible_local", "last_visible_utc", "last_visible_local",
        "visible_penumbral_min", "visible_partial_min", "visible_total_min",
        "greatest_visible_umbral_magnitude", "greatest_visible_utc", "greatest_visible_local", "greatest_visible_altitude_deg", "moon_horizon",
        "session_start_utc", "session_start_local", "session_end_utc", "session_end_local", "summary", "public_night_note",
        // Deprecated: the former names of the greatest_visible_* columns, last, written for one more release.
        "max_visible_umbral_magnitude", "max_visible_utc", "max_visible_local", "max_visible_altitude_deg",
    ];

    /// <summary>Many sites as CSV, one row per site in request order, every instant in UTC and local time.</summary>
    public static string BatchCsv(IEnumerable<LocalResponse> rows)
    {
        var csv = new CsvWriter().Row(BatchCsvColumns);
        foreach (var r in rows)
        {
            var whole = r.VisiblePhases.Where(p => p.Phase == "penumbral").ToList();
            double Minutes(string phase) => r.VisiblePhases.Where(p => p.Phase == phase).Sum(p => p.Minutes);
            var session = r.PublicNight?.Session;
            csv.Row(r.Site.Name, r.Site.LatitudeDegrees, r.Site.LongitudeDegrees, r.Site.TimeZone, string.Join("/", r.Site.TimeZoneAbbreviations),
                r.Eclipse.Date, r.Night.Evening, r.Night.Morning, whole.Count > 0,
                whole.FirstOrDefault()?.StartUtc, whole.FirstOrDefault()?.StartLocal, whole.LastOrDefault()?.EndUtc, whole.LastOrDefault()?.EndLocal,
                Minutes("penumbral"), Minutes("partial"), Minutes("total"),
                r.GreatestVisibleUmbralMagnitude?.Value, r.GreatestVisibleUmbralMagnitude?.Utc, r.GreatestVisibleUmbralMagnitude?.Local, r.GreatestVisibleUmbralMagnitude?.AltitudeDegrees,
                r.MoonHorizon, session?.DoorsOpenUtc, session?.DoorsOpen, session?.DoorsCloseUtc, session?.DoorsClose, r.Summary, r.PublicNight?.Note,
                r.GreatestVisibleUmbralMagnitude?.Value, r.GreatestVisibleUmbralMagnitude?.Utc, r.GreatestVisibleUmbralMagnitude?.Local, r.GreatestVisibleUmbralMagnitude?.AltitudeDegrees);
        }
        return csv.ToString();
    }

    /// <summary>
    /// One site's calendar: an event per visible stretch of each phase (window and description agree, and clipping is
    /// said), and with opening hours an event for the suggested public session. Null when an instant falls outside the
    /// years iCalendar can carry here.
    /// </summary>
    public static string? ICalendar(LocalCircumstances local, PublicNightPlan? plan, string eclipseDate, Instant generated)
    {
        var site = local.Site;
        var session = plan?.Session;
        var instants = local.VisiblePhases.SelectMany(p => new[] { p.StartUtc, p.EndUtc })
            .Concat(session is null ? [] : [session.DoorsOpen, session.DoorsClose]);
        if (instants.Any(i => !ICalendarWriter.CanWrite(i))) return null;
        var where = SiteWording.Where(site);
        var geo = (site.Location.Latitude.Degrees, site.Location.Longitude.Degrees);
        var calendar = new ICalendarWriter(SiteWording.LocalCalendarName(eclipseDate, site), generated);
        if (session is not null)
        {
            calendar.Event(Uid(eclipseDate, "public-session", site), session.DoorsOpen, session.DoorsClose, SiteWording.SessionEventTitle(site),
                SiteWording.SessionEventDescription(local, plan!), where, geo, AlarmMinutes);
        }
        var first = local.VisiblePhases.OrderBy(p => p.StartUtc).FirstOrDefault();
        foreach (var group in local.VisiblePhases.GroupBy(p => p.Phase))
        {
            var index = 0;
            foreach (var p in group.OrderBy(p => p.StartUtc))
            {
                var kind = SiteWording.PhaseName(p.Phase) + (index++ > 0 ? "-" + index : "");
                calendar.Event(Uid(eclipseDate, kind, site), p.StartUtc, p.EndUtc, SiteWording.PhaseEventTitle(local.Eclipse.Kind, p.Phase),
                    SiteWording.PhaseEventDescription(local, p), where, geo, ReferenceEquals(p, first) ? AlarmMinutes : null);
            }
        }
        return calendar.Finish();
    }

    /// <summary>The calendar as a download, or a 400 when it cannot be written.</summary>
    public static IResult Calendar(LocalCircumstances local, PublicNightPlan? plan, LocalResponse response, Instant generated, QueryReader reader)
    {
        var text = ICalendar(local, plan, response.Eclipse.Date, generated);
        if (text is null)
        {
            reader.Fail("format", "iCalendar covers Gregorian dates from 1583 to 9999 only; ask for json or csv.");
            return Problems.InvalidQuery(reader);
        }
        return Results.Text(text, ContentNegotiation.MediaType(OutputFormat.Calendar)).AsAttachment(FileName(response, OutputFormat.Calendar, "local"));
    }

    /// <summary>e.g. lunar-eclipse-2028-12-31-tokyo-local.ics.</summary>
    public static string FileName(LocalResponse r, OutputFormat format, string kind) =>
        Downloads.FileName(format, "lunar-eclipse", r.Eclipse.Date, Downloads.SiteSlug(r.Site.Name, r.Site.LatitudeDegrees, r.Site.LongitudeDegrees), kind);

    /// <summary>
    /// A UID that stays the same for the same eclipse, site (by its coordinates) and kind of event, so that a re-import
    /// or a subscribed feed updates events instead of duplicating them.
    /// </summary>
    public static string Uid(string eclipseDate, string kind, Site site) =>
        FormattableString.Invariant($"{eclipseDate}-{kind}-{site.Location.Latitude.Degrees:0.####}-{site.Location.Longitude.Degrees:0.####}@lunarshadow");

    private static DateTimeZone Zone(string id) => DateTimeZoneProviders.Tzdb.GetZoneOrNull(id) ?? DateTimeZone.Utc;

    private static string? Abbreviation(string? utc, DateTimeZone zone) =>
        utc is not null && TimeFormats.TryParseInstant(utc, out var instant) ? LocalDates.Abbreviation(instant, zone) : null;
}
