using System.Numerics;
using Integrable.Kernels;
using Integrable.Kernels.Gcd;
using Integrable.Numbers;

namespace Integrable.Polynomials;

/// <summary>Greatest common divisors, least common multiples, contents and square-free factorisation of
/// multivariate Laurent polynomials over Q.</summary>
/// <remarks>
/// <para><b>Normalisation.</b> A gcd is defined up to units. The result is the unique associate that
/// is primitive (integer coefficients with gcd 1), has a positive leading coefficient (the first term
/// in the canonical descending lex order) and no monomial factor; with
/// <see cref="MonomialFactor.Keep"/> it is multiplied by the gcd of the inputs' monomial parts.
/// gcd(0, 0) = 0 and gcd(p, 0) is the normalised p.</para>
/// <para><b>Algorithm.</b> Both inputs are split into rational content, monomial part and a primitive
/// integer polynomial; the integer polynomials go to Brown's dense modular algorithm over word primes
/// (evaluation/interpolation down to univariate Euclid mod p, Chinese remaindering, unlucky primes and
/// points detected by degree; see <c>Kernels.Gcd.ModularGcd</c>). Degree bounds from univariate images
/// prove coprimality at once in the common case. The dispatcher interpolates the cofactors as well when
/// that is not much more work, otherwise the gcd alone.</para>
/// <para><b>Verification.</b> Every gcd is checked exactly before it is returned: it divides both
/// inputs (by multiplying back with the cofactors, or by exact division), and it is the greatest common
/// divisor because its degree in every variable reaches a proven upper bound or the cofactors are
/// proven coprime.</para>
/// </remarks>
/// <example><code>
/// var r = new LaurentPolynomialRing("x", "y");
/// var a = LaurentPolynomial.Parse(r, "(x + y)^2 (x - 1)");
/// var b = LaurentPolynomial.Parse(r, "2 x^-3 (x + y) (x + 1)");
/// var g = a.Gcd(b);                          // x + y
/// var (h, ca, cb) = a.GcdWithCofactors(b);   // a = h·ca, b = h·cb
/// </code></example>
public static partial class PolynomialGcd
{
    /// <summary>The normalised greatest common divisor of two Laurent polynomials.</summary>
    /// <param name="a">First polynomial.</param>
    /// <param name="b">Second polynomial (same ring).</param>
    /// <param name="monomials">Whether monomial factors are units (default) or kept.</param>
    /// <returns>gcd(<paramref name="a"/>, <paramref name="b"/>), normalised as described on the class.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="Algebra.IncompatibleRingException">The rings differ.</exception>
    public static LaurentPolynomial Gcd(this LaurentPolynomial a, LaurentPolynomial b, MonomialFactor monomials = MonomialFactor.Unit) =>
        GcdWithCofactors(a, b, monomials).Gcd;

