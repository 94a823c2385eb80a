using System.Net;
using System.Net.Http.Headers;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Eclipses;

public class EclipseEndpointTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    // Five Millennium Canon of Lunar Eclipses (Espenak & Meeus 2009): 2022 Nov 08, total, gamma 0.2570, umbral magnitude
    // 1.3589, Saros 136; greatest eclipse 11:00:22 TD. NASA predictions (Espenak): P1 08:02:17 UT with ΔT 73 s.
    [Fact]
    public async Task One_eclipse_comes_in_full_with_the_agreed_field_names()
    {
        var e = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2022-11-08?deltaT=73"));
        Assert.Equal("2022-11-08", e.GetProperty("date").GetString());
        Assert.Equal("total", e.GetProperty("kind").GetString());
        Assert.Equal(0.2570, e.GetProperty("gamma").GetDouble(), 0.0005);
        Assert.Equal(1.3589, e.GetProperty("umbralMagnitude").GetDouble(), 0.001);
        Assert.Equal(136, e.GetProperty("saros").GetProperty("series").GetInt32());
        Assert.StartsWith("2022-11-08T11:00:2", e.GetProperty("greatestEclipse").GetProperty("tt").GetString(), StringComparison.Ordinal);
        Assert.EndsWith("Z", e.GetProperty("greatestEclipse").GetProperty("utc").GetString(), StringComparison.Ordinal);
        Assert.Equal(73, e.GetProperty("deltaTSeconds").GetDouble());
        var contacts = e.GetProperty("contacts").EnumerateArray().ToList();
        Assert.Equal(["P1", "U1", "U2", "U3", "U4", "P4"], contacts.Select(c => c.GetProperty("name").GetString()));
        Assert.StartsWith("2022-11-08T08:02:1", contacts[0].GetProperty("utc").GetString(), StringComparison.Ordinal);
        // Meeus (1998), ch. 54 geometry: the Moon moves east through the shadow, so at P1 the contact lies on its eastern
        // limb, at 90° + asin(γ/(ρ☉ + s☾)) ≈ 90° + asin(0.257/1.56) ≈ 99°, tilted by the path's inclination to the
        // celestial equator (under 20° here, the ecliptic and the orbit both within 30° of it near the node).
        Assert.InRange(contacts[0].GetProperty("positionAngleDegrees").GetDouble(), 70, 130);
        Assert.True(e.GetProperty("durations").GetProperty("totalMinutes").GetDouble() > 80);
        Assert.Equal("danjon", e.GetProperty("shadowModel").GetString());
    }

    // Five Millennium Canon: 2023 May 05 is penumbral, so partial and total durations do not occur.
    [Fact]
    public async Task Phases_that_do_not_occur_are_null()
    {
        var e = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2023-05-05"));
        Assert.Equal("penumbral", e.GetProperty("kind").GetString());
        Assert.Equal(System.Text.Json.JsonValueKind.Null, e.GetProperty("durations").GetProperty("totalMinutes").ValueKind);
        Assert.Equal(2, e.GetProperty("contacts").GetArrayLength());
    }

    // Five Millennium Canon: in 2025–2026 four eclipses, 2025 Mar 14 (T), 2025 Sep 07 (T), 2026 Mar 03 (T), 2026 Aug 28 (P).
    [Fact]
    public async Task A_range_lists_its_eclipses_in_order_and_filters_by_kind()
    {
        var list = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses?from=2025-01-01&to=2026-12-31"));
        Assert.Equal(["2025-03-14", "2025-09-07", "2026-03-03", "2026-08-28"], list.GetProperty("eclipses").EnumerateArray().Select(e => e.GetProperty("date").GetString()));
        Assert.Equal("danjon", list.GetProperty("shadowModel").GetString());
        Assert.Equal("best", list.GetProperty("deltaTModel").GetString());
        var partial = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses?from=2025-01-01&to=2026-12-31&kind=partial"));
        Assert.Equal(1, partial.GetProperty("count").GetInt32());
    }

    [Fact]
    public async Task Csv_comes_on_request_by_header_or_query()
    {
        var request = new HttpRequestMessage(HttpMethod.Get, "/api/v1/eclipses?from=2025-01-01&to=2025-12-31");
        request.Headers.Accept.Add(new MediaTypeWithQualityHeaderValue("text/csv"));
        var response = await _client.SendAsync(request);
        Assert.Equal("text/csv", response.Content.Headers.ContentType?.MediaType);
        var lines = (await response.Content.ReadAsStringAsync()).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith("date,kind,greatest_utc", lines[0], StringComparison.Ordinal);
        Assert.Equal(3, lines.Length);
        var byQuery = await _client.GetAsync("/api/v1/eclipses/2025-03-14?format=csv");
        Assert.Equal("text/csv", byQuery.Content.Headers.ContentType?.MediaType);
    }

    [Fact]
    public async Task The_shadow_model_is_chosen_and_reported()
    {
        // NASA's earlier catalogue (Espenak), Chauvenet rule: 2022 Nov 08 umbral magnitude 1.363.
        var chauvenet = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2022-11-08?shadow=chauvenet"));
        Assert.Equal("chauvenet", chauvenet.GetProperty("shadowModel").GetString());
        Assert.Equal(1.363, chauvenet.GetProperty("umbralMagnitude").GetDouble(), 0.0015);
        var layer = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2022-11-08?shadow=layer&layerKm=60"));
        Assert.Equal("layer", layer.GetProperty("shadowModel").GetString());
        Assert.Equal(60, layer.GetProperty("layerKm").GetDouble());
    }

    // Five Millennium Canon: −1999 Jun 26 (Julian calendar), Saros 17; ΔT uncertainty there is over a quarter of an hour
    // (HM Nautical Almanac Office table: ±1080 s at −2000).
    [Fact]
    public async Task Ancient_dates_use_the_julian_calendar_and_state_their_uncertainty()
    {
        var e = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/-1999-06-26"));
        Assert.Equal(17, e.GetProperty("saros").GetProperty("series").GetInt32());
        Assert.StartsWith("-1999-06-26T", e.GetProperty("greatestEclipse").GetProperty("tt").GetString(), StringComparison.Ordinal);
        Assert.True(e.GetProperty("greatestEclipse").GetProperty("uncertaintySeconds").GetDouble() > 900);
    }

    [Fact]
    public async Task A_date_without_an_eclipse_is_404()
    {
        var response = await _client.GetAsync("/api/v1/eclipses/2025-03-15");
        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
    }

    [Fact]
    public async Task An_unsupported_representation_is_406()
    {
        var request = new HttpRequestMessage(HttpMethod.Get, "/api/v1/eclipses/2025-03-14");
        request.Headers.Accept.Add(new MediaTypeWithQualityHeaderValue("application/xml"));
        Assert.Equal(HttpStatusCode.NotAcceptable, (await _client.SendAsync(request)).StatusCode);
    }

    [Theory]
    [InlineData("/api/v1/eclipses?to=2025-01-01", "from")]
    [InlineData("/api/v1/eclipses?from=2025-01-01", "to")]
    [InlineData("/api/v1/eclipses?from=2025-02-30&to=2026-01-01", "from")]
    [InlineData("/api/v1/eclipses?from=1582-10-10&to=1583-01-01", "from")]
    [InlineData("/api/v1/eclipses?from=2026-01-01&to=2025-01-01", "to")]
    [InlineData("/api/v1/eclipses?from=0001-01-01&to=1500-01-01", "to")]
    [InlineData("/api/v1/eclipses?from=-2500-01-01&to=-2000-01-01", "from")]
    [InlineData("/api/v1/eclipses?from=2025-01-01&to=2026-01-01&kind=annular", "kind")]
    [InlineData("/api/v1/eclipses?from=2025-01-01&to=2026-01-01&shadow=fuzzy", "shadow")]
    [InlineData("/api/v1/eclipses?from=2025-01-01&to=2026-01-01&shadow=layer&layerKm=-5", "layerKm")]
    [InlineData("/api/v1/eclipses?from=2025-01-01&to=2026-01-01&layerKm=90", "layerKm")]
    [InlineData("/api/v1/eclipses?from=2025-01-01&to=2026-01-01&format=xml", "format")]
    [InlineData("/api/v1/eclipses/2025-13-01", "date")]
    [InlineData("/api/v1/eclipses/yesterday", "date")]
    [InlineData("/api/v1/eclipses/2025-03-14?deltaT=abc", "deltaT")]
    public async Task Bad_input_gets_a_problem_response_naming_the_field(string url, string field)
    {
        await JsonAssert.ProblemNaming(await _client.GetAsync(url), field);
    }

    [Fact]
    public async Task The_OpenAPI_document_names_every_parameter_in_camel_case_with_its_range()
    {
        var doc = await JsonAssert.OkJson(await _client.GetAsync("/openapi/v1.json"));
        foreach (var path in new[] { "/api/v1/eclipses", "/api/v1/eclipses/{date}/local", "/api/v1/sites/upcoming" })
        {
            var parameters = doc.GetProperty("paths").GetProperty(path).GetProperty("get").GetProperty("parameters").EnumerateArray().ToList();
            Assert.Contains(parameters, p => p.GetProperty("name").GetString() == "shadow" && p.GetProperty("description").GetString()!.Contains("danjon", StringComparison.Ordinal));
            Assert.Contains(parameters, p => p.GetProperty("name").GetString() == "deltaTModel");
            Assert.All(parameters, p => Assert.False(string.IsNullOrEmpty(p.GetProperty("description").GetString())));
            Assert.All(parameters, p => Assert.True(char.IsLower(p.GetProperty("name").GetString()![0])));
        }
    }

    // Five Millennium Canon: 2025 March 14, gamma 0.3484 (north of the axis) — at greatest eclipse the Moon's centre is
    // gamma Earth radii from the axis: gamma × the Moon's horizontal parallax (0.91° that night) ≈ 0.317°, on the north side.
    [Fact]
    public async Task The_shadow_diagram_traces_the_moon_through_the_shadow()
    {
        var e = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/2025-03-14"));
        var d = e.GetProperty("shadowDiagram");
        Assert.InRange(d.GetProperty("umbraRadiusDegrees").GetDouble(), 0.6, 0.8);
        var points = d.GetProperty("points").EnumerateArray().ToList();
        Assert.Equal(["P1", "U1", "U2", "greatest", "U3", "U4", "P4"], points.Select(p => p.GetProperty("name").GetString()));
        var greatest = points[3];
        Assert.True(greatest.GetProperty("northDegrees").GetDouble() > 0);
        var least = Math.Sqrt(Math.Pow(greatest.GetProperty("eastDegrees").GetDouble(), 2) + Math.Pow(greatest.GetProperty("northDegrees").GetDouble(), 2));
        var parallax = e.GetProperty("moonAtGreatest").GetProperty("semiDiameterArcsec").GetDouble() / 3600 / 0.2725076;
        Assert.Equal(0.3484 * parallax, least, 0.003);
        var p1 = points[0];
        var distance = Math.Sqrt(Math.Pow(p1.GetProperty("eastDegrees").GetDouble(), 2) + Math.Pow(p1.GetProperty("northDegrees").GetDouble(), 2));
        Assert.Equal(d.GetProperty("penumbraRadiusDegrees").GetDouble() + d.GetProperty("moonRadiusDegrees").GetDouble(), distance, 0.01);
    }

    [Fact]
    public async Task The_OpenAPI_document_describes_utc_as_date_time_and_tt_as_terrestrial_time()
    {
        var doc = await JsonAssert.OkJson(await _client.GetAsync("/openapi/v1.json"));
        var instant = doc.GetProperty("components").GetProperty("schemas").GetProperty("InstantResponse").GetProperty("properties");
        Assert.Equal("date-time", instant.GetProperty("utc").GetProperty("format").GetString());
        Assert.Contains("Terrestrial Time", instant.GetProperty("tt").GetProperty("description").GetString(), StringComparison.Ordinal);
        var contact = doc.GetProperty("components").GetProperty("schemas").GetProperty("LocalContactResponse").GetProperty("properties");
        Assert.Equal("date-time", contact.GetProperty("local").GetProperty("format").GetString());
    }
}
