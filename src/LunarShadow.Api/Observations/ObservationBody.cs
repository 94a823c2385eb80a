using System.Text.Json;
using LunarShadow.Api.Validation;

namespace LunarShadow.Api.Observations;

/// <summary>
/// A POST body of observations: one object, or an array of them (a batch). Each object is read through the parameter
/// table; problems are named with the item's index in a batch ("[2].utc", "[0].site.lat").
/// </summary>
internal static class ObservationBody
{
    /// <summary>The observations read, in request order; null when any is invalid (problems on the reader).</summary>
    public static IReadOnlyList<ObservationInput>? Read(JsonElement root, QueryReader reader)
    {
        var items = new List<(JsonElement Element, string Prefix)>();
        if (root.ValueKind == JsonValueKind.Object) items.Add((root, ""));
        else if (root.ValueKind == JsonValueKind.Array)
        {
            var index = 0;
            foreach (var element in root.EnumerateArray()) items.Add((element, $"[{index++}]."));
            if (items.Count == 0) reader.Fail("body", "The array must hold at least one observation.");
        }
        else reader.Fail("body", "The body must be one observation object or an array of them.");
        var read = new List<ObservationInput>();
        foreach (var (element, prefix) in items)
        {
            if (Item(element, prefix, reader) is { } input) read.Add(input);
        }
        return reader.IsValid ? read : null;
    }

    private static ObservationInput? Item(JsonElement element, string prefix, QueryReader reader)
    {
        var name = prefix.Length == 0 ? "body" : prefix.TrimEnd('.');
        if (element.ValueKind != JsonValueKind.Object)
        {
            reader.Fail(name, $"{name} must be an observation object with kind, utc and site.");
            return null;
        }
        var before = reader.Errors.Count;
        var fields = JsonFields.Of(element, reader, prefix, [ObservationParameters.SiteName]);
        var f = RequestFields.FromFields(fields, reader, prefix);
        var kind = f.Choice(ObservationParameters.Kind);
        if (!f.Has(ObservationParameters.Kind))
            f.Fail(ObservationParameters.Kind, $"{prefix}kind is required: one of {string.Join(", ", ObservationKinds.All)}.");
        if (kind is null) return null;

        var allowed = ObservationParameters.FieldsOf(kind).Select(p => p.Name).Append(ObservationParameters.SiteName).ToHashSet(StringComparer.Ordinal);
        foreach (var member in element.EnumerateObject().Where(m => !allowed.Contains(m.Name)))
            reader.Fail(prefix + Clip(member.Name), $"{prefix}{Clip(member.Name)} is not a field of a {kind} observation; its fields are {string.Join(", ", allowed)}.");

        var utc = f.Instant(ObservationParameters.Utc);
        var site = Site(element, prefix, reader);
        var observer = Text(f, ObservationParameters.Observer);
        if (kind == ObservationKinds.Danjon)
        {
            var value = f.Number(ObservationParameters.Value, required: true);
            if (value is { } v && v * 2 != Math.Floor(v * 2))
                f.Fail(ObservationParameters.Value, $"{prefix}value must be from 0 to 4 in steps of 0.5; got {v.ToString(System.Globalization.CultureInfo.InvariantCulture)}.");
            return reader.Errors.Count == before && utc is not null && site is not null && value is not null
                ? new ObservationInput(prefix, kind, null, null, value, utc.Value, site, null, null, observer)
                : null;
        }
        var feature = Required(f, ObservationParameters.Feature);
        var crossing = Required(f, ObservationParameters.Crossing);
        var uncertainty = f.Number(ObservationParameters.UncertaintySeconds);
        var optics = Text(f, ObservationParameters.Optics);
        return reader.Errors.Count == before && utc is not null && site is not null && feature is not null && crossing is not null
            ? new ObservationInput(prefix, kind, feature, crossing == "emersion" ? CrossingDirection.Emersion : CrossingDirection.Immersion,
                null, utc.Value, site, uncertainty, optics, observer)
            : null;
    }

    private static ObservationSite? Site(JsonElement element, string prefix, QueryReader reader)
    {
        var name = prefix + ObservationParameters.SiteName;
        if (!element.TryGetProperty(ObservationParameters.SiteName, out var site) || site.ValueKind != JsonValueKind.Object)
        {
            reader.Fail(name, $"{name} is required: an object {{\"lat\": degrees −90 to 90, \"lon\": degrees −180 to 180, \"elevation\": metres −500 to 9000}}.");
            return null;
        }
        var f = RequestFields.FromFields(JsonFields.Of(site, reader, name + "."), reader, name + ".");
        foreach (var member in site.EnumerateObject().Where(m => !ObservationParameters.Site.Any(p => p.Name == m.Name)))
            reader.Fail($"{name}.{Clip(member.Name)}", $"{name}.{Clip(member.Name)} is not a field of a site; its fields are lat, lon, elevation.");
        var lat = f.Number(Parameters.Latitude);
        var lon = f.Number(Parameters.Longitude);
        var elevation = f.Number(Parameters.Elevation);
        return lat is null || lon is null || elevation is null ? null : new ObservationSite(lat.Value, lon.Value, elevation.Value);
    }

    private static string? Required(RequestFields f, Parameter p)
    {
        if (!f.Has(p))
        {
            f.Fail(p, $"{f.FieldName(p)} is required for a crater timing: one of {string.Join(", ", p.Allowed!)}.");
            return null;
        }
        return f.Choice(p);
    }

    // Free text, trimmed: within the length limit and without control characters; null when absent.
    private static string? Text(RequestFields f, Parameter p)
    {
        var raw = f.Raw(p)?.Trim();
        if (string.IsNullOrEmpty(raw)) return null;
        if (raw.Length > p.MaxLength || raw.Any(char.IsControl))
        {
            f.Fail(p, $"{f.FieldName(p)} must be text of 1 to {p.MaxLength} characters without control characters; got {raw.Length} characters.");
            return null;
        }
        return raw;
    }

    private static string Clip(string name) => name.Length <= 40 ? name : name[..40] + "…";
}
