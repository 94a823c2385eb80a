// Test classes run one after another. The frozen-logger race that first made this necessary is gone (each host has
// its own logger; HostLoggingTests starts six at once), but several classes start hosts that run searches for seconds
// or a published copy of the service, and on a small shared machine running them one at a time keeps their deadlines
// and probes steady.
[assembly: CollectionBehavior(DisableTestParallelization = true)]
