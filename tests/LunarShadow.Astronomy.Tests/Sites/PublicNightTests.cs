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
        Assert.Equal(PublicNightOutcome.OutsideOpeningHours, plan.Outcome);
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
        Assert.Equal(PublicNightOutcome.Session, plan.Outcome);
        Assert.True(plan.TotalityMinutesInWindow > 0);
    }

    // IANA tzdb (via NodaTime): in Berlin clocks went forward at 02:00 on 2025-03-30 (02:00–03:00 does not exist) and
    // back at 03:00 on 2025-10-26 (02:00–03:00 occurs twice).
    [Fact]
    public void Opening_times_in_a_daylight_saving_change_are_labelled_not_shifted_silently()
    {
        var berlin = DateTimeZoneProviders.Tzdb["Europe/Berlin"];
        var hours = new OpeningHours(new LocalTime(2, 30), new LocalTime(2, 45));
        var spring = hours.Windows(berlin, new LocalDate(2025, 3, 30), new LocalDate(2025, 3, 30)).Single();
        Assert.Equal(ClockAdjustmentKind.SkippedTakenAsEndOfGap, spring.OpensAdjustment!.Kind);
        Assert.Equal(new LocalTime(3, 0), spring.Opens.InZone(berlin).TimeOfDay);
        var autumn = hours.Windows(berlin, new LocalDate(2025, 10, 26), new LocalDate(2025, 10, 26)).Single();
        Assert.Equal(ClockAdjustmentKind.RepeatedFirstUsed, autumn.OpensAdjustment!.Kind);
        Assert.Equal(ClockAdjustmentKind.RepeatedSecondUsed, autumn.ClosesAdjustment!.Kind);
        Assert.Equal(Duration.FromMinutes(75), autumn.Closes - autumn.Opens); // first 02:30 to second 02:45
        var ordinary = hours.Windows(berlin, new LocalDate(2025, 6, 1), new LocalDate(2025, 6, 1)).Single();
        Assert.Null(ordinary.OpensAdjustment);
        Assert.Null(ordinary.ClosesAdjustment);
    }

    // IANA tzdb (via NodaTime): Japan keeps JST all year. NASA eclipse predictions (F. Espenak), 2028 December 31 (from
    // memory): greatest eclipse near 16:52 UTC, i.e. 01:52 JST on 1 January 2029, so the night is 31 December to 1 January.
    [Fact]
    public void The_night_is_named_by_its_local_evening_and_morning_dates()
    {
        var tokyo = DateTimeZoneProviders.Tzdb["Asia/Tokyo"];
        var local = LocalCircumstancesCalculator.Compute(EclipseOnDate.Find(2028, 12, 31), Site.At(35.68, 139.77, 0, tokyo), TimeScaleConverter.Default);
        Assert.Equal(new LocalNight(new LocalDate(2028, 12, 31), new LocalDate(2029, 1, 1)), local.Outline.Night);
        Assert.Equal(SiteVisibility.Whole, local.Outline.Visibility);
    }

    // Common practice: a night runs noon to noon, so 11:59 belongs to the night before and 12:00 to the night after.
    [Fact]
    public void A_night_runs_from_local_noon_to_local_noon()
    {
        var zone = DateTimeZoneProviders.Tzdb["Pacific/Kiritimati"];
        var beforeNoon = new LocalDateTime(2030, 6, 15, 11, 59).InZoneStrictly(zone).ToInstant();
        Assert.Equal(new LocalDate(2030, 6, 14), LocalNight.Around(beforeNoon, zone).Evening);
        Assert.Equal(new LocalDate(2030, 6, 15), LocalNight.Around(beforeNoon + Duration.FromMinutes(1), zone).Evening);
    }
}
