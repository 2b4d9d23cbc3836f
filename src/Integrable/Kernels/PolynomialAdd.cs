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
        var oc = new Rational[na + nb];
        var oe = new int[(na + nb) * n];
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
        if (k < na + nb)
        {
            Array.Resize(ref oc, k);
            Array.Resize(ref oe, k * n);
        }
        coeffs = oc;
        exps = oe;
    }

    /// <summary>Lexicographic comparison of exponent vectors, first entry most significant.</summary>
    public static int Compare(ReadOnlySpan<int> a, ReadOnlySpan<int> b)
    {
        for (int v = 0; v < a.Length; v++)
            if (a[v] != b[v]) return a[v] > b[v] ? 1 : -1;
        return 0;
    }
}
