using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Tests.Eclipses;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Tests.Photography;

public class PhotoAdviceTests
{
    private static readonly Camera Telephoto = new(36, 24, 4.3, 400, 1, Mount.FixedTripod, 800, 5.6);

    // Common practice (observers' reports): at U2 and U3 the limb next to the umbra's edge is the brightest part of the
    // Moon, lit by light refracted in the Earth's atmosphere, never black; so the brightness is continuous and positive
    // across the umbra's edge, and the step there is far smaller than one stop.
    [Fact]
    public void The_limb_at_the_umbras_edge_is_lit_and_the_brightness_is_continuous_there()
    {
        var g = new ShadowGeometry(0, 0.0005, 384_400, 149_597_870.7, 0);
        var radii = ShadowCrossSection.RadiiTowardMoon(ShadowModel.Danjon, g);
        var u = radii.Umbra.Radians;
        foreach (var danjon in new[] { 0.0, 2, 4 })
        {
            var inside = EclipsedMoonBrightness.AtPoint(u * (1 - 1e-9), radii, g.SunParallax.Radians, danjon);
            var edge = EclipsedMoonBrightness.AtPoint(u, radii, g.SunParallax.Radians, danjon);
            var outside = EclipsedMoonBrightness.AtPoint(u * (1 + 1e-9), radii, g.SunParallax.Radians, danjon);
            Assert.True(edge > 0 && double.IsFinite(Math.Log2(edge)));
            Assert.InRange(Math.Abs(Math.Log2(outside / inside)), 0, 0.01);
        }
    }

    // Five Millennium Canon (Espenak & Meeus 2009): the total eclipses of 2029 December 20, 2028 December 31 and 2025
    // September 7; every row of the plan, contacts included, has finite brightness and the contact rows carry the phase
    // that starts there (U1, U3 partial; U2 total; U4 penumbral; P4 uneclipsed).
    [Theory]
    [InlineData(2029, 12, 20, 47.3, 8.2, "Europe/Zurich")]
    [InlineData(2028, 12, 31, 47.3, 8.2, "Europe/Zurich")]
    [InlineData(2025, 9, 7, 0, 11.42, "Africa/Libreville")]
    public void Every_row_is_finite_and_a_contact_row_starts_its_phase(int year, int month, int day, double lat, double lon, string zone)
    {
        var site = Site.At(lat, lon, 550, DateTimeZoneProviders.Tzdb[zone]);
        var plan = PhotoPlanner.Plan(EclipseOnDate.Find(year, month, day), site, Telephoto, new PhotoSettings(), TimeScaleConverter.Default);
        Assert.NotEmpty(plan.Timeline);
        Assert.All(plan.Timeline, r => Assert.True(double.IsFinite(r.BrightnessStops) && double.IsFinite(r.LimbStops) && double.IsFinite(r.DiscStops)));
        var expected = new Dictionary<string, MoonPhaseState>
        {
            ["P1"] = MoonPhaseState.Penumbral, ["U1"] = MoonPhaseState.Partial, ["U2"] = MoonPhaseState.Total,
            ["U3"] = MoonPhaseState.Partial, ["U4"] = MoonPhaseState.Penumbral, ["P4"] = MoonPhaseState.Uneclipsed,
        };
        foreach (var row in plan.Timeline.Where(r => r.Contact is not null and not "greatest"))
            Assert.Equal(expected[row.Contact!], row.Phase);
        Assert.All(plan.Timeline, r => Assert.All(r.Exposure.BracketShutters.Append(r.Exposure.ShutterSeconds),
            t => Assert.InRange(t, Camera.DefaultFastestShutterSeconds, Camera.DefaultSlowestShutterSeconds)));
    }

    // ISO 2720 (N²/t = L·S/K): a luminance needing 1/32000 s at f/5.6, ISO 800 is brought inside 1/8000 s by closing the
    // aperture first (two stops: f/11.2), with no ISO change; at 100 times that luminance the aperture stops at f/16 and
    // the ISO goes down to 100, and only then is the shutter held at 1/8000 s with the stops left over reported.
    [Fact]
    public void Beyond_the_fastest_shutter_the_aperture_closes_then_the_ISO_falls()
    {
        var camera = Telephoto;
        var luminance = Luminance(1.0 / 32000, camera);
        var e = ExposureCalculator.For(luminance, camera, 0);
        Assert.Equal(1.0 / 8000, e.ShutterSeconds, 12);
        Assert.Equal(11.2, e.Aperture, 9);
        Assert.Equal(800, e.Iso);
        Assert.Equal(11.2, e.Warnings.Single(w => w.Code == PhotoWarningCode.ApertureClosed)["toAperture"]!.Value, 9);

        var brighter = ExposureCalculator.For(luminance * 100, camera, 2);
        Assert.Equal(16, brighter.Aperture);
        Assert.Equal(100, brighter.Iso);
        Assert.Equal(1.0 / 8000, brighter.ShutterSeconds, 12);
        // 1/32000 s is 2 stops past 1/8000 s and 100× is 6.64 more; f/16 takes 3.03, ISO 800 → 100 three: 2.61 stops remain.
        var over = brighter.Warnings.Single(w => w.Code == PhotoWarningCode.BeyondFastestShutter)["overStops"]!.Value;
        Assert.Equal(2 + Math.Log2(100) - 2 * Math.Log2(16 / 5.6) - 3, over, 9);
        Assert.All(brighter.BracketShutters, t => Assert.InRange(t, 1.0 / 8000, 30));
    }

