using System.Net;
using System.Text.Json;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Observations;

/// <summary>Only holders of an active observatory key may write; anyone may read (RFC 6750 bearer tokens).</summary>
public sealed class ObservationAuthTests : ObservationLogTest
{
    [Fact]
    public async Task A_write_without_a_key_is_401_with_a_bearer_challenge()
    {
        var response = await ObservationHost.PostAsync(Client, ObservationSamples.TychoImmersion(), key: null);
        await AssertUnauthorized(response);
        // RFC 6750 §3: the challenge names the Bearer scheme.
        Assert.StartsWith("Bearer", response.Headers.WwwAuthenticate.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_write_with_an_unknown_or_malformed_key_is_401()
    {
        await AssertUnauthorized(await ObservationHost.PostAsync(Client, ObservationSamples.TychoImmersion(), "lsk_" + new string('A', 43)));
        await AssertUnauthorized(await ObservationHost.PostAsync(Client, ObservationSamples.TychoImmersion(), "not-a-key"));
    }

    [Fact]
    public async Task A_revoked_key_is_401_and_its_earlier_writes_stay()
    {
        var key = await ObservationHost.AddKeyAsync(Storage, "Hollowmere Hill Public Observatory");
        Assert.Equal(HttpStatusCode.Created, (await ObservationHost.PostAsync(Client, ObservationSamples.Danjon(), key)).StatusCode);
        var (exit, _, error) = await ObservationHost.KeysAsync(Storage, "revoke", "Hollowmere Hill Public Observatory");
        Assert.True(exit == 0, error);
        await AssertUnauthorized(await ObservationHost.PostAsync(Client, ObservationSamples.Danjon(value: 3), key));
        Assert.Equal(1, (await JsonAssert.OkJson(await Client.GetAsync(ObservationHost.Url))).GetProperty("count").GetInt32());
    }

    [Fact]
    public async Task Reading_needs_no_key_and_never_shows_one()
    {
        var key = await ObservationHost.AddKeyAsync(Storage, "Hollowmere Hill Public Observatory");
        Assert.Equal(HttpStatusCode.Created, (await ObservationHost.PostAsync(Client, ObservationSamples.TychoImmersion(), key)).StatusCode);
        var json = await Client.GetStringAsync(ObservationHost.Url);
        var csv = await Client.GetStringAsync(ObservationHost.Url + "?format=csv");
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
