using System.Net;
using System.Text;
using System.Text.Json;
using System.Text.RegularExpressions;
using CsvHelper;
using LunarShadow.Api.Tests.Support;
using Calendar = Ical.Net.Calendar;

namespace LunarShadow.Api.Tests.Exports;

/// <summary>User text cannot inject calendar properties or spreadsheet formulas; every download is a named attachment.</summary>
[Collection(ExportHost.Name)]
public partial class InjectionAndDownloadTests(UnthrottledApiFactory factory)
{
    private readonly HttpClient _client = factory.CreateClient();

    // RFC 5545 §3.1 and §3.3.11: content lines end in CRLF and TEXT escapes line breaks as \n; no other control
    // characters are allowed. A bare CR, LF, NUL, ESC or VT in a site name must neither start a property nor survive.
    [Theory]
    [InlineData("Hall%0DX-INJECTED:1")]
    [InlineData("Hall%0AEND:VEVENT%0D%0ABEGIN:VEVENT%0D%0AX-INJECTED:1")]
    [InlineData("Hall%00%1B%0Bname")]
    [InlineData("Hall%0D%0A X-INJECTED:folded")]
    public async Task Control_characters_in_a_name_never_add_calendar_properties(string name)
    {
        foreach (var url in new[]
        {
            $"/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74&tz=America/New_York&open=22:00-05:00&name={name}&format=ics",
            $"/api/v1/sites/upcoming?lat=40.7&lon=-74&from=2025-01-01&count=3&name={name}&format=ics",
            $"/api/v1/eclipses/2025-03-14/photo-plan?lat=40.7&lon=-74&tz=America/New_York&name={name}&format=ics",
        })
        {
            var response = await _client.GetAsync(url);
            if (response.StatusCode == HttpStatusCode.BadRequest) continue; // refusing the name outright is also safe
            Assert.Equal(HttpStatusCode.OK, response.StatusCode);
            var text = await response.Content.ReadAsStringAsync();
            Assert.DoesNotContain(text, c => c is '\0' or '\u001b' or '\u000b');
            Assert.DoesNotContain(text.Split("\r\n"), line => line.StartsWith("X-INJECTED", StringComparison.Ordinal));
            Assert.DoesNotContain('\r', text.Replace("\r\n", "", StringComparison.Ordinal));
            Assert.DoesNotContain('\n', text.Replace("\r\n", "", StringComparison.Ordinal));
            var calendar = Calendar.Load(text)!;
            Assert.DoesNotContain(calendar.Properties, p => p.Name.StartsWith("X-INJECTED", StringComparison.Ordinal));
            Assert.All(calendar.Events, e => Assert.DoesNotContain(e.Properties, p => p.Name.StartsWith("X-INJECTED", StringComparison.Ordinal)));
            Assert.Equal(text.Split("\r\n").Count(l => l == "BEGIN:VEVENT"), calendar.Events.Count);
        }
    }

    // OWASP "CSV Injection": cells beginning with = + - @, tab or CR are prefixed with a single quote; numbers and ISO
    // dates with a minus sign stay data.
    [Theory]
    [InlineData("=HYPERLINK(\"http://example.invalid\",\"x\")", "'=HYPERLINK(\"http://example.invalid\",\"x\")")]
    [InlineData("+cmd|' /C calc'!A0", "'+cmd|' /C calc'!A0")]
    [InlineData("-2+3+cmd|' /C calc'!A0", "'-2+3+cmd|' /C calc'!A0")]
    [InlineData("@SUM(1+1)", "'@SUM(1+1)")]
    [InlineData("\t=1+1", "'\t=1+1")]
    [InlineData("\r=1+1", "'\r=1+1")]
    [InlineData("Quay", "Quay")]
    [InlineData("-12.5", "-12.5")]
    [InlineData("-0584-05-28", "-0584-05-28")]
    [InlineData("-1999-06-26T13:00:00.000Z", "-1999-06-26T13:00:00.000Z")]
    [InlineData("2025-03-13T23:57:28.572-04:00", "2025-03-13T23:57:28.572-04:00")]
    public void Formula_leading_text_cells_are_neutralised_and_data_is_not(string cell, string written) =>
        Assert.Equal(written, LunarShadow.Api.Formatting.CsvWriter.Neutralise(cell));

