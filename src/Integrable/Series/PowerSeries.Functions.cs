namespace Integrable.Series;

public sealed partial class PowerSeries<T>
{
    /// <summary>The multiplicative inverse of a series with non-zero constant term (Newton iteration), same precision.</summary>
    /// <returns>1/this.</returns>
    /// <exception cref="DivideByZeroException">No known non-zero coefficient.</exception>
    /// <exception cref="ArgumentException">The constant term is zero (the inverse has a pole; use <see cref="LaurentSeries"/>).</exception>
    /// <exception cref="InvalidOperationException">An exact non-constant polynomial (use <see cref="Inverse(int)"/>).</exception>
    public PowerSeries<T> Inverse() => Inverse(ExactPrecision);

    /// <summary>The multiplicative inverse computed to precision min(<see cref="Precision"/>, <paramref name="precision"/>).</summary>
    /// <param name="precision">Upper bound on the precision of the result.</param>
    /// <returns>1/this.</returns>
    /// <exception cref="DivideByZeroException">No known non-zero coefficient.</exception>
    /// <exception cref="ArgumentException">The constant term is zero.</exception>
    /// <exception cref="InvalidOperationException">Exact non-constant polynomial and no finite precision.</exception>
    public PowerSeries<T> Inverse(int precision) => Divide(Ring.One, this, precision);

    /// <summary>Inverse of a unit modulo x^n (n ≤ precision, n finite) by Newton iteration g ← g + g(1 − b·g).</summary>
    internal PowerSeries<T> InverseCore(int n)
    {
        var d = Ring.Domain;
        if (n <= 0) return CreateUnchecked(Ring, [], 0);
        var g = new T[] { d.Inverse(_c[0]) };
        int m = 1;
        while (m < n)
        {
            int m2 = Math.Min(2 * m, n);
            var bg = d.MultiplyTruncated(_c.AsSpan(0, Math.Min(_c.Length, m2)), g, m2, false);
            var next = new T[m2];
            g.CopyTo(next, 0);
            for (int k = m; k < m2; k++) next[k] = d.Zero;
            if (bg.Length > m)
            {
                var gh = d.MultiplyTruncated(g, bg.AsSpan(m), m2 - m, false);
                for (int k = 0; k < gh.Length; k++) next[m + k] = d.Negate(gh[k]);
            }
            g = next;
            m = m2;
        }
        return Create(Ring, g, n);
    }

    /// <summary>Integer power (binary powering); negative exponents invert first.</summary>
    /// <param name="exponent">The exponent.</param>
    /// <returns>this^<paramref name="exponent"/>; the precision follows the product rule (n + (k−1)v for k ≥ 1); this^0 is the exact 1.</returns>
    /// <exception cref="ArgumentException">A negative exponent and a zero constant term.</exception>
    public PowerSeries<T> Pow(int exponent)
    {
        if (exponent < 0) return Inverse().Pow(checked(-exponent));
        var result = Ring.One;
        var b = this;
        int e = exponent;
        while (e > 0)
        {
            if ((e & 1) != 0) result = result.IsOne ? b : result * b;
            e >>= 1;
            if (e > 0) b = b * b;
        }
        return result;
    }

    /// <summary>The square root with constant term √c₀ (or the square root of the leading term for even valuation), by Newton iteration on the inverse root.</summary>
    /// <returns>A series s with s² = this; precision n − v/2.</returns>
    /// <exception cref="ArgumentException">Odd valuation, or a leading coefficient that is not a square in the field.</exception>
    /// <exception cref="ArithmeticException">Characteristic 2.</exception>
    /// <exception cref="InvalidOperationException">An exact polynomial that is not a monomial (use <see cref="Sqrt(int)"/>).</exception>
    public PowerSeries<T> Sqrt() => Sqrt(ExactPrecision);

