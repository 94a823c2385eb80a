using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;

namespace LunarShadow.Api.Observations;

/// <summary>The fields of one posted observation, each described once (read by <see cref="ObservationBody"/>, documented in OpenAPI).</summary>
internal static class ObservationParameters
{
    /// <summary>Longest observer name.</summary>
    public const int MaxObserverLength = 100;

    /// <summary>Longest optics description.</summary>
    public const int MaxOpticsLength = 200;

    /// <summary>The site object's member name.</summary>
    public const string SiteName = "site";

    public static readonly Parameter Kind = new("kind", ParameterType.Choice,
        "crater-timing: when the umbra's edge crossed a named feature; danjon: an estimate of the eclipsed Moon's brightness on the Danjon scale.")
    {
        Allowed = ObservationKinds.All, Required = true,
    };

    public static readonly Parameter Feature = new("feature", ParameterType.Choice,
        "For a crater timing: the feature, by its name in the feature list (GET …/craters).")
    {
        Allowed = LunarFeatureCatalog.All.Select(f => f.Name).ToList(),
    };

    public static readonly Parameter Crossing = new("crossing", ParameterType.Choice,
        "For a crater timing: immersion (the umbra's edge reached the feature) or emersion (the feature left the umbra).")
    {
        Allowed = Common.WireNames.All<CrossingDirection>(),
    };

    public static readonly Parameter Utc = new("utc", ParameterType.Instant,
        "The observed instant, ISO 8601 with Z or an offset (kept to the millisecond). Must lie between P1 and P4; a timing within 30 minutes of the predicted crossing under the danjon shadow model.")
    {
        Required = true,
    };

    public static readonly Parameter UncertaintySeconds = new("uncertaintySeconds", ParameterType.Number,
        "For a crater timing: the observer's own estimate of the timing's uncertainty.")
    {
        Unit = "seconds", Minimum = 0, Maximum = 600,
    };

    public static readonly Parameter Optics = new("optics", ParameterType.Text,
        "For a crater timing: the telescope or binoculars, free text (e.g. \"150 mm reflector, 60x\").")
    {
        MaxLength = MaxOpticsLength,
    };

    public static readonly Parameter Observer = new("observer", ParameterType.Text,
        "The observer's name as it should be shown, optional: the only personal datum kept, and published with the observation.")
    {
        MaxLength = MaxObserverLength,
    };

    public static readonly Parameter Value = new("value", ParameterType.Number,
        "For a Danjon estimate: L, in steps of 0.5 (0 very dark, 4 bright copper-red).")
    {
        Unit = "", Minimum = 0, Maximum = 4,
    };

    /// <summary>Every field of an observation object except its site.</summary>
    public static readonly IReadOnlyList<Parameter> Fields = [Kind, Feature, Crossing, Utc, UncertaintySeconds, Optics, Observer, Value];

    /// <summary>The fields of the site object.</summary>
    public static readonly IReadOnlyList<Parameter> Site = [Parameters.Latitude, Parameters.Longitude, Parameters.Elevation];

    /// <summary>The fields (besides kind, utc and site) each kind takes.</summary>
    public static IReadOnlyList<Parameter> FieldsOf(string kind) => kind == ObservationKinds.Danjon
        ? [Kind, Utc, Observer, Value]
        : [Kind, Feature, Crossing, Utc, UncertaintySeconds, Optics, Observer];

    /// <summary>The kind filter of the list.</summary>
    public static readonly Parameter KindFilter = new("kind", ParameterType.Choice, "Only observations of this kind; default: both.")
    {
        Allowed = ObservationKinds.All,
    };
}
