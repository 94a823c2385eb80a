using LunarShadow.Api.Formatting;
using LunarShadow.Api.Common;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
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
            .Takes(new EndpointParameters([.. Parameters.Site, From, Count, Phase, Night, .. Parameters.Model, Formats.Parameter]))
            .WithSummary("The next eclipses a site can see")
            .WithDescription("The next count (up to 50) eclipses from a date of which at least the chosen phase is visible above the horizon profile and minimum altitude, optionally only during astronomical night and within opening hours. JSON, CSV or iCalendar (a subscription feed).")
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
        var phaseName = f.Choice(Phase)!;
        var nightOnly = f.Boolean(Night);
        var (model, time) = ModelChoice.Read(f);
        var output = Formats.Choose(request, f);
        if (start is { } s && s.Year > SupportedRange.LastYear - 1) f.Fail(From, $"from must be before {SupportedRange.LastYear}-01-01 to leave room to search.");
        if (!f.Reader.IsValid || site is null || start is null) return Problems.InvalidQuery(f.Reader);
        if (output is null) return Problems.NotAcceptable(Formats.Formats);

        var criteria = new UpcomingCriteria(Enum.GetValues<EclipsePhase>().First(p => WireNames.Of(p) == phaseName), nightOnly, null, site.Hours);
        var startTt = TtInstant.FromJulianDate(JulianDate.FromCalendar(start.Value.Year, start.Value.Month, start.Value.Day, start.Value.IsGregorian).Day);
        var aborted = request.HttpContext.RequestAborted;
        var found = UpcomingEclipses.From(EclipseFinder.For(model), site.Site, time, startTt, criteria)
            .Select(u =>
            {
                aborted.ThrowIfCancellationRequested(); // honours the request timeout on long searches
                return u;
            })
            .Take(wanted).ToList();
        var items = found.Select(u => Item(u, site.Site, time)).ToList();
        var note = items.Count < wanted
            ? $"Only {items.Count} such eclipses in the {UpcomingEclipses.MaxYearsAhead} years searched (or up to the year {SupportedRange.LastYear})."
            : null;
        var response = new UpcomingResponse(LocalMapping.Echo(site.Site),
            new UpcomingCriteriaEcho(start.Value.ToIsoDateString(), wanted, phaseName, criteria.AstronomicalNightOnly, site.Site.MinimumAltitude.Degrees, f.Raw(Parameters.Open)?.Trim(), model.Name),
            items.Count, items, note);

        return output switch
        {
            OutputFormat.Csv => Results.Text(Csv(items), ContentNegotiation.MediaType(OutputFormat.Csv)),
            OutputFormat.Calendar => Calendar(found, site.Site, time, f.Reader),
            _ => TypedResults.Ok(response),
        };
    }

    private static CalendarDate? Today(IClock clock)
    {
        var today = clock.GetCurrentInstant().InUtc().Date;
        return new CalendarDate(today.Year, today.Month, today.Day, true);
    }

    internal static UpcomingItem Item(UpcomingEclipse u, Site site, TimeScaleConverter time)
    {
        var full = LocalMapping.ToResponse(u.Local, time, null);
        var greatest = time.ToUtc(u.Local.Eclipse.GreatestEclipse);
        return new UpcomingItem(full.Eclipse.Date, full.Eclipse.Kind, TimeFormats.Utc(greatest), TimeFormats.Local(greatest, site.TimeZone).Text,
            TimeFormats.Round(u.QualifyingMinutes, 2), u.Qualifying.Select(q => LocalMapping.Phase(q, site.TimeZone)).ToList(),
            full.GreatestVisibleUmbralMagnitude, full.Summary);
    }

    internal static string Csv(IEnumerable<UpcomingItem> items)
    {
        var csv = new CsvWriter().Row("date", "kind", "greatest_utc", "greatest_local", "qualifying_minutes", "first_qualifying_utc", "last_qualifying_utc", "max_visible_umbral_magnitude", "summary");
        foreach (var i in items)
            csv.Row(i.Date, i.Kind, i.GreatestEclipseUtc, i.GreatestEclipseLocal, i.QualifyingMinutes, i.Qualifying.Count > 0 ? i.Qualifying[0].StartUtc : null,
                i.Qualifying.Count > 0 ? i.Qualifying[^1].EndUtc : null, i.GreatestVisibleUmbralMagnitude?.Value, i.Summary);
        return csv.ToString();
    }

    // A subscription feed: one event per eclipse, spanning its qualifying stretches, with an alarm.
    internal static IResult Calendar(List<UpcomingEclipse> found, Site site, TimeScaleConverter time, QueryReader reader)
    {
        if (found.Any(u => u.Qualifying.Any(q => !ICalendarWriter.CanWrite(q.StartUtc))))
        {
            reader.Fail("format", "iCalendar covers Gregorian dates from 1583 to 9999 only; ask for json or csv.");
            return Problems.InvalidQuery(reader);
        }
        var where = site.Name ?? FormattableString.Invariant($"{site.Location.Latitude.Degrees:0.####}, {site.Location.Longitude.Degrees:0.####}");
        var calendar = new ICalendarWriter($"Lunar eclipses visible from {where}");
        foreach (var u in found)
        {
            var start = u.Qualifying.Min(q => q.StartUtc);
            var end = u.Qualifying.Max(q => q.EndUtc);
            var date = TimeFormats.UtcDate(time.ToUtc(u.Local.Eclipse.GreatestEclipse));
            var kind = WireNames.Of(u.Local.Eclipse.Kind);
            calendar.Event(FormattableString.Invariant($"{date}-{site.Location.Latitude.Degrees:0.####}-{site.Location.Longitude.Degrees:0.####}@lunarshadow"),
                time.ToUtc(u.Local.Eclipse.GreatestEclipse), start, end, $"Lunar eclipse ({kind}) visible", u.Local.Summary, where,
                (site.Location.Latitude.Degrees, site.Location.Longitude.Degrees), LocalFormats.AlarmMinutes);
        }
        return Results.Text(calendar.Finish(), ContentNegotiation.MediaType(OutputFormat.Calendar));
    }
}
