using System.Text.Json;
using LunarShadow.Api.Tests.Support;

namespace LunarShadow.Api.Tests.Observations;

/// <summary>The OpenAPI document shows the observation body and that only the write needs the bearer key (OpenAPI 3.1, "Security Scheme Object").</summary>
public class ObservationDocumentTests(ApiFactory factory) : IClassFixture<ApiFactory>
{
    [Fact]
    public async Task The_write_requires_the_bearer_scheme_and_documents_its_body_while_the_read_is_public()
    {
        var document = JsonDocument.Parse(await factory.CreateClient().GetStringAsync("/openapi/v1.json")).RootElement;
        var scheme = document.GetProperty("components").GetProperty("securitySchemes").GetProperty("observatoryKey");
        Assert.Equal("http", scheme.GetProperty("type").GetString());
        Assert.Equal("bearer", scheme.GetProperty("scheme").GetString());
        var path = document.GetProperty("paths").GetProperty("/api/v1/eclipses/{date}/observations");
        var post = path.GetProperty("post");
        Assert.True(post.GetProperty("security")[0].TryGetProperty("observatoryKey", out _));
        Assert.False(path.GetProperty("get").TryGetProperty("security", out _));
        var oneOf = post.GetProperty("requestBody").GetProperty("content").GetProperty("application/json").GetProperty("schema").GetProperty("oneOf");
        var item = oneOf[0];
        Assert.Equal(["crater-timing", "danjon"], item.GetProperty("properties").GetProperty("kind").GetProperty("enum").EnumerateArray().Select(e => e.GetString()));
        Assert.Equal(4, item.GetProperty("properties").GetProperty("value").GetProperty("maximum").GetDouble());
        Assert.True(item.GetProperty("properties").GetProperty("site").GetProperty("properties").TryGetProperty("lat", out _));
        Assert.Equal("array", oneOf[1].GetProperty("type").GetString());
        Assert.Equal(500, oneOf[1].GetProperty("maxItems").GetInt32());
    }
}
