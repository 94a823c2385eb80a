using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Sites;

public class LocalPropertyTests
{
    // Random sea-level sites with flat horizons over random eclipses of 1950–2050: every visible stretch lies inside its
    // phase and inside a stretch where the Moon is up; where it ends other than at a contact it ends at a rising or
    // setting, to the second; the largest visible umbral magnitude never exceeds the global one.
    [Fact]
    public void Visible_stretches_lie_inside_their_phases_and_the_moon_up_intervals()
    {
        var random = new Random(2026);
        var eclipses = EclipseFinder.For(ShadowModel.Danjon).Between(
            TtInstant.FromJulianDate(JulianDate.FromCalendar(1950, 1, 1).Day), TtInstant.FromJulianDate(JulianDate.FromCalendar(2050, 1, 1).Day)).ToList();
        for (var trial = 0; trial < 300; trial++)
        {
            var eclipse = eclipses[random.Next(eclipses.Count)];
            var site = Site.At(random.NextDouble() * 180 - 90, random.NextDouble() * 360 - 180);
            var local = LocalCircumstancesCalculator.Compute(eclipse, site, TimeScaleConverter.Default);
            var sky = new LocalSky(eclipse.NightSky, site, local.DeltaTSeconds);
            foreach (var span in local.VisiblePhases)
            {
                var (start, end) = span.Phase switch
                {
                    EclipsePhase.Penumbral => (ContactName.P1, ContactName.P4),
                    EclipsePhase.Partial => (ContactName.U1, ContactName.U4),
                    _ => (ContactName.U2, ContactName.U3),
                };
                Assert.True(span.StartTt >= eclipse.Contact(start)!.Tt && span.EndTt <= eclipse.Contact(end)!.Tt);
                var middle = eclipse.NightSky.HoursFromCenter(span.StartTt) + span.Minutes / 120;
                Assert.True(sky.MoonLimbAt(middle).UpperLimbAltitude >= -1e-9);
                foreach (var edge in new[] { span.StartTt, span.EndTt })
                {
                    var atContact = eclipse.Contacts.Any(c => c.Tt == edge);
                    var atEvent = local.MoonEvents.Any(e => Math.Abs(e.Tt.SecondsSince(edge)) < 1);
                    Assert.True(atContact || atEvent, $"edge {edge} of {span.Phase} is neither a contact nor a rising or setting");
                }
            }
            if (local.GreatestVisibleUmbralMagnitude is { } best) Assert.True(best.Value <= eclipse.UmbralMagnitude + 1e-12);
            Assert.All(local.Contacts, c => Assert.Equal(local.VisiblePhases.Any(p => p.StartTt.SecondsSince(c.Tt) <= 1e-3 && c.Tt.SecondsSince(p.EndTt) <= 1e-3), c.Visible));
        }
    }

    // Common practice: a site on the far side of the date line sees the same physical eclipse at the same UTC instants;
    // only its calendar date differs.
    [Fact]
    public void Sites_either_side_of_the_date_line_see_the_same_instants()
    {
        var eclipse = EclipseFinder.For(ShadowModel.Danjon).Between(TtInstant.FromJulianDate(2460748), TtInstant.FromJulianDate(2460750)).Single();
        var west = LocalCircumstancesCalculator.Compute(eclipse, Site.At(-17, 179.9, 0, NodaTime.DateTimeZoneProviders.Tzdb["Pacific/Fiji"]), TimeScaleConverter.Default);
        var east = LocalCircumstancesCalculator.Compute(eclipse, Site.At(-17, -179.9, 0, NodaTime.DateTimeZoneProviders.Tzdb["Pacific/Niue"]), TimeScaleConverter.Default);
        Assert.Equal(west.Contacts.Select(c => c.Utc), east.Contacts.Select(c => c.Utc));
        Assert.Equal(west.VisibleMinutes(EclipsePhase.Penumbral), east.VisibleMinutes(EclipsePhase.Penumbral), 1.0); // 0.2° of longitude is 48 s of rotation
        Assert.NotEqual(west.Contacts[0].Utc.InZone(west.Site.TimeZone).Date, east.Contacts[0].Utc.InZone(east.Site.TimeZone).Date);
    }
}
