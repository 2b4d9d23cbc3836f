using Integrable.Algebra;

namespace Integrable.Univariate;

public sealed partial class RationalFunctionModP
{
    private static void Check(RationalFunctionModP a, RationalFunctionModP b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (a.Field.Modulus != b.Field.Modulus)
            throw new IncompatibleRingException($"rational functions over Z/{a.Field.Modulus}Z and Z/{b.Field.Modulus}Z cannot be combined");
    }

    /// <summary>Sum (Henrici: g = gcd(b, d); no further gcd when g = 1, else only gcd(numerator, g)).</summary>
    /// <param name="left">a/b.</param>
    /// <param name="right">c/d.</param>
    /// <returns>The canonical sum.</returns>
    /// <exception cref="IncompatibleRingException">The fields differ.</exception>
    public static RationalFunctionModP operator +(RationalFunctionModP left, RationalFunctionModP right)
    {
        Check(left, right);
        if (left.IsZero) return right;
        if (right.IsZero) return left;
        return AddCore(left.Numerator, left.Denominator, right.Numerator, right.Denominator);
    }

    private static RationalFunctionModP AddCore(PolynomialModP a, PolynomialModP b, PolynomialModP c, PolynomialModP d)
    {
        if (b.IsOne && d.IsOne) return new(a + c, b);
        if (d.IsOne) return Normalized(a + c * b, b);   // gcd(a + c·b, b) = gcd(a, b) = 1
        if (b.IsOne) return Normalized(a * d + c, d);
        var g = PolynomialModP.Gcd(b, d);
        if (g.IsOne) return Normalized(a * d + c * b, b * d);
        var b1 = b.DivideExact(g);
        var d1 = d.DivideExact(g);
        var num = a * d1 + c * b1;
        if (num.IsZero) return Zero(a.Field);
        // gcd(num, b1·d1·g) = gcd(num, g) because num is coprime to b1 and to d1.
        var h = PolynomialModP.Gcd(num, g);
        if (!h.IsOne)
        {
            num = num.DivideExact(h);
            g = g.DivideExact(h);
        }
        return Normalized(num, b1 * d1 * g);
    }

    /// <summary>Difference.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The canonical difference.</returns>
    /// <exception cref="IncompatibleRingException">The fields differ.</exception>
    public static RationalFunctionModP operator -(RationalFunctionModP left, RationalFunctionModP right)
    {
        Check(left, right);
        return left + (-right);
    }

    /// <summary>Negation.</summary>
    /// <param name="value">The function.</param>
    /// <returns>−<paramref name="value"/>.</returns>
    public static RationalFunctionModP operator -(RationalFunctionModP value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return new(-value.Numerator, value.Denominator);
    }

    /// <summary>Product (cancels gcd(a, d) and gcd(c, b) separately).</summary>
    /// <param name="left">a/b.</param>
    /// <param name="right">c/d.</param>
    /// <returns>The canonical product.</returns>
    /// <exception cref="IncompatibleRingException">The fields differ.</exception>
    public static RationalFunctionModP operator *(RationalFunctionModP left, RationalFunctionModP right)
    {
        Check(left, right);
        if (left.IsZero) return left;
        if (right.IsZero) return right;
        return MultiplyCore(left.Numerator, left.Denominator, right.Numerator, right.Denominator);
    }

    private static RationalFunctionModP MultiplyCore(PolynomialModP a, PolynomialModP b, PolynomialModP c, PolynomialModP d)
    {
        // (a/b)(c/d) with gcd(a, b) = gcd(c, d) = 1: cancel g1 = gcd(a, d), g2 = gcd(c, b).
        if (!d.IsOne && !a.IsConstant)
        {
            var g1 = PolynomialModP.Gcd(a, d);
            if (!g1.IsOne) { a = a.DivideExact(g1); d = d.DivideExact(g1); }
        }
        if (!b.IsOne && !c.IsConstant)
        {
            var g2 = PolynomialModP.Gcd(c, b);
            if (!g2.IsOne) { c = c.DivideExact(g2); b = b.DivideExact(g2); }
        }
        return Normalized(a * c, b * d);
    }

