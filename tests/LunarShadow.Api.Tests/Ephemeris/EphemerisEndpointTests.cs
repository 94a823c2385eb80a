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

    // Meeus (1998), ch. 54: at greatest eclipse the Moon's centre lies |gamma| Earth radii (0.35 for 2025 March 14,
    // Five Millennium Canon) from the shadow axis, which points at the antisolar point; seen from a site, parallax moves
    // the Moon by at most its horizontal parallax (0.95°). So the Moon's airless altitude is minus the Sun's to within
    // 0.35·0.95° + 0.95° ≈ 1.3°, and their azimuths are opposite to within 1.3°/cos(altitude).
    [Fact]
    public async Task At_greatest_eclipse_the_Moon_stands_opposite_the_Sun_in_the_site_sky()
    {
        var json = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/ephemeris?utc=2025-03-14T06:58:00Z&lat=-33.9&lon=151.2&elevation=40"));
        var moon = json.GetProperty("moon").GetProperty("topocentric");
        var sun = json.GetProperty("sun").GetProperty("topocentric");
        var moonAltitude = moon.GetProperty("airlessAltitudeDegrees").GetDouble();
        var sunAltitude = sun.GetProperty("airlessAltitudeDegrees").GetDouble();
        Assert.InRange(moonAltitude + sunAltitude, -1.3, 1.3);
        var opposite = (moon.GetProperty("azimuthDegrees").GetDouble() - sun.GetProperty("azimuthDegrees").GetDouble() + 360) % 360;
        Assert.InRange(opposite, 180 - 1.3 / Math.Cos(moonAltitude * Math.PI / 180), 180 + 1.3 / Math.Cos(moonAltitude * Math.PI / 180));
        Assert.True(moon.GetProperty("altitudeDegrees").GetDouble() >= moonAltitude);
    }

    // Sæmundsson (1986), Sky & Telescope 72, 70 (Meeus 1998, eq. 16.4): R = 1.02′ / tan(h + 10.3/(h + 5.11)) for a true
    // altitude h in degrees at 1010 hPa and 10 °C (29.0′ at h = 0, 11.2′ at 4°). Far below the horizon no air lies
    // between the body and the observer's line of sight, so the airless altitude is reported unchanged (common practice;
    // the library tapers refraction to zero between −2° and −5°). Equinox sunset on the equator at 0° longitude
    // (2025 March 20, about 18:08 UTC) walks the Sun through both regimes.
    [Fact]
    public async Task Refraction_follows_Saemundsson_near_the_horizon_and_stops_far_below_it()
    {
        var nearHorizon = 0;
        var farBelow = 0;
        for (var minute = 0; minute <= 120; minute += 10)
        {
            var utc = new DateTime(2025, 3, 20, 17, 30, 0, DateTimeKind.Utc).AddMinutes(minute).ToString("yyyy-MM-ddTHH:mm:ssZ", System.Globalization.CultureInfo.InvariantCulture);
            var json = await JsonAssert.OkJson(await _client.GetAsync($"/api/v1/ephemeris?utc={utc}&lat=0&lon=0&elevation=0"));
            var sun = json.GetProperty("sun").GetProperty("topocentric");
            var airless = sun.GetProperty("airlessAltitudeDegrees").GetDouble();
            var apparent = sun.GetProperty("altitudeDegrees").GetDouble();
            if (airless >= 0)
            {
                var expectedArcmin = 1.02 / Math.Tan((airless + 10.3 / (airless + 5.11)) * Math.PI / 180);
                Assert.Equal(expectedArcmin, (apparent - airless) * 60, 0.1);
                nearHorizon++;
            }
            else if (airless <= -5)
            {
                Assert.Equal(airless, apparent, 6);
                farBelow++;
            }
        }
        Assert.True(nearHorizon >= 2 && farBelow >= 2, $"{nearHorizon} samples near the horizon, {farBelow} far below");
        // Full Moon of 2025 March 14 at 12:00 UTC: the Moon is near the nadir of (0°, 0°) and the Sun near the zenith.
        var noon = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/ephemeris?utc=2025-03-14T12:00:00Z&lat=0&lon=0&elevation=0"));
        var moon = noon.GetProperty("moon").GetProperty("topocentric");
        Assert.True(moon.GetProperty("airlessAltitudeDegrees").GetDouble() < -60);
        Assert.Equal(moon.GetProperty("airlessAltitudeDegrees").GetDouble(), moon.GetProperty("altitudeDegrees").GetDouble(), 6);
    }

    // IERS Conventions (2010): TT = UTC + 37 s + 32.184 s since 2017. IERS Bulletin A of March 2025 gave UT1 − UTC ≈
    // +0.05 s (from memory), so the measured ΔT = 32.184 + 37 − 0.05 ≈ 69.13 s; the model's forecast (its data end in
    // 2023 May) must contain it within its stated one-sigma, and that sigma must stay that of a two-year forecast (< 3 s).
    [Fact]
    public async Task Response_gives_TT_and_delta_T_with_its_uncertainty()
    {
        var json = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/ephemeris?utc=2025-03-14T06:58:00Z"));
        Assert.Equal("2025-03-14T06:58:00.000Z", json.GetProperty("utc").GetString());
        Assert.Equal("2025-03-14T06:59:09.184", json.GetProperty("tt").GetString());
        Assert.Equal("best", json.GetProperty("deltaTModel").GetString());
        var sigma = json.GetProperty("deltaTUncertaintySeconds").GetDouble();
        Assert.InRange(sigma, 0.2, 3.0);
        Assert.InRange(json.GetProperty("deltaTSeconds").GetDouble(), 69.13 - sigma, 69.13 + sigma);
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
