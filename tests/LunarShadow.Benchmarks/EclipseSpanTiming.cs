using System.Diagnostics;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Ephemeris;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Benchmarks;

/// <summary>
/// Wall-clock seconds and eclipses per second for finding every eclipse, with full global circumstances and Saros
/// members, in 1900–2100 and in −1999…+3000, on one thread, each with a fresh (cold) finder. Targets: whole span ≤ 5 s.
/// </summary>
internal static class EclipseSpanTiming
{
    public static void Run()
    {
        var screening = new ApparentPlaceCalculator(LunarTheory.Screening, EarthOrbitTheory.Screening);
        EclipseFinder Fresh() => new(ShadowModel.Danjon, ApparentPlaceCalculator.Default, screening, maxParallelism: 1);
        // Warm up the JIT and the embedded data on one decade.
        _ = Fresh().Between(At(2000), At(2010)).Count();

        Time("1900-2100", () => Fresh().Between(At(1900), At(2101)).Count());
        Time("-1999..+3000", () => Fresh().Between(new TtInstant(SupportedRange.Start), new TtInstant(SupportedRange.End)).Count());

        // A server's first "upcoming" request: nothing cached yet (target 300 ms).
        var site = Site.At(40.71, -74.0, 0, NodaTime.DateTimeZoneProviders.Tzdb["America/New_York"]);
        Time("upcoming 10 total eclipses, cold", () => UpcomingEclipses.From(Fresh(), site, TimeScaleConverter.Default,
            At(2025), new UpcomingCriteria(EclipsePhase.Total)).Take(10).Count());
    }

    private static void Time(string label, Func<int> run)
    {
        var best = double.MaxValue;
        var count = 0;
        for (var i = 0; i < 3; i++)
        {
            var watch = Stopwatch.StartNew();
            count = run();
            best = Math.Min(best, watch.Elapsed.TotalSeconds);
        }
        Console.WriteLine($"{label}: {count} eclipses in {best * 1000:F0} ms (best of 3) = {count / best:F0} eclipses/s");
    }

    private static TtInstant At(int year) => TtInstant.FromJulianDate(JulianDate.FromCalendar(year, 1, 1).Day);
}
