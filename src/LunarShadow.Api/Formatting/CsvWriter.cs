using System.Globalization;
using System.Text;

namespace LunarShadow.Api.Formatting;

/// <summary>RFC 4180 CSV: comma-separated, CRLF line ends, fields quoted where they need it, invariant numbers.</summary>
internal sealed class CsvWriter
{
    private readonly StringBuilder _text = new();

    /// <summary>Writes one record.</summary>
    public CsvWriter Row(params object?[] fields)
    {
        for (var i = 0; i < fields.Length; i++)
        {
            if (i > 0) _text.Append(',');
            _text.Append(Escape(fields[i] switch
            {
                null => "",
                double d => d.ToString("R", CultureInfo.InvariantCulture),
                IFormattable f => f.ToString(null, CultureInfo.InvariantCulture),
                var other => other.ToString() ?? "",
            }));
        }
        _text.Append("\r\n");
        return this;
    }

    /// <inheritdoc />
    public override string ToString() => _text.ToString();

    private static string Escape(string field) =>
        field.IndexOfAny([',', '"', '\r', '\n']) >= 0 ? "\"" + field.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : field;
}
