using System.Data.Common;
using Microsoft.Data.Sqlite;

namespace LunarShadow.Api.Observations.Storage;

/// <summary>
/// SQLite through Microsoft.Data.Sqlite: one file, write-ahead log so readers never wait for a writer, and a busy
/// timeout so that writers from several hosts on the same file queue instead of failing.
/// </summary>
internal sealed class SqliteDialect : StorageDialect
{
    /// <summary>How long a writer waits for another's lock, milliseconds.</summary>
    private const int BusyTimeoutMilliseconds = 30_000;

    private readonly string _connectionString;

    /// <summary>A dialect on the configured connection string, or on the default file beside the app.</summary>
    public SqliteDialect(string? connectionString)
    {
        var builder = new SqliteConnectionStringBuilder(string.IsNullOrWhiteSpace(connectionString)
            ? $"Data Source={StorageOptions.DefaultSqliteFile}"
            : connectionString);
        if (builder.Mode is SqliteOpenMode.ReadWriteCreate && builder.DataSource.Length > 0 && builder.DataSource != ":memory:")
        {
            var folder = Path.GetDirectoryName(Path.GetFullPath(builder.DataSource));
            if (folder is not null) Directory.CreateDirectory(folder);
        }
        builder.DefaultTimeout = BusyTimeoutMilliseconds / 1000;
        _connectionString = builder.ToString();
    }

    /// <inheritdoc />
    public override string Name => StorageOptions.Sqlite;

    /// <inheritdoc />
    public override string IdentityColumn => "INTEGER PRIMARY KEY AUTOINCREMENT";

    /// <inheritdoc />
    public override async Task<DbConnection> OpenAsync(CancellationToken cancellationToken)
    {
        var connection = new SqliteConnection(_connectionString);
        await connection.OpenAsync(cancellationToken);
        await using var pragma = connection.CreateCommand();
        pragma.CommandText = $"PRAGMA busy_timeout = {BusyTimeoutMilliseconds}; PRAGMA foreign_keys = ON;";
        await pragma.ExecuteNonQueryAsync(cancellationToken);
        return connection;
    }

    /// <inheritdoc />
    public override async Task<DbTransaction> BeginMigrationAsync(DbConnection connection, CancellationToken cancellationToken)
    {
        // The journal mode is a property of the file, set outside any transaction; WAL lets readers run beside a writer.
        await using (var wal = connection.CreateCommand())
        {
            wal.CommandText = "PRAGMA journal_mode = WAL;";
            await wal.ExecuteNonQueryAsync(cancellationToken);
        }
        // BEGIN IMMEDIATE: the write lock is taken at once, so two hosts starting on one file migrate one after the other.
        return await connection.BeginTransactionAsync(cancellationToken);
    }

    /// <inheritdoc />
    public override bool IsUniqueViolation(DbException exception) =>
        exception is SqliteException { SqliteErrorCode: 19, SqliteExtendedErrorCode: 2067 or 1555 };
}
