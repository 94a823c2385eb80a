using System.Data.Common;

namespace LunarShadow.Api.Observations.Storage;

/// <summary>
/// What differs between the two databases: how a connection is opened, how an id column is declared, how migrations are
/// serialised between processes, and how a unique-key violation is recognised. The SQL itself is shared.
/// </summary>
internal abstract class StorageDialect
{
    /// <summary>The provider's configuration name.</summary>
    public abstract string Name { get; }

    /// <summary>The column declaration of a generated 64-bit primary key.</summary>
    public abstract string IdentityColumn { get; }

    /// <summary>An open connection.</summary>
    public abstract Task<DbConnection> OpenAsync(CancellationToken cancellationToken);

    /// <summary>
    /// A transaction that serialises migrations between processes and replicas (taken before the schema is read).
    /// </summary>
    public abstract Task<DbTransaction> BeginMigrationAsync(DbConnection connection, CancellationToken cancellationToken);

    /// <summary>Whether the exception is a violated unique constraint (an exact duplicate).</summary>
    public abstract bool IsUniqueViolation(DbException exception);

    /// <summary>The dialect for the configured provider; an unknown provider is a configuration error.</summary>
    public static StorageDialect From(StorageOptions options) => options.Provider.Trim().ToLowerInvariant() switch
    {
        StorageOptions.Sqlite => new SqliteDialect(options.ConnectionString),
        StorageOptions.Postgres => new PostgresDialect(options.ConnectionString
            ?? throw new InvalidOperationException("Storage:ConnectionString is required with Storage:Provider=postgres.")),
        var other => throw new InvalidOperationException($"Storage:Provider must be sqlite or postgres; got '{other}'."),
    };
}
