using System.Diagnostics;
using System.Globalization;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

/// <summary>W5: exact nullspace over Q of the matrices of ../shared/anchors/w5_nullspace.
/// usage: W5 FILE [REPS]            (a file written by gen_matrices.py: "rows cols", then rows of "p" or "p/q")
///        W5 random R C DEF [REPS]  or  W5 orbit M D [REPS]   (the same matrices built in process)
/// prints nullity=k seconds=median, where the time covers the whole nullspace computation including its
/// exact verification (the share of the verification and of the denominator clearing is printed too).</summary>
public sealed class W5Workload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "W5";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        if (args.Length < 1) return "usage: W5 FILE [REPS] | W5 random R C DEF [REPS] | W5 orbit M D [REPS]";
        var load = Stopwatch.StartNew();
        int rows, cols, next;
        Rational[] data;
        string name;
        if (args[0] == "random")
        {
            (rows, cols, data) = W5Matrices.Random(Int(args[1]), Int(args[2]), Int(args[3]));
            name = $"random_{rows}x{cols}_def{Int(args[3])}";
            next = 4;
        }
        else if (args[0] == "orbit")
        {
            (rows, cols, data) = W5Matrices.Orbit(Int(args[1]), Int(args[2]));
            name = $"orbit_M{args[1]}_D{args[2]}";
            next = 3;
        }
        else
        {
            (rows, cols, data) = Read(args[0]);
            name = Path.GetFileNameWithoutExtension(args[0]);
            next = 1;
        }
        int reps = args.Length > next ? Int(args[next]) : 3;
        double loadSeconds = load.Elapsed.TotalSeconds;

        // Untimed runs first (JIT tiering: at least three runs and half a second), then the timed runs;
        // each run starts from the rational matrix, so nothing is cached between runs.
        var kernel = RationalMatrix.FromRowMajor(rows, cols, data).Nullspace();
        var warm = Stopwatch.StartNew();
        for (int w = 0; w < 3 || warm.Elapsed.TotalSeconds < 0.5; w++)
            RationalMatrix.BuildKernel(RationalElimination.Echelon(data, rows, cols, EliminationOptions.Default), cols);
        var times = new double[reps];
        var verify = new double[reps];
        var clear = new double[reps];
        var cpu = new double[reps];
        EliminationDiagnostics diag = new();
        int gen2 = GC.CollectionCount(2), gen0 = GC.CollectionCount(0);
        var proc = Process.GetCurrentProcess();
        for (int r = 0; r < reps; r++)
        {
            diag = new EliminationDiagnostics();
            var options = new EliminationOptions { Diagnostics = diag };
            proc.Refresh();
            double c0 = proc.TotalProcessorTime.TotalSeconds;
            var sw = Stopwatch.StartNew();
            var e = RationalElimination.Echelon(data, rows, cols, options);
            var k = RationalMatrix.BuildKernel(e, cols);
            times[r] = sw.Elapsed.TotalSeconds;
            proc.Refresh();
            cpu[r] = proc.TotalProcessorTime.TotalSeconds - c0;
            verify[r] = diag.VerificationTime.TotalSeconds;
            clear[r] = diag.ClearingTime.TotalSeconds;
            if (k != kernel) throw new InvalidOperationException("runs disagree");
        }
        double median = Median(times);
        double cpuMedian = Median(cpu);
        gen2 = GC.CollectionCount(2) - gen2;
        gen0 = GC.CollectionCount(0) - gen0;

        // Independent check outside the timing, by the public API: A·v = 0 for every basis vector.
        var a = RationalMatrix.FromRowMajor(rows, cols, data);
        bool ok = (a * kernel.Transpose()).IsZero;
        return $"RESULT tool=integrable workload=W5 matrix={name} size={rows}x{cols} rank={cols - kernel.RowCount} " +
               $"nullity={kernel.RowCount} seconds={Timing.Seconds(median)} reps={reps} check={(ok ? "ok" : "FAILED")} min_s={Timing.Seconds(times.Min())} " +
               $"verify_s={Timing.Seconds(Median(verify))} clear_s={Timing.Seconds(Median(clear))} primes={diag.PrimesUsed} " +
               $"method={diag.MethodUsed} cpu_s={Timing.Seconds(cpuMedian)} gc0={gen0} gc2={gen2} load_s={loadSeconds:F2}";
    }

    private static int Int(string s) => int.Parse(s, CultureInfo.InvariantCulture);

    private static double Median(double[] values)
    {
        var v = (double[])values.Clone();
        Array.Sort(v);
        return v[v.Length / 2];
    }

    /// <summary>Reads the generator's text format.</summary>
    internal static (int Rows, int Cols, Rational[] Data) Read(string path)
    {
        using var reader = new StreamReader(path);
        var head = (reader.ReadLine() ?? throw new FormatException($"{path}: empty file")).Split(' ', StringSplitOptions.RemoveEmptyEntries);
        int rows = Int(head[0]), cols = Int(head[1]);
        var data = new Rational[rows * cols];
        for (int i = 0; i < rows; i++)
        {
            var line = reader.ReadLine() ?? throw new FormatException($"{path}: missing row {i}");
            var tokens = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            if (tokens.Length != cols) throw new FormatException($"{path}: row {i} has {tokens.Length} entries, expected {cols}");
            for (int j = 0; j < cols; j++) data[i * cols + j] = Rational.Parse(tokens[j]);
        }
        return (rows, cols, data);
    }
}
