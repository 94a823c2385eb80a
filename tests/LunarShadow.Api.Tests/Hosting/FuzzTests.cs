using System.Net;
using System.Text;
using LunarShadow.Api.Tests.Support;
using Microsoft.AspNetCore.Mvc.Testing;

namespace LunarShadow.Api.Tests.Hosting;

/// <summary>
/// Throws thousands of malformed and extreme inputs at every endpoint and asserts that none gets a 5xx and that every
/// refusal is a problem response. Seeded, so a failure repeats.
/// </summary>
public class FuzzTests
{
    private static readonly string[] Nasty =
    [
        "", " ", "NaN", "nan", "Infinity", "-Infinity", "1e309", "-1e309", "1e-400", "-0", "0", "90.0000001", "-90", "180", "-180.5",
        "12abc", "0x1F", "1,5", "١٢", "∞", "null", "true", "[]", "{}", "%00", "\u0000", "'; DROP TABLE x;--", new string('9', 400),
        new string('a', 5000), "2025-02-30", "2025-13-01", "1582-10-10", "-2500-01-01", "3001-01-01", "2025-03-14", "-1999-06-26",
        "2025-03-14T06:58:00Z", "2025-03-14T25:00:00Z", "2025-03-14T06:58:00+19:00", "Europe/Nowhere", "UTC", "Etc/GMT+14",
        "19:00-23:30", "24:00-01:00", "07:00-07:00", "90:5,180:12", "90:5,abc", "400:5", "1:2:3", "36x24", "0x0", "1e3x1e3",
        "danjon", "layer", "chauvenet", "none", "best", "espenak-meeus-2006", "json", "csv", "ics", "sequence", "geojson", "xml",
        "total,partial", "annular", "fixed", "lunar", "gimbal", "measured", "reported", "Tycho,Plato", "-5", "5", "50", "51", "500", "100000", "409601", "0.94", "64.1",
        // Digits of other scripts, which a regex \d accepts and the number parser refuses (Unicode UAX #44 category Nd).
        "2025-٠٣-١٤", "١٩:00-23:00", "19:00-٢٣:30", "2025-03-14T٠٦:00:00Z", "２０２５-03-14", "2025-03-14T06:00:00.١Z", "१२", "٤٧.٠٧",
        "2025-09-07T18:00+٠٢:00", "٠٩٠:5,180:12", "2026-03-03T11:33:00Z",
        // Years beyond what an instant can hold: must be range-checked before they are converted.
        "10000-01-01T00:00Z", "-10000-01-01T00:00Z", "99999-12-31T23:59:59Z", "10000-01-01", "3001-01-01T00:00Z",
    ];

    // Already percent-encoded: invalid UTF-8 in the query (an encoded lone surrogate, stray bytes, an overlong slash).
    private static readonly string[] Encoded = ["%ED%A0%80", "%FF%FE", "%C0%AF", "2025-03-14T06%ED%A0%80:00Z", "%E2%80%AE19:00-23:00"];

    private static readonly (string Path, string[] Names)[] Endpoints =
    [
        ("/api/v1/ephemeris", ["utc", "lat", "lon", "elevation", "pressure", "temperature", "deltaT", "deltaTModel"]),
        ("/api/v1/eclipses", ["from", "to", "kind", "shadow", "layerKm", "deltaT", "deltaTModel", "format"]),
        ("/api/v1/eclipses/{date}", ["shadow", "layerKm", "deltaT", "deltaTModel", "format"]),
        ("/api/v1/eclipses/{date}/local", ["lat", "lon", "elevation", "tz", "minAltitude", "horizon", "pressure", "temperature", "name", "open", "shadow", "deltaT", "format"]),
        ("/api/v1/sites/upcoming", ["lat", "lon", "tz", "from", "count", "years", "phase", "night", "open", "minAltitude", "pressure", "temperature", "horizon", "format"]),
        ("/api/v1/eclipses/{date}/photo-plan", ["lat", "lon", "tz", "iso", "aperture", "shutter", "focalLength", "teleconverter", "sensor", "pixelPitch", "pixels", "mount", "danjon", "danjonL", "shadow", "pressure", "temperature", "interval", "bracket", "blur", "extinction", "gap", "timelapseInterval", "fileSize", "start", "format"]),
        ("/api/v1/eclipses/{date}/visibility-map", ["shadow", "deltaT", "format"]),
        ("/api/v1/eclipses/{date}/observations", ["kind", "format"]),
        ("/api/v1/eclipses/{date}/craters", ["features", "penumbra", "lat", "lon", "tz", "shadow", "layerKm", "deltaT", "format"]),
        ("/api/v1/eclipses/{date}/enlargement", ["deltaT", "deltaTModel", "format", "shadow"]),
    ];

