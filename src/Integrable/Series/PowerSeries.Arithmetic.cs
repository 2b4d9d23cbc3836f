namespace Integrable.Series;

public sealed partial class PowerSeries<T>
{
    /// <summary>Sum; precision min(n_a, n_b).</summary>
    /// <param name="a">First summand.</param>
    /// <param name="b">Second summand.</param>
    /// <returns><paramref name="a"/> + <paramref name="b"/>.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">Different rings.</exception>
    public static PowerSeries<T> operator +(PowerSeries<T> a, PowerSeries<T> b) => AddCore(a, b, false);

    /// <summary>Difference; precision min(n_a, n_b).</summary>
    /// <param name="a">Minuend.</param>
    /// <param name="b">Subtrahend.</param>
    /// <returns><paramref name="a"/> − <paramref name="b"/>.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">Different rings.</exception>
    public static PowerSeries<T> operator -(PowerSeries<T> a, PowerSeries<T> b) => AddCore(a, b, true);

    private static PowerSeries<T> AddCore(PowerSeries<T> a, PowerSeries<T> b, bool subtract)
    {
        Check(a, b);
        var d = a.Ring.Domain;
        int prec = Math.Min(a._precision, b._precision);
        int len = Math.Min(prec, Math.Max(a._c.Length, b._c.Length));
        var c = new T[len];
        for (int k = 0; k < len; k++)
        {
            bool ha = k < a._c.Length, hb = k < b._c.Length;
            if (ha && hb) c[k] = subtract ? d.Subtract(a._c[k], b._c[k]) : d.Add(a._c[k], b._c[k]);
            else if (ha) c[k] = a._c[k];
            else c[k] = subtract ? d.Negate(b._c[k]) : b._c[k];
        }
        return Create(a.Ring, c, prec);
    }

    /// <summary>Negation.</summary>
    /// <param name="a">The series.</param>
    /// <returns>−<paramref name="a"/>, same precision.</returns>
    public static PowerSeries<T> operator -(PowerSeries<T> a)
    {
        ArgumentNullException.ThrowIfNull(a);
        var d = a.Ring.Domain;
        var c = new T[a._c.Length];
        for (int k = 0; k < c.Length; k++) c[k] = d.Negate(a._c[k]);
        return CreateUnchecked(a.Ring, c, a._precision);
    }

    /// <summary>Product; precision min(n_a + v_b, n_b + v_a) with v the valuations (the smaller precision for units).</summary>
    /// <param name="a">First factor.</param>
    /// <param name="b">Second factor.</param>
    /// <returns><paramref name="a"/>·<paramref name="b"/>.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">Different rings.</exception>
    public static PowerSeries<T> operator *(PowerSeries<T> a, PowerSeries<T> b)
    {
        Check(a, b);
        return MultiplyCore(a, b, ExactPrecision);
    }

    /// <summary>Product truncated to at most <paramref name="cap"/> (used by the algorithms to avoid computing unneeded terms).</summary>
    internal static PowerSeries<T> MultiplyCore(PowerSeries<T> a, PowerSeries<T> b, int cap)
    {
        var ring = a.Ring;
        if ((a.IsExact && a.IsZero) || (b.IsExact && b.IsZero)) return ring.Zero;
        int va = a.Valuation, vb = b.Valuation;
        int prec = Math.Min(AddPrecision(a._precision, vb), AddPrecision(b._precision, va));
        prec = Math.Min(prec, cap);
        if (a.IsZero || b.IsZero || va + (long)vb >= prec) return CreateUnchecked(ring, [], prec);
        int shift = va + vb;
        var sa = a._c.AsSpan(va);
        var sb = b._c.AsSpan(vb);
        int n = prec == ExactPrecision ? sa.Length + sb.Length - 1 : prec - shift;
        bool square = ReferenceEquals(a, b);
        var prod = ring.Domain.MultiplyTruncated(sa, sb, n, square);
        T[] c;
        if (shift == 0) c = prod;
        else
        {
            c = new T[shift + prod.Length];
            Array.Fill(c, ring.Domain.Zero, 0, shift);
            prod.CopyTo(c, shift);
        }
        return Create(ring, c, prec);
    }

