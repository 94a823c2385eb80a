namespace LunarShadow.Api.Observations.Storage;

/// <summary>Where the observers' log lives: configuration section "Storage" (<c>Storage:Provider</c>, <c>Storage:ConnectionString</c>).</summary>
internal sealed class StorageOptions
{
    /// <summary>The SQLite provider's name (the default).</summary>
    public const string Sqlite = "sqlite";

    /// <summary>The PostgreSQL provider's name.</summary>
    public const string Postgres = "postgres";

    /// <summary>sqlite (default) or postgres.</summary>
    public string Provider { get; set; } = Sqlite;

    /// <summary>The provider's connection string; for SQLite, empty means a file under <c>data/</c> beside the app.</summary>
    public string? ConnectionString { get; set; }

    /// <summary>The SQLite file used when no connection string is configured: <c>data/observations.db</c> beside the app.</summary>
    public static string DefaultSqliteFile => Path.Combine(AppContext.BaseDirectory, "data", "observations.db");

    /// <summary>The options from configuration (defaults where absent).</summary>
    public static StorageOptions From(IConfiguration configuration) =>
        configuration.GetSection("Storage").Get<StorageOptions>() ?? new StorageOptions();
}
