using System.Net;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Ephemeris;

[Collection("Ephemeris and craters")]
public class EphemerisEndpointTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    // Meeus (1998), Example 47.a: 1992 April 12, 0h TD is 1992-04-11T23:59:01.816Z (TAI − UTC = 26 s then, IERS
    // Bulletin C); α = 134.688470°, δ = +13.768368°, Δ = 368409.7 km (tolerances as in the library tests).
    [Fact]
    public async Task Moon_place_at_Meeus_example_47a_comes_through_the_API()
    {
        var json = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/ephemeris?utc=1992-04-11T23:59:01.816Z"));
        Assert.Equal("1992-04-12T00:00:00.000", json.GetProperty("tt").GetString());
        var moon = json.GetProperty("moon");
        Assert.Equal(134.688470 / 15, moon.GetProperty("rightAscensionHours").GetDouble(), 10.0 / 3600 / 15);
        Assert.Equal(13.768368, moon.GetProperty("declinationDegrees").GetDouble(), 6.0 / 3600);
        Assert.Equal(368409.7, moon.GetProperty("distanceKm").GetDouble(), 5.0);
        Assert.Equal(JsonValueKindNull, moon.GetProperty("distanceAu").ValueKind);
        Assert.True(json.GetProperty("sun").GetProperty("distanceAu").GetDouble() > 0.98);
    }

    private const System.Text.Json.JsonValueKind JsonValueKindNull = System.Text.Json.JsonValueKind.Null;

    [Fact]
    public async Task A_site_adds_topocentric_places_with_altitude_and_azimuth()
    {
        var json = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/ephemeris?utc=2025-03-14T06:58:00Z&lat=-33.9&lon=151.2&elevation=40"));
        var topo = json.GetProperty("moon").GetProperty("topocentric");
        Assert.InRange(topo.GetProperty("altitudeDegrees").GetDouble(), -90, 90);
        Assert.InRange(topo.GetProperty("azimuthDegrees").GetDouble(), 0, 360);
        Assert.True(topo.GetProperty("altitudeDegrees").GetDouble() >= topo.GetProperty("airlessAltitudeDegrees").GetDouble());
    }

    // IERS Conventions (2010): TT = UTC + 37 s + 32.184 s since 2017.
    [Fact]
    public async Task Response_gives_TT_and_delta_T_with_its_uncertainty()
    {
        var json = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/ephemeris?utc=2025-03-14T06:58:00Z"));
        Assert.Equal("2025-03-14T06:58:00.000Z", json.GetProperty("utc").GetString());
        Assert.Equal("2025-03-14T06:59:09.184", json.GetProperty("tt").GetString());
        Assert.Equal("best", json.GetProperty("deltaTModel").GetString());
        Assert.InRange(json.GetProperty("deltaTSeconds").GetDouble(), 68.5, 70.5);
        Assert.True(json.GetProperty("deltaTUncertaintySeconds").GetDouble() > 0);
    }

    [Fact]
    public async Task A_fixed_delta_t_is_used_and_reported()
    {
        var json = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/ephemeris?utc=1500-01-01T00:00:00Z&deltaT=200"));
        Assert.Equal(200, json.GetProperty("deltaTSeconds").GetDouble());
        Assert.Equal("fixed", json.GetProperty("deltaTModel").GetString());
    }

    [Theory]
    [InlineData("", "utc")]
    [InlineData("?utc=yesterday", "utc")]
    [InlineData("?utc=2025-03-14T06:58:00", "utc")]
    [InlineData("?utc=3001-01-01T00:00:00Z", "utc")]
    [InlineData("?utc=2025-03-14T06:58:00Z&lat=91&lon=0", "lat")]
    [InlineData("?utc=2025-03-14T06:58:00Z&lat=NaN&lon=0", "lat")]
    [InlineData("?utc=2025-03-14T06:58:00Z&lat=10&lon=Infinity", "lon")]
    [InlineData("?utc=2025-03-14T06:58:00Z&lat=10", "lon")]
    [InlineData("?utc=2025-03-14T06:58:00Z&lat=10&lon=10&elevation=1e9", "elevation")]
    [InlineData("?utc=2025-03-14T06:58:00Z&deltaT=70&deltaTModel=best", "deltaT")]
    [InlineData("?utc=2025-03-14T06:58:00Z&deltaTModel=magic", "deltaTModel")]
    [InlineData("?utc=2025-03-14T06:58:00Z&deltaT=1e300", "deltaT")]
    public async Task Bad_input_gets_a_problem_response_naming_the_field(string query, string field)
    {
        var problem = await JsonAssert.ProblemNaming(await _client.GetAsync("/api/v1/ephemeris" + query), field);
        Assert.Contains(field, problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_OpenAPI_document_describes_the_endpoint_and_its_units()
    {
        var response = await _client.GetAsync("/openapi/v1.json");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var text = await response.Content.ReadAsStringAsync();
        Assert.Contains("/api/v1/ephemeris", text, StringComparison.Ordinal);
        Assert.Contains("−90 to 90", text, StringComparison.Ordinal);
        Assert.Equal(HttpStatusCode.OK, (await _client.GetAsync("/docs/index.html")).StatusCode);
    }

    // Meeus (1998), Example 53.a, 1992 April 12, 0h TD (= 1992-04-11T23:59:01.816Z, as in Example 47.a's test):
    // l = −1.23°, b = +4.20°, P = 15.08°, sub-solar l0 = 67.90°, b0 = +1.46° (printed to 0.01°).
    [Fact]
    public async Task Libration_and_axis_at_Meeus_example_53a_come_through_the_API()
    {
        var moon = (await JsonAssert.OkJson(await _client.GetAsync("/api/v1/ephemeris?utc=1992-04-11T23:59:01.816Z"))).GetProperty("moon");
        var libration = moon.GetProperty("libration");
        Assert.Equal(-1.23, libration.GetProperty("longitudeDegrees").GetDouble(), 0.008);
        Assert.Equal(4.20, libration.GetProperty("latitudeDegrees").GetDouble(), 0.008);
        Assert.Equal(15.08, moon.GetProperty("axisPositionAngleDegrees").GetDouble(), 0.008);
        Assert.Equal(67.90, moon.GetProperty("subSolarPoint").GetProperty("longitudeDegrees").GetDouble(), 0.008);
        Assert.Equal(1.46, moon.GetProperty("subSolarPoint").GetProperty("latitudeDegrees").GetDouble(), 0.008);
        Assert.False(moon.TryGetProperty("topocentric", out var topo) && topo.ValueKind != System.Text.Json.JsonValueKind.Null);
    }

    // Meeus (1998), ch. 53 ("topocentric librations"): the parallax of up to 1° shifts the libration seen from a site by
    // up to about 1° from the geocentric one; on the Moon's meridian at mid-latitude the shift is mostly in latitude.
    [Fact]
    public async Task A_site_adds_topocentric_libration_and_axis_within_a_degree_of_the_geocentric_ones()
    {
        var sun = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/ephemeris?utc=2025-03-14T06:58:00Z&lat=47.07&lon=15.44&elevation=380"));
        var moon = sun.GetProperty("moon");
        var topo = moon.GetProperty("topocentric");
        var dl = topo.GetProperty("libration").GetProperty("longitudeDegrees").GetDouble() - moon.GetProperty("libration").GetProperty("longitudeDegrees").GetDouble();
        var db = topo.GetProperty("libration").GetProperty("latitudeDegrees").GetDouble() - moon.GetProperty("libration").GetProperty("latitudeDegrees").GetDouble();
        Assert.InRange(Math.Sqrt(dl * dl + db * db), 0.05, 1.05);
        var dp = topo.GetProperty("axisPositionAngleDegrees").GetDouble() - moon.GetProperty("axisPositionAngleDegrees").GetDouble();
        Assert.InRange(Math.Abs(dp), 0, 1.5);
        Assert.False(sun.GetProperty("sun").TryGetProperty("libration", out var none) && none.ValueKind != System.Text.Json.JsonValueKind.Null);
    }
}
