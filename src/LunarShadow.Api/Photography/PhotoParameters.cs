using System.ComponentModel;
using Microsoft.AspNetCore.Mvc;

namespace LunarShadow.Api.Photography;

// The photo-plan query, declared once for the OpenAPI document; the same names are read from a POST body. (No XML docs:
// each parameter's text is its Description.)
internal sealed record PhotoParameters(
    [property: FromQuery(Name = "lat"), Description(Validation.SiteQuery.LatitudeDescription)] string? Lat,
    [property: FromQuery(Name = "lon"), Description(Validation.SiteQuery.LongitudeDescription)] string? Lon,
    [property: FromQuery(Name = "elevation"), Description(Validation.SiteQuery.ElevationDescription)] string? Elevation,
    [property: FromQuery(Name = "tz"), Description(Validation.SiteQuery.TimeZoneDescription)] string? Tz,
    [property: FromQuery(Name = "minAltitude"), Description(Validation.SiteQuery.MinAltitudeDescription)] string? MinAltitude,
    [property: FromQuery(Name = "horizon"), Description(Validation.SiteQuery.HorizonDescription)] string? Horizon,
    [property: FromQuery(Name = "name"), Description(Validation.SiteQuery.NameDescription)] string? Name,
    [property: FromQuery(Name = "iso"), Description("ISO speed, 25 to 409600 (default 400); ignored when shutter is given.")] string? Iso,
    [property: FromQuery(Name = "aperture"), Description("Lens f-number, 0.95 to 64 (default 8).")] string? Aperture,
    [property: FromQuery(Name = "shutter"), Description("A fixed shutter time in seconds, 1/8000 to 3600 and within fastestShutter to slowestShutter: the ISO is then computed.")] string? Shutter,
    [property: FromQuery(Name = "fastestShutter"), Description("The camera's fastest shutter in seconds, 1/64000 to 1 (default 1/8000 = 0.000125); faster exposures are avoided by closing the aperture and lowering the ISO.")] string? FastestShutter,
    [property: FromQuery(Name = "slowestShutter"), Description("The camera's slowest timed shutter in seconds, up to 3600 (default 30); longer exposures are avoided by raising the ISO.")] string? SlowestShutter,
    [property: FromQuery(Name = "focalLength"), Description("Lens focal length in mm, above 0 up to 10000 (default 400).")] string? FocalLength,
    [property: FromQuery(Name = "teleconverter"), Description("Teleconverter or crop factor multiplying the focal length, 1 to 4 (default 1).")] string? Teleconverter,
    [property: FromQuery(Name = "sensor"), Description("Sensor size in mm, WIDTHxHEIGHT, each 1 to 100 (default 36x24).")] string? Sensor,
    [property: FromQuery(Name = "pixelPitch"), Description("Pixel pitch in µm, 0.5 to 30; or give pixels.")] string? PixelPitch,
    [property: FromQuery(Name = "pixels"), Description("Pixels across the sensor's width, 100 to 50000 (default 6000), used when pixelPitch is absent.")] string? Pixels,
    [property: FromQuery(Name = "mount"), Description("fixed (tripod, default), sidereal (star tracking) or lunar (Moon tracking).")] string? Mount,
    [property: FromQuery(Name = "danjon"), Description("Expected Danjon luminosity L, 0 (very dark) to 4 (bright), fractions allowed (default 2).")] string? Danjon,
    [property: FromQuery(Name = "interval"), Description("Timeline step in minutes, 1 to 60 (default 5).")] string? Interval,
    [property: FromQuery(Name = "bracket"), Description("Bracket of ±N stops, 0 to 5 (default 2).")] string? Bracket,
    [property: FromQuery(Name = "blur"), Description("Largest acceptable motion blur in pixels, 0.1 to 20 (default 1).")] string? Blur,
    [property: FromQuery(Name = "extinction"), Description("Extinction coefficient in magnitudes per air mass, 0 to 2 (default from the site's height).")] string? Extinction,
    [property: FromQuery(Name = "gap"), Description("Gap between successive discs of a multi-exposure, as a fraction of the Moon's diameter, 0 to 5 (default 0.25).")] string? Gap,
    [property: FromQuery(Name = "timelapseInterval"), Description("Time-lapse interval in seconds, 1 to 600 (default 10).")] string? TimelapseInterval,
    [property: FromQuery(Name = "fileSize"), Description("Size of one frame in MB, 1 to 500 (default 30).")] string? FileSize,
    [property: FromQuery(Name = "start"), Description("When the fixed-frame check starts, ISO 8601 instant (default: the first visible moment).")] string? Start)
{
    /// <summary>The value of a field by its query name.</summary>
    public string? this[string name] => name switch
    {
        "lat" => Lat, "lon" => Lon, "elevation" => Elevation, "tz" => Tz, "minAltitude" => MinAltitude, "horizon" => Horizon,
        "name" => Name, "iso" => Iso, "aperture" => Aperture, "shutter" => Shutter, "fastestShutter" => FastestShutter, "slowestShutter" => SlowestShutter, "focalLength" => FocalLength,
        "teleconverter" => Teleconverter, "sensor" => Sensor, "pixelPitch" => PixelPitch, "pixels" => Pixels, "mount" => Mount,
        "danjon" => Danjon, "interval" => Interval, "bracket" => Bracket, "blur" => Blur, "extinction" => Extinction, "gap" => Gap,
        "timelapseInterval" => TimelapseInterval, "fileSize" => FileSize, "start" => Start,
        _ => null,
    };

    /// <summary>Every field name.</summary>
    public static IReadOnlyList<string> Names { get; } =
    [
        "lat", "lon", "elevation", "tz", "minAltitude", "horizon", "name", "iso", "aperture", "shutter", "fastestShutter", "slowestShutter", "focalLength", "teleconverter",
        "sensor", "pixelPitch", "pixels", "mount", "danjon", "interval", "bracket", "blur", "extinction", "gap", "timelapseInterval", "fileSize", "start",
    ];
}
