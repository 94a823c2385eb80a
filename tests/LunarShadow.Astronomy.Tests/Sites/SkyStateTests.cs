using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Tests.Sites;

public class SkyStateTests
{
    // Explanatory Supplement to the Astronomical Almanac (2013), ch. 15: sunrise/sunset with the Sun's centre at −0°50′;
    // civil, nautical and astronomical twilight end at −6°, −12° and −18°.
    [Fact]
    public void The_twilight_thresholds_are_the_almanac_ones()
    {
        Assert.Equal(-50.0 / 60, SkyStates.SunsetAltitude.Degrees, 12);
        Assert.Equal(-6, SkyStates.CivilTwilightEndAltitude.Degrees, 12);
        Assert.Equal(-12, SkyStates.NauticalTwilightEndAltitude.Degrees, 12);
        Assert.Equal(-18, SkyStates.AstronomicalTwilightEndAltitude.Degrees, 12);
        Assert.Equal([SkyState.Day, SkyState.CivilTwilight, SkyState.NauticalTwilight, SkyState.AstronomicalTwilight, SkyState.Night],
            SkyStates.Thresholds.Select(t => t.State));
    }

    // Same source: each state holds from its threshold up to the one above it (walked every 0.1° from −90° to +90°).
    [Fact]
    public void Every_sun_altitude_falls_in_the_state_of_the_thresholds_around_it()
    {
        for (var tenths = -900; tenths <= 900; tenths++)
        {
            var altitude = Angle.FromDegrees(tenths / 10.0 + 0.01);
            var expected = altitude.Degrees > -50.0 / 60 ? SkyState.Day
                : altitude.Degrees > -6 ? SkyState.CivilTwilight
                : altitude.Degrees > -12 ? SkyState.NauticalTwilight
                : altitude.Degrees > -18 ? SkyState.AstronomicalTwilight : SkyState.Night;
            Assert.Equal(expected, SkyStates.FromSunAltitude(altitude));
        }
    }
}
