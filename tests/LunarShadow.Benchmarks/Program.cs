using BenchmarkDotNet.Running;
using LunarShadow.Benchmarks;

// Micro-benchmarks:  dotnet run -c Release --project tests/LunarShadow.Benchmarks -- --filter '*'   (add --job short)
// Eclipse search:    dotnet run -c Release --project tests/LunarShadow.Benchmarks -- span
// Cold catalogue:    dotnet run -c Release --project tests/LunarShadow.Benchmarks -- cold [rounds] [service dll]   (fresh
//                    service processes against astronomy-engine's search; needs node and npm; the dll defaults to the
//                    Release build, give a published one, e.g. ReadyToRun, to time that)
if (args is ["cold", ..])
{
    ColdCatalogueTiming.Run(args.Length > 1 ? int.Parse(args[1], System.Globalization.CultureInfo.InvariantCulture) : 3, args.Length > 2 ? args[2] : null);
    return;
}
if (args is ["span", ..])
{
    EclipseSpanTiming.Run();
    return;
}
BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
