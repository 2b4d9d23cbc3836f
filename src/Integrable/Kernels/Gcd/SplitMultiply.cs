using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Kernels.Gcd;

/// <summary>Products of polynomials whose integer coefficients do not fit in a machine word, by
/// splitting every coefficient into limbs of at most 62 bits: A = Σ Aᵢ·2^(s·i), B = Σ Bⱼ·2^(s·j), so
/// A·B = Σ AᵢBⱼ·2^(s(i+j)). Each AᵢBⱼ runs on the word paths of <see cref="PolynomialMultiply"/>
/// (64/128/192-bit accumulators), and big integers appear only once per output coefficient and limb
/// sum. A stand-in until the shared multiplication kernel has a multi-word coefficient path.</summary>
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
