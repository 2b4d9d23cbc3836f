using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Series;

/// <summary>The one entry point for truncated products of coefficient vectors over Q used by the series
/// types (so the product can later be routed to the shared univariate polynomial code).</summary>
/// <remarks>
/// Dispatch: when the shorter operand has fewer than <see cref="SchoolbookThreshold"/> entries the
/// schoolbook product on <see cref="Rational"/> values is used (skipping zeros, so a monomial factor
/// costs one pass); otherwise both operands are scaled to integers by the lcm of their denominators and
/// multiplied multi-modularly (<see cref="MultiModular"/>: NTT primes and Chinese remaindering), then
/// divided by the product of the two denominators. The threshold was measured on integer data of 1–4000
/// bits: the transform path wins from about 16–32 entries on.
/// </remarks>
internal static class RationalSeriesKernel
{
    /// <summary>Shorter-operand length below which the schoolbook product is used (settable from tests).</summary>
    internal static int SchoolbookThreshold = 24;

    /// <summary>The first min(n, a.Length + b.Length − 1) coefficients of a·b (trailing zeros possible).</summary>
    public static Rational[] Multiply(ReadOnlySpan<Rational> a, ReadOnlySpan<Rational> b, int n, bool square = false)
    {
        if (a.Length == 0 || b.Length == 0 || n <= 0) return [];
        if (a.Length > n) a = a[..n];
        if (b.Length > n) b = b[..n];
        int m = Math.Min(n, a.Length + b.Length - 1);
        if (Math.Min(a.Length, b.Length) < SchoolbookThreshold) return Schoolbook(a, b, m);
        var ia = IntegerVector.FromRationals(a, out var da);
        BigInteger db = da;
        var ib = square ? ia : IntegerVector.FromRationals(b, out db);
        var c = MultiModular.Multiply(ia, ib, m, square);
        var d = da * db;
        var result = new Rational[m];
        if (d.IsOne)
            for (int k = 0; k < c.Length; k++) result[k] = new Rational(c[k]);
        else
            for (int k = 0; k < c.Length; k++) result[k] = c[k].IsZero ? Rational.Zero : new Rational(c[k], d);
        return result;
    }

    /// <summary>Schoolbook truncated product (the reference the fast path is tested against).</summary>
    internal static Rational[] Schoolbook(ReadOnlySpan<Rational> a, ReadOnlySpan<Rational> b, int m)
    {
        var result = new Rational[m];
        if (a.Length > b.Length) { var t = a; a = b; b = t; }
        for (int i = 0; i < a.Length && i < m; i++)
        {
            var ai = a[i];
            if (ai.IsZero) continue;
            int lim = Math.Min(b.Length, m - i);
            if (ai.IsOne)
                for (int j = 0; j < lim; j++) { if (!b[j].IsZero) result[i + j] += b[j]; }
            else
                for (int j = 0; j < lim; j++) { if (!b[j].IsZero) result[i + j] += ai * b[j]; }
        }
        return result;
    }
}
