using System.Net;
using System.Text.Json;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Eclipses;

public class VisibilityMapEndpointTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    // RFC 7946: a FeatureCollection of Features whose MultiPolygon rings are closed, [longitude, latitude], within range,
    // exterior rings counterclockwise.
    [Fact]
    public async Task The_map_is_valid_GeoJSON_with_a_region_per_contact_and_the_whole_eclipse()
    {
        var response = await _client.GetAsync("/api/v1/eclipses/2025-03-14/visibility-map");
        Assert.Equal("application/geo+json", response.Content.Headers.ContentType?.MediaType);
        var doc = JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement;
        Assert.Equal("FeatureCollection", doc.GetProperty("type").GetString());
        var names = doc.GetProperty("features").EnumerateArray().Select(f => f.GetProperty("properties").GetProperty("name").GetString()).ToList();
        Assert.Equal(["P1", "U1", "U2", "greatest", "U3", "U4", "P4", "whole-eclipse", "whole-totality"], names);
        foreach (var feature in doc.GetProperty("features").EnumerateArray())
        {
            Assert.Equal("Feature", feature.GetProperty("type").GetString());
            Assert.Equal("MultiPolygon", feature.GetProperty("geometry").GetProperty("type").GetString());
            foreach (var polygon in feature.GetProperty("geometry").GetProperty("coordinates").EnumerateArray())
            {
                var ring = polygon[0].EnumerateArray().Select(p => (Lon: p[0].GetDouble(), Lat: p[1].GetDouble())).ToList();
                Assert.Equal(ring[0], ring[^1]);
                Assert.All(ring, p => Assert.True(p.Lon is >= -180 and <= 180 && p.Lat is >= -90 and <= 90));
                var area = 0.0;
                for (var i = 1; i < ring.Count; i++) area += (ring[i - 1].Lon * ring[i].Lat) - (ring[i].Lon * ring[i - 1].Lat);
                Assert.True(area > 0, "exterior ring must be counterclockwise");
            }
        }
    }

    [Fact]
    public async Task A_date_without_an_eclipse_is_404_and_bad_formats_are_refused()
    {
        Assert.Equal(HttpStatusCode.NotFound, (await _client.GetAsync("/api/v1/eclipses/2025-03-15/visibility-map")).StatusCode);
        await JsonAssert.ProblemNaming(await _client.GetAsync("/api/v1/eclipses/2025-03-14/visibility-map?format=csv"), "format");
    }
}
