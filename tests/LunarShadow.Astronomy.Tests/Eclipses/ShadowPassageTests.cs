using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Astronomy.Tests.Eclipses;

public class ShadowPassageTests
{
    // Common practice: the fitted passage must stand in for the ephemeris; 0.01″ of the Moon's motion is 0.02 s of time.
    // A passage is fitted about a full Moon: lunation 0 (2000 January), one near −1960 and one near +2970.
    [Theory]
    [InlineData(0L)]
    [InlineData(-49000L)]
    [InlineData(12000L)]
    public void The_fitted_passage_reproduces_the_ephemeris_to_a_hundredth_of_an_arcsecond(long lunation)
    {
        var center = MeanLunation.FullMoon(lunation);
        var passage = ShadowPassage.Compute(ApparentPlaceCalculator.Default, center);
        var toDate = ApparentPlaceCalculator.ToTrueEquatorOfDate(center).Matrix;
        for (var hours = -4.9; hours <= 4.9; hours += 0.7)
        {
            var (moonJ2000, sunJ2000) = ApparentPlaceCalculator.Default.ApparentVectorsJ2000Ecliptic(passage.InstantAt(hours));
            var moon = (toDate * moonJ2000).Normalized();
            var axis = (-(toDate * sunJ2000)).Normalized();
            var direct = Math.Atan2(moon.Cross(axis).Length, moon.Dot(axis));
            var fitted = passage.At(hours).Separation.Radians;
            Assert.True(Math.Abs(direct - fitted) * 206264.806 < 0.01, $"{(direct - fitted) * 206264.806:F4}″ at {hours} h");
            var fittedMoon = passage.MoonDirectionOfDate(hours);
            Assert.True(fittedMoon.Cross(moon).Length * 206264.806 < 0.01);
        }
    }

    [Fact]
    public void Hours_and_instants_convert_both_ways()
    {
        var passage = ShadowPassage.Compute(ApparentPlaceCalculator.Default, TtInstant.FromJulianDate(2460748.79));
        Assert.Equal(1.25, passage.HoursFromCenter(passage.InstantAt(1.25)), 6); // a Julian date in a double resolves ~40 µs
        // Five Millennium Canon (Espenak & Meeus 2009): gamma +0.3484 on 2025 March 14, the Moon north of the shadow axis
        // at greatest eclipse, so its direction from the axis points north (position angle near 0°).
        Assert.True(Math.Cos(passage.At(0).DirectionFromAxis.Radians) > 0.5, $"{passage.At(0).DirectionFromAxis.Degrees}°");
    }
}
