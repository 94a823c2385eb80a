using System.Globalization;
using Microsoft.Net.Http.Headers;

namespace LunarShadow.Api.Hosting;

/// <summary>
/// Gives every request a deadline (configuration "RequestTimeoutSeconds", default 30) and makes sure an aborted request
/// never looks like an answer: the endpoint sees the deadline through <see cref="HttpContext.RequestAborted"/> and stops;
/// a request that ran out of time gets a 503 problem response with <c>Cache-Control: no-store</c> and no ETag; one whose
/// client went away is dropped; and a response that had already started is cut off (the connection is aborted), so that
/// no cache can keep a partial body as if it were whole.
/// </summary>
internal sealed partial class RequestDeadlineMiddleware(RequestDelegate next, IConfiguration configuration, ILogger<RequestDeadlineMiddleware> logger)
{
    /// <summary>Default seconds a request may run.</summary>
    public const double DefaultSeconds = 30;

    private readonly TimeSpan _timeout = TimeSpan.FromSeconds(Math.Clamp(configuration.GetValue("RequestTimeoutSeconds", DefaultSeconds), 0.01, 3600));

    public async Task InvokeAsync(HttpContext context)
    {
        var clientGone = context.RequestAborted;
        using var deadline = CancellationTokenSource.CreateLinkedTokenSource(clientGone);
        deadline.CancelAfter(_timeout);
        context.RequestAborted = deadline.Token;
        try
        {
            await next(context);
        }
        catch (OperationCanceledException) when (deadline.IsCancellationRequested)
        {
            if (clientGone.IsCancellationRequested)
            {
                ClientWentAway(logger, context.Request.Path.Value);
                context.Abort();
                return;
            }
            RanOutOfTime(logger, context.Request.Path.Value, _timeout.TotalSeconds);
            if (context.Response.HasStarted)
            {
                context.Abort();
                return;
            }
            context.RequestAborted = clientGone;
            await WriteTimeoutAsync(context);
        }
        finally
        {
            context.RequestAborted = clientGone;
        }
    }

    private Task WriteTimeoutAsync(HttpContext context)
    {
        var response = context.Response;
        response.Clear();
        response.StatusCode = StatusCodes.Status503ServiceUnavailable;
        response.Headers[HeaderNames.CacheControl] = "no-store";
        response.Headers.RetryAfter = "5";
        var seconds = _timeout.TotalSeconds.ToString("0.###", CultureInfo.InvariantCulture);
        return Results.Problem(
            detail: $"The request ran out of its {seconds} s and was stopped. Ask for less (a shorter range, fewer sites or eclipses, a shorter horizon) or try again later.",
            statusCode: StatusCodes.Status503ServiceUnavailable, title: "The request took too long.",
            type: "https://lunarshadow.invalid/problems/timeout").ExecuteAsync(context);
    }

    [LoggerMessage(Level = LogLevel.Information, Message = "The client went away; work on {Path} stopped.")]
    private static partial void ClientWentAway(ILogger logger, string? path);

    [LoggerMessage(Level = LogLevel.Warning, Message = "{Path} ran out of its {Seconds} s and stopped.")]
    private static partial void RanOutOfTime(ILogger logger, string? path, double seconds);
}
