using System.Text.RegularExpressions;
using LunarShadow.Astronomy.Sites;
using NodaTime;

namespace LunarShadow.Api.Validation;

/// <summary>The <c>open</c> field: a daily opening window HH:MM-HH:MM in the site's local time.</summary>
internal static partial class OpeningQuery
{
    public const string Description = "Opening hours in the site's local time, HH:MM-HH:MM (e.g. 19:00-23:30; may span midnight, e.g. 21:00-02:00).";

    public static OpeningHours? Read(QueryReader reader, string? raw, string field = "open")
    {
        if (string.IsNullOrWhiteSpace(raw)) return null;
        var m = Syntax().Match(raw.Trim());
        if (!m.Success || !TryTime(m.Groups["oh"].Value, m.Groups["om"].Value, out var opens) || !TryTime(m.Groups["ch"].Value, m.Groups["cm"].Value, out var closes))
        {
            reader.Fail(field, $"{field} must be HH:MM-HH:MM in 24-hour local time, e.g. 19:00-23:30; got '{(raw.Length > 64 ? raw[..64] : raw)}'.");
            return null;
        }
        if (opens == closes)
        {
            reader.Fail(field, $"{field} must open and close at different times; got {raw.Trim()}.");
            return null;
        }
        return new OpeningHours(opens, closes);
    }

    private static bool TryTime(string h, string m, out LocalTime time)
    {
        time = default;
        var hour = int.Parse(h, System.Globalization.CultureInfo.InvariantCulture);
        var minute = int.Parse(m, System.Globalization.CultureInfo.InvariantCulture);
        if (hour > 23 || minute > 59) return false;
        time = new LocalTime(hour, minute);
        return true;
    }

    // ASCII digits only: \d would also match other scripts' digits, which the number parser then refuses.
    [GeneratedRegex(@"^(?<oh>[0-9]{2}):(?<om>[0-9]{2})-(?<ch>[0-9]{2}):(?<cm>[0-9]{2})$", RegexOptions.CultureInvariant)]
    private static partial Regex Syntax();
}