    /// <summary>Quotient a/b; see <see cref="Divide(PowerSeries{T}, PowerSeries{T}, int)"/>.</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor.</param>
    /// <returns><paramref name="a"/>/<paramref name="b"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="b"/> has no known non-zero coefficient.</exception>
    /// <exception cref="ArgumentException">The quotient is not a power series (v_a &lt; v_b).</exception>
    /// <exception cref="InvalidOperationException">Both are exact and the quotient is an infinite series.</exception>
    public static PowerSeries<T> operator /(PowerSeries<T> a, PowerSeries<T> b) => Divide(a, b, ExactPrecision);

    /// <summary>Scalar sum.</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The scalar.</param>
    /// <returns><paramref name="a"/> + <paramref name="c"/>.</returns>
    public static PowerSeries<T> operator +(PowerSeries<T> a, T c) { ArgumentNullException.ThrowIfNull(a); return a + a.Ring.Constant(c); }

    /// <summary>Scalar sum.</summary>
    /// <param name="c">The scalar.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/> + <paramref name="a"/>.</returns>
    public static PowerSeries<T> operator +(T c, PowerSeries<T> a) { ArgumentNullException.ThrowIfNull(a); return a.Ring.Constant(c) + a; }

    /// <summary>Scalar difference.</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The scalar.</param>
    /// <returns><paramref name="a"/> − <paramref name="c"/>.</returns>
    public static PowerSeries<T> operator -(PowerSeries<T> a, T c) { ArgumentNullException.ThrowIfNull(a); return a - a.Ring.Constant(c); }

    /// <summary>Scalar difference.</summary>
    /// <param name="c">The scalar.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/> − <paramref name="a"/>.</returns>
    public static PowerSeries<T> operator -(T c, PowerSeries<T> a) { ArgumentNullException.ThrowIfNull(a); return a.Ring.Constant(c) - a; }

    /// <summary>Integer sum.</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The integer.</param>
    /// <returns><paramref name="a"/> + <paramref name="c"/>.</returns>
    public static PowerSeries<T> operator +(PowerSeries<T> a, long c) { ArgumentNullException.ThrowIfNull(a); return a + a.Ring.Domain.FromInteger(c); }

    /// <summary>Integer sum.</summary>
    /// <param name="c">The integer.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/> + <paramref name="a"/>.</returns>
    public static PowerSeries<T> operator +(long c, PowerSeries<T> a) { ArgumentNullException.ThrowIfNull(a); return a + a.Ring.Domain.FromInteger(c); }

    /// <summary>Integer difference.</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The integer.</param>
    /// <returns><paramref name="a"/> − <paramref name="c"/>.</returns>
    public static PowerSeries<T> operator -(PowerSeries<T> a, long c) { ArgumentNullException.ThrowIfNull(a); return a - a.Ring.Domain.FromInteger(c); }

    /// <summary>Integer difference.</summary>
    /// <param name="c">The integer.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/> − <paramref name="a"/>.</returns>
    public static PowerSeries<T> operator -(long c, PowerSeries<T> a) { ArgumentNullException.ThrowIfNull(a); return a.Ring.Domain.FromInteger(c) - a; }

    /// <summary>Scalar multiple (0·a is the exact zero).</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The scalar.</param>
    /// <returns><paramref name="c"/>·<paramref name="a"/>, same precision.</returns>
    public static PowerSeries<T> operator *(PowerSeries<T> a, T c) => Scale(a, c);

    /// <summary>Scalar multiple.</summary>
    /// <param name="c">The scalar.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/>·<paramref name="a"/>.</returns>
    public static PowerSeries<T> operator *(T c, PowerSeries<T> a) => Scale(a, c);

    /// <summary>Integer multiple.</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The integer.</param>
    /// <returns><paramref name="c"/>·<paramref name="a"/>.</returns>
    public static PowerSeries<T> operator *(PowerSeries<T> a, long c) { ArgumentNullException.ThrowIfNull(a); return Scale(a, a.Ring.Domain.FromInteger(c)); }

