using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Tests.Eclipses;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;
using NodaTime;

namespace LunarShadow.Astronomy.Tests.Sites;

public class LocalCircumstancesTests
{
    private static LocalCircumstances At(int y, int m, int d, double lat, double lon, string zone = "UTC") =>
        LocalCircumstancesCalculator.Compute(EclipseOnDate.Find(y, m, d), Site.At(lat, lon, 0, DateTimeZoneProviders.Tzdb[zone]), TimeScaleConverter.Default);

    private static bool Whole(LocalCircumstances l)
    {
        var whole = l.VisiblePhases.Where(p => p.Phase == EclipsePhase.Penumbral).ToList();
        return whole.Count == 1 && whole[0].StartTt == l.Eclipse.Contact(ContactName.P1)!.Tt && whole[0].EndTt == l.Eclipse.Contact(ContactName.P4)!.Tt;
    }

    // NASA eclipse predictions (F. Espenak), visibility of the total eclipse of 2011 June 15 (from memory): "The entire
    // eclipse is visible from eastern Africa, the Middle East, central Asia and western Australia. Observers throughout
    // Europe will miss the first part of the eclipse because it occurs before moonrise."
    [Fact]
    public void Total_eclipse_of_2011_June_15_rises_eclipsed_over_Europe()
    {
        Assert.True(Whole(At(2011, 6, 15, -1.29, 36.82)));   // eastern Africa
        Assert.True(Whole(At(2011, 6, 15, -31.95, 115.86))); // western Australia
        var europe = At(2011, 6, 15, 48.85, 2.35, "Europe/Paris");
        var rise = europe.MoonEvents.Single(e => e.Type == MoonEventType.Rise && e.Tt > europe.Eclipse.Contact(ContactName.P1)!.Tt && e.Tt < europe.Eclipse.Contact(ContactName.P4)!.Tt);
        Assert.Equal(rise.Tt, europe.VisiblePhases[0].StartTt);
        Assert.Equal(SiteVisibility.Part, europe.Outline.Visibility);
        Assert.Equal(rise.Utc, europe.Outline.ComesIntoView!.Utc);
        Assert.Null(europe.Outline.LostFromView);
    }

    // NASA eclipse predictions (F. Espenak), 2015 April 04 (from memory): seen whole across the Pacific; in eastern North
    // America the Moon sets during the eclipse.
    [Fact]
    public void Total_eclipse_of_2015_April_04_sets_during_the_partial_phase_in_eastern_North_America()
    {
        Assert.True(Whole(At(2015, 4, 4, 21.3, -157.85, "Pacific/Honolulu")));
        var east = At(2015, 4, 4, 40.71, -74.0, "America/New_York");
        var set = east.MoonEvents.Single(e => e.Type == MoonEventType.Set && e.Tt > east.Eclipse.Contact(ContactName.U1)!.Tt && e.Tt < east.Eclipse.Contact(ContactName.U2)!.Tt);
        Assert.Equal(set.Tt, east.VisiblePhases.Where(p => p.Phase == EclipsePhase.Partial).Single().EndTt);
        Assert.Equal(0, east.VisibleMinutes(EclipsePhase.Total));
        Assert.Equal(set.Utc, east.Outline.LostFromView!.Utc);
        Assert.Equal(EclipsePhase.Partial, east.Outline.LostFromView.Stage);
        Assert.Equal([EclipsePhase.Total], east.Outline.MissedPhases);
    }

    // NASA eclipse predictions (F. Espenak), 2025 March 14 (from memory): the whole eclipse is visible from the Americas;
    // from western Europe the Moon sets during the eclipse.
    [Fact]
    public void Total_eclipse_of_2025_March_14_is_seen_whole_in_the_Americas_and_sets_over_Europe()
    {
        var newYork = At(2025, 3, 14, 40.71, -74.0, "America/New_York");
        Assert.True(Whole(newYork));
        Assert.Equal(newYork.Eclipse.Durations.TotalMinutes!.Value, newYork.VisibleMinutes(EclipsePhase.Total), 1e-6);
        Assert.Equal(newYork.Eclipse.UmbralMagnitude, newYork.GreatestVisibleUmbralMagnitude!.Value, 9);
        var london = At(2025, 3, 14, 51.5, -0.12, "Europe/London");
        Assert.False(Whole(london));
        Assert.True(london.VisibleMinutes(EclipsePhase.Partial) > 0);
        Assert.True(london.GreatestVisibleUmbralMagnitude!.Value < london.Eclipse.UmbralMagnitude);
    }

