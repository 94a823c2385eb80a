using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Sites;

/// <summary>What a site asks of the eclipses it wants listed.</summary>
/// <param name="MinimumPhase">At least this phase must be visible (partial includes total).</param>
/// <param name="AstronomicalNightOnly">Only count the part seen with the Sun more than 18° below the horizon.</param>
/// <param name="MinimumMoonAltitude">Only count the part with the Moon's upper limb at least this high.</param>
/// <param name="Hours">Only count the part inside these opening hours.</param>
public sealed record UpcomingCriteria(
    EclipsePhase MinimumPhase = EclipsePhase.Penumbral,
    bool AstronomicalNightOnly = false,
    Angle? MinimumMoonAltitude = null,
    OpeningHours? Hours = null);

/// <summary>An eclipse a site can see, with the stretches that met the criteria.</summary>
/// <param name="Local">Its local circumstances.</param>
/// <param name="Qualifying">The stretches of the chosen phase that meet every criterion.</param>
public sealed record UpcomingEclipse(LocalCircumstances Local, IReadOnlyList<VisibleSpan> Qualifying)
{
    /// <summary>Minutes that meet the criteria.</summary>
    public double QualifyingMinutes => Qualifying.Sum(q => q.Minutes);
}

/// <summary>The outcome of a bounded search for the eclipses a site can see.</summary>
/// <param name="Found">The eclipses found, in time order (at most the number asked for).</param>
/// <param name="SearchedUntil">The end of the window searched (exclusive): the year limit, or the end of the supported range.</param>
/// <param name="StoppedAtYearLimit">
/// True when fewer eclipses than asked for were found and the search stopped at its year limit before the end of the
/// supported range: later eclipses may still qualify. False when the count was reached or the whole range was searched.
/// </param>
public sealed record UpcomingSearch(IReadOnlyList<UpcomingEclipse> Found, TtInstant SearchedUntil, bool StoppedAtYearLimit);

/// <summary>The next eclipses a site can see, by its own criteria.</summary>
public static class UpcomingEclipses
{
    /// <summary>How many years a search looks ahead unless asked for more.</summary>
    public const int DefaultYearsAhead = 100;

    /// <summary>The longest look-ahead one search may ask for, in years.</summary>
    public const int MaxYearsAhead = 1000;

    private static readonly Angle AstronomicalNightSun = SkyStates.AstronomicalTwilightEndAltitude;

    /// <summary>
    /// The end (exclusive) of a window of <paramref name="yearsAhead"/> calendar years from <paramref name="from"/> (the
    /// same month, day and time that many years later), or the last day of the supported range when that comes first.
    /// </summary>
    public static TtInstant SearchEnd(TtInstant from, int yearsAhead)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(yearsAhead, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(yearsAhead, MaxYearsAhead);
        var start = from.JulianDate.ToCalendar();
        var end = JulianDate.FromCalendar(start.Year + yearsAhead, start.Month, start.Day);
        return TtInstant.FromJulianDate(Math.Min(end.Day, LastSearchDay));
    }

    private static double LastSearchDay => SupportedRange.End.Day - 1;

    /// <summary>
    /// Up to <paramref name="count"/> eclipses the site can see, searching at most <paramref name="yearsAhead"/> years from
    /// <paramref name="from"/>; says whether the search stopped at that limit. Stops when cancelled (checked per eclipse).
    /// </summary>
    public static UpcomingSearch Search(EclipseFinder finder, Site site, TimeScaleConverter time, TtInstant from, UpcomingCriteria criteria,
        int count, int yearsAhead, CancellationToken cancellationToken = default)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        var end = SearchEnd(from, yearsAhead);
        var found = Within(finder, site, time, from, end, criteria, cancellationToken).Take(count).ToList();
        return new UpcomingSearch(found, end, found.Count < count && end.JulianDate.Day < LastSearchDay);
    }

    /// <summary>
    /// Eclipses from <paramref name="from"/> on that the site can see, lazily, in time order, up to
    /// <see cref="MaxYearsAhead"/> years ahead; stops when cancelled.
    /// </summary>
    public static IEnumerable<UpcomingEclipse> From(EclipseFinder finder, Site site, TimeScaleConverter time, TtInstant from, UpcomingCriteria criteria,
        CancellationToken cancellationToken = default) =>
        Within(finder, site, time, from, SearchEnd(from, MaxYearsAhead), criteria, cancellationToken);

    private static IEnumerable<UpcomingEclipse> Within(EclipseFinder finder, Site site, TimeScaleConverter time, TtInstant from, TtInstant end,
        UpcomingCriteria criteria, CancellationToken cancellationToken)
    {
        var effectiveSite = criteria.MinimumMoonAltitude is { } min && min > site.MinimumAltitude ? site with { MinimumAltitude = min } : site;
        foreach (var eclipse in finder.Between(from, end, cancellationToken))
        {
            cancellationToken.ThrowIfCancellationRequested();
            var local = LocalCircumstancesCalculator.Compute(eclipse, effectiveSite, time);
            var spans = local.VisiblePhases.Where(p => p.Phase == criteria.MinimumPhase).ToList();
            if (spans.Count == 0) continue;
            if (criteria.AstronomicalNightOnly) spans = WithinAstronomicalNight(local, spans);
            if (criteria.Hours is not null) spans = PublicNightPlanner.Plan(local, criteria.Hours, time).PhasesInWindow.Where(p => p.Phase == criteria.MinimumPhase).ToList();
            if (criteria.AstronomicalNightOnly && criteria.Hours is not null) spans = WithinAstronomicalNight(local, spans);
            if (spans.Sum(s => s.Minutes) > 0) yield return new UpcomingEclipse(local, spans);
        }
    }

    private static List<VisibleSpan> WithinAstronomicalNight(LocalCircumstances local, List<VisibleSpan> spans)
    {
        var eclipse = local.Eclipse;
        var sky = new LocalSky(eclipse.NightSky, local.Site, local.DeltaTSeconds);
        var night = eclipse.NightSky;
        const double w = EclipseNightSky.HalfWidthHours - 0.5;
        var scan = new AltitudeCrossings(h => (AstronomicalNightSun.Radians - sky.SunAltitudeAt(h).Radians, 0), -w, w);
        double Dark(double value, double _) => value;
        var dark = scan.PositiveSpans(Dark, scan.Find(Dark, HorizonProfile.Flat));
        var result = new List<VisibleSpan>();
        foreach (var span in spans)
        {
            var (a, b) = (night.HoursFromCenter(span.StartTt), night.HoursFromCenter(span.EndTt));
            foreach (var (s, e) in dark)
            {
                var from = Math.Max(a, s);
                var to = Math.Min(b, e);
                if (to <= from) continue;
                var fromTt = from == a ? span.StartTt : night.InstantAt(from);
                var toTt = to == b ? span.EndTt : night.InstantAt(to);
                result.Add(span with
                {
                    StartTt = fromTt,
                    EndTt = toTt,
                    StartUtc = span.StartUtc.PlusTicks((long)Math.Round(fromTt.SecondsSince(span.StartTt) * 1e7)),
                    EndUtc = span.EndUtc.PlusTicks((long)Math.Round(toTt.SecondsSince(span.EndTt) * 1e7)),
                });
            }
        }
        return result;
    }
}
