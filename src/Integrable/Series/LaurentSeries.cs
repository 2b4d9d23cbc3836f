using System.Diagnostics;
using System.Text;
using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Series;

/// <summary>A truncated Laurent series c_v ε^v + c_{v+1} ε^{v+1} + … + O(ε^N) over Q in a small parameter ε,
/// with a valuation v of any sign; the tool for singularity-confinement analysis.</summary>
/// <remarks>
/// <para><b>Form.</b> A non-zero value is ε^v·u(ε) with u a power series whose constant term is non-zero
/// (the leading coefficient) known to a <i>relative</i> precision r: the value is known modulo ε^{v+r}
/// (its <see cref="AbsolutePrecision"/>). Exact values (from <see cref="Epsilon"/>, <see cref="Constant"/>,
/// <see cref="Exact"/>) have infinite precision. When nothing non-zero is known the value is O(ε^N):
/// its leading term is unknown, <see cref="HasLeadingTerm"/> is false, and inverting it throws.</para>
/// <para><b>Precision convention.</b> Products, quotients and powers keep the smaller relative precision
/// (so a leading-order cancellation in a sum, not a division, is what consumes precision); sums keep the
/// smaller absolute precision. As for <see cref="PowerSeries{T}"/>, the inverse of an exact non-monomial
/// is an infinite series and needs a precision: give inputs a finite precision or call
/// <see cref="Inverse(int)"/>.</para>
/// </remarks>
/// <example><code>
/// var e = LaurentSeries.Epsilon;
/// var x = LaurentSeries.Constant(2) + e + LaurentSeries.O(6);    // 2 + ε + O(ε^6)
/// var y = 1 / (x - 2);                                           // ε^-1 + O(ε^4)
/// var (c, k) = (y.LeadingCoefficient, y.Valuation);              // (1, −1)
/// </code></example>
[DebuggerDisplay("{ToString(),nq}")]
public sealed class LaurentSeries : IRingElement<LaurentSeries>
{
    private static readonly PowerSeriesRing<Rational> Units = PowerSeriesRing.OverRationals("ε");
    private const int ExactPrecision = int.MaxValue;

    // Non-zero: _u has non-zero constant term, value = ε^_v · _u.
    // No known term: _u is O(1) (precision 0) and _v is the absolute precision; exact zero: _u exact zero, _v = 0.
    private readonly PowerSeries<Rational> _u;
    private readonly int _v;

    private LaurentSeries(int v, PowerSeries<Rational> u) { _v = v; _u = u; }

    /// <summary>The exact zero.</summary>
    public static LaurentSeries Zero { get; } = new(0, Units.Zero);

    /// <summary>The exact one.</summary>
    public static LaurentSeries One { get; } = new(0, Units.One);

    /// <summary>The exact parameter ε.</summary>
    public static LaurentSeries Epsilon { get; } = new(1, Units.One);

    /// <summary>The exact constant <paramref name="value"/>.</summary>
    /// <param name="value">The constant.</param>
    /// <returns>The constant series.</returns>
    public static LaurentSeries Constant(Rational value) => value.IsZero ? Zero : new(0, Units.Constant(value));

    /// <summary>The exact monomial c·ε^k.</summary>
    /// <param name="coefficient">The coefficient.</param>
    /// <param name="exponent">The exponent (any sign).</param>
    /// <returns>c·ε^k.</returns>
    public static LaurentSeries Monomial(Rational coefficient, int exponent) => coefficient.IsZero ? Zero : new(exponent, Units.Constant(coefficient));

    /// <summary>The unknown quantity O(ε^n): zero known to absolute precision n.</summary>
    /// <param name="absolutePrecision">n (any sign).</param>
    /// <returns>O(ε^n).</returns>
    public static LaurentSeries O(int absolutePrecision) => new(absolutePrecision, Units.O(0));

