using BenchmarkDotNet.Running;
using LunarShadow.Benchmarks;

// Micro-benchmarks:  dotnet run -c Release --project tests/LunarShadow.Benchmarks -- --filter '*'   (add --job short)
// Eclipse search:    dotnet run -c Release --project tests/LunarShadow.Benchmarks -- span
// Cold catalogue:    dotnet run -c Release --project tests/LunarShadow.Benchmarks -- cold [rounds]   (fresh service
//                    processes against astronomy-engine's search; needs node and npm)
if (args is ["cold", ..])
{
    ColdCatalogueTiming.Run(args.Length > 1 ? int.Parse(args[1], System.Globalization.CultureInfo.InvariantCulture) : 3);
    return;
}
if (args is ["span", ..])
{
    EclipseSpanTiming.Run();
    return;
}
BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
