using System.Globalization;
using System.Net;
using System.Text.Json;
using LunarShadow.Api.Observations;
using LunarShadow.Api.Tests.Support;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;
using Xunit.Abstractions;

namespace LunarShadow.Api.Tests.Observations;

/// <summary>
/// The measured shadow over HTTP: /enlargement, shadow=measured and danjonL=reported, on an in-memory observers' log
/// filled with timings our own crater predictions make under an opaque layer of 120 km (a test of the plumbing and the
/// fit, not a claim about nature; the fit itself is checked in UmbralEnlargementFitTests).
/// </summary>
public class EnlargementEndpointTests(ObservationsApiFactory factory, ITestOutputHelper output) : IClassFixture<ObservationsApiFactory>
{
    private const string Date = "2025-03-14";
    private static readonly CalendarDate Eclipse = new(2025, 3, 14, true);
    private static readonly ObservationSite Site = new(-33.9, 151.2, 40);
    private const string Where = "lat=-33.9&lon=151.2&tz=Australia/Sydney";

    private readonly HttpClient _client = factory.CreateClient();

    // Every Earth-facing crossing of the umbra's edge under a 120 km layer, as UTC (the service's default ΔT model).
    private static readonly Lazy<List<(string Feature, CrossingDirection Crossing, DateTimeOffset Utc)>> Crossings = new(() =>
    {
        var time = TimeScaleConverter.Default;
        var eclipse = EclipseFinders.Shared.For(ShadowModel.Layer(120)).OnUtcDate(Eclipse, time)!;
        var list = new List<(string, CrossingDirection, DateTimeOffset)>();
        foreach (var t in new FeatureShadowCrossings(eclipse).Compute(LunarFeatureCatalog.All))
        {
            if (t.UmbraImmersion is { FacesEarth: true } i) list.Add((t.Feature.Name, CrossingDirection.Immersion, time.ToUtc(i.Tt).ToDateTimeOffset()));
            if (t.UmbraEmersion is { FacesEarth: true } o) list.Add((t.Feature.Name, CrossingDirection.Emersion, time.ToUtc(o.Tt).ToDateTimeOffset()));
        }
        return list;
    });

    private void Store(int count, double shiftSeconds = 0, int skip = 0)
    {
        foreach (var (feature, crossing, utc) in Crossings.Value.Skip(skip).Take(count))
            factory.Log.Add(new CraterTimingObservation(0, Eclipse, feature, crossing, utc.AddSeconds(shiftSeconds), Site, 20, null, null, "test-key", DateTimeOffset.UnixEpoch));
    }

    private void Report(double value) =>
        factory.Log.Add(new DanjonObservation(0, Eclipse, value, DateTimeOffset.UnixEpoch, Site, null, "test-key", DateTimeOffset.UnixEpoch));

    private async Task<JsonElement> Get(string path) => await JsonAssert.OkJson(await _client.GetAsync($"/api/v1/eclipses/{Date}/{path}"));

    [Fact]
    public async Task Without_enough_timings_the_enlargement_says_so_and_measured_shadows_are_a_409_problem()
    {
        factory.Log.Clear();
        Store(UmbralEnlargementFit.MinimumTimings - 1);
        var json = await Get("enlargement");
        Assert.Equal("too-few-timings", json.GetProperty("status").GetString());
        Assert.Equal(UmbralEnlargementFit.MinimumTimings - 1, json.GetProperty("observations").GetInt32());
        Assert.Equal(JsonValueKind.Null, json.GetProperty("enlargementPercent").ValueKind);
        Assert.Equal(UmbralEnlargementFit.MinimumTimings - 1, json.GetProperty("residuals").GetArrayLength());
        foreach (var path in new[] { "craters?shadow=measured", $"local?{Where}&shadow=measured", $"photo-plan?{Where}&shadow=measured" })
        {
            var response = await _client.GetAsync($"/api/v1/eclipses/{Date}/{path}");
            var body = await response.Content.ReadAsStringAsync();
            Assert.True(response.StatusCode == HttpStatusCode.Conflict, $"{path}: {(int)response.StatusCode} {body}");
            Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
            Assert.Contains("5 stored so far", body, StringComparison.Ordinal);
        }
    }