    /// <summary>The exact Laurent polynomial Σ c_i ε^{lowest + i}.</summary>
    /// <param name="coefficients">Coefficients, lowest exponent first.</param>
    /// <param name="lowestExponent">The exponent of the first coefficient.</param>
    /// <returns>The Laurent polynomial.</returns>
    public static LaurentSeries Exact(ReadOnlySpan<Rational> coefficients, int lowestExponent) =>
        Normalize(lowestExponent, Units.Polynomial(coefficients));

    /// <summary>The series Σ c_i ε^{lowest + i} + O(ε^absolutePrecision); coefficients at or above the precision are dropped.</summary>
    /// <param name="coefficients">Coefficients, lowest exponent first.</param>
    /// <param name="lowestExponent">The exponent of the first coefficient.</param>
    /// <param name="absolutePrecision">The absolute precision N ≥ <paramref name="lowestExponent"/>.</param>
    /// <returns>The series.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="absolutePrecision"/> &lt; <paramref name="lowestExponent"/>.</exception>
    public static LaurentSeries Create(ReadOnlySpan<Rational> coefficients, int lowestExponent, int absolutePrecision)
    {
        if (absolutePrecision < lowestExponent)
            throw new ArgumentOutOfRangeException(nameof(absolutePrecision), absolutePrecision, $"must be at least the lowest exponent {lowestExponent}");
        return Normalize(lowestExponent, Units.Series(coefficients, absolutePrecision - lowestExponent));
    }

    /// <summary>The power series <paramref name="series"/> (in any variable name over Q) read as a series in ε.</summary>
    /// <param name="series">A power series over Q.</param>
    /// <returns>The same series as a Laurent series.</returns>
    public static LaurentSeries FromPowerSeries(PowerSeries<Rational> series)
    {
        ArgumentNullException.ThrowIfNull(series);
        return Normalize(0, Units.Series(series.Coefficients, series.Precision));
    }

    private static LaurentSeries Normalize(int v, PowerSeries<Rational> s)
    {
        if (s.IsZero) return s.IsExact ? Zero : new LaurentSeries(AddPrecision(v, s.Precision), Units.O(0));
        int w = s.Valuation;
        return new LaurentSeries(checked(v + w), s.MultiplyByPowerOfX(-w));
    }

    private static int AddPrecision(long a, long b) =>
        a >= ExactPrecision || b >= ExactPrecision ? ExactPrecision : (int)Math.Clamp(a + b, int.MinValue, ExactPrecision - 1);

    /// <summary>True when a non-zero term is known (the value is neither exact zero nor O(ε^N)).</summary>
    public bool HasLeadingTerm => !_u.IsZero;

    /// <summary>True when every known coefficient is zero (exact zero or O(ε^N)).</summary>
    public bool IsZero => _u.IsZero;

    /// <summary>True for the exact one.</summary>
    public bool IsOne => _v == 0 && _u.IsOne;

    /// <summary>True for an exact Laurent polynomial.</summary>
    public bool IsExact => _u.IsExact;

    /// <summary>The valuation v (exponent of the leading term); for O(ε^N) it is N, for the exact zero <see cref="int.MaxValue"/>.</summary>
    public int Valuation => _u.IsZero ? (IsExact ? ExactPrecision : _v) : _v;

    /// <summary>The relative precision r: the number of known coefficients from the leading one on (0 for O(ε^N), <see cref="int.MaxValue"/> when exact).</summary>
    public int RelativePrecision => _u.Precision;

    /// <summary>The absolute precision N: the value is known modulo ε^N (<see cref="int.MaxValue"/> when exact).</summary>
    public int AbsolutePrecision => _u.IsZero ? (IsExact ? ExactPrecision : _v) : AddPrecision(_v, _u.Precision);

    /// <summary>The leading coefficient c_v.</summary>
    /// <exception cref="InvalidOperationException">No non-zero term is known.</exception>
    public Rational LeadingCoefficient => HasLeadingTerm ? _u.Get(0) : throw NoLeadingTerm();

