using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Api.Sites;

/// <summary>GET /api/v1/sites/upcoming: the next eclipses a site can actually show.</summary>
internal static class UpcomingEndpoints
{
    /// <summary>Most eclipses one request may ask for.</summary>
    public const int MaxCount = 50;

    private static readonly FormatOffer Formats = new(OutputFormat.Json, OutputFormat.Csv, OutputFormat.Calendar);

    public static readonly Parameter From = new("from", ParameterType.Date, "First UTC date to search from, YYYY-MM-DD (default: today).");

    public static readonly Parameter Count = new("count", ParameterType.Integer, "How many eclipses to return.")
    {
        Unit = "eclipses", Minimum = 1, Maximum = MaxCount, Default = 10.0,
    };

    public static readonly Parameter Years = new("years", ParameterType.Integer,
        "How many years from `from` to search. The search stops there even when fewer than count eclipses were found, and the response says so (searchLimitReached); ask for more years to look further.")
    {
        Unit = "years", Minimum = 1, Maximum = UpcomingEclipses.MaxYearsAhead, Default = (double)UpcomingEclipses.DefaultYearsAhead,
    };

    public static readonly Parameter Phase = new("phase", ParameterType.Choice,
        "Least phase that must be visible: penumbral, partial (partial or total) or total.")
    {
        Allowed = WireNames.All<EclipsePhase>(), Default = "penumbral",
    };

    public static readonly Parameter Night = new("night", ParameterType.Boolean,
        "true to count only the part seen in astronomical night (Sun 18° or more below the horizon).")
    {
        Default = false,
    };

    public static IEndpointRouteBuilder MapUpcomingEndpoints(this IEndpointRouteBuilder routes)
    {
        routes.MapGet("/api/v1/sites/upcoming", Get)
            .WithTags("Sites")
            .WithName("ListUpcomingVisibleEclipses")
            .Takes(new EndpointParameters([.. Parameters.Site, From, Count, Years, Phase, Night, .. Parameters.Model, Formats.Parameter]))
            .WithSummary("The next eclipses a site can see")
            .WithDescription("The next count (up to 50) eclipses, searched for over the given years (100 unless asked for more, up to 1000) from a date, of which at least the chosen phase is visible above the horizon profile and minimum altitude, optionally only during astronomical night and within opening hours. JSON, CSV or iCalendar (a subscription feed).")
            .Produces<UpcomingResponse>(StatusCodes.Status200OK, "application/json", "text/csv", "text/calendar")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status406NotAcceptable);
        return routes;
    }

    internal static IResult Get(HttpRequest request, IClock clock)
    {
        var f = RequestFields.FromQuery(request, new QueryReader());
        var site = SiteParameters.Read(f);
        var start = f.Has(From) ? f.Date(From) : Today(clock);
        var wanted = f.Integer(Count)!.Value;
        var years = f.Integer(Years)!.Value;
        var phaseName = f.Choice(Phase)!;
        var nightOnly = f.Boolean(Night);
        var (model, time) = ModelChoice.Read(f);
        var output = Formats.Choose(request, f);
        if (start is { } s && s.Year > SupportedRange.LastYear - 1) f.Fail(From, $"from must be before {SupportedRange.LastYear}-01-01 to leave room to search.");
        if (!f.Reader.IsValid || site is null || start is null) return Problems.InvalidQuery(f.Reader);
        if (output is null) return Problems.NotAcceptable(Formats.Formats);

        var criteria = new UpcomingCriteria(Enum.GetValues<EclipsePhase>().First(p => WireNames.Of(p) == phaseName), nightOnly, null, site.Hours);
        var startTt = TtInstant.FromJulianDate(start.Value.ToJulianDate().Day);
        var aborted = request.HttpContext.RequestAborted;
        // Stops at the request's deadline or when the client goes away (checked per eclipse scanned), and at the year limit.
        var search = UpcomingEclipses.Search(request.FinderFor(model), site.Site, time, startTt, criteria, wanted, years, aborted);
        var found = search.Found;
        var items = found.Select(u => Item(u, site.Site, time)).ToList();
        var searchedUntil = search.SearchedUntil.JulianDate.ToCalendar().ToIsoDateString();
        var note = items.Count >= wanted ? null
            : search.StoppedAtYearLimit
                ? $"Only {items.Count} such eclipses in the {years} years searched (before {searchedUntil}); later ones may qualify: ask for more years (up to {UpcomingEclipses.MaxYearsAhead})."
                : $"Only {items.Count} such eclipses up to the end of the supported range (the year {SupportedRange.LastYear}).";
        var abbreviations = found.SelectMany(u => LocalDates.Abbreviations(u.Local.Outline.Night, site.Site.TimeZone)).Distinct().ToList();
        var response = new UpcomingResponse(LocalMapping.Echo(site.Site, abbreviations),
            new UpcomingCriteriaEcho(start.Value.ToIsoDateString(), wanted, phaseName, criteria.AstronomicalNightOnly, site.Site.MinimumAltitude.Degrees, f.Raw(Parameters.Open)?.Trim(), model.Name, years),
            items.Count, items, note, searchedUntil, search.StoppedAtYearLimit);

        if (output == OutputFormat.Calendar)
        {
            if (UpcomingFormats.ICalendar(found, items, site.Site, SiteWording.Criteria(response.Criteria.Phase, response.Criteria.MinAltitudeDegrees, response.Criteria.AstronomicalNightOnly, response.Criteria.Open), clock.GetCurrentInstant()) is { } text)
                return Results.Text(text, ContentNegotiation.MediaType(OutputFormat.Calendar)).AsAttachment(UpcomingFormats.FileName(response.Site, OutputFormat.Calendar));
            f.Reader.Fail("format", "iCalendar covers Gregorian dates from 1583 to 9999 only; ask for json or csv.");
            return Problems.InvalidQuery(f.Reader);
        }
        return output == OutputFormat.Csv
            ? Results.Text(UpcomingFormats.Csv(items), ContentNegotiation.MediaType(OutputFormat.Csv)).AsAttachment(UpcomingFormats.FileName(response.Site, OutputFormat.Csv))
            : TypedResults.Ok(response);
    }

    private static CalendarDate? Today(IClock clock)
    {
        var today = clock.GetCurrentInstant().InUtc().Date;
        return new CalendarDate(today.Year, today.Month, today.Day, true);
    }

    /// <summary>One entry of the list: the eclipse, its night and greatest eclipse, and the stretches that qualify.</summary>
    internal static UpcomingItem Item(UpcomingEclipse u, Site site, TimeScaleConverter time)
    {
        var full = LocalMapping.ToResponse(u.Local, time, null);
        var greatest = time.ToUtc(u.Local.Eclipse.GreatestEclipse);
        return new UpcomingItem(full.Eclipse.Date, full.Eclipse.Kind, full.Night, TimeFormats.Utc(greatest), TimeFormats.Local(greatest, site.TimeZone).Text,
            TimeFormats.Round(u.QualifyingMinutes, 2), u.Qualifying.Select(q => LocalMapping.Phase(q, site.TimeZone)).ToList(),
            full.GreatestVisibleUmbralMagnitude, full.Summary);
    }
}
