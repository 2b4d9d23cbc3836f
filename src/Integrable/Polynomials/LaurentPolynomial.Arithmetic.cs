using Integrable.Kernels;
using Integrable.Numbers;

namespace Integrable.Polynomials;

public sealed partial class LaurentPolynomial
{
    /// <summary>Sum.</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand (same ring).</param>
    /// <returns><paramref name="left"/> + <paramref name="right"/>.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">The rings differ.</exception>
    public static LaurentPolynomial operator +(LaurentPolynomial left, LaurentPolynomial right)
    {
        ArgumentNullException.ThrowIfNull(left);
        left.CheckRing(right);
        if (right.IsZero) return left;
        if (left.IsZero) return right.WithRing(left._ring);
        PolynomialAdd.Merge(left._coeffs, left._exps, right._coeffs, right._exps, left._ring.VariableCount, false, out var c, out var e);
        return new LaurentPolynomial(left._ring, c, e);
    }

    /// <summary>Difference.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend (same ring).</param>
    /// <returns><paramref name="left"/> − <paramref name="right"/>.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">The rings differ.</exception>
    public static LaurentPolynomial operator -(LaurentPolynomial left, LaurentPolynomial right)
    {
        ArgumentNullException.ThrowIfNull(left);
        left.CheckRing(right);
        if (right.IsZero) return left;
        PolynomialAdd.Merge(left._coeffs, left._exps, right._coeffs, right._exps, left._ring.VariableCount, true, out var c, out var e);
        return new LaurentPolynomial(left._ring, c, e);
    }

    /// <summary>Negation.</summary>
    /// <param name="value">The polynomial.</param>
    /// <returns>−<paramref name="value"/>.</returns>
    public static LaurentPolynomial operator -(LaurentPolynomial value)
    {
        ArgumentNullException.ThrowIfNull(value);
        if (value.IsZero) return value;
        var c = new Rational[value._coeffs.Length];
        for (int i = 0; i < c.Length; i++) c[i] = -value._coeffs[i];
        return new LaurentPolynomial(value._ring, c, value._exps);
    }

    /// <summary>Product.</summary>
    /// <param name="left">First factor.</param>
    /// <param name="right">Second factor (same ring).</param>
    /// <returns><paramref name="left"/>·<paramref name="right"/>.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">The rings differ.</exception>
    /// <exception cref="OverflowException">An exponent of the product leaves the 32-bit range.</exception>
    public static LaurentPolynomial operator *(LaurentPolynomial left, LaurentPolynomial right)
    {
        ArgumentNullException.ThrowIfNull(left);
        left.CheckRing(right);
        var ring = left._ring;
        if (left.IsZero || right.IsZero) return ring.Zero;
        if (left.IsConstant) return right.Scale(left._coeffs[0]).WithRing(ring);
        if (right.IsConstant) return left.Scale(right._coeffs[0]);
        if (left.IsMonomial) return right.MultiplyByMonomial(left._coeffs[0], left._exps).WithRing(ring);
        if (right.IsMonomial) return left.MultiplyByMonomial(right._coeffs[0], right._exps);
        PolynomialMultiply.Multiply(left._coeffs, left._exps, right._coeffs, right._exps, ring.VariableCount, out var c, out var e);
        return new LaurentPolynomial(ring, c, e);
    }

    /// <summary>Sum with a constant.</summary>
    /// <param name="left">The polynomial.</param>
    /// <param name="right">The constant.</param>
    /// <returns><paramref name="left"/> + <paramref name="right"/>.</returns>
    public static LaurentPolynomial operator +(LaurentPolynomial left, Rational right)
    {
        ArgumentNullException.ThrowIfNull(left);
        return left + left._ring.Constant(right);
    }

    /// <summary>Sum with a constant.</summary>
    /// <param name="left">The constant.</param>
    /// <param name="right">The polynomial.</param>
    /// <returns><paramref name="left"/> + <paramref name="right"/>.</returns>
    public static LaurentPolynomial operator +(Rational left, LaurentPolynomial right)
    {
        ArgumentNullException.ThrowIfNull(right);
        return right._ring.Constant(left) + right;
    }

    /// <summary>Difference with a constant.</summary>
    /// <param name="left">The polynomial.</param>
    /// <param name="right">The constant.</param>
    /// <returns><paramref name="left"/> − <paramref name="right"/>.</returns>
    public static LaurentPolynomial operator -(LaurentPolynomial left, Rational right)
    {
        ArgumentNullException.ThrowIfNull(left);
        return left - left._ring.Constant(right);
    }

