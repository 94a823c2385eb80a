using System.Text.Json;
using LunarShadow.Api.Validation;

namespace LunarShadow.Api.Sites;

/// <summary>
/// The JSON body of a batch request: the computation choices at the top and a "sites" list, each site an object of the
/// same fields as the per-site query string, read by the same <see cref="SiteParameters"/>.
/// </summary>
/// <param name="Fields">The top-level fields (shadow, layerKm, deltaT, deltaTModel).</param>
/// <param name="Sites">The sites; null when any is invalid.</param>
/// <param name="TooLarge">Why the body is refused as too large, if it is.</param>
internal sealed record BatchBody(IReadOnlyDictionary<string, string?> Fields, IReadOnlyList<SiteParameters>? Sites, string? TooLarge)
{
    /// <summary>The name of the list of sites.</summary>
    public const string SitesName = "sites";

    public static async Task<BatchBody> ReadAsync(HttpRequest request, QueryReader reader, int maxBytes, int maxSites)
    {
        var empty = new Dictionary<string, string?>();
        var (document, tooLarge) = await JsonFields.ReadDocumentAsync(request, reader, maxBytes, maxDepth: 16);
        if (tooLarge) return new BatchBody(empty, null, $"The body may be at most {maxBytes / 1024} KiB.");
        if (document is null) return new BatchBody(empty, null, null);
        using (document)
        {
            var root = document.RootElement;
            if (root.ValueKind != JsonValueKind.Object || !root.TryGetProperty(SitesName, out var sites) || sites.ValueKind != JsonValueKind.Array)
            {
                reader.Fail(SitesName, "The body must be a JSON object with a \"sites\" array of site objects.");
                return new BatchBody(empty, null, null);
            }
            if (sites.GetArrayLength() > maxSites)
                return new BatchBody(empty, null, $"A batch may hold at most {maxSites} sites; got {sites.GetArrayLength()}.");
            if (sites.GetArrayLength() == 0) reader.Fail(SitesName, "sites must hold at least one site.");
            var fields = JsonFields.Of(root, reader);
            var parsed = new List<SiteParameters>();
            var index = 0;
            foreach (var s in sites.EnumerateArray())
            {
                var prefix = $"{SitesName}[{index++}].";
                if (s.ValueKind != JsonValueKind.Object)
                {
                    reader.Fail(prefix.TrimEnd('.'), "Each site must be a JSON object with at least lat and lon.");
                    continue;
                }
                var site = SiteParameters.Read(RequestFields.FromFields(JsonFields.Of(s, reader, prefix), reader, prefix));
                if (site is not null) parsed.Add(site);
            }
            return new BatchBody(fields, reader.IsValid ? parsed : null, null);
        }
    }
}
