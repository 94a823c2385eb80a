using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Sites;

public class NightClockTests
{
    // IERS Bulletin C: TT − UTC changes only at leap seconds, so within a night without one the shortcut must equal the
    // full conversion; before 1972 and with a fixed ΔT it equals TT − ΔT at greatest eclipse (to well under a second).
    [Theory]
    [InlineData("best")]
    [InlineData("espenak-meeus-2006")]
    public void The_night_clock_agrees_with_the_full_conversion(string model)
    {
        Assert.True(DeltaTModelCatalog.TryGet(model, out var deltaT));
        var time = new TimeScaleConverter(deltaT);
        var eclipses = EclipseFinder.For(ShadowModel.Danjon).Between(
            TtInstant.FromJulianDate(JulianDate.FromCalendar(1960, 1, 1).Day), TtInstant.FromJulianDate(JulianDate.FromCalendar(2040, 1, 1).Day));
        foreach (var eclipse in eclipses)
        {
            var clock = NightClock.For(eclipse, time);
            foreach (var contact in eclipse.Contacts)
                Assert.True(Math.Abs((clock(contact.Tt) - time.ToUtc(contact.Tt)).TotalMilliseconds) < 5, $"{contact.Name} of lunation {eclipse.Lunation}");
        }
    }
}
