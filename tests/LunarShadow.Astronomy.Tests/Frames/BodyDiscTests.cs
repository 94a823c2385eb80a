using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Frames;

public class BodyDiscTests
{
    // Meeus (1998), ch. 55: the Moon's semi-diameter s = asin(k·sin π), k = 0.2725076, π the equatorial horizontal
    // parallax. At the mean distance 384 400 km the Moon's semi-diameter is about 15′32.6″ = 932.6″ (from memory).
    [Fact]
    public void The_Moon_semi_diameter_is_k_times_the_sine_of_the_parallax()
    {
        var parallax = BodyDisc.HorizontalParallax(384_400);
        Assert.Equal(Math.Asin(0.2725076 * Math.Sin(parallax.Radians)), BodyDisc.MoonSemiDiameter(384_400).Radians, 15);
        Assert.InRange(BodyDisc.MoonSemiDiameter(384_400).Arcseconds, 932.0, 933.2);
    }

    // Meeus (1998), ch. 40: the topocentric semi-diameter follows sin s′ = sin s · Δ/Δ′; for the Moon that is the same
    // as asin(k·a/Δ′), the semi-diameter at the topocentric distance.
    [Theory]
    [InlineData(384_400, 378_000)]
    [InlineData(356_500, 351_000)]
    [InlineData(406_700, 400_500)]
    public void A_semi_diameter_rescaled_to_another_distance_is_the_semi_diameter_at_that_distance(double geocentricKm, double topocentricKm)
    {
        var rescaled = BodyDisc.AtDistance(BodyDisc.MoonSemiDiameter(geocentricKm), geocentricKm, topocentricKm);
        Assert.Equal(BodyDisc.MoonSemiDiameter(topocentricKm).Radians, rescaled.Radians, 14);
    }

    // IAU: one radian is 206 264.806 247″.
    [Fact]
    public void One_arcsecond_is_one_206265th_of_a_radian()
    {
        Assert.Equal(206_264.806247, 1 / Angle.RadiansPerArcsecond, 5);
        Assert.Equal(Math.PI / 180, 3600 * Angle.RadiansPerArcsecond, 15);
    }
}
