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

/// <summary>Chooses a representation from <c>?format=</c> (which wins) or the Accept header.</summary>
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

    /// <summary>
    /// The chosen format; null from the Accept header when it admits none of the allowed ones (the caller answers 406).
    /// An unknown <c>format</c> value is reported on the reader as a 400.
    /// </summary>
    public static OutputFormat? Choose(HttpRequest request, string? format, IReadOnlyCollection<OutputFormat> allowed, Validation.QueryReader reader)
    {
        if (!string.IsNullOrWhiteSpace(format))
        {
            var name = reader.OneOf("format", format, Names(allowed));
            return name is null ? allowed.First() : allowed.First(f => Known[f].Name == name);
        }
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
