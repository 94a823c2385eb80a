// Test classes run one after another: each starts its own in-memory host, and two hosts starting at once race on
// Serilog's process-wide bootstrap logger ("The logger is already frozen"). Remove once the host no longer shares it.
[assembly: CollectionBehavior(DisableTestParallelization = true)]
