using LunarShadow.Api.Formatting;
using LunarShadow.Api.Common;
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

    private static readonly FormatOffer Formats = new(OutputFormat.Json, OutputFormat.Csv);

    public static readonly Parameter From = new("from", ParameterType.Date,
        $"First UTC date of greatest eclipse, YYYY-MM-DD, years {SupportedRange.FirstYear} to +{SupportedRange.LastYear}.") { Required = true };

    public static readonly Parameter To = new("to", ParameterType.Date,
        $"Last UTC date of greatest eclipse (inclusive), YYYY-MM-DD, at most {MaxYearsPerRequest} years after from.") { Required = true };

    public static readonly Parameter Kind = new("kind", ParameterType.ChoiceList, "Kinds of eclipse to keep (default: all).")
    {
        Allowed = WireNames.All<EclipseKind>(),
    };

    public static IEndpointRouteBuilder MapEclipseEndpoints(this IEndpointRouteBuilder routes)
    {
        var group = routes.MapGroup("/api/v1/eclipses").WithTags("Eclipses");
        group.MapGet("/", List)
            .WithName("ListEclipses")
            .WithSummary("Every lunar eclipse in a date range")
            .WithDescription("Global circumstances of each lunar eclipse whose greatest phase falls between from and to (inclusive, UTC dates, at most 1000 years apart). JSON by default; CSV with Accept: text/csv or format=csv.")
            .Takes(new EndpointParameters([From, To, Kind, .. Parameters.Model, Formats.Parameter]))
            .Produces<EclipseListResponse>(StatusCodes.Status200OK, "application/json", "text/csv")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status406NotAcceptable);
        group.MapGet("/{date}", One)
            .WithName("GetEclipse")
            .WithSummary("One lunar eclipse in full, by the UTC date of its greatest phase")
            .WithDescription("The eclipse whose greatest phase falls on the given UTC date (YYYY-MM-DD; Julian calendar before 1582-10-15, astronomical year numbering). 404 when there is none.")
            .Takes(new EndpointParameters([Parameters.EclipseDate, .. Parameters.Model, Formats.Parameter]))
            .Produces<EclipseResponse>(StatusCodes.Status200OK, "application/json", "text/csv")
            .ProducesEclipseProblems();
        return routes;
    }

    internal static IResult List(HttpRequest request)
    {
        var f = RequestFields.FromQuery(request, new QueryReader());
        var first = f.Date(From);
        var last = f.Date(To);
        var kinds = f.Choices(Kind);
        var (model, time) = ModelChoice.Read(f);
        var output = Formats.Choose(request, f);
        if (first is { } a && last is { } b)
        {
            var span = DayOf(b) - DayOf(a);
            if (span < 0) f.Fail(To, $"to must not be before from; got from={a.ToIsoDateString()}, to={b.ToIsoDateString()}.");
            else if (span > MaxYearsPerRequest * 365.25 + 1) f.Fail(To, $"A request may span at most {MaxYearsPerRequest} years; from={a.ToIsoDateString()} to {b.ToIsoDateString()} spans {span / 365.25:0} years.");
        }
        if (!f.Reader.IsValid || first is null || last is null) return Problems.InvalidQuery(f.Reader);
        if (output is null) return Problems.NotAcceptable(Formats.Formats);

        var aborted = request.HttpContext.RequestAborted;
        var eclipses = EclipseLookup.InDateRange(model, time, DayOf(first.Value), DayOf(last.Value) + 1)
            .Select(e =>
            {
                aborted.ThrowIfCancellationRequested(); // honours the request timeout on long ranges
                return e;
            })
            .Where(e => kinds.Contains(WireNames.Of(e.Kind)))
            .Select(e => EclipseMapping.ToResponse(e, time))
            .ToList();
        if (output == OutputFormat.Csv) return Results.Text(EclipseMapping.Csv(eclipses), ContentNegotiation.MediaType(OutputFormat.Csv));
        return TypedResults.Ok(new EclipseListResponse(model.Name, LayerKm(model), time.DeltaTModel.Name, f.Raw(From)!.Trim(), f.Raw(To)!.Trim(),
            eclipses.Count, eclipses, EmbeddedDataSet.VersionTag));
    }

    internal static IResult One(HttpRequest request)
    {
        var f = RequestFields.FromQuery(request, new QueryReader());
        var r = EclipseLookup.Read(request, f, Formats);
        if (EclipseLookup.Resolve(f, r, Formats, out var eclipse) is { } problem) return problem;
        var response = EclipseMapping.ToResponse(eclipse, r.Time);
        return r.Output == OutputFormat.Csv
            ? Results.Text(EclipseMapping.Csv([response]), ContentNegotiation.MediaType(OutputFormat.Csv))
            : TypedResults.Ok(response);
    }

    private static double DayOf(CalendarDate date) => JulianDate.FromCalendar(date.Year, date.Month, date.Day, date.IsGregorian).Day;

    private static double? LayerKm(ShadowModel model) => model.Kind == ShadowModelKind.Layer ? model.LayerHeightKm : null;
}
