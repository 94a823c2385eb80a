using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;
using NodaTime;

namespace LunarShadow.Astronomy.Tests.Sites;

public class UpcomingEclipsesTests
{
    private static readonly Site NewYork = Site.At(40.71, -74.0, 0, DateTimeZoneProviders.Tzdb["America/New_York"]);
    private static readonly TtInstant From2025 = TtInstant.FromJulianDate(JulianDate.FromCalendar(2025, 1, 1).Day);

    // Five Millennium Canon: the first total lunar eclipse of 2025 is March 14, seen whole from the Americas (NASA).
    [Fact]
    public void The_next_total_eclipse_seen_from_New_York_after_2025_begins_is_March_14()
    {
        var upcoming = UpcomingEclipses.From(EclipseFinder.For(ShadowModel.Danjon), NewYork, TimeScaleConverter.Default, From2025,
            new UpcomingCriteria(EclipsePhase.Total)).Take(5).ToList();
        Assert.Equal(5, upcoming.Count);
        Assert.Equal(2460748, Math.Floor(upcoming[0].Local.Eclipse.GreatestEclipse.JulianDate.Day - 0.5) + 0.5, 0);
        Assert.All(upcoming, u => Assert.True(u.QualifyingMinutes > 0 && u.Qualifying.All(q => q.Phase == EclipsePhase.Total)));
        for (var i = 1; i < upcoming.Count; i++) Assert.True(upcoming[i].Local.Eclipse.GreatestEclipse > upcoming[i - 1].Local.Eclipse.GreatestEclipse);
    }

    [Fact]
    public void Filters_only_ever_remove_eclipses_or_minutes()
    {
        var finder = EclipseFinder.For(ShadowModel.Danjon);
        var all = UpcomingEclipses.From(finder, NewYork, TimeScaleConverter.Default, From2025, new UpcomingCriteria(EclipsePhase.Partial)).Take(8).ToList();
        var strict = UpcomingEclipses.From(finder, NewYork, TimeScaleConverter.Default, From2025,
            new UpcomingCriteria(EclipsePhase.Partial, AstronomicalNightOnly: true, MinimumMoonAltitude: Angle.FromDegrees(20),
                Hours: new OpeningHours(new LocalTime(20, 0), new LocalTime(2, 0)))).Take(3).ToList();
        Assert.NotEmpty(strict);
        foreach (var s in strict)
        {
            var same = all.FirstOrDefault(a => a.Local.Eclipse.Lunation == s.Local.Eclipse.Lunation);
            if (same is not null) Assert.True(s.QualifyingMinutes <= same.QualifyingMinutes + 1e-6);
            foreach (var q in s.Qualifying)
            {
                var local = q.StartUtc.InZone(NewYork.TimeZone).TimeOfDay;
                Assert.True(local >= new LocalTime(20, 0) || local <= new LocalTime(2, 0));
            }
        }
    }
}
