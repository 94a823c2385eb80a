using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Frames;

public class MoonOrientationTests
{
    // Meeus, Astronomical Algorithms 2nd ed. (1998), Example 53.a: 1992 April 12, 0h TD.
    private static readonly TtInstant Example53a = TtInstant.FromJulianDate(2448724.5);

    private static MoonPhysicalEphemeris FromOurEphemeris()
    {
        var sky = ApparentPlaceCalculator.Default.Geocentric(Example53a, TimeScaleConverter.Default.ToUniversalTime(Example53a));
        var orientation = MoonOrientation.At(Example53a, sky.Nutation, sky.MeanObliquity);
        return MoonPhysicalEphemeris.Compute(orientation, sky.Moon.TrueEquatorialKm, sky.Moon.TrueEquatorialKm, sky.Sun.TrueEquatorialKm);
    }

    // Meeus (1998), Example 53.a, printed to 0.01°: l = −1.23°, b = +4.20°, P = 15.08°. Our Moon differs from his
    // ch. 47 Moon by up to 10″, which moves the librations by under 0.003°; so the tolerance is half the last printed
    // digit plus that.
    [Fact]
    public void Libration_and_axis_match_Meeus_example_53a()
    {
        var physical = FromOurEphemeris();
        Assert.Equal(-1.23, physical.Libration.Longitude.Degrees, 0.008);
        Assert.Equal(4.20, physical.Libration.Latitude.Degrees, 0.008);
        Assert.Equal(15.08, physical.AxisPositionAngle.Degrees, 0.008);
    }

    // Meeus (1998), Example 53.a: selenographic position of the Sun l0 = 67.90°, b0 = +1.46° (the book's values, as
    // also reproduced by the astronomia package's test of the same example).
    [Fact]
    public void Sub_solar_point_matches_Meeus_example_53a()
    {
        var physical = FromOurEphemeris();
        Assert.Equal(67.90, physical.SubSolarPoint.Longitude.Degrees, 0.008);
        Assert.Equal(1.46, physical.SubSolarPoint.Latitude.Degrees, 0.008);
    }

    // The same example fed with Meeus' own inputs (Example 47.a: apparent λ = 133.167265°, β = −3.229126°,
    // α = 134.688470°, Δψ = +0.004610°, true ε = 23.440636°), so that only the orientation is under test.
    [Fact]
    public void With_Meeus_inputs_the_librations_and_axis_reproduce_example_53a()
    {
        var nutation = new Nutation(Angle.FromDegrees(0.004610), Angle.Zero);
        var orientation = MoonOrientation.At(Example53a, nutation, Angle.FromDegrees(23.440636));
        var ecliptic = CartesianVector.FromSpherical(Angle.FromDegrees(133.167265).Radians, Angle.FromDegrees(-3.229126).Radians, 368409.7);
        var moon = RotationMatrix.AboutX(-Angle.FromDegrees(23.440636).Radians) * ecliptic;
        // Consistency of the inputs: the right ascension Meeus prints follows from them.
        Assert.Equal(134.688470, moon.Longitude.Degrees, 0.00001);
        var subEarth = orientation.PointToward(-moon);
        Assert.Equal(-1.23, subEarth.Longitude.Degrees, 0.005);
        Assert.Equal(4.20, subEarth.Latitude.Degrees, 0.005);
        Assert.Equal(15.08, orientation.AxisPositionAngle(moon).Degrees, 0.005);
    }

    // Common practice (definition): the sub-Earth point of a geocentric observer lies at the centre of the disc, and a
    // point on the Moon toward the north pole appears at the axis' position angle.
    [Fact]
    public void The_pole_appears_at_the_axis_position_angle_and_the_sub_Earth_point_at_the_disc_centre()
    {
        var orientation = MoonOrientation.At(Example53a);
        var moon = new CartesianVector(-250000, 270000, 88000);
        var subEarth = orientation.PointToward(-moon);
        var surface = orientation.ToTrueEquatorOfDate * subEarth.ToVector(1737.4);
        Assert.True(surface.Normalized().Dot(-moon.Normalized()) > 1 - 1e-12);
        var pole = orientation.ToTrueEquatorOfDate * SelenographicPoint.FromDegrees(90, 0).ToVector(1737.4);
        Assert.Equal(orientation.AxisPositionAngle(moon).Degrees, MoonOrientation.PositionAngle(pole, moon).Degrees, 1e-9);
    }

    // Meeus (1998), ch. 53: the total libration stays within about ±8° in longitude and ±7° in latitude; over a Saros
    // of daily samples ours must stay inside those bounds (common practice: 8.2° and 7.0° with margin).
    [Fact]
    public void Librations_stay_within_their_known_bounds_over_eighteen_years()
    {
        double maxL = 0, maxB = 0;
        for (var day = 0; day < 6585; day += 3)
        {
            var tt = TtInstant.FromJulianDate(2451545.0 + day);
            var sky = ApparentPlaceCalculator.Default.Geocentric(tt, TimeScaleConverter.Default.ToUniversalTime(tt));
            var p = MoonPhysicalEphemeris.Compute(MoonOrientation.At(tt, sky.Nutation, sky.MeanObliquity), sky.Moon.TrueEquatorialKm, sky.Moon.TrueEquatorialKm, sky.Sun.TrueEquatorialKm);
            maxL = Math.Max(maxL, Math.Abs(p.Libration.Longitude.Degrees));
            maxB = Math.Max(maxB, Math.Abs(p.Libration.Latitude.Degrees));
        }
        Assert.InRange(maxL, 7.0, 8.2);
        Assert.InRange(maxB, 6.5, 7.0);
    }
}
