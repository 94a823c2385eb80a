using System.Globalization;
using System.Text.RegularExpressions;
using LunarShadow.Astronomy.Frames;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Units;
using NodaTime;

namespace LunarShadow.Api.Validation;

/// <summary>
/// One site as every per-site endpoint takes it, from a query string or a JSON object alike: location, time zone, horizon
/// profile, minimum altitude, air conditions, name (all in <see cref="Site"/>) and opening hours.
/// </summary>
/// <param name="Site">The site.</param>
/// <param name="Hours">The opening hours, when given.</param>
internal sealed partial record SiteParameters(Site Site, OpeningHours? Hours)
{
    /// <summary>The site; null when something is invalid (every problem is on the reader).</summary>
    public static SiteParameters? Read(RequestFields f)
    {
        var site = ReadSite(f, required: true);
        var hours = Opening(f);
        return site is null ? null : new SiteParameters(site, hours);
    }

    /// <summary>
    /// The site's place and air, or null when neither lat nor lon nor any other site field is given and none is required.
    /// </summary>
    public static Site? ReadSite(RequestFields f, bool required)
    {
        if (!required && !Parameters.Site.Any(f.Has)) return null;
        var latitude = f.Number(Parameters.Latitude, required: true);
        var longitude = f.Number(Parameters.Longitude, required: true);
        var elevation = f.Number(Parameters.Elevation)!.Value;
        var pressure = f.Number(Parameters.Pressure)!.Value;
        var temperature = f.Number(Parameters.Temperature)!.Value;
        var minimum = f.Number(Parameters.MinAltitude)!.Value;
        var zone = TimeZone(f);
        var sea = string.Equals(f.Raw(Parameters.Horizon)?.Trim(), "sea", StringComparison.OrdinalIgnoreCase);
        var horizon = sea ? HorizonProfile.Flat : Horizon(f);
        var name = f.Raw(Parameters.SiteName);
        if (name is { Length: > 200 }) f.Fail(Parameters.SiteName, $"{f.FieldName(Parameters.SiteName)} may be at most {Parameters.SiteName.MaxLength} characters.");
        if (latitude is null || longitude is null || zone is null || horizon is null) return null;
        return new Site(GeodeticLocation.FromDegrees(latitude.Value, longitude.Value, elevation), zone, horizon,
            Angle.FromDegrees(minimum), new AirConditions(pressure, temperature), string.IsNullOrWhiteSpace(name) ? null : name.Trim(), sea);
    }

    private static DateTimeZone? TimeZone(RequestFields f)
    {
        var raw = f.Raw(Parameters.TimeZone);
        if (string.IsNullOrWhiteSpace(raw)) return DateTimeZone.Utc;
        var zone = DateTimeZoneProviders.Tzdb.GetZoneOrNull(raw.Trim());
        if (zone is null) f.Fail(Parameters.TimeZone, $"{f.FieldName(Parameters.TimeZone)} must be an IANA time zone id such as Europe/Vienna or America/Santiago; got '{Clip(raw)}'.");
        return zone;
    }

    private static HorizonProfile? Horizon(RequestFields f)
    {
        var raw = f.Raw(Parameters.Horizon);
        var field = f.FieldName(Parameters.Horizon);
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
                f.Reader.Fail(field, $"{field} must be azimuth:altitude pairs in degrees separated by commas, e.g. 90:5,180:12; got '{Clip(pair)}'.");
                return null;
            }
            if (azimuth is < 0 or > 360 || altitude is < -5 or > 90)
            {
                f.Reader.Fail(field, $"{field} azimuths must be 0 to 360 and altitudes −5 to 90 degrees; got {Clip(pair)}.");
                return null;
            }
            points.Add((azimuth, altitude));
        }
        if (points.Count > Parameters.MaxHorizonPoints)
        {
            f.Reader.Fail(field, $"{field} may have at most {Parameters.MaxHorizonPoints} points; got {points.Count}.");
            return null;
        }
        return new HorizonProfile(points);
    }

    // A daily opening window HH:MM-HH:MM in the site's local time.
    private static OpeningHours? Opening(RequestFields f)
    {
        var raw = f.Raw(Parameters.Open);
        var field = f.FieldName(Parameters.Open);
        if (string.IsNullOrWhiteSpace(raw)) return null;
        var m = OpeningSyntax().Match(raw.Trim());
        if (!m.Success || !TryTime(m.Groups["oh"].Value, m.Groups["om"].Value, out var opens) || !TryTime(m.Groups["ch"].Value, m.Groups["cm"].Value, out var closes))
        {
            f.Reader.Fail(field, $"{field} must be HH:MM-HH:MM in 24-hour local time, e.g. 19:00-23:30; got '{Clip(raw)}'.");
            return null;
        }
        if (opens == closes)
        {
            f.Reader.Fail(field, $"{field} must open and close at different times; got {raw.Trim()}.");
            return null;
        }
        return new OpeningHours(opens, closes);
    }

    private static bool TryTime(string h, string m, out LocalTime time)
    {
        time = default;
        var hour = int.Parse(h, CultureInfo.InvariantCulture);
        var minute = int.Parse(m, CultureInfo.InvariantCulture);
        if (hour > 23 || minute > 59) return false;
        time = new LocalTime(hour, minute);
        return true;
    }

    [GeneratedRegex(@"^(?<oh>[0-9]{2}):(?<om>[0-9]{2})-(?<ch>[0-9]{2}):(?<cm>[0-9]{2})$", RegexOptions.CultureInvariant)]
    private static partial Regex OpeningSyntax();

    private static string Clip(string raw) => raw.Length <= 64 ? raw : raw[..64] + "…";
}
