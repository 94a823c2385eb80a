using System.Security.Cryptography;
using System.Text;

namespace LunarShadow.Api.Observations.Keys;

/// <summary>
/// An observatory key's secret: 256 random bits, written as "lsk_" and 43 base64url characters. Only its SHA-256 is
/// stored; a request's key is hashed and the hashes are compared in constant time.
/// </summary>
internal static class KeySecret
{
    /// <summary>The text every key begins with (so that a leaked key is recognisable in a scan).</summary>
    public const string Prefix = "lsk_";

    /// <summary>Random bits in a key.</summary>
    public const int Bits = 256;

    /// <summary>A new key from the operating system's cryptographic random generator.</summary>
    public static string Create() => Prefix + Base64Url(RandomNumberGenerator.GetBytes(Bits / 8));

    /// <summary>The stored form of a key: lowercase hex SHA-256 of its UTF-8 text (FIPS 180-4).</summary>
    public static string Hash(string key) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(key)));

    /// <summary>Whether a stored hash is the hash of a presented key, compared in constant time.</summary>
    public static bool Matches(string storedHash, string presentedKey) =>
        CryptographicOperations.FixedTimeEquals(Encoding.ASCII.GetBytes(storedHash), Encoding.ASCII.GetBytes(Hash(presentedKey)));

    /// <summary>Whether text has a key's shape (checked before any database work).</summary>
    public static bool IsWellFormed(string text) =>
        text.Length == Prefix.Length + 43 && text.StartsWith(Prefix, StringComparison.Ordinal)
        && text.AsSpan(Prefix.Length).IndexOfAnyExcept(Base64UrlAlphabet) < 0;

    private static readonly System.Buffers.SearchValues<char> Base64UrlAlphabet =
        System.Buffers.SearchValues.Create("ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_");

    // RFC 4648 §5: base64url without padding.
    private static string Base64Url(byte[] bytes) => Convert.ToBase64String(bytes).TrimEnd('=').Replace('+', '-').Replace('/', '_');
}