    /// <summary>Quotient.</summary>
    /// <param name="left">Dividend.</param>
    /// <param name="right">Non-zero divisor.</param>
    /// <returns>The canonical quotient.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="right"/> is zero.</exception>
    /// <exception cref="IncompatibleRingException">The fields differ.</exception>
    public static RationalFunctionModP operator /(RationalFunctionModP left, RationalFunctionModP right)
    {
        Check(left, right);
        if (right.IsZero) throw new DivideByZeroException("division by the zero rational function");
        if (left.IsZero) return left;
        return MultiplyCore(left.Numerator, left.Denominator, right.Denominator, right.Numerator);
    }

    /// <summary>Sum with a polynomial.</summary>
    /// <param name="left">The function.</param>
    /// <param name="right">The polynomial.</param>
    /// <returns>The sum.</returns>
    public static RationalFunctionModP operator +(RationalFunctionModP left, PolynomialModP right) => left + FromPolynomial(right);

    /// <summary>Product with a polynomial.</summary>
    /// <param name="left">The function.</param>
    /// <param name="right">The polynomial.</param>
    /// <returns>The product.</returns>
    public static RationalFunctionModP operator *(RationalFunctionModP left, PolynomialModP right) => left * FromPolynomial(right);

    /// <summary>Sum with an integer constant.</summary>
    /// <param name="left">The function.</param>
    /// <param name="right">An integer (reduced mod p).</param>
    /// <returns>The sum.</returns>
    public static RationalFunctionModP operator +(RationalFunctionModP left, long right)
    {
        ArgumentNullException.ThrowIfNull(left);
        return left + Constant(left.Field, right);
    }

    /// <summary>Sum with an integer constant.</summary>
    /// <param name="left">An integer (reduced mod p).</param>
    /// <param name="right">The function.</param>
    /// <returns>The sum.</returns>
    public static RationalFunctionModP operator +(long left, RationalFunctionModP right) => right + left;

    /// <summary>Difference with an integer constant.</summary>
    /// <param name="left">The function.</param>
    /// <param name="right">An integer (reduced mod p).</param>
    /// <returns>The difference.</returns>
    public static RationalFunctionModP operator -(RationalFunctionModP left, long right) => left + (-right);

    /// <summary>Difference with an integer constant.</summary>
    /// <param name="left">An integer (reduced mod p).</param>
    /// <param name="right">The function.</param>
    /// <returns>The difference.</returns>
    public static RationalFunctionModP operator -(long left, RationalFunctionModP right) => -right + left;

    /// <summary>Scalar multiple.</summary>
    /// <param name="left">The function.</param>
    /// <param name="right">An integer (reduced mod p).</param>
    /// <returns>The product.</returns>
    public static RationalFunctionModP operator *(RationalFunctionModP left, long right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ulong c = left.Field.FromInteger(right);
        return c == 0 ? Zero(left.Field) : new(left.Numerator.Scale(c), left.Denominator);
    }

    /// <summary>Scalar multiple.</summary>
    /// <param name="left">An integer (reduced mod p).</param>
    /// <param name="right">The function.</param>
    /// <returns>The product.</returns>
    public static RationalFunctionModP operator *(long left, RationalFunctionModP right) => right * left;

    /// <summary>An integer divided by a rational function.</summary>
    /// <param name="left">An integer (reduced mod p).</param>
    /// <param name="right">Non-zero divisor.</param>
    /// <returns>left/right.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="right"/> is zero.</exception>
    public static RationalFunctionModP operator /(long left, RationalFunctionModP right)
    {
        ArgumentNullException.ThrowIfNull(right);
        return right.Inverse() * left;
    }

    /// <summary>A rational function divided by a non-zero integer constant.</summary>
    /// <param name="left">The function.</param>
    /// <param name="right">An integer, non-zero mod p.</param>
    /// <returns>left/right.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="right"/> is zero mod p.</exception>
    public static RationalFunctionModP operator /(RationalFunctionModP left, long right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ulong c = left.Field.FromInteger(right);
        if (c == 0) throw new DivideByZeroException($"division by {right} ≡ 0 mod {left.Field.Modulus}");
        return new(left.Numerator.Scale(left.Field.Inverse(c)), left.Denominator);
    }

    /// <summary>Sum (named form).</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns>The sum.</returns>
    public static RationalFunctionModP Add(RationalFunctionModP left, RationalFunctionModP right) => left + right;

    /// <summary>Difference (named form).</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static RationalFunctionModP Subtract(RationalFunctionModP left, RationalFunctionModP right) => left - right;

