using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Sites;

public class EclipsePhasesTests
{
    // Common practice (the canons' contact definitions): the penumbral phase runs P1–P4, the partial U1–U4, totality
    // U2–U3; at a contact the phase that starts there is in progress. The 2025 March 14 eclipse is total (NASA eclipse
    // predictions, F. Espenak, from memory), so it has all seven moments.
    [Fact]
    public void At_each_contact_the_phase_that_starts_there_is_in_progress_and_none_outside_P1_to_P4()
    {
        var eclipse = EclipseFinder.For(ShadowModel.Danjon).OnUtcDate(new CalendarDate(2025, 3, 14, true), TimeScaleConverter.Default)!;
        TtInstant At(ContactName name) => eclipse.Contact(name)!.Tt;
        Assert.Null(EclipsePhases.At(eclipse, At(ContactName.P1).PlusSeconds(-1)));
        Assert.Equal(EclipsePhase.Penumbral, EclipsePhases.At(eclipse, At(ContactName.P1)));
        Assert.Equal(EclipsePhase.Partial, EclipsePhases.At(eclipse, At(ContactName.U1)));
        Assert.Equal(EclipsePhase.Total, EclipsePhases.At(eclipse, At(ContactName.U2)));
        Assert.Equal(EclipsePhase.Total, EclipsePhases.At(eclipse, eclipse.GreatestEclipse));
        Assert.Equal(EclipsePhase.Partial, EclipsePhases.At(eclipse, At(ContactName.U3)));
        Assert.Equal(EclipsePhase.Penumbral, EclipsePhases.At(eclipse, At(ContactName.U4)));
        Assert.Null(EclipsePhases.At(eclipse, At(ContactName.P4)));
    }

    // Same definitions: a penumbral eclipse (2024 March 25, NASA predictions, from memory) is never partial or total.
    [Fact]
    public void A_penumbral_eclipse_is_penumbral_throughout()
    {
        var eclipse = EclipseFinder.For(ShadowModel.Danjon).OnUtcDate(new CalendarDate(2024, 3, 25, true), TimeScaleConverter.Default)!;
        Assert.Equal(EclipseKind.Penumbral, eclipse.Kind);
        var (p1, p4) = (eclipse.Contact(ContactName.P1)!.Tt, eclipse.Contact(ContactName.P4)!.Tt);
        for (var f = 0.0; f < 1; f += 0.05)
            Assert.Equal(EclipsePhase.Penumbral, EclipsePhases.At(eclipse, p1.PlusSeconds(f * p4.SecondsSince(p1))));
    }
}