    [Fact]
    public async Task Batch_csv_neutralises_formula_names_and_reads_back_with_CsvHelper()
    {
        string[] names = ["=HYPERLINK(\"http://example.invalid\")", "+cmd|' /C calc'!A0", "@SUM(1+1)", "-1+1", "\t=1+1", "\r=1+1", "Quay, north"];
        var body = JsonSerializer.Serialize(new { sites = names.Select(n => new { lat = 51.5, lon = -0.12, name = n }) });
        var response = await _client.PostAsync("/api/v1/eclipses/2025-03-14/local?format=csv", new StringContent(body, Encoding.UTF8, "application/json"));
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        using var csv = CsvReader.FromText(await response.Content.ReadAsStringAsync(), new CsvReaderOptions { HasHeader = true });
        var read = new List<string>();
        while (csv.Read()) read.Add(csv.GetString("name"));
        Assert.Equal(names.Length, read.Count);
        foreach (var (cell, name) in read.Zip(names))
        {
            if (name == "Quay, north") Assert.Equal(name, cell);
            else
            {
                Assert.StartsWith("'", cell, StringComparison.Ordinal);
                Assert.Equal(name.Trim(), cell[1..].Trim());
            }
        }
    }

    // RFC 6266: Content-Disposition: attachment with a file name; ours are lower-case ASCII slugs naming the eclipse date,
    // the site and the kind of file.
    [Theory]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74&tz=America/New_York&name=Saltmarsh%20Bay%20Planetarium&format=csv", "lunar-eclipse-2025-03-14-saltmarsh-bay-planetarium-local.csv")]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=40.7&lon=-74&tz=America/New_York&name=Saltmarsh%20Bay%20Planetarium&format=ics", "lunar-eclipse-2025-03-14-saltmarsh-bay-planetarium-local.ics")]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=-33.45&lon=-70.67&format=ics", "lunar-eclipse-2025-03-14-33.45s-70.67w-local.ics")]
    [InlineData("/api/v1/eclipses/2025-03-14/local?lat=48.2&lon=16.37&name=Sternwarte%20K%C3%BCnigsberg%20%2F%20Dach&format=csv", "lunar-eclipse-2025-03-14-sternwarte-kunigsberg-dach-local.csv")]
    [InlineData("/api/v1/eclipses/2025-03-14/photo-plan?lat=40.7&lon=-74&name=Quay&format=csv", "lunar-eclipse-2025-03-14-quay-photo-plan.csv")]
    [InlineData("/api/v1/eclipses/2025-03-14/photo-plan?lat=40.7&lon=-74&name=Quay&format=ics", "lunar-eclipse-2025-03-14-quay-photo-plan.ics")]
    [InlineData("/api/v1/eclipses/2025-03-14/photo-plan?lat=40.7&lon=-74&name=Quay&format=sequence", "lunar-eclipse-2025-03-14-quay-photo-sequence.json")]
    [InlineData("/api/v1/sites/upcoming?lat=40.7&lon=-74&from=2025-01-01&count=2&name=Quay&format=csv", "lunar-eclipses-visible-from-quay.csv")]
    [InlineData("/api/v1/sites/upcoming?lat=40.7&lon=-74&from=2025-01-01&count=2&name=Quay&format=ics", "lunar-eclipses-visible-from-quay.ics")]
    [InlineData("/api/v1/eclipses?from=2025-01-01&to=2026-12-31&format=csv", "lunar-eclipses-2025-01-01-to-2026-12-31.csv")]
    [InlineData("/api/v1/eclipses/2025-03-14?format=csv", "lunar-eclipse-2025-03-14.csv")]
    [InlineData("/api/v1/eclipses/2025-03-14/visibility-map", "lunar-eclipse-2025-03-14-visibility-map.geojson")]
    public async Task Every_download_is_an_attachment_with_a_safe_meaningful_name(string url, string fileName)
    {
        var response = await _client.GetAsync(url);
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var disposition = response.Content.Headers.ContentDisposition;
        Assert.NotNull(disposition);
        Assert.Equal("attachment", disposition!.DispositionType);
        Assert.Equal(fileName, disposition.FileName?.Trim('"'));
        Assert.Matches(SafeName(), fileName);
    }

    [Fact]
    public async Task A_batch_csv_is_an_attachment_named_by_the_eclipse()
    {
        var body = new StringContent("""{"sites":[{"lat":51.5,"lon":-0.12}]}""", Encoding.UTF8, "application/json");
        var response = await _client.PostAsync("/api/v1/eclipses/2025-03-14/local?format=csv", body);
        Assert.Equal("lunar-eclipse-2025-03-14-sites.csv", response.Content.Headers.ContentDisposition?.FileName?.Trim('"'));
    }

    [GeneratedRegex("^[a-z0-9.-]+\\.(csv|ics|geojson|json)$")]
    private static partial Regex SafeName();
}