    [Fact]
    public void Contacts_carry_sky_state_and_zenith_position_angles()
    {
        var l = At(2025, 3, 14, 40.71, -74.0, "America/New_York");
        Assert.Equal(7, l.Contacts.Count);
        Assert.Null(l.Contacts.Single(c => c.Name is null).ZenithPositionAngle);
        // The U1 position angle from north minus the parallactic angle (Meeus 1998, ch. 14) is the angle from the zenith.
        var u1 = l.Contacts.Single(c => c.Name == ContactName.U1);
        var global = l.Eclipse.Contact(ContactName.U1)!.PositionAngle;
        Assert.Equal((global - u1.Moon.ParallacticAngle).NormalizedPositive().Degrees, u1.ZenithPositionAngle!.Value.Degrees, 9);
        Assert.All(l.Contacts, c => Assert.Equal(SkyStates.FromSunAltitude(c.SunAltitude), c.Sky));
        Assert.Equal(SkyState.Night, l.Contacts.Single(c => c.Name is null).Sky);
    }

    // Common practice: a horizon profile hides the Moon when it stands below the profile's altitude at its azimuth.
    [Fact]
    public void A_horizon_profile_hides_the_moon_and_says_when()
    {
        var eclipse = EclipseOnDate.Find(2025, 3, 14);
        // A ridge in the south-west, 30° high from azimuth 200° to 260°: totality (Moon at 211°–230° azimuth, 47°–39° high
        // from New York) stays above it, but the end of the eclipse (az 247°–260°, under 27°) goes behind it.
        var ridge = new HorizonProfile([(190, 0), (200, 30), (260, 30), (270, 0)]);
        var site = Site.At(40.71, -74.0, 0, DateTimeZoneProviders.Tzdb["America/New_York"]) with { Horizon = ridge };
        var l = LocalCircumstancesCalculator.Compute(eclipse, site, TimeScaleConverter.Default);
        Assert.Contains(l.MoonEvents, e => e.Type == MoonEventType.HiddenByHorizonProfile);
        Assert.Equal(eclipse.Durations.TotalMinutes!.Value, l.VisibleMinutes(EclipsePhase.Total), 1e-6);
        Assert.True(l.VisiblePhases.Where(p => p.Phase == EclipsePhase.Penumbral).Last().EndTt < eclipse.Contact(ContactName.P4)!.Tt);
        Assert.False(l.Contacts.Single(c => c.Name == ContactName.P4).Visible);
    }

    [Fact]
    public void A_minimum_altitude_shortens_what_counts_as_visible()
    {
        var eclipse = EclipseOnDate.Find(2025, 3, 14);
        var low = LocalCircumstancesCalculator.Compute(eclipse, Site.At(51.5, -0.12), TimeScaleConverter.Default);
        var high = LocalCircumstancesCalculator.Compute(eclipse, Site.At(51.5, -0.12) with { MinimumAltitude = Angle.FromDegrees(10) }, TimeScaleConverter.Default);
        Assert.True(high.VisibleMinutes(EclipsePhase.Penumbral) < low.VisibleMinutes(EclipsePhase.Penumbral) - 30);
    }

    [Fact]
    public void Horizon_profiles_interpolate_through_north()
    {
        var profile = new HorizonProfile([(350, 10), (10, 20)]);
        Assert.Equal(15, profile.AltitudeAt(Angle.Zero).Degrees, 9);
        Assert.Equal(12.5, profile.AltitudeAt(Angle.FromDegrees(355)).Degrees, 9);
        Assert.Equal(0, HorizonProfile.Flat.AltitudeAt(Angle.FromDegrees(123)).Degrees);
    }
}
