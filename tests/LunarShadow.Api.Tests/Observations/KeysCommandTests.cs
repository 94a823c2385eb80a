using System.Text.RegularExpressions;
using LunarShadow.Api.Observations.Keys;
using LunarShadow.Api.Tests.Support;
using Microsoft.Data.Sqlite;

namespace LunarShadow.Api.Tests.Observations;

/// <summary>The host's key commands: add prints the key last, list shows names, revoke works by name or id; only hashes are kept.</summary>
public class KeysCommandTests
{
    [Fact]
    public async Task Add_prints_a_256_bit_key_as_the_last_line_and_stores_only_its_hash()
    {
        await using var storage = await StorageBackend.CreateAsync("sqlite");
        var (exit, output, _) = await ObservationHost.KeysAsync(storage, "add", "Hollowmere Hill Public Observatory");
        Assert.Equal(0, exit);
        var key = output.TrimEnd().Split('\n')[^1].Trim();
        // 256 bits as unpadded base64url is 43 characters (RFC 4648 §5).
        Assert.Matches(new Regex("^lsk_[A-Za-z0-9_-]{43}$"), key);
        await using var connection = new SqliteConnection(storage.ConnectionString);
        await connection.OpenAsync();
        await using var command = connection.CreateCommand();
        command.CommandText = "SELECT key_hash FROM observatory_keys";
        var stored = (string)(await command.ExecuteScalarAsync())!;
        Assert.NotEqual(key, stored);
        Assert.Equal(KeySecret.Hash(key), stored);
    }

    [Fact]
    public void The_stored_hash_is_SHA_256() =>
        // FIPS 180-2, Appendix B.1: SHA-256("abc").
        Assert.Equal("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", KeySecret.Hash("abc"));

    [Fact]
    public async Task List_shows_each_key_and_revoke_works_by_name_or_id()
    {
        await using var storage = await StorageBackend.CreateAsync("sqlite");
        await ObservationHost.AddKeyAsync(storage, "Hollowmere Hill Public Observatory");
        await ObservationHost.AddKeyAsync(storage, "Invented Ridge Observatory");
        var (_, list, _) = await ObservationHost.KeysAsync(storage, "list");
        Assert.Contains("Hollowmere Hill Public Observatory", list, StringComparison.Ordinal);
        Assert.Contains("2 keys, 2 active.", list, StringComparison.Ordinal);
        Assert.DoesNotContain("lsk_", list, StringComparison.Ordinal);
        Assert.Equal(0, (await ObservationHost.KeysAsync(storage, "revoke", "Invented Ridge Observatory")).Exit);
        Assert.Equal(0, (await ObservationHost.KeysAsync(storage, "revoke", "1")).Exit);
        Assert.Contains("2 keys, 0 active.", (await ObservationHost.KeysAsync(storage, "list")).Output, StringComparison.Ordinal);
        Assert.NotEqual(0, (await ObservationHost.KeysAsync(storage, "revoke", "Nobody")).Exit);
        Assert.NotEqual(0, (await ObservationHost.KeysAsync(storage, "add", "hollowmere hill public observatory")).Exit); // names are unique
        Assert.NotEqual(0, (await ObservationHost.KeysAsync(storage, "frobnicate")).Exit);
    }
}
