using System.Globalization;
using System.Text;
using CsvHelper;
using Ical.Net.CalendarComponents;
using Ical.Net.DataTypes;
using Ical.Net.Serialization;
using NodaTime;
using CsvHelperWriter = CsvHelper.CsvWriter;

namespace LunarShadow.Api.Craters;

/// <summary>
/// CSV (CsvHelper) and iCalendar (Ical.Net) downloads of crater timings. Text cells are neutralised against formula
/// injection (a leading = + − @ tab or return gets an apostrophe, OWASP's advice) and stripped of control characters.
/// </summary>
internal static class CraterFormats
{
    /// <summary>Alarm lead before each crossing in the calendar, minutes.</summary>
    public const int AlarmMinutes = 10;

    public static string Csv(CraterTimingsResponse r)
    {
        using var text = new StringWriter(CultureInfo.InvariantCulture);
        var options = new CsvWriterOptions { NewLine = "\r\n", FormatProvider = CultureInfo.InvariantCulture };
        using (var csv = CsvHelperWriter.Create(text, options, leaveOpen: true))
        {
            string[] header =
            [
                "feature", "latitude_deg", "longitude_deg", "reached_by_umbra",
                "immersion_utc", "immersion_tt", "immersion_local", "immersion_visible", "immersion_position_angle_deg",
                "emersion_utc", "emersion_tt", "emersion_local", "emersion_visible", "emersion_position_angle_deg",
                "penumbral_immersion_utc", "penumbral_emersion_utc", "delta_t_uncertainty_s", "shadow_model",
            ];
            foreach (var h in header) csv.WriteField(h);
            csv.EndRecord();
            foreach (var f in r.Features)
            {
                csv.WriteField(Text(f.Name));
                csv.WriteField(Number(f.LatitudeDegrees));
                csv.WriteField(Number(f.LongitudeDegrees));
                csv.WriteField(f.ReachedByUmbra ? "true" : "false");
                foreach (var c in new[] { f.Immersion, f.Emersion })
                {
                    csv.WriteField(c?.Utc ?? "");
                    csv.WriteField(c?.Tt ?? "");
                    csv.WriteField(Text(c?.Local ?? ""));
                    csv.WriteField(c?.Visible is { } v ? (v ? "true" : "false") : "");
                    csv.WriteField(c is null ? "" : Number(c.PositionAngleDegrees));
                }
                csv.WriteField(f.PenumbralImmersion?.Utc ?? "");
                csv.WriteField(f.PenumbralEmersion?.Utc ?? "");
                csv.WriteField(Number(r.DeltaTUncertaintySeconds));
                csv.WriteField(Text(r.ShadowModel));
                csv.EndRecord();
            }
        }
        return text.ToString();
    }

    /// <summary>True when every crossing of the chosen features can be written (iCalendar here: Gregorian 1583 to 9999).</summary>
    public static bool CanWriteCalendar(IEnumerable<Instant> instants) => instants.All(i => i.InUtc().Year is >= 1583 and <= 9999);

    /// <summary>One event per immersion and emersion of the chosen features, each with an alarm shortly before.</summary>
    public static string Calendar(CraterTimingsResponse r, IReadOnlyList<(CraterTimingResponse Feature, Instant? Immersion, Instant? Emersion)> chosen)
    {
        var calendar = new Ical.Net.Calendar { ProductId = "-//LunarShadow//Crater timings//EN", Method = "PUBLISH" };
        calendar.AddProperty("X-WR-CALNAME", Text($"Crater timings, lunar eclipse {r.Date}"));
        var where = r.Site is null ? null : r.Site.Name ?? string.Create(CultureInfo.InvariantCulture, $"{r.Site.LatitudeDegrees:0.####}, {r.Site.LongitudeDegrees:0.####}");
        foreach (var (feature, immersion, emersion) in chosen)
        {
            if (immersion is { } i) calendar.Events.Add(Event(r, feature, feature.Immersion!, i, $"Umbra reaches {feature.Name}", "immersion", where));
            if (emersion is { } e) calendar.Events.Add(Event(r, feature, feature.Emersion!, e, $"{feature.Name} leaves the umbra", "emersion", where));
        }
        return new CalendarSerializer().SerializeToString(calendar) ?? "";
    }

    private static CalendarEvent Event(CraterTimingsResponse r, CraterTimingResponse feature, CrossingResponse crossing, Instant at, string summary, string which, string? where)
    {
        var utc = at.ToDateTimeUtc();
        var visibility = crossing.Visible switch
        {
            true => $" The Moon stands {crossing.MoonAltitudeDegrees:0.#}° high at the site ({crossing.Sky}).",
            false => " The Moon is below the horizon or hidden at the site then.",
            null => "",
        };
        var description = string.Create(CultureInfo.InvariantCulture,
            $"{summary} at {crossing.Utc} (TT {crossing.Tt}; ±{crossing.UncertaintySeconds:0.#} s from ΔT), position angle {crossing.PositionAngleDegrees:0.#}° on the disc, {r.ShadowModel} shadow.{visibility}");
        var e = new CalendarEvent
        {
            Uid = Text(string.Create(CultureInfo.InvariantCulture, $"{r.Date}-{feature.Name}-{which}-{r.ShadowModel}@lunarshadow")).Replace(' ', '-'),
            DtStamp = new CalDateTime(utc, "UTC", true),
            DtStart = new CalDateTime(utc, "UTC", true),
            DtEnd = new CalDateTime(utc.AddMinutes(1), "UTC", true),
            Summary = Text(summary),
            Description = Text(description),
            Transparency = "TRANSPARENT",
        };
        if (where is not null) e.Location = Text(where);
        e.Alarms.Add(new Alarm { Action = "DISPLAY", Description = Text(summary), Trigger = new Trigger($"-PT{AlarmMinutes}M") });
        return e;
    }

    private static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    // OWASP "CSV injection": text that a spreadsheet would read as a formula gets a leading apostrophe; control
    // characters (which also break calendar lines) are removed.
    internal static string Text(string value)
    {
        var clean = new StringBuilder(value.Length);
        foreach (var ch in value)
        {
            if (!char.IsControl(ch)) clean.Append(ch);
        }
        var s = clean.ToString();
        return s.Length > 0 && "=+-@\t\r".Contains(s[0]) ? "'" + s : s;
    }
}
