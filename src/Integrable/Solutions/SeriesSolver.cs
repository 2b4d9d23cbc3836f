using System.Diagnostics;
using Integrable.Analyses;
using Integrable.Numbers;
using Integrable.RationalFunctions;
using Integrable.Recursions;
using Integrable.Series;
using Integrable.Univariate;

namespace Integrable.Solutions;

/// <summary>Solutions of a recursion with a weight parameter g as power series in g over Q, for initial-value and
/// boundary-value problems.</summary>
/// <remarks>
/// <para><b>Initial values.</b> The recursion is iterated in the ring of series truncated after g^N; every equation
/// on the computed range is then checked exactly (left − right = O(g^{N+1})).</para>
/// <para><b>Boundary values.</b> For a recursion of order k with shifts x_j … x_{j+k}, k − 1 values x_b … x_{b+k−2}
/// are given and x_n → x_∞ as n → ∞, where x_∞ is the fixed point of the autonomous equation (a constant
/// solution), found first as a series by Newton's method (<see cref="SeriesEquations.SolveNewton{T}"/>). In such
/// problems x_n − x_∞ = O(g^{n+c}) typically, so modulo g^{N+1} only a window of about N indices differs from x_∞.
/// The solver solves the window system (M equations, M unknowns x_{b+k−1} … x_{b+k+M−2}, later terms set to x_∞) by
/// Newton's method in g: each step doubles the g-adic precision; the Jacobian is banded (lower bandwidth k − 1,
/// upper 1), computed by perturbing every (k+1)-th unknown by g^m at once (the dual-number trick of the series module)
/// and inverted by banded elimination whose pivots must be units (non-zero at g = 0). A step that does not gain
/// precision, or a pivot vanishing at g = 0, stops the solver with a <see cref="SeriesConvergenceException"/> saying
/// why. The result is verified exactly: every window equation has residual O(g^{N+1}), and the last k − 1 window
/// terms agree with x_∞ to O(g^{N+1}), so the infinite sequence (window, then x_∞ forever) satisfies every equation
/// modulo g^{N+1}; when that tail check fails the window is doubled.</para>
/// </remarks>
/// <example><code>
/// // our own scenario: a chain of weighted links, each site pulling on its two neighbours
/// var rec = Recurrence.Parse("W_n = 1 + t W_n (W_{n-1} + W_{n+1})");
/// var sol = SeriesSolver.SolveBoundaryValue(rec, "t", 0, [0], new SeriesOptions { Order = 12 });
/// Console.WriteLine(sol.ToText());
/// </code></example>
public static class SeriesSolver
{
    /// <summary>Solves an initial-value problem as power series in <paramref name="parameter"/>.</summary>
    /// <param name="recurrence">The recursion, of order k.</param>
    /// <param name="parameter">The weight variable, one of the recursion's parameters.</param>
    /// <param name="initial">The k initial values x_start … x_{start+k−1} (constants).</param>
    /// <param name="start">The index of the first initial value.</param>
    /// <param name="options">Order, count, other parameter values.</param>
    /// <param name="cancellation">Cancels between steps.</param>
    /// <param name="progress">Receives one report per computed term.</param>
    /// <returns>The verified solution, from the first computed index.</returns>
    /// <exception cref="ArgumentException">Bad parameter name, missing parameter values or wrong number of initial values.</exception>
    /// <exception cref="SeriesConvergenceException">A step divides by a series vanishing at g = 0.</exception>
    public static SeriesSolution SolveInitialValue(Recurrence recurrence, string parameter, IReadOnlyList<Rational> initial,
        long start = 0, SeriesOptions? options = null, IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(recurrence);
        ArgumentNullException.ThrowIfNull(initial);
        options ??= new SeriesOptions();
        CheckOptions(options);
        int k = recurrence.Order, prec = options.Order + 1;
        if (initial.Count != k)
            throw new ArgumentException($"{recurrence.Unknown} has order {k}: give {k} initial values, not {initial.Count}", nameof(initial));
        var watch = Stopwatch.StartNew();
        var ring = PowerSeriesRing.OverRationals(parameter);
        var arith = new SeriesArithmetic(ring, prec);
        var pars = ParameterSeries(recurrence, parameter, options, ring);
        var terms = new List<PowerSeries<Rational>>();
        foreach (var v in initial) terms.Add(ring.Constant(v).WithPrecision(prec));
        var rule = recurrence.Rule;
        var input = new PowerSeries<Rational>[rule.InputCount];
        var clock = new BudgetClock(options.Budget, cancellation);
        for (int s = 0; s < options.Count; s++)
        {
            Check(clock, prec);
            long j = start + k + s;
            for (int i = 0; i < k; i++) input[i] = terms[terms.Count - k + i];
            for (int i = 0; i < pars.Length; i++) input[k + i] = pars[i];
            if (!recurrence.IsAutonomous) input[^1] = ring.Constant(j - k - recurrence.LowestShift);
            PowerSeries<Rational> next;
            try { next = rule.Evaluate(arith, input); }
            catch (Exception e) when (e is ProgramEvaluationException or ArgumentException or DivideByZeroException)
            {
                throw new SeriesConvergenceException($"{recurrence.TermName(j)}: the step divides by a series that vanishes at {parameter} = 0, so the solution is not a power series in {parameter} ({e.Message})", 0);
            }
            if (next.Precision < prec)
                throw new SeriesConvergenceException($"{recurrence.TermName(j)}: the step divides by a series that vanishes at {parameter} = 0 and loses precision (known only to O({parameter}^{next.Precision}))", next.Precision);
            terms.Add(next.Truncate(prec));
            progress?.Report(new AnalysisProgress("series", s + 1, options.Count, recurrence.TermName(j)));
        }
        var residual = EquationResidual.Compile(recurrence);
        for (int j = 0; j + k < terms.Count; j++)
        {
            var r = residual.Evaluate(arith, start + j, i => terms[(int)(i - start)], pars).Truncate(prec);
            if (!r.IsZero) throw new InvalidOperationException($"internal error: the equation at {recurrence.TermName(start + j)} has residual {r}");
        }
        return new SeriesSolution(recurrence, parameter, SeriesProblemKind.InitialValue, options.Order, start + k,
            terms.Skip(k).ToList(), null, 0,
            $"exact: left − right = O({parameter}^{prec}) over Q for each of the {terms.Count - k} equations on {recurrence.TermName(start)} … {recurrence.TermName(start + terms.Count - 1)}",
            BudgetLimit.None, watch.Elapsed);
    }