    // Several eclipses (total 2025-09-07, partial 2026-03-03 is total, 2029-12-20 total; NASA five-millennium canon, from
    // memory) so the fuzzing reaches different nights, plus dates that are not eclipses or not dates at all.
    private static readonly string[] Dates =
    [
        "2025-09-07", "2026-03-03", "2029-12-20", "2025-03-14", "2022-11-08", "2025-03-15", "abc", "-1999-06-26", "2025-02-30",
        "99999-01-01", "%20", "2025-٠٩-٠٧", "２０２６-03-03", "2029-12-٢٠", "10000-01-01",
    ];

    /// <summary>GET requests sent; at least this many.</summary>
    private const int GetRequests = 10_000;

    [Fact]
    public async Task No_input_makes_the_service_fail()
    {
        await using var storage = await StorageBackend.CreateAsync("sqlite");
        var key = await ObservationHost.AddKeyAsync(storage, "Invented Fuzz Observatory");
        await using var factory = new WebApplicationFactory<Program>().WithWebHostBuilder(b =>
        {
            foreach (var (name, value) in storage.Settings) b.UseSetting(name, value);
            b.UseSetting("RateLimiting:WritesPerMinute", "1000000");
            b.UseSetting("RateLimiting:WriteBurst", "1000000");
            b.UseSetting("RateLimiting:PermitsPerSecond", "1000000");
            b.UseSetting("RateLimiting:Burst", "1000000");
            b.UseSetting("RateLimiting:ExpensiveQueuePerClient", "1000");
            b.UseSetting("RequestTimeoutSeconds", "300"); // a deadline is a 503 by design; here only real failures count
        });
        var client = factory.CreateClient();
        var random = new Random(6);
        var failures = new List<string>();
        var seen = new HashSet<HttpStatusCode>();
        var sent = 0;
        while (sent < GetRequests)
        {
            var (path, names) = Endpoints[random.Next(Endpoints.Length)];
            var url = path.Replace("{date}", Uri.EscapeDataString(Dates[random.Next(Dates.Length)]), StringComparison.Ordinal);
            var query = string.Join('&', Enumerable.Range(0, random.Next(0, 6)).Select(_ =>
                $"{names[random.Next(names.Length)]}={(random.Next(12) == 0 ? Encoded[random.Next(Encoded.Length)] : Uri.EscapeDataString(Nasty[random.Next(Nasty.Length)]))}"));
            // Keep the service's own work bounded: long date ranges are legitimate but slow, and are not what is fuzzed here.
            if (query.Contains("from=-1999", StringComparison.Ordinal)) continue;
            HttpResponseMessage response;
            try
            {
                response = await client.GetAsync(url + (query.Length > 0 ? "?" + query : ""));
            }
            catch (HttpRequestException e)
            {
                failures.Add($"broken answer for GET {url}?{query}: {e.InnerException?.InnerException?.Message ?? e.Message}");
                sent++;
                continue;
            }
            sent++;
            seen.Add(response.StatusCode);
            await Check(response, "GET " + url + "?" + query, failures);
        }
        string[] bodies =
        [
            "", "{", "[]", "null", "\"x\"", "{\"sites\":null}", "{\"sites\":[null]}", "{\"sites\":[{\"lat\":\"NaN\",\"lon\":1}]}",
            "{\"sites\":[{\"lat\":1e999,\"lon\":1}]}", "{\"sites\":[" + string.Join(',', Enumerable.Repeat("{\"lat\":1,\"lon\":1}", 600)) + "]}",
            "{\"lat\":{\"a\":{\"b\":{\"c\":{\"d\":{\"e\":{\"f\":{\"g\":{\"h\":1}}}}}}}}}", "{\"lat\":1,\"lon\":1,\"iso\":true}",
            "{\"lat\":1,\"lon\":1,\"sensor\":\"1x1\",\"focalLength\":10000,\"pixelPitch\":0.5}", new string('[', 5000),
        ];
        var writes = new HashSet<HttpStatusCode>();
        var bodyBytes = bodies.Concat(ObservationBodies(random)).Select(Encoding.UTF8.GetBytes).Concat(MalformedText()).ToList();
        foreach (var body in bodyBytes)
        {
            foreach (var date in new[] { "2025-09-07", "2026-03-03", "2029-12-20" })
            {
                foreach (var (path, type, bearer) in new (string Path, string Type, string? Bearer)[]
                {
                    ($"/api/v1/eclipses/{date}/local", "application/json", null), ($"/api/v1/eclipses/{date}/photo-plan", "application/json", null),
                    ($"/api/v1/eclipses/{date}/local", "text/xml", null), ($"/api/v1/eclipses/{date}/observations", "application/json", key),
                    ($"/api/v1/eclipses/{date}/observations", "text/xml", key), ($"/api/v1/eclipses/{date}/observations", "application/json", "lsk_" + new string('A', 43)),
                    ($"/api/v1/eclipses/{date}/observations", "application/json", null),
                })
                {
                    using var request = new HttpRequestMessage(HttpMethod.Post, path) { Content = new ByteArrayContent(body) };
                    request.Content.Headers.ContentType = new System.Net.Http.Headers.MediaTypeHeaderValue(type);
                    if (bearer is not null) request.Headers.Authorization = new System.Net.Http.Headers.AuthenticationHeaderValue("Bearer", bearer);
                    sent++;
                    HttpResponseMessage response;
                    try
                    {
                        response = await client.SendAsync(request);
                    }
                    catch (HttpRequestException e)
                    {
                        failures.Add($"broken answer for POST {path}: {Encoding.UTF8.GetString(body[..Math.Min(100, body.Length)])}: {e.InnerException?.InnerException?.Message ?? e.Message}");
                        continue;
                    }
                    if (path.EndsWith("/observations", StringComparison.Ordinal)) writes.Add(response.StatusCode);
                    await Check(response, $"POST {path} ({type}) {Encoding.UTF8.GetString(body[..Math.Min(60, body.Length)])}", failures);
                }
            }
        }
        Assert.True(sent >= GetRequests, $"only {sent} requests sent");
        Assert.True(failures.Count == 0, string.Join("\n", failures.Take(20)));
        // The inputs reached both the computations and the refusals.
        Assert.Contains(HttpStatusCode.OK, seen);
        Assert.Contains(HttpStatusCode.BadRequest, seen);
        Assert.Contains(HttpStatusCode.NotFound, seen);
        // The observation writes reached storage (stored, then repeated) as well as every refusal.
        Assert.Contains(HttpStatusCode.Created, writes);
        Assert.Contains(HttpStatusCode.Conflict, writes);
        Assert.Contains(HttpStatusCode.Unauthorized, writes);
        Assert.Contains(HttpStatusCode.BadRequest, writes);
    }

