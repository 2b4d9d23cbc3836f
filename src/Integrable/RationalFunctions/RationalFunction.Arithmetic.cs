using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.RationalFunctions;

public sealed partial class RationalFunction
{
    /// <summary>Sum (Henrici: only gcd(b, d) and a gcd with it are needed).</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand (same field).</param>
    /// <returns>The canonical sum.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public static RationalFunction operator +(RationalFunction left, RationalFunction right)
    {
        ArgumentNullException.ThrowIfNull(left);
        left.CheckField(right);
        var field = left.Field;
        if (left.IsZero) return right;
        if (right.IsZero) return left;
        LaurentPolynomial a = left.Numerator, b = left.Denominator, c = right.Numerator, d = right.Denominator;
        if (b.IsOne && d.IsOne)
        {
            var s = a + c;
            return s.IsZero ? field.Zero : new RationalFunction(field, s, b);
        }
        if (b.Equals(d))
        {
            // gcd(a + c, b) can be non-trivial.
            var s = a + c;
            if (s.IsZero) return field.Zero;
            var (_, s1, b1) = s.GcdWithCofactors(b, MonomialFactor.Keep);
            return new RationalFunction(field, s1, b1);
        }
        if (b.IsOne) return new RationalFunction(field, Mul(a, d) + c, d);   // gcd(a·d + c, d) = gcd(c, d) = 1
        if (d.IsOne) return new RationalFunction(field, a + Mul(c, b), b);
        var (g, b1x, d1x) = b.GcdWithCofactors(d, MonomialFactor.Keep);
        if (g.IsOne)
        {
            var num = Mul(a, d) + Mul(c, b);
            return num.IsZero ? field.Zero : new RationalFunction(field, num, Mul(b, d));
        }
        var t = Mul(a, d1x) + Mul(c, b1x);
        if (t.IsZero) return field.Zero;
        var (_, t1, g1) = t.GcdWithCofactors(g, MonomialFactor.Keep);
        return new RationalFunction(field, t1, Mul(Mul(b1x, d1x), g1));
    }

    /// <summary>Difference.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend (same field).</param>
    /// <returns>The canonical difference.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public static RationalFunction operator -(RationalFunction left, RationalFunction right)
    {
        ArgumentNullException.ThrowIfNull(right);
        return left + (-right);
    }

    /// <summary>Negation.</summary>
    /// <param name="value">The function.</param>
    /// <returns>−<paramref name="value"/>.</returns>
    public static RationalFunction operator -(RationalFunction value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return value.IsZero ? value : new RationalFunction(value.Field, -value.Numerator, value.Denominator);
    }

    /// <summary>Product (cancels gcd(a, d) and gcd(c, b) first).</summary>
    /// <param name="left">First factor.</param>
    /// <param name="right">Second factor (same field).</param>
    /// <returns>The canonical product.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public static RationalFunction operator *(RationalFunction left, RationalFunction right)
    {
        ArgumentNullException.ThrowIfNull(left);
        left.CheckField(right);
        var field = left.Field;
        if (left.IsZero || right.IsZero) return field.Zero;
        LaurentPolynomial a = left.Numerator, b = left.Denominator, c = right.Numerator, d = right.Denominator;
        if (!d.IsOne && !a.IsConstant)
        {
            var (_, a1, d1) = a.GcdWithCofactors(d, MonomialFactor.Keep);
            a = a1;
            d = d1;
        }
        if (!b.IsOne && !c.IsConstant)
        {
            var (_, c1, b1) = c.GcdWithCofactors(b, MonomialFactor.Keep);
            c = c1;
            b = b1;
        }
        return new RationalFunction(field, Mul(a, c), Mul(b, d));
    }

    /// <summary>Quotient.</summary>
    /// <param name="left">Dividend.</param>
    /// <param name="right">Divisor (same field, non-zero).</param>
    /// <returns>The canonical quotient.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="right"/> is zero.</exception>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public static RationalFunction operator /(RationalFunction left, RationalFunction right)
    {
        ArgumentNullException.ThrowIfNull(left);
        left.CheckField(right);
        return left * right.Inverse();
    }

    /// <summary>Sum with a constant.</summary>
    /// <param name="left">The function.</param>
    /// <param name="right">The constant.</param>
    /// <returns><paramref name="left"/> + <paramref name="right"/>.</returns>
    public static RationalFunction operator +(RationalFunction left, Rational right)
    {
        ArgumentNullException.ThrowIfNull(left);
        if (right.IsZero) return left;
        // gcd(a + λb, b) = gcd(a, b) = 1
        var num = left.Numerator + left.Denominator * right;
        return num.IsZero ? left.Field.Zero : new RationalFunction(left.Field, num, left.Denominator);
    }

    /// <summary>Sum with a constant.</summary>
    /// <param name="left">The constant.</param>
    /// <param name="right">The function.</param>
    /// <returns><paramref name="left"/> + <paramref name="right"/>.</returns>
    public static RationalFunction operator +(Rational left, RationalFunction right) => right + left;