    /// <summary>The square root computed to precision at most <paramref name="precision"/>; see <see cref="Sqrt()"/>.</summary>
    /// <param name="precision">Upper bound on the precision of the result.</param>
    /// <returns>The square root.</returns>
    /// <exception cref="ArgumentException">Odd valuation, or a leading coefficient that is not a square.</exception>
    /// <exception cref="ArithmeticException">Characteristic 2.</exception>
    /// <exception cref="InvalidOperationException">Exact non-monomial input and no finite precision.</exception>
    public PowerSeries<T> Sqrt(int precision)
    {
        var d = Ring.Domain;
        if (IsZero) return IsExact ? this : CreateUnchecked(Ring, [], Math.Min(precision, (_precision + 1) / 2));
        int v = Valuation;
        if ((v & 1) != 0) throw new ArgumentException($"{this} has odd valuation {v} and no power-series square root");
        if (d.Characteristic == 2) throw new ArithmeticException("square roots of series need characteristic ≠ 2 (Newton's step divides by 2)");
        var u = MultiplyByPowerOfX(-v);
        if (!d.TrySqrt(u._c[0], out var s0))
            throw new ArgumentException($"the leading coefficient {d.Format(u._c[0])} of {this} is not a square in {d.Name}");
        int half = v / 2;
        if (u.IsExact && u._c.Length == 1) return Ring.Monomial(s0, half).Truncate(precision);
        int rel = u._precision == ExactPrecision ? ExactPrecision : u._precision;
        if (precision != ExactPrecision) rel = Math.Min(rel, Math.Max(0, precision - half));
        if (rel == ExactPrecision)
            throw new InvalidOperationException($"the square root of the exact polynomial {this} is an infinite series: give a precision (Sqrt(precision)) or add O(x^n)");
        var h = new T[] { d.Inverse(s0) };          // h ≈ u^(−1/2)
        int m = 1;
        var uc = u._c;
        while (m < rel)
        {
            int m2 = Math.Min(2 * m, rel);
            var h2 = d.MultiplyTruncated(h, h, m2, true);
            var uh2 = d.MultiplyTruncated(uc.AsSpan(0, Math.Min(uc.Length, m2)), h2, m2, false);
            var next = new T[m2];
            h.CopyTo(next, 0);
            for (int k = m; k < m2; k++) next[k] = d.Zero;
            if (uh2.Length > m)
            {
                var hr = d.MultiplyTruncated(h, uh2.AsSpan(m), m2 - m, false);
                for (int k = 0; k < hr.Length; k++) next[m + k] = d.Negate(d.DivideByInteger(hr[k], 2));
            }
            h = next;
            m = m2;
        }
        var root = d.MultiplyTruncated(uc.AsSpan(0, Math.Min(uc.Length, rel)), h, rel, false);
        return Create(Ring, root, rel).MultiplyByPowerOfX(half);
    }

    /// <summary>The formal derivative d/dx; precision n − 1.</summary>
    /// <returns>The derivative.</returns>
    public PowerSeries<T> Derivative()
    {
        var d = Ring.Domain;
        int prec = IsExact ? ExactPrecision : Math.Max(0, _precision - 1);
        if (_c.Length <= 1) return CreateUnchecked(Ring, [], prec);
        var c = new T[_c.Length - 1];
        for (int k = 1; k < _c.Length; k++) c[k - 1] = d.Multiply(_c[k], d.FromInteger(k));
        return Create(Ring, c, prec);
    }

    /// <summary>The formal integral with zero constant term; precision n + 1.</summary>
    /// <returns>∫₀ this.</returns>
    /// <exception cref="ArithmeticException">In characteristic p, a non-zero coefficient c_k with p | k + 1.</exception>
    public PowerSeries<T> Integral()
    {
        var d = Ring.Domain;
        int prec = AddPrecision(_precision, 1);
        if (_c.Length == 0) return CreateUnchecked(Ring, [], prec);
        var c = new T[_c.Length + 1];
        c[0] = d.Zero;
        for (int k = 0; k < _c.Length; k++) c[k + 1] = d.IsZero(_c[k]) ? d.Zero : d.DivideByInteger(_c[k], k + 1);
        // In characteristic p the coefficient of x^p would need 1/p even when c_{p−1} = 0; it is then
        // undetermined, so the precision stops there.
        ulong ch = d.Characteristic;
        if (ch != 0 && (ulong)prec > ch) prec = (int)ch;
        return Create(Ring, c, prec);
    }

