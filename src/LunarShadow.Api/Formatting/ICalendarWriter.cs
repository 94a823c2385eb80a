using System.Globalization;
using System.Text;
using NodaTime;

namespace LunarShadow.Api.Formatting;

/// <summary>
/// Writes RFC 5545 iCalendar: CRLF line ends, lines folded at 75 octets, TEXT values escaped, DATE-TIMEs in UTC.
/// </summary>
internal sealed class ICalendarWriter
{
    private readonly StringBuilder _text = new();

    /// <summary>Starts a calendar with a name.</summary>
    public ICalendarWriter(string calendarName)
    {
        Line("BEGIN:VCALENDAR");
        Line("VERSION:2.0");
        Line("PRODID:-//LunarShadow//Lunar eclipse planning//EN");
        Line("CALSCALE:GREGORIAN");
        Line("METHOD:PUBLISH");
        Line("X-WR-CALNAME:" + Escape(calendarName));
    }

    /// <summary>True when an instant can be written (iCalendar DATE-TIME covers Gregorian years 1583 to 9999 here).</summary>
    public static bool CanWrite(Instant instant) => instant.InUtc().Year is >= 1583 and <= 9999;

    /// <summary>Adds an event, with an optional display alarm some minutes before it starts.</summary>
    public ICalendarWriter Event(string uid, Instant stamp, Instant start, Instant end, string summary, string description,
        string? location, (double Lat, double Lon)? geo, int? alarmMinutesBefore)
    {
        Line("BEGIN:VEVENT");
        Line("UID:" + Escape(uid));
        Line("DTSTAMP:" + DateTime(stamp));
        Line("DTSTART:" + DateTime(start));
        Line("DTEND:" + DateTime(end));
        Line("SUMMARY:" + Escape(summary));
        Line("DESCRIPTION:" + Escape(description));
        if (location is not null) Line("LOCATION:" + Escape(location));
        if (geo is { } g) Line(string.Create(CultureInfo.InvariantCulture, $"GEO:{g.Lat:0.######};{g.Lon:0.######}"));
        Line("TRANSP:TRANSPARENT");
        if (alarmMinutesBefore is { } minutes)
        {
            Line("BEGIN:VALARM");
            Line("ACTION:DISPLAY");
            Line("DESCRIPTION:" + Escape(summary));
            Line(string.Create(CultureInfo.InvariantCulture, $"TRIGGER:-PT{minutes}M"));
            Line("END:VALARM");
        }
        Line("END:VEVENT");
        return this;
    }

    /// <summary>Closes the calendar and returns its text.</summary>
    public string Finish()
    {
        Line("END:VCALENDAR");
        return _text.ToString();
    }

    private static string DateTime(Instant instant) =>
        instant.InUtc().ToString("yyyyMMdd'T'HHmmss'Z'", CultureInfo.InvariantCulture);

    // RFC 5545 §3.3.11: backslash, semicolon, comma and newline are escaped in TEXT.
    private static string Escape(string text) => text
        .Replace("\\", "\\\\", StringComparison.Ordinal).Replace(";", "\\;", StringComparison.Ordinal)
        .Replace(",", "\\,", StringComparison.Ordinal).Replace("\r\n", "\\n", StringComparison.Ordinal).Replace("\n", "\\n", StringComparison.Ordinal);

    // RFC 5545 §3.1: lines longer than 75 octets are folded with CRLF and a space, never inside a UTF-8 sequence.
    private void Line(string content)
    {
        var bytes = 0;
        var start = 0;
        for (var i = 0; i < content.Length; i++)
        {
            var size = Encoding.UTF8.GetByteCount(content.AsSpan(i, char.IsHighSurrogate(content[i]) && i + 1 < content.Length ? 2 : 1));
            if (bytes + size > (start == 0 ? 75 : 74))
            {
                _text.Append(content, start, i - start).Append("\r\n ");
                start = i;
                bytes = 0;
            }
            bytes += size;
            if (char.IsHighSurrogate(content[i])) i++;
        }
        _text.Append(content, start, content.Length - start).Append("\r\n");
    }
}
