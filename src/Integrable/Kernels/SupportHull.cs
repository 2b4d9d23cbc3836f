using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Kernels;

/// <summary>The directions V of the affine hulls of the supports of two Laurent polynomials (the span of
/// all differences of exponent vectors within each operand, summed), when V is a proper subspace of Qⁿ.
/// A polynomial that is homogeneous for some grading (Somos-type iterates are, for two independent
/// gradings) has a support in a lower-dimensional affine subspace, so its degree box in n variables is
/// mostly empty; projected onto the pivot coordinates of V it is dense again.</summary>
/// <remarks>
/// <para>Let R be the reduced row echelon form of a basis of V, with pivot columns p_1 &lt; … &lt; p_r and
/// free columns f. Projection onto the pivot coordinates is injective on every translate c + V, and
/// the free coordinates are recovered as x_f = c_f + Σ_i R[i][f]·(x_{p_i} − c_{p_i}). Because every
/// non-zero vector of V has its first non-zero entry at a pivot column, the projection also preserves
/// the descending lexicographic order of terms: canonical inputs project to canonical inputs, and
/// canonical projected outputs lift to canonical outputs.</para>
/// <para>The projection is a ring homomorphism that is injective on the supports involved, so a
/// product computed in r variables lifts to the product in n variables. For exact division A = Q·B,
/// Q is homogeneous for every grading for which A and B are (the extreme graded parts of a product in
/// an integral domain do not cancel), so its support lies in a0 − b0 + V and the projected quotient
/// lifts as well; a lift that is not integral proves that B does not divide A.</para>
/// <para>Found by one pass over the terms: each difference vector is tested exactly against the current
/// R in integer arithmetic (D·x_f = Σ_i S[i][f]·x_{p_i} with S = D·R integral) and only a failing vector
/// joins the basis, after which R is recomputed exactly over Q. Full rank ends the pass early, which for
/// generic supports happens after a few terms.</para>
/// </remarks>
internal sealed class SupportHull
{
    /// <summary>Counts, on the current thread, the products and divisions that ran projected (a test hook).</summary>
    [ThreadStatic] internal static int Applied;

    private readonly int _n;
    private readonly int[] _pivots, _free;
    private readonly long[] _s;   // S[i][k] = D·R[i][free[k]], row-major r × (n − r)
    private readonly long _d;

    private SupportHull(int n, int[] pivots, int[] free, long[] s, long d)
    {
        _n = n;
        _pivots = pivots;
        _free = free;
        _s = s;
        _d = d;
    }

    /// <summary>The dimension r of V (fewer than the number of variables).</summary>
    public int Rank => _pivots.Length;

    /// <summary>The pivot columns, ascending: the coordinates the projection keeps.</summary>
    public ReadOnlySpan<int> Pivots => _pivots;

    /// <summary>Finds V for the supports <paramref name="ea"/> and <paramref name="eb"/> (n exponents per
    /// term); null when V is all of Qⁿ or the exact description does not fit 64-bit integers.</summary>
    public static SupportHull? TryFind(ReadOnlySpan<int> ea, ReadOnlySpan<int> eb, int n)
    {
        if (n < 2) return null;
        var basis = new List<long[]>();
        var hull = Echelon(basis, n);
        if (!Extend(ea, n, basis, ref hull) || !Extend(eb, n, basis, ref hull)) return null;
        return hull is null || hull.Rank == 0 ? null : hull;
    }

    /// <summary>Adds the differences e_t − e_0 of one support to V; false once V is all of Qⁿ or too large to describe.</summary>
    private static bool Extend(ReadOnlySpan<int> e, int n, List<long[]> basis, ref SupportHull? hull)
    {
        Span<long> d = stackalloc long[n];
        for (int t = n; t < e.Length; t += n)
        {
            for (int v = 0; v < n; v++) d[v] = (long)e[t + v] - e[v];
            if (hull!.Contains(d)) continue;
            basis.Add(d.ToArray());
            if (basis.Count == n) return false;
            hull = Echelon(basis, n);
            if (hull is null) return false;
        }
        return true;
    }

