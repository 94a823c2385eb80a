using System.Globalization;
using System.Text.RegularExpressions;
using CsvHelper;

namespace LunarShadow.Api.Formatting;

/// <summary>
/// RFC 4180 CSV written with CsvHelper: comma-separated, CRLF line ends, fields quoted where they need it, invariant
/// numbers. Text cells that a spreadsheet would run as a formula are neutralised (see <see cref="Neutralise"/>).
/// </summary>
internal sealed partial class CsvWriter : IDisposable
{
    private readonly StringWriter _text = new(CultureInfo.InvariantCulture);
    private readonly CsvHelper.CsvWriter _csv;

    /// <summary>A new, empty file.</summary>
    public CsvWriter()
    {
        _csv = CsvHelper.CsvWriter.Create(_text, new CsvWriterOptions
        {
            NewLine = "\r\n",
            FormatProvider = CultureInfo.InvariantCulture,
            // Neutralised here per cell instead, so that numbers and ISO dates with a minus sign stay data.
            Injection = CsvInjection.None,
        }, true);
    }

    /// <summary>Writes one record.</summary>
    public CsvWriter Row(params object?[] fields)
    {
        foreach (var field in fields)
        {
            _csv.WriteField(field switch
            {
                null => "",
                double d => d.ToString("R", CultureInfo.InvariantCulture),
                bool b => b ? "true" : "false",
                string s => Neutralise(s),
                IFormattable f => f.ToString(null, CultureInfo.InvariantCulture),
                var other => Neutralise(other.ToString() ?? ""),
            });
        }
        _csv.EndRecord();
        return this;
    }

    /// <inheritdoc />
    public override string ToString()
    {
        _csv.Flush();
        return _text.ToString();
    }

    /// <inheritdoc />
    public void Dispose()
    {
        _csv.Dispose();
        _text.Dispose();
    }

    // OWASP, "CSV Injection": a cell beginning with = + - @, tab or carriage return may be run as a formula by a
    // spreadsheet; prefixing a single quote makes it text. Cells that are wholly a number or an ISO 8601 date or
    // date-time (e.g. -0584-05-28, -12.5) are data, not text, and are left as they are.
    /// <summary>A text cell made safe to open in a spreadsheet.</summary>
    public static string Neutralise(string text) =>
        text.Length > 0 && text[0] is '=' or '+' or '-' or '@' or '\t' or '\r' && !Data().IsMatch(text) ? "'" + text : text;

    [GeneratedRegex(@"^[+-]?(\d+(\.\d+)?([eE][+-]?\d+)?|\d{4,5}-\d{2}-\d{2}(T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:\d{2})?)?)$", RegexOptions.CultureInvariant)]
    private static partial Regex Data();
}
