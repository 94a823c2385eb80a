using System.Globalization;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Time;
using P = LunarShadow.Api.Photography.PhotoParameters;

namespace LunarShadow.Api.Photography;

/// <summary>Reads a camera and plan settings from named fields (query string or JSON body), reporting every problem.</summary>
internal static class PhotoRequest
{
    /// <summary>The camera and settings; <c>DanjonReported</c> when danjonL=reported (the settings then hold the default L).</summary>
    public static (Camera? Camera, PhotoSettings? Settings, bool DanjonReported) Read(RequestFields f, TimeScaleConverter time)
    {
        var iso = f.Number(P.Iso)!.Value;
        var aperture = f.Number(P.Aperture)!.Value;
        var shutter = f.Number(P.Shutter);
        var fastest = f.Number(P.FastestShutter)!.Value;
        var slowest = f.Number(P.SlowestShutter)!.Value;
        if (slowest < fastest) f.Reader.Fail("slowestShutter", "slowestShutter must be at least fastestShutter.");
        else if (shutter is { } t && (t < fastest || t > slowest))
            f.Reader.Fail("shutter", FormattableString.Invariant($"shutter must lie within the camera's range, fastestShutter {fastest:0.######} s to slowestShutter {slowest:0.###} s; got {t:0.######} s."));
        var focal = f.Number(P.FocalLength)!.Value;
        var multiplier = f.Number(P.Teleconverter)!.Value;
        var (width, height) = Sensor(f);
        var pitch = f.Number(P.PixelPitch);
        var pixels = f.Number(P.Pixels)!.Value;
        var mount = P.Mounts[f.Choice(P.MountChoice)!];
        var (danjonNumber, danjonWord) = f.NumberOrChoice(P.DanjonL);
        var danjon = danjonNumber ?? UmbralGlow.DefaultDanjon;
        var interval = f.Number(P.Interval)!.Value;
        var bracket = f.Integer(P.Bracket)!.Value;
        var blur = f.Number(P.Blur)!.Value;
        var extinction = f.Number(P.Extinction);
        var gap = f.Number(P.Gap)!.Value;
        var lapse = f.Number(P.TimelapseInterval)!.Value;
        var fileSize = f.Number(P.FileSize)!.Value;
        var start = f.Instant(P.Start);
        if (!f.Reader.IsValid) return (null, null, false);

        var pixelPitch = pitch ?? width / pixels * 1000;
        var camera = new Camera(width, height, pixelPitch, focal, multiplier, mount, iso, aperture, shutter, fastest, slowest);
        var settings = new PhotoSettings(danjon, interval, bracket, blur, extinction, gap, lapse, fileSize,
            start is { } s ? time.ToTerrestrialTime(s) : null);
        return (camera, settings, danjonWord == P.ReportedDanjon);
    }

    private static (double Width, double Height) Sensor(RequestFields f)
    {
        var raw = f.Raw(P.Sensor);
        if (string.IsNullOrWhiteSpace(raw)) return (36, 24);
        var parts = raw.ToLowerInvariant().Split('x');
        if (parts.Length == 2
            && double.TryParse(parts[0], NumberStyles.Float, CultureInfo.InvariantCulture, out var w)
            && double.TryParse(parts[1], NumberStyles.Float, CultureInfo.InvariantCulture, out var h)
            && w is >= 1 and <= 100 && h is >= 1 and <= 100)
            return (w, h);
        f.Fail(P.Sensor, $"{f.FieldName(P.Sensor)} must be WIDTHxHEIGHT in mm, each 1 to 100, e.g. 36x24 or 23.5x15.6; got '{(raw.Length > 40 ? raw[..40] : raw)}'.");
        return (36, 24);
    }
}
