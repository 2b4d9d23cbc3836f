using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Kernels.Gcd;

/// <summary>Products of polynomials whose integer coefficients do not fit in a machine word. Two methods,
/// a stand-in until the shared multiplication kernel has a multi-word coefficient path:</summary>
/// <remarks>
/// <list type="bullet">
/// <item><b>Limbs</b>: every coefficient is split into limbs of at most 62 bits, A = Σ Aᵢ·2^(s·i),
/// B = Σ Bⱼ·2^(s·j), so A·B = Σ AᵢBⱼ·2^(s(i+j)); each AᵢBⱼ runs on the word paths of
/// <see cref="PolynomialMultiply"/> (64/128/192-bit accumulators) and big integers appear only once per
/// output coefficient and limb sum. Cost ≈ kA·kB·#A·#B word products.</item>
/// <item><b>Kronecker + NTT</b>: the exponent vectors are packed into one integer in mixed radix
/// (radix = summed degree + 1 per variable, so no carries), and the dense univariate product is computed
/// by the series kernel's multi-modular number-theoretic transform. Cost ≈ K·L·log L for L packed
/// coefficients and K ≈ (bits(A) + bits(B))/61 primes; it wins for dense operands with big
/// coefficients (rational-function iterates in few variables).</item>
/// </list>
/// </remarks>
internal static class SplitMultiply
{
    /// <summary>Below this bit size the shared kernel is used directly.</summary>
    internal static int WordBits = 62;

    /// <summary>A·B for canonical term arrays (any exponents; the shared kernel handles the shifts).</summary>
    public static void Multiply(Rational[] ca, int[] ea, Rational[] cb, int[] eb, int n, out Rational[] coeffs, out int[] exps)
    {
        CoefficientForm.ToBig(ca, out var ia, out var da);
        CoefficientForm.ToBig(cb, out var ib, out var db);
        int bitsA = MaxBits(ia), bitsB = MaxBits(ib);
        if ((bitsA <= WordBits && bitsB <= WordBits) || ca.Length == 1 || cb.Length == 1)
        {
            PolynomialMultiply.Multiply(ca, ea, cb, eb, n, out coeffs, out exps);
            return;
        }
        int ka = (bitsA + WordBits - 1) / WordBits, kb = (bitsB + WordBits - 1) / WordBits;
        if (TryKronecker(ia, ea, da, ib, eb, db, n, bitsA, bitsB, ka, kb, out coeffs, out exps)) return;
        // one limb size for both, balanced so that all limbs of the larger operand are used fully
        int s = Math.Max((bitsA + ka - 1) / ka, (bitsB + kb - 1) / kb);
        ka = (bitsA + s - 1) / s;
        kb = (bitsB + s - 1) / s;
        var la = Limbs(ia, ea, n, s, ka);
        var lb = Limbs(ib, eb, n, s, kb);
        // S_r = Σ_{i+j=r} A_i·B_j, then Horner in 2^s from the top limb sum down.
        Rational[] accC = [];
        int[] accE = [];
        var shift = new Rational(BigInteger.One << s);
        for (int r = ka + kb - 2; r >= 0; r--)
        {
            Rational[] sc = [];
            int[] se = [];
            for (int i = Math.Max(0, r - kb + 1); i <= Math.Min(r, ka - 1); i++)
            {
                var (ac, ae) = la[i];
                var (bc, be) = lb[r - i];
                if (ac.Length == 0 || bc.Length == 0) continue;
                PolynomialMultiply.Multiply(ac, ae, bc, be, n, out var pc, out var pe);
                if (sc.Length == 0) { sc = pc; se = pe; }
                else PolynomialAdd.Merge(sc, se, pc, pe, n, false, out sc, out se);
            }
            if (accC.Length != 0)
            {
                for (int t = 0; t < accC.Length; t++) accC[t] *= shift;
                if (sc.Length != 0) PolynomialAdd.Merge(accC, accE, sc, se, n, false, out accC, out accE);
            }
            else
            {
                accC = sc;
                accE = se;
            }
        }
        var den = da * db;
        if (!den.IsOne)
        {
            var inv = new Rational(BigInteger.One, den);
            for (int t = 0; t < accC.Length; t++) accC[t] *= inv;
        }
        coeffs = accC;
        exps = accE;
    }

    /// <summary>Estimated cost ratio threshold: the transform is used when its estimate is below the limb method's.</summary>
    internal static double KroneckerCostFactor = 3.0;

    /// <summary>Largest packed length for the transform.</summary>
    internal static long KroneckerMaxLength = 1L << 22;

