using System.Collections;
using System.Text.Json;
using System.Text.Json.Serialization;
using System.Text.Json.Serialization.Metadata;

namespace LunarShadow.Api.Formatting;

/// <summary>
/// Guards the JSON boundary: a NaN or an infinity is a bug upstream, so writing one throws (the request fails with a 500
/// and the exception is logged as an error) instead of becoming a silent null or an invalid number. The check wraps the
/// getters of number-valued properties (numbers, nullable numbers, arrays and maps of numbers), so the converters, and
/// with them the OpenAPI schema's number types, stay as they are.
/// </summary>
internal static class FiniteNumbers
{
    /// <summary>Adds the guard (and strict number handling) to serializer options.</summary>
    public static JsonSerializerOptions Configure(JsonSerializerOptions options)
    {
        options.NumberHandling = JsonNumberHandling.Strict;
        options.TypeInfoResolver = (options.TypeInfoResolver ?? new DefaultJsonTypeInfoResolver()).WithAddedModifier(Guard);
        return options;
    }

    /// <summary>The options the host writes with: web defaults plus the guard, for code that serialises outside a request.</summary>
    public static JsonSerializerOptions Web { get; } = Configure(new JsonSerializerOptions(JsonSerializerDefaults.Web));

    /// <summary>Throws when a value holds a non-finite number (a number, or numbers nested in arrays and maps).</summary>
    public static void Check(object? value, string where)
    {
        switch (value)
        {
            case double d when !double.IsFinite(d): throw new NonFiniteNumberException(d, where);
            case float f when !float.IsFinite(f): throw new NonFiniteNumberException(f, where);
            case IDictionary map:
                foreach (DictionaryEntry e in map) Check(e.Value, $"{where}.{e.Key}");
                break;
            case IEnumerable items and not string:
                var i = 0;
                foreach (var item in items) Check(item, $"{where}[{i++}]");
                break;
        }
    }

    private static void Guard(JsonTypeInfo info)
    {
        if (info.Kind != JsonTypeInfoKind.Object) return;
        foreach (var property in info.Properties)
        {
            if (property.Get is not { } get || !HoldsNumbers(property.PropertyType)) continue;
            var name = $"{info.Type.Name}.{property.Name}";
            property.Get = owner =>
            {
                var value = get(owner);
                Check(value, name);
                return value;
            };
        }
    }

    private static bool HoldsNumbers(Type type)
    {
        var t = Nullable.GetUnderlyingType(type) ?? type;
        if (t == typeof(double) || t == typeof(float)) return true;
        if (t == typeof(string) || !typeof(IEnumerable).IsAssignableFrom(t)) return false;
        if (t.IsArray) return HoldsNumbers(t.GetElementType()!);
        return t.GetInterfaces().Append(t).Where(i => i.IsGenericType).SelectMany(i => i.GetGenericArguments()).Any(HoldsNumbers);
    }
}

/// <summary>A number that is not finite reached the JSON writer.</summary>
internal sealed class NonFiniteNumberException(double value, string where)
    : JsonException($"A non-finite number ({value}) reached the JSON boundary at {where}; this is a bug in the computation, not in the request.");
