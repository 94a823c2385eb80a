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

    // Five Millennium Canon (NASA, from memory): the total eclipses seen from New York in 2025 and 2026 are 2025 March 14
    // and 2026 March 3, and no other falls in those two years.
    [Fact]
    public void A_search_that_finds_fewer_than_asked_within_its_years_says_it_stopped_at_the_limit()
    {
        var search = UpcomingEclipses.Search(EclipseFinder.For(ShadowModel.Danjon), NewYork, TimeScaleConverter.Default, From2025,
            new UpcomingCriteria(EclipsePhase.Total), count: 5, yearsAhead: 2);
        Assert.Equal(2, search.Found.Count);
        Assert.True(search.StoppedAtYearLimit);
        Assert.Equal(JulianDate.FromCalendar(2027, 1, 1).Day, search.SearchedUntil.JulianDate.Day, 9);
    }

    [Fact]
    public void A_search_that_reaches_its_count_reports_no_limit()
    {
        var search = UpcomingEclipses.Search(EclipseFinder.For(ShadowModel.Danjon), NewYork, TimeScaleConverter.Default, From2025,
            new UpcomingCriteria(EclipsePhase.Total), count: 2, yearsAhead: 2);
        Assert.Equal(2, search.Found.Count);
        Assert.False(search.StoppedAtYearLimit);
    }

    // The supported range ends after the year 3000 (SupportedRange): a search that runs into it has searched everything.
    [Fact]
    public void A_search_cut_short_by_the_end_of_the_supported_range_is_not_stopped_at_the_limit()
    {
        var search = UpcomingEclipses.Search(EclipseFinder.For(ShadowModel.Danjon), NewYork, TimeScaleConverter.Default,
            TtInstant.FromJulianDate(JulianDate.FromCalendar(2990, 1, 1).Day), new UpcomingCriteria(EclipsePhase.Total), count: 50,
            yearsAhead: UpcomingEclipses.DefaultYearsAhead);
        Assert.True(search.Found.Count < 50);
        Assert.False(search.StoppedAtYearLimit);
        Assert.Equal(SupportedRange.End.Day - 1, search.SearchedUntil.JulianDate.Day, 9);
    }

    // Calendar arithmetic (common practice): n years after a date is the same month and day n years on, in the
    // astronomers' calendar (Julian before 1582 October 15), here across the Gregorian reform.
    [Theory]
    [InlineData(2025, 3, 1, 100, 2125, 3, 1)]
    [InlineData(-1999, 1, 1, 1000, -999, 1, 1)]
    [InlineData(1500, 6, 15, 100, 1600, 6, 15)]
    public void The_search_window_ends_the_same_date_the_given_years_later(int year, int month, int day, int years, int endYear, int endMonth, int endDay)
    {
        var end = UpcomingEclipses.SearchEnd(TtInstant.FromJulianDate(JulianDate.FromCalendar(year, month, day).Day), years);
        Assert.Equal(JulianDate.FromCalendar(endYear, endMonth, endDay).Day, end.JulianDate.Day, 9);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(UpcomingEclipses.MaxYearsAhead + 1)]
    public void The_search_window_is_between_one_year_and_the_maximum(int years)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => UpcomingEclipses.SearchEnd(From2025, years));
    }
}