    /// <summary>True when the direction <paramref name="d"/> lies in V.</summary>
    private bool Contains(ReadOnlySpan<long> d)
    {
        int r = _pivots.Length, m = _free.Length;
        for (int k = 0; k < m; k++)
        {
            Int128 sum = 0;
            for (int i = 0; i < r; i++) sum += (Int128)_s[i * m + k] * d[_pivots[i]];
            if (sum != (Int128)_d * d[_free[k]]) return false;
        }
        return true;
    }

    /// <summary>The reduced row echelon form of the basis, exact over Q, scaled to integers.</summary>
    private static SupportHull? Echelon(List<long[]> basis, int n)
    {
        int rows = basis.Count;
        var m = new Rational[rows][];
        for (int i = 0; i < rows; i++) m[i] = Array.ConvertAll(basis[i], x => new Rational(x));
        var pivots = new List<int>();
        int row = 0;
        for (int col = 0; col < n && row < rows; col++)
        {
            int p = row;
            while (p < rows && m[p][col].IsZero) p++;
            if (p == rows) continue;
            (m[p], m[row]) = (m[row], m[p]);
            var inv = Rational.One / m[row][col];
            for (int c = 0; c < n; c++) m[row][c] *= inv;
            for (int i = 0; i < rows; i++)
            {
                if (i == row || m[i][col].IsZero) continue;
                var f = m[i][col];
                for (int c = 0; c < n; c++) m[i][c] -= f * m[row][c];
            }
            pivots.Add(col);
            row++;
        }
        var free = Enumerable.Range(0, n).Except(pivots).ToArray();
        var den = BigInteger.One;
        for (int i = 0; i < row; i++)
            foreach (int f in free)
                den = den / BigInteger.GreatestCommonDivisor(den, m[i][f].Denominator) * m[i][f].Denominator;
        if (den > long.MaxValue) return null;
        var s = new long[row * free.Length];
        for (int i = 0; i < row; i++)
            for (int k = 0; k < free.Length; k++)
            {
                var v = m[i][free[k]] * new Rational(den);
                if (BigInteger.Abs(v.Numerator) > long.MaxValue) return null;
                s[i * free.Length + k] = (long)v.Numerator;
            }
        return new SupportHull(n, [.. pivots], free, s, (long)den);
    }

    /// <summary>The pivot coordinates of every term (r exponents per term, same term order).</summary>
    public int[] Project(ReadOnlySpan<int> e)
    {
        int terms = e.Length / _n, r = _pivots.Length;
        var p = new int[terms * r];
        for (int t = 0; t < terms; t++)
            for (int i = 0; i < r; i++) p[t * r + i] = e[t * _n + _pivots[i]];
        return p;
    }

    /// <summary>The full exponents of projected terms that lie in <paramref name="origin"/> + V; false when
    /// some lift is not an integer vector or leaves the 32-bit range.</summary>
    public bool TryLift(ReadOnlySpan<int> projected, ReadOnlySpan<long> origin, out int[] e)
    {
        int r = _pivots.Length, m = _free.Length, terms = projected.Length / Math.Max(r, 1);
        e = new int[terms * _n];
        for (int t = 0; t < terms; t++)
        {
            var x = projected.Slice(t * r, r);
            var full = e.AsSpan(t * _n, _n);
            for (int i = 0; i < r; i++) full[_pivots[i]] = x[i];
            for (int k = 0; k < m; k++)
            {
                Int128 sum = 0;
                for (int i = 0; i < r; i++) sum += (Int128)_s[i * m + k] * ((long)x[i] - origin[_pivots[i]]);
                var q = Int128.DivRem(sum, _d);
                if (q.Remainder != 0) return false;
                var value = q.Quotient + origin[_free[k]];
                if (value < int.MinValue || value > int.MaxValue) return false;
                full[_free[k]] = (int)value;
            }
        }
        return true;
    }
}
