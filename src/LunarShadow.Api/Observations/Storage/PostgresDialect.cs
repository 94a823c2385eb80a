using System.Data.Common;
using Npgsql;

namespace LunarShadow.Api.Observations.Storage;

/// <summary>
/// PostgreSQL through Npgsql, for deployments with several replicas: one pooled data source per process, and
/// migrations serialised across replicas by a transaction-scoped advisory lock.
/// </summary>
internal sealed class PostgresDialect(string connectionString) : StorageDialect, IDisposable
{
    /// <summary>The advisory lock every replica takes before reading or changing the schema (an arbitrary constant).</summary>
    private const long MigrationLockKey = 0x4C53_4F42_5331; // "LSOBS1"

    private readonly NpgsqlDataSource _dataSource = NpgsqlDataSource.Create(connectionString);

    /// <inheritdoc />
    public override string Name => StorageOptions.Postgres;

    /// <inheritdoc />
    public override string IdentityColumn => "BIGINT GENERATED ALWAYS AS IDENTITY PRIMARY KEY";

    /// <inheritdoc />
    public override async Task<DbConnection> OpenAsync(CancellationToken cancellationToken) =>
        await _dataSource.OpenConnectionAsync(cancellationToken);

    /// <inheritdoc />
    public override async Task<DbTransaction> BeginMigrationAsync(DbConnection connection, CancellationToken cancellationToken)
    {
        var transaction = await connection.BeginTransactionAsync(cancellationToken);
        await using var command = connection.CreateCommand();
        command.Transaction = transaction;
        // PostgreSQL manual, "Advisory Locks": held until the transaction ends, so a crashed replica cannot keep it.
        command.CommandText = $"SELECT pg_advisory_xact_lock({MigrationLockKey})";
        await command.ExecuteNonQueryAsync(cancellationToken);
        return transaction;
    }

    /// <inheritdoc />
    public override bool IsUniqueViolation(DbException exception) =>
        exception is PostgresException { SqlState: PostgresErrorCodes.UniqueViolation };

    /// <inheritdoc />
    public void Dispose() => _dataSource.Dispose();
}
