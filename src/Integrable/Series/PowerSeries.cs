using System.Diagnostics;
using System.Text;
using Integrable.Algebra;

namespace Integrable.Series;

/// <summary>A truncated power series f = c₀ + c₁x + … + c_{n−1}x^{n−1} + O(x^n) in one variable over a
/// field (Q or Z/pZ), or an exact polynomial (infinite precision).</summary>
/// <typeparam name="T">The coefficient type of the ring (<see cref="Numbers.Rational"/> or <see cref="ulong"/> residues).</typeparam>
/// <remarks>
/// <para><b>Precision convention.</b> A value knows its absolute precision n: every coefficient below x^n
/// is exact, nothing is known at or above x^n. Exact polynomials (from <see cref="PowerSeriesRing{T}.X"/>,
/// constants, <see cref="PowerSeriesRing{T}.Polynomial"/>) have infinite precision,
/// <see cref="Precision"/> = <see cref="int.MaxValue"/>. Every operation returns exactly the precision its
/// inputs determine:
/// sums and differences have precision min(n_a, n_b) ("the smaller precision"); a product has
/// min(n_a + v_b, n_b + v_a) where v is the valuation, which for series with non-zero constant terms is
/// again the smaller precision, while a factor x^k (or any factor of valuation k) lets the product know k
/// more terms; quotients, inverses, logarithms and exponentials of units keep the smaller precision;
/// a k-th power of a series of valuation v has precision n + (k−1)v. Add <see cref="PowerSeriesRing{T}.O"/>
/// to truncate explicitly. Operations whose exact result is an infinite series (the inverse of a
/// non-monomial polynomial, …) need a finite precision somewhere in their inputs or an explicit
/// precision argument, and throw <see cref="InvalidOperationException"/> otherwise.</para>
/// <para><b>Canonical form.</b> The stored coefficients stop at the last non-zero one below the
/// precision; two values are equal when they have the same ring, precision and coefficients. Use
/// <see cref="AgreesWith"/> to compare up to the smaller precision.</para>
/// <para><b>Algorithms.</b> Products go through one kernel per coefficient field (multi-modular
/// transforms over Q, three-prime transforms or schoolbook over Z/pZ); inverse, square root and
/// exponential use Newton iteration (O(M(n)) each), the logarithm is ∫f′/f, composition uses Brent–Kung
/// baby steps / giant steps (about 2√n products plus n² scalar operations). In characteristic p,
/// operations that divide by integers (integral, logarithm, exponential, square root for p = 2)
/// throw <see cref="ArithmeticException"/> when they would divide by a multiple of p.</para>
/// </remarks>
/// <example><code>
/// var r = PowerSeriesRing.Rationals;
/// var x = r.X;
/// var e = (x + r.O(8)).Exp();             // 1 + x + 1/2*x^2 + … + O(x^8)
/// var l = e.Log();                        // x + O(x^8)
/// </code></example>
[DebuggerDisplay("{ToString(),nq}")]
public sealed partial class PowerSeries<T> : IRingElement<PowerSeries<T>>
{
    internal const int ExactPrecision = int.MaxValue;

    private readonly T[] _c;
    private readonly int _precision;

    private PowerSeries(PowerSeriesRing<T> ring, T[] coefficients, int precision)
    {
        Ring = ring;
        _c = coefficients;
        _precision = precision;
    }

    /// <summary>Canonicalizes: truncates to the precision and trims trailing zeros (may reuse the array).</summary>
    internal static PowerSeries<T> Create(PowerSeriesRing<T> ring, T[] c, int precision)
    {
        var d = ring.Domain;
        int len = Math.Min(c.Length, precision);
        while (len > 0 && d.IsZero(c[len - 1])) len--;
        if (len != c.Length) Array.Resize(ref c, len);
        return new PowerSeries<T>(ring, c, precision);
    }

    /// <summary>Wraps an already canonical array.</summary>
    internal static PowerSeries<T> CreateUnchecked(PowerSeriesRing<T> ring, T[] c, int precision) => new(ring, c, precision);

    /// <summary>The ring this series belongs to.</summary>
    public PowerSeriesRing<T> Ring { get; }

    /// <summary>The absolute precision n (the series is known modulo x^n); <see cref="int.MaxValue"/> for an exact polynomial.</summary>
    public int Precision => _precision;

    /// <summary>True for an exact polynomial (infinite precision).</summary>
    public bool IsExact => _precision == ExactPrecision;

    /// <summary>The stored coefficients c₀, c₁, …: all known coefficients up to the last non-zero one; the
    /// coefficients from <c>Coefficients.Length</c> up to <see cref="Precision"/> − 1 are zero.</summary>
    public ReadOnlySpan<T> Coefficients => _c;

    /// <summary>The valuation: the index of the first non-zero known coefficient, or <see cref="Precision"/>
    /// when no known coefficient is non-zero (so O(x^n) has valuation n and the exact zero <see cref="int.MaxValue"/>).</summary>
    public int Valuation
    {
        get
        {
            var d = Ring.Domain;
            for (int i = 0; i < _c.Length; i++) if (!d.IsZero(_c[i])) return i;
            return _precision;
        }
    }

