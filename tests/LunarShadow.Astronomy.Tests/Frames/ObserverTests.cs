using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Frames;

public class ObserverTests
{
    // Meeus (1998), Example 40.a: Mars from Palomar (φ = 33°21′22″, L = 7h47m27s W, H = 1706 m), 2003 Aug 28 3h17m UT,
    // θ₀ = 1h40m45s, α = 22h38m07.25s, δ = −15°46′15.9″, Δ = 0.37276 AU → α′ = 22h38m08.54s, δ′ = −15°46′30.0″.
    [Fact]
    public void Topocentric_place_matches_Meeus_example_40a()
    {
        var direction = CartesianVector.FromSpherical(Angle.FromHours(22 + 38 / 60.0 + 7.25 / 3600).Radians, Angle.FromDegrees(-(15 + 46 / 60.0 + 15.9 / 3600)).Radians, 0.37276 * 149_597_870.7);
        var place = new ApparentPlace(direction.Longitude, direction.Latitude, direction.Length, Angle.Zero, Angle.Zero, Angle.Zero, Angle.Zero, direction);
        var palomar = new GeodeticLocation(Angle.FromDegrees(33 + 21 / 60.0 + 22 / 3600.0), Angle.FromHours(-(7 + 47 / 60.0 + 27 / 3600.0)), 1706);
        var topocentric = ApparentPlaceCalculator.Topocentric(place, Angle.FromHours(1 + 40 / 60.0 + 45 / 3600.0), palomar, AirConditions.Standard);
        Assert.Equal((22 * 60 + 38) * 60 + 8.54, topocentric.RightAscension.Hours * 3600, 0.02);
        Assert.Equal(-(15 + 46 / 60.0 + 30.0 / 3600) * 3600, topocentric.Declination.Arcseconds, 0.15);
    }

    // Common practice: a body on the local meridian south of the zenith has azimuth 180° and altitude 90° − φ + δ.
    [Fact]
    public void A_body_on_the_meridian_stands_due_south_at_the_colatitude_plus_declination()
    {
        var h = HorizontalCoordinates.FromHourAngle(Angle.Zero, Angle.FromDegrees(10), Angle.FromDegrees(50));
        Assert.Equal(50, h.Altitude.Degrees, 9);
        Assert.Equal(180, h.Azimuth.Degrees, 9);
    }

    // Meeus (1998), Example 13.b: Venus from Washington, H = 64.352133°, δ = −6°43′11.61″, φ = +38°55′17″ →
    // A = 68.0337° from the south (248.0337° from the north), h = 15.1249°.
    [Fact]
    public void Altitude_and_azimuth_match_Meeus_example_13b()
    {
        var h = HorizontalCoordinates.FromHourAngle(Angle.FromDegrees(64.352133), Angle.FromDegrees(-(6 + 43 / 60.0 + 11.61 / 3600)), Angle.FromDegrees(38 + 55 / 60.0 + 17 / 3600.0));
        Assert.Equal(15.1249, h.Altitude.Degrees, 1e-4);
        Assert.Equal(248.0337, h.Azimuth.Degrees, 1e-4);
        // The local components (north, east, up) of the same direction give the same place: the one home both paths use.
        var back = h.LocalUnitVector();
        var again = HorizontalCoordinates.FromLocalComponents(back.X * 3, back.Y * 3, back.Z * 3);
        Assert.Equal(h.Altitude.Degrees, again.Altitude.Degrees, 1e-12);
        Assert.Equal(h.Azimuth.Degrees, again.Azimuth.Degrees, 1e-12);
    }

    // NIMA TR8350.2 (WGS84): a = 6378.137 km; b = a(1 − f) = 6356.752 km.
    [Fact]
    public void Poles_and_equator_lie_on_the_WGS84_ellipsoid()
    {
        Assert.Equal(6378.137, GeodeticLocation.FromDegrees(0, 0).EarthFixedKm().X, 6);
        Assert.Equal(6356.752314, GeodeticLocation.FromDegrees(90, 0).EarthFixedKm().Z, 6);
        Assert.Equal(6379.137, GeodeticLocation.FromDegrees(0, 90, 1000).EarthFixedKm().Y, 6);
    }

    // Meeus (1998), ch. 16: Bennett's formula gives about 34.5′ at the apparent horizon (common practice: 34′), and
    // Sæmundsson's formula is consistent with it to within about 4″ for altitudes above the horizon.
    [Fact]
    public void Refraction_formulae_give_the_horizon_value_and_invert_each_other()
    {
        Assert.Equal(34.5, AtmosphericRefraction.FromApparentAltitude(Angle.Zero, AirConditions.Standard).Degrees * 60, 0.1);
        for (var trueAltitude = 0.0; trueAltitude <= 89; trueAltitude += 0.5)
        {
            var h = Angle.FromDegrees(trueAltitude);
            var apparent = AtmosphericRefraction.Apply(h, AirConditions.Standard);
            var back = apparent - AtmosphericRefraction.FromApparentAltitude(apparent, AirConditions.Standard);
            Assert.True(Math.Abs((back - h).Arcseconds) < 4.5, $"{(back - h).Arcseconds:F2}″ at {trueAltitude}°");
        }
    }

    // Meeus (1998), ch. 16: refraction scales with (P/1010)(283/(273 + T)).
    [Fact]
    public void Refraction_scales_with_pressure_and_temperature()
    {
        var standard = AtmosphericRefraction.FromTrueAltitude(Angle.FromDegrees(5), AirConditions.Standard);
        var thin = AtmosphericRefraction.FromTrueAltitude(Angle.FromDegrees(5), new AirConditions(505, 10));
        Assert.Equal(standard.Radians / 2, thin.Radians, 12);
    }

    [Fact]
    public void The_Moon_overhead_is_nearer_by_an_Earth_radius()
    {
        var sky = new Astronomy.Frames.ApparentPlaceCalculator(Astronomy.Ephemeris.LunarTheory.Truncated, Astronomy.Ephemeris.EarthOrbitTheory.Vsop87B)
            .Geocentric(Astronomy.Time.TtInstant.FromJulianDate(2460748.79), Astronomy.Time.Ut1Instant.FromJulianDate(2460748.79 - 69.2 / 86400));
        var subLunar = new GeodeticLocation(Angle.Zero, (sky.Moon.RightAscension - sky.GreenwichApparentSiderealTime).NormalizedSigned(), 0);
        // On the equator geodetic and geocentric verticals coincide, so on the Moon's meridian its geocentric zenith distance
        // is z = |δ|; parallax in altitude (Meeus 1998, ch. 40: sin p = (a/Δ)·sin z′, a = 6378.14 km) lowers it to
        // z′ = atan2(sin z, cos z − a/Δ), here about 0.3°: the check holds it to 0.005°.
        var topocentric = ApparentPlaceCalculator.Topocentric(sky.Moon, sky.GreenwichApparentSiderealTime, subLunar, AirConditions.Standard);
        var z = Math.Abs(sky.Moon.Declination.Radians);
        var zTopocentric = Math.Atan2(Math.Sin(z), Math.Cos(z) - 6378.14 / sky.Moon.DistanceKm);
        Assert.Equal(90 - zTopocentric * 180 / Math.PI, topocentric.TrueAltitude.Degrees, 0.005);
        Assert.True(topocentric.DistanceKm < sky.Moon.DistanceKm - 6300);
        Assert.True(topocentric.SemiDiameter > sky.Moon.SemiDiameter);
    }
}
