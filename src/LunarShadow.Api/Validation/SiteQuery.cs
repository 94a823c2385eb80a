using LunarShadow.Astronomy.Frames;

namespace LunarShadow.Api.Validation;

/// <summary>The shared optional site query: lat, lon, elevation, pressure, temperature.</summary>
internal static class SiteQuery
{
    public const string LatitudeDescription = "Geodetic latitude in degrees, −90 to 90, north positive (WGS84). Give with lon.";
    public const string LongitudeDescription = "Longitude in degrees, −180 to 180, east positive (WGS84). Give with lat.";
    public const string ElevationDescription = "Height above the WGS84 ellipsoid in metres, −500 to 9000 (default 0).";
    public const string PressureDescription = "Air pressure in hPa for refraction, 0 to 1200 (default 1010).";
    public const string TemperatureDescription = "Air temperature in °C for refraction, −90 to 60 (default 10).";

    /// <summary>The site and air, or null when no site was given.</summary>
    public static (GeodeticLocation Location, AirConditions Air)? Read(
        QueryReader reader, string? lat, string? lon, string? elevation, string? pressure, string? temperature)
    {
        var latitude = reader.Number("lat", lat, -90, 90, "degrees");
        var longitude = reader.Number("lon", lon, -180, 180, "degrees");
        var height = reader.Number("elevation", elevation, -500, 9000, "metres") ?? 0;
        var p = reader.Number("pressure", pressure, 0, 1200, "hPa") ?? AirConditions.Standard.PressureHectopascals;
        var t = reader.Number("temperature", temperature, -90, 60, "°C") ?? AirConditions.Standard.TemperatureCelsius;
        var anySiteField = new[] { lat, lon, elevation, pressure, temperature }.Any(v => !string.IsNullOrWhiteSpace(v));
        if (anySiteField && string.IsNullOrWhiteSpace(lat)) reader.Fail("lat", "lat is required with a site: degrees from -90 to 90.");
        if (anySiteField && string.IsNullOrWhiteSpace(lon)) reader.Fail("lon", "lon is required with a site: degrees from -180 to 180.");
        if (latitude is null || longitude is null) return null;
        return (GeodeticLocation.FromDegrees(latitude.Value, longitude.Value, height), new AirConditions(p, t));
    }
}