    /// <summary>The leading term c_v ε^v as an exact monomial.</summary>
    /// <exception cref="InvalidOperationException">No non-zero term is known.</exception>
    public LaurentSeries LeadingTerm => HasLeadingTerm ? Monomial(_u.Get(0), _v) : throw NoLeadingTerm();

    private InvalidOperationException NoLeadingTerm() =>
        new($"{this} has no known non-zero term: the precision was used up by cancellation; start with more terms");

    /// <summary>The coefficient of ε^k.</summary>
    /// <param name="k">The exponent, below the absolute precision.</param>
    /// <returns>c_k (zero below the valuation).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="k"/> is not below the absolute precision.</exception>
    public Rational this[int k]
    {
        get
        {
            if (k >= AbsolutePrecision) throw new ArgumentOutOfRangeException(nameof(k), k, $"the coefficient of ε^{k} is not known in {this}");
            if (_u.IsZero || k < _v) return Rational.Zero;
            return _u.Get(k - _v);
        }
    }

    /// <summary>The known coefficients from the leading one on (c_v, c_{v+1}, …; trailing zeros omitted).</summary>
    public ReadOnlySpan<Rational> Coefficients => _u.Coefficients;

    /// <summary>Sum; absolute precision min(N_a, N_b).</summary>
    /// <param name="a">First summand.</param>
    /// <param name="b">Second summand.</param>
    /// <returns><paramref name="a"/> + <paramref name="b"/>.</returns>
    public static LaurentSeries operator +(LaurentSeries a, LaurentSeries b) => AddCore(a, b, false);

    /// <summary>Difference; absolute precision min(N_a, N_b).</summary>
    /// <param name="a">Minuend.</param>
    /// <param name="b">Subtrahend.</param>
    /// <returns><paramref name="a"/> − <paramref name="b"/>.</returns>
    public static LaurentSeries operator -(LaurentSeries a, LaurentSeries b) => AddCore(a, b, true);

