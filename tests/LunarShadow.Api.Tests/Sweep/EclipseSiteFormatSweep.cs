using System.Collections.Concurrent;
using System.Diagnostics;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Sites;
using Xunit.Abstractions;
using static LunarShadow.Api.Tests.Sweep.SweepChecks;

namespace LunarShadow.Api.Tests.Sweep;

/// <summary>
/// Walks every eclipse of 1900–2100 × every sweep site × every output format through the library and the API's own
/// formatters, checking the invariants in <see cref="SweepChecks"/>. Prints how many cases ran.
/// </summary>
public class EclipseSiteFormatSweep(ITestOutputHelper output)
{
    [Fact]
    public void Every_eclipse_at_every_site_in_every_format_keeps_the_invariants()
    {
        var clock = Stopwatch.StartNew();
        var eclipses = SweepGrid.Eclipses;
        var sites = SweepGrid.Sites;
        // Five Millennium Canon (Espenak & Meeus 2009): the 20th and the 21st century hold 228 lunar eclipses each (from
        // memory), so 1900–2100 holds some 455–460 of every kind.
        Assert.InRange(SweepGrid.Eclipses.Count, 450, 465);
        Assert.Contains(eclipses, e => e.Kind == EclipseKind.Penumbral);
        Assert.Contains(eclipses, e => e.Kind == EclipseKind.Partial);
        Assert.Contains(eclipses, e => e.Kind == EclipseKind.Total);

        // The UTC date of each eclipse, as the API names it.
        var dates = eclipses.ToDictionary(e => e.Lunation, e => Api.Formatting.TimeFormats.UtcDate(SweepGrid.Time.ToUtc(e.GreatestEclipse)));
        var failures = new ConcurrentQueue<string>();
        long cases = 0, renderings = 0, plans = 0, allCombinationPlans = 0;
        var timings = new ConcurrentDictionary<string, long>();
        void Case(string kind, string what, Action check)
        {
            Interlocked.Increment(ref cases);
            var started = Stopwatch.GetTimestamp();
            try { check(); }
            catch (Exception ex) { failures.Enqueue($"{what}: {ex.GetType().Name}: {ex.Message}"); }
            var elapsed = Stopwatch.GetElapsedTime(started).Ticks;
            timings.AddOrUpdate(kind, elapsed, (_, t) => t + elapsed);
        }
        void Rendered(int n = 1) => Interlocked.Add(ref renderings, n);

        var pairs = eclipses.SelectMany(e => sites.Select(s => (Eclipse: e, Site: s))).ToList();

        Parallel.ForEach(pairs, new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount }, pair =>
        {
            var (eclipse, sweepSite) = pair;
            var site = sweepSite.Site;
            var name = $"{dates[eclipse.Lunation]} {sweepSite.Label}";
            LocalCircumstances? local = null;
            string? localCalendar = null;
            Case("local", $"{name} local", () =>
            {
                local = LocalCircumstancesCalculator.Compute(eclipse, site, SweepGrid.Time);
                ContactsOrdered(local);
                VisibleStretchesInsidePhaseAndMoonUp(local);
                var plan = sweepSite.Open is { } open ? PublicNightPlanner.Plan(local, open, SweepGrid.Time) : null;
                if (plan is not null)
                    foreach (var p in plan.PhasesInWindow)
                        Require(p.StartUtc >= plan.Window.Opens && p.EndUtc <= plan.Window.Closes, "public-night stretch outside the opening");
                var response = Renderings.Local(local, plan);
                foreach (var c in response.Contacts)
                {
                    LocalIsUtcPlusOffset(c.Utc, c.Local, site.TimeZone);
                    SkyMatchesSun(c);
                }
                foreach (var p in response.VisiblePhases)
                {
                    LocalIsUtcPlusOffset(p.StartUtc, p.StartLocal, site.TimeZone);
                    LocalIsUtcPlusOffset(p.EndUtc, p.EndLocal, site.TimeZone);
                }
                foreach (var m in response.MoonEvents) LocalIsUtcPlusOffset(m.Utc, m.Local, site.TimeZone);
                Renderings.Json(response);
                var rows = Readers.Csv(Renderings.LocalCsv(response));
                // One row per item, its kind first (docs/api.md): exactly one "contact" row per contact.
                Require(rows.Count(r => r[0] == "contact") == response.Contacts.Count, "CSV contact rows differ from the contacts");
                Readers.Csv(Renderings.SitesCsv([response]));
                var (status, ics) = Renderings.LocalCalendar(local, response);
                Require(status == 200, $"iCalendar status {status}");
                Require(Readers.Calendar(ics).Count == local.VisiblePhases.Count, "iCalendar events differ from the visible phases");
                localCalendar = ics;
                Rendered(4);
            });
            if (local is null || !local.AnyVisible) return;
            // Eclipses with an umbral phase (partial and total, where exposures span the widest range and trailing and
            // ISO changes arise): every mount × both camera set-ups, six plans per pair. Penumbral eclipses: both camera
            // set-ups with the mount cycling through all three across the grid, to keep the sweep's time in bounds.
            var visibleLocal = local;
            var parsedCalendars = new HashSet<string>(StringComparer.Ordinal);
            IEnumerable<Camera> setups = eclipse.Kind == EclipseKind.Penumbral
                ? SweepGrid.Cameras.Select((camera, c) => camera with
                {
                    Mount = SweepGrid.Mounts[(int)((Math.Abs(eclipse.Lunation) + sites.ToList().IndexOf(sweepSite) + c) % SweepGrid.Mounts.Count)],
                })
                : SweepGrid.Cameras.SelectMany(camera => SweepGrid.Mounts.Select(mount => camera with { Mount = mount }));
            foreach (var camera in setups)
            {
                if (eclipse.Kind != EclipseKind.Penumbral) Interlocked.Increment(ref allCombinationPlans);
                Case("photo", $"{name} photo {camera.FocalLengthMm:0}mm {camera.Mount}", () =>
                {
                    // A 15-minute step keeps the sweep fast; every visible contact still gets its row.
                    var plan = PhotoPlanner.Plan(visibleLocal, camera, new PhotoSettings(IntervalMinutes: 15), SweepGrid.Time);
                    var response = Renderings.Photo(plan);
                    PhotoPlan(plan, response);
                    Renderings.Json(response);
                    Require(Readers.Csv(Renderings.PhotoCsv(response)).Count == response.Timeline.Count, "photo CSV rows differ from the timeline");
                    Sequence(Renderings.PhotoSequence(response), plan.Camera);
                    // The photo plan's iCalendar is usually the site's, parsed above, and the mount does not change it;
                    // it is parsed once more for each distinct text.
                    var (status, ics) = Renderings.PhotoCalendar(plan);
                    Require(status == 200, $"photo iCalendar status {status}");
                    if (ics != localCalendar && parsedCalendars.Add(ics)) Readers.Calendar(ics);
                    Interlocked.Increment(ref plans);
                    Rendered(4);
                });
            }
        });

