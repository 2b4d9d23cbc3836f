using System.Numerics;
using System.Runtime.CompilerServices;
using Integrable.Numbers;

namespace Integrable.Kernels.Gcd;

/// <summary>Exact division of integer polynomials with large coefficients by a multi-modular method:
/// the quotient is computed modulo word primes (dense division over a box of exponents) and lifted by
/// Chinese remaindering. Each modular division is exact (remainder zero), so the lift Q satisfies
/// Q·B ≡ A modulo the product M of the primes; once ‖Q‖∞·‖B‖₁ &lt; M/2 and ‖A‖∞ &lt; M/2 this congruence
/// is an identity and Q is proven to be the exact quotient. A modular division that fails proves that
/// B does not divide A (p does not divide the leading coefficient of B).</summary>
internal static class ModularDivision
{
    /// <summary>Largest dense box (cells) used by the modular division.</summary>
    internal static long MaxBox = 1L << 23;

    /// <summary>True when the method applies: the exponent box of A is small enough.</summary>
    public static bool Applies(IntPoly a)
    {
        var d = a.Degrees();
        double box = 1;
        foreach (var x in d) box *= x + 1;
        return box <= MaxBox && box <= 256.0 * Math.Max(a.Count, 1024);
    }

    /// <summary>Q with Q·B = A, or false when B does not divide A. Requires <see cref="Applies"/>(a).</summary>
    public static bool TryDivide(IntPoly a, IntPoly b, out IntPoly q)
    {
        int n = a.Vars;
        q = a;
        var da = a.Degrees();
        var dbMax = b.Degrees();
        for (int v = 0; v < n; v++) if (dbMax[v] > da[v]) return false;
        double log2A = a.Log2MaxAbs(), log2B1 = b.Log2MaxAbs() + Math.Log2(b.Count);
        double cap = 128 + a.Log2Norm2() + da.Sum() + 2 * log2B1;
        var acc = new CrtAccumulator(n);
        int index = 0;
        while (true)
        {
            ulong p = Primes.Large(index++);
            var f = new ModP(p);
            if (f.FromInteger(b.Coeffs[0]) == 0) continue;
            if (!DivideDense(a.Reduce(f), b.Reduce(f), da, f, out var qp)) return false;
            acc.Add(qp, f);
            double m = acc.Log2Modulus - 2;
            if (m > acc.Log2MaxAbs() + log2B1 && m > log2A)
            {
                q = acc.Reconstruct();
                return true;
            }
            if (acc.Log2Modulus > cap) return false;
        }
    }

    /// <summary>Exact division mod p on a dense array indexed by the exponents of A in mixed radix
    /// (variable 0 most significant, so decreasing index = descending lex order).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static bool DivideDense(SparseModPoly a, SparseModPoly b, int[] degA, in ModP f, out SparseModPoly q)
    {
        int n = a.Vars;
        q = a;
        if (b.Count == 0) throw new DivideByZeroException("division by zero mod p");
        if (a.Count == 0) { q = a; return true; }
        var stride = new long[n];
        long box = 1;
        for (int v = n - 1; v >= 0; v--) { stride[v] = box; box *= degA[v] + 1; }
        var degB = new int[n];
        for (int t = 0; t < b.Count; t++)
            for (int v = 0; v < n; v++) degB[v] = Math.Max(degB[v], b.Exps[t * n + v]);
        var qMax = new int[n];
        for (int v = 0; v < n; v++)
        {
            qMax[v] = degA[v] - degB[v];
            if (qMax[v] < 0) return false;
        }
        var dense = new ulong[box];
        for (int t = 0; t < a.Count; t++) dense[Index(a.Exps, t, n, stride)] = a.Coeffs[t];
        var boff = new long[b.Count];
        long lead = Index(b.Exps, 0, n, stride);
        for (int j = 0; j < b.Count; j++) boff[j] = lead - Index(b.Exps, j, n, stride);
        var bc = b.Coeffs;
        ulong inv = f.Inv(bc[0]);
        var qc = new List<ulong>();
        var qe = new List<int>();
        var e = new int[n];
        long top = Index(a.Exps, 0, n, stride);
        for (long idx = top; idx >= 0; idx--)
        {
            ulong c = dense[idx];
            if (c == 0) continue;
            if (idx < lead) return false; // a non-zero remainder term below the divisor's leading monomial
            // exponents of the candidate quotient term: idx − lead in mixed radix, field by field
            long x = idx;
            bool ok = true;
            for (int v = 0; v < n; v++)
            {
                int ev = (int)(x / stride[v]);
                x -= ev * stride[v];
                int qv = ev - b.Exps[v];
                if (qv < 0 || qv > qMax[v]) { ok = false; break; }
                e[v] = qv;
            }
            if (!ok) return false;
            ulong qv0 = f.Mul(c, inv);
            qc.Add(qv0);
            qe.AddRange(e);
            dense[idx] = 0;
            SubtractMultiple(ref dense[idx], ref bc[0], ref boff[0], bc.Length, f.Neg(qv0), f);
        }
        q = new SparseModPoly(n, qc.ToArray(), qe.ToArray(), qc.Count);
        return true;
    }

    /// <summary>at[−off[j]] += q·b[j] for j = 1..count−1 (all positions inside the array by construction).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void SubtractMultiple(ref ulong at, ref ulong b, ref long off, int count, ulong q, in ModP f)
    {
        ulong qs = f.ShoupFactor(q);
        ulong p = f.P;
        for (int j = 1; j < count; j++)
        {
            ref ulong cell = ref Unsafe.Subtract(ref at, (nint)Unsafe.Add(ref off, j));
            ulong bj = Unsafe.Add(ref b, j);
            ulong hi = Math.BigMul(bj, qs, out _);
            ulong r = bj * q - hi * p;
            if (r >= p) r -= p;
            ulong sum = cell + r;
            cell = sum >= p ? sum - p : sum;
        }
    }

    private static long Index(int[] exps, int t, int n, long[] stride)
    {
        long x = 0;
        for (int v = 0; v < n; v++) x += exps[t * n + v] * stride[v];
        return x;
    }
}
