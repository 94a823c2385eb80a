using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Tests.Eclipses;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Tests.Sites;

public class PublicNightTests
{
    private static readonly DateTimeZone NewYork = DateTimeZoneProviders.Tzdb["America/New_York"];

    private static LocalCircumstances NewYorkMarch2025() =>
        LocalCircumstancesCalculator.Compute(EclipseOnDate.Find(2025, 3, 14), Site.At(40.71, -74.0, 0, NewYork), TimeScaleConverter.Default);

    // 2025 March 14 from New York: P1 23:57 EDT on the 13th (Five Millennium Canon contacts with TT − UTC = 69.184 s).
    [Fact]
    public void An_eclipse_wholly_outside_the_opening_hours_says_so_plainly()
    {
        var plan = PublicNightPlanner.Plan(NewYorkMarch2025(), new OpeningHours(new LocalTime(19, 0), new LocalTime(23, 30)), TimeScaleConverter.Default);
        Assert.Null(plan.Session);
        Assert.Empty(plan.PhasesInWindow);
        Assert.Contains("entirely outside the opening hours", plan.Note, StringComparison.Ordinal);
    }

    [Fact]
    public void A_window_across_midnight_gets_a_session_around_the_partial_phase()
    {
        var local = NewYorkMarch2025();
        var plan = PublicNightPlanner.Plan(local, new OpeningHours(new LocalTime(22, 0), new LocalTime(5, 0)), TimeScaleConverter.Default);
        Assert.NotNull(plan.Session);
        var u1 = local.Contacts.Single(c => c.Label == "U1").Utc;
        Assert.Equal(u1 - PublicNightPlanner.Lead, plan.Session!.DoorsOpen);
        Assert.Equal(plan.Window.Closes, plan.Session.DoorsClose); // U4 + 15 min falls after 05:00 EDT
        Assert.Equal(new LocalTime(5, 0), plan.Window.Closes.InZone(NewYork).TimeOfDay);
        Assert.True(plan.Session.MoonAltitudeAtOpen.Degrees > 40);
        Assert.Contains(plan.PhasesInWindow, p => p.Phase == EclipsePhase.Total);
        Assert.Contains("minutes of totality", plan.Note, StringComparison.Ordinal);
    }

    // IANA tzdb (via NodaTime): in Berlin clocks went forward at 02:00 on 2025-03-30 (02:00–03:00 does not exist) and
    // back at 03:00 on 2025-10-26 (02:00–03:00 occurs twice).
    [Fact]
    public void Opening_times_in_a_daylight_saving_change_are_labelled_not_shifted_silently()
    {
        var berlin = DateTimeZoneProviders.Tzdb["Europe/Berlin"];
        var hours = new OpeningHours(new LocalTime(2, 30), new LocalTime(2, 45));
        var spring = hours.Windows(berlin, new LocalDate(2025, 3, 30), new LocalDate(2025, 3, 30)).Single();
        Assert.Contains("does not exist", spring.Note, StringComparison.Ordinal);
        Assert.Equal(new LocalTime(3, 0), spring.Opens.InZone(berlin).TimeOfDay);
        var autumn = hours.Windows(berlin, new LocalDate(2025, 10, 26), new LocalDate(2025, 10, 26)).Single();
        Assert.Contains("occurs twice", autumn.Note, StringComparison.Ordinal);
        Assert.Equal(Duration.FromMinutes(75), autumn.Closes - autumn.Opens); // first 02:30 to second 02:45
        var ordinary = hours.Windows(berlin, new LocalDate(2025, 6, 1), new LocalDate(2025, 6, 1)).Single();
        Assert.Null(ordinary.Note);
    }
}
