using System.Numerics;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;

namespace Integrable.Univariate;

public sealed partial class UnivariatePolynomial
{
    /// <summary>Square-free decomposition f = u·Π fᵢ^i (Yun's algorithm): the fᵢ are monic, square-free and
    /// pairwise coprime, and u is the leading coefficient.</summary>
    /// <returns>The unit u and the non-trivial factors with their multiplicities, by increasing multiplicity.</returns>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    public (Rational Unit, IReadOnlyList<(UnivariatePolynomial Factor, int Multiplicity)> Factors) SquareFreeFactorization()
    {
        if (IsZero) throw new InvalidOperationException("the zero polynomial has no square-free decomposition");
        var unit = LeadingCoefficient;
        var factors = new List<(UnivariatePolynomial, int)>();
        if (IsConstant) return (unit, factors);
        var f = MakeMonic();
        var d = f.Derivative();
        var a0 = Gcd(f, d);
        var b = f.DivideExact(a0);
        var c = d.DivideExact(a0);
        var e = c - b.Derivative();
        int i = 1;
        while (!b.IsConstant)
        {
            var ai = Gcd(b, e);
            b = b.DivideExact(ai);
            c = e.DivideExact(ai);
            e = c - b.Derivative();
            if (!ai.IsConstant) factors.Add((ai, i));
            i++;
        }
        return (unit, factors);
    }

    /// <summary>The product of the distinct monic irreducible factors (the square-free part, monic).</summary>
    /// <returns>f / gcd(f, f′), made monic.</returns>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    public UnivariatePolynomial SquareFreePart()
    {
        if (IsZero) throw new InvalidOperationException("the zero polynomial has no square-free part");
        if (IsConstant) return One;
        var f = MakeMonic();
        return f.DivideExact(Gcd(f, f.Derivative()));
    }

    /// <summary>All rational roots with their multiplicities, in increasing order.</summary>
    /// <returns>The pairs (root, multiplicity).</returns>
    /// <remarks>Each square-free factor (Yun) is made a primitive integer polynomial A; its roots modulo a
    /// 62-bit prime p (with A square-free mod p) come from gcd(A, x^p − x) and Cantor–Zassenhaus splitting,
    /// each is lifted by Newton–Hensel iteration until p^k &gt; 2·|A(0)|·|lc A|, rationally reconstructed
    /// with numerator bound |A(0)| and denominator bound |lc A| (a rational root u/v of A has u | A(0),
    /// v | lc A), and kept only if A(u/v) = 0 exactly.</remarks>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    public IReadOnlyList<(Rational Root, int Multiplicity)> RationalRoots()
    {
        if (IsZero) throw new InvalidOperationException("every number is a root of the zero polynomial");
        var result = new List<(Rational, int)>();
        int zeroMult = 0;
        while (zeroMult < _c.Length && _c[zeroMult].IsZero) zeroMult++;
        if (zeroMult > 0) result.Add((Rational.Zero, zeroMult));
        var rest = new UnivariatePolynomial(_c[zeroMult..]);
        if (rest.IsConstant) return result;
        var (_, factors) = rest.SquareFreeFactorization();
        foreach (var (factor, mult) in factors)
            foreach (var r in SquareFreeRoots(factor))
                result.Add((r, mult));
        result.Sort((x, y) => x.Item1.CompareTo(y.Item1));
        return result;
    }

    private static List<Rational> SquareFreeRoots(UnivariatePolynomial factor)
    {
        var roots = new List<Rational>();
        var (_, a) = factor.ToPrimitive();
        if (a.Length == 2)
        {
            roots.Add(new Rational(-a[0], a[1]));
            return roots;
        }
        var n = BigInteger.Abs(a[0]);
        var d = BigInteger.Abs(a[^1]);
        var target = 2 * n * d + 1;
        var derivative = new BigInteger[a.Length - 1];
        for (int i = 1; i < a.Length; i++) derivative[i - 1] = a[i] * i;
        for (int i = 0; ; i++)
        {
            ulong p = Primes.Large(i);
            if (IntegerPoly.Residue(a[^1], p) == 0) continue;
            var field = new PrimeField(p);
            var ctx = PolyModContext.For(field);
            var ap = IntegerPoly.Reduce(a, p);
            var dp = IntegerPoly.Reduce(derivative, p);
            if (PolyMod.Gcd(ctx, ap, dp).Length != 1) continue;   // not square-free mod p
            foreach (ulong r0 in PolyMod.Roots(ctx, ap))
            {
                // Newton–Hensel lifting r ← r − A(r)/A′(r) mod p^(2^k).
                BigInteger r = r0, m = p;
                while (m <= target)
                {
                    m *= m;
                    var fr = Horner(a, r, m);
                    var dr = Horner(derivative, r, m);
                    r = Mod(r - fr * ModInverse(dr, m), m);
                }
                if (RationalReconstruction.TryReconstruct(r, m, n, d, out var root) &&
                    IntegerPoly.EvaluateHomogeneous(a, root.Numerator, root.Denominator).IsZero)
                    roots.Add(root);
            }
            return roots;
        }
    }

    private static BigInteger Horner(BigInteger[] a, BigInteger x, BigInteger m)
    {
        var r = BigInteger.Zero;
        for (int i = a.Length - 1; i >= 0; i--) r = (r * x + a[i]) % m;
        return r;
    }

    private static BigInteger Mod(BigInteger x, BigInteger m)
    {
        var r = x % m;
        return r.Sign < 0 ? r + m : r;
    }

    private static BigInteger ModInverse(BigInteger a, BigInteger m)
    {
        BigInteger r0 = m, r1 = Mod(a, m), t0 = 0, t1 = 1;
        while (!r1.IsZero)
        {
            var q = BigInteger.DivRem(r0, r1, out var rem);
            (r0, r1) = (r1, rem);
            (t0, t1) = (t1, t0 - q * t1);
        }
        if (!r0.IsOne) throw new ArithmeticException("derivative not invertible during Hensel lifting");
        return Mod(t0, m);
    }
}
