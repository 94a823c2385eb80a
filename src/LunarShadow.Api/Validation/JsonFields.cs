using System.Text.Json;

namespace LunarShadow.Api.Validation;

/// <summary>A flat JSON object read as field name → invariant text, so the query-string rules apply unchanged to bodies.</summary>
internal static class JsonFields
{
    /// <summary>The fields; null when the body is too large (reader still valid) or unreadable (a problem on the reader).</summary>
    public static async Task<Dictionary<string, string?>?> ReadAsync(HttpRequest request, QueryReader reader, int maxBytes)
    {
        if (request.ContentLength > maxBytes) return null;
        using var buffer = new MemoryStream();
        var chunk = new byte[8192];
        int read;
        while ((read = await request.Body.ReadAsync(chunk)) > 0)
        {
            buffer.Write(chunk, 0, read);
            if (buffer.Length > maxBytes) return null;
        }
        var bytes = buffer.ToArray();
        try
        {
            using var document = JsonDocument.Parse(bytes, new JsonDocumentOptions { MaxDepth = 8 });
            if (!JsonText.NamesAreText(document.RootElement, reader)) return null;
            if (document.RootElement.ValueKind != JsonValueKind.Object)
            {
                reader.Fail("body", "The body must be a JSON object of named fields.");
                return null;
            }
            var fields = new Dictionary<string, string?>(StringComparer.Ordinal);
            foreach (var property in document.RootElement.EnumerateObject())
            {
                switch (property.Value.ValueKind)
                {
                    case JsonValueKind.Number: fields[property.Name] = property.Value.GetRawText(); break;
                    case JsonValueKind.String: fields[property.Name] = JsonText.String(property.Value, property.Name, reader); break;
                    case JsonValueKind.Null: break;
                    case JsonValueKind.True or JsonValueKind.False: fields[property.Name] = property.Value.GetRawText(); break;
                    default: reader.Fail(property.Name, $"{property.Name} must be a number or a string; got a JSON {property.Value.ValueKind.ToString().ToLowerInvariant()}."); break;
                }
            }
            return reader.IsValid ? fields : null;
        }
        catch (JsonException e)
        {
            JsonText.FailUnreadable(reader, bytes, e, "a JSON object");
            return null;
        }
        catch (InvalidOperationException)
        {
            reader.Fail("body", "body field names must be valid Unicode text; one holds an unpaired surrogate escape.");
            return null;
        }
    }
}
