using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Eclipses;

// The eclipse caches under concurrency. Expected behaviour is the cache's own contract (common practice for shared
// caches: one computation per key, the same answer whatever the order or the number of threads).
public class EclipseCacheTests
{
    private static TtInstant At(int year) => TtInstant.FromJulianDate(new CalendarDate(year, 1, 1, year > 1582).ToJulianDate().Day);

    private static void RunTogether(int threads, Action<int> work)
    {
        using var start = new Barrier(threads);
        var workers = Enumerable.Range(0, threads).Select(i => new Thread(() =>
        {
            start.SignalAndWait();
            work(i);
        })).ToList();
        workers.ForEach(t => t.Start());
        workers.ForEach(t => t.Join());
    }

    [Fact]
    public void Many_threads_asking_for_the_same_eclipse_compute_its_passage_once_and_share_one_answer()
    {
        // Lunation 282 is the total eclipse of 2022 November 8 (Meeus 1998, ch. 49 numbering).
        var finder = EclipseFinder.OnEmbeddedEphemerides(ShadowModel.Danjon, maxParallelism: 1);
        var answers = new LunarEclipse?[16];
        RunTogether(answers.Length, i => answers[i] = finder.AtLunation(282));

        Assert.NotNull(answers[0]);
        Assert.All(answers, a => Assert.Same(answers[0], a));
        // The Saros walk may solve earlier doubtful members of the series, but never this one twice: a second ask
        // adds nothing.
        var computed = finder.PassagesComputed;
        Assert.Same(answers[0], finder.AtLunation(282));
        Assert.Equal(computed, finder.PassagesComputed);
    }

    [Fact]
    public void Concurrent_range_searches_compute_each_passage_once()
    {
        var together = EclipseFinder.OnEmbeddedEphemerides(ShadowModel.Danjon);
        RunTogether(8, _ => _ = together.Between(At(2001), At(2031)).Count());

        var alone = EclipseFinder.OnEmbeddedEphemerides(ShadowModel.Danjon, maxParallelism: 1);
        _ = alone.Between(At(2001), At(2031)).Count();

        Assert.True(alone.PassagesComputed > 60);
        Assert.Equal(alone.PassagesComputed, together.PassagesComputed);
    }

    [Fact]
    public void A_search_asks_for_its_threads_once_a_step_and_its_answers_do_not_depend_on_them()
    {
        var asked = 0;
        // Alternate one thread and four, as a host does when other requests come and go.
        var varying = EclipseFinder.OnEmbeddedEphemerides(ShadowModel.Danjon,
            () => ++asked % 2 == 0 ? 4 : 1);
        var answers = varying.Between(At(1950), At(2050)).ToList();
        var sequential = EclipseFinder.OnEmbeddedEphemerides(ShadowModel.Danjon, maxParallelism: 1).Between(At(1950), At(2050)).ToList();

        // 100 years are some 1237 lunations: about ten steps of LunationsPerStep, each asking once.
        Assert.InRange(asked, 1237 / EclipseFinder.LunationsPerStep, 1237 / EclipseFinder.LunationsPerStep + 2);
        Assert.Equal(sequential.Select(e => (e.Lunation, e.GreatestEclipse, e.Saros)), answers.Select(e => (e.Lunation, e.GreatestEclipse, e.Saros)));
    }

    [Fact]
    public void A_parallel_search_gives_exactly_the_sequential_answers()
    {
        var sequential = EclipseFinder.OnEmbeddedEphemerides(ShadowModel.Danjon, maxParallelism: 1).Between(At(1950), At(2050)).ToList();
        var parallel = EclipseFinder.OnEmbeddedEphemerides(ShadowModel.Danjon, maxParallelism: 4).Between(At(1950), At(2050)).ToList();

        Assert.Equal(sequential.Count, parallel.Count);
        for (var i = 0; i < sequential.Count; i++)
        {
            Assert.Equal(sequential[i].Lunation, parallel[i].Lunation);
            Assert.Equal(sequential[i].GreatestEclipse, parallel[i].GreatestEclipse);
            Assert.Equal(sequential[i].Gamma, parallel[i].Gamma);
            Assert.Equal(sequential[i].UmbralMagnitude, parallel[i].UmbralMagnitude);
            Assert.Equal(sequential[i].Saros, parallel[i].Saros);
            Assert.Equal(sequential[i].Contacts, parallel[i].Contacts);
        }
    }

    [Fact]
    public void Saros_members_do_not_depend_on_the_order_eclipses_are_asked_for()
    {
        // Five Millennium Canon (Espenak & Meeus 2009): 2022 November 8 is member 20 of Saros 136 (from memory); one
        // Saros earlier, 2004 October 28, is member 19.
        var laterFirst = EclipseFinder.OnEmbeddedEphemerides(ShadowModel.Danjon, maxParallelism: 1);
        var later = laterFirst.AtLunation(282)!;
        var earlier = laterFirst.AtLunation(282 - 223)!;

        var earlierFirst = EclipseFinder.OnEmbeddedEphemerides(ShadowModel.Danjon, maxParallelism: 1);
        Assert.Equal(earlier.Saros, earlierFirst.AtLunation(282 - 223)!.Saros);
        Assert.Equal(later.Saros, earlierFirst.AtLunation(282)!.Saros);
        Assert.Equal(new SarosMember(136, 20), later.Saros);
        Assert.Equal(new SarosMember(136, 19), earlier.Saros);
    }

    [Fact]
    public void Many_threads_asking_for_one_model_get_one_finder()
    {
        var finders = new EclipseFinders();
        var got = new EclipseFinder[16];
        RunTogether(got.Length, i => got[i] = finders.For(ShadowModel.Chauvenet));
        Assert.All(got, f => Assert.Same(got[0], f));
        Assert.Equal(1, finders.Count);
    }

    [Fact]
    public void Layer_finders_stay_bounded_under_concurrent_requests_for_many_heights_and_keep_the_default()
    {
        var finders = new EclipseFinders();
        var standard = ShadowModel.Layer();
        var defaultFinder = finders.For(standard);
        RunTogether(12, i =>
        {
            for (var h = 0; h < 10; h++)
            {
                var model = ShadowModel.Layer(10 * i + h);
                Assert.Equal(model, finders.For(model).Model);
                Assert.True(finders.Count <= EclipseFinders.MaxLayerFinders);
            }
        });
        Assert.Same(defaultFinder, finders.For(standard));
    }

    [Fact]
    public void The_night_sky_of_an_eclipse_is_fitted_once_under_concurrent_first_use()
    {
        var eclipse = EclipseFinder.OnEmbeddedEphemerides(ShadowModel.Danjon, maxParallelism: 1).AtLunation(282)!;
        var skies = new EclipseNightSky[8];
        RunTogether(skies.Length, i => skies[i] = eclipse.NightSky);
        Assert.All(skies, s => Assert.Same(skies[0], s));
    }
}
