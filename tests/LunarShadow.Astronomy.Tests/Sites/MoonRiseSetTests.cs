using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Tests.Eclipses;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Sites;

public class MoonRiseSetTests(Xunit.Abstractions.ITestOutputHelper output)
{
    // Meeus (1998), Example 15.a: Venus at Boston (φ = +42°20′, L = 71°05′ W) on 1988 March 20, from his tabulated
    // α, δ for March 19–21 (interpolated as in his ch. 3), Θ₀ = 177.74208°, ΔT = 56 s, h₀ = −0°34′:
    // rising 12:25:26 UT (m = 0.51766), setting 02:54:40 UT (m = 0.12130).
    [Fact]
    public void Rising_and_setting_match_Meeus_example_15a()
    {
        double[] alpha = [40.68021, 41.73129, 42.78204], delta = [18.04761, 18.44092, 18.82742];
        double Interpolate(double[] y, double n) =>
            y[1] + n / 2 * ((y[1] - y[0]) + (y[2] - y[1]) + n * ((y[2] - y[1]) - (y[1] - y[0])));
        var latitude = Angle.FromDegrees(42.3333);
        (double, double) Venus(double hours)
        {
            var days = hours / 24;
            var n = days + 56.0 / 86400;
            var theta = 177.74208 + 360.985647 * days;
            var hourAngle = Angle.FromDegrees(theta - 71.0833 - Interpolate(alpha, n));
            var h = HorizontalCoordinates.FromHourAngle(hourAngle, Angle.FromDegrees(Interpolate(delta, n)), latitude);
            return (h.Altitude.Radians - Angle.FromDegrees(-0.5667).Radians, h.Azimuth.Radians);
        }
        var crossings = new AltitudeCrossings(Venus, 0, 24).Find((limb, _) => limb, HorizonProfile.Flat);
        var rise = crossings.Single(c => c.Rising).Hours;
        var set = crossings.Single(c => !c.Rising).Hours;
        Assert.Equal(0.51766 * 24, rise, 1.0 / 60);
        Assert.Equal(0.12130 * 24, set, 1.0 / 60);
    }

    // astronomy-engine@2.1.19 (npm, MIT), SearchRiseSet for the Moon, printed by tools/reference-values/moon-rise-set.mjs;
    // sea-level sites at four latitudes. Its refraction and ΔT differ slightly from ours: within 5.7 s
    // here (measured), hence 10 s.
    [Theory]
    [InlineData(51.5, -0.12, 2025, 3, 14, "2025-03-14T06:22:55Z", "2025-03-14T18:29:51.742Z")]
    [InlineData(-33.87, 151.2, 2025, 3, 14, null, "2025-03-14T08:13:49.973Z")]
    [InlineData(40.71, -74.0, 2025, 3, 14, "2025-03-14T11:17:51.680Z", "2025-03-13T22:36:28.737Z")]
    [InlineData(69.65, 18.96, 2025, 3, 14, "2025-03-14T05:23:29.757Z", "2025-03-14T17:08:56.153Z")]
    [InlineData(0.0, 0.0, 2022, 11, 8, "2022-11-08T05:32:32.816Z", "2022-11-08T17:57:08.698Z")]
    [InlineData(-45.0, 170.0, 2022, 11, 8, "2022-11-08T17:18:28.523Z", "2022-11-08T07:24:28.250Z")]
    public void Moonrise_and_moonset_agree_with_a_reference_library(double lat, double lon, int y, int m, int d, string? set, string? rise)
    {
        var eclipse = EclipseOnDate.Find(y, m, d);
        var local = LocalCircumstancesCalculator.Compute(eclipse, Site.At(lat, lon), TimeScaleConverter.Default);
        void Check(MoonEventType type, string? expected)
        {
            if (expected is null) return;
            var instant = NodaTime.Text.InstantPattern.ExtendedIso.Parse(expected).Value;
            var nearest = local.MoonEvents.Where(e => e.Type == type).MinBy(e => Math.Abs((e.Utc - instant).TotalSeconds));
            Assert.NotNull(nearest);
            output.WriteLine($"{type}: ours − reference = {(nearest!.Utc - instant).TotalSeconds:F2} s");
            Assert.True(Math.Abs((nearest!.Utc - instant).TotalSeconds) < 10, $"{type}: {nearest.Utc} vs {instant}");
        }
        Check(MoonEventType.Set, set);
        Check(MoonEventType.Rise, rise);
    }