    // Observation bodies: valid ones (so some are stored, then repeat as 409), each field replaced by a nasty value or a
    // wrong JSON type, batches with bad members, and extreme sizes.
    private static IEnumerable<string> ObservationBodies(Random random)
    {
        const string Site = "{\"lat\":13,\"lon\":77.6,\"elevation\":900}";
        string[] valid =
        [
            "{\"kind\":\"crater-timing\",\"feature\":\"Tycho\",\"crossing\":\"immersion\",\"utc\":\"2025-09-07T17:09:20Z\",\"site\":" + Site + ",\"uncertaintySeconds\":3,\"optics\":\"80 mm\",\"observer\":\"R. Fenwick\"}",
            "{\"kind\":\"danjon\",\"value\":2.5,\"utc\":\"2025-09-07T18:10:00Z\",\"site\":" + Site + "}",
        ];
        foreach (var v in valid)
        {
            yield return v;
            yield return "[" + v + "," + v + "]";
        }
        string[] fields = ["kind", "feature", "crossing", "utc", "uncertaintySeconds", "optics", "observer", "value", "lat", "lon", "elevation", "site"];
        for (var i = 0; i < 120; i++)
        {
            var template = valid[random.Next(valid.Length)];
            var field = fields[random.Next(fields.Length)];
            var nasty = random.Next(4) switch
            {
                0 => "null",
                1 => "{\"x\":[1,2]}",
                2 => "[\"a\"]",
                _ => System.Text.Json.JsonSerializer.Serialize(Nasty[random.Next(Nasty.Length)]),
            };
            var replaced = System.Text.RegularExpressions.Regex.Replace(template, $"\"{field}\":(\\{{[^}}]*\\}}|\"[^\"]*\"|[^,}}]+)", $"\"{field}\":{nasty}");
            yield return random.Next(3) == 0 ? "[" + valid[0] + "," + replaced + "]" : replaced;
        }
        yield return "[" + string.Join(',', Enumerable.Repeat(valid[1], 501)) + "]";
        yield return "[[[[[[[[[[[[" + valid[1] + "]]]]]]]]]]]]";
        yield return "{\"kind\":\"danjon\",\"value\":2,\"utc\":\"2025-09-07T18:10:00Z\",\"site\":{\"lat\":13,\"lon\":77.6,\"elevation\":900,\"site\":{}}}";
        yield return "{\"kind\":\"danjon\",\"value\":2,\"utc\":\"0001-01-01T00:00:00Z\",\"site\":" + Site + "}";
    }

