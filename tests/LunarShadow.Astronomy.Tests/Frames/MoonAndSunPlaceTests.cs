using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Tests.Support;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Frames;

public class MoonAndSunPlaceTests
{
    private static GeocentricSky SkyAtTt(double jde)
    {
        var tt = TtInstant.FromJulianDate(jde);
        return ApparentPlaceCalculator.Default.Geocentric(tt, TimeScaleConverter.Default.ToUniversalTime(tt));
    }

    // Meeus, Astronomical Algorithms 2nd ed. (1998), Example 47.a, 1992 April 12, 0h TD. Meeus' truncated ELP-2000/82
    // is good to about 10″ in longitude and 4″ in latitude (his ch. 47), which sets the tolerances.
    [Fact]
    public void Moon_matches_Meeus_example_47a()
    {
        var moon = SkyAtTt(2448724.5).Moon;
        AngleAssert.Near(133.167265, moon.EclipticLongitude, 10);
        AngleAssert.Near(-3.229126, moon.EclipticLatitude, 4);
        AngleAssert.Near(134.688470, moon.RightAscension, 10);
        AngleAssert.Near(13.768368, moon.Declination, 6);
        Assert.Equal(368409.7, moon.DistanceKm, 5.0);
        AngleAssert.Near(0.991990, moon.HorizontalParallax, 1);
    }

    // The Astronomical Almanac for 1992 as quoted in Meeus (1998), Example 25.b, 1992 October 13.0 TD:
    // α = 13h13m30.749s, δ = −7°47′01.74″; R = 0.99760775 AU from VSOP87 (from the book; distance from memory).
    [Fact]
    public void Sun_matches_the_almanac_values_of_Meeus_example_25b()
    {
        var sun = SkyAtTt(2448908.5).Sun;
        AngleAssert.Near((13 + 13 / 60.0 + 30.749 / 3600) * 15, sun.RightAscension, 0.5);
        AngleAssert.Near(-(7 + 47 / 60.0 + 1.74 / 3600), sun.Declination, 0.3);
        Assert.Equal(0.99760775, sun.DistanceKm / 149_597_870.7, 1e-5);
    }

    // Meeus (1998), ch. 55: the Sun's semi-diameter is 959.63″ at 1 AU; ch. 47: π = asin(6378.14/Δ) for the Moon.
    [Fact]
    public void Semi_diameters_follow_the_distances()
    {
        var sky = SkyAtTt(2448908.5);
        Assert.Equal(959.63 / (sky.Sun.DistanceKm / 149_597_870.7), sky.Sun.SemiDiameter.Arcseconds, 1e-6);
        Assert.Equal(Math.Asin(0.2725076 * Math.Sin(sky.Moon.HorizontalParallax.Radians)), sky.Moon.SemiDiameter.Radians, 12);
    }

    [Fact]
    public void The_full_Moon_of_2025_March_14_stands_opposite_the_Sun()
    {
        // Common practice: at a total lunar eclipse the Moon stands within about a degree of the antisolar point.
        var sky = SkyAtTt(2460748.7902);
        var separation = (sky.Moon.EclipticLongitude - sky.Sun.EclipticLongitude).NormalizedPositive().Degrees;
        Assert.InRange(separation, 179.5, 180.5);
    }
}