    /// <summary>The normalised gcd g with cofactors: <paramref name="a"/> = g·ā and <paramref name="b"/> = g·b̄ exactly.</summary>
    /// <param name="a">First polynomial.</param>
    /// <param name="b">Second polynomial (same ring).</param>
    /// <param name="monomials">Whether monomial factors are units (default) or kept.</param>
    /// <returns>The gcd and both cofactors (for gcd(0, 0) all three are zero).</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="Algebra.IncompatibleRingException">The rings differ.</exception>
    public static GcdResult GcdWithCofactors(this LaurentPolynomial a, LaurentPolynomial b, MonomialFactor monomials = MonomialFactor.Unit)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        CheckSameRing(a, b);
        CheckMode(monomials);
        var ring = a.Ring;
        if (a.IsZero && b.IsZero) return new GcdResult(ring.Zero, ring.Zero, ring.Zero);
        if (b.IsZero)
        {
            var sa = Split(a);
            var g0 = ToLaurent(ring, sa.Primitive, monomials == MonomialFactor.Keep ? sa.Shift : null);
            return new GcdResult(g0, ring.Monomial(sa.Scale, monomials == MonomialFactor.Keep ? new int[ring.VariableCount] : sa.Shift), ring.Zero);
        }
        if (a.IsZero)
        {
            var r = GcdWithCofactors(b, a, monomials);
            return new GcdResult(r.Gcd, r.CofactorB, r.CofactorA);
        }
        var pa = Split(a);
        var pb = Split(b);
        var core = ModularGcd.Compute(pa.Primitive, pb.Primitive);
        var G = core.G;
        var ABar = core.ABar;
        var BBar = core.BBar;
        if (G.Coeffs[0].Sign < 0)
        {
            G = G.Scale(BigInteger.MinusOne);
            ABar = ABar.Scale(BigInteger.MinusOne);
            BBar = BBar.Scale(BigInteger.MinusOne);
        }
        int n = ring.VariableCount;
        var keep = new int[n];
        var shiftA = pa.Shift;
        var shiftB = pb.Shift;
        if (monomials == MonomialFactor.Keep)
        {
            for (int v = 0; v < n; v++) keep[v] = Math.Min(pa.Shift[v], pb.Shift[v]);
            shiftA = Subtract(pa.Shift, keep);
            shiftB = Subtract(pb.Shift, keep);
        }
        var gcd = ToLaurent(ring, G, keep);
        var ca = ToLaurent(ring, ABar, shiftA, pa.Scale);
        var cb = ToLaurent(ring, BBar, shiftB, pb.Scale);
        return new GcdResult(gcd, ca, cb);
    }

    /// <summary>The gcd of several polynomials (zero for none, or when all are zero).</summary>
    /// <param name="polynomials">Polynomials of one ring.</param>
    /// <param name="monomials">Whether monomial factors are units (default) or kept.</param>
    /// <returns>The normalised gcd of all of them.</returns>
    /// <exception cref="ArgumentNullException">The sequence or an element is null.</exception>
    /// <exception cref="ArgumentException">The sequence is empty.</exception>
    /// <exception cref="Algebra.IncompatibleRingException">The rings differ.</exception>
    public static LaurentPolynomial Gcd(IEnumerable<LaurentPolynomial> polynomials, MonomialFactor monomials = MonomialFactor.Unit)
    {
        ArgumentNullException.ThrowIfNull(polynomials);
        var list = polynomials.ToList();
        if (list.Count == 0) throw new ArgumentException("The gcd of no polynomials is undefined here (the ring is unknown).", nameof(polynomials));
        foreach (var p in list) ArgumentNullException.ThrowIfNull(p, nameof(polynomials));
        // Smallest first: the running gcd shrinks fastest and most pairs are then cheap.
        list.Sort((x, y) => x.TermCount.CompareTo(y.TermCount));
        LaurentPolynomial? g = null;
        foreach (var p in list)
        {
            if (p.IsZero) { CheckSameRing(list[0], p); continue; }
            g = g is null ? Gcd(p, p.Ring.Zero, monomials) : Gcd(g, p, monomials);
            if (g.IsOne) break;
        }
        return g ?? list[0].Ring.Zero;
    }

    /// <summary>The normalised least common multiple: primitive, positive leading coefficient, and
    /// no monomial factor (with <see cref="MonomialFactor.Keep"/>: times x^max(m_A, m_B)); zero when an
    /// input is zero.</summary>
    /// <param name="a">First polynomial.</param>
    /// <param name="b">Second polynomial (same ring).</param>
    /// <param name="monomials">Whether monomial factors are units (default) or kept.</param>
    /// <returns>lcm(<paramref name="a"/>, <paramref name="b"/>).</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="Algebra.IncompatibleRingException">The rings differ.</exception>
    public static LaurentPolynomial Lcm(this LaurentPolynomial a, LaurentPolynomial b, MonomialFactor monomials = MonomialFactor.Unit)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        CheckSameRing(a, b);
        CheckMode(monomials);
        if (a.IsZero || b.IsZero) return a.Ring.Zero;
        var r = GcdWithCofactors(a, b, MonomialFactor.Unit);
        // lcm = A·(B/g) for the primitive, monomial-free parts A and B; B/g = b̄ up to the unit of b.
        var pa = Split(a);
        var pb = Split(b);
        var bbar = Split(r.CofactorB).Primitive;
        var lcm = ToLaurent(a.Ring, pa.Primitive, null) * ToLaurent(a.Ring, bbar, null);
        if (monomials == MonomialFactor.Keep)
        {
            var m = new int[a.Ring.VariableCount];
            for (int v = 0; v < m.Length; v++) m[v] = Math.Max(pa.Shift[v], pb.Shift[v]);
            lcm = lcm.MultiplyByMonomial(Rational.One, m);
        }
        return lcm;
    }

    private static void CheckMode(MonomialFactor monomials)
    {
        if (monomials != MonomialFactor.Unit && monomials != MonomialFactor.Keep)
            throw new ArgumentOutOfRangeException(nameof(monomials), monomials, "Unknown monomial treatment.");
    }

    internal static void CheckSameRing(LaurentPolynomial a, LaurentPolynomial b)
    {
        if (!a.Ring.Equals(b.Ring))
            throw new Algebra.IncompatibleRingException($"Cannot take the gcd of elements of {a.Ring} and {b.Ring}; use LaurentPolynomialRing.Unify and Embed.");
    }

    private static int[] Subtract(int[] a, int[] b)
    {
        var r = new int[a.Length];
        for (int i = 0; i < r.Length; i++) r[i] = a[i] - b[i];
        return r;
    }

    /// <summary>p = Scale·x^Shift·Primitive with Primitive an integer polynomial, primitive, positive
    /// leading coefficient, no monomial factor (exponents ≥ 0, each variable's minimum 0).</summary>
    internal readonly record struct SplitPolynomial(Rational Scale, int[] Shift, IntPoly Primitive);

    internal static SplitPolynomial Split(LaurentPolynomial p)
    {
        int n = p.Ring.VariableCount;
        var shift = p.MinExponents();
        var exps = new int[p.TermCount * n];
        var src = p.ExpArray;
        bool shifted = shift.AsSpan().ContainsAnyExcept(0);
        for (int t = 0; t < p.TermCount; t++)
            for (int v = 0; v < n; v++) exps[t * n + v] = src[t * n + v] - shift[v];
        var coeffs = new Rational[p.TermCount];
        Rational scale;
        if (CoefficientForm.TryWords(p.CoeffArray, out var words, out long wden))
        {
            // word path: gcd of the numerators over the common denominator without big integers
            ulong g = 0;
            foreach (var x in words) { g = IntegerMath.Gcd(g, IntegerMath.UnsignedAbs(x)); if (g == 1) break; }
            long sg = words[0] < 0 ? -(long)g : (long)g;
            for (int i = 0; i < words.Length; i++) coeffs[i] = new Rational(words[i] / sg);
            scale = new Rational(sg, wden);
        }
        else
        {
            CoefficientForm.ToBig(p.CoeffArray, out var ints, out var den);
            BigInteger g = BigInteger.Zero;
            foreach (var x in ints) { g = BigInteger.GreatestCommonDivisor(g, x); if (g.IsOne) break; }
            if (ints[0].Sign < 0) g = -g;
            for (int i = 0; i < ints.Length; i++) coeffs[i] = new Rational(g.IsOne ? ints[i] : ints[i] / g);
            scale = new Rational(g, den);
        }
        return new SplitPolynomial(scale, shift, new IntPoly(n, coeffs, shifted ? exps : src));
    }

    /// <summary>scale·x^shift·q as a Laurent polynomial (q sorted in the ring's order).</summary>
    internal static LaurentPolynomial ToLaurent(LaurentPolynomialRing ring, IntPoly q, int[]? shift, Rational? scale = null)
    {
        int n = ring.VariableCount;
        var exps = q.Exps;
        if (shift is not null && shift.AsSpan().ContainsAnyExcept(0))
        {
            exps = new int[q.Exps.Length];
            for (int t = 0; t < q.Count; t++)
                for (int v = 0; v < n; v++) exps[t * n + v] = checked(q.Exps[t * n + v] + shift[v]);
        }
        var c = q.Coeffs;
        if (scale is { } s && !s.IsOne)
        {
            c = new Rational[q.Count];
            for (int i = 0; i < c.Length; i++) c[i] = q.Coeffs[i] * s;
        }
        return new LaurentPolynomial(ring, c, exps);
    }
}