    /// <summary>The fixed point x_∞ of the autonomous recursion (the constant solution), as a power series in the weight,
    /// by Newton's method from the simple rational fixed point at g = 0.</summary>
    /// <param name="recurrence">An autonomous recursion.</param>
    /// <param name="parameter">The weight variable.</param>
    /// <param name="options">Order, other parameter values, and the constant term when several candidates exist.</param>
    /// <returns>x_∞ to O(g^{Order+1}), verified.</returns>
    /// <exception cref="ArgumentException">The recursion is not autonomous, or a parameter is missing.</exception>
    /// <exception cref="SeriesConvergenceException">No simple rational fixed point at g = 0, or several and none chosen.</exception>
    public static PowerSeries<Rational> FixedPoint(Recurrence recurrence, string parameter, SeriesOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(recurrence);
        options ??= new SeriesOptions();
        CheckOptions(options);
        if (!recurrence.IsAutonomous)
            throw new ArgumentException("a fixed point (constant solution) needs an autonomous recursion: the index appears explicitly", nameof(recurrence));
        var residual = EquationResidual.Compile(recurrence);
        int prec = options.Order + 1;
        // P(y) = numerator of the residual at g = 0 with every term equal to y, a polynomial in y.
        var yField = new RationalFunctionField("y");
        var zeroSeries = ParameterSeries(recurrence, parameter, options, PowerSeriesRing.OverRationals(parameter), zeroWeight: true);
        var zeroPars = zeroSeries.Select(z => yField.Constant(z.IsZero ? Rational.Zero : z.ConstantTerm)).ToArray();
        RationalFunction pf;
        try { pf = residual.Evaluate(yField, 0, _ => yField.Variable(0), zeroPars); }
        catch (ArithmeticException e)
        {
            throw new SeriesConvergenceException($"the constant solutions at {parameter} = 0 cannot be found: {e.Message}", 0);
        }
        if (pf.IsZero) throw new SeriesConvergenceException($"at {parameter} = 0 every constant is a fixed point: the limit is not determined", 0);
        int degree = 0;
        foreach (var term in pf.Numerator.Terms) degree = Math.Max(degree, term.Exponents[0]);
        var pc = new Rational[degree + 1];
        Array.Fill(pc, Rational.Zero);
        foreach (var term in pf.Numerator.Terms) pc[term.Exponents[0]] += term.Coefficient;
        var poly = UnivariatePolynomial.FromCoefficients(pc);
        Rational y0;
        var roots = poly.RationalRoots().Where(r => r.Multiplicity == 1).Select(r => r.Root).ToList();
        if (options.LimitAtZero is { } chosen)
        {
            if (!roots.Contains(chosen))
                throw new SeriesConvergenceException($"{chosen} is not a simple root of the fixed-point equation at {parameter} = 0 ({poly} = 0)", 0);
            y0 = chosen;
        }
        else if (roots.Count == 1) y0 = roots[0];
        else if (roots.Count == 0)
            throw new SeriesConvergenceException($"the fixed-point equation at {parameter} = 0, {poly} = 0, has no simple rational root; the limit is not a power series over Q in {parameter}", 0);
        else
            throw new SeriesConvergenceException($"the fixed-point equation at {parameter} = 0, {poly} = 0, has several simple rational roots ({string.Join(", ", roots)}); choose one (LimitAtZero)", 0);
        var slope = Evaluate(Derivative(poly), y0);
        var ring = PowerSeriesRing.OverRationals(parameter);
        var c = Rational.One / slope;
        return SeriesEquations.SolveNewton(ring, y =>
        {
            var arith = new SeriesArithmetic(ring, y.Precision);
            var pars = ParameterSeries(recurrence, parameter, options, ring);
            var f = residual.Evaluate(arith, 0, _ => y, pars);
            return y - f * c;
        }, prec, initial: ring.Constant(y0).WithPrecision(1));
    }

