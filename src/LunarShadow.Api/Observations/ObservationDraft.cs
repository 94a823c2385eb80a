using System.Globalization;
using System.Security.Cryptography;
using System.Text;

namespace LunarShadow.Api.Observations;

/// <summary>The two kinds of observation, by wire name.</summary>
internal static class ObservationKinds
{
    /// <summary>A crater timing.</summary>
    public const string CraterTiming = "crater-timing";

    /// <summary>A Danjon-scale brightness estimate.</summary>
    public const string Danjon = "danjon";

    /// <summary>Both, as the wire names them.</summary>
    public static readonly IReadOnlyList<string> All = [CraterTiming, Danjon];
}

/// <summary>
/// One validated observation about to be stored: a crater timing (Feature and Crossing set) or a Danjon estimate
/// (DanjonValue set).
/// </summary>
/// <param name="Kind">crater-timing or danjon.</param>
/// <param name="Feature">The feature's catalogue name, for a timing.</param>
/// <param name="Crossing">Immersion or emersion, for a timing.</param>
/// <param name="DanjonValue">L, for an estimate.</param>
/// <param name="Utc">The observed instant, UTC, to the millisecond.</param>
/// <param name="Site">Where it was observed.</param>
/// <param name="UncertaintySeconds">The observer's stated uncertainty, if given.</param>
/// <param name="Optics">The optics, if given.</param>
/// <param name="Observer">The observer's name, if given.</param>
internal sealed record ObservationDraft(
    string Kind,
    string? Feature,
    CrossingDirection? Crossing,
    double? DanjonValue,
    DateTimeOffset Utc,
    ObservationSite Site,
    double? UncertaintySeconds,
    string? Optics,
    string? Observer)
{
    /// <summary>
    /// SHA-256 of every stored field, in a fixed invariant text: two drafts with the same fingerprint from the same key
    /// are exact duplicates (the database's unique key refuses the second).
    /// </summary>
    public string Fingerprint
    {
        get
        {
            var text = string.Join('\u001f',
                Kind, Feature ?? "", Crossing?.ToString() ?? "", Number(DanjonValue), Utc.ToUnixTimeMilliseconds().ToString(CultureInfo.InvariantCulture),
                Number(Site.LatitudeDegrees), Number(Site.LongitudeDegrees), Number(Site.ElevationMetres),
                Number(UncertaintySeconds), Optics ?? "", Observer ?? "");
            return Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text)));
        }
    }

    private static string Number(double? value) => value?.ToString("R", CultureInfo.InvariantCulture) ?? "";
}