    /// <summary>The logarithm of a series with constant term 1, log f = ∫ f′/f; same precision.</summary>
    /// <returns>log(this).</returns>
    /// <exception cref="ArgumentException">The constant term is not 1.</exception>
    /// <exception cref="InvalidOperationException">An exact polynomial other than 1 (use <see cref="Log(int)"/>).</exception>
    /// <exception cref="ArithmeticException">Characteristic p not above the precision.</exception>
    public PowerSeries<T> Log() => Log(ExactPrecision);

    /// <summary>The logarithm computed to precision at most <paramref name="precision"/>; see <see cref="Log()"/>.</summary>
    /// <param name="precision">Upper bound on the precision.</param>
    /// <returns>log(this).</returns>
    /// <exception cref="ArgumentException">The constant term is not 1.</exception>
    /// <exception cref="InvalidOperationException">Exact input other than 1 and no finite precision.</exception>
    /// <exception cref="ArithmeticException">Characteristic p not above the precision.</exception>
    public PowerSeries<T> Log(int precision)
    {
        var d = Ring.Domain;
        if (_precision == 0 || !d.IsOne(Get(0))) throw new ArgumentException($"the logarithm needs constant term 1; {this} has {(_precision == 0 ? "an unknown one" : d.Format(Get(0)))}");
        if (IsOne) return Ring.Zero;
        int n = Math.Min(_precision, precision);
        if (n == ExactPrecision)
            throw new InvalidOperationException($"the logarithm of the exact polynomial {this} is an infinite series: give a precision (Log(precision)) or add O(x^n)");
        CheckCharacteristic(n, "logarithm");
        var f = Truncate(n);
        return Divide(f.Derivative(), f, n - 1).Integral().Truncate(n);
    }

    /// <summary>The exponential of a series with zero constant term (Newton iteration E ← E(1 + f − log E)); same precision.</summary>
    /// <returns>exp(this).</returns>
    /// <exception cref="ArgumentException">The constant term is not known to be zero.</exception>
    /// <exception cref="InvalidOperationException">An exact non-zero polynomial (use <see cref="Exp(int)"/>).</exception>
    /// <exception cref="ArithmeticException">Characteristic p not above the precision.</exception>
    public PowerSeries<T> Exp() => Exp(ExactPrecision);

    /// <summary>The exponential computed to precision at most <paramref name="precision"/>; see <see cref="Exp()"/>.</summary>
    /// <param name="precision">Upper bound on the precision.</param>
    /// <returns>exp(this).</returns>
    /// <exception cref="ArgumentException">The constant term is not known to be zero.</exception>
    /// <exception cref="InvalidOperationException">Exact non-zero input and no finite precision.</exception>
    /// <exception cref="ArithmeticException">Characteristic p not above the precision.</exception>
    public PowerSeries<T> Exp(int precision)
    {
        var d = Ring.Domain;
        if (_precision == 0 || !d.IsZero(Get(0))) throw new ArgumentException($"the exponential needs constant term 0; {this} has {(_precision == 0 ? "an unknown one" : d.Format(Get(0)))}");
        int n = Math.Min(_precision, precision);
        if (IsExact && IsZero) return Ring.One;
        if (n == ExactPrecision)
            throw new InvalidOperationException($"the exponential of the exact polynomial {this} is an infinite series: give a precision (Exp(precision)) or add O(x^n)");
        CheckCharacteristic(n, "exponential");
        var e = Ring.One.WithPrecision(1);
        int m = 1;
        while (m < n)
        {
            int m2 = Math.Min(2 * m, n);
            var em = e.WithPrecision(m2);
            var delta = Truncate(m2) - em.Log();      // valuation ≥ m
            e = em + MultiplyCore(em, delta, m2);
            m = m2;
        }
        return e.Truncate(n);
    }

