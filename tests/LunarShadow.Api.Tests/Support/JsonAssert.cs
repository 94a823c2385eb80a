using System.Net;
using System.Text.Json;

namespace LunarShadow.Api.Tests.Support;

internal static class JsonAssert
{
    public static async Task<JsonElement> OkJson(HttpResponseMessage response)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.OK, $"{(int)response.StatusCode}: {body}");
        return JsonDocument.Parse(body).RootElement;
    }

    /// <summary>Asserts an RFC 9457 400 response whose errors name the field.</summary>
    public static async Task<JsonElement> ProblemNaming(HttpResponseMessage response, string field)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.BadRequest, $"{(int)response.StatusCode}: {body}");
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        var root = JsonDocument.Parse(body).RootElement;
        Assert.Equal(400, root.GetProperty("status").GetInt32());
        Assert.True(root.GetProperty("errors").TryGetProperty(field, out _), $"no error for '{field}' in {body}");
        return root;
    }
}