    /// <summary>The degree of the stored part (index of the last non-zero coefficient), −1 when none.</summary>
    public int Degree => _c.Length - 1;

    /// <summary>True when every known coefficient is zero (the exact zero, or O(x^n)).</summary>
    public bool IsZero => _c.Length == 0;

    /// <summary>True for the exact series 1.</summary>
    public bool IsOne => IsExact && _c.Length == 1 && Ring.Domain.IsOne(_c[0]);

    /// <summary>The coefficient of x^k.</summary>
    /// <param name="k">The index, 0 ≤ k &lt; <see cref="Precision"/>.</param>
    /// <returns>c_k.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="k"/> is negative or not below the precision.</exception>
    public T this[int k]
    {
        get
        {
            if (k < 0 || k >= _precision)
                throw new ArgumentOutOfRangeException(nameof(k), k, $"coefficient index must lie in [0, {_precision}) for a series known to O(x^{_precision})");
            return k < _c.Length ? _c[k] : Ring.Domain.Zero;
        }
    }

    /// <summary>The constant term c₀.</summary>
    /// <exception cref="InvalidOperationException">The precision is 0 (nothing is known).</exception>
    public T ConstantTerm => _precision > 0 ? this[0] : throw new InvalidOperationException("O(1) has no known constant term");

    internal T Get(int k) => k < _c.Length ? _c[k] : Ring.Domain.Zero;
    internal T[] Raw => _c;

    /// <summary>True when the two series agree up to the smaller of their precisions.</summary>
    /// <param name="other">Another series of the same ring.</param>
    /// <returns>Whether all coefficients below min(precisions) are equal.</returns>
    /// <exception cref="IncompatibleRingException">Different rings.</exception>
    public bool AgreesWith(PowerSeries<T> other)
    {
        Check(this, other);
        int n = Math.Min(_precision, other._precision);
        int m = Math.Min(n, Math.Max(_c.Length, other._c.Length));
        var d = Ring.Domain;
        for (int k = 0; k < m; k++) if (!d.AreEqual(Get(k), other.Get(k))) return false;
        return true;
    }

    /// <inheritdoc/>
    public bool Equals(PowerSeries<T>? other)
    {
        if (other is null) return false;
        if (ReferenceEquals(this, other)) return true;
        if (!Ring.Equals(other.Ring) || _precision != other._precision || _c.Length != other._c.Length) return false;
        var d = Ring.Domain;
        for (int k = 0; k < _c.Length; k++) if (!d.AreEqual(_c[k], other._c[k])) return false;
        return true;
    }

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as PowerSeries<T>);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(_precision);
        var d = Ring.Domain;
        for (int k = 0; k < Math.Min(_c.Length, 16); k++) h.Add(d.HashOf(_c[k]));
        h.Add(_c.Length);
        return h.ToHashCode();
    }

    /// <summary>Structural equality (same ring, precision and coefficients).</summary>
    /// <param name="left">First series.</param>
    /// <param name="right">Second series.</param>
    /// <returns>Whether they are equal.</returns>
    public static bool operator ==(PowerSeries<T>? left, PowerSeries<T>? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Structural inequality.</summary>
    /// <param name="left">First series.</param>
    /// <param name="right">Second series.</param>
    /// <returns>Whether they differ.</returns>
    public static bool operator !=(PowerSeries<T>? left, PowerSeries<T>? right) => !(left == right);

    /// <summary>Text such as <c>1 + 2*x + 5*x^2 + O(x^3)</c> (residues for Z/pZ print in [0, p)).</summary>
    /// <returns>The series as text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        var d = Ring.Domain;
        string v = Ring.Variable;
        for (int k = 0; k < _c.Length; k++)
        {
            var c = _c[k];
            if (d.IsZero(c)) continue;
            string s = d.Format(c);
            bool negative = s.StartsWith('-');
            if (negative) s = s[1..];
            if (sb.Length > 0) sb.Append(negative ? " - " : " + ");
            else if (negative) sb.Append('-');
            bool one = s == "1";
            if (k == 0) sb.Append(s);
            else
            {
                if (!one) sb.Append(s).Append('*');
                sb.Append(v);
                if (k > 1) sb.Append('^').Append(k);
            }
        }
        if (!IsExact)
        {
            if (sb.Length > 0) sb.Append(" + ");
            sb.Append("O(").Append(v);
            if (_precision != 1) sb.Append('^').Append(_precision);
            sb.Append(')');
        }
        else if (sb.Length == 0) sb.Append('0');
        return sb.ToString();
    }

    internal static void Check(PowerSeries<T> a, PowerSeries<T> b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (!ReferenceEquals(a.Ring, b.Ring) && !a.Ring.Equals(b.Ring))
            throw new IncompatibleRingException($"cannot combine series of {a.Ring} and {b.Ring}");
    }

    /// <summary>Saturating addition of precisions (int.MaxValue = exact).</summary>
    internal static int AddPrecision(long a, long b)
    {
        if (a >= ExactPrecision || b >= ExactPrecision) return ExactPrecision;
        long s = a + b;
        return s >= ExactPrecision ? ExactPrecision - 1 : (int)s;
    }
}
