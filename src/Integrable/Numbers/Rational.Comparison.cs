using System.Numerics;

namespace Integrable.Numbers;

public readonly partial struct Rational : IEquatable<Rational>, IComparable<Rational>, IComparable
{
    /// <summary>Exact equality of values.</summary>
    /// <param name="other">The other value.</param>
    /// <returns>True when both denote the same rational number.</returns>
    public bool Equals(Rational other)
    {
        if (_big is null) return other._big is null && _num == other._num && _denMinusOne == other._denMinusOne;
        return other._big is not null && _big.Num == other._big.Num && _big.Den == other._big.Den;
    }

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Rational r && Equals(r);

    /// <inheritdoc/>
    public override int GetHashCode() =>
        _big is null ? HashCode.Combine(_num, _denMinusOne) : HashCode.Combine(_big.Num, _big.Den);

    /// <summary>Exact equality.</summary>
    /// <param name="a">Left operand.</param>
    /// <param name="b">Right operand.</param>
    /// <returns>True when equal.</returns>
    public static bool operator ==(Rational a, Rational b) => a.Equals(b);

    /// <summary>Exact inequality.</summary>
    /// <param name="a">Left operand.</param>
    /// <param name="b">Right operand.</param>
    /// <returns>True when different.</returns>
    public static bool operator !=(Rational a, Rational b) => !a.Equals(b);

    /// <summary>Compares two values by size.</summary>
    /// <param name="other">The other value.</param>
    /// <returns>Negative, zero or positive as this is below, equal to or above <paramref name="other"/>.</returns>
    public int CompareTo(Rational other)
    {
        if (_big is null && other._big is null)
        {
            if (_denMinusOne == 0 && other._denMinusOne == 0) return _num.CompareTo(other._num);
            return ((Int128)_num * other.SmallDen).CompareTo((Int128)other._num * SmallDen);
        }
        int sa = Sign, sb = other.Sign;
        if (sa != sb) return sa.CompareTo(sb);
        return (Numerator * other.Denominator).CompareTo(other.Numerator * Denominator);
    }

    /// <inheritdoc/>
    public int CompareTo(object? obj) => obj switch
    {
        null => 1,
        Rational r => CompareTo(r),
        _ => throw new ArgumentException("Object is not a Rational.", nameof(obj)),
    };

    /// <summary>Less than.</summary>
    /// <param name="a">Left operand.</param>
    /// <param name="b">Right operand.</param>
    /// <returns>True when <paramref name="a"/> &lt; <paramref name="b"/>.</returns>
    public static bool operator <(Rational a, Rational b) => a.CompareTo(b) < 0;

    /// <summary>Greater than.</summary>
    /// <param name="a">Left operand.</param>
    /// <param name="b">Right operand.</param>
    /// <returns>True when <paramref name="a"/> &gt; <paramref name="b"/>.</returns>
    public static bool operator >(Rational a, Rational b) => a.CompareTo(b) > 0;

    /// <summary>Less than or equal.</summary>
    /// <param name="a">Left operand.</param>
    /// <param name="b">Right operand.</param>
    /// <returns>True when <paramref name="a"/> ≤ <paramref name="b"/>.</returns>
    public static bool operator <=(Rational a, Rational b) => a.CompareTo(b) <= 0;

    /// <summary>Greater than or equal.</summary>
    /// <param name="a">Left operand.</param>
    /// <param name="b">Right operand.</param>
    /// <returns>True when <paramref name="a"/> ≥ <paramref name="b"/>.</returns>
    public static bool operator >=(Rational a, Rational b) => a.CompareTo(b) >= 0;

    /// <summary>The larger of two values.</summary>
    /// <param name="x">First value.</param>
    /// <param name="y">Second value.</param>
    /// <returns>max(<paramref name="x"/>, <paramref name="y"/>).</returns>
    public static Rational Max(Rational x, Rational y) => x >= y ? x : y;

    /// <summary>The smaller of two values.</summary>
    /// <param name="x">First value.</param>
    /// <param name="y">Second value.</param>
    /// <returns>min(<paramref name="x"/>, <paramref name="y"/>).</returns>
    public static Rational Min(Rational x, Rational y) => x <= y ? x : y;
}
