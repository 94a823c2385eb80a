using System.Globalization;
using NodaTime;

namespace LunarShadow.Api.Validation;

/// <summary>
/// Reads query values and collects every problem with them, each naming the field, the value given and what is allowed,
/// so one 400 response can list them all.
/// </summary>
internal sealed class QueryReader
{
    private readonly Dictionary<string, string[]> _errors = new(StringComparer.Ordinal);

    /// <summary>True when no problem was found.</summary>
    public bool IsValid => _errors.Count == 0;

    /// <summary>The problems found, by field.</summary>
    public IDictionary<string, string[]> Errors => _errors;

    /// <summary>Records a problem with a field.</summary>
    public void Fail(string field, string message) =>
        _errors[field] = _errors.TryGetValue(field, out var existing) ? [.. existing, message] : [message];

    /// <summary>A finite number within [min, max]; null when absent (or required and absent: a problem).</summary>
    public double? Number(string field, string? raw, double min, double max, string unit, bool required = false)
    {
        if (string.IsNullOrWhiteSpace(raw))
        {
            if (required) Fail(field, Invariant($"{field} is required: a number of {unit} from {min} to {max}."));
            return null;
        }
        if (!double.TryParse(raw, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) || !double.IsFinite(value))
        {
            Fail(field, Invariant($"{field} must be a number of {unit} from {min} to {max}; got '{Clip(raw)}'."));
            return null;
        }
        if (value < min || value > max)
        {
            Fail(field, Invariant($"{field} must be from {min} to {max} {unit}; got {value}."));
            return null;
        }
        return value;
    }

    /// <summary>An ISO 8601 instant with a zone designator (Z or an offset) within the supported years.</summary>
    public Instant? Instant(string field, string? raw, bool required = true)
    {
        if (string.IsNullOrWhiteSpace(raw))
        {
            if (required) Fail(field, $"{field} is required: an ISO 8601 instant such as 2025-03-14T06:58:00Z, years {SupportedYears}.");
            return null;
        }
        if (!Formatting.TimeFormats.TryParseInstant(raw, out var instant))
        {
            Fail(field, $"{field} must be an ISO 8601 instant with Z or an offset, such as 2025-03-14T06:58:00Z, years {SupportedYears} (Julian calendar before 1582-10-15); got '{Clip(raw)}'.");
            return null;
        }
        if (!Astronomy.Time.SupportedRange.Contains(Astronomy.Time.JulianDate.OfUtc(instant)))
        {
            Fail(field, $"{field} must lie in the years {SupportedYears}; got {Clip(raw)}.");
            return null;
        }
        return instant;
    }

    /// <summary>A calendar date YYYY-MM-DD (astronomers' calendar) within the supported years.</summary>
    public Astronomy.Time.CalendarDate? Date(string field, string? raw, bool required = true)
    {
        if (string.IsNullOrWhiteSpace(raw))
        {
            if (required) Fail(field, $"{field} is required: a date YYYY-MM-DD, years {SupportedYears}.");
            return null;
        }
        if (!Formatting.TimeFormats.TryParseDate(raw, out var date))
        {
            Fail(field, $"{field} must be a date YYYY-MM-DD that exists (Julian calendar before 1582-10-15, astronomical year numbering, e.g. -0584-05-28), years {SupportedYears}; got '{Clip(raw)}'.");
            return null;
        }
        if (date.Year < Astronomy.Time.SupportedRange.FirstYear || date.Year > Astronomy.Time.SupportedRange.LastYear)
        {
            Fail(field, $"{field} must lie in the years {SupportedYears}; got {Clip(raw)}.");
            return null;
        }
        return date;
    }

    /// <summary>One of a fixed set of names (case-insensitive); null when absent.</summary>
    public string? OneOf(string field, string? raw, IReadOnlyCollection<string> allowed)
    {
        if (string.IsNullOrWhiteSpace(raw)) return null;
        var match = allowed.FirstOrDefault(a => string.Equals(a, raw.Trim(), StringComparison.OrdinalIgnoreCase));
        if (match is null) Fail(field, $"{field} must be one of {string.Join(", ", allowed)}; got '{Clip(raw)}'.");
        return match;
    }

    private static string SupportedYears => Invariant($"{Astronomy.Time.SupportedRange.FirstYear} to +{Astronomy.Time.SupportedRange.LastYear}");

    private static string Clip(string raw) => raw.Length <= 64 ? raw : raw[..64] + "…";

    private static string Invariant(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
