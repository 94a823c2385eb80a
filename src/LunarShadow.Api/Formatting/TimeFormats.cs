using System.Globalization;
using System.Text.RegularExpressions;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Api.Formatting;

/// <summary>
/// How instants are written and read: ISO 8601 extended format, with UTC ending in Z and TT without a zone. Dates are
/// in the astronomers' calendar — Julian before 1582 October 15, Gregorian from then on, astronomical year numbering
/// (year 0 = 1 BC) — so that an eclipse's date, its UTC and its TT always agree with the eclipse canons.
/// </summary>
internal static partial class TimeFormats
{
    /// <summary>A UTC instant, e.g. 2025-03-14T06:58:00.000Z or -1999-06-26T13:00:00.000Z.</summary>
    public static string Utc(Instant instant) => Write(JulianDate.OfUtc(ToMillisecond(instant)).Day, "Z");

    /// <summary>
    /// The instant rounded to the millisecond (half away from zero) in whole ticks: UTC and local times are both written
    /// from it, so they always agree to the millisecond.
    /// </summary>
    public static Instant ToMillisecond(Instant instant)
    {
        var ms = Math.DivRem(instant.ToUnixTimeTicks(), 10_000, out var rest);
        return Instant.FromUnixTimeMilliseconds(rest >= 5_000 ? ms + 1 : rest <= -5_000 ? ms - 1 : ms);
    }

    /// <summary>A TT instant without a zone, e.g. 2025-03-14T06:59:09.184.</summary>
    public static string Tt(TtInstant tt) => Write(tt.JulianDate.Day, "");

    /// <summary>
    /// A local time with its UTC offset, e.g. 2025-03-13T23:57:28.572-04:00, and a note when the local clock reading is
    /// ambiguous because the clocks go back around it.
    /// </summary>
    public static (string Text, string? Note) Local(Instant instant, DateTimeZone zone)
    {
        instant = ToMillisecond(instant);
        var offset = zone.GetUtcOffset(instant);
        // ISO 8601 offsets carry whole minutes: a local mean time offset such as +00:13:35 (zones before standard time)
        // is written rounded to the minute, and the wall time is computed with the offset written, so the text always
        // names the same instant as the UTC.
        var seconds = (int)Math.Round(offset.Seconds / 60.0, MidpointRounding.AwayFromZero) * 60;
        var sign = seconds < 0 ? '-' : '+';
        var abs = Math.Abs(seconds);
        // Round the instant to the millisecond before shifting it, so that the local text is exactly the UTC text plus the offset.
        var text = Write(JulianDate.OfUtc(ToMillisecond(instant) + Duration.FromSeconds(seconds)).Day, string.Create(CultureInfo.InvariantCulture, $"{sign}{abs / 3600:00}:{abs / 60 % 60:00}"));
        return (text, SiteWording.RepeatedTimeNote(instant, zone));
    }


    /// <summary>The calendar date (astronomers' calendar) of a UTC instant, YYYY-MM-DD.</summary>
    public static string UtcDate(Instant instant)
    {
        var jd = JulianDate.OfUtc(ToMillisecond(instant)).Day;
        return Write(jd, "")[..DateLength(jd)];
    }

    /// <summary>A number rounded for display.</summary>
    public static double Round(double value, int digits) => Math.Round(value, digits, MidpointRounding.AwayFromZero);

