using System.Text;
using LunarShadow.Api.Tests.Support;
using Microsoft.AspNetCore.Mvc.Testing;

namespace LunarShadow.Api.Tests.Hosting;

/// <summary>
/// Numbers are read in ASCII digits only, years are range-checked before anything is converted, and JSON text that is
/// not UTF-8 or not Unicode is refused with a 400 naming the field (RFC 8259 §8.1–8.2; RFC 9457 problem responses).
/// </summary>
public class InputParsingTests
{
    private static WebApplicationFactory<Program> Host() => new WebApplicationFactory<Program>().WithWebHostBuilder(b =>
    {
        b.UseSetting("RateLimiting:PermitsPerSecond", "10000");
        b.UseSetting("RateLimiting:Burst", "10000");
    });

    // Digits of other scripts (Unicode category Nd): Arabic-Indic, extended Arabic-Indic, Devanagari, fullwidth.
    public static TheoryData<string, string> OtherScriptDigits => new()
    {
        { "/api/v1/eclipses/2025-٠٣-١٤", "date" },
        { "/api/v1/eclipses/2025-۰۹-۰۷/local?lat=1&lon=1", "date" },
        { "/api/v1/eclipses/２０２６-03-03", "date" },
        { "/api/v1/eclipses/2029-12-२०/photo-plan?lat=1&lon=1", "date" },
        { "/api/v1/eclipses/2025-03-14/local?lat=1&lon=1&open=١٩:00-23:00", "open" },
        { "/api/v1/eclipses/2025-09-07/local?lat=1&lon=1&open=19:00-２３:30", "open" },
        { "/api/v1/ephemeris?utc=2025-03-14T٠٦:00:00Z", "utc" },
        { "/api/v1/ephemeris?utc=2025-03-14T06:00:00.١Z", "utc" },
        { "/api/v1/ephemeris?utc=2025-03-14T06:00+٠٢:00", "utc" },
        { "/api/v1/eclipses?from=٢٠٢٥-01-01&to=2026-01-01", "from" },
        { "/api/v1/sites/upcoming?lat=1&lon=1&from=2025-01-٠١", "from" },
        { "/api/v1/eclipses/2025-03-14/local?lat=٤٧&lon=1", "lat" },
    };

    [Theory]
    [MemberData(nameof(OtherScriptDigits))]
    public async Task Digits_of_other_scripts_get_a_400_naming_the_field(string url, string field)
    {
        await using var factory = Host();
        await JsonAssert.ProblemNaming(await factory.CreateClient().GetAsync(url), field);
    }

    [Theory]
    [InlineData("10000-01-01T00:00Z")]
    [InlineData("-10000-01-01T00:00:00Z")]
    [InlineData("99999-12-31T23:59:59Z")]
    [InlineData("3001-01-01T00:00Z")]
    public async Task Instants_beyond_the_span_are_range_checked_before_conversion(string utc)
    {
        await using var factory = Host();
        var problem = await JsonAssert.ProblemNaming(await factory.CreateClient().GetAsync("/api/v1/ephemeris?utc=" + Uri.EscapeDataString(utc)), "utc");
        Assert.Contains("-1999 to +3000", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
    }

    public static TheoryData<string, byte[], string> MalformedBodies()
    {
        static byte[] With(string before, byte[] bad, string after) => [.. Encoding.UTF8.GetBytes(before), .. bad, .. Encoding.UTF8.GetBytes(after)];
        return new()
        {
            // Not UTF-8 (RFC 3629: 0xFF never occurs; ED A0 80 encodes a surrogate, which UTF-8 forbids).
            { "/api/v1/eclipses/2025-09-07/local", With("{\"sites\":[{\"lat\":1,\"lon\":1},{\"lat\":2,\"lon\":2,\"name\":\"", [0xFF], "\"}]}"), "sites[1].name" },
            { "/api/v1/eclipses/2026-03-03/local", With("{\"sites\":[{\"lat\":1,\"lon\":1,\"tz\":\"Europe/", [0xED, 0xA0, 0x80], "\"}]}"), "sites[0].tz" },
            { "/api/v1/eclipses/2029-12-20/photo-plan", With("{\"lat\":1,\"lon\":1,\"name\":\"", [0xC0, 0xAF], "\"}"), "name" },
            // An escaped lone surrogate (RFC 8259 §8.2: such strings are not Unicode text).
            { "/api/v1/eclipses/2025-09-07/local", Encoding.UTF8.GetBytes("{\"sites\":[{\"lat\":1,\"lon\":1,\"name\":\"Hill \\ud800\"}]}"), "sites[0].name" },
            { "/api/v1/eclipses/2025-09-07/photo-plan", Encoding.UTF8.GetBytes("{\"lat\":1,\"lon\":1,\"tz\":\"\\udfff\"}"), "tz" },
        };
    }

    [Theory]
    [MemberData(nameof(MalformedBodies))]
    public async Task Body_text_that_is_not_UTF_8_or_not_Unicode_gets_a_400_naming_the_field(string path, byte[] body, string field)
    {
        await using var factory = Host();
        var content = new ByteArrayContent(body);
        content.Headers.ContentType = new System.Net.Http.Headers.MediaTypeHeaderValue("application/json");
        await JsonAssert.ProblemNaming(await factory.CreateClient().PostAsync(path, content), field);
    }
}
