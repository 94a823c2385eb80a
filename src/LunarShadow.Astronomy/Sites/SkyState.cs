using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Sites;

/// <summary>How dark the sky is, by the Sun's altitude.</summary>
public enum SkyState
{
    /// <summary>The Sun's upper limb is above the horizon.</summary>
    Day,

    /// <summary>Sun between sunset and 6° below the horizon.</summary>
    CivilTwilight,

    /// <summary>Sun between 6° and 12° below.</summary>
    NauticalTwilight,

    /// <summary>Sun between 12° and 18° below.</summary>
    AstronomicalTwilight,

    /// <summary>Sun more than 18° below the horizon.</summary>
    Night,
}

/// <summary>Classifies the sky by the Sun's true (airless) altitude.</summary>
public static class SkyStates
{
    // Explanatory Supplement to the Astronomical Almanac (2013), ch. 15: sunrise/sunset at −0°50′ (refraction and
    // semi-diameter), civil, nautical and astronomical twilight end at −6°, −12°, −18°.
    /// <summary>Sunrise and sunset: the Sun's centre at this true altitude (−0°50′).</summary>
    public static Angle SunsetAltitude { get; } = Angle.FromDegrees(-50.0 / 60);

    /// <summary>End of civil twilight (−6°).</summary>
    public static Angle CivilTwilightEndAltitude { get; } = Angle.FromDegrees(-6);

    /// <summary>End of nautical twilight (−12°).</summary>
    public static Angle NauticalTwilightEndAltitude { get; } = Angle.FromDegrees(-12);

    /// <summary>End of astronomical twilight, the start of night (−18°).</summary>
    public static Angle AstronomicalTwilightEndAltitude { get; } = Angle.FromDegrees(-18);

    /// <summary>
    /// Each state with the Sun's true altitude above which it holds (the lowest bound for <see cref="SkyState.Night"/>
    /// is −90°), brightest first: the one table to serve to clients that shade the sky.
    /// </summary>
    public static IReadOnlyList<(SkyState State, Angle SunAbove)> Thresholds { get; } =
    [
        (SkyState.Day, SunsetAltitude),
        (SkyState.CivilTwilight, CivilTwilightEndAltitude),
        (SkyState.NauticalTwilight, NauticalTwilightEndAltitude),
        (SkyState.AstronomicalTwilight, AstronomicalTwilightEndAltitude),
        (SkyState.Night, Angle.FromDegrees(-90)),
    ];

    /// <summary>The sky state for the Sun's centre at a true altitude.</summary>
    public static SkyState FromSunAltitude(Angle trueAltitude)
    {
        foreach (var (state, above) in Thresholds)
            if (trueAltitude.Radians > above.Radians) return state;
        return SkyState.Night;
    }
}