    /// <summary>Integer multiple.</summary>
    /// <param name="c">The integer.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/>·<paramref name="a"/>.</returns>
    public static PowerSeries<T> operator *(long c, PowerSeries<T> a) { ArgumentNullException.ThrowIfNull(a); return Scale(a, a.Ring.Domain.FromInteger(c)); }

    /// <summary>Division by a non-zero scalar.</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The scalar.</param>
    /// <returns><paramref name="a"/>/<paramref name="c"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="c"/> is zero.</exception>
    public static PowerSeries<T> operator /(PowerSeries<T> a, T c) { ArgumentNullException.ThrowIfNull(a); a.Ring.Domain.Validate(c, nameof(c)); return Scale(a, a.Ring.Domain.Inverse(c)); }

    /// <summary>Division by a scalar c: the scalar times the inverse of the series.</summary>
    /// <param name="c">The scalar.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/>/<paramref name="a"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="a"/> has no known non-zero coefficient.</exception>
    public static PowerSeries<T> operator /(T c, PowerSeries<T> a) { ArgumentNullException.ThrowIfNull(a); return a.Ring.Constant(c) / a; }

    /// <summary>Division by a non-zero integer.</summary>
    /// <param name="a">The series.</param>
    /// <param name="c">The integer.</param>
    /// <returns><paramref name="a"/>/<paramref name="c"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="c"/> is zero in the coefficient field.</exception>
    public static PowerSeries<T> operator /(PowerSeries<T> a, long c) { ArgumentNullException.ThrowIfNull(a); return Scale(a, a.Ring.Domain.Inverse(a.Ring.Domain.FromInteger(c))); }

    /// <summary>Division of an integer by a series.</summary>
    /// <param name="c">The integer.</param>
    /// <param name="a">The series.</param>
    /// <returns><paramref name="c"/>/<paramref name="a"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="a"/> has no known non-zero coefficient.</exception>
    public static PowerSeries<T> operator /(long c, PowerSeries<T> a) { ArgumentNullException.ThrowIfNull(a); return a.Ring.Constant(a.Ring.Domain.FromInteger(c)) / a; }

    private static PowerSeries<T> Scale(PowerSeries<T> a, T c)
    {
        ArgumentNullException.ThrowIfNull(a);
        var d = a.Ring.Domain;
        d.Validate(c, nameof(c));
        if (d.IsZero(c)) return a.Ring.Zero;
        if (d.IsOne(c)) return a;
        var r = new T[a._c.Length];
        for (int k = 0; k < r.Length; k++) r[k] = d.Multiply(a._c[k], c);
        return CreateUnchecked(a.Ring, r, a._precision);
    }

    /// <summary>Named form of <c>a + b</c>.</summary>
    /// <param name="a">First summand.</param>
    /// <param name="b">Second summand.</param>
    /// <returns>The sum.</returns>
    public static PowerSeries<T> Add(PowerSeries<T> a, PowerSeries<T> b) => a + b;

    /// <summary>Named form of <c>a - b</c>.</summary>
    /// <param name="a">Minuend.</param>
    /// <param name="b">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static PowerSeries<T> Subtract(PowerSeries<T> a, PowerSeries<T> b) => a - b;

    /// <summary>Named form of <c>a * b</c>.</summary>
    /// <param name="a">First factor.</param>
    /// <param name="b">Second factor.</param>
    /// <returns>The product.</returns>
    public static PowerSeries<T> Multiply(PowerSeries<T> a, PowerSeries<T> b) => a * b;

    /// <summary>Named form of unary minus.</summary>
    /// <param name="a">The series.</param>
    /// <returns>−<paramref name="a"/>.</returns>
    public static PowerSeries<T> Negate(PowerSeries<T> a) => -a;