    // JSON text that is not UTF-8 (RFC 8259 §8.1) or holds an escaped lone surrogate (RFC 8259 §8.2), in each kind of field.
    private static IEnumerable<byte[]> MalformedText()
    {
        byte[][] bad = [[0xFF, 0xFE], [0xC0, 0xAF], [0xED, 0xA0, 0x80], [0xF8, 0x88, 0x80, 0x80, 0x80], [0xE2, 0x82]];
        string[] around =
        [
            "{\"lat\":1,\"lon\":1,\"name\":\"@\"}", "{\"lat\":\"@\",\"lon\":1}", "{\"@\":1}", "{\"sites\":[{\"lat\":1,\"lon\":1,\"name\":\"@\"}]}",
            "{\"sites\":[{\"lat\":1,\"lon\":1},{\"lat\":2,\"lon\":2,\"tz\":\"@\"}]}", "{\"lat\":1,\"lon\":1,\"tz\":\"Europe/@\"}",
        ];
        foreach (var text in around)
        {
            foreach (var b in bad)
            {
                var parts = text.Split('@');
                yield return [.. Encoding.UTF8.GetBytes(parts[0]), .. b, .. Encoding.UTF8.GetBytes(parts[1])];
            }
            foreach (var escape in new[] { "\\ud800", "\\udfff", "x\\ud83d", "\\ude00y" })
                yield return Encoding.UTF8.GetBytes(text.Replace("@", escape, StringComparison.Ordinal));
        }
    }

    private static async Task Check(HttpResponseMessage response, string what, List<string> failures)
    {
        var status = (int)response.StatusCode;
        if (status >= 500) failures.Add($"{status} for {what}: {await response.Content.ReadAsStringAsync()}");
        else if (status >= 400 && status != 404 && response.Content.Headers.ContentType?.MediaType != "application/problem+json")
            failures.Add($"{status} without a problem response for {what}");
        else if (status == 404 && response.Content.Headers.ContentLength != 0 && response.Content.Headers.ContentType?.MediaType != "application/problem+json")
            failures.Add($"404 without a problem response for {what}");
    }
}