        // Upcoming: from 1900 on, every eclipse each site can see up to 2100 (and with opening hours, only inside them).
        Parallel.ForEach(sites, new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount }, s =>
        {
            // Sites with opening hours ask within them; the others ask for totality in astronomical night.
            foreach (var criteria in new[] { s.Open is null ? new UpcomingCriteria(EclipsePhase.Total, AstronomicalNightOnly: true) : new UpcomingCriteria(Hours: s.Open) })
            {
                Case("upcoming", $"upcoming {s.Label} {criteria.MinimumPhase}", () =>
                {
                    var end = SweepGrid.Tt(2101, 1, 1);
                    var found = UpcomingEclipses.From(EclipseFinder.For(eclipses[0].Model), s.Site, SweepGrid.Time, SweepGrid.Tt(1900, 1, 1), criteria)
                        .TakeWhile(u => u.Local.Eclipse.GreatestEclipse < end).ToList();
                    foreach (var u in found)
                    {
                        Require(u.Qualifying.Count > 0, "an upcoming eclipse without a qualifying stretch");
                        foreach (var q in u.Qualifying)
                            Require(u.Local.VisiblePhases.Any(v => v.StartTt.SecondsSince(q.StartTt) <= 1e-3 && q.EndTt.SecondsSince(v.EndTt) <= 1e-3), "qualifying stretch outside the visible phases");
                    }
                    var items = Renderings.UpcomingItems(found, s.Site);
                    foreach (var i in items) LocalIsUtcPlusOffset(i.GreatestEclipseUtc, i.GreatestEclipseLocal, s.Site.TimeZone);
                    Renderings.Json(items);
                    Require(Readers.Csv(Renderings.UpcomingCsv(items)).Count == items.Count, "upcoming CSV rows differ");
                    var (status, ics) = Renderings.UpcomingCalendar(found, s.Site);
                    Require(status == 200, $"upcoming iCalendar status {status}");
                    Require(Readers.Calendar(ics).Count == found.Count, "upcoming iCalendar events differ");
                    Rendered(3);
                });
            }
        });

        // The visibility map of every eclipse, as GeoJSON.
        Parallel.ForEach(eclipses, new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount }, e =>
        {
            var date = dates[e.Lunation];
            Case("map", $"{date} visibility map", () =>
            {
                var (status, body) = Renderings.VisibilityMap(date);
                Require(status == 200, $"visibility map status {status}: {body[..Math.Min(200, body.Length)]}");
                Require(Readers.GeoJson(body) > 0, "empty visibility map");
                Rendered();
            });
        });

        output.WriteLine($"Sweep: {eclipses.Count} eclipses × {sites.Count} sites = {pairs.Count} pairs; {plans} photo plans ({allCombinationPlans} of them every mount × both cameras on eclipses with an umbral phase); {cases} cases; {renderings} renderings; {failures.Count} failures; {clock.Elapsed.TotalSeconds:0.0} s.");
        output.WriteLine("Thread time by kind: " + string.Join(", ", timings.OrderBy(t => t.Key).Select(t => $"{t.Key} {TimeSpan.FromTicks(t.Value).TotalSeconds:0.0} s")));
        foreach (var f in failures.Take(40)) output.WriteLine(f);
        Assert.True(failures.IsEmpty, $"{failures.Count} of {cases} cases failed; first: {string.Join(" | ", failures.Take(5))}");
        Assert.True(cases >= pairs.Count + eclipses.Count, $"only {cases} cases ran");
    }
}
