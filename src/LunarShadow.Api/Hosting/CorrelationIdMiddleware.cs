using System.Text.RegularExpressions;
using Serilog.Context;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Echoes the caller's X-Correlation-Id (1–64 characters of letters, digits, '-', '_', '.') or makes one, and tags every
/// log line of the request with it.
/// </summary>
internal sealed partial class CorrelationIdMiddleware(RequestDelegate next)
{
    public const string Header = "X-Correlation-Id";

    public async Task InvokeAsync(HttpContext context)
    {
        var given = context.Request.Headers[Header].ToString();
        var id = Acceptable().IsMatch(given) ? given : context.TraceIdentifier;
        context.Response.OnStarting(() =>
        {
            context.Response.Headers[Header] = id;
            return Task.CompletedTask;
        });
        using (LogContext.PushProperty("CorrelationId", id))
            await next(context);
    }

    [GeneratedRegex("^[A-Za-z0-9._-]{1,64}$", RegexOptions.CultureInvariant)]
    private static partial Regex Acceptable();
}
