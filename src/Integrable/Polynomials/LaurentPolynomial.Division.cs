using Integrable.Kernels;
using Integrable.Numbers;

namespace Integrable.Polynomials;

public sealed partial class LaurentPolynomial
{
    /// <summary>Exact division in the Laurent ring: finds q with q·<paramref name="divisor"/> = this.</summary>
    /// <param name="divisor">The divisor (same ring).</param>
    /// <param name="quotient">The exact quotient when the call succeeds; the zero polynomial otherwise.</param>
    /// <returns>True when <paramref name="divisor"/> divides this polynomial in
    /// Q[x₁^±1, …, xₙ^±1]; false when it does not, or when it is zero. Never throws for a
    /// non-divisor.</returns>
    /// <remarks>Monomials are units, so both operands are first divided by their monomial content
    /// (the vector of per-variable minimum exponents); the divisor then divides iff the resulting
    /// polynomial divides the dividend's in Q[x₁, …, xₙ]. That is decided by heap division on packed
    /// exponents with integer coefficients (see <c>Kernels.PolynomialDivide</c>); a success means the
    /// remainder reached zero, so the quotient is exact by construction.</remarks>
    /// <exception cref="Algebra.IncompatibleRingException">The rings differ.</exception>
    public bool TryDivideExact(LaurentPolynomial divisor, out LaurentPolynomial quotient)
    {
        CheckRing(divisor);
        quotient = _ring.Zero;
        if (divisor.IsZero) return false;
        if (IsZero) return true;
        if (divisor.IsMonomial)
        {
            quotient = MultiplyByMonomialInverse(divisor);
            return true;
        }
        if (IsMonomial) return false; // a unit times a non-unit is never a unit
        if (!PolynomialDivide.TryDivide(_coeffs, _exps, divisor._coeffs, divisor._exps, _ring.VariableCount, out var c, out var e))
            return false;
        quotient = new LaurentPolynomial(_ring, c, e);
        return true;
    }

    /// <summary>The exchange step (a·b + c·d)/e computed exactly in one fused pass: Somos sequences,
    /// T-systems, the octahedron recurrence and cluster mutations are made of it.</summary>
    /// <param name="a">First factor of the first product.</param>
    /// <param name="b">Second factor of the first product (may be <paramref name="a"/>: a square).</param>
    /// <param name="c">First factor of the second product.</param>
    /// <param name="d">Second factor of the second product.</param>
    /// <param name="e">The divisor.</param>
    /// <param name="quotient">The exact quotient when the call succeeds; the zero polynomial otherwise.</param>
    /// <returns>True when <paramref name="e"/> divides a·b + c·d; false when it does not or is zero.
    /// The answer is the same as <c>(a*b + c*d).TryDivideExact(e, out q)</c>.</returns>
    /// <remarks>When all coefficients are small integers and both products are sparse, the two
    /// products and their sum are kept in packed form and never built as polynomials; only the quotient
    /// is (see <c>Kernels.ProductSumQuotient</c>). Otherwise the steps run one by one. Either way the
    /// quotient is exact: the division's remainder reached zero.</remarks>
    /// <example><code>
    /// var r = new LaurentPolynomialRing("w", "x", "y", "z");
    /// var (w, x, y, z) = (r.Variable(0), r.Variable(1), r.Variable(2), r.Variable(3));
    /// LaurentPolynomial.TryDivideProductSum(z, x, y, y, w, out var next);   // Somos-4: (z·x + y²)/w
    /// </code></example>
    /// <exception cref="Algebra.IncompatibleRingException">The rings differ.</exception>
    public static bool TryDivideProductSum(LaurentPolynomial a, LaurentPolynomial b, LaurentPolynomial c, LaurentPolynomial d,
        LaurentPolynomial e, out LaurentPolynomial quotient)
    {
        ArgumentNullException.ThrowIfNull(a);
        a.CheckRing(b);
        a.CheckRing(c);
        a.CheckRing(d);
        a.CheckRing(e);
        if (a.TermCount >= 2 && b.TermCount >= 2 && c.TermCount >= 2 && d.TermCount >= 2 && e.TermCount >= 2)
        {
            var status = ProductSumQuotient.TryRun(a._coeffs, a._exps, b._coeffs, b._exps, c._coeffs, c._exps,
                d._coeffs, d._exps, e._coeffs, e._exps, a._ring.VariableCount, out var qc, out var qe);
            if (status == FusedStatus.Exact)
            {
                quotient = new LaurentPolynomial(a._ring, qc, qe);
                return true;
            }
            if (status == FusedStatus.NotDivisible)
            {
                quotient = a._ring.Zero;
                return false;
            }
        }
        return (a * b + c * d).TryDivideExact(e, out quotient);
    }

    /// <summary>Exact division that reports a witness on failure.</summary>
    /// <param name="divisor">The divisor (same ring, non-zero).</param>
    /// <returns>On success, the quotient and a zero remainder. On failure, a quotient q and a non-zero
    /// remainder r with this = q·<paramref name="divisor"/> + r: both operands are divided by their
    /// monomial content (this = x^a·A₀, divisor = x^b·B₀) and A₀ is divided by B₀ with remainder in
    /// lex order, giving q = x^(a−b)·Q₀ and r = x^a·R₀. r ≠ 0 proves that the divisor does not divide
    /// this polynomial.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    /// <exception cref="Algebra.IncompatibleRingException">The rings differ.</exception>
    public DivisionResult DivideExact(LaurentPolynomial divisor)
    {
        CheckRing(divisor);
        if (divisor.IsZero) throw new DivideByZeroException("Division of a Laurent polynomial by zero.");
        if (TryDivideExact(divisor, out var q)) return new DivisionResult(q, _ring.Zero);
        int n = _ring.VariableCount;
        var a = MinExponents();
        var b = divisor.MinExponents();
        var a0 = MultiplyByMonomial(Rational.One, Negated(a));
        var b0 = divisor.MultiplyByMonomial(Rational.One, Negated(b));
        var (q0, r0) = DivRemPolynomial(a0, b0, 0);
        var ab = new int[n];
        for (int v = 0; v < n; v++) ab[v] = checked(a[v] - b[v]);
        var result = new DivisionResult(q0.MultiplyByMonomial(Rational.One, ab), r0.MultiplyByMonomial(Rational.One, a));
        CheckIdentity(this, divisor, result);
        return result;
    }

