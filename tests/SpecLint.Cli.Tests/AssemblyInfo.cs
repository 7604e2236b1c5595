// The CLI is run in-process with the working directory set per test, so tests must not run in parallel.
[assembly: CollectionBehavior(DisableTestParallelization = true)]
