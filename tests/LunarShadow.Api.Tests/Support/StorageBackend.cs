using Npgsql;

namespace LunarShadow.Api.Tests.Support;

/// <summary>
/// A fresh, empty observers' log for one test: a SQLite file in a temp folder, or a new database on the PostgreSQL
/// server named by LUNARSHADOW_TEST_POSTGRES (.ci/run starts one). Without that variable the PostgreSQL tests skip
/// locally and fail in CI (CI=true), as the browser tests do without chromium.
/// </summary>
public sealed class StorageBackend : IAsyncDisposable
{
    /// <summary>The environment variable with the PostgreSQL connection string (database: any existing one, e.g. postgres).</summary>
    public const string PostgresVariable = "LUNARSHADOW_TEST_POSTGRES";

    private readonly Func<Task> _cleanUp;

    private StorageBackend(string provider, string connectionString, Func<Task> cleanUp)
    {
        Provider = provider;
        ConnectionString = connectionString;
        _cleanUp = cleanUp;
    }

    /// <summary>sqlite or postgres.</summary>
    public string Provider { get; }

    /// <summary>The connection string of the fresh database.</summary>
    public string ConnectionString { get; }

    /// <summary>The host settings that point the service at this database.</summary>
    public IReadOnlyDictionary<string, string?> Settings => new Dictionary<string, string?>
    {
        ["Storage:Provider"] = Provider,
        ["Storage:ConnectionString"] = ConnectionString,
    };

    /// <summary>A fresh database of the given provider (skips or fails for postgres without a server, see above).</summary>
    public static async Task<StorageBackend> CreateAsync(string provider)
    {
        if (provider == "sqlite")
        {
            var folder = Directory.CreateTempSubdirectory("lunarshadow-obs-");
            return new StorageBackend(provider, $"Data Source={Path.Combine(folder.FullName, "observations.db")};Pooling=False", () =>
            {
                try { folder.Delete(recursive: true); } catch (IOException) { } // a file still open on a slow shutdown: leave it in /tmp
                return Task.CompletedTask;
            });
        }
        var server = Environment.GetEnvironmentVariable(PostgresVariable);
        if (string.IsNullOrWhiteSpace(server))
        {
            if (string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase))
                Assert.Fail($"CI=true but {PostgresVariable} is not set: .ci/run starts a PostgreSQL cluster and sets it.");
            Skip.If(true, $"PostgreSQL tests need {PostgresVariable} (a connection string); .ci/run sets it.");
        }
        var name = "lunarshadow_test_" + Guid.NewGuid().ToString("N");
        await using (var admin = new NpgsqlConnection(server))
        {
            await admin.OpenAsync();
            await using var create = new NpgsqlCommand($"CREATE DATABASE {name}", admin);
            await create.ExecuteNonQueryAsync();
        }
        var builder = new NpgsqlConnectionStringBuilder(server) { Database = name };
        return new StorageBackend(provider, builder.ConnectionString, async () =>
        {
            NpgsqlConnection.ClearAllPools();
            await using var admin = new NpgsqlConnection(server);
            await admin.OpenAsync();
            await using var drop = new NpgsqlCommand($"DROP DATABASE IF EXISTS {name} WITH (FORCE)", admin);
            await drop.ExecuteNonQueryAsync();
        });
    }

    /// <inheritdoc />
    public async ValueTask DisposeAsync() => await _cleanUp();
}
