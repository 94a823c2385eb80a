using LunarShadow.Api.Hosting;

namespace LunarShadow.Api.Tests.Hosting;

// How a search is lent the machine's cores, and where the readiness warm-up sends its request. Expected values follow
// from the options' own contract (docs/operations.md) and RFC 3986 host forms; no outside figure is involved.
public class SearchThreadsAndWarmUpTests
{
    [Fact]
    public void A_search_gets_every_core_while_its_request_is_alone_and_gives_one_back_when_another_arrives()
    {
        var inFlight = new RequestsInFlight(new RateLimitOptions { ThreadsPerSearch = 1, ThreadsPerSearchWhenAlone = 2 });
        Assert.Equal(2, inFlight.ThreadsForNextSearchStep()); // nothing counted yet (a search outside a request)
        using (inFlight.Enter())
        {
            Assert.Equal(2, inFlight.ThreadsForNextSearchStep());
            using (inFlight.Enter())
            {
                Assert.Equal(2, inFlight.Count);
                Assert.Equal(1, inFlight.ThreadsForNextSearchStep());
            }
            Assert.Equal(2, inFlight.ThreadsForNextSearchStep());
        }
        Assert.Equal(0, inFlight.Count);
    }

    [Fact]
    public void Thread_counts_below_one_still_give_one_thread()
    {
        var inFlight = new RequestsInFlight(new RateLimitOptions { ThreadsPerSearch = 0, ThreadsPerSearchWhenAlone = 0 });
        Assert.Equal(1, inFlight.ThreadsForNextSearchStep());
    }

    [Theory]
    [InlineData("http://+:8080", "http://127.0.0.1:8080/")]
    [InlineData("http://*:8080", "http://127.0.0.1:8080/")]
    [InlineData("http://0.0.0.0:5080", "http://127.0.0.1:5080/")]
    [InlineData("http://[::]:5080", "http://127.0.0.1:5080/")]
    [InlineData("http://localhost:5080", "http://localhost:5080/")]
    [InlineData("http://127.0.0.1:41234", "http://127.0.0.1:41234/")]
    [InlineData("http://[::1]:5080", "http://[::1]:5080/")]
    public void The_warm_up_calls_a_wildcard_listener_on_the_loopback_address(string listening, string called) =>
        Assert.Equal(called, PipelineWarmUp.LoopbackBase(listening)?.ToString());

    [Theory]
    [InlineData("https://+:8443")]
    [InlineData("http://unix:/run/lunarshadow.sock")]
    [InlineData("not an address")]
    public void The_warm_up_sends_nothing_where_it_cannot_call_plain_HTTP(string listening) =>
        Assert.Null(PipelineWarmUp.LoopbackBase(listening));
}