    /// <summary>
    /// Reads an ISO 8601 instant with Z or an offset (astronomers' calendar, optional minus sign on the year); false for
    /// anything else, including dates that do not exist (1582-10-05 to 1582-10-14, February 30).
    /// </summary>
    public static bool TryParseInstant(string text, out Instant instant)
    {
        instant = default;
        var m = InstantSyntax().Match(text.Trim());
        if (!m.Success) return false;
        if (!TryDate(m.Groups["date"].Value, out var date)) return false;
        // Range-check before converting: years far outside the span (e.g. 10000) cannot become an Instant at all.
        if (date.Year < SupportedRange.FirstYear - 1 || date.Year > SupportedRange.LastYear + 1) return false;
        var hour = int.Parse(m.Groups["h"].Value, CultureInfo.InvariantCulture);
        var minute = int.Parse(m.Groups["min"].Value, CultureInfo.InvariantCulture);
        var second = m.Groups["s"].Success ? double.Parse(m.Groups["s"].Value, CultureInfo.InvariantCulture) : 0;
        if (hour > 23 || minute > 59 || second >= 60) return false;
        var offsetMinutes = 0;
        if (m.Groups["zone"].Value != "Z")
        {
            var sign = m.Groups["zone"].Value[0] == '-' ? -1 : 1;
            var oh = int.Parse(m.Groups["oh"].Value, CultureInfo.InvariantCulture);
            var om = int.Parse(m.Groups["om"].Value, CultureInfo.InvariantCulture);
            if (oh > 18 || om > 59) return false;
            offsetMinutes = sign * (oh * 60 + om);
        }
        var jd = JulianDate.FromCalendar(date.Year, date.Month, date.Day, date.IsGregorian).Day
            + (hour * 3600 + minute * 60 + second - offsetMinutes * 60) / 86400.0;
        instant = ToMillisecond(new JulianDate(jd).ToUtcInstant());
        return true;
    }

    /// <summary>Reads YYYY-MM-DD (astronomers' calendar, optional minus sign); false for dates that do not exist.</summary>
    public static bool TryParseDate(string text, out CalendarDate date) => TryDate(text.Trim(), out date) & DateSyntax().IsMatch(text.Trim());


    private static bool TryDate(string text, out CalendarDate date)
    {
        date = default;
        var m = DateSyntax().Match(text.Length >= 10 && text.Contains('T', StringComparison.Ordinal) ? text[..text.IndexOf('T', StringComparison.Ordinal)] : text);
        if (!m.Success) return false;
        if (!int.TryParse(m.Groups["y"].Value, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var year)) return false;
        var month = int.Parse(m.Groups["m"].Value, CultureInfo.InvariantCulture);
        var day = int.Parse(m.Groups["d"].Value, CultureInfo.InvariantCulture);
        if (month is < 1 or > 12 || day < 1) return false;
        var gregorian = year > 1582 || (year == 1582 && (month > 10 || (month == 10 && day >= 15)));
        if (year == 1582 && month == 10 && day is > 4 and < 15) return false;
        var leap = gregorian ? (year % 4 == 0 && year % 100 != 0) || year % 400 == 0 : ((year % 4) + 4) % 4 == 0;
        int[] lengths = [31, leap ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
        if (day > lengths[month - 1]) return false;
        date = new CalendarDate(year, month, day, gregorian);
        return true;
    }

    private static string Write(double jd, string suffix)
    {
        // Round to the millisecond first, so that 0h never prints as 23:59:59.999 of the day before.
        var milliseconds = Math.Round((jd + 0.5) * 86_400_000.0, MidpointRounding.AwayFromZero);
        var dayStart = Math.Floor(milliseconds / 86_400_000.0);
        var ofDay = (long)(milliseconds - dayStart * 86_400_000.0);
        var date = new JulianDate(dayStart).ToCalendar(); // noon of that civil day: safe from rounding at midnight
        return string.Create(CultureInfo.InvariantCulture,
            $"{date.ToIsoDateString()}T{ofDay / 3_600_000:00}:{ofDay / 60_000 % 60:00}:{ofDay / 1000 % 60:00}.{ofDay % 1000:000}{suffix}");
    }

    private static int DateLength(double jd) => Write(jd, "").IndexOf('T', StringComparison.Ordinal);

    // ASCII digits only: \d would also match other scripts' digits, which the number parser then refuses.
    [GeneratedRegex(@"^(?<y>-?[0-9]{4,5})-(?<m>[0-9]{2})-(?<d>[0-9]{2})$", RegexOptions.CultureInvariant)]
    private static partial Regex DateSyntax();

    [GeneratedRegex(@"^(?<date>-?[0-9]{4,5}-[0-9]{2}-[0-9]{2})T(?<h>[0-9]{2}):(?<min>[0-9]{2})(:(?<s>[0-9]{2}(\.[0-9]{1,9})?))?(?<zone>Z|[+-](?<oh>[0-9]{2}):(?<om>[0-9]{2}))$", RegexOptions.CultureInvariant)]
    private static partial Regex InstantSyntax();
}
