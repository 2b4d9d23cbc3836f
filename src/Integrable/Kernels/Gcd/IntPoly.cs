using System.Runtime.CompilerServices;
using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Kernels.Gcd;

/// <summary>A polynomial with integer coefficients (stored as integer-valued <see cref="Rational"/>s so
/// that the shared multiplication and division kernels apply directly) and non-negative exponents, terms
/// in strictly descending lex order of the exponent vectors, variable 0 most significant.</summary>
internal sealed class IntPoly
{
    public readonly int Vars;
    public readonly Rational[] Coeffs;
    public readonly int[] Exps;

    public IntPoly(int vars, Rational[] coeffs, int[] exps)
    {
        Vars = vars;
        Coeffs = coeffs;
        Exps = exps;
    }

    public int Count => Coeffs.Length;

    public bool IsConstant => Coeffs.Length == 1 && !Exps.AsSpan().ContainsAnyExcept(0);

    public static IntPoly One(int vars) => new(vars, [Rational.One], new int[vars]);

    /// <summary>Largest exponent of each variable.</summary>
    public int[] Degrees()
    {
        var d = new int[Vars];
        for (int t = 0; t < Coeffs.Length; t++)
            for (int v = 0; v < Vars; v++)
                if (Exps[t * Vars + v] > d[v]) d[v] = Exps[t * Vars + v];
        return d;
    }

    /// <summary>The image modulo p (zero residues dropped; the order is kept).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public SparseModPoly Reduce(in ModP f)
    {
        int n = Vars, terms = Coeffs.Length, zeros = 0;
        var c = new ulong[terms];
        for (int t = 0; t < terms; t++)
            if ((c[t] = f.FromInteger(Coeffs[t])) == 0) zeros++;
        if (zeros == 0) return new SparseModPoly(n, c, Exps, terms);
        var e = new int[(terms - zeros) * n];
        int count = 0;
        for (int t = 0; t < terms; t++)
        {
            if (c[t] == 0) continue;
            c[count] = c[t];
            Array.Copy(Exps, t * n, e, count * n, n);
            count++;
        }
        return new SparseModPoly(n, c, e, count);
    }

    /// <summary>log2 of the largest coefficient magnitude.</summary>
    public double Log2MaxAbs()
    {
        double best = 0;
        foreach (var c in Coeffs) best = Math.Max(best, Log2Abs(c));
        return best;
    }

    /// <summary>log2 of the Euclidean norm of the coefficient vector.</summary>
    public double Log2Norm2()
    {
        double max = Log2MaxAbs();
        double s = 0;
        foreach (var c in Coeffs) s += Math.Pow(2, 2 * (Log2Abs(c) - max));
        return max + 0.5 * Math.Log2(s);
    }

    public static double Log2Abs(in Rational c)
    {
        if (c.TryGetSmall(out long n, out _)) return n == 0 ? 0 : Math.Log2(Math.Abs((double)n));
        return BigInteger.Log(BigInteger.Abs(c.Numerator), 2);
    }

    /// <summary>The same polynomial with variables renamed: new variable i is old variable
    /// <paramref name="map"/>[i]; variables not listed must not occur. Sorts when the order changes.</summary>
    public IntPoly Permute(int[] map, bool sort)
    {
        int n = map.Length, old = Vars, terms = Coeffs.Length;
        var e = new int[terms * n];
        for (int t = 0; t < terms; t++)
            for (int i = 0; i < n; i++) e[t * n + i] = Exps[t * old + map[i]];
        if (!sort) return new IntPoly(n, Coeffs, e);
        SortTerms(n, Coeffs, e, out var sc, out var se);
        return new IntPoly(n, sc, se);
    }

    /// <summary>Sorts terms into descending lex order (no two equal exponent vectors expected).</summary>
    public static void SortTerms(int n, Rational[] coeffs, int[] exps, out Rational[] sc, out int[] se)
    {
        int terms = coeffs.Length;
        var order = new int[terms];
        for (int i = 0; i < terms; i++) order[i] = i;
        Array.Sort(order, (a, b) => PolynomialAdd.Compare(exps.AsSpan(b * n, n), exps.AsSpan(a * n, n)));
        sc = new Rational[terms];
        se = new int[terms * n];
        for (int i = 0; i < terms; i++)
        {
            sc[i] = coeffs[order[i]];
            Array.Copy(exps, order[i] * n, se, i * n, n);
        }
    }

    /// <summary>Integer content (positive gcd of the coefficients).</summary>
    public BigInteger Content()
    {
        BigInteger g = BigInteger.Zero;
        foreach (var c in Coeffs)
        {
            g = BigInteger.GreatestCommonDivisor(g, c.Numerator);
            if (g.IsOne) break;
        }
        return g;
    }

    /// <summary>Divides every coefficient by the integer <paramref name="d"/>, which must divide them all.</summary>
    public IntPoly DivideExact(BigInteger d)
    {
        if (d.IsOne) return this;
        var c = new Rational[Coeffs.Length];
        for (int i = 0; i < c.Length; i++)
        {
            var q = BigInteger.DivRem(Coeffs[i].Numerator, d, out var r);
            if (!r.IsZero) throw new InvalidOperationException("internal error: inexact integer division");
            c[i] = new Rational(q);
        }
        return new IntPoly(Vars, c, Exps);
    }

    /// <summary>Multiplies every coefficient by an integer.</summary>
    public IntPoly Scale(BigInteger s)
    {
        if (s.IsOne) return this;
        var c = new Rational[Coeffs.Length];
        var r = new Rational(s);
        for (int i = 0; i < c.Length; i++) c[i] = Coeffs[i] * r;
        return new IntPoly(Vars, c, Exps);
    }

    /// <summary>Structural equality.</summary>
    public bool SameAs(ReadOnlySpan<Rational> coeffs, ReadOnlySpan<int> exps) =>
        Coeffs.AsSpan().SequenceEqual(coeffs) && Exps.AsSpan().SequenceEqual(exps);
}
