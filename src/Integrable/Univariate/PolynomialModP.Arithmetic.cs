using Integrable.Kernels.Univariate;

namespace Integrable.Univariate;

public sealed partial class PolynomialModP
{
    /// <summary>Sum.</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns><paramref name="left"/> + <paramref name="right"/>.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public static PolynomialModP operator +(PolynomialModP left, PolynomialModP right)
    {
        var ctx = Common(left, right);
        return new(ctx, PolyMod.Add(ctx.Mod, left._c, right._c));
    }

    /// <summary>Difference.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns><paramref name="left"/> − <paramref name="right"/>.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public static PolynomialModP operator -(PolynomialModP left, PolynomialModP right)
    {
        var ctx = Common(left, right);
        return new(ctx, PolyMod.Subtract(ctx.Mod, left._c, right._c));
    }

    /// <summary>Negation.</summary>
    /// <param name="value">The polynomial.</param>
    /// <returns>−<paramref name="value"/>.</returns>
    public static PolynomialModP operator -(PolynomialModP value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return new(value.Context, PolyMod.Negate(value.Context.Mod, value._c));
    }

    /// <summary>Product (schoolbook, Karatsuba or transform multiplication by size).</summary>
    /// <param name="left">First factor.</param>
    /// <param name="right">Second factor.</param>
    /// <returns><paramref name="left"/>·<paramref name="right"/>.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public static PolynomialModP operator *(PolynomialModP left, PolynomialModP right)
    {
        var ctx = Common(left, right);
        return new(ctx, PolyMod.Multiply(ctx, left._c, right._c));
    }

    /// <summary>Sum with a constant.</summary>
    /// <param name="left">The polynomial.</param>
    /// <param name="right">An integer (reduced mod p).</param>
    /// <returns><paramref name="left"/> + <paramref name="right"/>.</returns>
    public static PolynomialModP operator +(PolynomialModP left, long right)
    {
        ArgumentNullException.ThrowIfNull(left);
        return left + Constant(left.Field, right);
    }

    /// <summary>Sum with a constant.</summary>
    /// <param name="left">An integer (reduced mod p).</param>
    /// <param name="right">The polynomial.</param>
    /// <returns><paramref name="left"/> + <paramref name="right"/>.</returns>
    public static PolynomialModP operator +(long left, PolynomialModP right) => right + left;

    /// <summary>Difference with a constant.</summary>
    /// <param name="left">The polynomial.</param>
    /// <param name="right">An integer (reduced mod p).</param>
    /// <returns><paramref name="left"/> − <paramref name="right"/>.</returns>
    public static PolynomialModP operator -(PolynomialModP left, long right)
    {
        ArgumentNullException.ThrowIfNull(left);
        return left - Constant(left.Field, right);
    }

    /// <summary>Difference with a constant.</summary>
    /// <param name="left">An integer (reduced mod p).</param>
    /// <param name="right">The polynomial.</param>
    /// <returns><paramref name="left"/> − <paramref name="right"/>.</returns>
    public static PolynomialModP operator -(long left, PolynomialModP right)
    {
        ArgumentNullException.ThrowIfNull(right);
        return Constant(right.Field, left) - right;
    }

    /// <summary>Scalar multiple.</summary>
    /// <param name="left">The polynomial.</param>
    /// <param name="right">An integer (reduced mod p).</param>
    /// <returns><paramref name="left"/>·<paramref name="right"/>.</returns>
    public static PolynomialModP operator *(PolynomialModP left, long right)
    {
        ArgumentNullException.ThrowIfNull(left);
        return left.Scale(left.Field.FromInteger(right));
    }

    /// <summary>Scalar multiple.</summary>
    /// <param name="left">An integer (reduced mod p).</param>
    /// <param name="right">The polynomial.</param>
    /// <returns><paramref name="left"/>·<paramref name="right"/>.</returns>
    public static PolynomialModP operator *(long left, PolynomialModP right) => right * left;

    /// <summary>Sum (named form of <c>+</c>).</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns>The sum.</returns>
    public static PolynomialModP Add(PolynomialModP left, PolynomialModP right) => left + right;

    /// <summary>Difference (named form of <c>-</c>).</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static PolynomialModP Subtract(PolynomialModP left, PolynomialModP right) => left - right;

    /// <summary>Product (named form of <c>*</c>).</summary>
    /// <param name="left">First factor.</param>
    /// <param name="right">Second factor.</param>
    /// <returns>The product.</returns>
    public static PolynomialModP Multiply(PolynomialModP left, PolynomialModP right) => left * right;

    /// <summary>Negation (named form of unary <c>-</c>).</summary>
    /// <param name="value">The polynomial.</param>
    /// <returns>The negation.</returns>
    public static PolynomialModP Negate(PolynomialModP value) => -value;