    // ISO 2720 again: 4 minutes at ISO 800 fits 30 s at ISO 6400 (three stops); 4 hours would need more than ISO 25600
    // and is held at 30 s, with the stops short reported.
    [Fact]
    public void Beyond_the_slowest_shutter_the_ISO_rises_then_the_shortfall_is_reported()
    {
        var e = ExposureCalculator.For(Luminance(240, Telephoto), Telephoto, 0);
        Assert.Equal(30, e.ShutterSeconds, 9);
        Assert.Equal(6400, e.Iso, 6);
        var dark = ExposureCalculator.For(Luminance(4 * 3600, Telephoto), Telephoto, 1);
        Assert.Equal(30, dark.ShutterSeconds, 9);
        Assert.Equal(25600, dark.Iso);
        Assert.Equal(Math.Log2(4 * 3600 / 30.0) - 5, dark.Warnings.Single(w => w.Code == PhotoWarningCode.BeyondSlowestShutter)["underStops"]!.Value, 9);
        var slower = ExposureCalculator.For(Luminance(240, Telephoto), Telephoto with { SlowestShutterSeconds = 240 }, 0);
        Assert.Equal(240, slower.ShutterSeconds, 6);
        Assert.Empty(slower.Warnings);
    }

    // Meinel & Meinel (1983) via Thorstensen's fit: the zenith is some 14.7 magnitudes brighter than the dark sky at
    // sunset and about 6.1 magnitudes at the end of nautical twilight (Sun −9°, the fit's centre: y = 0), and no brighter
    // than the night sky once the Sun is 18° down.
    [Fact]
    public void Twilight_sky_brightness_follows_the_published_fit()
    {
        Assert.Equal(6.132725, SkyBrightness.TwilightBrighteningMagnitudes(-9), 9);
        Assert.Equal(-2.0635175 + 1.246602 + 9.4084495 + 6.132725, SkyBrightness.TwilightBrighteningMagnitudes(0), 9);
        Assert.Equal(0, SkyBrightness.TwilightBrighteningMagnitudes(-18));
        Assert.Equal(SkyBrightness.DaylightLuminance, SkyBrightness.Luminance(30), 6);
        for (var h = -20.0; h < 20; h += 0.5) Assert.True(SkyBrightness.Luminance(h + 0.5) >= SkyBrightness.Luminance(h));
    }

    // ISO 2720: the sky sits log₂(L·H/K) stops above middle grey; capped 2.5 stops above, a dim eclipsed Moon in a
    // twilight sky gets the exposure that keeps the sky at +2.5 stops, and the shortfall is reported.
    [Fact]
    public void In_a_bright_sky_the_exposure_is_capped_before_the_sky_saturates()
    {
        var sky = SkyBrightness.Luminance(-3);
        var e = ExposureCalculator.For(sky / 100, Telephoto, 0, sky);
        var placement = Math.Log2(sky * e.ShutterSeconds * e.Iso / (ExposureCalculator.MeterConstant * e.Aperture * e.Aperture));
        Assert.Equal(ExposureCalculator.SkyHeadroomStops, placement, 9);
        Assert.Contains(e.Warnings, w => w.Code == PhotoWarningCode.SkyLimitsExposure && w["stopsShort"] > 0);
        Assert.DoesNotContain(ExposureCalculator.For(sky * 10, Telephoto, 0, sky).Warnings, w => w.Code == PhotoWarningCode.SkyLimitsExposure);
    }

    // Common practice (blur ∝ exposure × focal length): in the totality of 2025 March 14 at 400 mm on a tripod the
    // exposure is several stops over the blur limit; the advice's numbers are consistent with each other.
    [Fact]
    public void Trailing_advice_says_by_how_many_stops_and_what_solves_it()
    {
        var site = Site.At(40.71, -74.0, 0, DateTimeZoneProviders.Tzdb["America/New_York"]);
        var plan = PhotoPlanner.Plan(EclipseOnDate.Find(2025, 3, 14), site, Telephoto, new PhotoSettings(), TimeScaleConverter.Default);
        var row = plan.Timeline.First(r => r.Phase == MoonPhaseState.Total);
        var w = row.Warnings.Single(w => w.Code == PhotoWarningCode.Trailing);
        var (t, limit) = (w["shutterSeconds"]!.Value, w["limitSeconds"]!.Value);
        Assert.Equal(row.Exposure.ShutterSeconds, t);
        Assert.Equal(Math.Log2(t / limit), w["excessStops"]!.Value, 9);
        Assert.True(w["excessStops"] > 2);
        Assert.Equal(400 * limit / t, w["shorterFocalLengthMm"]!.Value, 9);
        Assert.Equal(Math.Ceiling(t / limit), w["stackFrames"]!.Value);
        Assert.Equal(plan.Framing.SiderealLimitSeconds, w["siderealLimitSeconds"]!.Value);
        Assert.True(w["siderealLimitSeconds"] > limit * 10);
    }

    private static double Luminance(double shutterSeconds, Camera camera)
    {
        // Invert t = 100·N²/(S·2^EV) with EV = log₂(L·100/K) − placement.
        var ev = Math.Log2(100 * camera.EffectiveAperture * camera.EffectiveAperture / (camera.Iso * shutterSeconds));
        return Math.Pow(2, ev + ExposureCalculator.PlacementStops) * ExposureCalculator.MeterConstant / 100;
    }
}
