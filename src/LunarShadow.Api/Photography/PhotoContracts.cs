namespace LunarShadow.Api.Photography;

/// <summary>A photo plan: a shooting timeline with exposures, framing and sequences.</summary>
/// <param name="Site">The site (echo).</param>
/// <param name="Eclipse">The eclipse.</param>
/// <param name="Night">The local dates of the night that holds the visible part.</param>
/// <param name="Camera">The camera as understood.</param>
/// <param name="Summary">What the site sees, in one line.</param>
/// <param name="Model">The brightness model's settings and uncertainty.</param>
/// <param name="Timeline">Rows at every visible contact and every interval across the visible eclipse.</param>
/// <param name="Framing">Field of view, image scale, blur limits, time in a fixed frame.</param>
/// <param name="Sequences">Multi-exposure and time-lapse plans (null when nothing is visible).</param>
/// <param name="Cautions">Safety notes.</param>
/// <param name="Notes">Notes that hold for a run of timeline rows (an ISO change), once per run with its time range.</param>
/// <param name="MeasuredShadow">With shadow=measured: the crater timings used and the fitted enlargement.</param>
public sealed record PhotoPlanResponse(
    Common.SiteEcho Site, Common.EclipseBrief Eclipse, Common.NightResponse Night, CameraEcho Camera, string Summary, BrightnessModelEcho Model,
    IReadOnlyList<TimelineRowResponse> Timeline, FramingResponse Framing, SequencesResponse? Sequences, IReadOnlyList<string> Cautions,
    IReadOnlyList<PlanNoteResponse> Notes, Common.MeasuredShadowEcho? MeasuredShadow = null);

/// <summary>A note for a contiguous run of timeline rows, given once instead of on each row.</summary>
/// <param name="Code">iso-changed.</param>
/// <param name="Text">The note in words, naming its local time range.</param>
/// <param name="FromUtc">The run's first row, UTC.</param>
/// <param name="ToUtc">The run's last row, UTC.</param>
/// <param name="FromLocal">The run's first row, local time with offset.</param>
/// <param name="ToLocal">The run's last row, local time with offset.</param>
/// <param name="FirstRow">Index of the run's first row in the timeline (from 0).</param>
/// <param name="Rows">Rows in the run.</param>
/// <param name="Numbers">Its numbers by name: fromIso, lowestIso, highestIso (see docs/photography.md).</param>
public sealed record PlanNoteResponse(string Code, string Text, string FromUtc, string ToUtc, string FromLocal, string ToLocal, int FirstRow, int Rows,
    IReadOnlyDictionary<string, double> Numbers);

/// <summary>The camera as understood.</summary>
/// <param name="SensorWidthMm">Sensor width, mm.</param>
/// <param name="SensorHeightMm">Sensor height, mm.</param>
/// <param name="PixelPitchMicrons">Pixel pitch, µm.</param>
/// <param name="FocalLengthMm">Effective focal length (with teleconverter), mm.</param>
/// <param name="Aperture">Effective f-number.</param>
/// <param name="Iso">ISO asked for (null when the shutter was fixed).</param>
/// <param name="ShutterSeconds">Fixed shutter, if given.</param>
/// <param name="Mount">fixed, sidereal or lunar.</param>
/// <param name="FastestShutterSeconds">The camera's fastest shutter, s.</param>
/// <param name="SlowestShutterSeconds">The camera's slowest timed shutter, s.</param>
public sealed record CameraEcho(double SensorWidthMm, double SensorHeightMm, double PixelPitchMicrons, double FocalLengthMm, double Aperture, double? Iso, double? ShutterSeconds, string Mount,
    double FastestShutterSeconds, double SlowestShutterSeconds);

