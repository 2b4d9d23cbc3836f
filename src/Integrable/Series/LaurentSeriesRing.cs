using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Series;

/// <summary>Laurent series over Q in ε (<see cref="LaurentSeries"/>) as a ring context, so that a rule
/// written once against <see cref="IRing{T}"/> can be iterated on ε-dependent values (singularity confinement).</summary>
/// <remarks>Constants are exact. <see cref="TryDivide"/> inverts exact non-monomial divisors to
/// <see cref="RelativePrecision"/> terms (an exact quotient would be an infinite series); all other
/// operations follow the precision convention of <see cref="LaurentSeries"/>. <see cref="IsZero"/> is true
/// when no non-zero term is known (O(ε^N) as well as the exact zero), and <see cref="TryDivide"/> fails
/// for such divisors. Rings are equal when their relative precisions are.</remarks>
/// <example><code>
/// var ring = new LaurentSeriesRing(10);
/// var x = ring.Add(ring.FromInteger(2), LaurentSeries.Epsilon);
/// ring.TryDivide(ring.One, ring.Subtract(x, ring.FromInteger(2)), out var y);   // ε^-1
/// </code></example>
public sealed class LaurentSeriesRing : IRing<LaurentSeries>, IEquatable<LaurentSeriesRing>
{
    /// <summary>Creates the ring.</summary>
    /// <param name="relativePrecision">Number of terms kept when an exact non-monomial divisor is inverted, at least 1.</param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="relativePrecision"/> &lt; 1.</exception>
    public LaurentSeriesRing(int relativePrecision)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(relativePrecision, 1);
        RelativePrecision = relativePrecision;
    }

    /// <summary>Terms kept when inverting an exact non-monomial divisor.</summary>
    public int RelativePrecision { get; }

    /// <inheritdoc/>
    public LaurentSeries Zero => LaurentSeries.Zero;
    /// <inheritdoc/>
    public LaurentSeries One => LaurentSeries.One;
    /// <inheritdoc/>
    public LaurentSeries FromInteger(long value) => LaurentSeries.Constant(value);
    /// <inheritdoc/>
    public LaurentSeries FromRational(Rational value) => LaurentSeries.Constant(value);
    /// <inheritdoc/>
    public LaurentSeries Add(LaurentSeries a, LaurentSeries b) => a + b;
    /// <inheritdoc/>
    public LaurentSeries Subtract(LaurentSeries a, LaurentSeries b) => a - b;
    /// <inheritdoc/>
    public LaurentSeries Multiply(LaurentSeries a, LaurentSeries b) => a * b;
    /// <inheritdoc/>
    public LaurentSeries Negate(LaurentSeries a) => -a;
    /// <inheritdoc/>
    public bool IsZero(LaurentSeries a) { ArgumentNullException.ThrowIfNull(a); return a.IsZero; }
    /// <inheritdoc/>
    public bool AreEqual(LaurentSeries a, LaurentSeries b) { ArgumentNullException.ThrowIfNull(a); return a.Equals(b); }

    /// <inheritdoc/>
    public bool TryDivide(LaurentSeries a, LaurentSeries b, out LaurentSeries quotient)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        quotient = LaurentSeries.Zero;
        if (!b.HasLeadingTerm) return false;
        bool exactMonomial = b.IsExact && b.Coefficients.Length == 1;
        quotient = b.IsExact && !exactMonomial && a.IsExact ? a * b.Inverse(RelativePrecision) : a / b;
        return true;
    }

    /// <inheritdoc/>
    public bool Equals(LaurentSeriesRing? other) => other is not null && other.RelativePrecision == RelativePrecision;
    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as LaurentSeriesRing);
    /// <inheritdoc/>
    public override int GetHashCode() => RelativePrecision;
    /// <summary>Text such as <c>Q((ε)) [10 terms]</c>.</summary>
    /// <returns>The ring's name.</returns>
    public override string ToString() => $"Q((ε)) [{RelativePrecision} terms]";
}
