using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;
using Xunit.Abstractions;

namespace LunarShadow.Astronomy.Tests.Eclipses;

public class EclipseSearchTests(WholeSpan span, ITestOutputHelper output) : IClassFixture<WholeSpan>
{
    // Five Millennium Canon of Lunar Eclipses (Espenak & Meeus 2009): 228 lunar eclipses in 2001–2100, of which 86
    // penumbral, 57 partial and 85 total.
    [Fact]
    public void The_twenty_first_century_has_the_canon_count_of_each_kind()
    {
        var century = EclipseFinder.For(ShadowModel.Danjon).Between(
            TtInstant.FromJulianDate(JulianDate.FromCalendar(2001, 1, 1).Day),
            TtInstant.FromJulianDate(JulianDate.FromCalendar(2101, 1, 1).Day)).ToList();
        Assert.Equal(228, century.Count);
        Assert.Equal(86, century.Count(e => e.Kind == EclipseKind.Penumbral));
        Assert.Equal(57, century.Count(e => e.Kind == EclipseKind.Partial));
        Assert.Equal(85, century.Count(e => e.Kind == EclipseKind.Total));
    }

    // Five Millennium Canon (Espenak & Meeus 2009), from memory: 12,064 lunar eclipses from −1999 to +3000. Marginal
    // grazing eclipses far from the present may exist under one lunar theory and not the other, hence ±10.
    [Fact]
    public void The_whole_span_holds_the_canon_number_of_eclipses()
    {
        output.WriteLine($"{span.Eclipses.Count} eclipses: {span.Eclipses.Count(e => e.Kind == EclipseKind.Penumbral)} penumbral, {span.Eclipses.Count(e => e.Kind == EclipseKind.Partial)} partial, {span.Eclipses.Count(e => e.Kind == EclipseKind.Total)} total");
        Assert.InRange(span.Eclipses.Count, 12064 - 10, 12064 + 10);
    }

    [Fact]
    public void Contacts_are_in_order_around_greatest_eclipse_everywhere()
    {
        foreach (var e in span.Eclipses)
        {
            for (var i = 1; i < e.Contacts.Count; i++) Assert.True(e.Contacts[i - 1].Tt < e.Contacts[i].Tt);
            Assert.Equal(ContactName.P1, e.Contacts[0].Name);
            Assert.Equal(ContactName.P4, e.Contacts[^1].Name);
            var before = e.Contacts.Where(c => c.Name <= ContactName.U2).ToList();
            var after = e.Contacts.Where(c => c.Name >= ContactName.U3).ToList();
            Assert.All(before, c => Assert.True(c.Tt <= e.GreatestEclipse));
            Assert.All(after, c => Assert.True(c.Tt >= e.GreatestEclipse));
        }
    }

    // Common practice (definitions of the canon): total when the umbral magnitude reaches 1, partial when it lies
    // between 0 and 1, penumbral when only the penumbral magnitude is positive.
    [Fact]
    public void Kind_agrees_with_the_magnitudes_everywhere()
    {
        foreach (var e in span.Eclipses)
        {
            Assert.True(e.PenumbralMagnitude > 0);
            var expected = e.UmbralMagnitude >= 1 ? EclipseKind.Total : e.UmbralMagnitude > 0 ? EclipseKind.Partial : EclipseKind.Penumbral;
            if (Math.Abs(e.UmbralMagnitude - 1) > 1e-6 && Math.Abs(e.UmbralMagnitude) > 1e-6) Assert.Equal(expected, e.Kind);
            Assert.Equal(e.Kind == EclipseKind.Total, e.Durations.TotalMinutes is not null);
            Assert.Equal(e.Kind != EclipseKind.Penumbral, e.Durations.PartialMinutes is not null);
        }
    }

    // Common practice: the Saros is 223 synodic months = 6585.32 days; lunar eclipses can follow one lunation apart
    // (29.5 days) but never closer.
    [Fact]
    public void Saros_members_are_a_Saros_apart_and_eclipses_a_month_apart()
    {
        var byLunation = span.Eclipses.ToDictionary(e => e.Lunation);
        var pairs = 0;
        foreach (var e in span.Eclipses)
        {
            if (!byLunation.TryGetValue(e.Lunation + 223, out var next)) continue;
            Assert.Equal(e.Saros.Series, next.Saros.Series);
            Assert.Equal(e.Saros.Member + 1, next.Saros.Member);
            Assert.Equal(6585.32, next.GreatestEclipse.JulianDate.Day - e.GreatestEclipse.JulianDate.Day, 1.0);
            pairs++;
        }
        Assert.True(pairs > 11000);
        for (var i = 1; i < span.Eclipses.Count; i++)
            Assert.True(span.Eclipses[i].GreatestEclipse.JulianDate.Day - span.Eclipses[i - 1].GreatestEclipse.JulianDate.Day > 29);
    }

    [Fact]
    public void Grazing_penumbral_eclipses_are_found()
    {
        // Five Millennium Canon: 2027 July 18, penumbral magnitude 0.0014.
        Assert.Contains(span.Eclipses, e => e.PenumbralMagnitude < 0.002 && Math.Abs(e.GreatestEclipse.JulianDate.Day - 2461605.17) < 1);
        // Common practice: penumbral magnitudes spread fairly evenly over 0 to about 2.8, so roughly one eclipse in three
        // hundred grazes below 0.01; measured here: 41 of 12,063, 7 of them below 0.002.
        Assert.InRange(span.Eclipses.Count(e => e.PenumbralMagnitude < 0.01), 30, 60);
    }
}