    /// <summary>Multiplies every coefficient by a residue.</summary>
    /// <param name="factor">Any word (reduced mod p).</param>
    /// <returns>factor·this.</returns>
    public PolynomialModP Scale(ulong factor)
    {
        factor %= Context.P;
        return factor == 1 ? this : new(Context, PolyMod.Scale(Context.Mod, _c, factor));
    }

    /// <summary>The square (one transform fewer than a general product).</summary>
    /// <returns>this².</returns>
    public PolynomialModP Square() => new(Context, PolyMod.Square(Context, _c));

    /// <summary>Power by repeated squaring.</summary>
    /// <param name="exponent">A non-negative exponent.</param>
    /// <returns>this^exponent (0⁰ = 1).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="exponent"/> is negative.</exception>
    public PolynomialModP Pow(int exponent)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(exponent);
        ulong[] result = [1];
        ulong[] b = _c;
        if (exponent == 0) return new(Context, result);
        if (_c.Length == 0) return this;
        while (true)
        {
            if ((exponent & 1) != 0) result = PolyMod.Multiply(Context, result, b);
            exponent >>= 1;
            if (exponent == 0) break;
            b = PolyMod.Square(Context, b);
        }
        return new(Context, result);
    }

    /// <summary>this·x^k.</summary>
    /// <param name="k">A non-negative shift.</param>
    /// <returns>The shifted polynomial.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="k"/> is negative.</exception>
    public PolynomialModP ShiftLeft(int k)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(k);
        return k == 0 ? this : new(Context, PolyMod.ShiftLeft(_c, k));
    }

    /// <summary>The value at a point (Horner's rule).</summary>
    /// <param name="x">The point (any word; reduced mod p).</param>
    /// <returns>this(x) mod p.</returns>
    public ulong Evaluate(ulong x) => PolyMod.Evaluate(Context.Mod, _c, x % Context.P);

    /// <summary>The formal derivative.</summary>
    /// <returns>d/dx of this polynomial (coefficients i·cᵢ mod p, so x^p has derivative 0).</returns>
    public PolynomialModP Derivative() => new(Context, PolyMod.Derivative(Context.Mod, _c));

    /// <summary>The monic associate (this divided by its leading coefficient).</summary>
    /// <returns>The monic polynomial.</returns>
    /// <exception cref="DivideByZeroException">The polynomial is zero.</exception>
    public PolynomialModP MakeMonic()
    {
        if (_c.Length == 0) throw new DivideByZeroException("the zero polynomial has no monic associate");
        return _c[^1] == 1 ? this : new(Context, PolyMod.MakeMonic(Context.Mod, _c));
    }

    /// <summary>The composition this(<paramref name="inner"/>(x)).</summary>
    /// <param name="inner">The inner polynomial (same field).</param>
    /// <returns>The composed polynomial of degree deg(this)·deg(inner).</returns>
    /// <remarks>Divide and conquer: f = f_lo + x^k·f_hi gives f(g) = f_lo(g) + g^k·f_hi(g) with the powers
    /// g^(2^i) computed once, O(M(n) log n) for output degree n.</remarks>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public PolynomialModP Compose(PolynomialModP inner)
    {
        var ctx = Common(this, inner);
        if (_c.Length <= 1 || inner.Degree == 1 && inner._c[0] == 0 && inner._c[1] == 1) return this;
        if (inner._c.Length <= 1)
            return new(ctx, PolyMod.Trim([Evaluate(inner[0])]));
        var powers = new List<ulong[]> { inner._c };   // g^(2^i)
        while ((1 << powers.Count) < _c.Length) powers.Add(PolyMod.Square(ctx, powers[^1]));
        return new(ctx, ComposeRec(ctx, _c, powers, powers.Count));
    }

    private static ulong[] ComposeRec(PolyModContext ctx, ReadOnlySpan<ulong> f, List<ulong[]> powers, int level)
    {
        // f has at most 2^level coefficients.
        f = f[..PolyMod.TrimmedLength(f)];
        if (f.IsEmpty) return [];
        if (f.Length <= 8 || level == 0)
        {
            // Horner in g.
            ulong[] acc = [f[^1]];
            for (int i = f.Length - 2; i >= 0; i--)
            {
                acc = PolyMod.Multiply(ctx, acc, powers[0]);
                acc = PolyMod.Add(ctx.Mod, acc, f[i] == 0 ? [] : [f[i]]);
            }
            return acc;
        }
        int half = 1 << (level - 1);
        if (f.Length <= half) return ComposeRec(ctx, f, powers, level - 1);
        var lo = ComposeRec(ctx, f[..half], powers, level - 1);
        var hi = ComposeRec(ctx, f[half..], powers, level - 1);
        return PolyMod.Add(ctx.Mod, lo, PolyMod.Multiply(ctx, hi, powers[level - 1]));
    }
}
