using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Sites;

/// <summary>What the Moon does at the horizon.</summary>
public enum MoonEventType
{
    /// <summary>
    /// The upper limb rises: by the almanac convention to 0° apparent altitude (refraction, no dip), or, for a site
    /// that asks for a sea horizon, to the dip below 0°.
    /// </summary>
    Rise,

    /// <summary>The upper limb sets (the same convention).</summary>
    Set,

    /// <summary>The upper limb climbs above the local horizon profile.</summary>
    ClearsHorizonProfile,

    /// <summary>The upper limb sinks behind the local horizon profile.</summary>
    HiddenByHorizonProfile,
}

/// <summary>One horizon event of the Moon.</summary>
/// <param name="Type">Which event.</param>
/// <param name="Tt">When, TT.</param>
/// <param name="Utc">When, UTC.</param>
/// <param name="Azimuth">Where, degrees from north through east.</param>
public sealed record MoonEvent(MoonEventType Type, TtInstant Tt, Instant Utc, double Azimuth);

/// <summary>Whether the Moon crosses the horizon in the eclipse night at all.</summary>
public enum MoonHorizonState
{
    /// <summary>It rises or sets (or both) within 12 hours of greatest eclipse.</summary>
    RisesOrSets,

    /// <summary>It stays above the horizon all through the 24 hours about greatest eclipse.</summary>
    UpThroughout,

    /// <summary>It stays below the horizon all through the 24 hours about greatest eclipse.</summary>
    DownThroughout,
}
