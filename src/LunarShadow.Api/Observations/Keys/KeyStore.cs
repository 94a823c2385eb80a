using System.Data.Common;
using System.Globalization;
using LunarShadow.Api.Observations.Storage;

namespace LunarShadow.Api.Observations.Keys;

/// <summary>The observatory keys table: add, list, revoke, and find the key a request presents.</summary>
internal sealed class KeyStore(StorageDialect dialect)
{
    /// <summary>Longest display name.</summary>
    public const int MaxNameLength = 100;

    /// <summary>Adds a key for a new observatory name; returns the stored key and the secret (shown once, never stored).</summary>
    public async Task<(ObservatoryKey Key, string Secret)> AddAsync(string name, DateTimeOffset now, CancellationToken cancellationToken)
    {
        var secret = KeySecret.Create();
        await using var connection = await dialect.OpenAsync(cancellationToken);
        await using var command = connection.CreateCommand();
        command.CommandText = "INSERT INTO observatory_keys (name, key_hash, created_unix_ms) VALUES (@name, @hash, @created) RETURNING id";
        command.AddParameter("name", name).AddParameter("hash", KeySecret.Hash(secret)).AddParameter("created", now.ToUnixTimeMilliseconds());
        var id = Convert.ToInt64(await command.ExecuteScalarAsync(cancellationToken), CultureInfo.InvariantCulture);
        return (new ObservatoryKey(id, name, FromMs(now.ToUnixTimeMilliseconds()), null), secret);
    }

    /// <summary>Every key, oldest first.</summary>
    public async Task<IReadOnlyList<ObservatoryKey>> ListAsync(CancellationToken cancellationToken)
    {
        await using var connection = await dialect.OpenAsync(cancellationToken);
        await using var command = connection.CreateCommand();
        command.CommandText = "SELECT id, name, created_unix_ms, revoked_unix_ms FROM observatory_keys ORDER BY id";
        return await Read(command, cancellationToken);
    }

    /// <summary>Revokes the key with this id or name; the key revoked, or null when none matches.</summary>
    public async Task<ObservatoryKey?> RevokeAsync(string nameOrId, DateTimeOffset now, CancellationToken cancellationToken)
    {
        var key = (await ListAsync(cancellationToken)).FirstOrDefault(k =>
            string.Equals(k.Name, nameOrId, StringComparison.Ordinal)
            || (long.TryParse(nameOrId, NumberStyles.None, CultureInfo.InvariantCulture, out var id) && k.Id == id));
        if (key is null) return null;
        if (!key.IsActive) return key;
        await using var connection = await dialect.OpenAsync(cancellationToken);
        await using var command = connection.CreateCommand();
        command.CommandText = "UPDATE observatory_keys SET revoked_unix_ms = @at WHERE id = @id AND revoked_unix_ms IS NULL";
        command.AddParameter("at", now.ToUnixTimeMilliseconds()).AddParameter("id", key.Id);
        await command.ExecuteNonQueryAsync(cancellationToken);
        return key with { RevokedUtc = FromMs(now.ToUnixTimeMilliseconds()) };
    }

    /// <summary>The stored key a presented secret belongs to (active or revoked), or null for an unknown secret.</summary>
    public async Task<ObservatoryKey?> FindAsync(string presented, CancellationToken cancellationToken)
    {
        if (!KeySecret.IsWellFormed(presented)) return null;
        var hash = KeySecret.Hash(presented);
        await using var connection = await dialect.OpenAsync(cancellationToken);
        await using var command = connection.CreateCommand();
        // The index finds the row by the hash of a 256-bit secret (its timing reveals nothing usable about the key);
        // the final check compares the hashes in constant time.
        command.CommandText = "SELECT id, name, created_unix_ms, revoked_unix_ms, key_hash FROM observatory_keys WHERE key_hash = @hash";
        command.AddParameter("hash", hash);
        await using var rows = await command.ExecuteReaderAsync(cancellationToken);
        if (!await rows.ReadAsync(cancellationToken)) return null;
        return KeySecret.Matches(rows.GetString(4), presented) ? Row(rows) : null;
    }

    private static async Task<IReadOnlyList<ObservatoryKey>> Read(DbCommand command, CancellationToken cancellationToken)
    {
        var keys = new List<ObservatoryKey>();
        await using var rows = await command.ExecuteReaderAsync(cancellationToken);
        while (await rows.ReadAsync(cancellationToken)) keys.Add(Row(rows));
        return keys;
    }

    private static ObservatoryKey Row(DbDataReader rows) => new(
        Convert.ToInt64(rows.GetValue(0), CultureInfo.InvariantCulture),
        rows.GetString(1),
        FromMs(Convert.ToInt64(rows.GetValue(2), CultureInfo.InvariantCulture)),
        rows.IsDBNull(3) ? null : FromMs(Convert.ToInt64(rows.GetValue(3), CultureInfo.InvariantCulture)));

    private static DateTimeOffset FromMs(long ms) => DateTimeOffset.FromUnixTimeMilliseconds(ms);
}
