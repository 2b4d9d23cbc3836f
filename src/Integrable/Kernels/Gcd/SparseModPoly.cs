using System.Runtime.CompilerServices;
namespace Integrable.Kernels.Gcd;

/// <summary>A polynomial over Z/pZ in <see cref="Vars"/> variables with non-negative exponents: terms in
/// strictly descending lexicographic order (variable 0 most significant), term-major exponent vectors,
/// no zero coefficient. Terms that share the exponents of variables 0..k−2 are contiguous, which makes
/// the polynomial a list of "groups": coefficients in Z/pZ[x_{k−1}] of monomials in x_0..x_{k−2}.</summary>
internal sealed class SparseModPoly
{
    public readonly int Vars;
    public readonly int Count;
    public readonly ulong[] Coeffs;
    public readonly int[] Exps;

    public SparseModPoly(int vars, ulong[] coeffs, int[] exps, int count)
    {
        Vars = vars;
        Coeffs = coeffs;
        Exps = exps;
        Count = count;
    }

    public bool IsZero => Count == 0;

    public ReadOnlySpan<int> ExponentsOf(int term) => Exps.AsSpan(term * Vars, Vars);

    /// <summary>The constant c in k variables.</summary>
    public static SparseModPoly Constant(int vars, ulong c) =>
        c == 0 ? new SparseModPoly(vars, [], [], 0) : new SparseModPoly(vars, [c], new int[vars], 1);

    /// <summary>Largest exponent of the last variable.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public int LastDegree()
    {
        int k = Vars, d = 0;
        for (int t = 0; t < Count; t++) d = Math.Max(d, Exps[t * k + k - 1]);
        return d;
    }

    /// <summary>Largest exponent of variable <paramref name="v"/>.</summary>
    public int Degree(int v)
    {
        int k = Vars, d = -1;
        for (int t = 0; t < Count; t++) d = Math.Max(d, Exps[t * k + v]);
        return d;
    }

    /// <summary>Start index of every group (terms sharing the exponents of variables 0..k−2), plus Count at the end.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public int[] GroupStarts()
    {
        int k = Vars, m = k - 1;
        var starts = new List<int>(Math.Min(Count, 1024) + 1);
        for (int t = 0; t < Count; t++)
        {
            if (t == 0 || !Exps.AsSpan(t * k, m).SequenceEqual(Exps.AsSpan((t - 1) * k, m))) starts.Add(t);
        }
        starts.Add(Count);
        return starts.ToArray();
    }

    /// <summary>The coefficient of one group as a dense polynomial in the last variable.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public ulong[] GroupDense(int start, int end)
    {
        int k = Vars;
        var d = new ulong[Exps[start * k + k - 1] + 1];
        for (int t = start; t < end; t++) d[Exps[t * k + k - 1]] = Coeffs[t];
        return d;
    }

    /// <summary>Degree of one group's coefficient in the last variable.</summary>
    public int GroupDegree(int start) => Exps[start * Vars + Vars - 1];

    /// <summary>Evaluates the last variable at the point whose powers are given (powers[e] = α^e),
    /// giving a polynomial in the first k−1 variables; the lex order is kept.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public SparseModPoly EvaluateLast(int[] starts, ulong[] powers, in ModP f)
    {
        int k = Vars, m = k - 1, groups = starts.Length - 1;
        var c = new ulong[groups];
        var e = new int[groups * m];
        int n = 0;
        var exps = Exps;
        var coeffs = Coeffs;
        for (int g = 0; g < groups; g++)
        {
            int s = starts[g], end = starts[g + 1];
            ulong acc = 0;
            for (int t = s; t < end; t++) acc = f.Add(acc, f.Mul(coeffs[t], powers[exps[t * k + m]]));
            if (acc == 0) continue;
            c[n] = acc;
            if (m > 0) Array.Copy(exps, s * k, e, n * m, m);
            n++;
        }
        return new SparseModPoly(m, c, e, n);
    }

    /// <summary>s·this (s ≠ 0).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public SparseModPoly Scale(ulong s, in ModP f)
    {
        if (s == 1) return this;
        var c = new ulong[Count];
        for (int t = 0; t < Count; t++) c[t] = f.Mul(Coeffs[t], s);
        return new SparseModPoly(Vars, c, Exps, Count);
    }

    /// <summary>Lexicographic comparison of the leading monomials (both non-zero).</summary>
    public static int CompareLeading(SparseModPoly a, SparseModPoly b) =>
        PolynomialAdd.Compare(a.Exps.AsSpan(0, a.Vars), b.Exps.AsSpan(0, b.Vars));

    /// <summary>Builds a polynomial in k = mainVars + 1 variables from groups: main monomials (sorted in
    /// descending lex order) and their dense coefficients in the last variable (zero arrays are skipped).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static SparseModPoly FromGroups(int mainVars, int count, int[] mainExps, ulong[][] dense)
    {
        int k = mainVars + 1, terms = 0;
        for (int g = 0; g < count; g++)
            foreach (var x in dense[g]) if (x != 0) terms++;
        var c = new ulong[terms];
        var e = new int[terms * k];
        int n = 0;
        for (int g = 0; g < count; g++)
        {
            var d = dense[g];
            for (int i = d.Length - 1; i >= 0; i--)
            {
                if (d[i] == 0) continue;
                c[n] = d[i];
                if (mainVars > 0) Array.Copy(mainExps, g * mainVars, e, n * k, mainVars);
                e[n * k + mainVars] = i;
                n++;
            }
        }
        return new SparseModPoly(k, c, e, n);
    }

    /// <summary>Splits into groups: main monomials and dense coefficients in the last variable.</summary>
    public void ToGroups(out int[] starts, out int[] mainExps, out ulong[][] dense)
    {
        starts = GroupStarts();
        int groups = starts.Length - 1, m = Vars - 1;
        mainExps = new int[groups * m];
        dense = new ulong[groups][];
        for (int g = 0; g < groups; g++)
        {
            if (m > 0) Array.Copy(Exps, starts[g] * Vars, mainExps, g * m, m);
            dense[g] = GroupDense(starts[g], starts[g + 1]);
        }
    }
}
