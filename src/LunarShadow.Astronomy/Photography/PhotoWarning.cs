namespace LunarShadow.Astronomy.Photography;

/// <summary>What a timeline row warns of. The words are written by the caller; the library gives the code and numbers.</summary>
public enum PhotoWarningCode
{
    /// <summary>The Moon is below the horizon (apparent centre altitude under 0°).</summary>
    MoonBelowHorizon,

    /// <summary>The Moon is under 10°: dimmed and blurred by the air. Numbers: altitudeDegrees.</summary>
    LowAltitude,

    /// <summary>The Sun is up. Numbers: sunAltitudeDegrees.</summary>
    Daylight,

    /// <summary>The Sun is less than 12° below the horizon: the sky is bright. Numbers: sunAltitudeDegrees, skyLuminance (cd/m²).</summary>
    TwilightSky,

    /// <summary>
    /// The exposure the Moon needs would saturate the bright sky; it was shortened to the sky's limit. Numbers:
    /// wantedSeconds, cappedSeconds, stopsShort (how far the Moon is left under its ideal exposure), skyLuminance.
    /// </summary>
    SkyLimitsExposure,

    /// <summary>
    /// The exposure exceeds the trailing limit on this mount. Numbers: shutterSeconds, limitSeconds, excessStops,
    /// isoNeeded (ISO to bring the shutter to the limit), shorterFocalLengthMm (the lens at which the limit fits),
    /// stackFrames (frames at the limit to stack), siderealLimitSeconds (a star-tracking mount's limit; a Moon-tracking
    /// mount has none).
    /// </summary>
    Trailing,

    /// <summary>The Moon leaves a fixed frame: re-aim. Numbers: minutesInFrame.</summary>
    LeavingFrame,

    /// <summary>Too bright for the fastest shutter at the chosen aperture and ISO: the aperture was closed. Numbers: fromAperture, toAperture.</summary>
    ApertureClosed,

    /// <summary>The ISO was changed to stay within the shutter's range. Numbers: fromIso, toIso.</summary>
    IsoChanged,

    /// <summary>Even so the fastest shutter over-exposes. Numbers: fastestSeconds, overStops.</summary>
    BeyondFastestShutter,

    /// <summary>Even so the slowest shutter under-exposes. Numbers: slowestSeconds, underStops.</summary>
    BeyondSlowestShutter,

    /// <summary>The fixed shutter given needs an ISO outside 25–409600; the ISO was clamped. Numbers: isoNeeded, iso.</summary>
    IsoOutOfRange,
}

/// <summary>A warning: a code and the numbers that go with it (names as documented on each code).</summary>
/// <param name="Code">What it is.</param>
/// <param name="Numbers">Its numbers, by name.</param>
public sealed record PhotoWarning(PhotoWarningCode Code, IReadOnlyDictionary<string, double> Numbers)
{
    /// <summary>A warning without numbers.</summary>
    public PhotoWarning(PhotoWarningCode code)
        : this(code, new Dictionary<string, double>())
    {
    }

    /// <summary>A number of the warning, or null.</summary>
    public double? this[string name] => Numbers.TryGetValue(name, out var v) ? v : null;
}
