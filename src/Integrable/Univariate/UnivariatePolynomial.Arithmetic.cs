using System.Numerics;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;

namespace Integrable.Univariate;

public sealed partial class UnivariatePolynomial
{
    /// <summary>Shorter operand length from which products go through integer images modulo primes.</summary>
    internal static int ModularMultiplyThreshold = 16;

    /// <summary>Sum.</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns>The sum.</returns>
    public static UnivariatePolynomial operator +(UnivariatePolynomial left, UnivariatePolynomial right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        var (a, b) = left._c.Length >= right._c.Length ? (left._c, right._c) : (right._c, left._c);
        var r = (Rational[])a.Clone();
        for (int i = 0; i < b.Length; i++) r[i] += b[i];
        return new(Trim(r));
    }

    /// <summary>Difference.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static UnivariatePolynomial operator -(UnivariatePolynomial left, UnivariatePolynomial right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        var r = new Rational[Math.Max(left._c.Length, right._c.Length)];
        left._c.CopyTo(r, 0);
        for (int i = 0; i < right._c.Length; i++) r[i] -= right._c[i];
        return new(Trim(r));
    }

    /// <summary>Negation.</summary>
    /// <param name="value">The polynomial.</param>
    /// <returns>The negation.</returns>
    public static UnivariatePolynomial operator -(UnivariatePolynomial value)
    {
        ArgumentNullException.ThrowIfNull(value);
        var r = new Rational[value._c.Length];
        for (int i = 0; i < r.Length; i++) r[i] = -value._c[i];
        return new(r);
    }

    /// <summary>Product: schoolbook over Q for short operands, otherwise the integer polynomials after
    /// clearing denominators are multiplied through prime images (transform products) and Chinese
    /// remaindering within the bound min(len)·‖F‖∞·‖G‖∞.</summary>
    /// <param name="left">First factor.</param>
    /// <param name="right">Second factor.</param>
    /// <returns>The product.</returns>
    public static UnivariatePolynomial operator *(UnivariatePolynomial left, UnivariatePolynomial right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (left.IsZero || right.IsZero) return Zero;
        if (Math.Min(left._c.Length, right._c.Length) < ModularMultiplyThreshold)
        {
            var r = new Rational[left._c.Length + right._c.Length - 1];
            for (int i = 0; i < left._c.Length; i++)
            {
                var a = left._c[i];
                if (a.IsZero) continue;
                for (int j = 0; j < right._c.Length; j++) r[i + j] += a * right._c[j];
            }
            return new(Trim(r));
        }
        var (f, df) = left.ToIntegerPolynomial();
        var (g, dg) = right.ToIntegerPolynomial();
        var h = IntegerPoly.Multiply(f, g);
        return FromIntegers(h, new Rational(BigInteger.One, df * dg));
    }

    /// <summary>Scalar multiple.</summary>
    /// <param name="left">The polynomial.</param>
    /// <param name="right">The scalar.</param>
    /// <returns>The product.</returns>
    public static UnivariatePolynomial operator *(UnivariatePolynomial left, Rational right)
    {
        ArgumentNullException.ThrowIfNull(left);
        if (right.IsZero) return Zero;
        if (right.IsOne) return left;
        var r = new Rational[left._c.Length];
        for (int i = 0; i < r.Length; i++) r[i] = left._c[i] * right;
        return new(r);
    }

    /// <summary>Scalar multiple.</summary>
    /// <param name="left">The scalar.</param>
    /// <param name="right">The polynomial.</param>
    /// <returns>The product.</returns>
    public static UnivariatePolynomial operator *(Rational left, UnivariatePolynomial right) => right * left;

    /// <summary>Division by a non-zero scalar.</summary>
    /// <param name="left">The polynomial.</param>
    /// <param name="right">The non-zero scalar.</param>
    /// <returns>The quotient.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="right"/> is zero.</exception>
    public static UnivariatePolynomial operator /(UnivariatePolynomial left, Rational right)
    {
        if (right.IsZero) throw new DivideByZeroException("polynomial divided by zero");
        return left * right.Inverse();
    }

    /// <summary>Sum with a constant.</summary>
    /// <param name="left">The polynomial.</param>
    /// <param name="right">The constant.</param>
    /// <returns>The sum.</returns>
    public static UnivariatePolynomial operator +(UnivariatePolynomial left, Rational right) => left + Constant(right);

    /// <summary>Sum with a constant.</summary>
    /// <param name="left">The constant.</param>
    /// <param name="right">The polynomial.</param>
    /// <returns>The sum.</returns>
    public static UnivariatePolynomial operator +(Rational left, UnivariatePolynomial right) => Constant(left) + right;

    /// <summary>Difference with a constant.</summary>
    /// <param name="left">The polynomial.</param>
    /// <param name="right">The constant.</param>
    /// <returns>The difference.</returns>
    public static UnivariatePolynomial operator -(UnivariatePolynomial left, Rational right) => left - Constant(right);

    /// <summary>Difference with a constant.</summary>
    /// <param name="left">The constant.</param>
    /// <param name="right">The polynomial.</param>
    /// <returns>The difference.</returns>
    public static UnivariatePolynomial operator -(Rational left, UnivariatePolynomial right) => Constant(left) - right;

    /// <summary>Sum (named form).</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns>The sum.</returns>
    public static UnivariatePolynomial Add(UnivariatePolynomial left, UnivariatePolynomial right) => left + right;

    /// <summary>Difference (named form).</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static UnivariatePolynomial Subtract(UnivariatePolynomial left, UnivariatePolynomial right) => left - right;

    /// <summary>Product (named form).</summary>
    /// <param name="left">First factor.</param>
    /// <param name="right">Second factor.</param>
    /// <returns>The product.</returns>
    public static UnivariatePolynomial Multiply(UnivariatePolynomial left, UnivariatePolynomial right) => left * right;

    /// <summary>Negation (named form).</summary>
    /// <param name="value">The polynomial.</param>
    /// <returns>The negation.</returns>
    public static UnivariatePolynomial Negate(UnivariatePolynomial value) => -value;

    /// <summary>Power by repeated squaring.</summary>
    /// <param name="exponent">A non-negative exponent.</param>
    /// <returns>this^exponent (0⁰ = 1).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="exponent"/> is negative.</exception>
    public UnivariatePolynomial Pow(int exponent)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(exponent);
        var result = One;
        var b = this;
        while (exponent > 0)
        {
            if ((exponent & 1) != 0) result *= b;
            exponent >>= 1;
            if (exponent > 0) b *= b;
        }
        return result;
    }

    /// <summary>The value at a rational point (Horner's rule).</summary>
    /// <param name="x">The point.</param>
    /// <returns>this(x).</returns>
    public Rational Evaluate(Rational x)
    {
        if (x.IsInteger || _c.Length <= 1)
        {
            var r = Rational.Zero;
            for (int i = _c.Length - 1; i >= 0; i--) r = r * x + _c[i];
            return r;
        }
        // Homogeneous form on the integer numerators: v^d·F(u/v)/den.
        var (f, den) = ToIntegerPolynomial();
        var u = x.Numerator;
        var v = x.Denominator;
        var num = IntegerPoly.EvaluateHomogeneous(f, u, v);
        return new Rational(num, den * BigInteger.Pow(v, _c.Length - 1));
    }

    /// <summary>The formal derivative.</summary>
    /// <returns>d/dx of this polynomial.</returns>
    public UnivariatePolynomial Derivative()
    {
        if (_c.Length <= 1) return Zero;
        var r = new Rational[_c.Length - 1];
        for (int i = 1; i < _c.Length; i++) r[i - 1] = _c[i] * i;
        return new(r);
    }

    /// <summary>The monic associate.</summary>
    /// <returns>this / leading coefficient.</returns>
    /// <exception cref="DivideByZeroException">The polynomial is zero.</exception>
    public UnivariatePolynomial MakeMonic()
    {
        if (IsZero) throw new DivideByZeroException("the zero polynomial has no monic associate");
        return IsMonic ? this : this * LeadingCoefficient.Inverse();
    }

    /// <summary>The content: the positive rational c such that this/c has coprime integer coefficients (0 for zero).</summary>
    /// <returns>The content.</returns>
    public Rational Content()
    {
        if (IsZero) return Rational.Zero;
        var (c, _) = ToPrimitive();
        return c.Sign < 0 ? -c : c;
    }

    /// <summary>The primitive part this/<see cref="Content"/>: integer coefficients with gcd 1, same sign as this.</summary>
    /// <returns>The primitive part (zero for zero).</returns>
    public UnivariatePolynomial PrimitivePart()
    {
        if (IsZero) return Zero;
        var (c, prim) = ToPrimitive();
        return FromIntegers(prim, c.Sign < 0 ? Rational.NegativeOne : Rational.One);
    }

    /// <summary>The composition this(<paramref name="inner"/>).</summary>
    /// <param name="inner">The inner polynomial.</param>
    /// <returns>The composed polynomial.</returns>
    /// <remarks>Divide and conquer on the coefficient list with the powers inner^(2^i) computed once.</remarks>
    public UnivariatePolynomial Compose(UnivariatePolynomial inner)
    {
        ArgumentNullException.ThrowIfNull(inner);
        if (_c.Length <= 1) return this;
        if (inner.IsConstant) return Constant(Evaluate(inner[0]));
        var powers = new List<UnivariatePolynomial> { inner };
        while ((1 << powers.Count) < _c.Length) powers.Add(powers[^1] * powers[^1]);
        return ComposeRec(_c, powers, powers.Count);
    }

    private static UnivariatePolynomial ComposeRec(ReadOnlySpan<Rational> f, List<UnivariatePolynomial> powers, int level)
    {
        int n = f.Length;
        while (n > 0 && f[n - 1].IsZero) n--;
        f = f[..n];
        if (f.IsEmpty) return Zero;
        if (f.Length <= 8 || level == 0)
        {
            var acc = Constant(f[^1]);
            for (int i = f.Length - 2; i >= 0; i--) acc = acc * powers[0] + f[i];
            return acc;
        }
        int half = 1 << (level - 1);
        if (f.Length <= half) return ComposeRec(f, powers, level - 1);
        return ComposeRec(f[..half], powers, level - 1) + ComposeRec(f[half..], powers, level - 1) * powers[level - 1];
    }
}
