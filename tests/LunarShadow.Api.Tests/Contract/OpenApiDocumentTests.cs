using LunarShadow.Api.Tests.Support;
using Microsoft.OpenApi;
using Microsoft.OpenApi.Reader;

namespace LunarShadow.Api.Tests.Contract;

/// <summary>
/// Reads /openapi/v1.json with a general-purpose OpenAPI library (Microsoft.OpenApi) and checks that a client can type
/// against it: numbers carry their range, choices are enums, dates are dates (OpenAPI 3.1 / JSON Schema 2020-12).
/// </summary>
public class OpenApiDocumentTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    // Written out by hand (not taken from the service's table), so that a parameter dropped from the table, or typed
    // as text again, fails here.
    private static readonly string[] NumericParameters =
    [
        "lat", "lon", "elevation", "minAltitude", "pressure", "temperature", "layerKm", "deltaT", "track", "count", "iso", "aperture",
        "shutter", "focalLength", "teleconverter", "pixelPitch", "pixels", "danjonL", "interval", "bracket", "blur", "extinction", "gap",
        "timelapseInterval", "fileSize", "years",
    ];

    private static readonly string[] ChoiceParameters = ["shadow", "deltaTModel", "format", "kind", "phase", "mount"];

    // Free text read by its own rule: each is documented with a pattern or a length limit instead.
    private static readonly string[] TextParameters = ["tz", "horizon", "name", "open", "sensor"];

    [Fact]
    public async Task The_document_is_built_once_and_then_served_from_the_cache()
    {
        await _client.GetStringAsync("/openapi/v1.json");
        var again = await _client.GetAsync("/openapi/v1.json");
        Assert.True(again.Headers.Age is not null, "a second request should be answered from the output cache (Age header)");
    }

    private async Task<OpenApiDocument> Document()
    {
        await using var stream = await _client.GetStreamAsync("/openapi/v1.json");
        var result = await OpenApiDocument.LoadAsync(stream, "json", new OpenApiReaderSettings());
        Assert.Empty(result.Diagnostic?.Errors ?? []);
        return result.Document!;
    }

    private static IEnumerable<(string Operation, IOpenApiParameter Parameter)> Parameters(OpenApiDocument document) =>
        from path in document.Paths
        from operation in path.Value.Operations ?? []
        from parameter in operation.Value.Parameters ?? []
        select (operation.Value.OperationId ?? path.Key, parameter);

    [Fact]
    public async Task Every_numeric_parameter_is_typed_with_its_range()
    {
        var document = await Document();
        var numeric = Parameters(document).Where(p => NumericParameters.Contains(p.Parameter.Name)).ToList();
        // 9 operations take 53 numeric parameters: ephemeris 6, eclipse list 2, one eclipse 2, map 2, local 9, upcoming 9, photo plan 23.
        Assert.True(numeric.Count >= 53, $"only {numeric.Count} numeric parameters across the operations");
        foreach (var (operation, parameter) in numeric)
        {
            // A number that also takes a word (danjonL=reported) is a oneOf of the ranged number and the words.
            var schema = parameter.Schema!.OneOf?.FirstOrDefault(s => s.Type == JsonSchemaType.Number) ?? parameter.Schema!;
            Assert.True(schema.Type is JsonSchemaType.Number or JsonSchemaType.Integer, $"{operation}.{parameter.Name} is {schema.Type}");
            Assert.True(schema.Minimum is not null || schema.ExclusiveMinimum is not null, $"{operation}.{parameter.Name} has no minimum");
            Assert.NotNull(schema.Maximum);
        }
        // Spot values from the service's own documentation of its ranges (docs/api.md).
        var latitude = Parameters(document).First(p => p.Operation == "GetLocalCircumstances" && p.Parameter.Name == "lat").Parameter;
        Assert.Equal(("-90", "90", true), (latitude.Schema!.Minimum, latitude.Schema.Maximum, latitude.Required));
        var count = Parameters(document).First(p => p.Parameter.Name == "count").Parameter.Schema!;
        Assert.Equal((JsonSchemaType.Integer, "1", "50", 10), (count.Type!.Value, count.Minimum, count.Maximum, (int)count.Default!));
        // The upcoming search's year limit: 100 years unless asked for more, at most 1000 (docs/api.md).
        var years = Parameters(document).First(p => p.Operation == "ListUpcomingVisibleEclipses" && p.Parameter.Name == "years").Parameter.Schema!;
        Assert.Equal((JsonSchemaType.Integer, "1", "1000", 100), (years.Type!.Value, years.Minimum, years.Maximum, (int)years.Default!));
    }

    [Fact]
    public async Task Every_choice_is_an_enum_and_every_other_parameter_is_typed()
    {
        var document = await Document();
        foreach (var (operation, parameter) in Parameters(document))
        {
            var schema = parameter.Schema!;
            var where = $"{operation}.{parameter.Name}";
            if (ChoiceParameters.Contains(parameter.Name))
                Assert.True((schema.Enum ?? schema.Items?.Enum)?.Count > 0, $"{where} has no enum");
            else if (schema.Type == JsonSchemaType.String && schema.Format is null)
                Assert.True(TextParameters.Contains(parameter.Name) || parameter.Deprecated, $"{where} is untyped text");
        }
        var shadow = Parameters(document).First(p => p.Operation == "GetEclipse" && p.Parameter.Name == "shadow").Parameter.Schema!;
        Assert.Equal(["danjon", "chauvenet", "none", "layer"], shadow.Enum!.Select(e => e.GetValue<string>()));
        // measured only where the observers' log is used.
        foreach (var operation in new[] { "GetCraterTimings", "GetLocalCircumstances", "GetPhotoPlan" })
        {
            var measurable = Parameters(document).First(p => p.Operation == operation && p.Parameter.Name == "shadow").Parameter.Schema!;
            Assert.Equal(["danjon", "chauvenet", "none", "layer", "measured"], measurable.Enum!.Select(e => e.GetValue<string>()));
        }
        var danjonL = Parameters(document).First(p => p.Operation == "GetPhotoPlan" && p.Parameter.Name == "danjonL").Parameter.Schema!;
        Assert.Equal(["reported"], danjonL.OneOf!.Single(s => s.Type == JsonSchemaType.String).Enum!.Select(e => e.GetValue<string>()));
        var date = Parameters(document).First(p => p.Operation == "GetEclipse" && p.Parameter.Name == "date").Parameter;
        Assert.Equal(("date", ParameterLocation.Path), (date.Schema!.Format, date.In!.Value));
        Assert.Contains("1582-10-15", date.Description, StringComparison.Ordinal);
        var night = Parameters(document).First(p => p.Parameter.Name == "night").Parameter.Schema!;
        Assert.Equal(JsonSchemaType.Boolean, night.Type);
        var former = Parameters(document).First(p => p.Operation == "GetPhotoPlan" && p.Parameter.Name == "danjon").Parameter;
        Assert.True(former.Deprecated);
    }

    [Fact]
    public async Task Json_bodies_are_typed_like_the_query()
    {
        var document = await Document();
        var operations = document.Paths.SelectMany(p => p.Value.Operations ?? []).Select(o => o.Value).ToList();
        var photo = operations.Single(o => o.OperationId == "PostPhotoPlan").RequestBody!.Content!["application/json"].Schema!;
        Assert.Equal(JsonSchemaType.Number, photo.Properties!["iso"].Type);
        Assert.Equal(("25", "409600"), (photo.Properties["iso"].Minimum, photo.Properties["iso"].Maximum));
        Assert.Contains("pressure", photo.Properties.Keys);
        var batch = operations.Single(o => o.OperationId == "GetLocalCircumstancesForManySites").RequestBody!.Content!["application/json"].Schema!;
        var site = batch.Properties!["sites"].Items!;
        Assert.Equal(["lat", "lon"], site.Required!.Order());
        Assert.Equal(JsonSchemaType.Number, site.Properties!["temperature"].Type);
    }

    [Fact]
    public async Task Response_states_are_enums_and_the_health_probes_are_documented()
    {
        var document = await Document();
        var schemas = document.Components!.Schemas!;
        string[] Enum(string schema, string property) =>
            schemas[schema].Properties![property].Enum!.Where(e => e is not null).Select(e => e.GetValue<string>()).ToArray();
        Assert.Equal(["penumbral", "partial", "total"], Enum("EclipseResponse", "kind"));
        Assert.Equal(["day", "civil-twilight", "nautical-twilight", "astronomical-twilight", "night"], Enum("LocalContactResponse", "sky"));
        Assert.Equal(["day", "civil-twilight", "nautical-twilight", "astronomical-twilight", "night"], Enum("TrackPointResponse", "sky"));
        Assert.Equal(["rise", "set", "clears-horizon-profile", "hidden-by-horizon-profile"], Enum("MoonEventResponse", "type"));
        Assert.Equal(["penumbral", "partial", "total"], Enum("VisiblePhaseResponse", "phase"));
        Assert.Equal(["uneclipsed", "penumbral", "partial", "total"], Enum("TimelineRowResponse", "phase"));
        Assert.Contains("greatest", Enum("LocalContactResponse", "name"));
        Assert.Equal(["P1", "U1", "U2", "U3", "U4", "P4"], Enum("ContactResponse", "name"));
        // Every photo warning code the library defines, written by the one naming policy (kebab-case lower).
        Assert.Equal(
            ["moon-below-horizon", "low-altitude", "daylight", "twilight-sky", "sky-limits-exposure", "trailing", "leaving-frame",
                "aperture-closed", "iso-changed", "beyond-fastest-shutter", "beyond-slowest-shutter", "iso-out-of-range"],
            Enum("WarningResponse", "code"));
        foreach (var path in new[] { "/health/live", "/health/ready" })
            Assert.Contains(HttpMethod.Get, document.Paths[path].Operations!.Keys);
    }
}