/// <summary>The brightness model used.</summary>
/// <param name="DanjonL">Expected Danjon luminosity L.</param>
/// <param name="ExtinctionPerAirMass">Extinction coefficient, magnitudes per air mass.</param>
/// <param name="UncertaintyStops">One-sigma uncertainty of the totality brightness, stops.</param>
/// <param name="Note">How to read the numbers.</param>
/// <param name="Reported">With danjonL=reported: the observers' estimates used, or the fallback and why.</param>
public sealed record BrightnessModelEcho(double DanjonL, double ExtinctionPerAirMass, double UncertaintyStops, string Note, DanjonReportsEcho? Reported = null)
{
    /// <summary>Deprecated: the former name of <see cref="DanjonL"/>, written for one more release.</summary>
    public double Danjon => DanjonL;
}

/// <summary>One timeline row.</summary>
/// <param name="Utc">UTC.</param>
/// <param name="Local">Local time with offset.</param>
/// <param name="Contact">P1, U1, U2, greatest, U3, U4 or P4 when the row is a contact.</param>
/// <param name="Phase">uneclipsed, penumbral, partial or total.</param>
/// <param name="UmbralFraction">Fraction of the disc in the umbra.</param>
/// <param name="PenumbralFraction">Fraction of the disc in the penumbra only.</param>
/// <param name="MoonAltitudeDegrees">The Moon's apparent altitude, degrees.</param>
/// <param name="MoonAzimuthDegrees">The Moon's azimuth, degrees.</param>
/// <param name="Airmass">Air mass.</param>
/// <param name="BrightnessStops">What the exposure is for (sunlit limb, or the disc in totality), stops from the uneclipsed Moon above the air; negative is darker.</param>
/// <param name="LimbStops">The brightest limb point, stops (eclipse only).</param>
/// <param name="DiscStops">The disc's mean, stops (eclipse only).</param>
/// <param name="Exposure">Suggested exposure.</param>
/// <param name="Warnings">Things to watch, in words.</param>
/// <param name="WarningDetails">The same as codes with their numbers, for programs.</param>
public sealed record TimelineRowResponse(
    string Utc, string Local, string? Contact, string Phase, double UmbralFraction, double PenumbralFraction, double MoonAltitudeDegrees,
    double MoonAzimuthDegrees, double Airmass, double BrightnessStops, double LimbStops, double DiscStops, ExposureResponse Exposure, IReadOnlyList<string> Warnings,
    IReadOnlyList<WarningResponse> WarningDetails);

/// <summary>A warning as a code and its numbers.</summary>
/// <param name="Code">moon-below-horizon, low-altitude, daylight, twilight-sky, sky-limits-exposure, trailing, leaving-frame, aperture-closed, iso-changed, beyond-fastest-shutter, beyond-slowest-shutter or iso-out-of-range.</param>
/// <param name="Numbers">Its numbers by name (see docs/photography.md).</param>
public sealed record WarningResponse(string Code, IReadOnlyDictionary<string, double> Numbers);

/// <summary>A suggested exposure.</summary>
/// <param name="ShutterSeconds">Shutter, s.</param>
/// <param name="Iso">ISO.</param>
/// <param name="Aperture">f-number.</param>
/// <param name="Ev100">EV at ISO 100 of the exposure.</param>
/// <param name="BracketStops">The bracket's half-width, stops.</param>
/// <param name="BracketShutterSeconds">Shutter times of the bracket, darkest first.</param>
/// <param name="Settable">The same exposure as a camera can be set: third-stop ISO and marked shutter times.</param>
public sealed record ExposureResponse(double ShutterSeconds, double Iso, double Aperture, double Ev100, int BracketStops, IReadOnlyList<double> BracketShutterSeconds,
    SettableExposureResponse Settable);

/// <summary>An exposure as a camera can be set (docs/photography.md).</summary>
/// <param name="Shutter">The shutter as the camera shows it: "1/160 s", "0.3 s", "2.5 s"; beyond 30 s whole seconds on bulb, "47 s bulb".</param>
/// <param name="ShutterSeconds">The time that marking stands for (1/160 s is 2^(−22/3) s), or the bulb time.</param>
/// <param name="Iso">The ISO as the camera shows it (third stops, 25 to 409600).</param>
/// <param name="OffStops">How far the settable exposure is from the computed one, stops (positive: brighter); within ±1/6 unless the camera's limits forced more.</param>
/// <param name="BracketShutters">The bracket's shutter times set the same way, one per computed bracket time, darkest first.</param>
public sealed record SettableExposureResponse(string Shutter, double ShutterSeconds, double Iso, double OffStops, IReadOnlyList<string> BracketShutters);

