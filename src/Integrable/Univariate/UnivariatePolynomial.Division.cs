using System.Numerics;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;

namespace Integrable.Univariate;

public sealed partial class UnivariatePolynomial
{
    /// <summary>Euclidean division over Q: dividend = q·divisor + r, deg r &lt; deg divisor (long division).</summary>
    /// <param name="dividend">The dividend.</param>
    /// <param name="divisor">The non-zero divisor.</param>
    /// <returns>Quotient and remainder.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    public static (UnivariatePolynomial Quotient, UnivariatePolynomial Remainder) DivRem(UnivariatePolynomial dividend, UnivariatePolynomial divisor)
    {
        ArgumentNullException.ThrowIfNull(dividend);
        ArgumentNullException.ThrowIfNull(divisor);
        if (divisor.IsZero) throw new DivideByZeroException("polynomial division by zero");
        int la = dividend._c.Length, lb = divisor._c.Length;
        if (la < lb) return (Zero, dividend);
        var r = (Rational[])dividend._c.Clone();
        var q = new Rational[la - lb + 1];
        var inv = divisor._c[^1].Inverse();
        var b = divisor._c;
        for (int k = la - lb; k >= 0; k--)
        {
            var t = r[k + lb - 1];
            if (t.IsZero) continue;
            t *= inv;
            q[k] = t;
            for (int j = 0; j < lb - 1; j++)
                if (!b[j].IsZero) r[k + j] -= t * b[j];
            r[k + lb - 1] = Rational.Zero;
        }
        return (new(Trim(q)), new(Trim(r[..(lb - 1)])));
    }

    /// <summary>The remainder of Euclidean division.</summary>
    /// <param name="dividend">The dividend.</param>
    /// <param name="divisor">The non-zero divisor.</param>
    /// <returns>The remainder.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    public static UnivariatePolynomial operator %(UnivariatePolynomial dividend, UnivariatePolynomial divisor) => DivRem(dividend, divisor).Remainder;

    /// <summary>The remainder (named form of <c>%</c>).</summary>
    /// <param name="dividend">The dividend.</param>
    /// <param name="divisor">The non-zero divisor.</param>
    /// <returns>The remainder.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    public static UnivariatePolynomial Mod(UnivariatePolynomial dividend, UnivariatePolynomial divisor) => dividend % divisor;

    /// <summary>Exact division, decided on the primitive integer parts (Gauss's lemma) by a modular
    /// quotient verified by exact multiplication.</summary>
    /// <param name="divisor">The non-zero divisor.</param>
    /// <param name="quotient">q with q·divisor = this when the call succeeds.</param>
    /// <returns>False when <paramref name="divisor"/> does not divide this polynomial.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    public bool TryDivideExact(UnivariatePolynomial divisor, out UnivariatePolynomial quotient)
    {
        ArgumentNullException.ThrowIfNull(divisor);
        if (divisor.IsZero) throw new DivideByZeroException("polynomial division by zero");
        quotient = Zero;
        if (IsZero) return true;
        if (Degree < divisor.Degree) return false;
        if (divisor.IsConstant) { quotient = this / divisor._c[0]; return true; }
        int lq = _c.Length - divisor._c.Length + 1;
        if (Math.Min(divisor._c.Length, lq) < ModularMultiplyThreshold || (long)lq * divisor._c.Length < 20000)
        {
            var (q, r) = DivRem(this, divisor);
            if (!r.IsZero) return false;
            quotient = q;
            return true;
        }
        var (ca, fa) = ToPrimitive();
        var (cb, fb) = divisor.ToPrimitive();
        if (!IntegerPoly.TryDivideExact(fa, fb, out var fq)) return false;
        quotient = FromIntegers(fq, ca / cb);
        return true;
    }

    /// <summary>Exact division.</summary>
    /// <param name="divisor">A non-zero divisor of this polynomial.</param>
    /// <returns>The quotient.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    /// <exception cref="ArithmeticException"><paramref name="divisor"/> does not divide this polynomial.</exception>
    public UnivariatePolynomial DivideExact(UnivariatePolynomial divisor)
    {
        if (!TryDivideExact(divisor, out var q))
            throw new ArithmeticException($"a polynomial of degree {divisor.Degree} does not divide this one of degree {Degree} exactly");
        return q;
    }

    /// <summary>The monic gcd over Q (0 when both are zero), by Brown's modular algorithm on the primitive
    /// integer parts; the result is verified to divide both inputs exactly.</summary>
    /// <param name="a">First polynomial.</param>
    /// <param name="b">Second polynomial.</param>
    /// <returns>gcd(a, b), monic or zero.</returns>
    public static UnivariatePolynomial Gcd(UnivariatePolynomial a, UnivariatePolynomial b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (a.IsZero) return b.IsZero ? Zero : b.MakeMonic();
        if (b.IsZero) return a.MakeMonic();
        if (a.IsConstant || b.IsConstant) return One;
        var (_, fa) = a.ToPrimitive();
        var (_, fb) = b.ToPrimitive();
        var g = IntegerPoly.GcdPrimitive(fa, fb);
        return FromIntegers(g, new Rational(BigInteger.One, g[^1]));
    }

