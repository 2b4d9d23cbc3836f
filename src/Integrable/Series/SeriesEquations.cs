namespace Integrable.Series;

/// <summary>Solving fixed-point equations y = F(x, y) for a power series y, by Newton iteration
/// (quadratic convergence) or by plain fixed-point iteration (linear, x-adic contraction).</summary>
/// <remarks>
/// <para>F is a delegate over series of one ring: it receives y (with x available as
/// <see cref="PowerSeriesRing{T}.X"/>) and returns F(x, y). It must be built from the analytic series
/// operations applied to y itself (+, −, ·, /, powers, square roots, exp/log, composition of fixed
/// series with y) so that F(y + δ) = F(y) + ∂F/∂y(y)·δ + O(δ²) with ∂F/∂y a series: Newton's method does
/// not apply to equations in which y is differentiated or integrated or y(g) is formed (y = 1 + ∫y; use
/// <see cref="Iterate{T}"/> for those, which only needs each step to gain a coefficient), and it must not lose precision: an argument known to O(x^n) must
/// give a value known to at least O(x^n).</para>
/// <para><b>Newton.</b> From an approximation correct to O(x^m), one step gives O(x^{2m}):
/// y ← y − (y − F(y))·u where u = (1 − ∂F/∂y(y))⁻¹ mod x^m is carried from step to step and refined by one
/// Newton step of its own, so a step costs one evaluation of F at precision 2m, one evaluation of
/// ∂F/∂y at precision m and three products of length m. The derivative may be supplied; otherwise it is
/// computed by a dual-number trick with ε = x^m: F(y + x^m) − F(y) = ∂F/∂y(y)·x^m + O(x^{2m}), so its
/// coefficients m … 2m−1 are those of ∂F/∂y mod x^m (one extra evaluation of F per step, exact, no
/// symbolic differentiation). Newton needs 1 − ∂F/∂y(0, y(0)) ≠ 0 in the field. The returned solution is
/// verified: y − F(y) = O(x^order) is checked exactly with one more evaluation of F.</para>
/// </remarks>
/// <example><code>
/// var r = PowerSeriesRing.Rationals;
/// var x = r.X;
/// var c = SeriesEquations.SolveNewton(r, y => 1 + x * y * y, 30);    // Catalan generating function
/// </code></example>
public static class SeriesEquations
{
    /// <summary>Solves y = F(x, y) to O(x^<paramref name="order"/>) by Newton iteration.</summary>
    /// <typeparam name="T">The coefficient type.</typeparam>
    /// <param name="ring">The series ring.</param>
    /// <param name="f">The map y ↦ F(x, y).</param>
    /// <param name="order">The precision wanted, non-negative.</param>
    /// <param name="derivative">Optional y ↦ ∂F/∂y(x, y), called with y truncated to the precision the step needs (about half
    /// the current order) and expected to return at least that precision; when null it is computed by the dual-number trick (see remarks).</param>
    /// <param name="initial">Optional approximation whose correct leading terms start the iteration; when null,
    /// y(0) is taken from F(x, O(1)), which works when F(0, y) does not depend on y.</param>
    /// <returns>The verified solution, with precision <paramref name="order"/>.</returns>
    /// <exception cref="ArgumentException">No usable start (y(0) undetermined or wrong), 1 − ∂F/∂y(0, y(0)) = 0, or F loses precision.</exception>
    /// <exception cref="InvalidOperationException">The iteration or the final check failed (F is not analytic in y, or the supplied derivative is wrong).</exception>
    public static PowerSeries<T> SolveNewton<T>(PowerSeriesRing<T> ring, Func<PowerSeries<T>, PowerSeries<T>> f, int order,
        Func<PowerSeries<T>, PowerSeries<T>>? derivative = null, PowerSeries<T>? initial = null)
    {
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(f);
        ArgumentOutOfRangeException.ThrowIfNegative(order);
        if (order == 0) return ring.O(0);
        var d = ring.Domain;
        var y = Start(ring, f, order, initial, out int m);
        PowerSeries<T>? u = null;
        int uPrec = 0;
        while (m < order)
        {
            int m2 = (int)Math.Min(2L * m, order), t = m2 - m;
            var yy = y.WithPrecision(m2);
            var fy = Evaluate(f, yy, m2);
            var res = (yy - fy).Truncate(m2);
            if (res.Valuation < m)
                throw new InvalidOperationException($"Newton iteration lost track at precision {m}: y − F(y) has valuation {res.Valuation} < {m}; F may not be analytic in y, or the supplied derivative is wrong");
            PowerSeries<T> dfy;
            if (derivative is not null)
            {
                dfy = derivative(y.WithPrecision(t));
                if (dfy.Precision < t) throw new ArgumentException($"the derivative returned O(x^{dfy.Precision}) for an argument known to O(x^{t})", nameof(derivative));
                dfy = dfy.Truncate(t);
            }
            else
            {
                var shifted = Evaluate(f, yy + ring.Monomial(d.One, m), m2);
                dfy = (shifted - fy).Truncate(m2).MultiplyByPowerOfX(-m);
            }
            var g = (ring.One - dfy).Truncate(t);
            if (d.IsZero(g.Get(0)))
                throw new ArgumentException("1 − ∂F/∂y vanishes at x = 0: Newton's method does not apply (the solution may be non-unique); try SeriesEquations.Iterate or another formulation", nameof(f));
            if (u is null) { u = g.Inverse(); uPrec = t; }
            while (uPrec < t)
            {
                int p2 = Math.Min(2 * uPrec, t);
                var up = u.WithPrecision(p2);
                var e = (ring.One - PowerSeries<T>.MultiplyCore(g.Truncate(p2), up, p2)).Truncate(p2);
                u = (up + PowerSeries<T>.MultiplyCore(up, e, p2)).Truncate(p2);
                uPrec = p2;
            }
            var delta = PowerSeries<T>.MultiplyCore(res.MultiplyByPowerOfX(-m), u.Truncate(t), t);
            y = (yy - delta.MultiplyByPowerOfX(m)).Truncate(m2);
            m = m2;
        }
        y = y.WithPrecision(order);
        var check = (y - Evaluate(f, y, order)).Truncate(order);
        if (!check.IsZero)
            throw new InvalidOperationException($"verification failed: y − F(y) = {check}; F may not be analytic in y, or the supplied derivative is wrong");
        return y;
    }

