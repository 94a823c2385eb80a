using System.Reflection;
using System.Runtime.Loader;
using LunarShadow.Api.Tests.Support;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.OpenApi;
using Microsoft.OpenApi.Reader;
using NSwag.CodeGeneration.CSharp;

namespace LunarShadow.Api.Tests.Contract;

/// <summary>
/// Generates a C# client from /openapi/v1.json with a standard generator (NSwag), compiles it with Roslyn, and calls two
/// endpoints through it against the in-memory host: the document is good enough for a typed client.
/// </summary>
public class GeneratedClientTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    [Fact]
    public async Task A_client_generated_from_the_document_calls_the_service_with_typed_values()
    {
        var client = Activator.CreateInstance(await CompileClientType(), _client)!;

        // The total lunar eclipse of 2025 March 14: greatest eclipse 06:58:43 TD, Saros 123
        // (Espenak & Meeus 2009, Five Millennium Canon of Lunar Eclipses, NASA/TP-2009-214172).
        var eclipse = await Call(client, "GetEclipseAsync", new() { ["date"] = new DateTimeOffset(2025, 3, 14, 0, 0, 0, TimeSpan.Zero) });
        Assert.Equal("Total", Property(eclipse, "Kind")!.ToString());
        Assert.Equal(123, Property(Property(eclipse, "Saros")!, "Series"));

        // The same eclipse from New York (40.7° N, 74° W): P1 falls near 03:57 UT, local midnight, in full night
        // (P1 time from memory of the canon's table for 2025 March 14).
        var local = await Call(client, "GetLocalCircumstancesAsync", new()
        {
            ["date"] = new DateTimeOffset(2025, 3, 14, 0, 0, 0, TimeSpan.Zero), ["lat"] = 40.7, ["lon"] = -74.0, ["tz"] = "America/New_York",
        });
        Assert.Equal("America/New_York", Property(Property(local, "Site")!, "TimeZone"));
        var contacts = ((System.Collections.IEnumerable)Property(local, "Contacts")!).Cast<object>().ToList();
        Assert.Contains(contacts, c => Property(c, "Sky")!.ToString() == "Night");
        Assert.All(contacts, c => Assert.True(Enum.IsDefined(Property(c, "Name")!.GetType(), Property(c, "Name")!)));
    }

    private async Task<Type> CompileClientType()
    {
        // NSwag 14 reads OpenAPI 3.0: the 3.1 document is written down to 3.0 with Microsoft.OpenApi first.
        var json31 = await _client.GetStringAsync("/openapi/v1.json");
        var read = OpenApiDocument.Parse(json31, "json", new OpenApiReaderSettings());
        Assert.Empty(read.Diagnostic?.Errors ?? []);
        using var writer = new StringWriter();
        read.Document!.SerializeAsV3(new OpenApiJsonWriter(writer));
        var document = await NSwag.OpenApiDocument.FromJsonAsync(writer.ToString());
        var settings = new CSharpClientGeneratorSettings
        {
            ClassName = "LunarShadowClient",
            UseBaseUrl = false,
            GenerateClientInterfaces = false,
            CSharpGeneratorSettings = { Namespace = "Generated" },
        };
        var code = new CSharpClientGenerator(document, settings).GenerateFile();

        var references = ((string)AppContext.GetData("TRUSTED_PLATFORM_ASSEMBLIES")!).Split(Path.PathSeparator)
            .Append(typeof(Newtonsoft.Json.JsonConvert).Assembly.Location)
            .Distinct()
            .Select(path => MetadataReference.CreateFromFile(path));
        var compilation = CSharpCompilation.Create("GeneratedLunarShadowClient", [CSharpSyntaxTree.ParseText(code)], references,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, nullableContextOptions: NullableContextOptions.Enable));
        using var image = new MemoryStream();
        var emitted = compilation.Emit(image);
        Assert.True(emitted.Success, string.Join("\n", emitted.Diagnostics.Where(d => d.Severity == DiagnosticSeverity.Error).Take(10)));
        var assembly = new AssemblyLoadContext("generated-client", isCollectible: true).LoadFromStream(new MemoryStream(image.ToArray()));
        return assembly.GetType("Generated.LunarShadowClient")!;
    }

    // Calls a generated operation by name, passing the named arguments and the declared defaults for the rest.
    private static async Task<object> Call(object client, string method, Dictionary<string, object> arguments)
    {
        var operation = client.GetType().GetMethods().Single(m => m.Name == method && m.GetParameters().All(p => p.ParameterType != typeof(CancellationToken)));
        var values = operation.GetParameters()
            .Select(p => arguments.TryGetValue(p.Name!, out var v) ? v : p.HasDefaultValue ? p.DefaultValue : null)
            .ToArray();
        var task = (Task)operation.Invoke(client, values)!;
        await task;
        return task.GetType().GetProperty("Result")!.GetValue(task)!;
    }

    private static object? Property(object target, string name) =>
        target.GetType().GetProperty(name, BindingFlags.Public | BindingFlags.Instance)!.GetValue(target);
}