    /// <summary>Degree of the outer series from which composition uses baby steps / giant steps (settable from tests).</summary>
    internal static int ComposeBabyStepThreshold = 8;

    private void CheckCharacteristic(int n, string what)
    {
        ulong ch = Ring.Domain.Characteristic;
        if (ch != 0 && (ulong)n > ch)
            throw new ArithmeticException($"the {what} to precision {n} divides by integers up to {n - 1}, which meets the characteristic {ch}");
    }

    /// <summary>The composition this(g) with a series g of zero constant term (Horner's rule for small degrees,
    /// Brent–Kung baby steps / giant steps with about 2√n truncated products otherwise).</summary>
    /// <param name="inner">The inner series g, with known constant term 0.</param>
    /// <returns>f(g), with precision min(n_f·v_g, n_g + (w−1)·v_g) where w is the least k ≥ 1 with f_k ≠ 0.</returns>
    /// <exception cref="ArgumentException">The constant term of <paramref name="inner"/> is not known to be zero.</exception>
    /// <exception cref="Algebra.IncompatibleRingException">Different rings.</exception>
    public PowerSeries<T> Compose(PowerSeries<T> inner)
    {
        Check(this, inner);
        var d = Ring.Domain;
        if (inner._precision == 0 || !d.IsZero(inner.Get(0)))
            throw new ArgumentException($"composition needs an inner series with constant term 0; got {inner}", nameof(inner));
        int vg = inner.Valuation;
        if (inner.IsExact && inner.IsZero)
            return _precision == 0 ? this : Create(Ring, [Get(0)], ExactPrecision);
        int w = _precision;
        for (int k = 1; k < _c.Length; k++) if (!d.IsZero(_c[k])) { w = k; break; }
        long cap1 = _precision == ExactPrecision ? ExactPrecision : (long)_precision * vg;
        long cap2 = w == ExactPrecision ? ExactPrecision : (inner._precision == ExactPrecision ? ExactPrecision : inner._precision + (long)(w - 1) * vg);
        int prec = (int)Math.Min(ExactPrecision, Math.Min(cap1, cap2));
        if (IsExact && _c.Length <= 1) return this;
        int deg = _c.Length - 1;
        if (prec != ExactPrecision) deg = Math.Min(deg, (prec - 1) / vg);
        var g = prec == ExactPrecision ? inner : inner.Truncate(prec);
        PowerSeries<T> r;
        if (deg < ComposeBabyStepThreshold)
        {
            r = Ring.Constant(Get(deg));
            for (int k = deg - 1; k >= 0; k--)
                r = MultiplyCore(r, g, prec) + Ring.Constant(_c[k]);
        }
        else
        {
            // Brent–Kung baby steps / giant steps: g^0 … g^s with s = ⌈√(deg+1)⌉, each block of s
            // coefficients of f evaluated as a linear combination of those powers, blocks combined by
            // Horner's rule in g^s: about 2√deg products instead of deg.
            int step = (int)Math.Ceiling(Math.Sqrt(deg + 1));
            var powers = new PowerSeries<T>[step + 1];
            powers[0] = Ring.One;
            for (int i = 1; i <= step; i++) powers[i] = MultiplyCore(powers[i - 1], g, prec);
            int blocks = deg / step;
            r = Block(blocks);
            for (int j = blocks - 1; j >= 0; j--)
                r = MultiplyCore(r, powers[step], prec) + Block(j);

            PowerSeries<T> Block(int j)
            {
                var acc = Ring.Zero;
                for (int i = 0; i < step; i++)
                {
                    int idx = j * step + i;
                    if (idx > deg) break;
                    var c = _c[idx];
                    if (!d.IsZero(c)) acc += i == 0 ? Ring.Constant(c) : powers[i] * c;
                }
                return acc;
            }
        }
        return r.Truncate(prec);
    }
}
