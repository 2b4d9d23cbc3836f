namespace Integrable.Polynomials;

public static partial class PolynomialGcd
{
    /// <summary>The square-free factorisation p = u·f₁·f₂²⋯f_k^k (see <see cref="SquareFreeFactorization"/>).</summary>
    /// <param name="p">A non-zero Laurent polynomial.</param>
    /// <returns>The factorisation; its <see cref="SquareFreeFactorization.Expand"/> equals p (checked).</returns>
    /// <remarks>The rational content and the monomial part form the unit u. The rest, A, is split as
    /// A = cont_x(A)·pp_x(A) for its first variable x; Yun's algorithm (D. Y. Y. Yun, "On square-free
    /// decomposition algorithms", SYMSAC 1976) on pp_x(A) with the multivariate gcd gives the factors
    /// that involve x, and the content (free of x) is factorised recursively. Factors of equal
    /// multiplicity from both parts are coprime and are multiplied together.</remarks>
    /// <exception cref="ArgumentNullException"><paramref name="p"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="p"/> is zero.</exception>
    public static SquareFreeFactorization FactorSquareFree(this LaurentPolynomial p)
    {
        ArgumentNullException.ThrowIfNull(p);
        if (p.IsZero) throw new ArgumentException("The zero polynomial has no square-free factorisation.", nameof(p));
        var ring = p.Ring;
        var s = Split(p);
        var unit = ring.Monomial(s.Scale, s.Shift);
        var primitive = ToLaurent(ring, s.Primitive, null);
        var byMultiplicity = new SortedDictionary<int, LaurentPolynomial>();
        SquareFreePrimitive(primitive, byMultiplicity);
        var factors = byMultiplicity.Select(kv => new SquareFreeFactor(kv.Value, kv.Key)).ToArray();
        var result = new SquareFreeFactorization(unit, factors);
        if (result.Expand() != p)
            throw new InvalidOperationException("internal error: the square-free factorisation does not multiply back to the input");
        return result;
    }

    /// <summary>Adds the square-free factors of a primitive, monomial-free polynomial with positive leading coefficient.</summary>
    private static void SquareFreePrimitive(LaurentPolynomial a, SortedDictionary<int, LaurentPolynomial> into)
    {
        if (a.IsConstant) return;
        int n = a.Ring.VariableCount, v = 0;
        while (v < n && a.MaxExponent(v) == 0) v++;
        var content = ContentOf(a, v);
        var pp = DivideKnown(a, content);
        Yun(pp, v, into);
        SquareFreePrimitive(content, into);
    }

    /// <summary>Yun's algorithm in x_v for f primitive in x_v: b₁ = f/gcd(f, f′), d₁ = f′/gcd − b₁′,
    /// aᵢ = gcd(bᵢ, dᵢ), bᵢ₊₁ = bᵢ/aᵢ, dᵢ₊₁ = dᵢ/aᵢ − bᵢ₊₁′; the aᵢ are the factors of multiplicity i.</summary>
    private static void Yun(LaurentPolynomial f, int v, SortedDictionary<int, LaurentPolynomial> into)
    {
        var df = f.Derivative(v);
        var (_, b, c) = GcdWithCofactors(f, df);
        var d = c - b.Derivative(v);
        for (int i = 1; !b.IsConstant; i++)
        {
            var (a, bNext, dNext) = GcdWithCofactors(b, d);
            if (!a.IsConstant) Put(into, i, a);
            b = bNext;
            d = dNext - b.Derivative(v);
        }
    }

    private static void Put(SortedDictionary<int, LaurentPolynomial> into, int multiplicity, LaurentPolynomial factor)
    {
        // a normalised gcd is primitive, positive and monomial-free already
        into[multiplicity] = into.TryGetValue(multiplicity, out var existing) ? existing * factor : factor;
    }
}