    /// <summary>Solves a boundary-value problem: k − 1 values at the low end and x_n → x_∞ (the fixed point) as n → ∞,
    /// as power series in <paramref name="parameter"/> (see the type remarks for the method and its verification).</summary>
    /// <param name="recurrence">An autonomous recursion of order k ≥ 1.</param>
    /// <param name="parameter">The weight variable.</param>
    /// <param name="boundaryIndex">The index b of the first given value.</param>
    /// <param name="boundaryValues">The k − 1 values x_b … x_{b+k−2}.</param>
    /// <param name="options">Order, count, window, other parameter values, budget.</param>
    /// <param name="cancellation">Cancels between Newton steps.</param>
    /// <param name="progress">Receives one report per Newton step.</param>
    /// <returns>The verified solution from index b + k − 1 on (with the limit and the window used).</returns>
    /// <exception cref="ArgumentException">Bad parameter, missing values, wrong number of boundary values.</exception>
    /// <exception cref="SeriesConvergenceException">The g-adic Newton iteration does not apply or does not converge, or the
    /// tail never reaches the limit within <see cref="SeriesOptions.MaxWindow"/>; the message says why.</exception>
    /// <exception cref="BudgetExceededException">The time limit was reached.</exception>
    public static SeriesSolution SolveBoundaryValue(Recurrence recurrence, string parameter, long boundaryIndex,
        IReadOnlyList<Rational> boundaryValues, SeriesOptions? options = null, IProgress<AnalysisProgress>? progress = null,
        CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(recurrence);
        ArgumentNullException.ThrowIfNull(boundaryValues);
        options ??= new SeriesOptions();
        CheckOptions(options);
        int k = recurrence.Order;
        if (boundaryValues.Count != k - 1)
            throw new ArgumentException($"{recurrence.Unknown} has order {k}: a boundary-value problem needs {k - 1} value(s) at the low end and the limit, not {boundaryValues.Count} value(s)", nameof(boundaryValues));
        var watch = Stopwatch.StartNew();
        var limit = FixedPoint(recurrence, parameter, options);
        var ring = limit.Ring;
        var pars = ParameterSeries(recurrence, parameter, options, ring);
        var residual = EquationResidual.Compile(recurrence);
        var clock = new BudgetClock(options.Budget, cancellation);
        int prec = options.Order + 1;
        long s = boundaryIndex + k - 1;
        int window = Math.Max(options.Window ?? options.Order + k + 1, options.Count + k);
        while (true)
        {
            PowerSeries<Rational>[] x;
            try { x = SolveWindow(residual, ring, pars, limit, boundaryIndex, boundaryValues, window, prec, clock, progress); }
            catch (Exception e) when (e is ProgramEvaluationException or DivideByZeroException || e is ArgumentException && e is not ArgumentNullException)
            {
                throw new SeriesConvergenceException($"an equation of the window divides by a series that vanishes at {parameter} = 0, so the solution is not a power series in {parameter} ({e.Message})", 0);
            }
            bool tail = true;
            for (int i = Math.Max(0, window - (k - 1)); i < window; i++)
                if (!(x[i] - limit).Truncate(prec).IsZero) { tail = false; break; }
            if (tail)
            {
                // exact check of every window equation at full precision
                var arith = new SeriesArithmetic(ring, prec);
                var lp = limit.Truncate(prec);
                for (int r = 0; r < window; r++)
                {
                    Kernels.KernelCancellation.Poll();
                    var e = residual.Evaluate(arith, boundaryIndex + r, i => Term(i, s, window, x, boundaryValues, boundaryIndex, lp, ring), pars).Truncate(prec);
                    if (!e.IsZero) throw new InvalidOperationException($"internal error: window equation {r} has residual {e}");
                }
                int count = Math.Min(options.Count, window);
                string stability = "";
                if (options.CheckLargerWindow)
                {
                    int larger = window + Math.Max(4, window / 4);
                    var y = SolveWindow(residual, ring, pars, limit, boundaryIndex, boundaryValues, larger, prec, clock, progress);
                    for (int i = 0; i < count; i++)
                        if (!(y[i] - x[i]).Truncate(prec).IsZero)
                            throw new SeriesConvergenceException($"enlarging the window from {window} to {larger} changed {recurrence.TermName(s + i)}: the window solution is not stable", prec);
                    stability = $"; solving again on a window of {larger} indices gave the same {count} reported series";
                }
                return new SeriesSolution(recurrence, parameter, SeriesProblemKind.BoundaryValue, options.Order, s,
                    x.Take(count).ToList(), limit, window,
                    $"exact: left − right = O({parameter}^{prec}) over Q for all {window} equations of the window {recurrence.TermName(s)} … {recurrence.TermName(s + window - 1)}, " +
                    $"and the last {Math.Max(k - 1, 0)} window term(s) equal the limit to O({parameter}^{prec}), so the sequence continued by the limit satisfies every equation modulo {parameter}^{prec}" + stability,
                    BudgetLimit.None, watch.Elapsed);
            }
            if (window * 2 > options.MaxWindow)
                throw new SeriesConvergenceException($"{recurrence.Unknown}_n − {recurrence.Unknown}_∞ does not vanish to O({parameter}^{prec}) at the end of a window of {window} indices (limit {options.MaxWindow}): the solution does not approach the fixed point g-adically fast enough, or tends to another limit", prec);
            window *= 2;
        }
    }

