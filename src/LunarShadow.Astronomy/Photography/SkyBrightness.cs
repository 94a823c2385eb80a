namespace LunarShadow.Astronomy.Photography;

/// <summary>The brightness of the clear sky by the Sun's altitude: what a long exposure of a low Moon also records.</summary>
public static class SkyBrightness
{
    // Common practice (e.g. Krisciunas & Schaefer 1991, PASP 103, 1033, whose dark-sky zenith is about 21.6–21.9): a dark
    // moonless zenith at V ≈ 21.8 mag/arcsec² (from memory).
    /// <summary>The dark-sky zenith, V magnitudes per square arc-second.</summary>
    public const double DarkZenithMagnitudesPerArcsec2 = 21.8;

    // Common practice (from memory: a clear blue sky measures some 2000–8000 cd/m² away from the Sun).
    /// <summary>The clear daytime sky once the Sun stands 10° or more up, cd/m².</summary>
    public const double DaylightLuminance = 4000;

    // Meinel & Meinel (1983), "Sunsets, Twilights and Evening Skies", p. 38 (zenith twilight), as fitted by J. Thorstensen
    // (skycalc): Δm = ((2.0635175·y + 1.246602)·y − 9.4084495)·y + 6.132725 with y = (−h☉ − 9)/9, for −18° ≤ h☉ ≤ 0°;
    // it agrees with Ashburn (1952), J. Geophys. Res. 57, 85. Accuracy: about half a magnitude.
    /// <summary>How many magnitudes the twilight zenith is brighter than the dark zenith, Sun at a true altitude in degrees.</summary>
    public static double TwilightBrighteningMagnitudes(double sunAltitudeDegrees)
    {
        if (sunAltitudeDegrees <= -18) return 0;
        var y = (-Math.Min(sunAltitudeDegrees, 0) - 9) / 9;
        return Math.Max(0, ((2.0635175 * y + 1.246602) * y - 9.4084495) * y + 6.132725);
    }

    /// <summary>
    /// The sky's luminance (cd/m²) for the Sun at a true altitude: the twilight model from −18° to 0°, then log-linear
    /// to the daylight value at +10° and constant above (a documented rule, not a model of the sky's brightness across
    /// its face: near the horizon the twilight sky is brighter than at the zenith, so this is a lower bound there).
    /// </summary>
    public static double Luminance(double sunAltitudeDegrees)
    {
        var atHorizon = MoonBrightness.Luminance(DarkZenithMagnitudesPerArcsec2 - TwilightBrighteningMagnitudes(0));
        if (sunAltitudeDegrees <= 0) return MoonBrightness.Luminance(DarkZenithMagnitudesPerArcsec2 - TwilightBrighteningMagnitudes(sunAltitudeDegrees));
        var f = Math.Min(sunAltitudeDegrees, 10) / 10;
        return Math.Exp(Math.Log(atHorizon) + f * (Math.Log(DaylightLuminance) - Math.Log(atHorizon)));
    }
}
