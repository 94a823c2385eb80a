using LunarShadow.Astronomy.Units;

namespace LunarShadow.Astronomy.Photography;

/// <summary>What the lens frames and how long the Moon may be exposed before it blurs.</summary>
/// <param name="FieldWidth">Horizontal field of view (landscape).</param>
/// <param name="FieldHeight">Vertical field of view (landscape).</param>
/// <param name="MoonDiameterPixels">The Moon's image diameter, pixels.</param>
/// <param name="MoonFractionOfFrameHeight">The Moon's diameter as a fraction of the frame's short side.</param>
/// <param name="TrailingLimitSeconds">Longest exposure before blur exceeds the limit on this mount, s (null: the Moon is tracked).</param>
/// <param name="FixedTripodLimitSeconds">The same on a fixed tripod, s.</param>
/// <param name="SiderealLimitSeconds">The same on a sidereal mount, s.</param>
/// <param name="MinutesInFixedFrame">How long the Moon stays wholly in a fixed landscape frame aimed at it at the start, minutes.</param>
public sealed record Framing(
    Angle FieldWidth, Angle FieldHeight, double MoonDiameterPixels, double MoonFractionOfFrameHeight,
    double? TrailingLimitSeconds, double FixedTripodLimitSeconds, double SiderealLimitSeconds, double MinutesInFixedFrame);

/// <summary>Plans for a multi-exposure across the sky and a time-lapse.</summary>
/// <param name="CompositeIntervalSeconds">Interval between exposures so the discs are spaced by the chosen gap, s.</param>
/// <param name="CompositeExposures">Exposures over the visible eclipse.</param>
/// <param name="PathWidth">Horizontal extent of the Moon's path (disc included) over the visible eclipse.</param>
/// <param name="PathHeight">Vertical extent of that path.</param>
/// <param name="FitsLandscape">Whether the path fits the frame held landscape.</param>
/// <param name="FitsPortrait">Whether it fits the frame held portrait.</param>
/// <param name="AimAzimuth">Where to aim the frame's centre: azimuth.</param>
/// <param name="AimAltitude">Where to aim the frame's centre: altitude.</param>
/// <param name="TimeLapseIntervalSeconds">Time-lapse interval, s.</param>
/// <param name="TimeLapseFrames">Frames over the visible eclipse.</param>
/// <param name="TimeLapseMinutes">Duration covered, minutes.</param>
/// <param name="TimeLapsePlaybackSeconds">Playback length at 25 frames per second, s.</param>
/// <param name="TimeLapseStorageGigabytes">Storage needed, GB.</param>
public sealed record Sequences(
    double CompositeIntervalSeconds, int CompositeExposures, Angle PathWidth, Angle PathHeight, bool FitsLandscape, bool FitsPortrait,
    Angle AimAzimuth, Angle AimAltitude, double TimeLapseIntervalSeconds, int TimeLapseFrames, double TimeLapseMinutes,
    double TimeLapsePlaybackSeconds, double TimeLapseStorageGigabytes);

/// <summary>Lens geometry.</summary>
public static class Optics
{
    // Common practice (thin-lens geometry): field of view 2·atan(d/2f).
    /// <summary>The field of view across a sensor dimension.</summary>
    public static Angle FieldOfView(double sensorMm, double focalLengthMm) => Angle.FromRadians(2 * Math.Atan(sensorMm / (2 * focalLengthMm)));

    // Common practice: an angle θ (small) images to f·θ on the sensor; divided by the pixel pitch gives pixels.
    /// <summary>Pixels an angle spans.</summary>
    public static double Pixels(Angle angle, double focalLengthMm, double pixelPitchMicrons) =>
        focalLengthMm * angle.Radians / (pixelPitchMicrons / 1000);

    /// <summary>Longest exposure before an image moving at the given angular rate blurs by the given number of pixels, s.</summary>
    public static double BlurLimitSeconds(double blurPixels, double pixelPitchMicrons, double focalLengthMm, double radiansPerSecond) =>
        blurPixels * pixelPitchMicrons / 1000 / (focalLengthMm * radiansPerSecond);
}