    private static PowerSeries<Rational> Term(long i, long s, int window, PowerSeries<Rational>[] x, IReadOnlyList<Rational> boundary,
        long b, PowerSeries<Rational> limit, PowerSeriesRing<Rational> ring)
    {
        if (i < s) return ring.Constant(boundary[(int)(i - b)]);
        if (i >= s + window) return limit;
        return x[i - s];
    }

    private static PowerSeries<Rational>[] SolveWindow(EquationResidual residual, PowerSeriesRing<Rational> ring, PowerSeries<Rational>[] pars,
        PowerSeries<Rational> limit, long b, IReadOnlyList<Rational> boundary, int window, int prec, BudgetClock clock,
        IProgress<AnalysisProgress>? progress)
    {
        int k = residual.Order, p = k - 1, width = p + 2;
        long s = b + k - 1;
        var x = new PowerSeries<Rational>[window];
        var start = limit.Truncate(1);
        Array.Fill(x, start);
        var arith1 = new SeriesArithmetic(ring, 1);
        var lim1 = limit.Truncate(1);
        for (int r = 0; r < window; r++)
        {
            Kernels.KernelCancellation.Poll();
            var e = residual.Evaluate(arith1, b + r, i => Term(i, s, window, x, boundary, b, lim1, ring), pars).Truncate(1);
            if (!e.IsZero)
                throw new SeriesConvergenceException($"at {ring.Variable} = 0 the equation at {residual.Recurrence.TermName(b + r - residual.LowestShift)} is not solved by the limit's constant term {start.ConstantTerm}: the boundary value is felt at order 0, so the window iteration has no start", 0);
        }
        int m = 1, steps = 0, total = (int)Math.Ceiling(Math.Log2(Math.Max(prec, 2)));
        var res = new PowerSeries<Rational>[window];
        var pert = new PowerSeries<Rational>[window];
        var jac = new PowerSeries<Rational>[window, width];
        while (m < prec)
        {
            Check(clock, m);
            int m2 = Math.Min(2 * m, prec), t = m2 - m;
            var arith = new SeriesArithmetic(ring, m2);
            var lim = limit.Truncate(m2);
            for (int i = 0; i < window; i++) x[i] = x[i].WithPrecision(m2);
            for (int r = 0; r < window; r++)
            {
                Kernels.KernelCancellation.Poll();
                var e = residual.Evaluate(arith, b + r, i => Term(i, s, window, x, boundary, b, lim, ring), pars).Truncate(m2);
                if (e.Valuation < m)
                    throw new SeriesConvergenceException($"Newton step {steps + 1} lost track: the window equation at {residual.Recurrence.TermName(b + r - residual.LowestShift)} has residual of valuation {e.Valuation} < {m}", m);
                res[r] = e;
            }
            var bump = ring.Monomial(Rational.One, m);
            for (int color = 0; color <= k; color++)
            {
                for (int i = 0; i < window; i++) pert[i] = i % (k + 1) == color ? x[i] + bump : x[i];
                for (int r = 0; r < window; r++)
                {
                    Kernels.KernelCancellation.Poll();
                    // columns of row r: r − p … r + 1
                    int col = -1;
                    for (int c = Math.Max(0, r - p); c <= Math.Min(window - 1, r + 1); c++)
                        if (c % (k + 1) == color) { col = c; break; }
                    if (col < 0) continue;
                    var e = residual.Evaluate(arith, b + r, i => Term(i, s, window, pert, boundary, b, lim, ring), pars).Truncate(m2);
                    jac[r, col - r + p] = (e - res[r]).Truncate(m2).MultiplyByPowerOfX(-m).Truncate(t);
                }
            }
            var rhs = new PowerSeries<Rational>[window];
            for (int r = 0; r < window; r++) rhs[r] = res[r].MultiplyByPowerOfX(-m).Truncate(t);
            var delta = SolveBanded(jac, rhs, window, p, t, ring, m, residual);
            for (int i = 0; i < window; i++) x[i] = (x[i] - delta[i].MultiplyByPowerOfX(m)).Truncate(m2);
            m = m2;
            steps++;
            progress?.Report(new AnalysisProgress("series", steps, total, $"window of {window}: known to O({ring.Variable}^{m})"));
        }
        return x;
    }

