namespace LunarShadow.Astronomy.Photography;

/// <summary>How the camera is mounted.</summary>
public enum Mount
{
    /// <summary>A fixed tripod: the sky turns past the camera.</summary>
    FixedTripod,

    /// <summary>A mount tracking the stars: the Moon drifts slowly against them.</summary>
    SiderealTracking,

    /// <summary>A mount tracking the Moon itself.</summary>
    LunarTracking,
}

/// <summary>A camera, lens and exposure choices.</summary>
/// <param name="SensorWidthMm">Sensor width, mm.</param>
/// <param name="SensorHeightMm">Sensor height, mm.</param>
/// <param name="PixelPitchMicrons">Pixel pitch, µm.</param>
/// <param name="FocalLengthMm">Lens focal length, mm.</param>
/// <param name="FocalMultiplier">Teleconverter or other focal multiplier (1 for none).</param>
/// <param name="Mount">How the camera is mounted.</param>
/// <param name="Iso">ISO speed (ignored when <paramref name="ShutterSeconds"/> is given: the ISO is then computed).</param>
/// <param name="Aperture">f-number.</param>
/// <param name="ShutterSeconds">A fixed shutter time, or null to compute the shutter for the ISO.</param>
/// <param name="FastestShutterSeconds">The camera's fastest settable shutter, s (default 1/8000).</param>
/// <param name="SlowestShutterSeconds">The camera's slowest timed shutter, s (default 30).</param>
public sealed record Camera(
    double SensorWidthMm, double SensorHeightMm, double PixelPitchMicrons, double FocalLengthMm, double FocalMultiplier,
    Mount Mount, double Iso, double Aperture, double? ShutterSeconds = null,
    double FastestShutterSeconds = Camera.DefaultFastestShutterSeconds, double SlowestShutterSeconds = Camera.DefaultSlowestShutterSeconds)
{
    // Common practice: the timed shutter range of current interchangeable-lens cameras is 1/8000 s to 30 s.
    /// <summary>The default fastest shutter, s.</summary>
    public const double DefaultFastestShutterSeconds = 1.0 / 8000;

    /// <summary>The default slowest timed shutter, s.</summary>
    public const double DefaultSlowestShutterSeconds = 30;

    /// <summary>Effective focal length, mm.</summary>
    public double EffectiveFocalLengthMm => FocalLengthMm * FocalMultiplier;

    /// <summary>Effective f-number (a teleconverter multiplies it too).</summary>
    public double EffectiveAperture => Aperture * FocalMultiplier;
}

/// <summary>Choices for the plan.</summary>
/// <param name="Danjon">Expected Danjon luminosity L, 0–4.</param>
/// <param name="IntervalMinutes">Timeline step, minutes.</param>
/// <param name="BracketStops">Bracket of ±N stops around the suggested exposure.</param>
/// <param name="BlurPixels">Largest acceptable motion blur, pixels.</param>
/// <param name="ExtinctionPerAirMass">Extinction coefficient, magnitudes per air mass, or null for the site-height default.</param>
/// <param name="CompositeGap">Gap between successive discs of a multi-exposure, as a fraction of the Moon's diameter.</param>
/// <param name="TimeLapseIntervalSeconds">Time-lapse interval, seconds.</param>
/// <param name="FileSizeMegabytes">Size of one frame, MB.</param>
/// <param name="Start">Start of the fixed-frame check, or null for the first visible moment.</param>
public sealed record PhotoSettings(
    double Danjon = UmbralGlow.DefaultDanjon, double IntervalMinutes = 5, int BracketStops = 2, double BlurPixels = 1,
    double? ExtinctionPerAirMass = null, double CompositeGap = 0.25, double TimeLapseIntervalSeconds = 10, double FileSizeMegabytes = 30,
    Time.TtInstant? Start = null);
