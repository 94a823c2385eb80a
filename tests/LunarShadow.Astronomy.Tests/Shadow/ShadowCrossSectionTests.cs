using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Shadow;

public class ShadowCrossSectionTests
{
    // A Moon at 384 400 km and the Sun at 1 AU.
    private static readonly ShadowGeometry Typical = new(0.001, 0.002, 384_400, 149_597_870.7, 0);

    // Espenak & Meeus (2009), Five Millennium Canon §1.3 (Danjon): umbra 1.01·π☾ + π☉ − s☉, penumbra 1.01·π☾ + π☉ + s☉.
    [Fact]
    public void Danjon_radii_follow_the_canon_formula()
    {
        var moonParallax = Math.Asin(6378.137 / 384_400);
        var sunParallax = Math.Asin(6378.137 / 149_597_870.7);
        var sunRadius = Angle.FromArcseconds(959.63).Radians;
        var radii = ShadowCrossSection.RadiiTowardMoon(ShadowModel.Danjon, Typical);
        Assert.Equal(1.01 * moonParallax + sunParallax - sunRadius, radii.Umbra.Radians, 12);
        Assert.Equal(1.01 * moonParallax + sunParallax + sunRadius, radii.Penumbra.Radians, 12);
        // Common practice: at the Moon's mean distance the umbra is about 0.7° and the penumbra about 1.23° in radius.
        Assert.InRange(radii.Umbra.Degrees, 0.68, 0.72);
        Assert.InRange(radii.Penumbra.Degrees, 1.21, 1.25);
    }

    // Explanatory Supplement to the Astronomical Ephemeris (1961), Chauvenet's rule: 1.02 × (0.998340·π☾ + π☉ ± s☉).
    [Fact]
    public void Chauvenet_radii_enlarge_the_whole_cone_by_a_fiftieth()
    {
        var geometric = ShadowCrossSection.RadiiTowardMoon(ShadowModel.Geometric, Typical);
        var chauvenet = ShadowCrossSection.RadiiTowardMoon(ShadowModel.Chauvenet, Typical);
        Assert.Equal(1.02 * geometric.Umbra.Radians, chauvenet.Umbra.Radians, 12);
        Assert.Equal(1.02 * geometric.Penumbra.Radians, chauvenet.Penumbra.Radians, 12);
    }

    // WGS84 (NIMA TR8350.2): seen from the equatorial plane the Earth's limb is an ellipse of axis ratio (b + h)/(a + h);
    // seen from over a pole it is a circle.
    [Fact]
    public void The_layer_model_casts_an_elliptical_shadow_flattened_toward_the_poles()
    {
        var model = ShadowModel.Layer(87);
        var east = ShadowCrossSection.Radii(model, Typical, Angle.FromDegrees(90));
        var north = ShadowCrossSection.Radii(model, Typical, Angle.Zero);
        var cone = (a: 6378.137 + 87, b: 6378.137 * (1 - 1 / 298.257223563) + 87);
        var sunRadius = Typical.SunSemiDiameter.Radians;
        Assert.Equal(cone.b / cone.a, (north.Umbra.Radians + sunRadius) / (east.Umbra.Radians + sunRadius), 9);

        var overPole = Typical with { AxisDeclinationRadians = Math.PI / 2 };
        Assert.Equal(ShadowCrossSection.Radii(model, overPole, Angle.FromDegrees(90)).Umbra.Radians,
            ShadowCrossSection.Radii(model, overPole, Angle.Zero).Umbra.Radians, 12);
    }

    [Fact]
    public void A_higher_layer_casts_a_larger_shadow()
    {
        var low = ShadowCrossSection.RadiiTowardMoon(ShadowModel.Layer(40), Typical);
        var high = ShadowCrossSection.RadiiTowardMoon(ShadowModel.Layer(120), Typical);
        Assert.True(high.Umbra > low.Umbra);
        Assert.True(high.Penumbra > low.Penumbra);
    }

    [Theory]
    [InlineData("danjon", ShadowModelKind.Danjon)]
    [InlineData("Chauvenet", ShadowModelKind.Chauvenet)]
    [InlineData("none", ShadowModelKind.None)]
    [InlineData("layer", ShadowModelKind.Layer)]
    public void Models_are_found_by_their_public_names(string name, ShadowModelKind kind)
    {
        Assert.True(ShadowModel.TryParse(name, 87, out var model));
        Assert.Equal(kind, model.Kind);
        Assert.Equal(name.ToLowerInvariant(), model.Name);
    }

    [Fact]
    public void Gamma_is_the_distance_from_the_axis_in_earth_radii_north_positive()
    {
        var south = new ShadowGeometry(0, -0.004, 384_400, 149_597_870.7, 0);
        Assert.Equal(-Math.Sin(Math.Atan(0.004)) * 384_400 / GeodeticLocation.EquatorialRadiusKm, south.DistanceFromAxisInEarthRadii, 12);
    }

    // Meeus (1998), ch. 54: magnitude (ρ + s − d)/(2s): 1 when the Moon's far limb touches the shadow's edge from inside
    // (d = ρ − s), 0 when its near limb touches it from outside (d = ρ + s), negative beyond.
    [Theory]
    [InlineData(0.0123, 0.0045)]
    [InlineData(0.0070, 0.0047)]
    public void Magnitude_is_the_fraction_of_the_Moon_diameter_inside_the_shadow(double rho, double s)
    {
        Assert.Equal(1.0, ShadowCrossSection.Magnitude(rho, s, rho - s), 12);
        Assert.Equal(0.0, ShadowCrossSection.Magnitude(rho, s, rho + s), 12);
        Assert.Equal(0.5, ShadowCrossSection.Magnitude(rho, s, rho), 12);
        Assert.True(ShadowCrossSection.Magnitude(rho, s, rho + 2 * s) < 0);
    }
}
