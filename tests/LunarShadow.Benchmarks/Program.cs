using BenchmarkDotNet.Running;

// Run all: dotnet run -c Release --project tests/LunarShadow.Benchmarks -- --filter '*'
// One:     dotnet run -c Release --project tests/LunarShadow.Benchmarks -- --filter '*ApparentPlace*'
BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
