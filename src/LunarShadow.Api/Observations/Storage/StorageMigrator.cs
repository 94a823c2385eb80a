namespace LunarShadow.Api.Observations.Storage;

/// <summary>Applies the schema migrations when the host starts, before it serves a request.</summary>
internal sealed partial class StorageMigrator(StorageDialect dialect, ILogger<StorageMigrator> logger) : IHostedService
{
    /// <inheritdoc />
    public async Task StartAsync(CancellationToken cancellationToken)
    {
        var applied = await SchemaMigrations.ApplyAsync(dialect, cancellationToken);
        Migrated(logger, dialect.Name, applied.Count, SchemaMigrations.Latest);
    }

    /// <inheritdoc />
    public Task StopAsync(CancellationToken cancellationToken) => Task.CompletedTask;

    [LoggerMessage(Level = LogLevel.Information, Message = "Observers' log on {Provider}: {Applied} schema steps applied, now at version {Version}")]
    private static partial void Migrated(ILogger logger, string provider, int applied, int version);
}