    /// <summary>Product (named form).</summary>
    /// <param name="left">First factor.</param>
    /// <param name="right">Second factor.</param>
    /// <returns>The product.</returns>
    public static RationalFunctionModP Multiply(RationalFunctionModP left, RationalFunctionModP right) => left * right;

    /// <summary>Quotient (named form).</summary>
    /// <param name="left">Dividend.</param>
    /// <param name="right">Non-zero divisor.</param>
    /// <returns>The quotient.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="right"/> is zero.</exception>
    public static RationalFunctionModP Divide(RationalFunctionModP left, RationalFunctionModP right) => left / right;

    /// <summary>Negation (named form).</summary>
    /// <param name="value">The function.</param>
    /// <returns>The negation.</returns>
    public static RationalFunctionModP Negate(RationalFunctionModP value) => -value;

    /// <summary>The multiplicative inverse (swaps the parts; no gcd needed).</summary>
    /// <returns>1/this.</returns>
    /// <exception cref="DivideByZeroException">This function is zero.</exception>
    public RationalFunctionModP Inverse()
    {
        if (IsZero) throw new DivideByZeroException("the zero rational function has no inverse");
        return Normalized(Denominator, Numerator);
    }

    /// <summary>Integer power; negative exponents invert first. Powers of coprime parts stay coprime, so no gcd is needed.</summary>
    /// <param name="exponent">The exponent.</param>
    /// <returns>this^exponent (anything to the 0 is 1).</returns>
    /// <exception cref="DivideByZeroException">Zero to a negative power.</exception>
    public RationalFunctionModP Pow(int exponent)
    {
        if (exponent == 0) return One(Field);
        var b = exponent < 0 ? Inverse() : this;
        long e = Math.Abs((long)exponent);
        if (e > int.MaxValue) throw new ArgumentOutOfRangeException(nameof(exponent));
        return new(b.Numerator.Pow((int)e), b.Denominator.Pow((int)e));
    }

    /// <summary>The value at a point.</summary>
    /// <param name="x">The point (reduced mod p).</param>
    /// <returns>numerator(x)/denominator(x) mod p.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="x"/> is a pole (the denominator vanishes there).</exception>
    public ulong Evaluate(ulong x)
    {
        ulong d = Denominator.Evaluate(x);
        if (d == 0) throw new DivideByZeroException($"{x} is a pole of the rational function");
        return Field.Multiply(Numerator.Evaluate(x), Field.Inverse(d));
    }

    /// <summary>The composition this(<paramref name="inner"/>).</summary>
    /// <param name="inner">The inner rational function (same field).</param>
    /// <returns>The canonical composition.</returns>
    /// <remarks>With this = N/D of degree n = max(deg N, deg D) and inner = u/v, this(u/v) =
    /// [v^n·N(u/v)]/[v^n·D(u/v)], both homogenised polynomials evaluated by Horner's rule in (u, v);
    /// one gcd cancels the common factor.</remarks>
    /// <exception cref="IncompatibleRingException">The fields differ.</exception>
    /// <exception cref="DivideByZeroException">The composition has a zero denominator (inner hits a pole identically).</exception>
    public RationalFunctionModP Compose(RationalFunctionModP inner)
    {
        Check(this, inner);
        int n = Degree;
        var u = inner.Numerator;
        var v = inner.Denominator;
        var num = Homogenize(Numerator, n, u, v);
        var den = Homogenize(Denominator, n, u, v);
        return Create(num, den);
    }

    /// <summary>v^n·f(u/v) = Σ fᵢ uⁱ v^(n−i) for deg f ≤ n (Horner in u with powers of v).</summary>
    private static PolynomialModP Homogenize(PolynomialModP f, int n, PolynomialModP u, PolynomialModP v)
    {
        if (f.IsZero) return f;
        int d = f.Degree;
        // Homogeneous Horner: acc ← acc·u + f_i·v^(d−i), then times v^(n−d).
        var acc = PolynomialModP.One(f.Field).Scale(f[d]);
        var vp = PolynomialModP.One(f.Field);
        for (int i = d - 1; i >= 0; i--)
        {
            vp *= v;
            acc = acc * u + vp.Scale(f[i]);
        }
        if (n > d) acc *= v.Pow(n - d);
        return acc;
    }
}
