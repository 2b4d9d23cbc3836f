using Integrable.Numbers;

namespace Integrable.Series;

/// <summary>The one entry point for truncated products of residue vectors over Z/pZ used by the series
/// types (so the product can later be routed to the shared univariate polynomial code).</summary>
/// <remarks>
/// Dispatch: below <see cref="SchoolbookThreshold"/> entries in the shorter operand, a schoolbook
/// product with 192-bit lazy accumulation (one reduction per output coefficient); above it, the residues
/// are lifted to integers in [0, p) and multiplied by transforms modulo three 62-bit NTT primes, whose
/// product exceeds n·p² for every n &lt; 2^58, then recombined (Garner) and reduced modulo p.
/// </remarks>
internal static class ModularSeriesKernel
{
    /// <summary>Shorter-operand length below which the schoolbook product is used (settable from tests).</summary>
    internal static int SchoolbookThreshold = 48;

    /// <summary>The first min(n, a.Length + b.Length − 1) coefficients of a·b modulo p.</summary>
    public static ulong[] Multiply(PrimeField field, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, int n, bool square = false)
    {
        if (a.Length == 0 || b.Length == 0 || n <= 0) return [];
        if (a.Length > n) a = a[..n];
        if (b.Length > n) b = b[..n];
        int m = Math.Min(n, a.Length + b.Length - 1);
        if (Math.Min(a.Length, b.Length) < SchoolbookThreshold) return Schoolbook(field, a, b, m);
        var q = new NttPrime[3];
        var images = new ulong[3][];
        var ra = new ulong[a.Length];
        var rb = square ? ra : new ulong[b.Length];
        for (int j = 0; j < 3; j++)
        {
            q[j] = NttPrime.Get(j);
            ulong qj = q[j].P;
            for (int i = 0; i < a.Length; i++) ra[i] = a[i] % qj;
            if (!square) for (int i = 0; i < b.Length; i++) rb[i] = b[i] % qj;
            images[j] = new ulong[m];
            q[j].Multiply(ra, rb, images[j], square);
        }
        // Garner for three primes; the integer value v0 + v1·q0 + v2·q0·q1 is reduced modulo p.
        ulong q0 = q[0].P, q1 = q[1].P, q2 = q[2].P;
        ulong inv01 = q[1].Field.Inverse(q0 % q1), inv01s = q[1].ShoupOf(inv01);
        ulong q0m2 = q0 % q2, q0m2s = q[2].ShoupOf(q0m2);
        ulong inv012 = q[2].Field.Inverse(q[2].Field.Multiply(q0 % q2, q1 % q2)), inv012s = q[2].ShoupOf(inv012);
        ulong p = field.Modulus;
        ulong q0p = q0 % p, q01p = field.Multiply(q0p, q1 % p);
        var result = new ulong[m];
        for (int k = 0; k < m; k++)
        {
            ulong r0 = images[0][k], r1 = images[1][k], r2 = images[2][k];
            ulong v0 = r0;
            ulong t = v0 % q1;
            ulong v1 = NttPrime.MulShoup(r1 >= t ? r1 - t : r1 + q1 - t, inv01, inv01s, q1);
            ulong s = NttPrime.MulShoup(v1, q0m2, q0m2s, q2);
            s += v0 % q2; if (s >= q2) s -= q2;
            ulong v2 = NttPrime.MulShoup(r2 >= s ? r2 - s : r2 + q2 - s, inv012, inv012s, q2);
            ulong x = field.Add(v0 % p, field.Multiply(v1 % p, q0p));
            result[k] = field.Add(x, field.Multiply(v2 % p, q01p));
        }
        return result;
    }

    /// <summary>Schoolbook truncated product (the reference the fast path is tested against).</summary>
    internal static ulong[] Schoolbook(PrimeField field, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, int m)
    {
        var result = new ulong[m];
        ulong p = field.Modulus;
        ulong t64 = (ulong)((UInt128.One << 64) % p);
        ulong t128 = field.Multiply(t64, t64);
        for (int k = 0; k < m; k++)
        {
            int iLo = Math.Max(0, k - b.Length + 1), iHi = Math.Min(k, a.Length - 1);
            ulong lo = 0, mid = 0, top = 0;
            for (int i = iLo; i <= iHi; i++)
            {
                ulong hi = Math.BigMul(a[i], b[k - i], out ulong plo);
                lo += plo;
                hi += lo < plo ? 1UL : 0UL;
                mid += hi;
                if (mid < hi) top++;
            }
            result[k] = IntegerVector.Combine(lo, mid, top, field, t64, t128);
        }
        return result;
    }
}
