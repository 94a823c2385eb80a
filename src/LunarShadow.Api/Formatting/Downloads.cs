using System.Globalization;
using System.Text;

namespace LunarShadow.Api.Formatting;

/// <summary>
/// Files for download: a <c>Content-Disposition: attachment</c> header with a meaningful, safe file name such as
/// lunar-eclipse-2028-12-31-tokyo-science-hall-local.ics (eclipse date, site slug, kind).
/// </summary>
internal static class Downloads
{
    /// <summary>The result, sent as an attachment with the given file name.</summary>
    public static IResult AsAttachment(this IResult result, string fileName) => new Attachment(result, fileName);

    /// <summary>
    /// A file name: parts joined by hyphens, each reduced to lower-case ASCII letters, digits and dots, then the extension
    /// of the format.
    /// </summary>
    public static string FileName(OutputFormat format, params string?[] parts)
    {
        var stem = string.Join("-", parts.Select(Slug).Where(p => p.Length > 0));
        return (stem.Length == 0 ? "lunarshadow" : stem) + format switch
        {
            OutputFormat.Csv => ".csv",
            OutputFormat.Calendar => ".ics",
            OutputFormat.GeoJson => ".geojson",
            _ => ".json",
        };
    }

    /// <summary>A site's slug: its name when it has letters or digits, else its coordinates (35.68n-139.77e).</summary>
    public static string SiteSlug(string? name, double latitudeDegrees, double longitudeDegrees)
    {
        var slug = Slug(name);
        return slug.Length > 0 ? slug : string.Create(CultureInfo.InvariantCulture,
            $"{Math.Abs(latitudeDegrees):0.##}{(latitudeDegrees < 0 ? 's' : 'n')}-{Math.Abs(longitudeDegrees):0.##}{(longitudeDegrees < 0 ? 'w' : 'e')}");
    }

    // Letters lose their accents (by a table, as the service runs with invariant globalization), everything else but ASCII letters, digits and dots becomes one
    // hyphen; at most 48 characters, so the name is safe in a header, a URL and every file system.
    private static string Slug(string? text)
    {
        if (string.IsNullOrWhiteSpace(text)) return "";
        var builder = new StringBuilder();
        foreach (var c in text)
        {
            var folded = Fold(char.ToLowerInvariant(c));
            if (folded is not null) builder.Append(folded);
            else if (builder.Length > 0 && builder[^1] != '-') builder.Append('-');
        }
        var slug = builder.ToString().Trim('-', '.');
        return slug.Length > 48 ? slug[..48].TrimEnd('-', '.') : slug;
    }

    private const string Accented = "àáâãäåāăąçćčďđèéêëēėęěìíîïīįıñńňòóôõöøōőùúûüūůűųýÿźżžßæœþð";
    private static readonly string[] Plain =
    [
        "a", "a", "a", "a", "a", "a", "a", "a", "a", "c", "c", "c", "d", "d", "e", "e", "e", "e", "e", "e", "e", "e",
        "i", "i", "i", "i", "i", "i", "i", "n", "n", "n", "o", "o", "o", "o", "o", "o", "o", "o", "u", "u", "u", "u", "u", "u",
        "u", "u", "y", "y", "z", "z", "z", "ss", "ae", "oe", "th", "d",
    ];

    private static string? Fold(char c)
    {
        if (char.IsAsciiLetterOrDigit(c) || c == '.') return c.ToString();
        var i = Accented.IndexOf(c, StringComparison.Ordinal);
        return i >= 0 ? Plain[i] : null;
    }

    private sealed class Attachment(IResult inner, string fileName) : IResult
    {
        public Task ExecuteAsync(HttpContext httpContext)
        {
            httpContext.Response.Headers.ContentDisposition = $"attachment; filename=\"{fileName}\"";
            return inner.ExecuteAsync(httpContext);
        }
    }
}
