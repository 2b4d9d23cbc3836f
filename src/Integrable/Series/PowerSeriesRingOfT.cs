using Integrable.Algebra;

namespace Integrable.Series;

/// <summary>The ring K[[x]] of power series in one variable over a field K (Q or Z/pZ), as a context
/// object that creates its elements.</summary>
/// <typeparam name="T">The coefficient type: <see cref="Numbers.Rational"/> for Q, <see cref="ulong"/> residues for Z/pZ.</typeparam>
/// <remarks>Obtain instances from <see cref="PowerSeriesRing"/>. Two rings are equal when their
/// coefficient fields and variable names are equal; elements of different rings do not mix.</remarks>
/// <example><code>
/// var r = PowerSeriesRing.Modular(new PrimeField(101));
/// var s = r.Series([1, 1], 8).Inverse();   // 1/(1+x) + O(x^8) over Z/101Z
/// </code></example>
public sealed class PowerSeriesRing<T> : IEquatable<PowerSeriesRing<T>>
{
    internal PowerSeriesRing(CoefficientDomain<T> domain, string variable)
    {
        Domain = domain;
        Variable = variable;
        Zero = PowerSeries<T>.CreateUnchecked(this, [], PowerSeries<T>.ExactPrecision);
        One = PowerSeries<T>.CreateUnchecked(this, [domain.One], PowerSeries<T>.ExactPrecision);
        X = PowerSeries<T>.CreateUnchecked(this, [domain.Zero, domain.One], PowerSeries<T>.ExactPrecision);
    }

    internal CoefficientDomain<T> Domain { get; }

    /// <summary>The coefficient field as a ring context.</summary>
    public IRing<T> CoefficientRing => Domain.Ring;

    /// <summary>The characteristic of the coefficient field: 0 for Q, p for Z/pZ.</summary>
    public ulong Characteristic => Domain.Characteristic;

    /// <summary>The variable's name (for printing).</summary>
    public string Variable { get; }

    /// <summary>The exact zero series.</summary>
    public PowerSeries<T> Zero { get; }

    /// <summary>The exact series 1.</summary>
    public PowerSeries<T> One { get; }

    /// <summary>The exact series x.</summary>
    public PowerSeries<T> X { get; }

    /// <summary>The zero series known to precision <paramref name="precision"/>: O(x^precision).</summary>
    /// <param name="precision">The precision n ≥ 0.</param>
    /// <returns>O(x^n); adding it to an exact series truncates that series to precision n.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="precision"/> is negative.</exception>
    public PowerSeries<T> O(int precision)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(precision);
        return PowerSeries<T>.CreateUnchecked(this, [], precision);
    }

    /// <summary>The exact constant series <paramref name="value"/>.</summary>
    /// <param name="value">The constant.</param>
    /// <returns>The constant series.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A residue not below p (over Z/pZ).</exception>
    public PowerSeries<T> Constant(T value)
    {
        Domain.Validate(value, nameof(value));
        return PowerSeries<T>.Create(this, [value], PowerSeries<T>.ExactPrecision);
    }

    /// <summary>The exact monomial c·x^k.</summary>
    /// <param name="coefficient">The coefficient c.</param>
    /// <param name="exponent">The exponent k ≥ 0.</param>
    /// <returns>c·x^k.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="exponent"/> is negative, or a residue not below p.</exception>
    public PowerSeries<T> Monomial(T coefficient, int exponent)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(exponent);
        Domain.Validate(coefficient, nameof(coefficient));
        var c = new T[exponent + 1];
        Array.Fill(c, Domain.Zero);
        c[exponent] = coefficient;
        return PowerSeries<T>.Create(this, c, PowerSeries<T>.ExactPrecision);
    }

    /// <summary>The exact polynomial c₀ + c₁x + … (infinite precision).</summary>
    /// <param name="coefficients">The coefficients, constant term first.</param>
    /// <returns>The polynomial as an exact series.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A residue not below p (over Z/pZ).</exception>
    public PowerSeries<T> Polynomial(ReadOnlySpan<T> coefficients) => PowerSeries<T>.Create(this, Checked(coefficients), PowerSeries<T>.ExactPrecision);

    private T[] Checked(ReadOnlySpan<T> coefficients)
    {
        foreach (var c in coefficients) Domain.Validate(c, nameof(coefficients));
        return coefficients.ToArray();
    }

    /// <summary>The series c₀ + c₁x + … + O(x^precision); coefficients at index ≥ precision are dropped.</summary>
    /// <param name="coefficients">The known coefficients, constant term first (missing ones are zero).</param>
    /// <param name="precision">The precision n ≥ 0.</param>
    /// <returns>The series.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="precision"/> is negative, or a residue not below p.</exception>
    public PowerSeries<T> Series(ReadOnlySpan<T> coefficients, int precision)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(precision);
        return PowerSeries<T>.Create(this, Checked(coefficients), precision);
    }

    /// <summary>The series Σ_{k&lt;n} f(k) x^k + O(x^n).</summary>
    /// <param name="coefficient">The coefficient of x^k.</param>
    /// <param name="precision">The precision n ≥ 0.</param>
    /// <returns>The series.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="precision"/> is negative.</exception>
    public PowerSeries<T> FromFunction(Func<int, T> coefficient, int precision)
    {
        ArgumentNullException.ThrowIfNull(coefficient);
        ArgumentOutOfRangeException.ThrowIfNegative(precision);
        var c = new T[precision];
        for (int k = 0; k < precision; k++) { c[k] = coefficient(k); Domain.Validate(c[k], nameof(coefficient)); }
        return PowerSeries<T>.Create(this, c, precision);
    }

    /// <inheritdoc/>
    public bool Equals(PowerSeriesRing<T>? other) =>
        other is not null && (ReferenceEquals(this, other) || (Domain.Equals(other.Domain) && Variable == other.Variable));

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as PowerSeriesRing<T>);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Domain.DomainHash, Variable);

    /// <summary>Text such as <c>Q[[x]]</c>.</summary>
    /// <returns>The ring's name.</returns>
    public override string ToString() => $"{Domain.Name}[[{Variable}]]";
}
