using System.Net;
using System.Text;
using LunarShadow.Api.Tests.Support;
using Xunit.Abstractions;

namespace LunarShadow.Api.Tests.Sweep;

/// <summary>
/// The same invariants through HTTP for a sample that touches every endpoint and every format: the total eclipses that
/// once answered 500 (2029-12-20, 2028-12-31, 2029-06-26, 2025-09-07, 2026-03-03; Five Millennium Canon dates), a
/// partial and a penumbral one, at sites with half- and quarter-hour zones, a sea horizon and opening hours.
/// </summary>
public class HttpSampleSweep(ApiFactory factory, ITestOutputHelper output) : IClassFixture<ApiFactory>
{
    private static readonly string[] Dates = ["2029-12-20", "2028-12-31", "2029-06-26", "2025-09-07", "2026-03-03", "2023-10-28", "2024-03-25"];

    private static readonly string[] Sites =
    [
        "lat=47.3&lon=8.2&elevation=550&tz=Europe/Zurich",
        "lat=0&lon=11.42&tz=Africa/Libreville",
        "lat=-43.95&lon=-176.55&elevation=30&tz=Pacific/Chatham&horizon=sea",
        "lat=27.7&lon=85.3&elevation=1400&tz=Asia/Kathmandu&open=19:00-23:30",
        "lat=-34.9&lon=138.6&tz=Australia/Adelaide&horizon=90:5,180:12",
        "lat=70&lon=23&tz=Europe/Oslo&minAltitude=5",
    ];

    private const string CameraA = "sensor=23.5x15.6&pixels=6000&focalLength=400&aperture=5.6&iso=800";
    private const string CameraB = "sensor=36x24&pixelPitch=4.3&focalLength=600&teleconverter=1.4&aperture=6.3&iso=1600&fastestShutter=0.00025&slowestShutter=15";

    [Fact]
    public async Task Every_endpoint_and_format_answers_a_sample_of_eclipses_and_sites()
    {
        // Correctness, not speed: no rate limit, and no request timeout cutting off the cold 200-year list on a busy machine.
        var client = factory.WithWebHostBuilder(b => b.UseSetting("RateLimiting:PermitsPerSecond", "1000000").UseSetting("RateLimiting:Burst", "1000000")
            .UseSetting("RequestTimeoutSeconds", "600")).CreateClient();
        var requests = new List<(string Url, string Format, HttpContent? Body)>
        {
            ("/api/v1/eclipses?from=1900-01-01&to=2100-12-31", "json", null),
            ("/api/v1/eclipses?from=1900-01-01&to=2100-12-31&format=csv", "csv", null),
            ("/api/v1/ephemeris?utc=2029-12-20T22:42:00Z&lat=47.3&lon=8.2&elevation=550", "json", null),
        };
        foreach (var date in Dates)
        {
            requests.Add(($"/api/v1/eclipses/{date}", "json", null));
            requests.Add(($"/api/v1/eclipses/{date}/visibility-map", "geojson", null));
            requests.Add(($"/api/v1/eclipses/{date}/visibility-map?format=json", "geojson", null));
            requests.Add(($"/api/v1/eclipses/{date}/local", "json", Json("{\"sites\":[{\"lat\":47.3,\"lon\":8.2,\"tz\":\"Europe/Zurich\"},{\"lat\":-43.95,\"lon\":-176.55,\"tz\":\"Pacific/Chatham\",\"horizon\":\"sea\"}]}")));
            requests.Add(($"/api/v1/eclipses/{date}/local?format=csv", "csv", Json("{\"sites\":[{\"lat\":27.7,\"lon\":85.3,\"tz\":\"Asia/Kathmandu\",\"open\":\"19:00-23:30\"}]}")));
            foreach (var site in Sites)
            {
                foreach (var format in new[] { "json", "csv", "ics" })
                    requests.Add(($"/api/v1/eclipses/{date}/local?{site}&format={format}", format, null));
                foreach (var (camera, mount) in new[] { (CameraA, "fixed"), (CameraB, "sidereal"), (CameraA, "lunar") })
                    foreach (var format in new[] { "json", "csv", "ics", "sequence" })
                        requests.Add(($"/api/v1/eclipses/{date}/photo-plan?{site}&{camera}&mount={mount}&format={format}", format, null));
            }
            requests.Add(($"/api/v1/eclipses/{date}/photo-plan", "json", Json("{\"lat\":47.3,\"lon\":8.2,\"elevation\":550,\"tz\":\"Europe/Zurich\",\"focalLength\":400,\"aperture\":5.6,\"iso\":800,\"mount\":\"fixed\"}")));
        }
        foreach (var site in Sites)
            foreach (var format in new[] { "json", "csv", "ics" })
                requests.Add(($"/api/v1/sites/upcoming?{site}&from=1900-01-01&count=50&format={format}", format, null));

        var failures = new List<string>();
        foreach (var (url, format, body) in requests)
        {
            try
            {
                using var response = body is null ? await client.GetAsync(url) : await client.PostAsync(url, body);
                var text = await response.Content.ReadAsStringAsync();
                SweepChecks.Require(response.StatusCode == HttpStatusCode.OK, $"{(int)response.StatusCode}: {text[..Math.Min(300, text.Length)]}");
                switch (format)
                {
                    case "csv": Readers.Csv(text); break;
                    case "ics": Readers.Calendar(text); break;
                    case "geojson": Readers.GeoJson(text); break;
                    default:
                        // RFC 8259: a JSON number cannot be NaN or infinite; the body parses and no number is null in its place.
                        using (var doc = System.Text.Json.JsonDocument.Parse(text)) SweepChecks.Require(doc.RootElement.ValueKind != System.Text.Json.JsonValueKind.Undefined, "empty JSON");
                        break;
                }
            }
            catch (Exception ex) when (ex is SweepFailure or InvalidDataException or System.Text.Json.JsonException or FormatException)
            {
                failures.Add($"{url}: {ex.Message}");
            }
        }
        output.WriteLine($"HTTP sample: {requests.Count} requests, {failures.Count} failures.");
        foreach (var f in failures.Take(30)) output.WriteLine(f);
        Assert.Empty(failures);
        Assert.True(requests.Count > 400, $"only {requests.Count} requests");
    }

    private static StringContent Json(string json) => new(json, Encoding.UTF8, "application/json");
}