    /// <summary>Quotient a/b of power series, computed to at most <paramref name="precision"/>.</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor with valuation v_b ≤ v_a.</param>
    /// <param name="precision">Upper bound on the result's precision; needed (finite) when both operands are exact and
    /// <paramref name="b"/> is not a monomial.</param>
    /// <returns>The quotient, with precision min(n_a − v_b, n_b − 2v_b + v_a, <paramref name="precision"/>).</returns>
    /// <exception cref="DivideByZeroException"><paramref name="b"/> has no known non-zero coefficient.</exception>
    /// <exception cref="ArgumentException">v_a &lt; v_b: the quotient has a pole (use <see cref="LaurentSeries"/>).</exception>
    /// <exception cref="InvalidOperationException">Exact operands, non-monomial divisor and no finite precision.</exception>
    public static PowerSeries<T> Divide(PowerSeries<T> a, PowerSeries<T> b, int precision)
    {
        Check(a, b);
        ArgumentOutOfRangeException.ThrowIfNegative(precision);
        if (b.IsZero) throw new DivideByZeroException($"division by {b}, which has no known non-zero coefficient");
        int vb = b.Valuation;
        if (a.IsExact && a.IsZero) return a.Ring.Zero;
        int va = a.Valuation;
        if (va < vb)
            throw new ArgumentException($"the quotient has a pole: the dividend has valuation {va} < {vb}, the divisor's (use LaurentSeries for negative powers)", nameof(b));
        var ua = a.MultiplyByPowerOfX(-vb);
        var ub = b.MultiplyByPowerOfX(-vb);
        int prec = Math.Min(ua._precision, AddPrecision(ub._precision, va - vb));
        prec = Math.Min(prec, precision);
        if (ub._c.Length == 1 && ub.IsExact)
            return Create(a.Ring, ScaleArray(ua, a.Ring.Domain.Inverse(ub._c[0])), prec);
        if (prec == ExactPrecision)
            throw new InvalidOperationException($"({a}) / ({b}) is an infinite series of exact polynomials: give a precision (Divide(a, b, precision)) or add O(x^n) to an operand");
        if (prec <= va - vb) return CreateUnchecked(a.Ring, [], prec);
        var inv = ub.InverseCore(prec - (va - vb));
        return MultiplyCore(ua, inv, prec);
    }

    private static T[] ScaleArray(PowerSeries<T> a, T c)
    {
        var d = a.Ring.Domain;
        var r = new T[a._c.Length];
        for (int k = 0; k < r.Length; k++) r[k] = d.Multiply(a._c[k], c);
        return r;
    }

    /// <summary>Multiplication by x^k; a negative k divides by x^−k, which needs valuation ≥ −k.</summary>
    /// <param name="k">The exponent.</param>
    /// <returns>x^k·this, with precision shifted by k.</returns>
    /// <exception cref="ArgumentException">k &lt; 0 and the series is not divisible by x^−k.</exception>
    public PowerSeries<T> MultiplyByPowerOfX(int k)
    {
        if (k == 0) return this;
        var d = Ring.Domain;
        if (k > 0)
        {
            if (_c.Length == 0) return CreateUnchecked(Ring, [], AddPrecision(_precision, k));
            var c = new T[_c.Length + k];
            Array.Fill(c, d.Zero, 0, k);
            _c.CopyTo(c, k);
            return CreateUnchecked(Ring, c, AddPrecision(_precision, k));
        }
        int s = -k;
        if (Valuation < s)
            throw new ArgumentException($"{this} is not divisible by {Ring.Variable}^{s}", nameof(k));
        int prec = IsExact ? ExactPrecision : _precision - s;
        if (_c.Length <= s) return CreateUnchecked(Ring, [], prec);
        return CreateUnchecked(Ring, _c.AsSpan(s).ToArray(), prec);
    }

    /// <summary>The series truncated to precision min(<see cref="Precision"/>, <paramref name="precision"/>).</summary>
    /// <param name="precision">The new precision, non-negative.</param>
    /// <returns>The truncated series.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="precision"/> is negative.</exception>
    public PowerSeries<T> Truncate(int precision)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(precision);
        if (precision >= _precision) return this;
        return Create(Ring, _c.Length > precision ? _c[..precision] : _c, precision);
    }

    /// <summary>The same coefficients with the precision raised or lowered to <paramref name="precision"/>, treating the
    /// unknown coefficients as zero (used to feed an approximation into an iteration as if it were exact there).</summary>
    internal PowerSeries<T> WithPrecision(int precision) =>
        Create(Ring, _c.Length > precision ? _c[..precision] : _c, precision);
}
