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
    /// <summary>The sky state for the Sun's centre at a true altitude.</summary>
    public static SkyState FromSunAltitude(Angle trueAltitude) => trueAltitude.Degrees switch
    {
        > -50.0 / 60 => SkyState.Day,
        > -6 => SkyState.CivilTwilight,
        > -12 => SkyState.NauticalTwilight,
        > -18 => SkyState.AstronomicalTwilight,
        _ => SkyState.Night,
    };
}
