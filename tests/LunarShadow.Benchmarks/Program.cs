using BenchmarkDotNet.Running;
using LunarShadow.Benchmarks;

// Micro-benchmarks:  dotnet run -c Release --project tests/LunarShadow.Benchmarks -- --filter '*'   (add --job short)
// Eclipse search:    dotnet run -c Release --project tests/LunarShadow.Benchmarks -- span
if (args is ["span", ..])
{
    EclipseSpanTiming.Run();
    return;
}
BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