    [Fact]
    public async Task The_enlargement_recovers_the_layer_the_timings_were_made_with_and_rejects_a_gross_error()
    {
        factory.Log.Clear();
        Store(30);
        Store(1, shiftSeconds: 300, skip: 40); // one timing 5 minutes late
        var json = await Get("enlargement");
        output.WriteLine(json.ToString());
        Assert.Equal("measured", json.GetProperty("status").GetString());
        Assert.Equal(31, json.GetProperty("observations").GetInt32());
        // 120 km: the layer the timings were made with (the reduction's own accuracy, see UmbralEnlargementFitTests).
        Assert.Equal(120, json.GetProperty("equivalentLayerKm").GetDouble(), 3.0);
        Assert.True(json.GetProperty("enlargementPercentSigma").GetDouble() > 0);
        var residuals = json.GetProperty("residuals").EnumerateArray().ToList();
        Assert.Equal(31, residuals.Count);
        var late = residuals[30];
        Assert.True(late.GetProperty("rejected").GetBoolean());
        Assert.Equal(300, late.GetProperty("residualSeconds").GetDouble(), 40.0);
        Assert.Equal(1, json.GetProperty("rejected").GetInt32());
        Assert.All(residuals.Take(30), r => Assert.True(Math.Abs(r.GetProperty("residualSeconds").GetDouble()) < 30));
        Assert.Contains(residuals, r => r.GetProperty("crossing").GetString() == "emersion");

        var csv = await _client.GetStringAsync($"/api/v1/eclipses/{Date}/enlargement?format=csv");
        var lines = csv.Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith("feature,crossing,observed_utc,predicted_utc,residual_s,rejected", lines[0], StringComparison.Ordinal);
        Assert.Equal(32, lines.Length);
    }

    [Fact]
    public async Task Measured_shadows_use_the_fit_say_how_many_timings_and_follow_each_new_timing()
    {
        factory.Log.Clear();
        Store(12);
        var fit = await Get("enlargement");
        var craters = await Get("craters?shadow=measured");
        Assert.Equal("enlarged", craters.GetProperty("shadowModel").GetString());
        var measured = craters.GetProperty("measuredShadow");
        Assert.Equal(12, measured.GetProperty("timings").GetInt32());
        Assert.Equal(fit.GetProperty("enlargementPercent").GetDouble(), measured.GetProperty("enlargementPercent").GetDouble());
        // The crater prediction under the measured shadow is the fit's predicted instant (one model, one formula).
        var first = fit.GetProperty("residuals")[0];
        var feature = craters.GetProperty("features").EnumerateArray().Single(f => f.GetProperty("name").GetString() == first.GetProperty("feature").GetString());
        var crossing = feature.GetProperty(first.GetProperty("crossing").GetString() == "immersion" ? "immersion" : "emersion");
        var gap = (Instant(crossing.GetProperty("utc")) - Instant(first.GetProperty("predictedUtc"))).TotalSeconds;
        Assert.True(Math.Abs(gap) < 1, $"{gap:0.00} s");

        var local = await Get($"local?{Where}&shadow=measured");
        Assert.Equal(12, local.GetProperty("measuredShadow").GetProperty("timings").GetInt32());
        var photo = await Get($"photo-plan?{Where}&shadow=measured");
        Assert.Equal(12, photo.GetProperty("measuredShadow").GetProperty("timings").GetInt32());
        Assert.Equal("enlarged", photo.GetProperty("eclipse").GetProperty("shadowModel").GetString());

        // A new timing (a minute late) shows at once: the answers are not served from the output cache, and other caches
        // must revalidate them (RFC 9111 §5.2.2.4 no-cache).
        var headers = await _client.GetAsync($"/api/v1/eclipses/{Date}/craters?shadow=measured");
        Assert.Contains("no-cache", headers.Headers.CacheControl!.ToString(), StringComparison.Ordinal);
        Store(1, shiftSeconds: 60, skip: 20);
        var again = await Get("craters?shadow=measured");
        Assert.Equal(13, again.GetProperty("measuredShadow").GetProperty("timings").GetInt32());
        Assert.NotEqual(measured.GetProperty("enlargementPercent").GetDouble(), again.GetProperty("measuredShadow").GetProperty("enlargementPercent").GetDouble());
        Assert.Equal(13, (await Get($"local?{Where}&shadow=measured")).GetProperty("measuredShadow").GetProperty("timings").GetInt32());
        Assert.Equal(13, (await Get("enlargement")).GetProperty("observations").GetInt32());
    }

