using System.Diagnostics;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;
using Xunit.Abstractions;

namespace LunarShadow.Astronomy.Tests.Eclipses;

/// <summary>The crater timings of every eclipse of 1900–2100 and a sample of the whole span, under every shadow model.</summary>
public sealed class CraterSweep
{
    public static readonly ShadowModel[] Models = [ShadowModel.Danjon, ShadowModel.Chauvenet, ShadowModel.Geometric, ShadowModel.Layer()];

    public CraterSweep()
    {
        var watch = Stopwatch.StartNew();
        var windows = new List<(double From, double To)> { (JulianDate.FromCalendar(1900, 1, 1).Day, JulianDate.FromCalendar(2101, 1, 1).Day) };
        // A sample of the span −1999…+3000: two years every 250 years.
        for (var year = -1999; year < 3000; year += 250)
            windows.Add((JulianDate.FromCalendar(year, 1, 1, year >= 1583).Day, JulianDate.FromCalendar(year + 2, 1, 1, year + 2 >= 1583).Day));
        foreach (var model in Models)
        {
            foreach (var (from, to) in windows)
            {
                var search = Stopwatch.StartNew();
                var eclipses = EclipseFinder.For(model).Between(TtInstant.FromJulianDate(from), TtInstant.FromJulianDate(to)).ToList();
                SearchTime += search.Elapsed;
                foreach (var eclipse in eclipses)
                    Cases.Add((model, eclipse, new FeatureShadowCrossings(eclipse).Compute(LunarFeatureCatalog.All)));
            }
        }
        Elapsed = watch.Elapsed;
    }

    public List<(ShadowModel Model, LunarEclipse Eclipse, IReadOnlyList<FeatureTiming> Timings)> Cases { get; } = [];

    public TimeSpan Elapsed { get; }

    public TimeSpan SearchTime { get; private set; }
}

public class FeatureShadowCrossingSweepTests(CraterSweep sweep, ITestOutputHelper output) : IClassFixture<CraterSweep>
{
    // Contacts are solved to 4 ms; the 3-D sphere meets the cone a fraction of a second before the 2-D disc of the
    // contacts does (the cone widens toward the Earth by 0.07″ over the 8 km between limb and tangent point): allow 1 s.
    private const double SlackSeconds = 1.0;

    [Fact]
    public void Every_eclipse_lists_every_feature_under_every_model()
    {
        output.WriteLine($"{sweep.Cases.Count} eclipse × model cases ({sweep.Cases.Count(c => c.Eclipse.Kind != EclipseKind.Penumbral)} with an umbral phase), {sweep.Cases.Sum(c => c.Timings.Count)} feature timings, computed in {sweep.Elapsed.TotalSeconds:0.0} s of which {sweep.SearchTime.TotalSeconds:0.0} s finding the eclipses");
        foreach (var model in CraterSweep.Models) Assert.Contains(sweep.Cases, c => c.Model == model);
        Assert.All(sweep.Cases, c => Assert.Equal(LunarFeatureCatalog.All.Count, c.Timings.Count));
        Assert.True(sweep.Cases.Count(c => c.Eclipse.Kind != EclipseKind.Penumbral) > 1000);
    }

    // Common practice (geometry): the umbra reaches no feature in a penumbral eclipse; in a total eclipse it covers the
    // whole visible disc between U2 and U3, so it reaches every feature facing the Earth before U2 and leaves it after U3.
    [Fact]
    public void Kind_decides_which_features_the_umbra_reaches()
    {
        foreach (var (model, e, timings) in sweep.Cases)
        {
            if (e.Kind == EclipseKind.Penumbral) Assert.All(timings, t => Assert.False(t.ReachedByUmbra));
            if (e.Kind != EclipseKind.Total) continue;
            var u2 = e.Contact(ContactName.U2)!.Tt;
            var u3 = e.Contact(ContactName.U3)!.Tt;
            foreach (var t in timings.Where(t => t.UmbraImmersion?.FacesEarth ?? FacesEarthAtGreatest(e, t.Feature)))
            {
                Assert.True(t.ReachedByUmbra, $"{model.Name} {e.GreatestEclipse}: {t.Feature.Name}");
                Assert.True(t.UmbraImmersion!.Tt.SecondsSince(u2) <= SlackSeconds, $"{model.Name} {e.GreatestEclipse}: {t.Feature.Name} enters after U2");
                Assert.True(t.UmbraEmersion!.Tt.SecondsSince(u3) >= -SlackSeconds, $"{model.Name} {e.GreatestEclipse}: {t.Feature.Name} leaves before U3");
            }
        }
    }

    private static bool FacesEarthAtGreatest(LunarEclipse e, LunarFeature f) =>
        new FeatureShadowCrossings(e).At(f, e.Passage.HoursFromCenter(e.GreatestEclipse)).FacesEarth;

