namespace Integrable.Polynomials;

public static partial class PolynomialGcd
{
    /// <summary>The content of <paramref name="p"/> with respect to one variable: the normalised gcd of
    /// its coefficients when p is read as a Laurent polynomial in <paramref name="variable"/> with
    /// coefficients in the other variables.</summary>
    /// <param name="p">The polynomial.</param>
    /// <param name="variable">The variable's name.</param>
    /// <returns>The content (primitive, positive leading coefficient, no monomial factor, free of
    /// <paramref name="variable"/>); zero for the zero polynomial. p = content·<see cref="PrimitivePartIn"/>.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="variable"/> is not a variable of the ring.</exception>
    public static LaurentPolynomial ContentIn(this LaurentPolynomial p, string variable)
    {
        ArgumentNullException.ThrowIfNull(p);
        int v = p.Ring.RequireIndex(variable);
        return ContentOf(p, v);
    }

    /// <summary>The primitive part of <paramref name="p"/> with respect to one variable:
    /// p / <see cref="ContentIn"/>(p, variable). It keeps p's rational content and monomial part.</summary>
    /// <param name="p">The polynomial.</param>
    /// <param name="variable">The variable's name.</param>
    /// <returns>The primitive part; zero for zero.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="variable"/> is not a variable of the ring.</exception>
    public static LaurentPolynomial PrimitivePartIn(this LaurentPolynomial p, string variable)
    {
        ArgumentNullException.ThrowIfNull(p);
        int v = p.Ring.RequireIndex(variable);
        if (p.IsZero) return p;
        return DivideKnown(p, ContentOf(p, v));
    }

    internal static LaurentPolynomial ContentOf(LaurentPolynomial p, int v)
    {
        var ring = p.Ring;
        if (p.IsZero) return ring.Zero;
        var coefficients = CoefficientsIn(p, v);
        coefficients.Sort((x, y) => x.TermCount.CompareTo(y.TermCount));
        LaurentPolynomial g = Gcd(coefficients[0], ring.Zero);
        for (int i = 1; i < coefficients.Count && !g.IsOne; i++) g = Gcd(g, coefficients[i]);
        return g;
    }

    /// <summary>The coefficients of p as a polynomial in x_v (each with x_v's exponent set to 0).</summary>
    internal static List<LaurentPolynomial> CoefficientsIn(LaurentPolynomial p, int v)
    {
        var ring = p.Ring;
        int n = ring.VariableCount;
        var groups = new SortedDictionary<int, LaurentPolynomialBuilder>();
        var e = new int[n];
        foreach (var t in p.Terms)
        {
            t.Exponents.CopyTo(e);
            int k = e[v];
            e[v] = 0;
            if (!groups.TryGetValue(k, out var b)) groups[k] = b = ring.CreateBuilder();
            b.Add(t.Coefficient, e);
        }
        return groups.Values.Select(b => b.ToPolynomial()).ToList();
    }

    /// <summary>a / d where d is known to divide a; the division is exact and checked.</summary>
    internal static LaurentPolynomial DivideKnown(LaurentPolynomial a, LaurentPolynomial d)
    {
        if (d.IsOne) return a;
        if (!a.TryDivideExact(d, out var q))
            throw new InvalidOperationException("internal error: a computed divisor does not divide exactly");
        return q;
    }
}
