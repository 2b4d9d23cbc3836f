using System.Diagnostics;
using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Univariate;

/// <summary>A univariate rational function over Z/pZ: an element of the field (Z/pZ)(x), stored as
/// numerator/denominator.</summary>
/// <remarks>
/// <para>Canonical form: numerator and denominator are coprime and the denominator is monic (zero is
/// 0/1). Equal functions therefore have equal parts, and equality compares them directly.</para>
/// <para>Arithmetic keeps the operands' coprimality to avoid large gcds (Henrici's method):
/// a/b·c/d cancels gcd(a, d) and gcd(c, b) instead of one gcd of the products; a/b + c/d with
/// g = gcd(b, d) needs no further gcd when g = 1 and otherwise only gcd(a·(d/g) + c·(b/g), g).</para>
/// </remarks>
/// <example><code>
/// var f = new PrimeField(101);
/// var x = RationalFunctionModP.X(f);
/// var r = 1 / (x + 1) + x;            // (x² + x + 1)/(x + 1)
/// var s = r.Compose(1 / x);           // r(1/x)
/// </code></example>
[DebuggerDisplay("{NumeratorDegree}/{DenominatorDegree} mod {Field.Modulus}")]
public sealed partial class RationalFunctionModP : IRingElement<RationalFunctionModP>
{
    private RationalFunctionModP(PolynomialModP numerator, PolynomialModP denominator)
    {
        Numerator = numerator;
        Denominator = denominator;
        AssertCanonical();
    }

    [Conditional("DEBUG")]
    private void AssertCanonical()
    {
        Debug.Assert(Denominator.IsMonic, "denominator not monic");
        Debug.Assert(!Numerator.IsZero || Denominator.IsOne, "zero not stored as 0/1");
    }

    /// <summary>The numerator (coprime to the denominator).</summary>
    public PolynomialModP Numerator { get; }

    /// <summary>The monic denominator.</summary>
    public PolynomialModP Denominator { get; }

    /// <summary>The coefficient field Z/pZ.</summary>
    public PrimeField Field => Numerator.Field;

    /// <summary>Degree of the numerator (−1 for zero).</summary>
    public int NumeratorDegree => Numerator.Degree;

    /// <summary>Degree of the denominator.</summary>
    public int DenominatorDegree => Denominator.Degree;

    /// <summary>The degree of the rational function, max(deg numerator, deg denominator) (0 for constants).</summary>
    public int Degree => Math.Max(Math.Max(Numerator.Degree, Denominator.Degree), 0);

    /// <inheritdoc/>
    public bool IsZero => Numerator.IsZero;

    /// <inheritdoc/>
    public bool IsOne => Numerator.IsOne && Denominator.IsOne;

    /// <summary>True when the denominator is 1.</summary>
    public bool IsPolynomial => Denominator.IsOne;

    /// <summary>Wraps parts already known to be canonical (coprime, monic denominator).</summary>
    internal static RationalFunctionModP CreateUnchecked(PolynomialModP numerator, PolynomialModP denominator) => new(numerator, denominator);

    /// <summary>The canonical form of <paramref name="numerator"/>/<paramref name="denominator"/> (one gcd).</summary>
    /// <param name="numerator">Numerator.</param>
    /// <param name="denominator">Non-zero denominator over the same field.</param>
    /// <returns>The reduced fraction with monic denominator.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="denominator"/> is zero.</exception>
    /// <exception cref="IncompatibleRingException">The fields differ.</exception>
    public static RationalFunctionModP Create(PolynomialModP numerator, PolynomialModP denominator)
    {
        ArgumentNullException.ThrowIfNull(numerator);
        ArgumentNullException.ThrowIfNull(denominator);
        if (denominator.IsZero) throw new DivideByZeroException("rational function with zero denominator");
        if (numerator.Modulus != denominator.Modulus)
            throw new IncompatibleRingException($"numerator over Z/{numerator.Modulus}Z and denominator over Z/{denominator.Modulus}Z");
        if (numerator.IsZero) return Zero(numerator.Field);
        var g = PolynomialModP.Gcd(numerator, denominator);
        if (!g.IsOne)
        {
            numerator = numerator.DivideExact(g);
            denominator = denominator.DivideExact(g);
        }
        return Normalized(numerator, denominator);
    }

