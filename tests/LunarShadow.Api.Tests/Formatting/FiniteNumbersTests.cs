using System.Text.Json;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Tests.Support;
using Microsoft.Extensions.DependencyInjection;

namespace LunarShadow.Api.Tests.Formatting;

public class FiniteNumbersTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    private sealed record Probe(double Value, double? Maybe, double[] Many);

    // RFC 8259 §6: NaN and infinities are not JSON numbers; the guard turns one into a loud failure, never a null.
    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(double.NegativeInfinity)]
    public void A_non_finite_number_throws_at_the_JSON_boundary(double bad)
    {
        Assert.Throws<NonFiniteNumberException>(() => JsonSerializer.Serialize(new Probe(bad, 1, [1]), FiniteNumbers.Web));
        Assert.Throws<NonFiniteNumberException>(() => JsonSerializer.Serialize(new Probe(1, bad, [1]), FiniteNumbers.Web));
        Assert.Throws<NonFiniteNumberException>(() => JsonSerializer.Serialize(new Probe(1, null, [1, bad]), FiniteNumbers.Web));
        Assert.Equal("{\"value\":1.5,\"maybe\":null,\"many\":[2]}", JsonSerializer.Serialize(new Probe(1.5, null, [2]), FiniteNumbers.Web));
    }

    [Fact]
    public async Task The_host_writes_with_the_guard_and_the_OpenAPI_document_still_types_numbers_as_numbers()
    {
        var options = factory.Services.GetRequiredService<Microsoft.Extensions.Options.IOptions<Microsoft.AspNetCore.Http.Json.JsonOptions>>().Value.SerializerOptions;
        Assert.Throws<NonFiniteNumberException>(() => JsonSerializer.Serialize(new Probe(double.NaN, 1, [1]), options));
        var doc = await JsonAssert.OkJson(await factory.CreateClient().GetAsync("/openapi/v1.json"));
        var row = doc.GetProperty("components").GetProperty("schemas").GetProperty("TimelineRowResponse").GetProperty("properties");
        Assert.Contains("number", row.GetProperty("brightnessStops").GetProperty("type").ToString(), StringComparison.Ordinal);
    }
}