    private static LaurentSeries AddCore(LaurentSeries a, LaurentSeries b, bool subtract)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (b.IsExact && b.IsZero) return a;
        if (a.IsExact && a.IsZero) return subtract ? -b : b;
        int v = Math.Min(a._v, b._v);
        var ua = a._u.MultiplyByPowerOfX(a._v - v);
        var ub = b._u.MultiplyByPowerOfX(b._v - v);
        return Normalize(v, subtract ? ua - ub : ua + ub);
    }

    /// <summary>Negation.</summary>
    /// <param name="a">The series.</param>
    /// <returns>−<paramref name="a"/>.</returns>
    public static LaurentSeries operator -(LaurentSeries a)
    {
        ArgumentNullException.ThrowIfNull(a);
        return new LaurentSeries(a._v, -a._u);
    }

    /// <summary>Product; relative precision min(r_a, r_b).</summary>
    /// <param name="a">First factor.</param>
    /// <param name="b">Second factor.</param>
    /// <returns><paramref name="a"/>·<paramref name="b"/>.</returns>
    public static LaurentSeries operator *(LaurentSeries a, LaurentSeries b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if ((a.IsExact && a.IsZero) || (b.IsExact && b.IsZero)) return Zero;
        return Normalize(checked(a._v + b._v), a._u * b._u);
    }

    /// <summary>Quotient; relative precision min(r_a, r_b).</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor with a known non-zero term.</param>
    /// <returns><paramref name="a"/>/<paramref name="b"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="b"/> has no known non-zero term.</exception>
    /// <exception cref="InvalidOperationException">Exact non-monomial divisor and exact dividend (give a precision).</exception>
    public static LaurentSeries operator /(LaurentSeries a, LaurentSeries b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (!b.HasLeadingTerm) throw new DivideByZeroException($"division by {b}, which has no known non-zero term");
        if (a.IsExact && a.IsZero) return Zero;
        int cap = a.IsExact ? ExactPrecision : a._u.Precision;
        if (!a.HasLeadingTerm) return O(checked(a._v - b._v));
        var q = PowerSeries<Rational>.Divide(a._u, b._u, cap);
        return Normalize(checked(a._v - b._v), q);
    }

    /// <summary>The inverse of a series with a known non-zero term: ε^{−v}·u⁻¹, same relative precision.</summary>
    /// <returns>1/this.</returns>
    /// <exception cref="DivideByZeroException">No known non-zero term.</exception>
    /// <exception cref="InvalidOperationException">Exact non-monomial (use <see cref="Inverse(int)"/>).</exception>
    public LaurentSeries Inverse() => One / this;

    /// <summary>The inverse computed to relative precision at most <paramref name="relativePrecision"/>.</summary>
    /// <param name="relativePrecision">Upper bound on the relative precision of the result.</param>
    /// <returns>1/this.</returns>
    /// <exception cref="DivideByZeroException">No known non-zero term.</exception>
    public LaurentSeries Inverse(int relativePrecision)
    {
        if (!HasLeadingTerm) throw new DivideByZeroException($"inverse of {this}, which has no known non-zero term");
        return Normalize(checked(-_v), _u.Inverse(relativePrecision));
    }

    /// <summary>Integer power; negative exponents invert first; this^0 is the exact one.</summary>
    /// <param name="exponent">The exponent.</param>
    /// <returns>this^<paramref name="exponent"/>.</returns>
    /// <exception cref="DivideByZeroException">Negative exponent and no known non-zero term.</exception>
    public LaurentSeries Pow(int exponent)
    {
        if (exponent == 0) return One;
        if (exponent < 0) return Inverse().Pow(checked(-exponent));
        if (IsExact && IsZero) return Zero;
        if (!HasLeadingTerm) return O(checked(_v * exponent));
        return Normalize(checked(_v * exponent), _u.Pow(exponent));
    }

    /// <summary>The same series truncated to absolute precision min(N, <paramref name="absolutePrecision"/>).</summary>
    /// <param name="absolutePrecision">The new absolute precision.</param>
    /// <returns>The truncated series.</returns>
    public LaurentSeries Truncate(int absolutePrecision) => this + O(absolutePrecision);

    /// <summary>Scalar sum.</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The scalar.</param>
    /// <returns><paramref name="a"/> + <paramref name="c"/>.</returns>
    public static LaurentSeries operator +(LaurentSeries a, Rational c) => a + Constant(c);

    /// <summary>Scalar sum.</summary>
    /// <param name="c">The scalar.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/> + <paramref name="a"/>.</returns>
    public static LaurentSeries operator +(Rational c, LaurentSeries a) => Constant(c) + a;

    /// <summary>Scalar difference.</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The scalar.</param>
    /// <returns><paramref name="a"/> − <paramref name="c"/>.</returns>
    public static LaurentSeries operator -(LaurentSeries a, Rational c) => a - Constant(c);

    /// <summary>Scalar difference.</summary>
    /// <param name="c">The scalar.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/> − <paramref name="a"/>.</returns>
    public static LaurentSeries operator -(Rational c, LaurentSeries a) => Constant(c) - a;

    /// <summary>Scalar multiple.</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The scalar.</param>
    /// <returns><paramref name="c"/>·<paramref name="a"/>.</returns>
    public static LaurentSeries operator *(LaurentSeries a, Rational c) => a * Constant(c);

    /// <summary>Scalar multiple.</summary>
    /// <param name="c">The scalar.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/>·<paramref name="a"/>.</returns>
    public static LaurentSeries operator *(Rational c, LaurentSeries a) => Constant(c) * a;

    /// <summary>Division by a non-zero scalar.</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The scalar.</param>
    /// <returns><paramref name="a"/>/<paramref name="c"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="c"/> is zero.</exception>
    public static LaurentSeries operator /(LaurentSeries a, Rational c) => a * c.Inverse();

    /// <summary>A scalar divided by a series.</summary>
    /// <param name="c">The scalar.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/>/<paramref name="a"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="a"/> has no known non-zero term.</exception>
    public static LaurentSeries operator /(Rational c, LaurentSeries a) => Constant(c) / a;

    /// <summary>Named form of <c>a + b</c>.</summary>
    /// <param name="a">First summand.</param>
    /// <param name="b">Second summand.</param>
    /// <returns>The sum.</returns>
    public static LaurentSeries Add(LaurentSeries a, LaurentSeries b) => a + b;

    /// <summary>Named form of <c>a - b</c>.</summary>
    /// <param name="a">Minuend.</param>
    /// <param name="b">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static LaurentSeries Subtract(LaurentSeries a, LaurentSeries b) => a - b;

    /// <summary>Named form of <c>a * b</c>.</summary>
    /// <param name="a">First factor.</param>
    /// <param name="b">Second factor.</param>
    /// <returns>The product.</returns>
    public static LaurentSeries Multiply(LaurentSeries a, LaurentSeries b) => a * b;

    /// <summary>Named form of <c>a / b</c>.</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor.</param>
    /// <returns>The quotient.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="b"/> has no known non-zero term.</exception>
    public static LaurentSeries Divide(LaurentSeries a, LaurentSeries b) => a / b;

    /// <summary>Named form of unary minus.</summary>
    /// <param name="a">The series.</param>
    /// <returns>−<paramref name="a"/>.</returns>
    public static LaurentSeries Negate(LaurentSeries a) => -a;

    /// <summary>True when both agree up to the smaller absolute precision.</summary>
    /// <param name="other">Another series.</param>
    /// <returns>Whether all coefficients below min(N_a, N_b) agree.</returns>
    public bool AgreesWith(LaurentSeries other)
    {
        ArgumentNullException.ThrowIfNull(other);
        return (this - other).IsZero;
    }

    /// <inheritdoc/>
    public bool Equals(LaurentSeries? other) => other is not null && _v == other._v && _u.Equals(other._u);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as LaurentSeries);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(_v, _u);

    /// <summary>Structural equality (same valuation, precision and coefficients).</summary>
    /// <param name="left">First series.</param>
    /// <param name="right">Second series.</param>
    /// <returns>Whether they are equal.</returns>
    public static bool operator ==(LaurentSeries? left, LaurentSeries? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Structural inequality.</summary>
    /// <param name="left">First series.</param>
    /// <param name="right">Second series.</param>
    /// <returns>Whether they differ.</returns>
    public static bool operator !=(LaurentSeries? left, LaurentSeries? right) => !(left == right);

    /// <summary>Text such as <c>ε^-2 + 1 - 1/2*ε + O(ε^3)</c>.</summary>
    /// <returns>The series as text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        var c = _u.Coefficients;
        for (int i = 0; i < c.Length; i++)
        {
            if (c[i].IsZero) continue;
            int k = _v + i;
            string s = c[i].ToString();
            bool negative = s.StartsWith('-');
            if (negative) s = s[1..];
            if (sb.Length > 0) sb.Append(negative ? " - " : " + ");
            else if (negative) sb.Append('-');
            if (k == 0) { sb.Append(s); continue; }
            if (s != "1") sb.Append(s).Append('*');
            sb.Append('ε');
            if (k != 1) sb.Append('^').Append(k);
        }
        if (!IsExact)
        {
            if (sb.Length > 0) sb.Append(" + ");
            int n = AbsolutePrecision;
            sb.Append(n == 0 ? "O(1)" : n == 1 ? "O(ε)" : $"O(ε^{n})");
        }
        else if (sb.Length == 0) sb.Append('0');
        return sb.ToString();
    }
}