    // Common practice: above the Arctic Circle near a midsummer full Moon the Moon never rises (the full Moon stands
    // opposite the Sun, low in the southern sky in June). The canon's 2011 June 15 total eclipse, seen from 78° N.
    [Fact]
    public void A_moon_that_never_rises_is_reported_as_such()
    {
        var local = LocalCircumstancesCalculator.Compute(EclipseOnDate.Find(2011, 6, 15), Site.At(78.2, 15.6), TimeScaleConverter.Default);
        Assert.Equal(MoonHorizonState.DownThroughout, local.HorizonState);
        Assert.Empty(local.MoonEvents);
        Assert.False(local.AnyVisible);
        Assert.Equal(SiteVisibility.NoneMoonDownThroughout, local.Outline.Visibility);
    }

    // Common practice: in the Arctic near a midwinter full Moon the Moon stays up all day. 2010 December 21 total eclipse
    // (Five Millennium Canon), seen from 78° N.
    [Fact]
    public void A_moon_that_never_sets_is_reported_as_such()
    {
        var local = LocalCircumstancesCalculator.Compute(EclipseOnDate.Find(2010, 12, 21), Site.At(78.2, 15.6), TimeScaleConverter.Default);
        Assert.Equal(MoonHorizonState.UpThroughout, local.HorizonState);
        Assert.Single(local.VisiblePhases, p => p.Phase == EclipsePhase.Total);
    }

    // astronomy-engine@2.1.19 (npm, MIT), SearchRiseSet with metersAboveGround 0 (the almanac convention: upper limb at
    // 0° apparent, refraction, no dip) and equal to the height (a sea horizon, dip included); printed by
    // tools/reference-values/moon-rise-set.mjs. It scales refraction to the air density at the ground, so the site gets
    // the standard atmosphere's pressure and temperature there (ICAO 1993: 949.7 hPa, 11.4 °C at 550 m; 701.1 hPa,
    // −4.5 °C at 3000 m; 1001.3 hPa, 14.4 °C at 100 m) and sea-level air (1013.25 hPa, 15 °C) under a sea horizon.
    // Events more than 12 hours from greatest eclipse are outside the night reported (null). The dip moves the times
    // by 1.7 to 12.6 minutes, far beyond the 10 s allowed (within 7.9 s measured). (At 3000 m over a sea horizon the library's dip, from its own
    // refraction model, exceeds the nautical 1.76′·√h by about 1′: 79 s later there; that case is left out.)
    [Theory]
    [InlineData(47.3, 8.2, 550, 949.7, 11.4, 2029, 12, 20, false, "2029-12-20T15:19:02.750Z", null)]
    [InlineData(47.3, 8.2, 550, 1013.25, 15, 2029, 12, 20, true, "2029-12-20T15:12:32.133Z", null)]
    [InlineData(46.55, 7.98, 3000, 701.1, -4.5, 2025, 3, 14, false, "2025-03-14T17:56:43.727Z", "2025-03-14T05:47:04.848Z")]
    [InlineData(-33.87, 151.2, 100, 1001.3, 14.4, 2025, 3, 14, false, "2025-03-14T08:13:51.572Z", null)]
    [InlineData(-33.87, 151.2, 100, 1013.25, 15, 2025, 3, 14, true, "2025-03-14T08:12:06.036Z", null)]
    public void Rise_and_set_follow_the_almanac_by_default_and_the_sea_horizon_when_asked(
        double lat, double lon, double height, double pressure, double temperature, int y, int m, int d, bool sea, string? rise, string? set)
    {
        var site = Site.At(lat, lon, height) with { SeaHorizonDip = sea, Air = new AirConditions(pressure, temperature) };
        var local = LocalCircumstancesCalculator.Compute(EclipseOnDate.Find(y, m, d), site, TimeScaleConverter.Default);
        foreach (var (type, expected) in new[] { (MoonEventType.Rise, rise), (MoonEventType.Set, set) })
        {
            if (expected is null) continue;
            var instant = NodaTime.Text.InstantPattern.ExtendedIso.Parse(expected).Value;
            var nearest = local.MoonEvents.Where(e => e.Type == type).MinBy(e => Math.Abs((e.Utc - instant).TotalSeconds));
            Assert.NotNull(nearest);
            output.WriteLine($"{type}: ours − reference = {(nearest!.Utc - instant).TotalSeconds:F2} s");
            Assert.True(Math.Abs((nearest!.Utc - instant).TotalSeconds) < 10, $"{type}: {nearest.Utc} vs {instant}");
        }
    }

    // Common practice (the nautical almanacs): the sea horizon from 100 m lies 1.76′·√100 = 17.6′ down; it applies only
    // when the site asks for it.
    [Fact]
    public void The_dip_applies_only_to_a_sea_horizon()
    {
        Assert.Equal(17.6, Site.At(0, 0, 100).SeaHorizonDipAngle.Degrees * 60, 1e-9);
        Assert.Equal(0, Site.At(0, 0, 100).HorizonDip.Degrees);
        Assert.Equal(17.6, (Site.At(0, 0, 100) with { SeaHorizonDip = true }).HorizonDip.Degrees * 60, 1e-9);
    }
}
