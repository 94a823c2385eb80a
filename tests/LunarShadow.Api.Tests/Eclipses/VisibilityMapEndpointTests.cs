using System.Globalization;
using System.Net;
using System.Text.Json;
using LunarShadow.Api.Tests.Support;
using NetTopologySuite.Geometries;

namespace LunarShadow.Api.Tests.Eclipses;

public class VisibilityMapEndpointTests(UnthrottledApiFactory factory) : IClassFixture<UnthrottledApiFactory>
{
    private static readonly GeometryFactory Geometry = new();
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

    // Invariant (common practice for a simplified outline): a place where the Moon stands clearly above the horizon
    // (> 2°, about two cells of margin against the 0.75° simplification and the spherical-Earth model) lies inside the
    // region "Moon up at greatest eclipse"; one clearly below (< −2°) lies outside. Altitudes come from /ephemeris
    // (topocentric, refracted), a computation independent of the map's grid.
    [Theory]
    [InlineData("2025-03-14")]
    [InlineData("2029-12-20")]
    [InlineData("2022-11-08")]
    [InlineData("2155-09-11")]
    public async Task Outlines_are_valid_smooth_polygons_that_agree_with_the_Moons_altitude(string date)
    {
        var map = await JsonAssert.OkJson(await _client.GetAsync($"/api/v1/eclipses/{date}/visibility-map"));
        var features = map.GetProperty("features").EnumerateArray().ToList();
        foreach (var feature in features)
        {
            var region = ToGeometry(feature);
            Assert.True(region.IsValid, $"{date} {Name(feature)} is not a valid polygon");
            var (edges, stairs) = (0, 0);
            foreach (var ring in Rings(feature))
            {
                for (var i = 1; i < ring.Length; i++)
                {
                    edges++;
                    var (dx, dy) = (Math.Abs(ring[i].X - ring[i - 1].X), Math.Abs(ring[i].Y - ring[i - 1].Y));
                    var onEdgeOfMap = (Math.Abs(ring[i].X) == 180 && ring[i].X == ring[i - 1].X) || (Math.Abs(ring[i].Y) == 90 && ring[i].Y == ring[i - 1].Y);
                    if (!onEdgeOfMap && ((dx == 0 && dy <= 1) || (dy == 0 && dx <= 1))) stairs++;
                }
            }
            // A 1° staircase is all axis-parallel unit steps; the smoothed outline is mostly slanted.
            Assert.True(stairs < edges / 2, $"{date} {Name(feature)}: {stairs} of {edges} edges are unit staircase steps");
        }

        var greatest = features.Single(f => Name(f) == "greatest");
        var utc = greatest.GetProperty("properties").GetProperty("utc").GetString()!;
        var up = ToGeometry(greatest);
        var checkedPoints = 0;
        for (var lat = -75; lat <= 75; lat += 15)
        {
            for (var lon = -180; lon < 180; lon += 20)
            {
                var q = string.Create(CultureInfo.InvariantCulture, $"/api/v1/ephemeris?utc={utc}&lat={lat}&lon={lon}");
                var altitude = (await JsonAssert.OkJson(await _client.GetAsync(q))).GetProperty("moon").GetProperty("topocentric").GetProperty("altitudeDegrees").GetDouble();
                if (Math.Abs(altitude) < 2) continue;
                var inside = up.Covers(Geometry.CreatePoint(new Coordinate(lon, lat)));
                Assert.True(inside == altitude > 0, $"{date}: at {lat}, {lon} the Moon is {altitude:F1}° high but the map says {(inside ? "up" : "down")}");
                checkedPoints++;
            }
        }
        Assert.True(checkedPoints > 150);
    }

    private static string Name(JsonElement feature) => feature.GetProperty("properties").GetProperty("name").GetString()!;

    private static IEnumerable<Coordinate[]> Rings(JsonElement feature) =>
        feature.GetProperty("geometry").GetProperty("coordinates").EnumerateArray()
            .SelectMany(p => p.EnumerateArray())
            .Select(r => r.EnumerateArray().Select(c => new Coordinate(c[0].GetDouble(), c[1].GetDouble())).ToArray());

    private static MultiPolygon ToGeometry(JsonElement feature)
    {
        var polygons = feature.GetProperty("geometry").GetProperty("coordinates").EnumerateArray().Select(p =>
        {
            var rings = p.EnumerateArray().Select(r => Geometry.CreateLinearRing(r.EnumerateArray().Select(c => new Coordinate(c[0].GetDouble(), c[1].GetDouble())).ToArray())).ToList();
            return Geometry.CreatePolygon(rings[0], rings.Skip(1).ToArray());
        }).ToArray();
        return Geometry.CreateMultiPolygon(polygons);
    }
}