    /// <summary>Plain fixed-point iteration y ← F(x, y) at precision <paramref name="order"/>, reporting whether it
    /// converged x-adically (every step fixes at least one more coefficient) and, if not, why.</summary>
    /// <typeparam name="T">The coefficient type.</typeparam>
    /// <param name="ring">The series ring.</param>
    /// <param name="f">The map y ↦ F(x, y).</param>
    /// <param name="order">The precision wanted, non-negative.</param>
    /// <param name="initial">Starting value (default: zero).</param>
    /// <param name="maxSteps">Step limit (default: <paramref name="order"/> + 2, enough for any x-adic contraction).</param>
    /// <returns>The report; its solution is a fixed point modulo x^order when <see cref="FixedPointIteration{T}.Converged"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="order"/> or <paramref name="maxSteps"/> is negative.</exception>
    public static FixedPointIteration<T> Iterate<T>(PowerSeriesRing<T> ring, Func<PowerSeries<T>, PowerSeries<T>> f, int order,
        PowerSeries<T>? initial = null, int? maxSteps = null)
    {
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(f);
        ArgumentOutOfRangeException.ThrowIfNegative(order);
        int limit = maxSteps ?? order + 2;
        ArgumentOutOfRangeException.ThrowIfNegative(limit);
        var y = (initial ?? ring.Zero).WithPrecision(order);
        var gains = new List<int>();
        int previous = -1;
        for (int step = 1; step <= limit; step++)
        {
            var next = f(y);
            if (next.Precision < order)
                return new FixedPointIteration<T>(false, y, step, gains,
                    $"step {step}: F returned O(x^{next.Precision}) for an argument known to O(x^{order}); F loses precision");
            next = next.Truncate(order);
            var diff = (next - y).Truncate(order);
            if (diff.IsZero)
                return new FixedPointIteration<T>(true, next, step, gains, $"fixed point modulo x^{order} after {step} steps");
            int v = diff.Valuation;
            gains.Add(v);
            if (v <= previous)
                return new FixedPointIteration<T>(false, next, step, gains,
                    $"step {step}: the change has valuation {v}, not above the previous change's {previous}; F is not an x-adic contraction here (typically ∂F/∂y(0, y(0)) ≠ 0), use Newton's method");
            previous = v;
            y = next;
        }
        return new FixedPointIteration<T>(false, y, limit, gains, $"no fixed point modulo x^{order} within {limit} steps");
    }

    private static PowerSeries<T> Evaluate<T>(Func<PowerSeries<T>, PowerSeries<T>> f, PowerSeries<T> y, int precision)
    {
        var r = f(y) ?? throw new ArgumentException("F returned null", nameof(f));
        if (!r.Ring.Equals(y.Ring)) throw new Algebra.IncompatibleRingException($"F returned a series of {r.Ring}, expected {y.Ring}");
        if (r.Precision < precision)
            throw new ArgumentException($"F returned O(x^{r.Precision}) for an argument known to O(x^{precision}); F must not lose precision", nameof(f));
        return r.Truncate(precision);
    }

    private static PowerSeries<T> Start<T>(PowerSeriesRing<T> ring, Func<PowerSeries<T>, PowerSeries<T>> f, int order, PowerSeries<T>? initial, out int correct)
    {
        PowerSeries<T> y;
        if (initial is null)
        {
            var z = f(ring.O(0));
            if (z.Precision < 1)
                throw new ArgumentException("F(0, y) depends on y(0), so y(0) is not determined by F alone: supply an initial approximation", nameof(initial));
            y = z.Truncate(1);
        }
        else
        {
            if (!initial.Ring.Equals(ring)) throw new Algebra.IncompatibleRingException($"initial value in {initial.Ring}, expected {ring}");
            y = initial;
        }
        int m = Math.Min(y.Precision, order);
        if (m == 0) throw new ArgumentException("the initial approximation has no known constant term", nameof(initial));
        var ym = y.WithPrecision(m);
        var fy = f(ym);
        var res = (ym - fy).Truncate(Math.Min(m, fy.Precision));
        correct = Math.Min(m, res.Valuation);
        if (correct == 0)
            throw new ArgumentException($"the initial approximation does not satisfy y(0) = F(0, y(0)): y − F(y) = {res}", nameof(initial));
        return ym.Truncate(correct);
    }
}
