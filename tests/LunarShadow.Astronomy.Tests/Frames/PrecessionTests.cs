using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Time;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Frames;

public class PrecessionTests
{
    // IAU 2006 precession, Capitaine, Wallace & Chapront (2003), A&A 412, 567, eq. 40 (ζ_A, z_A, θ_A in arcseconds;
    // coefficients from memory), assembled as P = R3(−z_A)·R2(θ_A)·R3(−ζ_A). A reference for the test only.
    private static RotationMatrix Iau2006(double t)
    {
        const double asec = Math.PI / 648000;
        var zeta = (2.650545 + t * (2306.083227 + t * (0.2988499 + t * (0.01801828 + t * (-0.000005971 + t * -0.0000003173))))) * asec;
        var z = (-2.650545 + t * (2306.077181 + t * (1.0927348 + t * (0.01826837 + t * (-0.000028596 + t * -0.0000002904))))) * asec;
        var theta = t * (2004.191903 + t * (-0.4294934 + t * (-0.04182264 + t * (-0.000007089 + t * -0.0000001274)))) * asec;
        return RotationMatrix.AboutZ(-z) * RotationMatrix.AboutY(theta) * RotationMatrix.AboutZ(-zeta);
    }

    // Vondrák et al. (2011), §5: the long-term model stays within 100 µas of IAU 2006 in the 20th and 21st centuries.
    [Theory]
    [InlineData(1900.0)]
    [InlineData(1950.0)]
    [InlineData(2025.2)]
    [InlineData(2100.0)]
    public void Long_term_precession_agrees_with_IAU_2006_near_the_present(double year)
    {
        var tt = TtInstant.FromJulianDate(2451545.0 + (year - 2000) * 365.25);
        var vondrak = VondrakPrecession.Matrix(tt);
        var iau = Iau2006(tt.JulianCenturiesSinceJ2000);
        foreach (var v in new[] { new CartesianVector(1, 0, 0), new CartesianVector(0, 1, 0), new CartesianVector(0, 0, 1), new CartesianVector(0.6, -0.48, 0.64) })
        {
            var a = vondrak * v;
            var b = iau * v;
            var separationArcseconds = Math.Atan2(a.Cross(b).Length, a.Dot(b)) * 206264.806;
            Assert.True(separationArcseconds < 0.001, $"{separationArcseconds * 1000:F3} mas at {year}");
        }
    }

    [Theory]
    [InlineData(-1999)]
    [InlineData(3000)]
    public void Precession_matrix_stays_orthonormal_at_the_ends_of_the_span(int year)
    {
        var m = VondrakPrecession.Matrix(TtInstant.FromJulianDate(JulianDate.FromCalendar(year, 1, 1).Day));
        var product = m * m.Transposed();
        Assert.Equal(1, product.M11, 12);
        Assert.Equal(1, product.M22, 12);
        Assert.Equal(1, product.M33, 12);
        Assert.Equal(0, product.M12, 12);
    }

    // Common practice: general precession in longitude is about 50.3″ a year, so from −1999 to J2000 the equinox moves
    // about 55.9°; the obliquity then was about 23.9° (Vondrák et al. 2011, Fig. 8).
    [Fact]
    public void Precession_over_four_millennia_is_of_the_known_size()
    {
        var tt = TtInstant.FromJulianDate(JulianDate.FromCalendar(-1999, 1, 1).Day);
        var m = VondrakPrecession.Matrix(tt);
        var pole = VondrakPrecession.EquatorPole(tt);
        Assert.InRange(Math.Acos(pole.Z) * 180 / Math.PI, 21.5, 23.0);
        Assert.InRange(Obliquity.Mean(tt).Degrees, 23.8, 24.0);
        Assert.True(m.M33 < 0.99);
    }
}