    // Common practice (geometry): a point of the Moon is in the umbra only while part of the Moon is (U1…U4), in the
    // penumbra only between P1 and P4; the penumbra reaches it before the umbra and keeps it longer.
    [Fact]
    public void Crossings_lie_between_the_contacts_and_nest_inside_each_other()
    {
        var crossings = 0;
        foreach (var (model, e, timings) in sweep.Cases)
        {
            var p1 = e.Contact(ContactName.P1)!.Tt;
            var p4 = e.Contact(ContactName.P4)!.Tt;
            foreach (var t in timings)
            {
                string Where() => $"{model.Name} {e.GreatestEclipse}: {t.Feature.Name}";
                if (t.PenumbraImmersion is null) { Assert.Null(t.UmbraImmersion); continue; }
                Assert.True(t.PenumbraImmersion.Tt.SecondsSince(p1) >= -SlackSeconds, Where());
                Assert.True(t.PenumbraEmersion!.Tt.SecondsSince(p4) <= SlackSeconds, Where());
                Assert.True(t.PenumbraImmersion.Tt < t.PenumbraEmersion.Tt, Where());
                crossings += 2;
                if (t.UmbraImmersion is null) continue;
                var u1 = e.Contact(ContactName.U1)!.Tt;
                var u4 = e.Contact(ContactName.U4)!.Tt;
                Assert.True(t.UmbraImmersion.Tt.SecondsSince(u1) >= -SlackSeconds, Where());
                Assert.True(t.UmbraEmersion!.Tt.SecondsSince(u4) <= SlackSeconds, Where());
                Assert.True(t.PenumbraImmersion.Tt < t.UmbraImmersion.Tt && t.UmbraImmersion.Tt < t.UmbraEmersion.Tt && t.UmbraEmersion.Tt < t.PenumbraEmersion.Tt, Where());
                crossings += 2;
            }
        }
        output.WriteLine($"{crossings} crossings checked");
    }

    // Common practice: the features nearest the point where the umbra first touches the limb (U1) enter first. Rank
    // correlation (Spearman) between each feature's distance on the disc from the U1 contact point and its immersion
    // time, over every total eclipse (in a grazing partial eclipse the edge sweeps along the limb, and the rule fails).
    [Fact]
    public void Features_near_the_first_contact_point_enter_first()
    {
        var worst = 1.0;
        var cases = 0;
        foreach (var (model, e, timings) in sweep.Cases)
        {
            if (e.Kind != EclipseKind.Total) continue;
            var reached = timings.Where(t => t.ReachedByUmbra).ToList();
            var crossings = new FeatureShadowCrossings(e);
            var u1 = e.Contact(ContactName.U1)!;
            var hours = e.Passage.HoursFromCenter(u1.Tt);
            var moon = e.Passage.At(hours);
            var toAxis = Math.Atan2(-moon.XiRadians, -moon.EtaRadians);
            var s = moon.MoonSemiDiameter.Radians;
            var (cx, cy) = (moon.XiRadians + s * Math.Sin(toAxis), moon.EtaRadians + s * Math.Cos(toAxis));
            var distances = reached.Select(t =>
            {
                var g = crossings.At(t.Feature, hours).Geometry;
                return Math.Sqrt((g.XiRadians - cx) * (g.XiRadians - cx) + (g.EtaRadians - cy) * (g.EtaRadians - cy));
            }).ToList();
            var times = reached.Select(t => t.UmbraImmersion!.Tt.JulianDate.Day).ToList();
            var rho = Spearman(distances, times);
            worst = Math.Min(worst, rho);
            cases++;
            // The first feature to enter is one of the nearest quarter to the contact point.
            var first = times.IndexOf(times.Min());
            Assert.True(distances.Count(d => d < distances[first]) <= reached.Count / 4, $"{model.Name} {e.GreatestEclipse}: {reached[first].Feature.Name}");
        }
        output.WriteLine($"{cases} eclipses, least rank correlation {worst:0.000}");
        Assert.True(worst > 0.6, $"{worst}");
    }

    private static double Spearman(List<double> a, List<double> b)
    {
        static double[] Ranks(List<double> v)
        {
            var order = Enumerable.Range(0, v.Count).OrderBy(i => v[i]).ToArray();
            var ranks = new double[v.Count];
            for (var r = 0; r < order.Length; r++) ranks[order[r]] = r;
            return ranks;
        }
        var (ra, rb) = (Ranks(a), Ranks(b));
        var n = a.Count;
        var sum = ra.Zip(rb, (x, y) => (x - y) * (x - y)).Sum();
        return 1 - 6 * sum / (n * (n * (double)n - 1));
    }

    // The first immersion is no sooner than U1 and the last emersion no later than U4, and in total eclipses the
    // features nearest the limb bracket them closely: the first immersion comes within a few minutes of U1 when
    // the list spans the disc (common practice; our list reaches within about 10° of the limb all round).
    [Fact]
    public void First_immersion_and_last_emersion_bracket_the_partial_phase()
    {
        var largestGapMinutes = 0.0;
        foreach (var (model, e, timings) in sweep.Cases.Where(c => c.Eclipse.Kind == EclipseKind.Total))
        {
            var u1 = e.Contact(ContactName.U1)!.Tt;
            var u4 = e.Contact(ContactName.U4)!.Tt;
            var first = timings.Where(t => t.ReachedByUmbra).Min(t => t.UmbraImmersion!.Tt);
            var last = timings.Where(t => t.ReachedByUmbra).Max(t => t.UmbraEmersion!.Tt);
            Assert.True(first.SecondsSince(u1) >= -SlackSeconds);
            Assert.True(last.SecondsSince(u4) <= SlackSeconds);
            largestGapMinutes = Math.Max(largestGapMinutes, Math.Max(first.SecondsSince(u1), u4.SecondsSince(last)) / 60);
        }
        output.WriteLine($"largest U1→first immersion or last emersion→U4 in total eclipses: {largestGapMinutes:0.0} min");
        Assert.True(largestGapMinutes < 15);
    }
}
