using System.Reflection;
using BenchmarkDotNet.Running;
using Integrable.Benchmarks;

// Two modes:
//   dotnet run -c Release --project benchmarks/Integrable.Benchmarks -- W1 15
//       runs one workload once (median of a few repetitions inside) and prints one line of
//       result figures, for side-by-side comparison with ../shared/anchors;
//   dotnet run -c Release --project benchmarks/Integrable.Benchmarks -- --filter '*Fateman*'
//       runs the BenchmarkDotNet suite.
var workloads = typeof(IWorkload).Assembly.GetTypes()
    .Where(t => typeof(IWorkload).IsAssignableFrom(t) && !t.IsAbstract && !t.IsInterface)
    .Select(t => (IWorkload)Activator.CreateInstance(t)!)
    .ToDictionary(w => w.Name, StringComparer.OrdinalIgnoreCase);

if (args.Length > 0 && workloads.TryGetValue(args[0], out var workload))
{
    Console.WriteLine(workload.Run(args[1..]));
    return 0;
}
if (args.Length > 0 && !args[0].StartsWith('-'))
{
    Console.Error.WriteLine($"unknown workload '{args[0]}'; known: {string.Join(", ", workloads.Keys.Order())}");
    return 2;
}
BenchmarkSwitcher.FromAssembly(Assembly.GetExecutingAssembly()).Run(args);
return 0;