    private static PowerSeries<Rational>[] SolveBanded(PowerSeries<Rational>[,] jac, PowerSeries<Rational>[] rhs, int n, int p, int t,
        PowerSeriesRing<Rational> ring, int m, EquationResidual residual)
    {
        var inv = new PowerSeries<Rational>[n];
        for (int c = 0; c < n; c++)
        {
            Kernels.KernelCancellation.Poll();
            var piv = jac[c, p] ?? ring.Zero.WithPrecision(t);
            if (piv.Get(0).IsZero)
                throw new SeriesConvergenceException($"the linearised window system is singular at {ring.Variable} = 0 in column {c} (pivot vanishes): the equations do not determine {residual.Recurrence.Unknown} order by order in this arrangement (the g = 0 Jacobian needs non-zero leading minors)", m);
            inv[c] = PowerSeries<Rational>.Divide(ring.One, piv, t);
            for (int r = c + 1; r <= Math.Min(c + p, n - 1); r++)
            {
                var below = jac[r, c - r + p];
                if (below is null || below.Truncate(t).IsZero) continue;
                var f = PowerSeries<Rational>.MultiplyCore(below, inv[c], t);
                if (c + 1 < n)
                {
                    var up = jac[c, p + 1];
                    if (up is not null)
                        jac[r, c + 1 - r + p] = ((jac[r, c + 1 - r + p] ?? ring.Zero) - PowerSeries<Rational>.MultiplyCore(f, up, t)).Truncate(t);
                }
                rhs[r] = (rhs[r] - PowerSeries<Rational>.MultiplyCore(f, rhs[c], t)).Truncate(t);
            }
        }
        var d = new PowerSeries<Rational>[n];
        for (int c = n - 1; c >= 0; c--)
        {
            Kernels.KernelCancellation.Poll();
            var v = rhs[c];
            if (c + 1 < n && jac[c, p + 1] is { } up) v = (v - PowerSeries<Rational>.MultiplyCore(up, d[c + 1], t)).Truncate(t);
            d[c] = PowerSeries<Rational>.MultiplyCore(v, inv[c], t);
        }
        return d;
    }

