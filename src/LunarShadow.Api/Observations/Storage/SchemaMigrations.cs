using System.Data.Common;

namespace LunarShadow.Api.Observations.Storage;

/// <summary>One schema change: a version number that only grows, what it does, and its SQL ({id} is the dialect's id column).</summary>
/// <param name="Version">The version this step brings the schema to.</param>
/// <param name="Description">What it changes, for the schema_migrations table.</param>
/// <param name="Sql">The statements, shared by both dialects apart from {id}.</param>
internal sealed record SchemaMigration(int Version, string Description, string Sql);

/// <summary>
/// The versioned schema, applied at start-up: each step runs once, in order, inside one transaction that first takes
/// the dialect's migration lock (BEGIN IMMEDIATE on SQLite, an advisory lock on PostgreSQL), so any number of hosts or
/// replicas may start at once. Applied steps are recorded in schema_migrations; running again changes nothing.
/// </summary>
internal static class SchemaMigrations
{
    /// <summary>Every step, oldest first. Never edit a released step: add a new one.</summary>
    public static readonly IReadOnlyList<SchemaMigration> All =
    [
        new(1, "observatory keys and observations", """
            CREATE TABLE observatory_keys (
                id {id},
                name TEXT NOT NULL UNIQUE,
                key_hash TEXT NOT NULL UNIQUE,
                created_unix_ms BIGINT NOT NULL,
                revoked_unix_ms BIGINT NULL
            );
            CREATE TABLE observations (
                id {id},
                eclipse_date TEXT NOT NULL,
                kind TEXT NOT NULL,
                feature TEXT NULL,
                crossing TEXT NULL,
                danjon_value DOUBLE PRECISION NULL,
                observed_unix_ms BIGINT NOT NULL,
                latitude_degrees DOUBLE PRECISION NOT NULL,
                longitude_degrees DOUBLE PRECISION NOT NULL,
                elevation_metres DOUBLE PRECISION NOT NULL,
                uncertainty_seconds DOUBLE PRECISION NULL,
                optics TEXT NULL,
                observer TEXT NULL,
                key_id BIGINT NOT NULL REFERENCES observatory_keys (id),
                received_unix_ms BIGINT NOT NULL,
                fingerprint TEXT NOT NULL,
                UNIQUE (key_id, fingerprint)
            );
            CREATE INDEX observations_by_eclipse ON observations (eclipse_date, id);
            """),
    ];

    /// <summary>The newest schema version.</summary>
    public static int Latest => All[^1].Version;

    /// <summary>Brings the database to <see cref="Latest"/>; returns the versions applied by this call (none when up to date).</summary>
    public static async Task<IReadOnlyList<int>> ApplyAsync(StorageDialect dialect, CancellationToken cancellationToken)
    {
        await using var connection = await dialect.OpenAsync(cancellationToken);
        await using var transaction = await dialect.BeginMigrationAsync(connection, cancellationToken);
        await Execute(connection, transaction, """
            CREATE TABLE IF NOT EXISTS schema_migrations (
                version INTEGER NOT NULL PRIMARY KEY,
                description TEXT NOT NULL,
                applied_unix_ms BIGINT NOT NULL
            )
            """, cancellationToken);
        var applied = new HashSet<int>();
        await using (var read = connection.CreateCommand())
        {
            read.Transaction = transaction;
            read.CommandText = "SELECT version FROM schema_migrations";
            await using var rows = await read.ExecuteReaderAsync(cancellationToken);
            while (await rows.ReadAsync(cancellationToken)) applied.Add(Convert.ToInt32(rows.GetValue(0), System.Globalization.CultureInfo.InvariantCulture));
        }
        var done = new List<int>();
        foreach (var step in All.Where(s => !applied.Contains(s.Version)))
        {
            await Execute(connection, transaction, step.Sql.Replace("{id}", dialect.IdentityColumn, StringComparison.Ordinal), cancellationToken);
            await using var record = connection.CreateCommand();
            record.Transaction = transaction;
            record.CommandText = "INSERT INTO schema_migrations (version, description, applied_unix_ms) VALUES (@version, @description, @at)";
            record.AddParameter("version", step.Version).AddParameter("description", step.Description)
                .AddParameter("at", DateTimeOffset.UtcNow.ToUnixTimeMilliseconds());
            await record.ExecuteNonQueryAsync(cancellationToken);
            done.Add(step.Version);
        }
        await transaction.CommitAsync(cancellationToken);
        return done;
    }

    private static async Task Execute(DbConnection connection, DbTransaction transaction, string sql, CancellationToken cancellationToken)
    {
        await using var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        await command.ExecuteNonQueryAsync(cancellationToken);
    }
}
