using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Validation;

/// <summary>
/// The named fields of one request (its query string, a JSON body, or one object of a JSON array), read through the
/// parameter table: every problem goes to the <see cref="QueryReader"/> under the field's name (with a prefix such as
/// "sites[2]." inside an array), naming the value given and what is allowed.
/// </summary>
internal sealed class RequestFields(QueryReader reader, Func<string, string?> source, string prefix = "")
{
    /// <summary>Where the problems go.</summary>
    public QueryReader Reader => reader;

    /// <summary>The fields of the route and the query string.</summary>
    public static RequestFields FromQuery(HttpRequest request, QueryReader reader) =>
        new(reader, name => request.RouteValues.TryGetValue(name, out var route) ? route?.ToString()
            : request.Query.TryGetValue(name, out var values) ? values.ToString() : null);

    /// <summary>The route's fields, then a JSON body's, then the query string's (where <c>format</c> travels).</summary>
    public static RequestFields FromBody(HttpRequest request, IReadOnlyDictionary<string, string?> body, QueryReader reader) =>
        new(reader, name => request.RouteValues.TryGetValue(name, out var route) ? route?.ToString()
            : body.TryGetValue(name, out var value) ? value
            : request.Query.TryGetValue(name, out var values) ? values.ToString() : null);

    /// <summary>The fields of a JSON object already read as text.</summary>
    public static RequestFields FromFields(IReadOnlyDictionary<string, string?> fields, QueryReader reader, string prefix = "") =>
        new(reader, name => fields.GetValueOrDefault(name), prefix);

    /// <summary>The name a problem with the parameter is reported under: the (former) name the request used.</summary>
    public string FieldName(Parameter p) =>
        prefix + (string.IsNullOrWhiteSpace(source(p.Name)) ? p.FormerNames.FirstOrDefault(n => !string.IsNullOrWhiteSpace(source(n))) ?? p.Name : p.Name);

    /// <summary>The raw text under the parameter's name or a former name; null when absent.</summary>
    public string? Raw(Parameter p)
    {
        var value = source(p.Name);
        if (!string.IsNullOrWhiteSpace(value)) return value;
        foreach (var former in p.FormerNames)
        {
            var old = source(former);
            if (!string.IsNullOrWhiteSpace(old)) return old;
        }
        return value;
    }

    /// <summary>Whether the parameter was given.</summary>
    public bool Has(Parameter p) => !string.IsNullOrWhiteSpace(Raw(p));

    /// <summary>Records a problem with the parameter.</summary>
    public void Fail(Parameter p, string message) => reader.Fail(FieldName(p), message);

    /// <summary>A number in range; the default when absent or invalid (a problem is then on the reader); null without a default.</summary>
    public double? Number(Parameter p, bool? required = null)
    {
        var raw = Raw(p);
        var value = reader.Number(FieldName(p), raw, p.Minimum!.Value, p.Maximum!.Value, p.Unit, required ?? p.Required);
        if (value is { } v && p.MinimumExclusive && v <= p.Minimum)
        {
            Fail(p, $"{FieldName(p)} must be {p.RangeText}; got {Clip(raw!)}.");
            return p.NumberDefault;
        }
        return value ?? p.NumberDefault;
    }

    /// <summary>
    /// One of the allowed words, or else a number in range (the default when absent or invalid; a problem naming both the
    /// range and the words is then on the reader).
    /// </summary>
    public (double? Number, string? Choice) NumberOrChoice(Parameter p)
    {
        var raw = Raw(p);
        if (string.IsNullOrWhiteSpace(raw)) return (p.NumberDefault, null);
        var word = p.Allowed!.FirstOrDefault(a => string.Equals(a, raw.Trim(), StringComparison.OrdinalIgnoreCase));
        if (word is not null) return (null, word);
        if (!double.TryParse(raw, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out _))
        {
            Fail(p, $"{FieldName(p)} must be a number {p.RangeText}, or one of {string.Join(", ", p.Allowed!)}; got '{Clip(raw)}'.");
            return (p.NumberDefault, null);
        }
        return (Number(p), null);
    }

    /// <summary>A whole number in range; the default when absent or invalid (a problem is then on the reader).</summary>
    public int? Integer(Parameter p)
    {
        var raw = Raw(p);
        var value = Number(p);
        if (value is { } v && !string.IsNullOrWhiteSpace(raw) && v != Math.Floor(v))
        {
            Fail(p, $"{FieldName(p)} must be a whole number {p.RangeText}; got {Clip(raw)}.");
            value = p.NumberDefault;
        }
        return value is { } w ? (int)w : null;
    }

    /// <summary>true or false; the default (false unless stated) when absent.</summary>
    public bool Boolean(Parameter p) =>
        reader.OneOf(FieldName(p), Raw(p), ["true", "false"]) is { } name ? name == "true" : p.Default is true;

    /// <summary>One of the allowed names; the default when absent or invalid.</summary>
    public string? Choice(Parameter p) => reader.OneOf(FieldName(p), Raw(p), p.Allowed!) ?? p.Default as string;

    /// <summary>Comma-separated allowed names; every allowed name when absent.</summary>
    public IReadOnlyList<string> Choices(Parameter p)
    {
        var raw = Raw(p);
        if (string.IsNullOrWhiteSpace(raw)) return p.Allowed!;
        var chosen = new List<string>();
        foreach (var part in raw.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            var match = p.Allowed!.FirstOrDefault(a => string.Equals(a, part, StringComparison.OrdinalIgnoreCase));
            if (match is null) Fail(p, $"{FieldName(p)} must be a comma-separated list of {string.Join(", ", p.Allowed!)}; got '{Clip(part)}'.");
            else if (!chosen.Contains(match)) chosen.Add(match);
        }
        return chosen.Count == 0 ? p.Allowed! : chosen;
    }

    /// <summary>A calendar date in the supported years; null when absent or invalid.</summary>
    public CalendarDate? Date(Parameter p, bool? required = null) => reader.Date(FieldName(p), Raw(p), required ?? p.Required);

    /// <summary>An instant in the supported years; null when absent or invalid.</summary>
    public NodaTime.Instant? Instant(Parameter p) => reader.Instant(FieldName(p), Raw(p), p.Required);

    private static string Clip(string raw) => raw.Length <= 64 ? raw : raw[..64] + "…";
}
