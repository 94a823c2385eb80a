using System.Net.Http.Headers;
using System.Text;
using LunarShadow.Api.Observations.Keys;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.Configuration;

namespace LunarShadow.Api.Tests.Support;

/// <summary>
/// An in-memory host on a given observers' log, with the rate limits raised (write limits too) so tests can post
/// quickly; and the keys command run in-process on the same database.
/// </summary>
public sealed class ObservationHost(StorageBackend storage, IReadOnlyDictionary<string, string?>? extra = null) : WebApplicationFactory<Program>
{
    /// <summary>The eclipse the tests post to: the total lunar eclipse of 2025 September 7 (NASA Five Millennium Canon, from memory).</summary>
    public const string Eclipse = "2025-09-07";

    /// <summary>The log's URL for <see cref="Eclipse"/>.</summary>
    public const string Url = $"/api/v1/eclipses/{Eclipse}/observations";

    /// <summary>The database.</summary>
    public StorageBackend Storage => storage;

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        builder.UseSetting("RateLimiting:PermitsPerSecond", "1000000");
        builder.UseSetting("RateLimiting:Burst", "1000000");
        builder.UseSetting("RateLimiting:WritesPerMinute", "1000000");
        builder.UseSetting("RateLimiting:WriteBurst", "1000000");
        builder.UseSetting("RequestTimeoutSeconds", "300");
        foreach (var (name, value) in storage.Settings) builder.UseSetting(name, value);
        foreach (var (name, value) in extra ?? new Dictionary<string, string?>()) builder.UseSetting(name, value);
    }

    /// <summary>Runs <c>keys …</c> on the host's database; its exit code, standard output and error.</summary>
    public static async Task<(int Exit, string Output, string Error)> KeysAsync(StorageBackend storage, params string[] args)
    {
        var configuration = new ConfigurationBuilder().AddInMemoryCollection(storage.Settings).Build();
        using var output = new StringWriter();
        using var error = new StringWriter();
        var exit = await KeysCommand.RunAsync(args, configuration, output, error);
        return (exit, output.ToString(), error.ToString());
    }

    /// <summary>Adds a key with the keys command and returns it (the last line of the output).</summary>
    public static async Task<string> AddKeyAsync(StorageBackend storage, string name)
    {
        var (exit, output, error) = await KeysAsync(storage, "add", name);
        Assert.True(exit == 0, error);
        return output.TrimEnd().Split('\n')[^1].Trim();
    }

    /// <summary>POSTs a JSON body with the key (none when null).</summary>
    public static async Task<HttpResponseMessage> PostAsync(HttpClient client, string json, string? key)
    {
        using var request = new HttpRequestMessage(HttpMethod.Post, Url) { Content = new StringContent(json, Encoding.UTF8, "application/json") };
        if (key is not null) request.Headers.Authorization = new AuthenticationHeaderValue("Bearer", key);
        return await client.SendAsync(request);
    }
}
