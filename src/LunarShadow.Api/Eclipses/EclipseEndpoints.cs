using System.ComponentModel;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Embedded;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Eclipses;

/// <summary>GET /api/v1/eclipses and /api/v1/eclipses/{date}: global circumstances.</summary>
internal static class EclipseEndpoints
{
    /// <summary>Longest range one list request may span, in years.</summary>
    public const int MaxYearsPerRequest = 1000;

    private static readonly OutputFormat[] Formats = [OutputFormat.Json, OutputFormat.Csv];

    public static IEndpointRouteBuilder MapEclipseEndpoints(this IEndpointRouteBuilder routes)
    {
        var group = routes.MapGroup("/api/v1/eclipses").WithTags("Eclipses");
        group.MapGet("/", List)
            .WithName("ListEclipses")
            .WithSummary("Every lunar eclipse in a date range")
            .WithDescription("Global circumstances of each lunar eclipse whose greatest phase falls between from and to (inclusive, UTC dates, at most 1000 years apart). JSON by default; CSV with Accept: text/csv or format=csv.")
            .Produces<EclipseListResponse>(StatusCodes.Status200OK, "application/json", "text/csv")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status406NotAcceptable);
        group.MapGet("/{date}", One)
            .WithName("GetEclipse")
            .WithSummary("One lunar eclipse in full, by the UTC date of its greatest phase")
            .WithDescription("The eclipse whose greatest phase falls on the given UTC date (YYYY-MM-DD; Julian calendar before 1582-10-15, astronomical year numbering). 404 when there is none.")
            .Produces<EclipseResponse>(StatusCodes.Status200OK, "application/json", "text/csv")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status406NotAcceptable);
        return routes;
    }

    internal static IResult List(
        HttpRequest request,
        [Description("First UTC date, YYYY-MM-DD (Julian calendar before 1582-10-15; e.g. -0584-05-01), years −1999 to +3000.")] string? from,
        [Description("Last UTC date (inclusive), YYYY-MM-DD, at most 1000 years after from.")] string? to,
        [Description("Comma-separated kinds to keep: total, partial, penumbral (default: all).")] string? kind,
        [AsParameters] ModelParameters computation,
        [Description("Response format: json (default) or csv; overrides the Accept header.")] string? format)
    {
        var reader = new QueryReader();
        var first = reader.Date("from", from);
        var last = reader.Date("to", to);
        var kinds = ReadKinds(reader, kind);
        var (model, time) = computation.Read(reader);
        var output = ContentNegotiation.Choose(request, format, Formats, reader);
        if (first is { } f && last is { } l)
        {
            var span = DayOf(l) - DayOf(f);
            if (span < 0) reader.Fail("to", $"to must not be before from; got from={from}, to={to}.");
            else if (span > MaxYearsPerRequest * 365.25 + 1) reader.Fail("to", $"A request may span at most {MaxYearsPerRequest} years; from={from} to {to} spans {span / 365.25:0} years.");
        }
        if (!reader.IsValid || first is null || last is null) return Problems.InvalidQuery(reader);
        if (output is null) return Problems.NotAcceptable(Formats);

        var aborted = request.HttpContext.RequestAborted;
        var eclipses = request.FinderFor(model).OnUtcDates(first.Value, last.Value, time)
            .Select(e =>
            {
                aborted.ThrowIfCancellationRequested(); // honours the request timeout on long ranges
                return e;
            })
            .Where(e => kinds.Contains(e.Kind))
            .Select(e => EclipseMapping.ToResponse(e, time))
            .ToList();
        if (output == OutputFormat.Csv) return Results.Text(EclipseMapping.Csv(eclipses), ContentNegotiation.MediaType(OutputFormat.Csv));
        return TypedResults.Ok(new EclipseListResponse(model.Name, LayerKm(model), time.DeltaTModel.Name, from!.Trim(), to!.Trim(),
            eclipses.Count, eclipses, EmbeddedDataSet.VersionTag));
    }

    internal static IResult One(
        HttpRequest request,
        [Description("UTC date of greatest eclipse, YYYY-MM-DD (Julian calendar before 1582-10-15).")] string date,
        [AsParameters] ModelParameters computation,
        [Description("Response format: json (default) or csv; overrides the Accept header.")] string? format)
    {
        var reader = new QueryReader();
        var day = reader.Date("date", date);
        var (model, time) = computation.Read(reader);
        var output = ContentNegotiation.Choose(request, format, Formats, reader);
        if (EclipseLookup.Resolve(reader, day, date, output, Formats, request.FinderFor(model), time, out var eclipse) is { } problem) return problem;
        var response = EclipseMapping.ToResponse(eclipse, time);
        return output == OutputFormat.Csv
            ? Results.Text(EclipseMapping.Csv([response]), ContentNegotiation.MediaType(OutputFormat.Csv))
            : TypedResults.Ok(response);
    }

    private static double DayOf(CalendarDate date) => date.ToJulianDate().Day;

    private static double? LayerKm(ShadowModel model) => model.Kind == ShadowModelKind.Layer ? model.LayerHeightKm : null;

    private static HashSet<EclipseKind> ReadKinds(QueryReader reader, string? kind)
    {
        var all = new HashSet<EclipseKind> { EclipseKind.Penumbral, EclipseKind.Partial, EclipseKind.Total };
        if (string.IsNullOrWhiteSpace(kind)) return all;
        var chosen = new HashSet<EclipseKind>();
        foreach (var part in kind.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            switch (part.ToLowerInvariant())
            {
                case "total": chosen.Add(EclipseKind.Total); break;
                case "partial": chosen.Add(EclipseKind.Partial); break;
                case "penumbral": chosen.Add(EclipseKind.Penumbral); break;
                default:
                    reader.Fail("kind", $"kind must be a comma-separated list of total, partial, penumbral; got '{part}'.");
                    break;
            }
        }
        return chosen.Count == 0 ? all : chosen;
    }
}