/// <summary>Framing.</summary>
/// <param name="FieldOfViewWidthDegrees">Horizontal field (landscape), degrees.</param>
/// <param name="FieldOfViewHeightDegrees">Vertical field (landscape), degrees.</param>
/// <param name="MoonDiameterPixels">The Moon's image diameter, pixels.</param>
/// <param name="MoonFractionOfFrameHeight">The Moon's diameter over the frame's short side.</param>
/// <param name="TrailingLimitSeconds">Longest exposure before the blur limit on this mount, s (null when the Moon is tracked).</param>
/// <param name="FixedTripodLimitSeconds">The same on a fixed tripod, s.</param>
/// <param name="SiderealLimitSeconds">The same on a sidereal mount, s.</param>
/// <param name="MinutesInFixedFrame">Minutes the Moon stays in a fixed frame aimed at it at the start.</param>
public sealed record FramingResponse(
    double FieldOfViewWidthDegrees, double FieldOfViewHeightDegrees, double MoonDiameterPixels, double MoonFractionOfFrameHeight,
    double? TrailingLimitSeconds, double FixedTripodLimitSeconds, double SiderealLimitSeconds, double MinutesInFixedFrame);

/// <summary>Sequences.</summary>
/// <param name="Composite">The multi-exposure across the sky.</param>
/// <param name="TimeLapse">The time-lapse.</param>
public sealed record SequencesResponse(CompositeResponse Composite, TimeLapseResponse TimeLapse);

/// <summary>A multi-exposure across the sky.</summary>
/// <param name="IntervalSeconds">Interval between exposures, s.</param>
/// <param name="Exposures">Number of exposures.</param>
/// <param name="PathWidthDegrees">Horizontal extent of the path, disc included, degrees.</param>
/// <param name="PathHeightDegrees">Vertical extent, degrees.</param>
/// <param name="FitsLandscape">Whether it fits the frame held landscape.</param>
/// <param name="FitsPortrait">Whether it fits held portrait.</param>
/// <param name="AimAzimuthDegrees">Aim the frame's centre at this azimuth.</param>
/// <param name="AimAltitudeDegrees">and this altitude.</param>
public sealed record CompositeResponse(double IntervalSeconds, int Exposures, double PathWidthDegrees, double PathHeightDegrees, bool FitsLandscape, bool FitsPortrait, double AimAzimuthDegrees, double AimAltitudeDegrees);

/// <summary>A time-lapse.</summary>
/// <param name="IntervalSeconds">Interval, s.</param>
/// <param name="Frames">Frames.</param>
/// <param name="DurationMinutes">Duration covered, minutes.</param>
/// <param name="PlaybackSecondsAt25Fps">Playback at 25 frames per second, s.</param>
/// <param name="StorageGigabytes">Storage, GB.</param>
public sealed record TimeLapseResponse(double IntervalSeconds, int Frames, double DurationMinutes, double PlaybackSecondsAt25Fps, double StorageGigabytes);

/// <summary>One step of a plain exposure sequence for a camera-control script.</summary>
/// <param name="Instant">When, ISO 8601 UTC.</param>
/// <param name="ShutterSeconds">Shutter, s.</param>
/// <param name="Iso">ISO.</param>
/// <param name="Aperture">f-number.</param>
/// <param name="Note">A note that starts at this step and holds for a run of steps (e.g. the ISO change through totality), or null.</param>
/// <param name="SettableShutter">The shutter as the camera shows it ("1/160 s"), the nearest marked time to this step's.</param>
/// <param name="SettableIso">The ISO as the camera shows it, the nearest third stop to this step's.</param>
public sealed record SequenceStep(string Instant, double ShutterSeconds, double Iso, double Aperture, string? Note, string SettableShutter, double SettableIso);
