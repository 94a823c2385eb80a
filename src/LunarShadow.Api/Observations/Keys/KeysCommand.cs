using System.Globalization;
using LunarShadow.Api.Observations.Storage;

namespace LunarShadow.Api.Observations.Keys;

/// <summary>
/// The host's key commands, run as <c>dotnet LunarShadow.Api.dll keys add "Name"</c> (prints the new key as the last
/// line), <c>keys list</c> and <c>keys revoke &lt;name-or-id&gt;</c>, on the database the service is configured with.
/// </summary>
internal static class KeysCommand
{
    /// <summary>The first argument that selects these commands.</summary>
    public const string Verb = "keys";

    private const string Usage = """
        Usage:
          keys add "Observatory name"   add a key; the key is printed once, on the last line
          keys list                     list keys (id, name, created, revoked)
          keys revoke <name-or-id>      revoke a key: it can no longer write
        Storage comes from Storage:Provider and Storage:ConnectionString (appsettings.json or Storage__Provider, Storage__ConnectionString).
        """;

    /// <summary>The configuration the service itself reads: appsettings.json (and per environment) and the environment.</summary>
    public static IConfiguration HostConfiguration()
    {
        var environment = Environment.GetEnvironmentVariable("ASPNETCORE_ENVIRONMENT") ?? Environment.GetEnvironmentVariable("DOTNET_ENVIRONMENT") ?? "Production";
        return new ConfigurationBuilder()
            .SetBasePath(AppContext.BaseDirectory)
            .AddJsonFile("appsettings.json", optional: true)
            .AddJsonFile($"appsettings.{environment}.json", optional: true)
            .AddEnvironmentVariables()
            .Build();
    }

    /// <summary>Runs one command (the arguments after "keys"); the process exit code.</summary>
    public static async Task<int> RunAsync(IReadOnlyList<string> args, IConfiguration configuration, TextWriter output, TextWriter error)
    {
        StorageDialect dialect;
        try
        {
            dialect = StorageDialect.From(StorageOptions.From(configuration));
        }
        catch (InvalidOperationException e)
        {
            await error.WriteLineAsync(e.Message);
            return 2;
        }
        try
        {
            await SchemaMigrations.ApplyAsync(dialect, CancellationToken.None);
            var keys = new KeyStore(dialect);
            return args switch
            {
                ["add", var name] => await Add(keys, name, output, error),
                ["list"] => await List(keys, output),
                ["revoke", var which] => await Revoke(keys, which, output, error),
                _ => await Fail(error, Usage),
            };
        }
        catch (System.Data.Common.DbException e)
        {
            // An unreachable or misconfigured database: say so in one line, not a stack trace.
            await error.WriteLineAsync($"The {dialect.Name} database could not be used: {e.Message}");
            return 1;
        }
        finally
        {
            (dialect as IDisposable)?.Dispose();
        }
    }

    private static async Task<int> Add(KeyStore keys, string name, TextWriter output, TextWriter error)
    {
        name = name.Trim();
        if (name.Length is 0 or > KeyStore.MaxNameLength || name.Any(char.IsControl))
            return await Fail(error, $"The name must be 1 to {KeyStore.MaxNameLength} characters without control characters.");
        if ((await keys.ListAsync(CancellationToken.None)).Any(k => string.Equals(k.Name, name, StringComparison.OrdinalIgnoreCase)))
            return await Fail(error, $"A key named \"{name}\" exists already; choose another name or revoke that one.");
        var (key, secret) = await keys.AddAsync(name, DateTimeOffset.UtcNow, CancellationToken.None);
        await output.WriteLineAsync(string.Create(CultureInfo.InvariantCulture, $"Added key {key.Id} for \"{key.Name}\". It is shown only now; the service keeps its SHA-256 hash."));
        await output.WriteLineAsync("Send it with each write as: Authorization: Bearer <key>");
        await output.WriteLineAsync(secret);
        return 0;
    }

    private static async Task<int> List(KeyStore keys, TextWriter output)
    {
        var all = await keys.ListAsync(CancellationToken.None);
        await output.WriteLineAsync("id\tname\tcreated (UTC)\trevoked (UTC)");
        foreach (var k in all)
            await output.WriteLineAsync(string.Create(CultureInfo.InvariantCulture, $"{k.Id}\t{k.Name}\t{k.CreatedUtc:yyyy-MM-ddTHH:mm:ssZ}\t{(k.RevokedUtc is { } r ? r.ToString("yyyy-MM-ddTHH:mm:ssZ", CultureInfo.InvariantCulture) : "-")}"));
        await output.WriteLineAsync(string.Create(CultureInfo.InvariantCulture, $"{all.Count} keys, {all.Count(k => k.IsActive)} active."));
        return 0;
    }

    private static async Task<int> Revoke(KeyStore keys, string which, TextWriter output, TextWriter error)
    {
        var key = await keys.RevokeAsync(which.Trim(), DateTimeOffset.UtcNow, CancellationToken.None);
        if (key is null) return await Fail(error, $"No key has the id or name \"{which}\"; see keys list.");
        await output.WriteLineAsync(string.Create(CultureInfo.InvariantCulture, $"Revoked key {key.Id} (\"{key.Name}\"): it can no longer write. Its observations stay."));
        return 0;
    }

    private static async Task<int> Fail(TextWriter error, string message)
    {
        await error.WriteLineAsync(message);
        return 2;
    }
}
