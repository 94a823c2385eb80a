using System.Globalization;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Units;
using NodaTime;

namespace LunarShadow.Api.Validation;

/// <summary>The raw text of a site's fields, from a query string or a JSON body.</summary>
internal sealed record SiteFields(
    string? Lat, string? Lon, string? Elevation = null, string? Tz = null, string? MinAltitude = null, string? Horizon = null,
    string? Pressure = null, string? Temperature = null, string? Name = null);

/// <summary>Reads and validates a site: every problem is reported on the reader under the field's name.</summary>
internal static class SiteQuery
{
    public const string LatitudeDescription = "Geodetic latitude in degrees, −90 to 90, north positive (WGS84).";
    public const string LongitudeDescription = "Longitude in degrees, −180 to 180, east positive (WGS84).";
    public const string ElevationDescription = "Height above the WGS84 ellipsoid in metres, −500 to 9000 (default 0).";
    public const string PressureDescription = "Air pressure in hPa for refraction, 0 to 1200 (default 1010).";
    public const string TemperatureDescription = "Air temperature in °C for refraction, −90 to 60 (default 10).";
    public const string TimeZoneDescription = "IANA time zone of the site, e.g. Europe/Vienna (tzdb as carried by NodaTime); default UTC.";
    public const string MinAltitudeDescription = "Lowest useful altitude of the Moon's upper limb in degrees, −5 to 60 (default 0).";
    public const string HorizonDescription = "Local horizon profile: azimuth:altitude pairs in degrees, comma-separated, e.g. 90:5,180:12,270:3 (azimuth 0–360 from north through east, altitude −5 to 90; up to 360 points; linear between them); or sea for a flat sea horizon lowered by the dip for the site's elevation. Without it, rise and set follow the almanac convention: the upper limb at 0° with refraction, no dip.";
    public const string NameDescription = "A free-text name for the site, up to 200 characters, echoed back.";

    /// <summary>Maximum number of horizon-profile points.</summary>
    public const int MaxHorizonPoints = 360;

    /// <summary>A site; null when lat and lon are absent and not required, or when something is invalid.</summary>
    public static Site? Read(QueryReader reader, SiteFields f, bool required, string prefix = "")
    {
        string F(string name) => prefix + name;
        var anyGiven = new[] { f.Lat, f.Lon, f.Elevation, f.Tz, f.MinAltitude, f.Horizon, f.Pressure, f.Temperature }.Any(v => !string.IsNullOrWhiteSpace(v));
        if (!required && !anyGiven) return null;
        var latitude = reader.Number(F("lat"), f.Lat, -90, 90, "degrees", required: true);
        var longitude = reader.Number(F("lon"), f.Lon, -180, 180, "degrees", required: true);
        var elevation = reader.Number(F("elevation"), f.Elevation, -500, 9000, "metres") ?? 0;
        var pressure = reader.Number(F("pressure"), f.Pressure, 0, 1200, "hPa") ?? AirConditions.Standard.PressureHectopascals;
        var temperature = reader.Number(F("temperature"), f.Temperature, -90, 60, "°C") ?? AirConditions.Standard.TemperatureCelsius;
        var minimum = reader.Number(F("minAltitude"), f.MinAltitude, -5, 60, "degrees") ?? 0;
        var zone = TimeZone(reader, F("tz"), f.Tz);
        var sea = string.Equals(f.Horizon?.Trim(), "sea", StringComparison.OrdinalIgnoreCase);
        var horizon = sea ? HorizonProfile.Flat : Horizon(reader, F("horizon"), f.Horizon);
        if (f.Name is { Length: > 200 }) reader.Fail(F("name"), "name may be at most 200 characters.");
        if (latitude is null || longitude is null || zone is null || horizon is null) return null;
        return new Site(GeodeticLocation.FromDegrees(latitude.Value, longitude.Value, elevation), zone, horizon,
            Angle.FromDegrees(minimum), new AirConditions(pressure, temperature), string.IsNullOrWhiteSpace(f.Name) ? null : f.Name.Trim(), sea);
    }

    private static DateTimeZone? TimeZone(QueryReader reader, string field, string? raw)
    {
        if (string.IsNullOrWhiteSpace(raw)) return DateTimeZone.Utc;
        var zone = DateTimeZoneProviders.Tzdb.GetZoneOrNull(raw.Trim());
        if (zone is null) reader.Fail(field, $"{field} must be an IANA time zone id such as Europe/Vienna or America/Santiago; got '{Clip(raw)}'.");
        return zone;
    }

    private static HorizonProfile? Horizon(QueryReader reader, string field, string? raw)
    {
        if (string.IsNullOrWhiteSpace(raw)) return HorizonProfile.Flat;
        var points = new List<(double, double)>();
        foreach (var pair in raw.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            var parts = pair.Split(':');
            if (parts.Length != 2
                || !double.TryParse(parts[0], NumberStyles.Float, CultureInfo.InvariantCulture, out var azimuth)
                || !double.TryParse(parts[1], NumberStyles.Float, CultureInfo.InvariantCulture, out var altitude)
                || !double.IsFinite(azimuth) || !double.IsFinite(altitude))
            {
                reader.Fail(field, $"{field} must be azimuth:altitude pairs in degrees separated by commas, e.g. 90:5,180:12; got '{Clip(pair)}'.");
                return null;
            }
            if (azimuth is < 0 or > 360 || altitude is < -5 or > 90)
            {
                reader.Fail(field, $"{field} azimuths must be 0 to 360 and altitudes −5 to 90 degrees; got {Clip(pair)}.");
                return null;
            }
            points.Add((azimuth, altitude));
        }
        if (points.Count > MaxHorizonPoints)
        {
            reader.Fail(field, $"{field} may have at most {MaxHorizonPoints} points; got {points.Count}.");
            return null;
        }
        return new HorizonProfile(points);
    }

    private static string Clip(string raw) => raw.Length <= 64 ? raw : raw[..64] + "…";
}
