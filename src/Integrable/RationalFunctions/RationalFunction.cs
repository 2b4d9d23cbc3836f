using System.Diagnostics;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.RationalFunctions;

/// <summary>An element of the field Q(x₁, …, xₙ) of rational functions: a quotient of two polynomials
/// with rational coefficients in the variables of a <see cref="RationalFunctionField"/>.</summary>
/// <remarks>
/// <para><b>Canonical form</b> (enforced by every factory and operation, so equality is structural):
/// numerator and denominator are ordinary polynomials (no negative exponents: monomials of a Laurent
/// input are moved to the denominator), they are coprime as polynomials, and the denominator is
/// primitive (integer coefficients with gcd 1) with a positive leading coefficient in the ring's term
/// order (the first term in descending lex order). Any rational content sits in the numerator. Zero is
/// 0/1.</para>
/// <para><b>Arithmetic</b> keeps the gcds small: a/b + c/d uses g = gcd(b, d) and only then
/// gcd(a·(d/g) + c·(b/g), g) (Henrici); (a/b)·(c/d) cancels gcd(a, d) and gcd(c, b) before
/// multiplying. Gcds come from <see cref="PolynomialGcd"/> (modular, verified).</para>
/// <para>Immutable and thread-safe.</para>
/// </remarks>
/// <example><code>
/// var field = new RationalFunctionField("x", "y");
/// RationalFunction x = field.Variable("x"), y = field.Variable("y");
/// var r = (x * x - y * y) / (x - y);    // x + y
/// var s = (y + 1) / x;
/// Console.WriteLine(s.Pow(-2));          // x^2/(y^2 + 2*y + 1)
/// </code></example>
[DebuggerDisplay("{ToString(),nq}")]
public sealed partial class RationalFunction : IRingElement<RationalFunction>
{
    private int _hash;

    /// <summary>Trusted constructor: numerator and denominator must already be canonical.</summary>
    internal RationalFunction(RationalFunctionField field, LaurentPolynomial numerator, LaurentPolynomial denominator)
    {
        Field = field;
        Numerator = numerator;
        Denominator = denominator;
        AssertCanonical();
    }

    /// <summary>The field this function belongs to.</summary>
    public RationalFunctionField Field { get; }

    /// <summary>The numerator: a polynomial (no negative exponent) coprime to the denominator.</summary>
    public LaurentPolynomial Numerator { get; }

    /// <summary>The denominator: a primitive polynomial with positive leading coefficient (1 for polynomials).</summary>
    public LaurentPolynomial Denominator { get; }

    /// <summary>True for zero.</summary>
    public bool IsZero => Numerator.IsZero;

    /// <summary>True for the constant 1.</summary>
    public bool IsOne => Numerator.IsOne && Denominator.IsOne;

    /// <summary>True when the denominator is 1 (the function is a polynomial).</summary>
    public bool IsPolynomial => Denominator.IsOne;

    /// <summary>True for constants (zero included).</summary>
    public bool IsConstant => Denominator.IsOne && Numerator.IsConstant;

    /// <summary>Structural (= mathematical) equality; functions of different fields are unequal.</summary>
    /// <param name="other">The other function.</param>
    /// <returns>True when equal.</returns>
    public bool Equals(RationalFunction? other)
    {
        if (ReferenceEquals(this, other)) return true;
        if (other is null || !Field.Equals(other.Field)) return false;
        return Numerator.Equals(other.Numerator) && Denominator.Equals(other.Denominator);
    }

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is RationalFunction r && Equals(r);

    /// <summary>Hash of the canonical form.</summary>
    /// <returns>The hash code.</returns>
    public override int GetHashCode()
    {
        if (_hash != 0) return _hash;
        int h = HashCode.Combine(Numerator, Denominator);
        if (h == 0) h = 1;
        _hash = h;
        return h;
    }

    /// <summary>Equality operator.</summary>
    /// <param name="left">First function.</param>
    /// <param name="right">Second function.</param>
    /// <returns>True when both are null or equal.</returns>
    public static bool operator ==(RationalFunction? left, RationalFunction? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Inequality operator.</summary>
    /// <param name="left">First function.</param>
    /// <param name="right">Second function.</param>
    /// <returns>True when not equal.</returns>
    public static bool operator !=(RationalFunction? left, RationalFunction? right) => !(left == right);

    /// <summary>The canonical form of numerator/denominator (Laurent polynomials of the field's ring).</summary>
    internal static RationalFunction Canonical(RationalFunctionField field, LaurentPolynomial numerator, LaurentPolynomial denominator)
    {
        if (denominator.IsZero) throw new DivideByZeroException("Rational function with a zero denominator.");
        if (numerator.IsZero) return field.Zero;
        var ring = field.PolynomialRing;
        int n = ring.VariableCount;
        var mn = numerator.MinExponents();
        var md = denominator.MinExponents();
        var N = numerator.MultiplyByMonomial(Rational.One, Negate(mn));
        var D = denominator.MultiplyByMonomial(Rational.One, Negate(md));
        if (!D.IsConstant)
        {
            var (_, n1, d1) = N.GcdWithCofactors(D);
            N = n1;
            D = d1;
        }
        var kappa = D.Content;   // signed: D/kappa has a positive leading coefficient
        if (!kappa.IsOne)
        {
            D = D.PrimitivePart;
            N = N * kappa.Inverse();
        }
        var up = new int[n];
        var down = new int[n];
        bool anyUp = false, anyDown = false;
        for (int v = 0; v < n; v++)
        {
            int e = checked(mn[v] - md[v]);
            if (e > 0) { up[v] = e; anyUp = true; }
            else if (e < 0) { down[v] = -e; anyDown = true; }
        }
        if (anyUp) N = N.MultiplyByMonomial(Rational.One, up);
        if (anyDown) D = D.MultiplyByMonomial(Rational.One, down);
        return new RationalFunction(field, N, D);
    }

    private static int[] Negate(int[] e)
    {
        var r = new int[e.Length];
        for (int i = 0; i < e.Length; i++) r[i] = checked(-e[i]);
        return r;
    }

    /// <summary>Checks the canonical-form invariant (coprimality by a gcd, so it is expensive).</summary>
    internal bool IsCanonical()
    {
        if (!Numerator.Ring.Equals(Field.PolynomialRing) || !Denominator.Ring.Equals(Field.PolynomialRing)) return false;
        if (Denominator.IsZero || !Numerator.IsPolynomial || !Denominator.IsPolynomial) return false;
        if (!Denominator.Content.IsOne) return false;
        if (Numerator.IsZero) return Denominator.IsOne;
        return Numerator.Gcd(Denominator, MonomialFactor.Keep).IsOne;
    }

    [Conditional("DEBUG")]
    private void AssertCanonical() => Debug.Assert(IsCanonical(), "RationalFunction is not canonical.");

    private void CheckField(RationalFunction other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (!ReferenceEquals(Field, other.Field) && !Field.Equals(other.Field))
            throw new IncompatibleRingException($"Cannot combine elements of {Field} and {other.Field}; use RationalFunctionField.Unify and Embed.");
    }
}
