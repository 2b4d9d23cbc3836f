using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Polynomials;

public sealed partial class LaurentPolynomial
{
    /// <summary>Total degree: the largest exponent sum over the terms (may be negative).</summary>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    public int TotalDegree
    {
        get
        {
            RequireNonZero(nameof(TotalDegree));
            int n = _ring.VariableCount;
            long best = long.MinValue;
            for (int t = 0; t < _coeffs.Length; t++)
            {
                long s = 0;
                for (int v = 0; v < n; v++) s += _exps[t * n + v];
                if (s > best) best = s;
            }
            return checked((int)best);
        }
    }

    /// <summary>Lowest total degree: the smallest exponent sum over the terms.</summary>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    public int LowTotalDegree
    {
        get
        {
            RequireNonZero(nameof(LowTotalDegree));
            int n = _ring.VariableCount;
            long best = long.MaxValue;
            for (int t = 0; t < _coeffs.Length; t++)
            {
                long s = 0;
                for (int v = 0; v < n; v++) s += _exps[t * n + v];
                if (s < best) best = s;
            }
            return checked((int)best);
        }
    }

    /// <summary>Degree in one variable (its largest exponent); same as <see cref="MaxExponent(string)"/>.</summary>
    /// <param name="variable">The variable's name.</param>
    /// <returns>The largest exponent of <paramref name="variable"/> (may be negative).</returns>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    /// <exception cref="ArgumentException">Unknown variable.</exception>
    public int Degree(string variable) => MaxExponent(variable);

    /// <summary>Largest exponent of a variable over all terms.</summary>
    /// <param name="variable">The variable's name.</param>
    /// <returns>The maximum exponent.</returns>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    /// <exception cref="ArgumentException">Unknown variable.</exception>
    public int MaxExponent(string variable) => MaxExponent(_ring.RequireIndex(variable));

    /// <summary>Smallest exponent of a variable over all terms.</summary>
    /// <param name="variable">The variable's name.</param>
    /// <returns>The minimum exponent.</returns>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    /// <exception cref="ArgumentException">Unknown variable.</exception>
    public int MinExponent(string variable) => MinExponent(_ring.RequireIndex(variable));

    /// <summary>Largest exponent of the variable at position <paramref name="variable"/>.</summary>
    /// <param name="variable">The variable's index.</param>
    /// <returns>The maximum exponent.</returns>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    /// <exception cref="ArgumentOutOfRangeException">Index out of range.</exception>
    public int MaxExponent(int variable)
    {
        _ring.CheckIndex(variable);
        RequireNonZero(nameof(MaxExponent));
        int n = _ring.VariableCount, m = int.MinValue;
        for (int t = 0; t < _coeffs.Length; t++) m = Math.Max(m, _exps[t * n + variable]);
        return m;
    }

    /// <summary>Smallest exponent of the variable at position <paramref name="variable"/>.</summary>
    /// <param name="variable">The variable's index.</param>
    /// <returns>The minimum exponent.</returns>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    /// <exception cref="ArgumentOutOfRangeException">Index out of range.</exception>
    public int MinExponent(int variable)
    {
        _ring.CheckIndex(variable);
        RequireNonZero(nameof(MinExponent));
        int n = _ring.VariableCount, m = int.MaxValue;
        for (int t = 0; t < _coeffs.Length; t++) m = Math.Min(m, _exps[t * n + variable]);
        return m;
    }

    /// <summary>True when no exponent is negative (an ordinary polynomial).</summary>
    public bool IsPolynomial => !_exps.AsSpan().ContainsAnyInRange(int.MinValue, -1);

    /// <summary>The coefficient of x^e (binary search in the canonical order).</summary>
    /// <param name="exponents">One exponent per variable.</param>
    /// <returns>The coefficient, or 0 when the term is absent.</returns>
    /// <exception cref="ArgumentException"><paramref name="exponents"/> has the wrong length.</exception>
    public Rational Coefficient(ReadOnlySpan<int> exponents)
    {
        _ring.CheckExponentLength(exponents.Length, nameof(exponents));
        int n = _ring.VariableCount, lo = 0, hi = _coeffs.Length - 1;
        while (lo <= hi)
        {
            int mid = (lo + hi) >>> 1;
            int c = CompareLex(_exps.AsSpan(mid * n, n), exponents);
            if (c == 0) return _coeffs[mid];
            if (c > 0) lo = mid + 1; else hi = mid - 1;
        }
        return Rational.Zero;
    }

    /// <summary>Partial derivative ∂/∂x_v (Laurent: ∂x^e/∂x = e·x^(e−1) for every integer e).</summary>
    /// <param name="variable">The variable's name.</param>
    /// <returns>The derivative.</returns>
    /// <exception cref="ArgumentException">Unknown variable.</exception>
    public LaurentPolynomial Derivative(string variable) => Derivative(_ring.RequireIndex(variable));

    /// <summary>Partial derivative with respect to the variable at position <paramref name="variable"/>.</summary>
    /// <param name="variable">The variable's index.</param>
    /// <returns>The derivative.</returns>
    /// <exception cref="ArgumentOutOfRangeException">Index out of range.</exception>
    public LaurentPolynomial Derivative(int variable)
    {
        _ring.CheckIndex(variable);
        int n = _ring.VariableCount, m = 0;
        var c = new Rational[_coeffs.Length];
        var e = new int[_exps.Length];
        // Dropping the terms with e_v = 0 and shifting the rest by the same vector keeps the order.
        for (int t = 0; t < _coeffs.Length; t++)
        {
            int k = _exps[t * n + variable];
            if (k == 0) continue;
            c[m] = _coeffs[t] * k;
            _exps.AsSpan(t * n, n).CopyTo(e.AsSpan(m * n, n));
            e[m * n + variable] = checked(k - 1);
            m++;
        }
        Array.Resize(ref c, m);
        Array.Resize(ref e, m * n);
        return new LaurentPolynomial(_ring, c, e);
    }

    /// <summary>The rational content c: the unique rational with this = c·<see cref="PrimitivePart"/>,
    /// where the primitive part has coprime integer coefficients and a positive leading coefficient
    /// (leading = first in the canonical descending lex order). So c carries the sign of the leading
    /// coefficient: c = ±gcd(numerators)/lcm(denominators). The content of zero is 0.</summary>
    public Rational Content
    {
        get
        {
            if (IsZero) return Rational.Zero;
            BigInteger g = BigInteger.Zero, l = BigInteger.One;
            foreach (var c in _coeffs)
            {
                g = BigInteger.GreatestCommonDivisor(g, c.Numerator);
                var d = c.Denominator;
                if (!d.IsOne) l = l / BigInteger.GreatestCommonDivisor(l, d) * d;
            }
            var r = new Rational(g, l);
            return _coeffs[0].Sign < 0 ? -r : r;
        }
    }

    /// <summary>The primitive part: this divided by <see cref="Content"/> (integer coefficients with
    /// gcd 1 and a positive leading coefficient); zero for zero.</summary>
    public LaurentPolynomial PrimitivePart
    {
        get
        {
            if (IsZero) return this;
            var c = Content;
            return c.IsOne ? this : Scale(c.Inverse());
        }
    }

    private void RequireNonZero(string what)
    {
        if (IsZero) throw new InvalidOperationException($"{what} is undefined for the zero polynomial.");
    }
}