    /// <summary>The monic least common multiple (0 when either is zero).</summary>
    /// <param name="a">First polynomial.</param>
    /// <param name="b">Second polynomial.</param>
    /// <returns>lcm(a, b).</returns>
    public static UnivariatePolynomial Lcm(UnivariatePolynomial a, UnivariatePolynomial b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (a.IsZero || b.IsZero) return Zero;
        return (a.DivideExact(Gcd(a, b)) * b).MakeMonic();
    }

    /// <summary>The monic gcd g and the cofactors s, t with s·a + t·b = g, deg s &lt; deg b − deg g,
    /// deg t &lt; deg a − deg g (the unique minimal ones).</summary>
    /// <param name="a">First polynomial.</param>
    /// <param name="b">Second polynomial.</param>
    /// <returns>(g, s, t); all zero for a = b = 0.</returns>
    /// <remarks>Cofactors are computed modulo 62-bit primes (extended half-GCD), combined by Chinese
    /// remaindering and rational reconstruction, and accepted only once s·a + t·b = g holds exactly.</remarks>
    public static (UnivariatePolynomial Gcd, UnivariatePolynomial S, UnivariatePolynomial T) ExtendedGcd(UnivariatePolynomial a, UnivariatePolynomial b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (a.IsZero && b.IsZero) return (Zero, Zero, Zero);
        if (b.IsZero) return (a.MakeMonic(), Constant(a.LeadingCoefficient.Inverse()), Zero);
        if (a.IsZero) return (b.MakeMonic(), Zero, Constant(b.LeadingCoefficient.Inverse()));
        var g = Gcd(a, b);
        int ls = Math.Max(b.Degree - g.Degree, 0), lt = Math.Max(a.Degree - g.Degree, 0);
        if (ls + lt == 0)
        {
            // Both are constants times g: g = a / lc(a).
            return (g, Constant(a.LeadingCoefficient.Inverse()), Zero);
        }
        var acc = new MultiModular(ls + lt);
        for (int i = 0; ; i++)
        {
            var field = new PrimeField(Primes.Large(i));
            if (!a.CanReduce(field) || !b.CanReduce(field) || !g.CanReduce(field)) continue;
            var ap = a.ReduceModulo(field);
            var bp = b.ReduceModulo(field);
            if (ap.Degree != a.Degree || bp.Degree != b.Degree) continue;
            var (gp, sp, tp) = PolynomialModP.ExtendedGcd(ap, bp);
            if (!gp.Equals(g.ReduceModulo(field))) continue;      // unlucky prime
            var img = new ulong[ls + lt];
            sp.Coefficients.CopyTo(img);
            tp.Coefficients.CopyTo(img.AsSpan(ls));
            acc.Add(field.Modulus, img);
            // Try a reconstruction when the number of primes doubles, or when the images stopped changing.
            int k = acc.Count;
            if (!acc.Stable && (k & (k - 1)) != 0) continue;
            if (!TryReconstructAll(acc, out var coeffs)) continue;
            var s = FromCoefficients(coeffs.AsSpan(0, ls));
            var t = FromCoefficients(coeffs.AsSpan(ls));
            if ((s * a + t * b).Equals(g)) return (g, s, t);
        }
    }

    private bool CanReduce(PrimeField field)
    {
        foreach (var c in _c) if (!field.CanReduce(c)) return false;
        return true;
    }

    private static bool TryReconstructAll(MultiModular acc, out Rational[] values)
    {
        var ints = acc.Reconstruct();
        values = new Rational[ints.Length];
        var m = acc.Modulus;
        for (int i = 0; i < ints.Length; i++)
        {
            var v = ints[i].Sign < 0 ? ints[i] + m : ints[i];
            if (!RationalReconstruction.TryReconstruct(v, m, out values[i])) return false;
        }
        return true;
    }

    /// <summary>The resultant res(a, b) = lc(a)^deg b·Π_{a(α)=0} b(α) (0 when either is zero).</summary>
    /// <param name="a">First polynomial.</param>
    /// <param name="b">Second polynomial.</param>
    /// <returns>The resultant.</returns>
    /// <remarks>With a = c_a·A and b = c_b·B (A, B primitive integer polynomials),
    /// res(a, b) = c_a^deg b·c_b^deg a·res(A, B), and res(A, B) is computed modulo primes until their
    /// product exceeds twice the Hadamard bound ‖A‖₂^deg B·‖B‖₂^deg A.</remarks>
    public static Rational Resultant(UnivariatePolynomial a, UnivariatePolynomial b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (a.IsZero || b.IsZero) return Rational.Zero;
        var (ca, fa) = a.ToPrimitive();
        var (cb, fb) = b.ToPrimitive();
        var r = IntegerPoly.Resultant(fa, fb);
        return r * ca.Pow(b.Degree) * cb.Pow(a.Degree);
    }

    /// <summary>The discriminant (−1)^(n(n−1)/2)·res(f, f′)/lc(f) for degree n ≥ 1.</summary>
    /// <returns>The discriminant; zero exactly when f has a repeated complex root.</returns>
    /// <exception cref="InvalidOperationException">The polynomial is constant.</exception>
    public Rational Discriminant()
    {
        if (Degree < 1) throw new InvalidOperationException("the discriminant needs degree at least 1");
        int n = Degree;
        var r = Resultant(this, Derivative()) / LeadingCoefficient;
        return ((long)n * (n - 1) / 2 & 1) != 0 ? -r : r;
    }
}
