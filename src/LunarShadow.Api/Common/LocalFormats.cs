using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Sites;

namespace LunarShadow.Api.Common;

/// <summary>CSV and iCalendar representations of local circumstances.</summary>
internal static class LocalFormats
{
    /// <summary>Alarm lead before the first visible phase, minutes.</summary>
    public const int AlarmMinutes = 30;

    public static string ContactsCsv(LocalResponse r)
    {
        var csv = new CsvWriter().Row("contact", "utc", "local", "moon_altitude_deg", "moon_azimuth_deg", "visible", "sun_altitude_deg", "sky", "zenith_position_angle_deg");
        foreach (var c in r.Contacts)
            csv.Row(c.Name, c.Utc, c.Local, c.AltitudeDegrees, c.AzimuthDegrees, c.Visible ? "true" : "false", c.SunAltitudeDegrees, c.Sky, c.ZenithPositionAngleDegrees);
        return csv.ToString();
    }

    public static string SitesCsv(IEnumerable<LocalResponse> rows)
    {
        var csv = new CsvWriter().Row("name", "lat_deg", "lon_deg", "tz", "eclipse_date", "visible", "first_visible_utc", "last_visible_utc",
            "visible_penumbral_min", "visible_partial_min", "visible_total_min", "max_visible_umbral_magnitude", "max_visible_utc", "max_visible_altitude_deg", "moon_horizon", "summary");
        foreach (var r in rows)
        {
            var whole = r.VisiblePhases.Where(p => p.Phase == "penumbral").ToList();
            double Minutes(string phase) => r.VisiblePhases.Where(p => p.Phase == phase).Sum(p => p.Minutes);
            csv.Row(r.Site.Name, r.Site.LatitudeDegrees, r.Site.LongitudeDegrees, r.Site.TimeZone, r.Eclipse.Date, whole.Count > 0 ? "true" : "false",
                whole.FirstOrDefault()?.StartUtc, whole.LastOrDefault()?.EndUtc, Minutes("penumbral"), Minutes("partial"), Minutes("total"),
                r.GreatestVisibleUmbralMagnitude?.Value, r.GreatestVisibleUmbralMagnitude?.Utc, r.GreatestVisibleUmbralMagnitude?.AltitudeDegrees, r.MoonHorizon, r.Summary);
        }
        return csv.ToString();
    }

    /// <summary>One VEVENT per visible phase, at the site, with an alarm before the first.</summary>
    public static IResult Calendar(LocalCircumstances local, LocalResponse response, QueryReader reader)
    {
        var first = local.VisiblePhases.OrderBy(p => p.StartUtc).FirstOrDefault();
        if (local.VisiblePhases.Any(p => !ICalendarWriter.CanWrite(p.StartUtc) || !ICalendarWriter.CanWrite(p.EndUtc)))
        {
            reader.Fail("format", "iCalendar covers Gregorian dates from 1583 to 9999 only; ask for json or csv.");
            return Problems.InvalidQuery(reader);
        }
        var site = local.Site;
        var where = site.Name ?? FormattableString.Invariant($"{site.Location.Latitude.Degrees:0.####}, {site.Location.Longitude.Degrees:0.####}");
        var calendar = new ICalendarWriter($"Lunar eclipse {response.Eclipse.Date} at {where}");
        foreach (var p in local.VisiblePhases.OrderBy(p => p.StartUtc))
        {
            var phase = WireNames.Of(p.Phase);
            var uid = FormattableString.Invariant($"{response.Eclipse.Date}-{phase}-{p.StartUtc.ToUnixTimeSeconds()}-{site.Location.Latitude.Degrees:0.####}-{site.Location.Longitude.Degrees:0.####}@lunarshadow");
            calendar.Event(uid, local.Contacts.Single(c => c.Name is null).Utc, p.StartUtc, p.EndUtc,
                $"Lunar eclipse ({response.Eclipse.Kind}): {phase} phase visible",
                response.Summary + " " + string.Join(" ", response.Cautions), where,
                (site.Location.Latitude.Degrees, site.Location.Longitude.Degrees), ReferenceEquals(p, first) ? AlarmMinutes : null);
        }
        return Results.Text(calendar.Finish(), ContentNegotiation.MediaType(OutputFormat.Calendar));
    }
}
