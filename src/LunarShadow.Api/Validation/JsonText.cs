using System.Text.Json;

namespace LunarShadow.Api.Validation;

/// <summary>
/// Reading text out of JSON bodies without letting malformed text through: bytes that are not UTF-8 and string escapes
/// that are not Unicode (an unpaired surrogate such as \uD800) are refused with a problem naming the field.
/// </summary>
internal static class JsonText
{
    /// <summary>A JSON string's text; null and a problem on the reader when it holds an unpaired surrogate.</summary>
    public static string? String(JsonElement value, string field, QueryReader reader)
    {
        try
        {
            return value.GetString();
        }
        catch (InvalidOperationException)
        {
            reader.Fail(field, $"{field} must be valid Unicode text; it holds an unpaired surrogate escape (\\uD800 to \\uDFFF alone).");
            return null;
        }
    }

    /// <summary>False, with a problem on the reader, when a field name anywhere in the document is not Unicode text.</summary>
    public static bool NamesAreText(JsonElement element, QueryReader reader, string path = "")
    {
        switch (element.ValueKind)
        {
            case JsonValueKind.Object:
                foreach (var property in element.EnumerateObject())
                {
                    string name;
                    try
                    {
                        name = property.Name;
                    }
                    catch (InvalidOperationException)
                    {
                        var field = path.Length == 0 ? "body" : path;
                        reader.Fail(field, $"{field}: field names must be valid Unicode text; one holds an unpaired surrogate escape (\\uD800 to \\uDFFF alone).");
                        return false;
                    }
                    if (!NamesAreText(property.Value, reader, path.Length == 0 ? name : path + "." + name)) return false;
                }
                return true;
            case JsonValueKind.Array:
                var index = 0;
                foreach (var item in element.EnumerateArray())
                    if (!NamesAreText(item, reader, $"{path}[{index++}]")) return false;
                return true;
            default:
                return true;
        }
    }

    /// <summary>Records a body that is not JSON text under the field where reading it failed (e.g. sites[3].name), or "body".</summary>
    public static void FailUnreadable(QueryReader reader, byte[] json, JsonException error, string expected)
    {
        var field = FailingField(json);
        var why = field == "body" ? "" : $" (at {field})";
        reader.Fail(field, $"{field} could not be read: the body must be {expected} in UTF-8{why}. {error.Message}");
    }

    /// <summary>Where a body that is not JSON text, or not UTF-8, fails: a path such as sites[3].name, or "body".</summary>
    public static string FailingField(ReadOnlySpan<byte> json)
    {
        var reader = new Utf8JsonReader(json, new JsonReaderOptions { MaxDepth = 64 });
        var frames = new List<(bool IsArray, int Index, string? Name)>();
        try
        {
            while (reader.Read())
            {
                switch (reader.TokenType)
                {
                    case JsonTokenType.PropertyName:
                        frames[^1] = (false, -1, reader.GetString());
                        break;
                    case JsonTokenType.StartObject or JsonTokenType.StartArray:
                        Advance(frames);
                        frames.Add((reader.TokenType == JsonTokenType.StartArray, -1, null));
                        break;
                    case JsonTokenType.EndObject or JsonTokenType.EndArray:
                        frames.RemoveAt(frames.Count - 1);
                        break;
                    default:
                        Advance(frames);
                        break;
                }
            }
        }
        catch (Exception e) when (e is JsonException or InvalidOperationException)
        {
            var path = "";
            for (var i = 0; i < frames.Count; i++)
            {
                var f = frames[i];
                if (f.IsArray) path += $"[{(i == frames.Count - 1 ? f.Index + 1 : f.Index)}]";
                else if (f.Name is not null) path += (path.Length == 0 ? "" : ".") + f.Name;
            }
            return path.Length == 0 ? "body" : path;
        }
        return "body";
    }

    private static void Advance(List<(bool IsArray, int Index, string? Name)> frames)
    {
        if (frames.Count > 0 && frames[^1].IsArray) frames[^1] = (true, frames[^1].Index + 1, null);
    }
}
