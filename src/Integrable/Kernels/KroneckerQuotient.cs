using System.Numerics;
using Integrable.Kernels.Univariate;

namespace Integrable.Kernels;

/// <summary>Exact quotients in Z[t] of long dense polynomials with wide coefficients (the Kronecker images of
/// multivariate exact divisions): the quotient modulo each transform prime of <see cref="KroneckerProduct"/> by
/// Newton iteration for the inverse of the reversed divisor, Garner reconstruction, and verification by one
/// exact multiplication back.</summary>
/// <remarks>The number of primes is a guess (the dividend's size plus a margin); the multiplication back makes
/// any answer exact. When it fails, the caller decides with a method that needs no guess (non-divisible
/// inputs and quotients larger than the guess go there).</remarks>
internal static class KroneckerQuotient
{
    /// <summary>Largest dividend length: products inside Newton's iteration stay within the primes' 2-adicity.</summary>
    public const int MaxLength = 1 << (KroneckerProduct.MaxLog - 1);

    /// <summary>Bits added to the dividend's size for the guessed size of the quotient's coefficients (tests shrink it
    /// to make the guess fail).</summary>
    internal static int GuessMarginBits = 32;

    /// <summary>Counts, on the current thread, the quotients this method returned (a test hook).</summary>
    [ThreadStatic] internal static int Answered;

    /// <summary>q with q·b = a when the guess holds and the check passes; false when undecided (never a wrong q).
    /// <paramref name="a"/> and <paramref name="b"/> are trimmed (non-zero last entries), b has at least two entries.</summary>
    public static bool TryDivide(BigInteger[] a, BigInteger[] b, int bitsA, int bitsB, out BigInteger[] quotient)
    {
        quotient = [];
        int la = a.Length, lb = b.Length, m = la - lb + 1;
        if (m < 1 || la > MaxLength) return false;
        int k = KroneckerProduct.PrimesFor(Math.Max(1, bitsA + GuessMarginBits));
        if (k == 0) return false;
        var primes = KroneckerProduct.TransformPrimes;
        // Residues of the top m coefficients of a and b, reversed (the quotient depends on nothing else).
        int nb = Math.Min(m, lb);
        var revA = new BigInteger[m];
        var revB = new BigInteger[nb];
        for (int i = 0; i < m; i++) revA[i] = a[la - 1 - i];
        for (int i = 0; i < nb; i++) revB[i] = b[lb - 1 - i];
        var idxA = new long[m];
        var idxB = new long[nb];
        for (int i = 0; i < m; i++) idxA[i] = i;
        for (int i = 0; i < nb; i++) idxB[i] = i;
        var ra = new uint[k * m];
        var rb = new uint[k * nb];
        KroneckerProduct.Load(revA, idxA, primes, k, m, ra);
        KroneckerProduct.Load(revB, idxB, primes, k, nb, rb);
        var rows = new uint[k * m];
        var scale = new uint[k];
        for (int i = 0; i < k; i++)
        {
            KernelCancellation.Poll();
            var p = primes[i];
            var bi = rb.AsSpan(i * nb, nb);
            if (bi[0] == 0) return false;   // the prime divides lc(b)
            var g = Inverse(p, bi, m);
            var revQ = MultiplyLow(p, ra.AsSpan(i * m, m), g, m);
            // The quotient is revQ reversed; rows hold plain residues (MontMul(x, R) = x).
            var row = rows.AsSpan(i * m, m);
            for (int j = 0; j < m; j++) row[j] = m - 1 - j < revQ.Length ? revQ[m - 1 - j] : 0;
            scale[i] = p.RModQ;
        }
        int count = KroneckerProduct.Reconstruct(rows, primes, k, m, m, scale, out var qi, out var qc);
        if (count == 0) return false;
        // Verification: q·b = a exactly (one product by transforms, sized from the candidate's coefficients).
        int bitsQ = 0;
        foreach (var c in qc) bitsQ = Math.Max(bitsQ, (int)BigInteger.Abs(c).GetBitLength());
        var bIdx = new List<long>();
        var bCoef = new List<BigInteger>();
        for (int j = lb - 1; j >= 0; j--) if (!b[j].IsZero) { bIdx.Add(j); bCoef.Add(b[j]); }
        if (KroneckerProduct.PrimesFor(bitsQ + bitsB + 64) == 0) return false;
        int pc = KroneckerProduct.Multiply(qc, qi, bCoef.ToArray(), bIdx.ToArray(), la, square: false, bitsQ, bitsB, out var pi, out var pcoef);
        int t = 0;
        for (int j = la - 1; j >= 0; j--)
        {
            if (a[j].IsZero) continue;
            if (t >= pc || pi[t] != j || pcoef[t] != a[j]) return false;
            t++;
        }
        if (t != pc) return false;
        quotient = new BigInteger[m];
        for (int j = 0; j < count; j++) quotient[qi[j]] = qc[j];
        Answered++;
        return true;
    }

    /// <summary>g with b·g ≡ 1 mod t^n (b[0] ≠ 0) by Newton's iteration g ← g + g·(1 − b·g), doubling the precision.</summary>
    private static uint[] Inverse(NttPrime p, ReadOnlySpan<uint> b, int n)
    {
        var g = new uint[] { p.PowMod(b[0], p.Q - 2) };
        int prec = 1;
        while (prec < n)
        {
            int next = Math.Min(2 * prec, n);
            var e = MultiplyLow(p, b[..Math.Min(b.Length, next)], g, next);   // b·g ≡ 1 mod t^prec
            var h = new uint[next];
            for (int j = prec; j < next; j++) h[j] = j < e.Length ? p.Sub(0, e[j]) : 0;
            var gh = MultiplyLow(p, g, h, next);
            var ng = new uint[next];
            g.CopyTo(ng, 0);
            for (int j = prec; j < next; j++) ng[j] = j < gh.Length ? gh[j] : 0;
            g = ng;
            prec = next;
        }
        return g;
    }

    /// <summary>x·y mod (q, t^n), by one transform product.</summary>
    private static uint[] MultiplyLow(NttPrime p, ReadOnlySpan<uint> x, ReadOnlySpan<uint> y, int n)
    {
        int full = x.Length + y.Length - 1;
        int len = (int)BitOperations.RoundUpToPowerOf2((uint)Math.Max(full, 16));
        p.EnsureTables(BitOperations.Log2((uint)len));
        var fx = new uint[len];
        var fy = new uint[len];
        x.CopyTo(fx);
        y.CopyTo(fy);
        p.Forward(fx);
        p.Forward(fy);
        p.PointwiseMontMul(fx, fy);
        p.Inverse(fx);
        uint s = p.ToMont(p.ToMont(p.PowMod((uint)(len % p.Q), p.Q - 2)));
        var r = new uint[Math.Min(n, full)];
        for (int j = 0; j < r.Length; j++) r[j] = p.MontMul(fx[j], s);
        return r;
    }
}
