using System.Globalization;
using System.Text.Json.Nodes;
using LunarShadow.Api.Validation;
using Microsoft.AspNetCore.OpenApi;
using Microsoft.OpenApi;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Writes each operation's parameters and JSON body from the endpoint's <see cref="EndpointParameters"/>: numbers as
/// number or integer with their minimum, maximum and default, choices as enums, dates as format: date, instants as
/// date-time, booleans as boolean. The handlers read the same table, so the document and the validation cannot drift.
/// </summary>
internal sealed class ParameterTableTransformer : IOpenApiOperationTransformer
{
    public Task TransformAsync(OpenApiOperation operation, OpenApiOperationTransformerContext context, CancellationToken cancellationToken)
    {
        var table = context.Description.ActionDescriptor.EndpointMetadata.OfType<EndpointParameters>().LastOrDefault();
        if (table is null) return Task.CompletedTask;
        var parameters = new List<IOpenApiParameter>();
        foreach (var p in table.Query)
        {
            parameters.Add(ParameterOf(p, p.Name, deprecated: false));
            parameters.AddRange(p.FormerNames.Select(former => ParameterOf(p, former, deprecated: true)));
        }
        operation.Parameters = parameters;
        if (table.Body is not null)
        {
            var body = ObjectOf(table.Body);
            if (table.ListName is not null && table.ListItem is not null)
            {
                body.Properties![table.ListName] = new OpenApiSchema
                {
                    Type = JsonSchemaType.Array, Items = ObjectOf(table.ListItem), MinItems = 1, MaxItems = table.MaxListItems,
                    Description = $"The {table.ListName}, each an object of the same fields as the per-site query string.",
                };
                body.Required!.Add(table.ListName);
            }
            operation.RequestBody = new OpenApiRequestBody
            {
                Required = true,
                Description = "A JSON object with the same field names, types and ranges as the query string.",
                Content = new Dictionary<string, OpenApiMediaType> { ["application/json"] = new() { Schema = body } },
            };
        }
        return Task.CompletedTask;
    }

    private static OpenApiParameter ParameterOf(Parameter p, string name, bool deprecated)
    {
        var choiceList = p.Type == ParameterType.ChoiceList;
        return new OpenApiParameter
        {
            Name = name,
            In = p.Place == ParameterPlace.Path ? ParameterLocation.Path : ParameterLocation.Query,
            Required = p.Required && !deprecated,
            Deprecated = deprecated,
            Description = deprecated ? $"Deprecated former name of {p.Name}, accepted for one release: use {p.Name}." : Describe(p),
            Schema = SchemaOf(p),
            Style = choiceList ? ParameterStyle.Form : null,
            Explode = !choiceList,
        };
    }

    private static OpenApiSchema ObjectOf(IReadOnlyList<Parameter> fields)
    {
        var schema = new OpenApiSchema
        {
            Type = JsonSchemaType.Object,
            Properties = new Dictionary<string, IOpenApiSchema>(StringComparer.Ordinal),
            Required = new HashSet<string>(StringComparer.Ordinal),
        };
        foreach (var p in fields.Where(f => f.Place == ParameterPlace.Query))
        {
            var property = SchemaOf(p);
            property.Description = Describe(p);
            schema.Properties[p.Name] = property;
            foreach (var former in p.FormerNames)
            {
                var old = SchemaOf(p);
                old.Deprecated = true;
                old.Description = $"Deprecated former name of {p.Name}, accepted for one release: use {p.Name}.";
                schema.Properties[former] = old;
            }
            if (p.Required) schema.Required.Add(p.Name);
        }
        return schema;
    }

    /// <summary>The schema of one parameter's value.</summary>
    public static OpenApiSchema SchemaOf(Parameter p)
    {
        var schema = p.Type switch
        {
            ParameterType.Number => new OpenApiSchema { Type = JsonSchemaType.Number },
            ParameterType.Integer => new OpenApiSchema { Type = JsonSchemaType.Integer, Format = "int32" },
            ParameterType.Boolean => new OpenApiSchema { Type = JsonSchemaType.Boolean },
            ParameterType.Date => new OpenApiSchema
            {
                Type = JsonSchemaType.String, Format = "date", Pattern = @"^-?[0-9]{4,5}-[0-9]{2}-[0-9]{2}$",
            },
            ParameterType.Instant => new OpenApiSchema { Type = JsonSchemaType.String, Format = "date-time" },
            ParameterType.Choice => new OpenApiSchema { Type = JsonSchemaType.String, Enum = Names(p) },
            ParameterType.ChoiceList => new OpenApiSchema
            {
                Type = JsonSchemaType.Array, UniqueItems = true, Items = new OpenApiSchema { Type = JsonSchemaType.String, Enum = Names(p) },
            },
            ParameterType.NumberOrChoice => new OpenApiSchema
            {
                OneOf =
                [
                    new OpenApiSchema { Type = JsonSchemaType.Number, Minimum = Text(p.Minimum), Maximum = Text(p.Maximum) },
                    new OpenApiSchema { Type = JsonSchemaType.String, Enum = Names(p) },
                ],
            },
            _ => new OpenApiSchema { Type = JsonSchemaType.String, Pattern = p.Pattern, MaxLength = p.MaxLength },
        };
        if (p.Type is ParameterType.Number or ParameterType.Integer)
        {
            if (p.MinimumExclusive) schema.ExclusiveMinimum = Text(p.Minimum);
            else schema.Minimum = Text(p.Minimum);
            schema.Maximum = Text(p.Maximum);
        }
        schema.Default = p.Default switch
        {
            double d when p.Type == ParameterType.Integer => JsonValue.Create((int)d),
            double d => JsonValue.Create(d),
            int i => JsonValue.Create(i),
            bool b => JsonValue.Create(b),
            string s => JsonValue.Create(s),
            _ => null,
        };
        return schema;
    }

    /// <summary>The description with the unit, range and default spelled out for readers of the document.</summary>
    private static string Describe(Parameter p)
    {
        var text = p.Description;
        if (p.Type is ParameterType.Number or ParameterType.Integer or ParameterType.NumberOrChoice) text += $" {char.ToUpperInvariant(p.RangeText[0])}{p.RangeText[1..]}.";
        if (p.Type is ParameterType.Date) text += " Astronomers' calendar: Julian before 1582-10-15, year 0 = 1 BC, negative years allowed.";
        if (p.Allowed is { } allowed)
            text += $" {(p.Type == ParameterType.NumberOrChoice ? "Or one of" : "One of")}: {string.Join(", ", allowed)}{(p.Type == ParameterType.ChoiceList ? " (comma-separated)" : "")}.";
        if (p.Default is { } d) text += FormattableString.Invariant($" Default: {(d is bool b ? (b ? "true" : "false") : d)}.");
        return text;
    }

    private static List<JsonNode> Names(Parameter p) => p.Allowed!.Select(a => (JsonNode)JsonValue.Create(a)).ToList();

    private static string? Text(double? value) => value?.ToString("R", CultureInfo.InvariantCulture);
}
