namespace LunarShadow.Api.Tests.Support;

/// <summary>
/// A fresh SQLite observers' log and an in-memory host on it for each test. A test class may prepare the log (add keys)
/// in <see cref="BeforeHostStartsAsync"/>, before the host is made.
/// </summary>
public abstract class ObservationLogTest : IAsyncLifetime, IDisposable
{
    /// <summary>The test's database.</summary>
    protected StorageBackend Storage { get; private set; } = null!;

    /// <summary>A client of the host on <see cref="Storage"/>.</summary>
    protected HttpClient Client { get; private set; } = null!;

    private ObservationHost _host = null!;

    /// <summary>Runs after the database is made and before the host starts on it.</summary>
    protected virtual Task BeforeHostStartsAsync() => Task.CompletedTask;

    public async Task InitializeAsync()
    {
        Storage = await StorageBackend.CreateAsync("sqlite");
        await BeforeHostStartsAsync();
        _host = new ObservationHost(Storage);
        Client = _host.CreateClient();
    }

    public async Task DisposeAsync()
    {
        await _host.DisposeAsync();
        await Storage.DisposeAsync();
    }

    public void Dispose()
    {
        Client.Dispose();
        _host.Dispose();
        GC.SuppressFinalize(this);
    }
}
