using System.Globalization;
using Integrable.Kernels;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Benchmarks;

/// <summary>The heap multiplication kernels alone, on the products of workload W4 (T-system, two packed
/// words for N ≥ 7): the operands of the last layer are packed once, then each kernel
/// (<c>MultiplyHeap2</c> with the exponent inline in the heap entries, <c>MultiplyHeapN</c> with two
/// words) runs on all of them; prints the median process CPU seconds of <c>reps</c> runs per kernel.
/// With <c>sparse k</c> instead of N: one-word operands (<c>MultiplyHeap1</c> against
/// <c>MultiplyHeapN</c> with one word). Usage: <c>-- HeapK N [reps]</c> or <c>-- HeapK sparse k [reps]</c>.</summary>
public sealed class HeapKernelWorkload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "HeapK";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        bool sparse = args.Length > 0 && args[0] == "sparse";
        if (sparse) args = args[1..];
        int n = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 7;
        int reps = args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 3;
        var pairs = sparse ? Sparse(n) : Operands(n);
        var packed = new List<(ulong[] A, long[] Ca, ulong[] B, long[] Cb, int Words)>();
        foreach (var (a, b) in pairs)
        {
            var s = new ProductShape(a.Exponents, b.Exponents, a.TermCount, b.TermCount, a.Ring.VariableCount);
            var max = new long[s.Nvars];
            for (int v = 0; v < s.Nvars; v++) max[v] = s.Radix[v] - 1;
            var layout = ExponentLayout.Create(max, guard: false);
            var pa = new ulong[a.TermCount * layout.Words];
            var pb = new ulong[b.TermCount * layout.Words];
            layout.Pack(a.Exponents, s.Nvars, s.MinA, pa);
            layout.Pack(b.Exponents, s.Nvars, s.MinB, pb);
            if (!CoefficientForm.TryWords(a.Coefficients, out var wa, out _) || !CoefficientForm.TryWords(b.Coefficients, out var wb, out _))
                throw new InvalidOperationException("coefficients do not fit in words");
            if (PolynomialMultiply.SelectAccumulator(wa, wb) != Accumulator.Word64) throw new InvalidOperationException("expected 64-bit sums");
            packed.Add(a.TermCount <= b.TermCount ? (pa, wa, pb, wb, layout.Words) : (pb, wb, pa, wa, layout.Words));
        }
        bool one = packed.All(p => p.Words == 1);
        if (!one && packed.Any(p => p.Words != 2)) throw new InvalidOperationException("expected one or two packed words");
        long terms2 = 0, termsN = 0;
        double Time(Func<long> run, out long terms)
        {
            run();
            var t = new double[reps];
            terms = 0;
            for (int r = 0; r < reps; r++)
            {
                var c0 = W2Workload.ProcessCpu();
                terms = run();
                t[r] = W2Workload.ProcessCpu() - c0;
            }
            Array.Sort(t);
            return t[reps / 2];
        }
        double h2 = Time(() =>
        {
            long total = 0;
            foreach (var p in packed)
            {
                var oe = Pool.Rent<ulong>(2 * 2 * p.Cb.Length);
                var oc = Pool.Rent<long>(2 * p.Cb.Length);
                total += one ? PolynomialMultiply.MultiplyHeap1<Word64Ops, long, long>(p.A, p.Ca, p.B, p.Cb, ref oe, ref oc) : PolynomialMultiply.MultiplyHeap2<Word64Ops, long, long>(p.A, p.Ca, p.B, p.Cb, ref oe, ref oc);
                Pool.Return(oe);
                Pool.Return(oc);
            }
            return total;
        }, out terms2);
        double hn = Time(() =>
        {
            long total = 0;
            foreach (var p in packed)
            {
                var oe = Pool.Rent<ulong>(2 * 2 * p.Cb.Length);
                var oc = Pool.Rent<long>(2 * p.Cb.Length);
                total += PolynomialMultiply.MultiplyHeapN<Word64Ops, long, long>(p.A, p.Ca, p.B, p.Cb, p.Words, ref oe, ref oc);
                Pool.Return(oe);
                Pool.Return(oc);
            }
            return total;
        }, out termsN);
        if (terms2 != termsN) throw new InvalidOperationException("kernels disagree");
        string F(double v) => v.ToString("0.0000", CultureInfo.InvariantCulture);
        return $"n={n} products={packed.Count} terms={terms2} inline_cpu={F(h2)} heapN_cpu={F(hn)}";
    }

    /// <summary>One word: (1 + x + y + z² + t³ + u⁵)^k · (1 + u + t + z² + y³ + x⁵)^k.</summary>
    private static List<(LaurentPolynomial, LaurentPolynomial)> Sparse(int k)
    {
        var ring = new LaurentPolynomialRing("x", "y", "z", "t", "u");
        LaurentPolynomial V(int i) => ring.Variable(i);
        var f = (ring.One + V(0) + V(1) + V(2).Pow(2) + V(3).Pow(3) + V(4).Pow(5)).Pow(k);
        var g = (ring.One + V(4) + V(3) + V(2).Pow(2) + V(1).Pow(3) + V(0).Pow(5)).Pow(k);
        return [(f, g)];
    }

    /// <summary>The operand pairs T_{a,m}², T_{a+1,m}·T_{a−1,m} of the last layer m = N − 1.</summary>
    private static List<(LaurentPolynomial, LaurentPolynomial)> Operands(int n)
    {
        var names = new List<string>();
        for (int a = -(n - 2); a <= n - 2; a++) names.Add($"u_{{{a}}}");
        for (int a = -(n - 1); a <= n - 1; a++) names.Add($"v_{{{a}}}");
        var ring = new LaurentPolynomialRing([.. names]);
        var prev = new LaurentPolynomial[2 * n + 1];
        var cur = new LaurentPolynomial[2 * n + 1];
        for (int a = -(n - 2); a <= n - 2; a++) prev[a + n] = ring.Variable(a + n - 2);
        for (int a = -(n - 1); a <= n - 1; a++) cur[a + n] = ring.Variable(2 * n - 3 + a + n - 1);
        for (int m = 1; m < n - 1; m++)
        {
            var next = new LaurentPolynomial[2 * n + 1];
            for (int a = -(n - m - 1); a <= n - m - 1; a++)
            {
                var num = cur[a + n] * cur[a + n] + cur[a + 1 + n] * cur[a - 1 + n];
                if (!num.TryDivideExact(prev[a + n], out var q)) throw new InvalidOperationException("division is not exact");
                next[a + n] = q;
            }
            prev = cur;
            cur = next;
        }
        var list = new List<(LaurentPolynomial, LaurentPolynomial)>();
        const int last = 0;
        list.Add((cur[last + n], cur[last + n]));
        list.Add((cur[last + 1 + n], cur[last - 1 + n]));
        return list;
    }
}
