namespace LunarShadow.Astronomy.Embedded;

/// <summary>The published tables this library embeds, by the logical names the build gives them.</summary>
public static class EmbeddedDataSet
{
    /// <summary>ELP/MPP02 with DE405-fitted constants, truncated (within 0.1″ of the full series).</summary>
    public const string LunarTruncated = "LunarShadow.Ephemeris.elpmpp02-de405-truncated.bin";

    /// <summary>ELP/MPP02 with DE405-fitted constants, all published terms.</summary>
    public const string LunarFull = "LunarShadow.Ephemeris.elpmpp02-de405-full.bin";

    /// <summary>VSOP87B for the Earth: heliocentric spherical coordinates, J2000 ecliptic.</summary>
    public const string EarthVsop87B = "LunarShadow.Ephemeris.vsop87b-earth.bin";

    /// <summary>USNO/IERS measured ΔT series.</summary>
    public const string MeasuredDeltaT = "LunarShadow.Time.deltat-measured.bin";

    /// <summary>All embedded tables.</summary>
    public static IReadOnlyList<string> All { get; } = [LunarTruncated, LunarFull, EarthVsop87B, MeasuredDeltaT];

    /// <summary>The SHA-256 of an embedded table's bytes, lower-case hex.</summary>
    public static string Sha256(string logicalName) =>
        Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(BlockFile.ReadResource(logicalName)));

    /// <summary>
    /// A short version tag of the embedded data (first 12 hex digits of the SHA-256 over all tables),
    /// for cache validators and responses.
    /// </summary>
    public static string VersionTag { get; } = ComputeVersionTag();

    private static string ComputeVersionTag()
    {
        using var hash = System.Security.Cryptography.IncrementalHash.CreateHash(System.Security.Cryptography.HashAlgorithmName.SHA256);
        foreach (var name in All) hash.AppendData(BlockFile.ReadResource(name));
        return Convert.ToHexStringLower(hash.GetHashAndReset())[..12];
    }
}
