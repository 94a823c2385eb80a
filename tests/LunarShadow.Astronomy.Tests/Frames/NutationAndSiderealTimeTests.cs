using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Frames;

public class NutationAndSiderealTimeTests
{
    // Meeus (1998), Example 22.a, 1987 April 10, 0h TD: Δψ = −3.788″, Δε = +9.443″ (IAU 1980 theory; IAU 2000B
    // differs from it by a few hundredths of an arc-second at most).
    [Fact]
    public void Nutation_matches_Meeus_example_22a()
    {
        var nutation = NutationIau2000B.At(TtInstant.FromJulianDate(2446895.5));
        Assert.Equal(-3.788, nutation.InLongitude.Arcseconds, 0.02);
        Assert.Equal(9.443, nutation.InObliquity.Arcseconds, 0.02);
    }

    // Meeus (1998), Example 22.a: ε₀ = 23°26′27.407″ on Lieske's 84381.448″ at J2000; IAU 2006 starts from 84381.406″,
    // so ours is 0.042″ smaller by definition, and its rate (−46.836769″/cy against −46.8150″/cy) adds 0.003″ by 1987.
    [Fact]
    public void Mean_obliquity_matches_Meeus_example_22a_after_the_IAU_2006_offset()
    {
        var tt = TtInstant.FromJulianDate(2446895.5);
        var expected = 23 * 3600 + 26 * 60 + 27.407 - 0.042;
        Assert.Equal(expected, Obliquity.MeanIau2006(tt).Arcseconds, 0.005);
        Assert.Equal(expected, Obliquity.Mean(tt).Arcseconds, 0.005);
    }

    // Meeus (1998), Examples 12.a and 12.b: mean sidereal time at Greenwich 1987 April 10 0h UT = 13h10m46.3668s,
    // at 19h21m00s UT = 8h34m57.0896s. Meeus uses the IAU 1982 expression; IAU 2006 carries the corrected precession rate
    // (Capitaine et al. 2003), which puts it about 3.3 ms later in 1987, hence the 5 ms tolerance.
    [Theory]
    [InlineData(2446895.5, 13, 10, 46.3668)]
    [InlineData(2446896.30625, 8, 34, 57.0896)]
    public void Mean_sidereal_time_matches_Meeus_chapter_12(double jdUt1, int h, int m, double s)
    {
        var ut1 = Ut1Instant.FromJulianDate(jdUt1);
        var tt = TtInstant.FromJulianDate(jdUt1 + 55.3 / 86400);
        var gmst = EarthRotation.GreenwichMeanSiderealTime(ut1, tt);
        Assert.Equal(h * 3600 + m * 60 + s, gmst.Hours * 3600, 0.005);
    }

    // Meeus (1998), Example 12.a: apparent sidereal time 1987 April 10 0h UT = 13h10m46.1351s (IAU 1982 basis, as above).
    [Fact]
    public void Apparent_sidereal_time_matches_Meeus_example_12a()
    {
        var ut1 = Ut1Instant.FromJulianDate(2446895.5);
        var tt = TtInstant.FromJulianDate(2446895.5 + 55.3 / 86400);
        var nutation = NutationIau2000B.At(tt);
        var gast = EarthRotation.GreenwichApparentSiderealTime(ut1, tt, nutation, Obliquity.Mean(tt));
        Assert.Equal(13 * 3600 + 10 * 60 + 46.1351, gast.Hours * 3600, 0.005);
    }

    // IERS Conventions (2010), eq. 5.15: ERA at J2000.0 UT1 is 0.7790572732640 turns.
    [Fact]
    public void Earth_rotation_angle_at_J2000_is_the_IERS_constant()
    {
        var era = EarthRotation.EarthRotationAngle(Ut1Instant.FromJulianDate(2451545.0));
        Assert.Equal(0.7790572732640 * 360, era.Degrees, 9);
    }

    // Meeus (1998), eq. 12.4 (IAU 1982): θ₀ = 280.46061837° + 360.98564736629°·d + 0.000387933°·T² − T³/38710000, d days and
    // T centuries from J2000.0. 4000 years before J2000 (T = −40.75) the IAU 2006 expression (Capitaine et al. 2003, IERS
    // Conventions 2010 eq. 5.32) adds −0.000029956″·T⁴ = −0.023°; with that term the two agree to 0.005° (their T² and T³
    // terms differ by 0.004° there). Ours must agree to that and be reduced to [0°, 360°).
    [Fact]
    public void Sidereal_time_far_from_J2000_agrees_with_the_IAU_1982_polynomial_reduced_to_one_turn()
    {
        const double jd = 1000000.3;
        var gmst = EarthRotation.GreenwichMeanSiderealTime(Ut1Instant.FromJulianDate(jd), TtInstant.FromJulianDate(jd));
        var d = jd - 2451545.0;
        var t = d / 36525;
        var meeus = 280.46061837 + 360.98564736629 * d + 0.000387933 * t * t - t * t * t / 38710000 - 0.000029956 * Math.Pow(t, 4) / 3600;
        var expected = ((meeus % 360) + 360) % 360;
        Assert.True(gmst >= Angle.Zero && gmst.Degrees < 360, $"{gmst.Degrees}°");
        Assert.Equal(expected, gmst.Degrees, 0.005);
    }
}