    [Fact]
    public async Task Reported_danjon_uses_the_median_with_its_spread_and_falls_back_clearly_without_reports()
    {
        factory.Log.Clear();
        var none = (await Get($"photo-plan?{Where}&danjonL=reported")).GetProperty("model");
        Assert.True(none.GetProperty("reported").GetProperty("fellBack").GetBoolean());
        Assert.Equal(0, none.GetProperty("reported").GetProperty("reports").GetInt32());
        Assert.Equal(2.0, none.GetProperty("danjonL").GetDouble()); // the documented default L
        Assert.Contains("No Danjon estimates", none.GetProperty("reported").GetProperty("note").GetString(), StringComparison.Ordinal);

        foreach (var value in new[] { 1.0, 1.5, 1.5, 2.0, 3.5 }) Report(value);
        var some = (await Get($"photo-plan?{Where}&danjonL=reported")).GetProperty("model");
        var reported = some.GetProperty("reported");
        // Median of {1, 1.5, 1.5, 2, 3.5} = 1.5; |x − 1.5| = {0.5, 0, 0, 0.5, 2} has median 0.5, × 1.4826 (Hampel 1974) = 0.74.
        Assert.Equal(1.5, some.GetProperty("danjonL").GetDouble());
        Assert.Equal((5, 1.5, 0.74, 1.0, 3.5, false), (reported.GetProperty("reports").GetInt32(), reported.GetProperty("medianL").GetDouble(),
            reported.GetProperty("spreadL").GetDouble(), reported.GetProperty("lowestL").GetDouble(), reported.GetProperty("highestL").GetDouble(),
            reported.GetProperty("fellBack").GetBoolean()));

        Report(4.0);
        Report(4.0);
        var more = (await Get($"photo-plan?{Where}&danjonL=reported")).GetProperty("model");
        Assert.Equal(2.0, more.GetProperty("danjonL").GetDouble()); // median of seven: the fourth, 2.0
    }

    [Fact]
    public async Task Bad_choices_are_400_problems_naming_the_field()
    {
        await JsonAssert.ProblemNaming(await _client.GetAsync($"/api/v1/eclipses/{Date}/photo-plan?{Where}&danjonL=bright"), "danjonL");
        await JsonAssert.ProblemNaming(await _client.GetAsync($"/api/v1/eclipses/{Date}/photo-plan?{Where}&danjonL=5"), "danjonL");
        // measured is offered only where the log is used; elsewhere it is an unknown model.
        await JsonAssert.ProblemNaming(await _client.GetAsync($"/api/v1/eclipses/{Date}?shadow=measured"), "shadow");
        await JsonAssert.ProblemNaming(await _client.GetAsync($"/api/v1/eclipses/{Date}/craters?shadow=measured&layerKm=80"), "layerKm");
        await JsonAssert.ProblemNaming(await _client.GetAsync($"/api/v1/eclipses/{Date}/enlargement?deltaT=abc"), "deltaT");
    }

    private static DateTimeOffset Instant(JsonElement utc) =>
        DateTimeOffset.Parse(utc.GetString()!, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal);
}
