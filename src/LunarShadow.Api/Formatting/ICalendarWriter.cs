using System.Text;
using Ical.Net;
using Ical.Net.CalendarComponents;
using Ical.Net.DataTypes;
using Ical.Net.Serialization;
using NodaTime;
using Duration = NodaTime.Duration;

namespace LunarShadow.Api.Formatting;

/// <summary>
/// RFC 5545 iCalendar written with Ical.Net: every DATE-TIME in UTC, DTSTAMP the time of generation, and every piece of
/// user text cleaned of control characters before Ical.Net escapes it (<see cref="Clean"/>).
/// </summary>
internal sealed class ICalendarWriter
{
    private readonly Calendar _calendar = new();
    private readonly CalDateTime _stamp;

    /// <summary>Starts a calendar with a name, stamped with the time of generation.</summary>
    /// <param name="calendarName">Shown by calendar programs (NAME, RFC 7986, and X-WR-CALNAME).</param>
    /// <param name="generated">The time of generation: every event's DTSTAMP.</param>
    /// <param name="refresh">For a subscription feed: how often clients should fetch it again (REFRESH-INTERVAL, RFC 7986, and X-PUBLISHED-TTL).</param>
    public ICalendarWriter(string calendarName, Instant generated, Duration? refresh = null)
    {
        _calendar.ProductId = "-//LunarShadow//Lunar eclipse planning//EN";
        _calendar.Scale = "GREGORIAN";
        _calendar.Method = "PUBLISH";
        _calendar.AddProperty("NAME", Clean(calendarName));
        _calendar.AddProperty("X-WR-CALNAME", Clean(calendarName));
        if (refresh is { } r)
        {
            var text = "PT" + (long)r.TotalSeconds + "S";
            if (r.TotalSeconds % 3600 == 0) text = "PT" + (long)r.TotalHours + "H";
            var interval = new CalendarProperty("REFRESH-INTERVAL", text);
            interval.Parameters.Add("VALUE", "DURATION");
            _calendar.Properties.Add(interval);
            _calendar.AddProperty("X-PUBLISHED-TTL", text);
        }
        _stamp = Utc(generated);
    }

    /// <summary>True when an instant can be written (iCalendar DATE-TIME covers Gregorian years 1583 to 9999 here).</summary>
    public static bool CanWrite(Instant instant) => instant.InUtc().Year is >= 1583 and <= 9999;

    /// <summary>Adds an event, with an optional display alarm some minutes before it starts.</summary>
    public ICalendarWriter Event(string uid, Instant start, Instant end, string summary, string description,
        string? location, (double Lat, double Lon)? geo, int? alarmMinutesBefore)
    {
        var e = new CalendarEvent
        {
            Uid = Clean(uid),
            DtStamp = _stamp,
            DtStart = Utc(start),
            DtEnd = Utc(end > start ? end : start + Duration.FromSeconds(1)),
            Summary = Clean(summary),
            Description = Clean(description),
            Transparency = "TRANSPARENT",
        };
        if (location is not null) e.Location = Clean(location);
        if (geo is { } g) e.GeographicLocation = new GeographicLocation(g.Lat, g.Lon);
        if (alarmMinutesBefore is { } minutes)
        {
            e.Alarms.Add(new Alarm
            {
                Action = "DISPLAY",
                Description = Clean(summary),
                Trigger = new Trigger(Ical.Net.DataTypes.Duration.FromMinutes(-minutes)),
            });
        }
        _calendar.Events.Add(e);
        return this;
    }

    /// <summary>The calendar's text.</summary>
    public string Finish() => new CalendarSerializer().SerializeToString(_calendar) ?? "";

    // RFC 5545 §3.3.11: TEXT may hold line breaks only as the escaped \n, and §3.1 forbids control characters other
    // than HTAB in content lines. Line breaks of every kind (CRLF, a bare CR, LF, NEL, U+2028/2029) become one LF, which
    // Ical.Net writes as \n; every other control character is dropped, so user text can never start a new property.
    /// <summary>Text made safe for an iCalendar TEXT value.</summary>
    public static string Clean(string text)
    {
        var builder = new StringBuilder(text.Length);
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (c == '\r')
            {
                builder.Append('\n');
                if (i + 1 < text.Length && text[i + 1] == '\n') i++;
            }
            else if (c is '\n' or '\u0085' or '\u2028' or '\u2029') builder.Append('\n');
            else if (c == '\t') builder.Append(' ');
            else if (!char.IsControl(c)) builder.Append(c);
        }
        return builder.ToString();
    }

    private static CalDateTime Utc(Instant instant) => new(instant.ToDateTimeUtc());
}
