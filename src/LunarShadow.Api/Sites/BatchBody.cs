using System.Globalization;
using System.Text.Json;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Sites;

/// <summary>The JSON body of a batch request, validated field by field with the same rules as the query string.</summary>
internal sealed class BatchBody
{
    public List<(Site Site, OpeningHours? Hours)>? Sites { get; private set; }

    public ShadowModel? Model { get; private set; }

    public IDeltaTModel? DeltaT { get; private set; }

    public string? TooLarge { get; private set; }

    public static async Task<BatchBody> ReadAsync(HttpRequest request, QueryReader reader, int maxBytes, int maxSites)
    {
        var result = new BatchBody();
        using var buffer = new MemoryStream();
        var chunk = new byte[16 * 1024];
        int read;
        while ((read = await request.Body.ReadAsync(chunk)) > 0)
        {
            buffer.Write(chunk, 0, read);
            if (buffer.Length > maxBytes)
            {
                result.TooLarge = $"The body may be at most {maxBytes / 1024} KiB.";
                return result;
            }
        }
        JsonDocument document;
        var bytes = buffer.ToArray();
        try
        {
            document = JsonDocument.Parse(bytes, new JsonDocumentOptions { MaxDepth = 16 });
        }
        catch (JsonException e)
        {
            JsonText.FailUnreadable(reader, bytes, e, "a JSON object {\"sites\": [ … ]}");
            return result;
        }
        if (!JsonText.NamesAreText(document.RootElement, reader))
        {
            document.Dispose();
            return result;
        }
        using (document)
        {
            var root = document.RootElement;
            if (root.ValueKind != JsonValueKind.Object || !root.TryGetProperty("sites", out var sites) || sites.ValueKind != JsonValueKind.Array)
            {
                reader.Fail("sites", "The body must be a JSON object with a \"sites\" array of site objects.");
                return result;
            }
            if (sites.GetArrayLength() > maxSites)
            {
                result.TooLarge = $"A batch may hold at most {maxSites} sites; got {sites.GetArrayLength()}.";
                return result;
            }
            if (sites.GetArrayLength() == 0) reader.Fail("sites", "sites must hold at least one site.");
            result.Model = ShadowQuery.Read(reader, Text(root, "shadow", reader, ""), Text(root, "layerKm", reader, ""));
            result.DeltaT = DeltaTQuery.Read(reader, Text(root, "deltaT", reader, ""), Text(root, "deltaTModel", reader, ""));
            var parsed = new List<(Site, OpeningHours?)>();
            var index = 0;
            foreach (var s in sites.EnumerateArray())
            {
                var prefix = $"sites[{index++}].";
                if (s.ValueKind != JsonValueKind.Object)
                {
                    reader.Fail(prefix.TrimEnd('.'), "Each site must be a JSON object with at least lat and lon.");
                    continue;
                }
                var fields = new SiteFields(Text(s, "lat", reader, prefix), Text(s, "lon", reader, prefix), Text(s, "elevation", reader, prefix),
                    Text(s, "tz", reader, prefix), Text(s, "minAltitude", reader, prefix), Text(s, "horizon", reader, prefix),
                    Text(s, "pressure", reader, prefix), Text(s, "temperature", reader, prefix), Text(s, "name", reader, prefix));
                var site = SiteQuery.Read(reader, fields, required: true, prefix);
                var hours = OpeningQuery.Read(reader, Text(s, "open", reader, prefix), prefix + "open");
                if (site is not null) parsed.Add((site, hours));
            }
            if (reader.IsValid) result.Sites = parsed;
        }
        return result;
    }

    // A JSON number or string as invariant text, so the query-string rules apply unchanged.
    private static string? Text(JsonElement element, string name, QueryReader reader, string prefix)
    {
        if (!element.TryGetProperty(name, out var value) || value.ValueKind == JsonValueKind.Null) return null;
        switch (value.ValueKind)
        {
            case JsonValueKind.Number:
                return value.GetRawText();
            case JsonValueKind.String:
                return JsonText.String(value, prefix + name, reader);
            case JsonValueKind.Array when name == "horizon":
                var points = new List<string>();
                foreach (var p in value.EnumerateArray())
                {
                    if (p.ValueKind == JsonValueKind.Array && p.GetArrayLength() == 2 && p[0].ValueKind == JsonValueKind.Number && p[1].ValueKind == JsonValueKind.Number)
                        points.Add(string.Create(CultureInfo.InvariantCulture, $"{p[0].GetDouble()}:{p[1].GetDouble()}"));
                    else
                    {
                        reader.Fail(prefix + name, $"{prefix}{name} as an array must hold [azimuth, altitude] number pairs.");
                        return null;
                    }
                }
                return string.Join(',', points);
            default:
                reader.Fail(prefix + name, $"{prefix}{name} must be a number or a string; got a JSON {value.ValueKind.ToString().ToLowerInvariant()}.");
                return null;
        }
    }
}
