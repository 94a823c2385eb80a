using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Eclipses;

/// <summary>Finds the eclipse of a calendar date (greatest eclipse in TT on that date, astronomers' calendar).</summary>
internal static class EclipseOnDate
{
    public static LunarEclipse Find(int year, int month, int day, ShadowModel? model = null)
    {
        var start = TtInstant.FromJulianDate(JulianDate.FromCalendar(year, month, day).Day - 0.5);
        var eclipse = EclipseFinder.For(model ?? ShadowModel.Danjon).Between(start, start.PlusSeconds(2 * 86400)).FirstOrDefault();
        Assert.True(eclipse is not null, $"no eclipse found near {year}-{month}-{day}");
        return eclipse!;
    }

    public static double SecondsOfDay(TtInstant tt)
    {
        var day = tt.JulianDate.Day + 0.5;
        return (day - Math.Floor(day)) * 86400;
    }
}
