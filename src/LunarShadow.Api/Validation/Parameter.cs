namespace LunarShadow.Api.Validation;

/// <summary>How a parameter's text is read, and how the OpenAPI document types it.</summary>
internal enum ParameterType
{
    /// <summary>A finite decimal number within [Minimum, Maximum].</summary>
    Number,

    /// <summary>A whole number within [Minimum, Maximum].</summary>
    Integer,

    /// <summary>true or false.</summary>
    Boolean,

    /// <summary>A calendar date YYYY-MM-DD in the astronomers' calendar.</summary>
    Date,

    /// <summary>An ISO 8601 instant with Z or an offset.</summary>
    Instant,

    /// <summary>One of <see cref="Parameter.Allowed"/> (case-insensitive).</summary>
    Choice,

    /// <summary>A comma-separated list of <see cref="Parameter.Allowed"/> values.</summary>
    ChoiceList,

    /// <summary>A finite decimal number within [Minimum, Maximum], or one of <see cref="Parameter.Allowed"/> (case-insensitive).</summary>
    NumberOrChoice,

    /// <summary>Free or patterned text read by its own rule (time zone, horizon profile, opening hours, sensor).</summary>
    Text,
}

/// <summary>Where a parameter travels.</summary>
internal enum ParameterPlace
{
    /// <summary>The query string (and, with the same name, a JSON body).</summary>
    Query,

    /// <summary>The route.</summary>
    Path,
}

/// <summary>
/// One request parameter, described once: its name, type, unit, range, default and allowed values. The same description
/// reads and validates the value (<see cref="RequestFields"/>), words the problem message, and types the OpenAPI schema.
/// </summary>
/// <param name="Name">The wire name, in the query string and in JSON bodies.</param>
/// <param name="Type">How the value is read and typed.</param>
/// <param name="Description">What it means, in one or two sentences (range and default are added from the fields).</param>
internal sealed record Parameter(string Name, ParameterType Type, string Description)
{
    /// <summary>Unit of a number, as it reads in a message ("degrees", "hPa").</summary>
    public string Unit { get; init; } = "";

    /// <summary>Least allowed value of a number.</summary>
    public double? Minimum { get; init; }

    /// <summary>Greatest allowed value of a number.</summary>
    public double? Maximum { get; init; }

    /// <summary>True when the minimum itself is not allowed (a focal length above 0).</summary>
    public bool MinimumExclusive { get; init; }

    /// <summary>The value used when the parameter is absent (a double, string or bool), or null for none.</summary>
    public object? Default { get; init; }

    /// <summary>The allowed values of a choice, as written on the wire.</summary>
    public IReadOnlyList<string>? Allowed { get; init; }

    /// <summary>A regular expression the text must match (documented in the schema).</summary>
    public string? Pattern { get; init; }

    /// <summary>Longest allowed text.</summary>
    public int? MaxLength { get; init; }

    /// <summary>Whether the request must carry it.</summary>
    public bool Required { get; init; }

    /// <summary>Where it travels.</summary>
    public ParameterPlace Place { get; init; } = ParameterPlace.Query;

    /// <summary>Older names still accepted for one release (documented as deprecated).</summary>
    public IReadOnlyList<string> FormerNames { get; init; } = [];

    /// <summary>The number default, for reading.</summary>
    public double? NumberDefault => Default is double d ? d : Default is int i ? i : null;

    /// <summary>The allowed range in words, e.g. "from −90 to 90 degrees".</summary>
    public string RangeText =>
        $"{(MinimumExclusive ? "above" : "from")} {Text(Minimum)} {(MinimumExclusive ? "up to" : "to")} {Text(Maximum)}{(Unit.Length > 0 ? " " + Unit : "")}";

    // A bound as prose writes it: the minus sign, not a hyphen.
    private static string Text(double? value) => value switch
    {
        null => "",
        < 0 => "−" + (-value.Value).ToString(System.Globalization.CultureInfo.InvariantCulture),
        _ => value.Value.ToString(System.Globalization.CultureInfo.InvariantCulture),
    };
}
