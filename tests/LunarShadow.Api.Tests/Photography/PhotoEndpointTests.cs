using System.Net;
using System.Text;
using System.Text.Json;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Photography;

public class PhotoEndpointTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    private readonly HttpClient _client = factory.CreateClient();
    private const string Plan = "/api/v1/eclipses/2025-03-14/photo-plan?lat=40.7&lon=-74&tz=America/New_York";

    [Fact]
    public async Task A_photo_plan_has_a_timeline_framing_and_sequences_with_the_agreed_names()
    {
        var p = await JsonAssert.OkJson(await _client.GetAsync(Plan + "&iso=800&aperture=6.3&focalLength=600&mount=sidereal&danjon=2.5&interval=10"));
        var rows = p.GetProperty("timeline").EnumerateArray().ToList();
        Assert.NotEmpty(rows);
        foreach (var field in new[] { "utc", "local", "phase", "umbralFraction", "moonAltitudeDegrees", "airmass", "brightnessStops", "exposure", "warnings" })
            Assert.True(rows[0].TryGetProperty(field, out _), field);
        foreach (var field in new[] { "shutterSeconds", "iso", "aperture", "bracketStops" })
            Assert.True(rows[0].GetProperty("exposure").TryGetProperty(field, out _), field);
        Assert.Contains(rows, r => r.GetProperty("phase").GetString() == "total");
        Assert.All(rows, r => Assert.Contains(r.GetProperty("phase").GetString(), new[] { "uneclipsed", "penumbral", "partial", "total" }));
        Assert.Equal(2.5, p.GetProperty("model").GetProperty("danjonL").GetDouble());
        Assert.Equal(2.5, p.GetProperty("model").GetProperty("danjon").GetDouble()); // the former name, kept for one release
        Assert.Equal("sidereal", p.GetProperty("camera").GetProperty("mount").GetString());
        Assert.True(p.GetProperty("framing").GetProperty("moonDiameterPixels").GetDouble() > 500);
        Assert.True(p.GetProperty("sequences").GetProperty("timeLapse").GetProperty("frames").GetInt32() > 100);
        Assert.Contains(p.GetProperty("cautions").EnumerateArray(), c => c.GetString()!.Contains("Sun", StringComparison.Ordinal));
    }

    [Fact]
    public async Task The_plan_comes_as_csv_calendar_and_a_camera_sequence()
    {
        var csv = await (await _client.GetAsync(Plan + "&format=csv")).Content.ReadAsStringAsync();
        Assert.StartsWith("utc,local,contact,phase", csv, StringComparison.Ordinal);
        var ics = await _client.GetAsync(Plan + "&format=ics");
        Assert.Equal("text/calendar", ics.Content.Headers.ContentType?.MediaType);
        var sequence = await _client.GetAsync(Plan + "&format=sequence&bracket=1");
        var steps = JsonDocument.Parse(await sequence.Content.ReadAsStringAsync()).RootElement;
        Assert.Equal(JsonValueKind.Array, steps.ValueKind);
        Assert.True(steps.GetArrayLength() > 100);
        Assert.True(steps[0].TryGetProperty("instant", out _) && steps[0].TryGetProperty("shutterSeconds", out _));
    }

    // Common practice (a note is read once): ISO 100 at f/8 on a Moon-tracking mount needs more than 30 s in totality, so
    // the ISO is raised; JSON gives that once per run with its local time range, the CSV writes it once in the warnings
    // column of the run's first row, and the camera sequence once on that row's first step.
    [Fact]
    public async Task An_ISO_change_is_written_once_per_run_in_JSON_CSV_and_the_sequence()
    {
        const string query = Plan + "&iso=100&aperture=8&focalLength=400&mount=lunar&bracket=1";
        var p = await JsonAssert.OkJson(await _client.GetAsync(query));
        var notes = p.GetProperty("notes").EnumerateArray().ToList();
        Assert.NotEmpty(notes);
        Assert.All(notes, n => Assert.Equal("iso-changed", n.GetProperty("code").GetString()));
        var rows = p.GetProperty("timeline").EnumerateArray().ToList();
        Assert.DoesNotContain(rows, r => r.GetProperty("warningDetails").EnumerateArray().Any(w => w.GetProperty("code").GetString() == "iso-changed"));
        var first = notes[0];
        var firstRow = first.GetProperty("firstRow").GetInt32();
        var rowCount = first.GetProperty("rows").GetInt32();
        Assert.True(rowCount > 1);
        Assert.Equal(rows[firstRow].GetProperty("utc").GetString(), first.GetProperty("fromUtc").GetString());
        Assert.Equal(rows[firstRow + rowCount - 1].GetProperty("utc").GetString(), first.GetProperty("toUtc").GetString());
        var text = first.GetProperty("text").GetString()!;
        Assert.StartsWith("From ", text, StringComparison.Ordinal);
        Assert.Contains("ISO raised from 100", text, StringComparison.Ordinal);

        var csv = await (await _client.GetAsync(query + "&format=csv")).Content.ReadAsStringAsync();
        Assert.Equal(notes.Count, CountOf(csv, "ISO raised from"));
        Assert.Equal(1, CountOf(csv, text));

        var steps = JsonDocument.Parse(await (await _client.GetAsync(query + "&format=sequence")).Content.ReadAsStringAsync()).RootElement.EnumerateArray().ToList();
        var noted = steps.Where(s => s.TryGetProperty("note", out var n) && n.ValueKind == JsonValueKind.String).ToList();
        Assert.Equal(notes.Count, noted.Count);
        Assert.Equal(first.GetProperty("fromUtc").GetString(), noted[0].GetProperty("instant").GetString());
        Assert.Equal(text, noted[0].GetProperty("note").GetString());
    }

    private static int CountOf(string haystack, string needle)
    {
        var count = 0;
        for (var i = haystack.IndexOf(needle, StringComparison.Ordinal); i >= 0; i = haystack.IndexOf(needle, i + needle.Length, StringComparison.Ordinal)) count++;
        return count;
    }

    [Fact]
    public async Task A_camera_profile_can_come_in_a_JSON_body()
    {
        var body = new StringContent("""{"lat":40.7,"lon":-74,"sensor":"23.5x15.6","pixels":6000,"focalLength":300,"aperture":5.6,"shutter":2,"mount":"lunar","shadow":"chauvenet"}""", Encoding.UTF8, "application/json");
        var p = await JsonAssert.OkJson(await _client.PostAsync("/api/v1/eclipses/2025-03-14/photo-plan", body));
        Assert.Equal(23.5 / 6000 * 1000, p.GetProperty("camera").GetProperty("pixelPitchMicrons").GetDouble(), 3);
        Assert.Equal(2, p.GetProperty("camera").GetProperty("shutterSeconds").GetDouble());
        Assert.Equal("chauvenet", p.GetProperty("eclipse").GetProperty("shadowModel").GetString());
        Assert.Equal(JsonValueKind.Null, p.GetProperty("framing").GetProperty("trailingLimitSeconds").ValueKind);
    }

    [Theory]
    [InlineData("&aperture=0.8", "aperture")]
    [InlineData("&aperture=90", "aperture")]
    [InlineData("&focalLength=0", "focalLength")]
    [InlineData("&focalLength=-50", "focalLength")]
    [InlineData("&iso=20", "iso")]
    [InlineData("&iso=500000", "iso")]
    [InlineData("&sensor=36by24", "sensor")]
    [InlineData("&pixelPitch=0.1", "pixelPitch")]
    [InlineData("&mount=gimbal", "mount")]
    [InlineData("&danjon=5", "danjon")]
    [InlineData("&interval=0", "interval")]
    [InlineData("&bracket=1.5", "bracket")]
    [InlineData("&shutter=0", "shutter")]
    [InlineData("&format=raw", "format")]
    public async Task Bad_camera_values_get_a_problem_naming_the_field(string extra, string field)
    {
        await JsonAssert.ProblemNaming(await _client.GetAsync(Plan + extra), field);
    }

    [Fact]
    public async Task Bad_bodies_are_refused_clearly()
    {
        await JsonAssert.ProblemNaming(await _client.PostAsync("/api/v1/eclipses/2025-03-14/photo-plan", new StringContent("""{"lat":40.7,"lon":-74,"iso":[800]}""", Encoding.UTF8, "application/json")), "iso");
        await JsonAssert.ProblemNaming(await _client.PostAsync("/api/v1/eclipses/2025-03-14/photo-plan", new StringContent("[1,2]", Encoding.UTF8, "application/json")), "body");
        Assert.Equal(HttpStatusCode.UnsupportedMediaType, (await _client.PostAsync("/api/v1/eclipses/2025-03-14/photo-plan", new StringContent("lat=1", Encoding.UTF8, "text/plain"))).StatusCode);
        var huge = new StringContent("{\"name\":\"" + new string('x', 70_000) + "\"}", Encoding.UTF8, "application/json");
        Assert.Equal(HttpStatusCode.RequestEntityTooLarge, (await _client.PostAsync("/api/v1/eclipses/2025-03-14/photo-plan", huge)).StatusCode);
    }
}