    /// <summary>Difference with a constant.</summary>
    /// <param name="left">The constant.</param>
    /// <param name="right">The polynomial.</param>
    /// <returns><paramref name="left"/> − <paramref name="right"/>.</returns>
    public static LaurentPolynomial operator -(Rational left, LaurentPolynomial right)
    {
        ArgumentNullException.ThrowIfNull(right);
        return right._ring.Constant(left) - right;
    }

    /// <summary>Product with a constant.</summary>
    /// <param name="left">The polynomial.</param>
    /// <param name="right">The constant.</param>
    /// <returns><paramref name="left"/>·<paramref name="right"/>.</returns>
    public static LaurentPolynomial operator *(LaurentPolynomial left, Rational right)
    {
        ArgumentNullException.ThrowIfNull(left);
        return left.Scale(right);
    }

    /// <summary>Product with a constant.</summary>
    /// <param name="left">The constant.</param>
    /// <param name="right">The polynomial.</param>
    /// <returns><paramref name="left"/>·<paramref name="right"/>.</returns>
    public static LaurentPolynomial operator *(Rational left, LaurentPolynomial right)
    {
        ArgumentNullException.ThrowIfNull(right);
        return right.Scale(left);
    }

    /// <summary>Named form of <c>a + b</c>.</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns>The sum.</returns>
    public static LaurentPolynomial Add(LaurentPolynomial left, LaurentPolynomial right) => left + right;

    /// <summary>Named form of <c>a - b</c>.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static LaurentPolynomial Subtract(LaurentPolynomial left, LaurentPolynomial right) => left - right;

    /// <summary>Named form of <c>a * b</c>.</summary>
    /// <param name="left">First factor.</param>
    /// <param name="right">Second factor.</param>
    /// <returns>The product.</returns>
    public static LaurentPolynomial Multiply(LaurentPolynomial left, LaurentPolynomial right) => left * right;

    /// <summary>Named form of unary minus.</summary>
    /// <param name="value">The polynomial.</param>
    /// <returns>The negation.</returns>
    public static LaurentPolynomial Negate(LaurentPolynomial value) => -value;

    /// <summary>Integer power by repeated squaring. Negative exponents are allowed only for
    /// monomials c·x^e (the units of the ring): (c·x^e)^(−k) = c^(−k)·x^(−k·e).</summary>
    /// <param name="exponent">The exponent.</param>
    /// <returns>this^<paramref name="exponent"/>; p^0 = 1 for every p, zero included.</returns>
    /// <exception cref="NotInvertibleException"><paramref name="exponent"/> is negative and this
    /// polynomial is not a monomial (it has no inverse in the Laurent ring).</exception>
    /// <exception cref="OverflowException">An exponent leaves the 32-bit range.</exception>
    public LaurentPolynomial Pow(int exponent)
    {
        if (exponent == 0) return _ring.One;
        if (exponent == 1) return this;
        if (IsMonomial)
        {
            int n = _ring.VariableCount;
            var e = new int[n];
            for (int v = 0; v < n; v++) e[v] = checked(_exps[v] * exponent);
            return new LaurentPolynomial(_ring, [_coeffs[0].Pow(exponent)], e);
        }
        if (exponent < 0)
            throw new NotInvertibleException($"A polynomial with {TermCount} terms has no inverse in {_ring}, so it cannot be raised to the power {exponent}; only monomials can.");
        if (IsZero) return this;
        LaurentPolynomial result = _ring.One, square = this;
        int k = exponent;
        while (true)
        {
            if ((k & 1) != 0) result = result.IsOne ? square : result * square;
            k >>= 1;
            if (k == 0) break;
            square *= square;
        }
        return result;
    }

    /// <summary>Multiplies every coefficient by a constant.</summary>
    internal LaurentPolynomial Scale(Rational factor)
    {
        if (factor.IsZero) return _ring.Zero;
        if (factor.IsOne) return this;
        var c = new Rational[_coeffs.Length];
        for (int i = 0; i < c.Length; i++) c[i] = _coeffs[i] * factor;
        return new LaurentPolynomial(_ring, c, _exps);
    }

    /// <summary>Multiplies by c·x^e (translation keeps the lex order).</summary>
    internal LaurentPolynomial MultiplyByMonomial(Rational c, ReadOnlySpan<int> e)
    {
        int n = _ring.VariableCount;
        var exps = new int[_exps.Length];
        for (int t = 0; t < _coeffs.Length; t++)
            for (int v = 0; v < n; v++)
                exps[t * n + v] = checked(_exps[t * n + v] + e[v]);
        var coeffs = c.IsOne ? _coeffs : new Rational[_coeffs.Length];
        if (!c.IsOne)
            for (int i = 0; i < coeffs.Length; i++) coeffs[i] = _coeffs[i] * c;
        return new LaurentPolynomial(_ring, coeffs, exps);
    }
}
