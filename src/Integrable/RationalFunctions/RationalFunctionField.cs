using System.Diagnostics;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.RationalFunctions;

/// <summary>The field Q(x₁, …, xₙ) of rational functions in the variables of a
/// <see cref="LaurentPolynomialRing"/>, as a ring context object.</summary>
/// <remarks>
/// <para>Immutable; two fields are equal when their polynomial rings are equal (same variable names in
/// the same order). Elements of different fields never mix silently: use <see cref="Unify"/> and
/// <see cref="Embed"/>.</para>
/// <para>As an <see cref="IRing{T}"/> it plugs into everything written against that interface, e.g.
/// <see cref="Text.ExpressionEvaluator"/> (that is how <see cref="Parse"/> works) or
/// <see cref="LaurentPolynomial.Evaluate{T}(IRing{T}, ReadOnlySpan{T})"/>.</para>
/// </remarks>
/// <example><code>
/// var field = new RationalFunctionField("x", "y");
/// var x = field.Variable("x");
/// var y = field.Variable("y");
/// var r = (y + 1) / x;                 // (y + 1)/x
/// var s = field.Parse("(x^2 - y^2)/(x - y)");   // x + y
/// </code></example>
[DebuggerDisplay("{ToString(),nq}")]
public sealed class RationalFunctionField : IRing<RationalFunction>, IEquatable<RationalFunctionField>
{
    /// <summary>The field of fractions of <paramref name="ring"/>.</summary>
    /// <param name="ring">The polynomial ring whose variables the rational functions use.</param>
    /// <exception cref="ArgumentNullException"><paramref name="ring"/> is null.</exception>
    public RationalFunctionField(LaurentPolynomialRing ring)
    {
        ArgumentNullException.ThrowIfNull(ring);
        PolynomialRing = ring;
        Zero = new RationalFunction(this, ring.Zero, ring.One);
        One = new RationalFunction(this, ring.One, ring.One);
    }

    /// <summary>The field in the given variables (variable 0 is the most significant in the term order).</summary>
    /// <param name="variables">Variable names: at least one, non-empty, distinct.</param>
    /// <exception cref="ArgumentException">No names, an empty name, or a repeated name.</exception>
    public RationalFunctionField(params string[] variables) : this(new LaurentPolynomialRing(variables)) { }

    /// <summary>The polynomial ring of numerators and denominators.</summary>
    public LaurentPolynomialRing PolynomialRing { get; }

    /// <summary>The variable names in order.</summary>
    public IReadOnlyList<string> Variables => PolynomialRing.Variables;

    /// <summary>The zero function 0/1.</summary>
    public RationalFunction Zero { get; }

    /// <summary>The constant 1.</summary>
    public RationalFunction One { get; }

    /// <summary>The variable with the given name.</summary>
    /// <param name="name">The name.</param>
    /// <returns>x as x/1.</returns>
    /// <exception cref="ArgumentException"><paramref name="name"/> is not a variable of this field.</exception>
    public RationalFunction Variable(string name) => new(this, PolynomialRing.Variable(name), PolynomialRing.One);

    /// <summary>The variable at position <paramref name="index"/>.</summary>
    /// <param name="index">0 ≤ index &lt; number of variables.</param>
    /// <returns>The variable.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="index"/> is out of range.</exception>
    public RationalFunction Variable(int index) => new(this, PolynomialRing.Variable(index), PolynomialRing.One);

    /// <summary>A constant.</summary>
    /// <param name="value">The value.</param>
    /// <returns>The constant function.</returns>
    public RationalFunction Constant(Rational value) => value.IsZero ? Zero : new(this, PolynomialRing.Constant(value), PolynomialRing.One);

    /// <summary>A Laurent polynomial as a rational function (negative powers go to the denominator).</summary>
    /// <param name="polynomial">A polynomial of <see cref="PolynomialRing"/>.</param>
    /// <returns>The same function in canonical form.</returns>
    /// <exception cref="IncompatibleRingException">The polynomial belongs to another ring.</exception>
    public RationalFunction FromPolynomial(LaurentPolynomial polynomial) => Create(polynomial, PolynomialRing.One);

    /// <summary>The quotient <paramref name="numerator"/>/<paramref name="denominator"/> in canonical form:
    /// coprime polynomial numerator and denominator, denominator primitive with positive leading coefficient.</summary>
    /// <param name="numerator">Numerator (a Laurent polynomial of <see cref="PolynomialRing"/>).</param>
    /// <param name="denominator">Denominator (same ring, non-zero).</param>
    /// <returns>The canonical rational function.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="denominator"/> is zero.</exception>
    /// <exception cref="IncompatibleRingException">A polynomial belongs to another ring.</exception>
    public RationalFunction Create(LaurentPolynomial numerator, LaurentPolynomial denominator)
    {
        Own(numerator);
        Own(denominator);
        return RationalFunction.Canonical(this, numerator, denominator);
    }

