using Microsoft.Net.Http.Headers;

namespace LunarShadow.Api.Formatting;

/// <summary>The representations an endpoint can return.</summary>
internal enum OutputFormat
{
    Json,
    Csv,
    Calendar,
    GeoJson,
    Sequence,
}

/// <summary>Names and media types of the representations, and the Accept header's choice among them.</summary>
internal static class ContentNegotiation
{
    private static readonly Dictionary<OutputFormat, (string Name, string MediaType)> Known = new()
    {
        [OutputFormat.Json] = ("json", "application/json"),
        [OutputFormat.Csv] = ("csv", "text/csv"),
        [OutputFormat.Calendar] = ("ics", "text/calendar"),
        [OutputFormat.GeoJson] = ("geojson", "application/geo+json"),
        [OutputFormat.Sequence] = ("sequence", "application/vnd.lunarshadow.sequence+json"),
    };

    /// <summary>The media type of a format.</summary>
    public static string MediaType(OutputFormat format) => Known[format].MediaType;

    /// <summary>The names accepted by <c>?format=</c> among the allowed formats.</summary>
    public static IReadOnlyCollection<string> Names(IEnumerable<OutputFormat> allowed) => allowed.Select(f => Known[f].Name).ToList();

    /// <summary>The name <c>?format=</c> takes for a format.</summary>
    public static string Name(OutputFormat format) => Known[format].Name;

    /// <summary>The format the Accept header prefers among the allowed ones (the first when it names none); null when it admits none.</summary>
    public static OutputFormat? FromAccept(HttpRequest request, IReadOnlyCollection<OutputFormat> allowed)
    {
        var accept = request.GetTypedHeaders().Accept;
        if (accept is null || accept.Count == 0) return allowed.First();
        foreach (var range in accept.OrderByDescending(a => a.Quality ?? 1))
        {
            if ((range.Quality ?? 1) <= 0) continue;
            foreach (var f in allowed)
            {
                if (MediaTypeHeaderValue.Parse(Known[f].MediaType).IsSubsetOf(range)) return f;
                if (f == OutputFormat.Json && range.MediaType.Equals("application/problem+json", StringComparison.OrdinalIgnoreCase)) return f;
            }
        }
        return null;
    }
}
