using System.Net;
using System.Text;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Observations;

/// <summary>Bad observations get a 400 naming the field (with its index in a batch) and what is allowed; exact repeats 409.</summary>
public sealed class ObservationValidationTests : ObservationLogTest
{
    private string _key = null!;

    protected override async Task BeforeHostStartsAsync() =>
        _key = await ObservationHost.AddKeyAsync(Storage, "Hollowmere Hill Public Observatory");

    private Task<HttpResponseMessage> Post(string json) => ObservationHost.PostAsync(Client, json, _key);

    [Fact]
    public async Task A_feature_not_in_the_list_is_refused() =>
        await JsonAssert.ProblemNaming(await Post(ObservationSamples.TychoImmersion().Replace("Tycho", "Atlantis", StringComparison.Ordinal)), "feature");

    [Fact]
    public async Task An_instant_outside_the_eclipse_is_refused_with_P1_and_P4()
    {
        // 14:00 UTC is before P1 (about 15:28 UT; NASA canon, from memory).
        var problem = await JsonAssert.ProblemNaming(await Post(ObservationSamples.Danjon(utc: "2025-09-07T14:00:00Z")), "utc");
        Assert.Contains("P1 2025-09-07T15:28", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_timing_more_than_thirty_minutes_from_the_predicted_crossing_is_refused()
    {
        // 36 minutes after the service's predicted immersion of Tycho (17:09:06 UTC), inside the eclipse.
        var problem = await JsonAssert.ProblemNaming(await Post(ObservationSamples.TychoImmersion(utc: "2025-09-07T17:45:00Z")), "utc");
        Assert.Contains("30 minutes", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_site_where_the_Moon_is_below_the_horizon_is_refused() =>
        await JsonAssert.ProblemNaming(await Post(ObservationSamples.Danjon(site: ObservationSamples.MoonBelowHorizon)), "site");

    [Theory]
    [InlineData(4.5)]
    [InlineData(2.3)]
    [InlineData(-0.5)]
    public async Task A_Danjon_value_off_the_half_step_scale_is_refused(double value)
    {
        // Danjon scale L = 0…4 (Danjon 1921; common practice to estimate to half steps).
        var problem = await JsonAssert.ProblemNaming(await Post(ObservationSamples.Danjon(value)), "value");
        Assert.Contains("0", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Fields_are_named_with_their_index_in_a_batch()
    {
        var batch = $"[{ObservationSamples.Danjon()}, {ObservationSamples.Danjon(utc: "2025-09-07T99:00:00Z")}, {ObservationSamples.TychoImmersion(site: """{"lat": 91, "lon": 0}""")}]";
        var response = await Post(batch);
        await JsonAssert.ProblemNaming(response, "[1].utc");
        await JsonAssert.ProblemNaming(await Post(batch), "[2].site.lat");
    }

    [Fact]
    public async Task Missing_and_unknown_fields_are_named()
    {
        await JsonAssert.ProblemNaming(await Post("""{"value": 2, "utc": "2025-09-07T18:10:00Z", "site": {"lat": 13, "lon": 77.6}}"""), "kind");
        await JsonAssert.ProblemNaming(await Post("""{"kind": "crater-timing", "utc": "2025-09-07T17:09:20Z", "site": {"lat": 13, "lon": 77.6}}"""), "feature");
        await JsonAssert.ProblemNaming(await Post("""{"kind": "danjon", "value": 2, "utc": "2025-09-07T18:10:00Z"}"""), "site");
        await JsonAssert.ProblemNaming(await Post("""{"kind": "danjon", "value": 2, "utc": "2025-09-07T18:10:00Z", "site": {"lat": 13, "lon": 77.6}, "email": "x@example.org"}"""), "email");
    }

    [Fact]
    public async Task An_exact_repeat_from_the_same_key_is_409_and_another_key_may_post_the_same()
    {
        Assert.Equal(HttpStatusCode.Created, (await Post(ObservationSamples.TychoImmersion())).StatusCode);
        Assert.Equal(HttpStatusCode.Conflict, (await Post(ObservationSamples.TychoImmersion())).StatusCode);
        var other = await ObservationHost.AddKeyAsync(Storage, "Invented Ridge Observatory");
        Assert.Equal(HttpStatusCode.Created, (await ObservationHost.PostAsync(Client, ObservationSamples.TychoImmersion(), other)).StatusCode);
        // A different observed instant is a different observation.
        Assert.Equal(HttpStatusCode.Created, (await Post(ObservationSamples.TychoImmersion(utc: "2025-09-07T17:09:21Z"))).StatusCode);
    }

    [Fact]
    public async Task Too_many_items_or_too_large_a_body_is_413_and_a_body_that_is_not_json_415()
    {
        var many = "[" + string.Join(',', Enumerable.Range(0, 501).Select(ObservationSamples.DanjonAt)) + "]";
        Assert.Equal(HttpStatusCode.RequestEntityTooLarge, (await Post(many)).StatusCode);
        Assert.Equal(HttpStatusCode.RequestEntityTooLarge, (await Post("\"" + new string('x', 300 * 1024) + "\"")).StatusCode);
        using var request = new HttpRequestMessage(HttpMethod.Post, ObservationHost.Url) { Content = new StringContent("<x/>", Encoding.UTF8, "text/xml") };
        request.Headers.Authorization = new System.Net.Http.Headers.AuthenticationHeaderValue("Bearer", _key);
        Assert.Equal(HttpStatusCode.UnsupportedMediaType, (await Client.SendAsync(request)).StatusCode);
    }

    [Fact]
    public async Task A_date_without_an_eclipse_is_404_for_reading_and_writing()
    {
        Assert.Equal(HttpStatusCode.NotFound, (await Client.GetAsync("/api/v1/eclipses/2025-09-08/observations")).StatusCode);
        using var request = new HttpRequestMessage(HttpMethod.Post, "/api/v1/eclipses/2025-09-08/observations")
        {
            Content = new StringContent(ObservationSamples.Danjon(), Encoding.UTF8, "application/json"),
        };
        request.Headers.Authorization = new System.Net.Http.Headers.AuthenticationHeaderValue("Bearer", _key);
        Assert.Equal(HttpStatusCode.NotFound, (await Client.SendAsync(request)).StatusCode);
    }

    [Fact]
    public async Task The_csv_list_neutralises_text_a_spreadsheet_would_run()
    {
        // OWASP, "CSV Injection": a cell starting with = is prefixed with a quote.
        var json = ObservationSamples.TychoImmersion(observer: "=HYPERLINK(\\\"http://example.invalid\\\")");
        Assert.Equal(HttpStatusCode.Created, (await Post(json)).StatusCode);
        var csv = await Client.GetStringAsync(ObservationHost.Url + "?format=csv");
        Assert.Contains("'=HYPERLINK", csv, StringComparison.Ordinal);
        Assert.StartsWith("eclipse,id,kind,feature,crossing,value,utc", csv, StringComparison.Ordinal);
    }
}