    /// <summary>Reads a rational function written as on paper, e.g. <c>(x^2 + 1)/(x y - 2) + 1/x</c>.</summary>
    /// <param name="text">The expression; it may use the field's variables only.</param>
    /// <returns>The value in canonical form.</returns>
    /// <exception cref="Text.ExpressionParseException">Malformed text.</exception>
    /// <exception cref="Text.ExpressionEvaluationException">An unknown variable or a division by zero
    /// (with the position).</exception>
    public RationalFunction Parse(string text) => RationalFunction.Parse(this, text);

    /// <summary>The smallest field containing the variables of both (see <see cref="LaurentPolynomialRing.Unify"/>).</summary>
    /// <param name="other">The other field.</param>
    /// <returns>The common field.</returns>
    public RationalFunctionField Unify(RationalFunctionField other)
    {
        ArgumentNullException.ThrowIfNull(other);
        var ring = PolynomialRing.Unify(other.PolynomialRing);
        return ring.Equals(PolynomialRing) ? this : new RationalFunctionField(ring);
    }

    /// <summary>Moves a rational function into this field, which must contain all of its variables.</summary>
    /// <param name="value">A rational function of any field.</param>
    /// <returns>The same function as an element of this field.</returns>
    /// <exception cref="IncompatibleRingException">A variable is missing here.</exception>
    public RationalFunction Embed(RationalFunction value)
    {
        ArgumentNullException.ThrowIfNull(value);
        if (value.Field.Equals(this)) return ReferenceEquals(value.Field, this) ? value : new RationalFunction(this, value.Numerator.WithRing(PolynomialRing), value.Denominator.WithRing(PolynomialRing));
        // Re-ordering variables can change which term leads, so canonicalise again.
        return RationalFunction.Canonical(this, PolynomialRing.Embed(value.Numerator), PolynomialRing.Embed(value.Denominator));
    }

    /// <summary>Value equality: equal polynomial rings.</summary>
    /// <param name="other">The other field.</param>
    /// <returns>True when equal.</returns>
    public bool Equals(RationalFunctionField? other) => other is not null && (ReferenceEquals(this, other) || PolynomialRing.Equals(other.PolynomialRing));

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is RationalFunctionField f && Equals(f);

    /// <inheritdoc/>
    public override int GetHashCode() => PolynomialRing.GetHashCode() * 31 + 7;

    /// <summary>Text such as <c>Q(x, y)</c>.</summary>
    /// <returns>The description.</returns>
    public override string ToString() => "Q(" + string.Join(", ", PolynomialRing.Variables) + ")";

    // ---- IRing<RationalFunction> ----

    /// <inheritdoc/>
    public RationalFunction FromInteger(long value) => Constant(value);

    /// <inheritdoc/>
    public RationalFunction FromRational(Rational value) => Constant(value);

    /// <inheritdoc/>
    public RationalFunction Add(RationalFunction a, RationalFunction b) => Own(a) + b;

    /// <inheritdoc/>
    public RationalFunction Subtract(RationalFunction a, RationalFunction b) => Own(a) - b;

    /// <inheritdoc/>
    public RationalFunction Multiply(RationalFunction a, RationalFunction b) => Own(a) * b;

    /// <inheritdoc/>
    public RationalFunction Negate(RationalFunction a) => -Own(a);

    /// <inheritdoc/>
    public bool IsZero(RationalFunction a) => Own(a).IsZero;

    /// <inheritdoc/>
    public bool AreEqual(RationalFunction a, RationalFunction b) => Own(a) == Own(b);

    /// <summary>Division in the field.</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor.</param>
    /// <param name="quotient">a/b when <paramref name="b"/> is non-zero.</param>
    /// <returns>False exactly when <paramref name="b"/> is zero.</returns>
    public bool TryDivide(RationalFunction a, RationalFunction b, out RationalFunction quotient)
    {
        Own(a);
        if (Own(b).IsZero) { quotient = Zero; return false; }
        quotient = a / b;
        return true;
    }

    private RationalFunction Own(RationalFunction a)
    {
        ArgumentNullException.ThrowIfNull(a);
        if (!Equals(a.Field)) throw new IncompatibleRingException($"Element of {a.Field} used in {this}; use Unify and Embed.");
        return a;
    }

    private void Own(LaurentPolynomial p)
    {
        ArgumentNullException.ThrowIfNull(p);
        if (!PolynomialRing.Equals(p.Ring)) throw new IncompatibleRingException($"Polynomial of {p.Ring} used in {this}.");
    }
}
