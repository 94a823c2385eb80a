using System.Net;
using System.Text.Json;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Observations;

/// <summary>The observers' log keeps what it is given, on both backends: across restarts and under many writers at once.</summary>
public class ObservationStorageTests
{
    [SkippableTheory]
    [InlineData("sqlite")]
    [InlineData("postgres")]
    public async Task Observations_survive_a_restart_of_the_service(string provider)
    {
        await using var storage = await StorageBackend.CreateAsync(provider);
        var key = await ObservationHost.AddKeyAsync(storage, "Hollowmere Hill Public Observatory");
        await using (var first = new ObservationHost(storage))
        {
            var response = await ObservationHost.PostAsync(first.CreateClient(), $"[{ObservationSamples.TychoImmersion()}, {ObservationSamples.Danjon()}]", key);
            Assert.Equal(HttpStatusCode.Created, response.StatusCode);
        }
        // A second host on the same file or database: a restart, or another replica.
        await using var second = new ObservationHost(storage);
        var list = await JsonAssert.OkJson(await second.CreateClient().GetAsync(ObservationHost.Url));
        Assert.Equal(2, list.GetProperty("count").GetInt32());
        var timing = list.GetProperty("observations")[0];
        Assert.Equal("Tycho", timing.GetProperty("feature").GetString());
        Assert.Equal("2025-09-07T17:09:20.000Z", timing.GetProperty("utc").GetString());
        Assert.Equal("Hollowmere Hill Public Observatory", timing.GetProperty("observatory").GetString());
        Assert.Equal(2.5, list.GetProperty("observations")[1].GetProperty("value").GetDouble());
    }

    [SkippableTheory]
    [InlineData("sqlite")]
    [InlineData("postgres")]
    public async Task Two_replicas_starting_at_once_on_one_database_both_serve(string provider)
    {
        await using var storage = await StorageBackend.CreateAsync(provider);
        await using var a = new ObservationHost(storage);
        await using var b = new ObservationHost(storage);
        // Both run the migrations at start-up; the lock lets one go first, the other then finds nothing to do.
        var clients = await Task.WhenAll(Task.Run(a.CreateClient), Task.Run(b.CreateClient));
        foreach (var client in clients)
            Assert.Equal(0, (await JsonAssert.OkJson(await client.GetAsync(ObservationHost.Url))).GetProperty("count").GetInt32());
    }

    [SkippableTheory]
    [InlineData("sqlite")]
    [InlineData("postgres")]
    public async Task Eight_observatories_posting_fifty_each_at_once_lose_nothing(string provider)
    {
        const int Writers = 8, PostsEach = 50;
        await using var storage = await StorageBackend.CreateAsync(provider);
        var keys = new List<string>();
        for (var w = 0; w < Writers; w++) keys.Add(await ObservationHost.AddKeyAsync(storage, $"Invented Observatory {w + 1}"));
        await using var host = new ObservationHost(storage);
        var client = host.CreateClient();
        var statuses = await Task.WhenAll(Enumerable.Range(0, Writers).Select(w => Task.Run(async () =>
        {
            var codes = new List<HttpStatusCode>();
            for (var i = 0; i < PostsEach; i++)
                codes.Add((await ObservationHost.PostAsync(client, ObservationSamples.DanjonAt(w * PostsEach + i), keys[w])).StatusCode);
            return codes;
        })));
        Assert.All(statuses.SelectMany(s => s), s => Assert.Equal(HttpStatusCode.Created, s));
        var list = await JsonAssert.OkJson(await client.GetAsync(ObservationHost.Url));
        var observations = list.GetProperty("observations").EnumerateArray().ToList();
        Assert.Equal(Writers * PostsEach, observations.Count);
        Assert.Equal(Writers * PostsEach, observations.Select(o => o.GetProperty("utc").GetString()).Distinct().Count());
        Assert.Equal(Writers * PostsEach, observations.Select(o => o.GetProperty("id").GetInt64()).Distinct().Count());
        Assert.All(observations.GroupBy(o => o.GetProperty("observatory").GetString()), g => Assert.Equal(PostsEach, g.Count()));
    }

    [SkippableTheory]
    [InlineData("sqlite")]
    [InlineData("postgres")]
    public async Task A_batch_with_one_bad_item_stores_nothing_and_names_the_item(string provider)
    {
        await using var storage = await StorageBackend.CreateAsync(provider);
        var key = await ObservationHost.AddKeyAsync(storage, "Hollowmere Hill Public Observatory");
        await using var host = new ObservationHost(storage);
        var client = host.CreateClient();
        var bad = $"[{ObservationSamples.Danjon()}, {ObservationSamples.TychoImmersion()}, {ObservationSamples.Danjon(value: 4.5)}]";
        await JsonAssert.ProblemNaming(await ObservationHost.PostAsync(client, bad, key), "[2].value");
        // Stored once, then repeated as the second item of a batch: 409 naming it, and the batch's first item is not kept.
        Assert.Equal(HttpStatusCode.Created, (await ObservationHost.PostAsync(client, ObservationSamples.TychoImmersion(), key)).StatusCode);
        var repeat = await ObservationHost.PostAsync(client, $"[{ObservationSamples.Danjon()}, {ObservationSamples.TychoImmersion()}]", key);
        Assert.Equal(HttpStatusCode.Conflict, repeat.StatusCode);
        Assert.Equal("[1]", JsonDocument.Parse(await repeat.Content.ReadAsStringAsync()).RootElement.GetProperty("field").GetString());
        var list = await JsonAssert.OkJson(await client.GetAsync(ObservationHost.Url));
        Assert.Equal(1, list.GetProperty("count").GetInt32());
        Assert.Equal("crater-timing", list.GetProperty("observations")[0].GetProperty("kind").GetString());
    }
}