    internal static PowerSeries<Rational>[] ParameterSeries(Recurrence recurrence, string parameter, SeriesOptions options,
        PowerSeriesRing<Rational> ring, bool zeroWeight = false)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(parameter);
        if (!recurrence.Parameters.Contains(parameter))
            throw new ArgumentException($"'{parameter}' is not a parameter of {recurrence.Text} (parameters: {(recurrence.Parameters.Length == 0 ? "none" : string.Join(", ", recurrence.Parameters))})", nameof(parameter));
        var result = new PowerSeries<Rational>[recurrence.Parameters.Length];
        for (int i = 0; i < result.Length; i++)
        {
            string name = recurrence.Parameters[i];
            if (name == parameter) result[i] = zeroWeight ? ring.Zero : ring.X;
            else if (options.ParameterValues is { } values && values.TryGetValue(name, out var v)) result[i] = ring.Constant(v);
            else throw new ArgumentException($"the parameter '{name}' needs a value (SeriesOptions.ParameterValues)", nameof(options));
        }
        return result;
    }

    private static void CheckOptions(SeriesOptions options)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(options.Order, nameof(options.Order));
        ArgumentOutOfRangeException.ThrowIfLessThan(options.Count, 1, nameof(options.Count));
        if (options.Window is { } w) ArgumentOutOfRangeException.ThrowIfLessThan(w, 1, nameof(options.Window));
    }

    private static void Check(BudgetClock clock, int precision)
    {
        try { clock.Check(); }
        catch (BudgetHit hit) { throw new BudgetExceededException(hit.Limit, precision, $"series solution stopped at precision {precision}: {hit.Message}"); }
    }

    private static UnivariatePolynomial Derivative(UnivariatePolynomial p)
    {
        var c = p.ToArray();
        if (c.Length <= 1) return UnivariatePolynomial.Zero;
        var d = new Rational[c.Length - 1];
        for (int i = 1; i < c.Length; i++) d[i - 1] = c[i] * i;
        return UnivariatePolynomial.FromCoefficients(d);
    }

    private static Rational Evaluate(UnivariatePolynomial p, Rational x)
    {
        var c = p.ToArray();
        var v = Rational.Zero;
        for (int i = c.Length - 1; i >= 0; i--) v = v * x + c[i];
        return v;
    }
}
