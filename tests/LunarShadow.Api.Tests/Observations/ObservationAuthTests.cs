using System.Net;
using System.Text.Json;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Observations;

/// <summary>Only holders of an active observatory key may write; anyone may read (RFC 6750 bearer tokens).</summary>
public sealed class ObservationAuthTests : IAsyncLifetime, IDisposable
{
    private StorageBackend _storage = null!;
    private ObservationHost _host = null!;
    private HttpClient _client = null!;

    public async Task InitializeAsync()
    {
        _storage = await StorageBackend.CreateAsync("sqlite");
        _host = new ObservationHost(_storage);
        _client = _host.CreateClient();
    }

    public async Task DisposeAsync()
    {
        await _host.DisposeAsync();
        await _storage.DisposeAsync();
    }

    public void Dispose()
    {
        _client.Dispose();
        _host.Dispose();
    }

    [Fact]
    public async Task A_write_without_a_key_is_401_with_a_bearer_challenge()
    {
        var response = await ObservationHost.PostAsync(_client, ObservationSamples.TychoImmersion(), key: null);
        await AssertUnauthorized(response);
        // RFC 6750 §3: the challenge names the Bearer scheme.
        Assert.StartsWith("Bearer", response.Headers.WwwAuthenticate.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_write_with_an_unknown_or_malformed_key_is_401()
    {
        await AssertUnauthorized(await ObservationHost.PostAsync(_client, ObservationSamples.TychoImmersion(), "lsk_" + new string('A', 43)));
        await AssertUnauthorized(await ObservationHost.PostAsync(_client, ObservationSamples.TychoImmersion(), "not-a-key"));
    }

    [Fact]
    public async Task A_revoked_key_is_401_and_its_earlier_writes_stay()
    {
        var key = await ObservationHost.AddKeyAsync(_storage, "Hollowmere Hill Public Observatory");
        Assert.Equal(HttpStatusCode.Created, (await ObservationHost.PostAsync(_client, ObservationSamples.Danjon(), key)).StatusCode);
        var (exit, _, error) = await ObservationHost.KeysAsync(_storage, "revoke", "Hollowmere Hill Public Observatory");
        Assert.True(exit == 0, error);
        await AssertUnauthorized(await ObservationHost.PostAsync(_client, ObservationSamples.Danjon(value: 3), key));
        Assert.Equal(1, (await JsonAssert.OkJson(await _client.GetAsync(ObservationHost.Url))).GetProperty("count").GetInt32());
    }

    [Fact]
    public async Task Reading_needs_no_key_and_never_shows_one()
    {
        var key = await ObservationHost.AddKeyAsync(_storage, "Hollowmere Hill Public Observatory");
        Assert.Equal(HttpStatusCode.Created, (await ObservationHost.PostAsync(_client, ObservationSamples.TychoImmersion(), key)).StatusCode);
        var json = await _client.GetStringAsync(ObservationHost.Url);
        var csv = await _client.GetStringAsync(ObservationHost.Url + "?format=csv");
        Assert.DoesNotContain(key, json, StringComparison.Ordinal);
        Assert.DoesNotContain(key, csv, StringComparison.Ordinal);
        Assert.DoesNotContain("key", JsonDocument.Parse(json).RootElement.GetProperty("observations")[0].EnumerateObject().Select(p => p.Name));
    }

    private static async Task AssertUnauthorized(HttpResponseMessage response)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.Unauthorized, $"{(int)response.StatusCode}: {body}");
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
    }
}
