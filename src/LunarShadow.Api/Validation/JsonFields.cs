using System.Globalization;
using System.Text.Json;

namespace LunarShadow.Api.Validation;

/// <summary>JSON bodies read as field name → invariant text, so the query-string rules apply unchanged to bodies.</summary>
internal static class JsonFields
{
    /// <summary>
    /// The body as a JSON document; null when it is over <paramref name="maxBytes"/> (TooLarge set) or
    /// unreadable (a problem on the reader).
    /// </summary>
    public static async Task<(JsonDocument? Document, bool TooLarge)> ReadDocumentAsync(HttpRequest request, QueryReader reader, int maxBytes, int maxDepth)
    {
        if (request.ContentLength > maxBytes) return (null, true);
        using var buffer = new MemoryStream();
        var chunk = new byte[16 * 1024];
        int read;
        while ((read = await request.Body.ReadAsync(chunk)) > 0)
        {
            buffer.Write(chunk, 0, read);
            if (buffer.Length > maxBytes) return (null, true);
        }
        var bytes = buffer.ToArray();
        JsonDocument document;
        try
        {
            document = JsonDocument.Parse(bytes, new JsonDocumentOptions { MaxDepth = maxDepth });
        }
        catch (JsonException e)
        {
            // Not JSON, or not UTF-8: name the field where reading stopped (e.g. sites[1].name).
            JsonText.FailUnreadable(reader, bytes, e, "a JSON object");
            return (null, false);
        }
        // A field name that is not Unicode text (an escaped lone surrogate) cannot even be compared.
        if (!JsonText.NamesAreText(document.RootElement, reader))
        {
            document.Dispose();
            return (null, false);
        }
        return (document, false);
    }

    /// <summary>A flat JSON object body's fields; null when too large (reader still valid) or unreadable (a problem).</summary>
    public static async Task<Dictionary<string, string?>?> ReadAsync(HttpRequest request, QueryReader reader, int maxBytes)
    {
        var (document, _) = await ReadDocumentAsync(request, reader, maxBytes, maxDepth: 8);
        if (document is null) return null;
        using (document)
        {
            if (document.RootElement.ValueKind != JsonValueKind.Object)
            {
                reader.Fail("body", "The body must be a JSON object of named fields.");
                return null;
            }
            var fields = Of(document.RootElement, reader);
            return reader.IsValid ? fields : null;
        }
    }

    /// <summary>
    /// An object's members as invariant text: numbers, strings and booleans as written; a horizon may also be an array of
    /// [azimuth, altitude] pairs. Anything else is a problem named with the prefix ("sites[3]."), except the members named
    /// in <paramref name="nested"/>, which the caller reads by their own rule (an observation's "site" object).
    /// </summary>
    public static Dictionary<string, string?> Of(JsonElement element, QueryReader reader, string prefix = "", IReadOnlyCollection<string>? nested = null)
    {
        var fields = new Dictionary<string, string?>(StringComparer.Ordinal);
        foreach (var property in element.EnumerateObject())
        {
            var value = property.Value;
            switch (value.ValueKind)
            {
                case JsonValueKind.Null: break;
                case JsonValueKind.String: fields[property.Name] = JsonText.String(value, prefix + property.Name, reader); break;
                case JsonValueKind.Number or JsonValueKind.True or JsonValueKind.False: fields[property.Name] = value.GetRawText(); break;
                case JsonValueKind.Array when property.Name == Parameters.Horizon.Name:
                    fields[property.Name] = HorizonPairs(value, reader, prefix + property.Name);
                    break;
                case JsonValueKind.Array or JsonValueKind.Object when prefix.Length == 0 && property.Name == "sites":
                    break; // the batch's list of sites, read by its own rule
                case JsonValueKind.Array or JsonValueKind.Object when nested?.Contains(property.Name) == true:
                    break;
                default:
                    reader.Fail(prefix + property.Name, $"{prefix}{property.Name} must be a number or a string; got a JSON {value.ValueKind.ToString().ToLowerInvariant()}.");
                    break;
            }
        }
        return fields;
    }

    private static string? HorizonPairs(JsonElement array, QueryReader reader, string field)
    {
        var points = new List<string>();
        foreach (var p in array.EnumerateArray())
        {
            if (p.ValueKind != JsonValueKind.Array || p.GetArrayLength() != 2 || p[0].ValueKind != JsonValueKind.Number || p[1].ValueKind != JsonValueKind.Number)
            {
                reader.Fail(field, $"{field} as an array must hold [azimuth, altitude] number pairs.");
                return null;
            }
            points.Add(string.Create(CultureInfo.InvariantCulture, $"{p[0].GetDouble()}:{p[1].GetDouble()}"));
        }
        return string.Join(',', points);
    }
}
