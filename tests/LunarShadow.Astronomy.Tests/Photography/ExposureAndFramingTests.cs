using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Photography;

public class ExposureAndFramingTests
{
    private static readonly Camera FullFrame = new(36, 24, 4.3, 400, 1, Mount.FixedTripod, 100, 11);

    private static double FullMoonLuminance() =>
        MoonBrightness.Luminance(MoonBrightness.SurfaceBrightness(MoonBrightness.VisualMagnitude(149_597_870.7, 384_400, 0), 932.6));

    // F. Espenak, NASA lunar-eclipse exposure guide (from memory): t = f²/(I·2^Q), Q = 8 for the full Moon; at f/11 and
    // ISO 100 that is 1/212 s.
    [Fact]
    public void The_full_moon_exposure_agrees_with_the_NASA_formula_within_a_stop()
    {
        var nasa = 11.0 * 11 / (100 * Math.Pow(2, 8));
        var ours = ExposureCalculator.For(FullMoonLuminance(), FullFrame, 0).ShutterSeconds;
        Assert.InRange(Math.Log2(ours / nasa), -1, 1);
    }

    // Common practice, the "looney 11" rule: at f/11 the sunlit Moon needs 1/ISO seconds.
    [Fact]
    public void The_full_moon_exposure_agrees_with_the_looney_11_rule_within_a_stop()
    {
        var looney = 1.0 / 100;
        var ours = ExposureCalculator.For(FullMoonLuminance(), FullFrame, 0).ShutterSeconds;
        Assert.InRange(Math.Log2(ours / looney), -1, 1);
    }

    // ISO 2720: N²/t = L·S/K; doubling the ISO halves the shutter, and a fixed shutter yields the ISO back.
    [Fact]
    public void The_exposure_equation_trades_ISO_shutter_and_aperture()
    {
        var a = ExposureCalculator.For(1000, FullFrame, 2);
        var b = ExposureCalculator.For(1000, FullFrame with { Iso = 200 }, 2);
        Assert.Equal(a.ShutterSeconds / 2, b.ShutterSeconds, 12);
        Assert.Equal(5, a.BracketShutters.Count);
        Assert.Equal(a.ShutterSeconds * 4, a.BracketShutters[^1], 12);
        var c = ExposureCalculator.For(1000, FullFrame with { ShutterSeconds = a.ShutterSeconds }, 0);
        Assert.Equal(100, c.Iso, 9);
        Assert.True(ExposureCalculator.For(1e-6, FullFrame with { ShutterSeconds = 1.0 / 8000 }, 0).IsoClamped);
    }

    // Hand calculation: blur ≤ 1 pixel of 4.3 µm at 400 mm for a motion of 15″/s: t = 0.0043 / (400 · 15/206265) = 0.148 s.
    [Fact]
    public void Trailing_limit_matches_a_hand_calculation()
    {
        Assert.Equal(0.1478, Optics.BlurLimitSeconds(1, 4.3, 400, Angle.FromArcseconds(15).Radians), 0.0005);
    }

    // Common practice: a 50 mm lens on a 36 × 24 mm sensor sees 39.6° × 27.0°; half a degree at 1000 mm spans 8.73 mm,
    // 2182 pixels of 4 µm.
    [Fact]
    public void Field_of_view_and_image_scale_follow_the_lens_geometry()
    {
        Assert.Equal(39.6, Optics.FieldOfView(36, 50).Degrees, 0.05);
        Assert.Equal(27.0, Optics.FieldOfView(24, 50).Degrees, 0.05);
        Assert.Equal(2182, Optics.Pixels(Angle.FromDegrees(0.5), 1000, 4), 1.0);
    }
}
