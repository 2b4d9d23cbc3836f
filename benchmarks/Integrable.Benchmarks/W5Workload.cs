using System.Diagnostics;
using System.Globalization;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

/// <summary>W5: exact nullspace over Q of a matrix read from a file written by the anchor generator
/// (first line "rows cols", then one row per line, entries "p" or "p/q").
/// usage: W5 FILE [REPS]   prints nullity=k seconds=median (nullspace including its exact check).</summary>
public sealed class W5Workload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "W5";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        if (args.Length < 1) return "usage: W5 FILE [REPS]";
        int reps = args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 3;
        var load = Stopwatch.StartNew();
        var (rows, cols, data) = Read(args[0]);
        double loadSeconds = load.Elapsed.TotalSeconds;
        // Warm-up on a fresh copy (JIT), then timed runs; each run gets a fresh matrix so nothing is cached.
        var warm = RationalMatrix.FromRowMajor(rows, cols, data);
        var kernel = warm.Nullspace();
        var times = new double[reps];
        EliminationDiagnostics? diag = null;
        for (int r = 0; r < reps; r++)
        {
            var d = new EliminationDiagnostics();
            var options = new EliminationOptions { Diagnostics = d };
            var sw = Stopwatch.StartNew();
            var e = RationalElimination.Echelon(data, rows, cols, options);
            var k = RationalMatrix.BuildKernel(e, cols);
            times[r] = sw.Elapsed.TotalSeconds;
            if (k != kernel) throw new InvalidOperationException("runs disagree");
            diag = d;
        }
        Array.Sort(times);
        // Independent check outside the timing: A times every basis vector is zero.
        var a = warm;
        bool ok = true;
        for (int q = 0; q < kernel.RowCount && ok; q++)
            foreach (var x in a.Multiply(kernel.Row(q))) if (!x.IsZero) { ok = false; break; }
        var name = Path.GetFileNameWithoutExtension(args[0]);
        return $"RESULT tool=integrable workload=W5 matrix={name} size={rows}x{cols} rank={cols - kernel.RowCount} nullity={kernel.RowCount} " +
               $"seconds={Timing.Seconds(times[reps / 2])} reps={reps} check={(ok ? "ok" : "FAILED")} load_s={loadSeconds:F2} [{diag}]";
    }

    internal static (int Rows, int Cols, Rational[] Data) Read(string path)
    {
        using var reader = new StreamReader(path);
        var head = (reader.ReadLine() ?? throw new FormatException("empty file")).Split(' ', StringSplitOptions.RemoveEmptyEntries);
        int rows = int.Parse(head[0], CultureInfo.InvariantCulture), cols = int.Parse(head[1], CultureInfo.InvariantCulture);
        var data = new Rational[rows * cols];
        for (int i = 0; i < rows; i++)
        {
            var line = reader.ReadLine() ?? throw new FormatException($"missing row {i}");
            var tokens = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            if (tokens.Length != cols) throw new FormatException($"row {i} has {tokens.Length} entries, expected {cols}");
            for (int j = 0; j < cols; j++) data[i * cols + j] = Rational.Parse(tokens[j]);
        }
        return (rows, cols, data);
    }
}