    private static bool TryKronecker(BigInteger[] ia, int[] ea, BigInteger da, BigInteger[] ib, int[] eb, BigInteger db, int n,
        int bitsA, int bitsB, int ka, int kb, out Rational[] coeffs, out int[] exps)
    {
        coeffs = [];
        exps = [];
        int na = ia.Length, nb = ib.Length;
        ProductShape.MinMax(ea, n, out var minA, out var maxA);
        ProductShape.MinMax(eb, n, out var minB, out var maxB);
        var radix = new long[n];
        var stride = new long[n];
        double length = 1;
        for (int v = 0; v < n; v++)
        {
            radix[v] = (long)maxA[v] - minA[v] + maxB[v] - minB[v] + 1;
            length *= radix[v];
        }
        if (length > KroneckerMaxLength) return false;
        double k = (bitsA + bitsB + Math.Log2(Math.Min(na, nb)) + 2) / 61.0 + 1;
        double ntt = KroneckerCostFactor * k * 2 * length * Math.Log2(2 * length);
        double limbs = (double)ka * kb * na * nb;
        if (ntt >= limbs) return false;
        long st = 1;
        for (int v = n - 1; v >= 0; v--) { stride[v] = st; st *= radix[v]; }
        long lenA = Pack(ea, minA, stride, n, na, out var ka2), lenB = Pack(eb, minB, stride, n, nb, out var kb2);
        var va = new Rational[lenA];
        var vb = new Rational[lenB];
        for (int t = 0; t < na; t++) va[ka2[t]] = new Rational(ia[t]);
        for (int t = 0; t < nb; t++) vb[kb2[t]] = new Rational(ib[t]);
        var prod = Series.RationalSeriesKernel.Multiply(va, vb, (int)(lenA + lenB - 1));
        int count = 0;
        for (int i = 0; i < prod.Length; i++) if (!prod[i].IsZero) count++;
        coeffs = new Rational[count];
        exps = new int[count * n];
        var den = da * db;
        var inv = den.IsOne ? Rational.One : new Rational(BigInteger.One, den);
        int m = 0;
        // descending lex order = descending packed index
        for (long i = prod.Length - 1; i >= 0; i--)
        {
            var c = prod[i];
            if (c.IsZero) continue;
            coeffs[m] = den.IsOne ? c : c * inv;
            long x = i;
            for (int v = 0; v < n; v++)
            {
                long d = x / stride[v];
                x -= d * stride[v];
                exps[m * n + v] = (int)(d + minA[v] + minB[v]);
            }
            m++;
        }
        return true;
    }

    private static long Pack(int[] e, int[] min, long[] stride, int n, int terms, out long[] index)
    {
        index = new long[terms];
        long max = 0;
        for (int t = 0; t < terms; t++)
        {
            long x = 0;
            for (int v = 0; v < n; v++) x += (e[t * n + v] - min[v]) * stride[v];
            index[t] = x;
            if (x > max) max = x;
        }
        return max + 1;
    }

    private static int MaxBits(BigInteger[] v)
    {
        long best = 0;
        foreach (var x in v) best = Math.Max(best, x.GetBitLength());
        return (int)best;
    }

    /// <summary>Limb polynomials: limb i holds sign(c)·⌊|c|/2^(s·i)⌋ mod 2^s for every coefficient c (zero limbs dropped).</summary>
    private static (Rational[] C, int[] E)[] Limbs(BigInteger[] c, int[] e, int n, int s, int k)
    {
        var counts = new int[k];
        var limbs = new long[c.Length * k];
        var mask = (BigInteger.One << s) - 1;
        for (int t = 0; t < c.Length; t++)
        {
            var x = BigInteger.Abs(c[t]);
            int sign = c[t].Sign;
            for (int i = 0; i < k && !x.IsZero; i++)
            {
                long v = (long)(x & mask);
                x >>= s;
                if (v == 0) continue;
                limbs[t * k + i] = sign < 0 ? -v : v;
                counts[i]++;
            }
        }
        var result = new (Rational[], int[])[k];
        for (int i = 0; i < k; i++)
        {
            var rc = new Rational[counts[i]];
            var re = new int[counts[i] * n];
            int m = 0;
            for (int t = 0; t < c.Length; t++)
            {
                long v = limbs[t * k + i];
                if (v == 0) continue;
                rc[m] = new Rational(v);
                Array.Copy(e, t * n, re, m * n, n);
                m++;
            }
            result[i] = (rc, re);
        }
        return result;
    }
}