    /// <summary>Division with remainder by one divisor under a monomial order (the multivariate
    /// division algorithm): repeatedly, the leading term of what is left is divided by the leading
    /// term of <paramref name="divisor"/> when it is divisible, and moved to the remainder otherwise.</summary>
    /// <param name="divisor">The divisor (same ring, non-zero).</param>
    /// <param name="order">The monomial order that picks leading terms.</param>
    /// <returns>q and r with this = q·<paramref name="divisor"/> + r, where no term of r is divisible by
    /// the leading term of the divisor.</returns>
    /// <remarks>For true polynomials (no negative exponents) this is the textbook algorithm. With
    /// negative exponents, both operands are first made polynomials by the smallest monomials
    /// u = x^a, w = x^b with a, b ≥ 0 (a_v = max(0, −min exponent of x_v), likewise b); then
    /// u·this = Q₀·(w·divisor) + R₀ and the result is q = (w/u)·Q₀, r = R₀/u, which still satisfies
    /// this = q·divisor + r exactly. A divisor that is a constant or a monomial dividing every term gives
    /// remainder zero.</remarks>
    /// <exception cref="DivideByZeroException"><paramref name="divisor"/> is zero.</exception>
    /// <exception cref="Algebra.IncompatibleRingException">The rings differ.</exception>
    public DivisionResult DivRem(LaurentPolynomial divisor, MonomialOrder order)
    {
        CheckRing(divisor);
        if (divisor.IsZero) throw new DivideByZeroException("Division of a Laurent polynomial by zero.");
        int code = order switch
        {
            MonomialOrder.Lex => 0,
            MonomialOrder.GradedLex => 1,
            MonomialOrder.GradedReverseLex => 2,
            _ => throw new ArgumentOutOfRangeException(nameof(order), order, "Unknown monomial order."),
        };
        if (IsZero) return new DivisionResult(_ring.Zero, _ring.Zero);
        int n = _ring.VariableCount;
        var a = MinExponents();
        var b = divisor.MinExponents();
        bool shifted = false;
        for (int v = 0; v < n; v++)
        {
            a[v] = Math.Max(0, -a[v]);
            b[v] = Math.Max(0, -b[v]);
            if (a[v] != 0 || b[v] != 0) shifted = true;
        }
        if (!shifted)
        {
            var (q, r) = DivRemPolynomial(this, divisor, code);
            return new DivisionResult(q, r);
        }
        var up = MultiplyByMonomial(Rational.One, a);
        var wd = divisor.MultiplyByMonomial(Rational.One, b);
        var (q0, r0) = DivRemPolynomial(up, wd, code);
        var ba = new int[n];
        for (int v = 0; v < n; v++) ba[v] = b[v] - a[v];
        var result = new DivisionResult(q0.MultiplyByMonomial(Rational.One, ba), r0.MultiplyByMonomial(Rational.One, Negated(a)));
        CheckIdentity(this, divisor, result);
        return result;
    }

    private static (LaurentPolynomial Q, LaurentPolynomial R) DivRemPolynomial(LaurentPolynomial p, LaurentPolynomial d, int order)
    {
        var ring = p._ring;
        PolynomialDivRem.DivRem(p._coeffs, p._exps, d._coeffs, d._exps, ring.VariableCount, order,
            out var qc, out var qe, out var rc, out var re);
        return (ring.FromTerms(qc.ToArray(), qe.ToArray()), ring.FromTerms(rc.ToArray(), re.ToArray()));
    }

    [System.Diagnostics.Conditional("DEBUG")]
    private static void CheckIdentity(LaurentPolynomial p, LaurentPolynomial d, DivisionResult r) =>
        System.Diagnostics.Debug.Assert(r.Quotient * d + r.Remainder == p, "division identity violated");

    private LaurentPolynomial MultiplyByMonomialInverse(LaurentPolynomial monomial)
    {
        int n = _ring.VariableCount;
        var e = new int[n];
        for (int v = 0; v < n; v++) e[v] = checked(-monomial._exps[v]);
        return MultiplyByMonomial(monomial._coeffs[0].Inverse(), e);
    }

    private static int[] Negated(int[] e)
    {
        var r = new int[e.Length];
        for (int i = 0; i < e.Length; i++) r[i] = checked(-e[i]);
        return r;
    }

    /// <summary>Per-variable minimum exponents (all zero for the zero polynomial).</summary>
    internal int[] MinExponents()
    {
        int n = _ring.VariableCount;
        var m = new int[n];
        if (IsZero) return m;
        _exps.AsSpan(0, n).CopyTo(m);
        for (int t = 1; t < _coeffs.Length; t++)
            for (int v = 0; v < n; v++)
                if (_exps[t * n + v] < m[v]) m[v] = _exps[t * n + v];
        return m;
    }
}
