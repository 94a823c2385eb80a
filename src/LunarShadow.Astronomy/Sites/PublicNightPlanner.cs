using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Sites;

/// <summary>Fits an eclipse's visible phases into an observatory's opening hours and suggests a session.</summary>
public static class PublicNightPlanner
{
    /// <summary>Doors open this long before the first moment worth showing, and close this long after the last.</summary>
    public static readonly Duration Lead = Duration.FromMinutes(15);

    // Common practice: penumbral shading is noticeable to the eye only when most of the Moon's diameter is immersed
    // (penumbral magnitude above about 0.7), and then only within about half an hour of greatest eclipse.
    private const double NoticeablePenumbralMagnitude = 0.7;
    private static readonly Duration NoticeablePenumbralHalfWidth = Duration.FromMinutes(30);

    /// <summary>The plan for an eclipse at a site with the given opening hours.</summary>
    public static PublicNightPlan Plan(LocalCircumstances local, OpeningHours hours, TimeScaleConverter time)
    {
        var zone = local.Site.TimeZone;
        var eclipse = local.Eclipse;
        var greatestUtc = time.ToUtc(eclipse.GreatestEclipse);
        var day = greatestUtc.InZone(zone).Date;
        var windows = hours.Windows(zone, day.PlusDays(-1), day.PlusDays(1)).ToList();
        var visible = local.VisiblePhases.Where(p => p.Phase == EclipsePhase.Penumbral).ToList();
        var window = windows.MaxBy(w => visible.Sum(v => Overlap(w, v.StartUtc, v.EndUtc).TotalSeconds)) is { } best
            && visible.Sum(v => Overlap(best, v.StartUtc, v.EndUtc).TotalSeconds) > 0
            ? best
            : windows.MinBy(w => Math.Abs((Mid(w) - greatestUtc).TotalSeconds))!;

        var inWindow = new List<VisibleSpan>();
        foreach (var span in local.VisiblePhases)
        {
            var start = Max(span.StartUtc, window.Opens);
            var end = Min(span.EndUtc, window.Closes);
            if (end <= start) continue;
            inWindow.Add(span with
            {
                StartUtc = start,
                EndUtc = end,
                StartTt = span.StartTt.PlusSeconds((start - span.StartUtc).TotalSeconds),
                EndTt = span.EndTt.PlusSeconds((end - span.EndUtc).TotalSeconds),
            });
        }

        var showable = Showable(local, greatestUtc, window).ToList();
        if (showable.Count == 0)
        {
            var outcome = !local.AnyVisible ? PublicNightOutcome.NothingVisible
                : inWindow.Count == 0 ? PublicNightOutcome.OutsideOpeningHours
                : PublicNightOutcome.OnlyFaintPenumbra;
            return new PublicNightPlan(window, inWindow, null, outcome);
        }

        var doorsOpen = Max(window.Opens, showable[0].Start - Lead);
        var doorsClose = Min(window.Closes, showable[^1].End + Lead);
        var sky = new LocalSky(eclipse.NightSky, local.Site, local.DeltaTSeconds);
        var night = eclipse.NightSky;
        double HoursAt(Instant utc) => night.HoursFromCenter(eclipse.GreatestEclipse) + (utc - greatestUtc).TotalHours;
        var session = new SuggestedSession(doorsOpen, doorsClose,
            sky.MoonAt(Math.Clamp(HoursAt(doorsOpen), -EclipseNightSky.HalfWidthHours, EclipseNightSky.HalfWidthHours)).ApparentAltitude,
            sky.MoonAt(Math.Clamp(HoursAt(doorsClose), -EclipseNightSky.HalfWidthHours, EclipseNightSky.HalfWidthHours)).ApparentAltitude);
        return new PublicNightPlan(window, inWindow, session, PublicNightOutcome.Session);
    }

    private static IEnumerable<(Instant Start, Instant End)> Showable(LocalCircumstances local, Instant greatestUtc, OpeningWindow window)
    {
        var spans = local.VisiblePhases.Where(p => p.Phase == EclipsePhase.Partial).Select(p => (p.StartUtc, p.EndUtc)).ToList();
        if (spans.Count == 0 && local.Eclipse.PenumbralMagnitude >= NoticeablePenumbralMagnitude)
        {
            var (a, b) = (greatestUtc - NoticeablePenumbralHalfWidth, greatestUtc + NoticeablePenumbralHalfWidth);
            spans = local.VisiblePhases.Where(p => p.Phase == EclipsePhase.Penumbral)
                .Select(p => (Max(p.StartUtc, a), Min(p.EndUtc, b))).Where(s => s.Item2 > s.Item1).ToList();
        }
        foreach (var (start, end) in spans)
        {
            var s = Max(start, window.Opens);
            var e = Min(end, window.Closes);
            if (e > s) yield return (s, e);
        }
    }

    private static Duration Overlap(OpeningWindow w, Instant start, Instant end)
    {
        var s = Max(w.Opens, start);
        var e = Min(w.Closes, end);
        return e > s ? e - s : Duration.Zero;
    }

    private static Instant Mid(OpeningWindow w) => w.Opens + (w.Closes - w.Opens) / 2;

    private static Instant Max(Instant a, Instant b) => a > b ? a : b;

    private static Instant Min(Instant a, Instant b) => a < b ? a : b;
}
