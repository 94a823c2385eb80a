using System.Globalization;

namespace LunarShadow.Api.Tests.Observations;

/// <summary>
/// Invented observations of the total lunar eclipse of 2025 September 7 (greatest about 18:12 UT, totality about 17:31
/// to 18:53 UT: NASA Five Millennium Canon, from memory), made from an invented site near 13° N, 77.6° E, where the Moon
/// stood high that evening (the eclipse was seen across South Asia; from memory).
/// </summary>
internal static class ObservationSamples
{
    /// <summary>The invented site: the moon is up there throughout the eclipse.</summary>
    public const string SeesTheMoon = """{"lat": 13.0, "lon": 77.6, "elevation": 900}""";

    /// <summary>A site in North America, where it was daytime with the Moon below the horizon (from memory).</summary>
    public const string MoonBelowHorizon = """{"lat": 40.0, "lon": -100.0, "elevation": 600}""";

    /// <summary>
    /// Tycho's immersion as the service observed it: 14 s after the service's own prediction under the danjon model
    /// (17:09:06 UTC, GET …/craters), well inside the ±30 min window; timings vary by observer by about that much
    /// (common practice).
    /// </summary>
    public static string TychoImmersion(string utc = "2025-09-07T17:09:20Z", string site = SeesTheMoon, string? observer = "R. Fenwick") =>
        $$"""{"kind": "crater-timing", "feature": "Tycho", "crossing": "immersion", "utc": "{{utc}}", "site": {{site}}, "uncertaintySeconds": 3, "optics": "150 mm reflector, 75x"{{(observer is null ? "" : $", \"observer\": \"{observer}\"")}}}""";

    /// <summary>A Danjon estimate during totality.</summary>
    public static string Danjon(double value = 2.5, string utc = "2025-09-07T18:10:00Z", string site = SeesTheMoon) =>
        $$"""{"kind": "danjon", "value": {{value.ToString(CultureInfo.InvariantCulture)}}, "utc": "{{utc}}", "site": {{site}}}""";

    /// <summary>A distinct Danjon estimate for index n: one second apart from 17:40 UTC, all within totality.</summary>
    public static string DanjonAt(int n) =>
        Danjon(2, new DateTimeOffset(2025, 9, 7, 17, 40, 0, TimeSpan.Zero).AddSeconds(n).ToString("yyyy-MM-ddTHH:mm:ssZ", CultureInfo.InvariantCulture));
}
