using System.Diagnostics;
using System.Globalization;
using Integrable.Kernels.LinearAlgebra;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

/// <summary>Where the time of an exact nullspace goes (usage: LAprofile random R C DEF [REPS] |
/// LAprofile orbit M D [REPS]): process CPU time per phase (denominator clearing, one modular image,
/// the whole verified computation), and the whole computation again on the integer matrix whose rows
/// were cleared beforehand (what a caller that builds integer rows directly would pay). CPU time is
/// printed because wall time is unreliable on a shared machine.</summary>
internal sealed class LinearAlgebraProfileWorkload : IWorkload
{
    public string Name => "LAprofile";

    public string Run(string[] args)
    {
        var (rows, cols, data) = args[0] == "orbit"
            ? W5Matrices.Orbit(Int(args[1]), Int(args[2]))
            : W5Matrices.Random(Int(args[1]), Int(args[2]), Int(args[3]));
        int reps = args.Length > (args[0] == "orbit" ? 3 : 4) ? Int(args[^1]) : 5;
        var pr = Process.GetCurrentProcess();
        double Cpu() { pr.Refresh(); return pr.TotalProcessorTime.TotalMilliseconds; }
        double Measure(Action a)
        {
            a();
            double c0 = Cpu();
            for (int r = 0; r < reps; r++) a();
            return (Cpu() - c0) / reps;
        }
        var b = IntegerRows.FromRational(data, rows, cols);
        var cleared = new Rational[rows * cols];
        for (int i = 0; i < rows; i++) for (int j = 0; j < cols; j++) cleared[i * cols + j] = b.Entry(i, j);
        ulong prime = RationalElimination.PrimeSupply(EliminationOptions.Default, rows, cols)(0);
        var reducer = new ModularReducer(new PrimeField(prime));
        var image = new ulong[rows * cols];
        double clear = Measure(() => IntegerRows.FromRational(data, rows, cols));
        double reduce = Measure(() => b.ReduceColumnMajor(reducer, image));
        double echelon = Measure(() => ModularEchelon.Compute(image, rows, cols, reducer).Dispose());
        var diag = new EliminationDiagnostics();
        double full = Measure(() => RationalElimination.Echelon(data, rows, cols, new EliminationOptions { Diagnostics = diag = new EliminationDiagnostics() }));
        double fullCleared = Measure(() => RationalElimination.Echelon(cleared, rows, cols, EliminationOptions.Default));
        return string.Create(CultureInfo.InvariantCulture,
            $"cpu ms per call (first prime {prime}): clear {clear:F2}  reduce mod p {reduce:F2}  echelon mod p {echelon:F2}  whole nullspace {full:F2}  " +
            $"whole nullspace on pre-cleared integer rows {fullCleared:F2}  [{diag}]");
    }

    private static int Int(string s) => int.Parse(s, CultureInfo.InvariantCulture);
}
