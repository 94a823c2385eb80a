using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Photography;

namespace LunarShadow.Api.Photography;

/// <summary>The camera and plan parameters of a photo plan, each described once (the site's are <see cref="Parameters.Site"/>).</summary>
internal static class PhotoParameters
{
    public static readonly Parameter Iso = new("iso", ParameterType.Number, "ISO speed; ignored when shutter is given.")
    {
        Unit = "ISO", Minimum = ExposureCalculator.MinIso, Maximum = ExposureCalculator.MaxIso, Default = 400.0,
    };

    public static readonly Parameter Aperture = new("aperture", ParameterType.Number, "Lens f-number.")
    {
        Unit = "f-number", Minimum = 0.95, Maximum = 64, Default = 8.0,
    };

    public static readonly Parameter Shutter = new("shutter", ParameterType.Number, "A fixed shutter time: the ISO is then computed.")
    {
        Unit = "seconds", Minimum = 1.0 / 8000, Maximum = 3600,
    };

    public static readonly Parameter FastestShutter = new("fastestShutter", ParameterType.Number,
        "The camera's fastest shutter; faster exposures are avoided by closing the aperture (to f/16) and lowering the ISO (to 100).")
    {
        Unit = "seconds", Minimum = 1.0 / 64000, Maximum = 1, Default = Astronomy.Photography.Camera.DefaultFastestShutterSeconds,
    };

    public static readonly Parameter SlowestShutter = new("slowestShutter", ParameterType.Number,
        "The camera's slowest timed shutter; longer exposures are avoided by raising the ISO (to 25600).")
    {
        Unit = "seconds", Minimum = 1.0 / 64000, Maximum = 3600, Default = Astronomy.Photography.Camera.DefaultSlowestShutterSeconds,
    };

    public static readonly Parameter FocalLength = new("focalLength", ParameterType.Number, "Lens focal length.")
    {
        Unit = "mm", Minimum = 0, MinimumExclusive = true, Maximum = 10000, Default = 400.0,
    };

    public static readonly Parameter Teleconverter = new("teleconverter", ParameterType.Number,
        "Teleconverter or crop factor multiplying the focal length.")
    {
        Unit = "×", Minimum = 1, Maximum = 4, Default = 1.0,
    };

    public static readonly Parameter Sensor = new("sensor", ParameterType.Text, "Sensor size in mm, WIDTHxHEIGHT, each 1 to 100.")
    {
        Default = "36x24", Pattern = @"^[0-9.]+[xX][0-9.]+$",
    };

    public static readonly Parameter PixelPitch = new("pixelPitch", ParameterType.Number, "Pixel pitch; or give pixels.")
    {
        Unit = "µm", Minimum = 0.5, Maximum = 30,
    };

    public static readonly Parameter Pixels = new("pixels", ParameterType.Number,
        "Pixels across the sensor's width, used when pixelPitch is absent.")
    {
        Unit = "pixels", Minimum = 100, Maximum = 50000, Default = 6000.0,
    };

    /// <summary>The mount names on the wire and what they mean.</summary>
    public static readonly IReadOnlyDictionary<string, Mount> Mounts = new Dictionary<string, Mount>
    {
        ["fixed"] = Mount.FixedTripod, ["sidereal"] = Mount.SiderealTracking, ["lunar"] = Mount.LunarTracking,
    };

    public static readonly Parameter MountChoice = new("mount", ParameterType.Choice,
        "fixed (tripod), sidereal (star tracking) or lunar (Moon tracking).")
    {
        Allowed = [.. Mounts.Keys], Default = "fixed",
    };

    /// <summary>The word for "the median of the Danjon estimates observers have stored for this eclipse".</summary>
    public const string ReportedDanjon = "reported";

    /// <summary>The expected Danjon luminosity; "danjon" is its former name (it also names a shadow model).</summary>
    public static readonly Parameter DanjonL = new("danjonL", ParameterType.NumberOrChoice,
        $"Expected Danjon luminosity L of totality, 0 (very dark) to 4 (bright), fractions allowed; or {ReportedDanjon}: the median of the Danjon estimates observers have stored for this eclipse (with their spread and count in model.reported), falling back to the default {UmbralGlow.DefaultDanjon} and saying so when there are none.")
    {
        Unit = "Danjon L", Minimum = 0, Maximum = 4, Default = UmbralGlow.DefaultDanjon, FormerNames = ["danjon"], Allowed = [ReportedDanjon],
    };

    public static readonly Parameter Interval = new("interval", ParameterType.Number, "Timeline step.")
    {
        Unit = "minutes", Minimum = 1, Maximum = 60, Default = 5.0,
    };

    public static readonly Parameter Bracket = new("bracket", ParameterType.Integer, "Bracket of ±N stops.")
    {
        Unit = "stops", Minimum = 0, Maximum = 5, Default = 2.0,
    };

    public static readonly Parameter Blur = new("blur", ParameterType.Number, "Largest acceptable motion blur.")
    {
        Unit = "pixels", Minimum = 0.1, Maximum = 20, Default = 1.0,
    };

    public static readonly Parameter Extinction = new("extinction", ParameterType.Number,
        "Extinction coefficient (default from the site's height).")
    {
        Unit = "magnitudes per air mass", Minimum = 0, Maximum = 2,
    };

    public static readonly Parameter Gap = new("gap", ParameterType.Number,
        "Gap between successive discs of a multi-exposure, in Moon diameters.")
    {
        Unit = "Moon diameters", Minimum = 0, Maximum = 5, Default = 0.25,
    };

    public static readonly Parameter TimelapseInterval = new("timelapseInterval", ParameterType.Number, "Time-lapse interval.")
    {
        Unit = "seconds", Minimum = 1, Maximum = 600, Default = 10.0,
    };

    public static readonly Parameter FileSize = new("fileSize", ParameterType.Number, "Size of one frame.")
    {
        Unit = "MB", Minimum = 1, Maximum = 500, Default = 30.0,
    };

    public static readonly Parameter Start = new("start", ParameterType.Instant,
        "When the fixed-frame check starts, ISO 8601 instant (default: the first visible moment).");

    /// <summary>The camera and plan fields, in the order the document lists them.</summary>
    public static readonly IReadOnlyList<Parameter> Camera =
    [
        Iso, Aperture, Shutter, FastestShutter, SlowestShutter, FocalLength, Teleconverter, Sensor, PixelPitch, Pixels, MountChoice, DanjonL, Interval, Bracket, Blur,
        Extinction, Gap, TimelapseInterval, FileSize, Start,
    ];
}
