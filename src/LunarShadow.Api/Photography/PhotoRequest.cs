using System.Globalization;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Photography;

/// <summary>Reads a site, a camera and plan settings from named fields (query string or JSON body), reporting every problem.</summary>
internal static class PhotoRequest
{
    public static (Site? Site, Camera? Camera, PhotoSettings? Settings) Read(QueryReader reader, Func<string, string?> field, TimeScaleConverter time)
    {
        var site = SiteQuery.Read(reader, new SiteFields(field("lat"), field("lon"), field("elevation"), field("tz"), field("minAltitude"),
            field("horizon"), Name: field("name")), required: true);
        var iso = reader.Number("iso", field("iso"), ExposureCalculator.MinIso, ExposureCalculator.MaxIso, "ISO") ?? 400;
        var aperture = reader.Number("aperture", field("aperture"), 0.95, 64, "f-number") ?? 8;
        var shutter = reader.Number("shutter", field("shutter"), 1.0 / 8000, 3600, "seconds");
        var fastest = reader.Number("fastestShutter", field("fastestShutter"), 1.0 / 64000, 1, "seconds") ?? Camera.DefaultFastestShutterSeconds;
        var slowest = reader.Number("slowestShutter", field("slowestShutter"), 1.0 / 64000, 3600, "seconds") ?? Camera.DefaultSlowestShutterSeconds;
        if (slowest < fastest) reader.Fail("slowestShutter", "slowestShutter must be at least fastestShutter.");
        else if (shutter is { } t && (t < fastest || t > slowest))
            reader.Fail("shutter", FormattableString.Invariant($"shutter must lie within the camera's range, fastestShutter {fastest:0.######} s to slowestShutter {slowest:0.###} s; got {t:0.######} s."));
        var focal = reader.Number("focalLength", field("focalLength"), 0, 10000, "mm") ?? 400;
        if (focal <= 0) reader.Fail("focalLength", "focalLength must be above 0 mm (up to 10000).");
        var multiplier = reader.Number("teleconverter", field("teleconverter"), 1, 4, "×") ?? 1;
        var (width, height) = Sensor(reader, field("sensor"));
        var pitch = reader.Number("pixelPitch", field("pixelPitch"), 0.5, 30, "µm");
        var pixels = reader.Number("pixels", field("pixels"), 100, 50000, "pixels");
        var mountName = reader.OneOf("mount", field("mount"), ["fixed", "sidereal", "lunar"]) ?? "fixed";
        var danjon = reader.Number("danjon", field("danjon"), 0, 4, "Danjon L") ?? UmbralGlow.DefaultDanjon;
        var interval = reader.Number("interval", field("interval"), 1, 60, "minutes") ?? 5;
        var bracket = reader.Number("bracket", field("bracket"), 0, 5, "stops") ?? 2;
        if (bracket != Math.Floor(bracket)) reader.Fail("bracket", "bracket must be a whole number of stops from 0 to 5.");
        var blur = reader.Number("blur", field("blur"), 0.1, 20, "pixels") ?? 1;
        var extinction = reader.Number("extinction", field("extinction"), 0, 2, "magnitudes per air mass");
        var gap = reader.Number("gap", field("gap"), 0, 5, "Moon diameters") ?? 0.25;
        var lapse = reader.Number("timelapseInterval", field("timelapseInterval"), 1, 600, "seconds") ?? 10;
        var fileSize = reader.Number("fileSize", field("fileSize"), 1, 500, "MB") ?? 30;
        var start = reader.Instant("start", field("start"), required: false);
        if (!reader.IsValid || site is null) return (null, null, null);

        var pixelPitch = pitch ?? width / (pixels ?? 6000) * 1000;
        var mount = mountName switch { "sidereal" => Mount.SiderealTracking, "lunar" => Mount.LunarTracking, _ => Mount.FixedTripod };
        var camera = new Camera(width, height, pixelPitch, focal, multiplier, mount, iso, aperture, shutter, fastest, slowest);
        var settings = new PhotoSettings(danjon, interval, (int)bracket, blur, extinction, gap, lapse, fileSize,
            start is { } s ? time.ToTerrestrialTime(s) : null);
        return (site, camera, settings);
    }

    private static (double Width, double Height) Sensor(QueryReader reader, string? raw)
    {
        if (string.IsNullOrWhiteSpace(raw)) return (36, 24);
        var parts = raw.ToLowerInvariant().Split('x');
        if (parts.Length == 2
            && double.TryParse(parts[0], NumberStyles.Float, CultureInfo.InvariantCulture, out var w)
            && double.TryParse(parts[1], NumberStyles.Float, CultureInfo.InvariantCulture, out var h)
            && w is >= 1 and <= 100 && h is >= 1 and <= 100)
            return (w, h);
        reader.Fail("sensor", $"sensor must be WIDTHxHEIGHT in mm, each 1 to 100, e.g. 36x24 or 23.5x15.6; got '{(raw.Length > 40 ? raw[..40] : raw)}'.");
        return (36, 24);
    }
}