    /// <summary>Makes the denominator monic (parts already coprime).</summary>
    private static RationalFunctionModP Normalized(PolynomialModP numerator, PolynomialModP denominator)
    {
        if (numerator.IsZero) return Zero(numerator.Field);
        ulong lc = denominator.LeadingCoefficient;
        if (lc != 1)
        {
            ulong inv = numerator.Field.Inverse(lc);
            numerator = numerator.Scale(inv);
            denominator = denominator.Scale(inv);
        }
        return new(numerator, denominator);
    }

    /// <summary>The polynomial <paramref name="polynomial"/> as a rational function.</summary>
    /// <param name="polynomial">The polynomial.</param>
    /// <returns><paramref name="polynomial"/>/1.</returns>
    public static RationalFunctionModP FromPolynomial(PolynomialModP polynomial)
    {
        ArgumentNullException.ThrowIfNull(polynomial);
        return new(polynomial, PolynomialModP.One(polynomial.Field));
    }

    /// <summary>Zero over <paramref name="field"/>.</summary>
    /// <param name="field">The coefficient field.</param>
    /// <returns>0/1.</returns>
    public static RationalFunctionModP Zero(PrimeField field) => new(PolynomialModP.Zero(field), PolynomialModP.One(field));

    /// <summary>One over <paramref name="field"/>.</summary>
    /// <param name="field">The coefficient field.</param>
    /// <returns>1/1.</returns>
    public static RationalFunctionModP One(PrimeField field) => new(PolynomialModP.One(field), PolynomialModP.One(field));

    /// <summary>The variable x over <paramref name="field"/>.</summary>
    /// <param name="field">The coefficient field.</param>
    /// <returns>x/1.</returns>
    public static RationalFunctionModP X(PrimeField field) => new(PolynomialModP.X(field), PolynomialModP.One(field));

    /// <summary>A constant.</summary>
    /// <param name="field">The coefficient field.</param>
    /// <param name="value">Any integer (reduced mod p).</param>
    /// <returns>value/1.</returns>
    public static RationalFunctionModP Constant(PrimeField field, long value) =>
        new(PolynomialModP.Constant(field, value), PolynomialModP.One(field));

    // ------------------------------------------------------------------ equality

    /// <inheritdoc/>
    public bool Equals(RationalFunctionModP? other) =>
        other is not null && Numerator.Equals(other.Numerator) && Denominator.Equals(other.Denominator);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as RationalFunctionModP);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Numerator, Denominator);

    /// <summary>Equality of canonical forms.</summary>
    /// <param name="left">First function.</param>
    /// <param name="right">Second function.</param>
    /// <returns>True when equal.</returns>
    public static bool operator ==(RationalFunctionModP? left, RationalFunctionModP? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Inequality.</summary>
    /// <param name="left">First function.</param>
    /// <param name="right">Second function.</param>
    /// <returns>True when different.</returns>
    public static bool operator !=(RationalFunctionModP? left, RationalFunctionModP? right) => !(left == right);

    /// <summary>Text <c>(num)/(den)</c>, or just the numerator text when the denominator is 1.</summary>
    /// <returns>The text in the variable x.</returns>
    public override string ToString() => ToString("x");

    /// <summary>Text in a chosen variable.</summary>
    /// <param name="variable">The variable name.</param>
    /// <returns>The text.</returns>
    public string ToString(string variable) =>
        Denominator.IsOne ? Numerator.ToString(variable) : $"({Numerator.ToString(variable)})/({Denominator.ToString(variable)})";
}
