using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Eclipses;

public class EclipseMomentsAndDiagramTests
{
    private static readonly EclipseFinder Finder = EclipseFinder.For(ShadowModel.Danjon);

    // NASA lunar eclipse predictions (Espenak): the total eclipse of 2022 November 8 has its greatest phase at
    // 10:59 UT on that date, with P1, U1, U2, U3, U4, P4 all occurring.
    [Fact]
    public void The_eclipse_on_a_UTC_date_is_found_and_the_next_date_has_none()
    {
        var time = TimeScaleConverter.Default;
        var found = Finder.OnUtcDate(new CalendarDate(2022, 11, 8, true), time);
        Assert.NotNull(found);
        Assert.Equal(EclipseKind.Total, found.Kind);
        Assert.Null(Finder.OnUtcDate(new CalendarDate(2022, 11, 9, true), time));
        Assert.Single(Finder.OnUtcDates(new CalendarDate(2022, 11, 1, true), new CalendarDate(2022, 11, 30, true), time));
    }

    // Same source: the moments of a total eclipse in time order are P1, U1, U2, greatest, U3, U4, P4.
    [Fact]
    public void Greatest_eclipse_sits_between_U2_and_U3_among_the_moments()
    {
        var e = Finder.OnUtcDate(new CalendarDate(2022, 11, 8, true), TimeScaleConverter.Default)!;
        Assert.Equal(["P1", "U1", "U2", "greatest", "U3", "U4", "P4"], e.Moments.Select(m => m.Label));
        for (var i = 1; i < e.Moments.Count; i++) Assert.True(e.Moments[i - 1].Tt < e.Moments[i].Tt);
    }

    // Meeus (1998), ch. 54: at an external contact the Moon's centre is ρ + s from the shadow axis, at an internal one
    // ρ − s; greatest eclipse is the least distance. Walked over every eclipse of 2001–2030.
    [Fact]
    public void The_diagram_puts_each_contact_at_the_shadow_edge_and_greatest_eclipse_nearest_the_axis()
    {
        var start = TtInstant.FromJulianDate(new CalendarDate(2001, 1, 1, true).ToJulianDate().Day);
        var end = TtInstant.FromJulianDate(new CalendarDate(2031, 1, 1, true).ToJulianDate().Day);
        var count = 0;
        foreach (var e in Finder.Between(start, end))
        {
            var diagram = ShadowDiagram.Of(e);
            Assert.Equal(e.Moments.Count, diagram.Points.Count);
            // The angular distance from the axis of the point at gnomonic coordinates (tan east, tan north).
            double Distance(ShadowDiagramPoint p) => Math.Atan(Math.Sqrt(Math.Pow(Math.Tan(p.East.Radians), 2) + Math.Pow(Math.Tan(p.North.Radians), 2)));
            var greatest = diagram.Points.Single(p => p.Moment.IsGreatest);
            Assert.All(diagram.Points, p => Assert.True(Distance(p) >= Distance(greatest) - 1e-12));
            foreach (var p in diagram.Points.Where(p => !p.Moment.IsGreatest))
            {
                var g = e.Passage.At(e.Passage.HoursFromCenter(p.Moment.Tt));
                var radii = ShadowCrossSection.RadiiTowardMoon(e.Model, g);
                var s = g.MoonSemiDiameter.Radians;
                var edge = p.Moment.Contact switch
                {
                    ContactName.P1 or ContactName.P4 => radii.Penumbra.Radians + s,
                    ContactName.U1 or ContactName.U4 => radii.Umbra.Radians + s,
                    _ => radii.Umbra.Radians - s,
                };
                // 0.2″: the contacts are solved to 10⁻⁶ h; where the Moon's path grazes an edge the distance changes
                // slowly, so the time tolerance shows as a few hundredths of an arc-second.
                Assert.Equal(edge, Distance(p), 0.2 * Math.PI / 180 / 3600);
            }
            count++;
        }
        Assert.True(count > 60);
    }
}
