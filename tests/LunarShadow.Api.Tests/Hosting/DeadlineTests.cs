using System.Net;
using System.Text;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Sites;
using LunarShadow.Astronomy.Time;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Http;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;

namespace LunarShadow.Api.Tests.Hosting;

/// <summary>
/// A request that runs out of time, or whose client goes away, is never answered as if it had finished: no 200, no
/// ETag, nothing a cache may keep, and the work stops.
/// </summary>
public class DeadlineTests
{
    // A search no site can satisfy within the longest scan allowed (1000 years; a polar site, total phase, astronomical night only, a 1° horizon
    // all round of 360 points, and a layer height no other test uses, so the finder starts cold): seconds of work.
    private static readonly string HopelessSearch = "/api/v1/sites/upcoming?lat=89.9&lon=0&from=-1999-01-01&years=1000&phase=total&night=true&count=50&shadow=layer&layerKm=123.4&horizon="
        + string.Join(',', Enumerable.Range(0, 360).Select(a => $"{a}:1"));

    /// <summary>Test-only endpoints behind the whole pipeline: they write part of a body, then wait for cancellation.</summary>
    private sealed class SlowEndpoints(TaskCompletionSource<bool> stopped) : IStartupFilter
    {
        public Action<IApplicationBuilder> Configure(Action<IApplicationBuilder> next) => app =>
        {
            next(app);
            app.Run(async context =>
            {
                if (!context.Request.Path.StartsWithSegments("/api/test-slow")) { context.Response.StatusCode = 404; return; }
                context.Response.ContentType = "application/json";
                await context.Response.WriteAsync("{\"partial\":[1,2,3", CancellationToken.None);
                if (HttpMethods.IsPost(context.Request.Method)) await context.Response.Body.FlushAsync(CancellationToken.None); // streaming: the response has started
                try
                {
                    await Task.Delay(Timeout.Infinite, context.RequestAborted);
                }
                catch (OperationCanceledException)
                {
                    stopped.TrySetResult(true);
                    throw;
                }
            });
        };
    }

    private static WebApplicationFactory<Program> Host(string timeoutSeconds, TaskCompletionSource<bool>? stopped = null) =>
        new WebApplicationFactory<Program>().WithWebHostBuilder(b =>
        {
            b.UseSetting("RequestTimeoutSeconds", timeoutSeconds);
            b.UseSetting("RateLimiting:PermitsPerSecond", "1000");
            b.UseSetting("RateLimiting:Burst", "1000");
            b.ConfigureServices(s => s.AddSingleton<IStartupFilter>(new SlowEndpoints(stopped ?? new TaskCompletionSource<bool>())));
        });

    private static async Task AssertTimeoutProblem(HttpResponseMessage response)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.ServiceUnavailable, $"{(int)response.StatusCode}: {body[..Math.Min(body.Length, 300)]}");
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        Assert.True(response.Headers.CacheControl?.NoStore, "Cache-Control: no-store");
        Assert.False(response.Headers.CacheControl?.Public ?? false);
        Assert.Null(response.Headers.ETag);
        Assert.Contains("ran out of", body, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_search_that_runs_out_of_time_gets_a_503_problem_with_no_store_and_no_ETag_every_time()
    {
        await using var factory = Host("0.02"); // far shorter than the search, however fast the machine (it once finished inside 0.3 s on a quiet one)
        var client = factory.CreateClient();
        await AssertTimeoutProblem(await client.GetAsync(HopelessSearch));
        // Nothing was cached from the first: the same URL again is again a fresh 503, not a stored body.
        await AssertTimeoutProblem(await client.GetAsync(HopelessSearch));
    }

    [Fact]
    public async Task A_body_cut_short_by_the_deadline_is_never_sent_or_tagged()
    {
        var stopped = new TaskCompletionSource<bool>();
        await using var factory = Host("0.3", stopped);
        var client = factory.CreateClient();
        var response = await client.GetAsync("/api/test-slow");
        await AssertTimeoutProblem(response);
        Assert.DoesNotContain("partial", await response.Content.ReadAsStringAsync(), StringComparison.Ordinal);
        Assert.True(await stopped.Task.WaitAsync(TimeSpan.FromSeconds(10)));
    }

    [Fact]
    public async Task A_streamed_answer_cut_short_by_the_deadline_is_aborted_rather_than_completed()
    {
        await using var factory = Host("0.3");
        var client = factory.CreateClient();
        // The response had started, so no status can change any more: the connection is cut and the client sees an
        // incomplete message, never a complete 200 a cache could keep.
        await Assert.ThrowsAnyAsync<Exception>(async () =>
        {
            var response = await client.PostAsync("/api/test-slow", new StringContent("{}", Encoding.UTF8, "application/json"));
            await response.Content.ReadAsStringAsync();
        });
    }

    [Fact]
    public async Task When_the_client_goes_away_the_work_is_cancelled()
    {
        var stopped = new TaskCompletionSource<bool>();
        await using var factory = Host("600", stopped);
        var client = factory.CreateClient();
        using var gone = new CancellationTokenSource(TimeSpan.FromMilliseconds(300));
        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => client.GetAsync("/api/test-slow", gone.Token));
        Assert.True(await stopped.Task.WaitAsync(TimeSpan.FromSeconds(10)));
    }

    [Fact]
    public void The_upcoming_scan_stops_when_cancelled_even_when_nothing_qualifies()
    {
        // A cold finder (a layer height used nowhere else) and criteria nothing meets: the full scan takes seconds.
        ShadowModel.TryParse("layer", 111.1, out var model);
        var site = Site.At(89.9, 0);
        using var cancel = new CancellationTokenSource(TimeSpan.FromMilliseconds(100));
        Assert.ThrowsAny<OperationCanceledException>(() => UpcomingEclipses.From(EclipseFinder.For(model), site,
            new TimeScaleConverter(DeltaTModelCatalog.Default), TtInstant.FromJulianDate(JulianDate.FromCalendar(-1999, 1, 1, false).Day),
            new UpcomingCriteria(EclipsePhase.Total, AstronomicalNightOnly: true), cancel.Token).ToList());
    }

    [Fact]
    public void The_catalogue_scan_stops_at_the_next_full_Moon_once_cancelled()
    {
        using var cancel = new CancellationTokenSource();
        var seen = 0;
        Assert.ThrowsAny<OperationCanceledException>(() =>
        {
            foreach (var _ in EclipseFinder.For(ShadowModel.Danjon).Between(TtInstant.FromJulianDate(2451545.0), TtInstant.FromJulianDate(2451545.0 + 36525), cancel.Token))
            {
                seen++;
                cancel.Cancel();
            }
        });
        Assert.Equal(1, seen);
    }
}
