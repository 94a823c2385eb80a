using System.Globalization;
using System.Net;
using System.Text.Json;
using LunarShadow.Api.Tests.Support;
using Xunit.Abstractions;

namespace LunarShadow.Api.Tests.Craters;

// One collection with the ephemeris tests: their hosts then start one after the other (two hosts starting at once can
// trip the shared bootstrap logger, a known issue of the host set-up).
[Collection("Ephemeris and craters")]
public class CraterEndpointTests(UnthrottledApiFactory factory, ITestOutputHelper output) : IClassFixture<UnthrottledApiFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    private async Task<JsonElement> Get(string query) => await JsonAssert.OkJson(await _client.GetAsync("/api/v1/eclipses/" + query));

    private static DateTimeOffset Utc(JsonElement crossing) =>
        DateTimeOffset.Parse(crossing.GetProperty("utc").GetString()!, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal);

    [Fact]
    public async Task Lists_every_feature_in_the_order_the_umbra_reaches_them_with_the_unreached_last()
    {
        var json = await Get("2025-03-14/craters");
        Assert.Equal("danjon", json.GetProperty("shadowModel").GetString());
        var features = json.GetProperty("features").EnumerateArray().ToList();
        Assert.True(features.Count >= 40);
        var reached = features.TakeWhile(f => f.GetProperty("reachedByUmbra").GetBoolean()).ToList();
        Assert.Equal(json.GetProperty("reachedCount").GetInt32(), reached.Count);
        Assert.All(features.Skip(reached.Count), f => Assert.False(f.GetProperty("reachedByUmbra").GetBoolean()));
        var immersions = reached.Select(f => Utc(f.GetProperty("immersion"))).ToList();
        Assert.Equal(immersions.OrderBy(t => t), immersions);
        Assert.All(reached, f => Assert.True(Utc(f.GetProperty("immersion")) < Utc(f.GetProperty("emersion"))));
        // Common practice (geometry): the Moon moves east through the shadow, so the first feature reached lies on the
        // disc's eastern half (position angle 0°–180°); and a feature's place on the disc moves only with libration and
        // the axis (Meeus 1998, ch. 53: well under a degree an hour), so immersion and emersion agree to 3°.
        Assert.InRange(reached[0].GetProperty("immersion").GetProperty("positionAngleDegrees").GetDouble(), 0, 180);
        Assert.All(reached, f =>
        {
            var turn = f.GetProperty("emersion").GetProperty("positionAngleDegrees").GetDouble() - f.GetProperty("immersion").GetProperty("positionAngleDegrees").GetDouble();
            Assert.InRange(Math.Abs((turn + 540) % 360 - 180), 0, 3);
        });
        Assert.All(reached, f => Assert.True(f.GetProperty("immersion").GetProperty("uncertaintySeconds").GetDouble() > 0));
    }

    // Common practice (geometry): a feature on the Earth-facing hemisphere is seen within the Moon's disc, at most one
    // semi-diameter from its centre; a feature near the centre of the map (Mösting A, 3° S 5° W) lies near the disc's
    // centre (libration is under 10°). Checked against the eclipse endpoint's own shadow diagram, a separate mapping.
    [Fact]
    public async Task Each_feature_at_greatest_lies_on_the_Moon_the_shadow_diagram_draws_at_greatest()
    {
        var craters = await Get("2029-12-20/craters");
        var eclipse = await Get("2029-12-20");
        var diagram = eclipse.GetProperty("shadowDiagram");
        var greatest = diagram.GetProperty("points").EnumerateArray().Single(p => p.GetProperty("name").GetString() == "greatest");
        var radius = diagram.GetProperty("moonRadiusDegrees").GetDouble();
        double Distance(JsonElement at) => Math.Sqrt(
            Math.Pow(at.GetProperty("eastDegrees").GetDouble() - greatest.GetProperty("eastDegrees").GetDouble(), 2)
            + Math.Pow(at.GetProperty("northDegrees").GetDouble() - greatest.GetProperty("northDegrees").GetDouble(), 2));
        var offsets = craters.GetProperty("features").EnumerateArray().ToDictionary(f => f.GetProperty("name").GetString()!, f => f.GetProperty("atGreatest"));
        foreach (var (name, at) in offsets.Where(o => o.Value.GetProperty("facesEarth").GetBoolean()))
            Assert.True(Distance(at) <= radius * 1.002, $"{name}: {Distance(at) / radius:0.000} semi-diameters from the centre");
        Assert.True(offsets.Values.Max(Distance) > 0.85 * radius, "the limb features lie near the limb");
        Assert.True(Distance(offsets["Mösting A"]) < 0.2 * radius);
        output.WriteLine($"largest {offsets.Values.Max(Distance) / radius:0.000}, Mösting A {Distance(offsets["Mösting A"]) / radius:0.000} semi-diameters");
    }

    // Common practice (geometry): in a penumbral eclipse the umbra reaches nothing, but every feature is still listed.
    [Fact]
    public async Task A_penumbral_eclipse_lists_every_feature_as_never_reached()
    {
        var json = await Get("2024-03-25/craters?penumbra=true");
        Assert.Equal("penumbral", json.GetProperty("kind").GetString());
        Assert.Equal(0, json.GetProperty("reachedCount").GetInt32());
        var features = json.GetProperty("features").EnumerateArray().ToList();
        Assert.True(features.Count >= 40);
        Assert.All(features, f => Assert.Equal(JsonValueKind.Null, f.GetProperty("immersion").ValueKind));
        Assert.Contains(features, f => f.GetProperty("penumbralImmersion").ValueKind == JsonValueKind.Object);
    }

    // A crossing is the same instant everywhere: a site changes only the visibility fields.
    [Fact]
    public async Task A_site_adds_visibility_but_never_moves_a_crossing()
    {
        var plain = await Get("2025-03-14/craters?features=Tycho,Plato");
        var sited = await Get("2025-03-14/craters?features=Tycho,Plato&lat=-33.87&lon=151.21&tz=Australia/Sydney&name=Harbour%20Dome");
        for (var i = 0; i < 2; i++)
        {
            var a = plain.GetProperty("features")[i].GetProperty("immersion");
            var b = sited.GetProperty("features")[i].GetProperty("immersion");
            Assert.Equal(a.GetProperty("utc").GetString(), b.GetProperty("utc").GetString());
            Assert.False(a.TryGetProperty("visible", out var v) && v.ValueKind != JsonValueKind.Null);
            Assert.Contains(b.GetProperty("visible").ValueKind, new[] { JsonValueKind.True, JsonValueKind.False });
            Assert.Contains(b.GetProperty("sky").GetString(), new[] { "day", "civil-twilight", "nautical-twilight", "astronomical-twilight", "night" });
            Assert.EndsWith("+11:00", b.GetProperty("local").GetString());
            // Visible means the Moon is up (the upper limb, so the centre may be a quarter of a degree lower).
            if (b.GetProperty("visible").GetBoolean()) Assert.True(b.GetProperty("moonAltitudeDegrees").GetDouble() > -1);
            else Assert.True(b.GetProperty("moonAltitudeDegrees").GetDouble() < 1);
        }
    }

    // Independent check, derived differently: at the predicted instant, the ephemeris endpoint's Moon and Sun places
    // and its libration (l, b) and axis angle (P) put the feature on the disc by the orthographic projection of
    // selenographic coordinates; that point's distance from the antisolar axis must equal Danjon's umbral radius at its
    // own distance, 1.01·asin(a/D) + asin(a/R☉) − 959.63″/R☉[AU] (Danjon 1951 as in the Five Millennium Canon, §1.3).
    [Theory]
    [InlineData("2025-03-14")]
    [InlineData("2022-11-08")]
    public async Task At_each_immersion_the_ephemeris_endpoint_puts_the_feature_on_Danjons_umbral_edge(string date)
    {
        var craters = await Get(date + "/craters?features=Tycho,Plato,Aristarchus,Langrenus,Grimaldi,Copernicus");
        var worst = 0.0;
        foreach (var f in craters.GetProperty("features").EnumerateArray())
        {
            foreach (var which in new[] { "immersion", "emersion" })
            {
                var utc = f.GetProperty(which).GetProperty("utc").GetString();
                var eph = await JsonAssert.OkJson(await _client.GetAsync("/api/v1/ephemeris?utc=" + utc));
                var residual = DanjonResidualArcsec(eph, f.GetProperty("latitudeDegrees").GetDouble(), f.GetProperty("longitudeDegrees").GetDouble());
                worst = Math.Max(worst, Math.Abs(residual));
            }
        }
        output.WriteLine($"{date}: largest |distance − umbral radius| {worst:0.000}″");
        Assert.True(worst < 0.2, $"{worst}″");
    }

    private static double DanjonResidualArcsec(JsonElement eph, double latitudeDegrees, double longitudeDegrees)
    {
        const double a = 6378.137, k = 0.2725076, au = 149_597_870.7, rad = Math.PI / 180;
        static (double X, double Y, double Z) Vector(JsonElement body)
        {
            var ra = body.GetProperty("rightAscensionHours").GetDouble() * 15 * rad;
            var dec = body.GetProperty("declinationDegrees").GetDouble() * rad;
            var d = body.GetProperty("distanceKm").GetDouble();
            return (d * Math.Cos(dec) * Math.Cos(ra), d * Math.Cos(dec) * Math.Sin(ra), d * Math.Sin(dec));
        }
        var moonJson = eph.GetProperty("moon");
        var moon = Vector(moonJson);
        var sun = Vector(eph.GetProperty("sun"));
        var l = moonJson.GetProperty("libration").GetProperty("longitudeDegrees").GetDouble() * rad;
        var b = moonJson.GetProperty("libration").GetProperty("latitudeDegrees").GetDouble() * rad;
        var p = moonJson.GetProperty("axisPositionAngleDegrees").GetDouble() * rad;
        var (lat, lon) = (latitudeDegrees * rad, longitudeDegrees * rad);
        // Orthographic projection of selenographic coordinates (e.g. Meeus 1998, ch. 53, and any lunar atlas): x toward
        // selenographic east, y toward the pole, z toward the observer, in Moon radii.
        var x = Math.Cos(lat) * Math.Sin(lon - l);
        var y = Math.Sin(lat) * Math.Cos(b) - Math.Cos(lat) * Math.Sin(b) * Math.Cos(lon - l);
        var z = Math.Sin(lat) * Math.Sin(b) + Math.Cos(lat) * Math.Cos(b) * Math.Cos(lon - l);
        // Sky directions at the Moon: north N, east E, toward the Earth T; the pole lies at position angle P.
        var dm = Math.Sqrt(moon.X * moon.X + moon.Y * moon.Y + moon.Z * moon.Z);
        var (dx, dy, dz) = (moon.X / dm, moon.Y / dm, moon.Z / dm);
        var eLen = Math.Sqrt(dx * dx + dy * dy);
        var (ex, ey, ez) = (-dy / eLen, dx / eLen, 0.0);
        var (nx, ny, nz) = (dy * ez - dz * ey, dz * ex - dx * ez, dx * ey - dy * ex);
        double Along(double n, double e, double t) => k * a * ((Math.Sin(p) * x + Math.Cos(p) * y) * n + (-Math.Cos(p) * x + Math.Sin(p) * y) * e - z * t);
        var f = (X: moon.X + Along(nx, ex, dx), Y: moon.Y + Along(ny, ey, dy), Z: moon.Z + Along(nz, ez, dz));
        var rs = Math.Sqrt(sun.X * sun.X + sun.Y * sun.Y + sun.Z * sun.Z);
        var (ax, ay, az) = (-sun.X / rs, -sun.Y / rs, -sun.Z / rs);
        var along = f.X * ax + f.Y * ay + f.Z * az;
        var (cx, cy, cz) = (f.Y * az - f.Z * ay, f.Z * ax - f.X * az, f.X * ay - f.Y * ax);
        var separation = Math.Atan2(Math.Sqrt(cx * cx + cy * cy + cz * cz), along);
        var radius = 1.01 * Math.Asin(a / along) + Math.Asin(a / rs) - 959.63 / 3600 * rad * au / rs;
        return (separation - radius) / rad * 3600;
    }

    [Fact]
    public async Task Csv_has_a_header_and_one_row_per_feature_in_the_same_order_as_json()
    {
        var json = await Get("2025-03-14/craters");
        var response = await _client.GetAsync("/api/v1/eclipses/2025-03-14/craters?format=csv");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("text/csv", response.Content.Headers.ContentType?.MediaType);
        var lines = (await response.Content.ReadAsStringAsync()).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith("feature,latitude_deg,longitude_deg,reached_by_umbra,immersion_utc", lines[0]);
        var names = json.GetProperty("features").EnumerateArray().Select(f => f.GetProperty("name").GetString()).ToList();
        Assert.Equal(names.Count + 1, lines.Length);
        Assert.Equal(names, lines.Skip(1).Select(l => l.Split(',')[0]));
        Assert.All(lines.Skip(1), l => Assert.Equal(lines[0].Split(',').Length, l.Split(',').Length));
    }

    // RFC 5545: one VEVENT per crossing of the chosen features, at the instant of the JSON answer (to the second).
    [Fact]
    public async Task Calendar_has_an_event_per_crossing_of_the_chosen_features()
    {
        var json = await Get("2025-03-14/craters?features=Tycho,Plato");
        var response = await _client.GetAsync("/api/v1/eclipses/2025-03-14/craters?format=ics&features=Tycho,Plato");
        Assert.Equal("text/calendar", response.Content.Headers.ContentType?.MediaType);
        var calendar = Ical.Net.Calendar.Load(await response.Content.ReadAsStringAsync())!;
        Assert.Equal(4, calendar.Events.Count);
        foreach (var f in json.GetProperty("features").EnumerateArray())
        {
            var expected = Utc(f.GetProperty("immersion")).UtcDateTime;
            var ev = calendar.Events.Single(e => e.Summary == $"Umbra reaches {f.GetProperty("name").GetString()}");
            Assert.Equal(new DateTime(expected.Ticks - expected.Ticks % TimeSpan.TicksPerSecond, DateTimeKind.Utc), ev.DtStart!.AsUtc);
            Assert.Single(ev.Alarms);
        }
    }

    [Theory]
    [InlineData("2025-03-14/craters?features=Nowhere", "features")]
    [InlineData("2025-03-14/craters?penumbra=maybe", "penumbra")]
    [InlineData("2025-03-14/craters?format=ics", "features")]
    [InlineData("2025-03-14/craters?format=ics&features=Tycho,Plato,Kepler,Grimaldi,Billy,Proclus,Manilius,Menelaus,Censorinus,Langrenus,Picard", "features")]
    [InlineData("2025-03-14/craters?lat=47", "lon")]
    [InlineData("2025-03-14/craters?lat=47&lon=15&tz=Mars/Olympus", "tz")]
    [InlineData("2025-03-14/craters?shadow=fuzzy", "shadow")]
    [InlineData("2025-03-14/craters?shadow=layer&layerKm=9999", "layerKm")]
    [InlineData("2025-03-14/craters?format=xml", "format")]
    [InlineData("2025-02-30/craters", "date")]
    [InlineData("3001-01-01/craters", "date")]
    [InlineData("1002-03-01/craters?format=ics&features=Tycho", "format")]
    public async Task Bad_input_gets_a_problem_response_naming_the_field(string query, string field)
    {
        var response = await _client.GetAsync("/api/v1/eclipses/" + query);
        if (response.StatusCode == HttpStatusCode.NotFound) Assert.Fail($"404 for {query}");
        await JsonAssert.ProblemNaming(response, field);
    }

    [Fact]
    public async Task A_date_without_an_eclipse_is_not_found()
    {
        var response = await _client.GetAsync("/api/v1/eclipses/2025-03-15/craters");
        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
    }

    // Walk the space: /craters answers for every eclipse with an umbral phase in 2000–2100 and in two-year windows every
    // 500 years over −1999…+3000, under every shadow model, with the invariants of the answer (common practice: a
    // crossing lies between U1 and U4, immersion before emersion, total eclipses reach every feature facing the Earth).
    [Fact]
    public async Task Craters_answer_for_every_umbral_eclipse_under_every_shadow_model()
    {
        var windows = new List<(string From, string To)> { ("2000-01-01", "2100-12-31") };
        for (var year = -1999; year <= 2999; year += 500) windows.Add((Year(year) + "-01-01", Year(year + 1) + "-12-31"));
        var cases = 0;
        var crossings = 0;
        foreach (var shadow in new[] { "danjon", "chauvenet", "none", "layer&layerKm=60" })
        {
            foreach (var (from, to) in windows)
            {
                var list = await Get($"?from={from}&to={to}&kind=partial,total&shadow={shadow}");
                foreach (var e in list.GetProperty("eclipses").EnumerateArray())
                {
                    var date = e.GetProperty("date").GetString();
                    var contacts = e.GetProperty("contacts").EnumerateArray().ToDictionary(c => c.GetProperty("name").GetString()!, c => Seconds(c));
                    var json = await Get($"{date}/craters?shadow={shadow}");
                    cases++;
                    Assert.Equal(shadow.Split('&')[0], json.GetProperty("shadowModel").GetString());
                    foreach (var f in json.GetProperty("features").EnumerateArray().Where(f => f.GetProperty("reachedByUmbra").GetBoolean()))
                    {
                        var (a, b) = (Seconds(f.GetProperty("immersion")), Seconds(f.GetProperty("emersion")));
                        Assert.True(a < b);
                        Assert.True(a >= contacts["U1"] - 1 && b <= contacts["U4"] + 1, $"{shadow} {date} {f.GetProperty("name")}");
                        crossings += 2;
                    }
                    if (e.GetProperty("kind").GetString() == "total")
                        Assert.Contains(json.GetProperty("features").EnumerateArray(), f => f.GetProperty("reachedByUmbra").GetBoolean());
                    if (cases % 7 == 0)
                    {
                        var csv = await _client.GetStringAsync($"/api/v1/eclipses/{date}/craters?shadow={shadow}&format=csv");
                        Assert.Equal(json.GetProperty("features").GetArrayLength() + 1, csv.Split("\r\n", StringSplitOptions.RemoveEmptyEntries).Length);
                    }
                }
            }
        }
        output.WriteLine($"{cases} eclipse × model answers, {crossings} umbral crossings checked");
        Assert.True(cases > 500);
    }

    // An ordering key in seconds for ISO instants of any year (negative years too); exact within a month, which is all
    // an eclipse night needs.
    private static double Seconds(JsonElement instant)
    {
        var text = instant.GetProperty("utc").GetString()!;
        var negative = text.StartsWith('-');
        var parts = text.TrimStart('-').TrimEnd('Z').Split('-', 'T', ':');
        var year = int.Parse(parts[0], CultureInfo.InvariantCulture) * (negative ? -1 : 1);
        return ((year * 13.0 + int.Parse(parts[1], CultureInfo.InvariantCulture)) * 32 + int.Parse(parts[2], CultureInfo.InvariantCulture)) * 86400
            + int.Parse(parts[3], CultureInfo.InvariantCulture) * 3600 + int.Parse(parts[4], CultureInfo.InvariantCulture) * 60
            + double.Parse(parts[5], CultureInfo.InvariantCulture);
    }

    private static string Year(int year) => year < 0 ? "-" + (-year).ToString("0000", CultureInfo.InvariantCulture) : year.ToString("0000", CultureInfo.InvariantCulture);
}