    /// <summary>Difference with a constant.</summary>
    /// <param name="left">The function.</param>
    /// <param name="right">The constant.</param>
    /// <returns><paramref name="left"/> − <paramref name="right"/>.</returns>
    public static RationalFunction operator -(RationalFunction left, Rational right) => left + (-right);

    /// <summary>Difference with a constant.</summary>
    /// <param name="left">The constant.</param>
    /// <param name="right">The function.</param>
    /// <returns><paramref name="left"/> − <paramref name="right"/>.</returns>
    public static RationalFunction operator -(Rational left, RationalFunction right) => -right + left;

    /// <summary>Product with a constant.</summary>
    /// <param name="left">The function.</param>
    /// <param name="right">The constant.</param>
    /// <returns><paramref name="left"/>·<paramref name="right"/>.</returns>
    public static RationalFunction operator *(RationalFunction left, Rational right)
    {
        ArgumentNullException.ThrowIfNull(left);
        if (right.IsZero) return left.Field.Zero;
        return right.IsOne ? left : new RationalFunction(left.Field, left.Numerator * right, left.Denominator);
    }

    /// <summary>Product with a constant.</summary>
    /// <param name="left">The constant.</param>
    /// <param name="right">The function.</param>
    /// <returns><paramref name="left"/>·<paramref name="right"/>.</returns>
    public static RationalFunction operator *(Rational left, RationalFunction right) => right * left;

    /// <summary>Quotient by a constant.</summary>
    /// <param name="left">The function.</param>
    /// <param name="right">The non-zero constant.</param>
    /// <returns><paramref name="left"/>/<paramref name="right"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="right"/> is zero.</exception>
    public static RationalFunction operator /(RationalFunction left, Rational right)
    {
        if (right.IsZero) throw new DivideByZeroException("Division of a rational function by zero.");
        return left * right.Inverse();
    }

    /// <summary>A constant divided by a function.</summary>
    /// <param name="left">The constant.</param>
    /// <param name="right">The non-zero function.</param>
    /// <returns><paramref name="left"/>/<paramref name="right"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="right"/> is zero.</exception>
    public static RationalFunction operator /(Rational left, RationalFunction right)
    {
        ArgumentNullException.ThrowIfNull(right);
        return right.Inverse() * left;
    }

    /// <summary>Named form of <c>a + b</c>.</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns>The sum.</returns>
    public static RationalFunction Add(RationalFunction left, RationalFunction right) => left + right;

    /// <summary>Named form of <c>a - b</c>.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static RationalFunction Subtract(RationalFunction left, RationalFunction right) => left - right;

    /// <summary>Named form of <c>a * b</c>.</summary>
    /// <param name="left">First factor.</param>
    /// <param name="right">Second factor.</param>
    /// <returns>The product.</returns>
    public static RationalFunction Multiply(RationalFunction left, RationalFunction right) => left * right;

    /// <summary>Named form of <c>a / b</c>.</summary>
    /// <param name="left">Dividend.</param>
    /// <param name="right">Divisor.</param>
    /// <returns>The quotient.</returns>
    public static RationalFunction Divide(RationalFunction left, RationalFunction right) => left / right;

    /// <summary>Named form of unary minus.</summary>
    /// <param name="value">The function.</param>
    /// <returns>The negation.</returns>
    public static RationalFunction Negate(RationalFunction value) => -value;

    /// <summary>The multiplicative inverse den/num (renormalised).</summary>
    /// <returns>1/this.</returns>
    /// <exception cref="DivideByZeroException">This function is zero.</exception>
    public RationalFunction Inverse()
    {
        if (IsZero) throw new DivideByZeroException("Zero has no inverse in a field of rational functions.");
        var kappa = Numerator.Content;   // signed by the leading coefficient
        var den = kappa.IsOne ? Numerator : Numerator.PrimitivePart;
        var num = kappa.IsOne ? Denominator : Denominator * kappa.Inverse();
        return new RationalFunction(Field, num, den);
    }

    private static LaurentPolynomial Mul(LaurentPolynomial a, LaurentPolynomial b) => PolynomialProducts.Multiply(a, b);

    /// <summary>Integer power; negative exponents invert first.</summary>
    /// <param name="exponent">The exponent.</param>
    /// <returns>this^<paramref name="exponent"/> (f^0 = 1, also for f = 0).</returns>
    /// <exception cref="DivideByZeroException">Zero to a negative power.</exception>
    public RationalFunction Pow(int exponent)
    {
        if (exponent == 0) return Field.One;
        if (exponent == 1) return this;
        if (exponent < 0)
        {
            if (exponent == int.MinValue) throw new OverflowException("Exponent too large.");
            return Inverse().Pow(-exponent);
        }
        if (IsZero) return this;
        // powers of coprime polynomials stay coprime; a power of a primitive positive polynomial is primitive positive
        return new RationalFunction(Field, PolynomialProducts.Pow(Numerator, exponent), PolynomialProducts.Pow(Denominator, exponent));
    }
}
