using System.ComponentModel;
using LunarShadow.Api.Eclipses;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;
using NodaTime;

namespace LunarShadow.Api.Sites;

/// <summary>GET /api/v1/sites/upcoming: the next eclipses a site can actually show.</summary>
internal static class UpcomingEndpoints
{
    /// <summary>Most eclipses one request may ask for.</summary>
    public const int MaxCount = 50;

    private static readonly OutputFormat[] Formats = [OutputFormat.Json, OutputFormat.Csv, OutputFormat.Calendar];

    public static IEndpointRouteBuilder MapUpcomingEndpoints(this IEndpointRouteBuilder routes)
    {
        routes.MapGet("/api/v1/sites/upcoming", Get)
            .WithTags("Sites")
            .WithName("ListUpcomingVisibleEclipses")
            .WithSummary("The next eclipses a site can see")
            .WithDescription("The next count (up to 50) eclipses from a date of which at least the chosen phase is visible above the horizon profile and minimum altitude, optionally only during astronomical night and within opening hours. JSON, CSV or iCalendar (a subscription feed).")
            .Produces<UpcomingResponse>(StatusCodes.Status200OK, "application/json", "text/csv", "text/calendar")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status406NotAcceptable);
        return routes;
    }

    internal static IResult Get(
        HttpRequest request,
        [Description(SiteQuery.LatitudeDescription)] string? lat,
        [Description(SiteQuery.LongitudeDescription)] string? lon,
        [Description(SiteQuery.ElevationDescription)] string? elevation,
        [Description(SiteQuery.TimeZoneDescription)] string? tz,
        [Description(SiteQuery.MinAltitudeDescription + " Only the part with the Moon at least this high counts.")] string? minAltitude,
        [Description(SiteQuery.HorizonDescription)] string? horizon,
        [Description(SiteQuery.NameDescription)] string? name,
        [Description("First UTC date to search from, YYYY-MM-DD (default: today).")] string? from,
        [Description("How many eclipses, 1 to 50 (default 10).")] string? count,
        [Description("Least phase that must be visible: penumbral (default), partial (partial or total) or total.")] string? phase,
        [Description("true to count only the part seen in astronomical night (Sun 18° or more below the horizon).")] string? night,
        [Description(OpeningQuery.Description + " Only the part inside counts.")] string? open,
        [AsParameters] ModelParameters computation,
        [Description("Response format: json (default), csv or ics; overrides the Accept header.")] string? format,
        IClock clock)
    {
        var reader = new QueryReader();
        var site = SiteQuery.Read(reader, new SiteFields(lat, lon, elevation, tz, minAltitude, horizon, Name: name), required: true);
        var start = string.IsNullOrWhiteSpace(from) ? Today(clock) : reader.Date("from", from);
        var wanted = (int)(reader.Number("count", count, 1, MaxCount, "eclipses") ?? 10);
        if (!string.IsNullOrWhiteSpace(count) && !int.TryParse(count, out _)) reader.Fail("count", $"count must be a whole number from 1 to {MaxCount}; got '{count}'.");
        var phaseName = reader.OneOf("phase", phase, ["penumbral", "partial", "total"]) ?? "penumbral";
        var nightName = reader.OneOf("night", night, ["true", "false"]);
        var hours = OpeningQuery.Read(reader, open);
        var (model, time) = computation.Read(reader);
        var output = ContentNegotiation.Choose(request, format, Formats, reader);
        if (start is { } s && s.Year > SupportedRange.LastYear - 1) reader.Fail("from", $"from must be before {SupportedRange.LastYear}-01-01 to leave room to search.");
        if (!reader.IsValid || site is null || start is null) return Problems.InvalidQuery(reader);
        if (output is null) return Problems.NotAcceptable(Formats);

        var criteria = new UpcomingCriteria(
            phaseName switch { "total" => EclipsePhase.Total, "partial" => EclipsePhase.Partial, _ => EclipsePhase.Penumbral },
            nightName == "true", null, hours);
        var startTt = TtInstant.FromJulianDate(JulianDate.FromCalendar(start.Value.Year, start.Value.Month, start.Value.Day, start.Value.IsGregorian).Day);
        var aborted = request.HttpContext.RequestAborted;
        var found = UpcomingEclipses.From(EclipseFinder.For(model), site, time, startTt, criteria)
            .Select(u =>
            {
                aborted.ThrowIfCancellationRequested(); // honours the request timeout on long searches
                return u;
            })
            .Take(wanted).ToList();
        var items = found.Select(u => Item(u, site, time)).ToList();
        var note = items.Count < wanted
            ? $"Only {items.Count} such eclipses in the {UpcomingEclipses.MaxYearsAhead} years searched (or up to the year {SupportedRange.LastYear})."
            : null;
        var response = new UpcomingResponse(LocalMapping.Echo(site),
            new UpcomingCriteriaEcho(start.Value.ToIsoDateString(), wanted, phaseName, criteria.AstronomicalNightOnly, site.MinimumAltitude.Degrees, open?.Trim(), model.Name),
            items.Count, items, note);

        return output switch
        {
            OutputFormat.Csv => Results.Text(Csv(items), ContentNegotiation.MediaType(OutputFormat.Csv)),
            OutputFormat.Calendar => Calendar(found, site, time, reader),
            _ => TypedResults.Ok(response),
        };
    }

    internal static UpcomingItem Item(UpcomingEclipse u, Site site, TimeScaleConverter time)
    {
        var full = LocalMapping.ToResponse(u.Local, time, null);
        var greatest = time.ToUtc(u.Local.Eclipse.GreatestEclipse);
        return new UpcomingItem(full.Eclipse.Date, full.Eclipse.Kind, TimeFormats.Utc(greatest), TimeFormats.Local(greatest, site.TimeZone).Text,
            TimeFormats.Round(u.QualifyingMinutes, 2), u.Qualifying.Select(q => LocalMapping.Phase(q, site.TimeZone)).ToList(),
            full.MaxVisibleUmbralMagnitude, full.Summary);
    }

    private static CalendarDate? Today(IClock clock)
    {
        var today = clock.GetCurrentInstant().InUtc().Date;
        return new CalendarDate(today.Year, today.Month, today.Day, true);
    }

    internal static string Csv(IEnumerable<UpcomingItem> items)
    {
        var csv = new CsvWriter().Row("date", "kind", "greatest_utc", "greatest_local", "qualifying_minutes", "first_qualifying_utc", "last_qualifying_utc", "max_visible_umbral_magnitude", "summary");
        foreach (var i in items)
            csv.Row(i.Date, i.Kind, i.GreatestEclipseUtc, i.GreatestEclipseLocal, i.QualifyingMinutes, i.Qualifying.Count > 0 ? i.Qualifying[0].StartUtc : null,
                i.Qualifying.Count > 0 ? i.Qualifying[^1].EndUtc : null, i.MaxVisibleUmbralMagnitude?.Value, i.Summary);
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
            var kind = EclipseMapping.KindName(u.Local.Eclipse.Kind);
            calendar.Event(FormattableString.Invariant($"{date}-{site.Location.Latitude.Degrees:0.####}-{site.Location.Longitude.Degrees:0.####}@lunarshadow"),
                time.ToUtc(u.Local.Eclipse.GreatestEclipse), start, end, $"Lunar eclipse ({kind}) visible", u.Local.Summary, where,
                (site.Location.Latitude.Degrees, site.Location.Longitude.Degrees), LocalFormats.AlarmMinutes);
        }
        return Results.Text(calendar.Finish(), ContentNegotiation.MediaType(OutputFormat.Calendar));
    }
}
