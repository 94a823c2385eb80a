using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Frames;

public class RefractionBelowHorizonTests
{
    // Common practice: a body far below the horizon is not seen through the air, so its airless altitude is reported
    // (the Sun at −64.62° stays at −64.62°); near the horizon Sæmundsson's formula applies (Meeus 1998, eq. 16.4: about
    // 29′ at 0° true altitude for 1010 hPa, 10 °C).
    [Fact]
    public void Far_below_the_horizon_the_airless_altitude_is_reported()
    {
        Assert.Equal(-64.62, AtmosphericRefraction.Apply(Angle.FromDegrees(-64.62), AirConditions.Standard).Degrees, 12);
        Assert.Equal(0, AtmosphericRefraction.FromTrueAltitude(Angle.FromDegrees(-5), AirConditions.Standard).Degrees);
        Assert.Equal(0, AtmosphericRefraction.FromApparentAltitude(Angle.FromDegrees(-30), AirConditions.Standard).Degrees);
        Assert.Equal(28.9, AtmosphericRefraction.FromTrueAltitude(Angle.Zero, AirConditions.Standard).Degrees * 60, 0.2);
    }

    [Fact]
    public void The_apparent_altitude_is_continuous_and_increasing_through_the_taper()
    {
        var previous = double.NegativeInfinity;
        for (var h = -10.0; h <= 2; h += 0.001)
        {
            var apparent = AtmosphericRefraction.Apply(Angle.FromDegrees(h), AirConditions.Standard).Degrees;
            Assert.True(apparent > previous, $"apparent altitude falls at {h}°");
            Assert.True(apparent - previous < 0.01 || previous == double.NegativeInfinity, $"jump at {h}°");
            previous = apparent;
        }
    }
}
