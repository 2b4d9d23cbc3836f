using Integrable.Kernels.Univariate;

namespace Integrable.Univariate;

public sealed partial class PolynomialModP
{
    /// <summary>Euclidean division: <paramref name="dividend"/> = q·<paramref name="divisor"/> + r with deg r &lt; deg divisor.</summary>
    /// <param name="dividend">The dividend a.</param>
    /// <param name="divisor">The non-zero divisor b.</param>
    /// <returns>The quotient q and remainder r.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public static (PolynomialModP Quotient, PolynomialModP Remainder) DivRem(PolynomialModP dividend, PolynomialModP divisor)
    {
        var ctx = Common(dividend, divisor);
        var (q, r) = PolyMod.DivRem(ctx, dividend._c, divisor._c, ref divisor._reciprocal);
        return (new(ctx, q), new(ctx, r));
    }

    /// <summary>The remainder of Euclidean division.</summary>
    /// <param name="dividend">The dividend.</param>
    /// <param name="divisor">The non-zero divisor.</param>
    /// <returns><paramref name="dividend"/> mod <paramref name="divisor"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    public static PolynomialModP operator %(PolynomialModP dividend, PolynomialModP divisor) => DivRem(dividend, divisor).Remainder;

    /// <summary>The remainder of Euclidean division (named form of <c>%</c>).</summary>
    /// <param name="dividend">The dividend.</param>
    /// <param name="divisor">The non-zero divisor.</param>
    /// <returns>The remainder.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    public static PolynomialModP Mod(PolynomialModP dividend, PolynomialModP divisor) => dividend % divisor;

    /// <summary>Exact division: succeeds when <paramref name="divisor"/> divides this polynomial.</summary>
    /// <param name="divisor">The non-zero divisor.</param>
    /// <param name="quotient">The quotient q with q·divisor = this, when the call succeeds.</param>
    /// <returns>False when the remainder is not zero.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    public bool TryDivideExact(PolynomialModP divisor, out PolynomialModP quotient)
    {
        var ctx = Common(this, divisor);
        var (q, r) = PolyMod.DivRem(ctx, _c, divisor._c, ref divisor._reciprocal);
        quotient = new(ctx, r.Length == 0 ? q : []);
        return r.Length == 0;
    }

    /// <summary>Exact division.</summary>
    /// <param name="divisor">A non-zero divisor of this polynomial.</param>
    /// <returns>The quotient.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    /// <exception cref="ArithmeticException"><paramref name="divisor"/> does not divide this polynomial.</exception>
    public PolynomialModP DivideExact(PolynomialModP divisor)
    {
        if (!TryDivideExact(divisor, out var q))
            throw new ArithmeticException($"a polynomial of degree {divisor.Degree} does not divide this one of degree {Degree} exactly");
        return q;
    }

    /// <summary>The monic greatest common divisor (0 when both are zero).</summary>
    /// <param name="a">First polynomial.</param>
    /// <param name="b">Second polynomial.</param>
    /// <returns>gcd(<paramref name="a"/>, <paramref name="b"/>), monic or zero.</returns>
    /// <remarks>Euclid below degree 600, half-GCD above (O(M(n) log n)).</remarks>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public static PolynomialModP Gcd(PolynomialModP a, PolynomialModP b)
    {
        var ctx = Common(a, b);
        return new(ctx, PolyMod.Gcd(ctx, a._c, b._c));
    }

    /// <summary>The monic gcd g together with Bézout cofactors s, t: s·a + t·b = g.</summary>
    /// <param name="a">First polynomial.</param>
    /// <param name="b">Second polynomial.</param>
    /// <returns>(g, s, t); all zero when both inputs are zero. When both are non-zero, deg s &lt; deg b − deg g and deg t &lt; deg a − deg g.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public static (PolynomialModP Gcd, PolynomialModP S, PolynomialModP T) ExtendedGcd(PolynomialModP a, PolynomialModP b)
    {
        var ctx = Common(a, b);
        var (g, s, t) = PolyMod.ExtendedGcd(ctx, a._c, b._c);
        return (new(ctx, g), new(ctx, s), new(ctx, t));
    }

    /// <summary>The monic least common multiple (0 when either is zero).</summary>
    /// <param name="a">First polynomial.</param>
    /// <param name="b">Second polynomial.</param>
    /// <returns>lcm(<paramref name="a"/>, <paramref name="b"/>).</returns>
    public static PolynomialModP Lcm(PolynomialModP a, PolynomialModP b)
    {
        var ctx = Common(a, b);
        if (a.IsZero || b.IsZero) return Zero(ctx.Field);
        var g = Gcd(a, b);
        return (a.DivideExact(g) * b).MakeMonic();
    }

    /// <summary>The resultant res(a, b) = lc(a)^deg b · Π_{a(α)=0} b(α).</summary>
    /// <param name="a">First polynomial.</param>
    /// <param name="b">Second polynomial.</param>
    /// <returns>The resultant in [0, p); 0 when either is zero; res(c, b) = c^deg b for a constant c.</returns>
    /// <remarks>Computed along the Euclidean remainder sequence:
    /// res(a, b) = (−1)^(deg a·deg b)·lc(b)^(deg a − deg r)·res(b, r) with r = a mod b (O(n²)).</remarks>
    /// <exception cref="Algebra.IncompatibleRingException">The fields differ.</exception>
    public static ulong Resultant(PolynomialModP a, PolynomialModP b)
    {
        var ctx = Common(a, b);
        return PolyMod.Resultant(ctx, a._c, b._c);
    }

    /// <summary>The discriminant disc(f) = (−1)^(n(n−1)/2)·res(f, f′)/lc(f), the resultant taken with the formal
    /// degree n − 1 of f′ (n = deg f ≥ 1).</summary>
    /// <returns>The discriminant; zero exactly when f has a repeated root in the algebraic closure of Z/pZ.</returns>
    /// <exception cref="InvalidOperationException">The polynomial is constant.</exception>
    public ulong Discriminant()
    {
        if (Degree < 1) throw new InvalidOperationException("the discriminant needs degree at least 1");
        var mod = Context.Mod;
        int n = Degree;
        var d = PolyMod.Derivative(mod, _c);
        int dd = d.Length - 1;
        if (dd < 0) return 0;
        // Sylvester resultant with formal degree n − 1 for f′ = lc(f)^(n−1−deg f′)·res(f, f′).
        ulong r = PolyMod.Resultant(Context, _c, d);
        r = mod.Mul(r, mod.Pow(_c[^1], (ulong)(n - 1 - dd)));
        r = mod.Mul(r, mod.Inverse(_c[^1]));
        if (((long)n * (n - 1) / 2 & 1) != 0) r = mod.Neg(r);
        return r;
    }
}
