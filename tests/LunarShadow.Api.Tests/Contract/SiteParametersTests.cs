using System.Text;
using System.Text.Json;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Contract;

/// <summary>Every per-site endpoint and every JSON body reads a site with the same fields and the same rules.</summary>
public class SiteParametersTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    // London on the morning of 2025 March 14: the Moon sets during the partial phase (moonset 06:22:55 UTC by
    // astronomy-engine 2.1.19, tools/reference-values/moon-rise-set.mjs), so refraction decides how much is seen.
    private const string London = "lat=51.5&lon=-0.12&tz=Europe/London";

    private static StringContent Json(string body) => new(body, Encoding.UTF8, "application/json");

    [Theory]
    [InlineData("/api/v1/eclipses/2025-03-14/local?")]
    [InlineData("/api/v1/eclipses/2025-03-14/photo-plan?")]
    [InlineData("/api/v1/sites/upcoming?from=2025-03-01&")]
    public async Task Impossible_air_is_refused_by_every_per_site_GET(string endpoint)
    {
        var problem = await JsonAssert.ProblemNaming(await _client.GetAsync(endpoint + London + "&pressure=5000&temperature=99"), "pressure");
        Assert.True(problem.GetProperty("errors").TryGetProperty("temperature", out _));
        Assert.Contains("from 0 to 1200 hPa; got 5000", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Impossible_air_is_refused_in_every_JSON_body()
    {
        await JsonAssert.ProblemNaming(await _client.PostAsync("/api/v1/eclipses/2025-03-14/photo-plan",
            Json("""{"lat":51.5,"lon":-0.12,"pressure":5000}""")), "pressure");
        await JsonAssert.ProblemNaming(await _client.PostAsync("/api/v1/eclipses/2025-03-14/local",
            Json("""{"sites":[{"lat":51.5,"lon":-0.12},{"lat":51.5,"lon":-0.12,"pressure":5000}]}""")), "sites[1].pressure");
    }

    // Refraction lifts the Moon by about 34′ at the horizon and 5′ at 10° (Sæmundsson 1986, via Meeus, Astronomical
    // Algorithms, 2nd ed., ch. 16; about 1.7′ at 30°): with no air (pressure 0) every altitude is lower, by 0.01° to 0.6°.
    [Fact]
    public async Task Air_conditions_change_the_photo_plan()
    {
        var standard = Altitudes(await JsonAssert.OkJson(await _client.GetAsync($"/api/v1/eclipses/2025-03-14/photo-plan?{London}")));
        var airless = Altitudes(await JsonAssert.OkJson(await _client.GetAsync($"/api/v1/eclipses/2025-03-14/photo-plan?{London}&pressure=0")));
        var common = standard.Keys.Intersect(airless.Keys).Where(k => standard[k] > 1).ToList();
        Assert.NotEmpty(common);
        Assert.All(common, k => Assert.InRange(standard[k] - airless[k], 0.01, 0.6));
    }

    [Fact]
    public async Task Air_conditions_change_what_upcoming_counts()
    {
        async Task<double> Minutes(string air) =>
            (await JsonAssert.OkJson(await _client.GetAsync($"/api/v1/sites/upcoming?{London}&from=2025-03-01&count=1{air}")))
            .GetProperty("eclipses")[0].GetProperty("qualifyingMinutes").GetDouble();
        Assert.True(await Minutes("&pressure=0") < await Minutes(""), "without refraction the Moon sets earlier, so less of the eclipse counts");
    }

    [Fact]
    public async Task A_site_in_a_batch_body_is_read_exactly_like_the_query_string()
    {
        const string query = "lat=47.07&lon=15.44&elevation=380&tz=Europe/Vienna&minAltitude=3&horizon=90:5,180:12&pressure=960&temperature=-2&name=Kestrel%20Ridge&open=04:00-08:00";
        var single = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2025-03-14/local?" + query));
        var batch = await JsonAssert.OkJson(await _client.PostAsync("/api/v1/eclipses/2025-03-14/local", Json("""
            {"sites":[{"lat":47.07,"lon":15.44,"elevation":380,"tz":"Europe/Vienna","minAltitude":3,"horizon":[[90,5],[180,12]],
                       "pressure":960,"temperature":-2,"name":"Kestrel Ridge","open":"04:00-08:00"}]}
            """)));
        Assert.Equal(single.GetRawText(), batch.GetProperty("sites")[0].GetRawText());
        Assert.NotEqual(JsonValueKind.Null, single.GetProperty("publicNight").ValueKind);
    }

    private static Dictionary<string, double> Altitudes(JsonElement plan) => plan.GetProperty("timeline").EnumerateArray()
        .ToDictionary(r => r.GetProperty("utc").GetString()!, r => r.GetProperty("moonAltitudeDegrees").GetDouble());
}
