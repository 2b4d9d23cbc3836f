using System.Runtime.CompilerServices;
using Integrable.Numbers;

namespace Integrable.Kernels;

/// <summary>Addition and subtraction of sparse polynomials by merging two sorted term lists.</summary>
internal static class PolynomialAdd
{
    /// <summary>A ± B for canonical inputs (descending lex, n exponents per term); the result is canonical.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void Merge(ReadOnlySpan<Rational> ca, ReadOnlySpan<int> ea, ReadOnlySpan<Rational> cb, ReadOnlySpan<int> eb,
        int n, bool subtract, out Rational[] coeffs, out int[] exps)
    {
        int na = ca.Length, nb = cb.Length;
        // First pass: count the common exponents, so that the output is allocated at its final size
        // (unless coefficients cancel). Touching fresh memory is the dominant cost for sums of millions of
        // terms, so an over-allocation followed by a shrinking copy would double it.
        int common = 0;
        for (int p = 0, q = 0; p < na && q < nb;)
        {
            int c = Compare(ea.Slice(p * n, n), eb.Slice(q * n, n));
            if (c > 0) p++;
            else if (c < 0) q++;
            else { common++; p++; q++; }
        }
        int size = na + nb - common;
        var oc = new Rational[size];
        var oe = new int[size * n];
        int i = 0, j = 0, k = 0;
        while (i < na && j < nb)
        {
            var a = ea.Slice(i * n, n);
            var b = eb.Slice(j * n, n);
            int c = Compare(a, b);
            if (c > 0)
            {
                oc[k] = ca[i];
                a.CopyTo(oe.AsSpan(k * n, n));
                i++; k++;
            }
            else if (c < 0)
            {
                oc[k] = subtract ? -cb[j] : cb[j];
                b.CopyTo(oe.AsSpan(k * n, n));
                j++; k++;
            }
            else
            {
                var s = subtract ? ca[i] - cb[j] : ca[i] + cb[j];
                if (!s.IsZero)
                {
                    oc[k] = s;
                    a.CopyTo(oe.AsSpan(k * n, n));
                    k++;
                }
                i++; j++;
            }
        }
        for (; i < na; i++, k++)
        {
            oc[k] = ca[i];
            ea.Slice(i * n, n).CopyTo(oe.AsSpan(k * n, n));
        }
        for (; j < nb; j++, k++)
        {
            oc[k] = subtract ? -cb[j] : cb[j];
            eb.Slice(j * n, n).CopyTo(oe.AsSpan(k * n, n));
        }
        if (k < size)
        {
            Array.Resize(ref oc, k);
            Array.Resize(ref oe, k * n);
        }
        coeffs = oc;
        exps = oe;
    }

    /// <summary>Lexicographic comparison of exponent vectors, first entry most significant.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static int Compare(ReadOnlySpan<int> a, ReadOnlySpan<int> b)
    {
        // The first differing entry decides (lex order); CommonPrefixLength is vectorised.
        int v = a.Length <= 4 ? 0 : a.CommonPrefixLength(b);
        for (; v < a.Length; v++)
            if (a[v] != b[v]) return a[v] > b[v] ? 1 : -1;
        return 0;
    }
}
