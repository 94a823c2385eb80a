// Test classes run in parallel (xUnit's default: one collection per class, as many at once as there are cores).
// It is safe because nothing is shared between hosts: each host has its own logger (HostLoggingTests starts six at
// once and checks the static Serilog logger is never touched), its own rate limiters, output cache and eclipse caches
// (DI singletons); in-memory hosts open no ports; no test sets environment variables; and the library's shared
// eclipse caches are thread-safe. Deadline and cost tests allow for a busy machine (their work outlasts their
// deadlines many times over). The one exception runs alone: RunsAlone below.
[assembly: CollectionBehavior(CollectionBehavior.CollectionPerClass, DisableTestParallelization = false)]

namespace LunarShadow.Api.Tests.Support;

/// <summary>
/// Tests that start a published copy of the service on a real port and probe it with per-try time limits, as the
/// container runtime would: they run after the parallel collections, alone, so that the probes' limits hold.
/// </summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class RunsAlone
{
    /// <summary>The collection's name.</summary>
    public const string Name = "runs alone";
}
