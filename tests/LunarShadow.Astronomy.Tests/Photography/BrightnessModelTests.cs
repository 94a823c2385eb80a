using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;
using Xunit.Abstractions;

namespace LunarShadow.Astronomy.Tests.Photography;

public class BrightnessModelTests(ITestOutputHelper output)
{
    // Common practice (MathWorld, "Circle-Circle Intersection"): for a uniform Sun (no limb darkening) the hidden fraction is
    // the lens area over the Sun's area.
    [Theory]
    [InlineData(0.95, 0.27, 1.10)]
    [InlineData(0.95, 0.27, 0.80)]
    [InlineData(0.95, 0.27, 1.20)]
    [InlineData(1.00, 0.30, 0.75)]
    public void A_uniform_sun_is_hidden_by_the_lens_area(double earth, double sun, double separation)
    {
        Assert.Equal(DiscCoverage.FractionInside(earth, sun, separation), SolarDiscOcculting.HiddenFraction(earth, sun, separation, 0), 0.002);
    }

    [Fact]
    public void The_sun_is_all_visible_outside_the_penumbra_and_all_hidden_inside_the_umbra()
    {
        Assert.Equal(0, SolarDiscOcculting.HiddenFraction(0.95, 0.27, 1.23));
        Assert.Equal(1, SolarDiscOcculting.HiddenFraction(0.95, 0.27, 0.67));
    }

    // Common practice: limb darkening makes the solar limb fainter, so when only the limb is covered less light is lost
    // than for a uniform disc, and when only the limb shows less light is left.
    [Fact]
    public void Limb_darkening_weights_the_centre_of_the_sun()
    {
        Assert.True(SolarDiscOcculting.HiddenFraction(0.95, 0.27, 1.18) < SolarDiscOcculting.HiddenFraction(0.95, 0.27, 1.18, 0));
        Assert.True(SolarDiscOcculting.HiddenFraction(0.95, 0.27, 0.72) > SolarDiscOcculting.HiddenFraction(0.95, 0.27, 0.72, 0));
    }

    // MathWorld, "Circle-Circle Intersection": two unit circles one radius apart overlap by 2π/3 − √3/2.
    [Fact]
    public void Disc_coverage_follows_the_lens_formula()
    {
        Assert.Equal((2 * Math.PI / 3 - Math.Sqrt(3) / 2) / Math.PI, DiscCoverage.FractionInside(1, 1, 1), 12);
        Assert.Equal(1, DiscCoverage.FractionInside(2, 1, 0.5));
        Assert.Equal(0, DiscCoverage.FractionInside(1, 1, 2.5));
    }

    // Allen's Astrophysical Quantities (Cox 2000): full Moon V = −12.74 at mean distance (1 AU from the Sun, 384 400 km).
    [Fact]
    public void The_full_moon_at_mean_distance_has_magnitude_minus_12_74()
    {
        Assert.Equal(-12.74, MoonBrightness.VisualMagnitude(149_597_870.7, 384_400, 0), 0.01);
        // Common practice: the full Moon's surface brightness is about 3.3 mag/arcsec².
        Assert.InRange(MoonBrightness.SurfaceBrightness(-12.74, 932.6), 3.2, 3.5);
    }

    // Kasten & Young (1989), Appl. Opt. 28, 4735: air mass 1 at the zenith, near sec z at 30° altitude, and 38.09 at the
    // horizon in their tabulated rigorous model, which their fitted formula meets to 0.5 % (37.92).
    [Theory]
    [InlineData(90, 1.0, 0.001)]
    [InlineData(30, 1.9942, 0.005)]
    [InlineData(10, 5.60, 0.02)]
    [InlineData(0, 38.09, 0.2)]
    public void Air_mass_follows_Kasten_and_Young(double altitude, double expected, double tolerance)
    {
        Assert.Equal(expected, AtmosphericExtinction.AirMass(altitude), tolerance);
    }

    // Green (1992), ICQ 14, 55 (from memory): 0.1451 + 0.120 + 0.016 = 0.281 mag per air mass at sea level, less higher up.
    [Fact]
    public void Extinction_is_0_28_magnitudes_per_air_mass_at_sea_level()
    {
        Assert.Equal(0.2811, AtmosphericExtinction.CoefficientForHeight(0), 0.0001);
        Assert.True(AtmosphericExtinction.CoefficientForHeight(2500) < 0.2);
    }

    // Published mid-totality brightness of specific eclipses with their observed Danjon L, against the whole-disc
    // brightness at greatest eclipse (V = −12.74 − 2.5·log₁₀ of the fraction of the uneclipsed Moon's light; −12.74 is the
    // mean full Moon, common practice). The model states a 1.5-stop (1.63 mag) one-sigma; the check allows that plus the
    // observations' own error.
    // 2008 Feb 21 (umbral magnitude 1.11): REA (Brazil) observers' mean L = 3.0 ± 0.1 and V = −2.8 ± 0.3 (H. C. Vital,
    //   "Understanding REA's observations of the total lunar eclipse of February 20–21, 2008").
    // 2004 Oct 28: V = −2.2 ± 0.2 averaged over 13 REA observers (H. C. Vital, "Report on the total lunar eclipse of
    //   Oct. 28, 2004"); L = 2.4 at mid-eclipse (P. Harrington, philharrington.net, "Total lunar eclipse of 2004 October 27–28").
    [Theory]
    [InlineData(2008, 2, 21, 3.0, -2.8, 0.3)]
    [InlineData(2004, 10, 28, 2.4, -2.2, 0.2)]
    public void Totality_brightness_matches_published_observations_within_the_stated_uncertainty(
        int year, int month, int day, double danjon, double observedV, double observedSigma)
    {
        var eclipse = EclipseFinder.For(ShadowModel.Danjon).OnUtcDate(new CalendarDate(year, month, day, true), TimeScaleConverter.Default)!;
        var hours = eclipse.GreatestEclipse.SecondsSince(eclipse.Passage.Center) / 3600;
        var g = eclipse.Passage.At(hours);
        var disc = EclipsedMoonBrightness.WholeDisc(g, ShadowCrossSection.RadiiTowardMoon(ShadowModel.Danjon, g), danjon);
        var v = -12.74 - 2.5 * Math.Log10(disc);
        var statedMagnitudes = UmbralGlow.UncertaintyStops * 2.5 * Math.Log10(2);
        output.WriteLine($"{year}-{month:00}-{day:00}: model V = {v:F2} for L = {danjon}, observed {observedV} ± {observedSigma}");
        Assert.Equal(observedV, v, statedMagnitudes + observedSigma);
    }

    [Fact]
    public void Brightness_falls_steadily_into_the_shadow()
    {
        var g = new ShadowGeometry(0, 0.0005, 384_400, 149_597_870.7, 0);
        var radii = ShadowCrossSection.RadiiTowardMoon(ShadowModel.Danjon, g);
        var previous = double.MaxValue;
        for (var rho = radii.Penumbra.Radians * 1.05; rho > 0; rho -= 0.0002)
        {
            var b = EclipsedMoonBrightness.AtPoint(rho, radii, g.SunParallax.Radians, 2);
            Assert.True(b <= previous + 1e-12, $"brightness rises at ρ = {Angle.FromRadians(rho).Degrees:F3}°");
            previous = b;
        }
    }
}
