using Integrable.Series;

namespace Integrable.Guessing;

/// <summary>Hermite–Padé approximants: polynomials P₀ … P_r of bounded degrees with
/// P₀f₀ + … + P_r f_r = O(x^N) for given power series f_i, found by exact linear algebra over the
/// coefficient field; the basis of algebraic and linear differential equation guessing.</summary>
/// <remarks>
/// <para>The unknowns are the K = Σ(d_i + 1) coefficients of the P_i; the coefficient of x^k in
/// Σ P_i f_i gives one linear equation for each k &lt; N, where N is the smallest precision among the f_i.
/// The equations are eliminated one at a time (internal incremental Gaussian elimination), so the index
/// after which the solution space stopped shrinking is known: the terms up to it are
/// <see cref="GuessResult{TValue}.TermsUsed"/>, every later equation is a confirmation. The relation
/// returned is re-checked by series arithmetic (Σ P_i f_i = O(x^N)).</para>
/// <para>The degree-searching forms (<see cref="AlgebraicEquation{T}"/>, <see cref="DifferentialEquation{T}"/>)
/// try the smallest order first and, for each order, the smallest degree, and return the first confirmed
/// relation, so the relation is usually the minimal one (null space of dimension 1).</para>
/// </remarks>
/// <example><code>
/// var r = PowerSeriesRing.Rationals;
/// var c = SeriesEquations.SolveNewton(r, y => 1 + r.X * y * y, 30);
/// var eq = HermitePade.AlgebraicEquation(c, 2, 2);     // (1) + (-1)*y + (x)*y^2 = 0
/// </code></example>
public static class HermitePade
{
    /// <summary>Finds polynomials P_i with deg P_i ≤ <paramref name="degreeBounds"/>[i] and Σ P_i f_i = O(x^N).</summary>
    /// <typeparam name="T">The coefficient type.</typeparam>
    /// <param name="series">The series f₀ … f_r of one ring; N is the smallest of their precisions (must be finite).</param>
    /// <param name="degreeBounds">Degree bounds d_i ≥ 0, one per series.</param>
    /// <param name="minimumConfirmations">Confirmations required.</param>
    /// <param name="labels">Optional names of the series for printing.</param>
    /// <returns>The relation with its evidence; when the solution space has dimension &gt; 1 the basis vector with the
    /// fewest non-zero coefficients is returned and <see cref="PolynomialRelation{T}.NullspaceDimension"/> says so.</returns>
    /// <exception cref="ArgumentException">Mismatched lengths, negative bounds, no series, or all series exact.</exception>
    public static GuessResult<PolynomialRelation<T>> Find<T>(IReadOnlyList<PowerSeries<T>> series, IReadOnlyList<int> degreeBounds,
        int minimumConfirmations = GuessDefaults.MinimumConfirmations, IReadOnlyList<string>? labels = null)
    {
        ArgumentNullException.ThrowIfNull(series);
        ArgumentNullException.ThrowIfNull(degreeBounds);
        ArgumentOutOfRangeException.ThrowIfNegative(minimumConfirmations);
        if (series.Count == 0) throw new ArgumentException("at least one series is needed", nameof(series));
        if (series.Count != degreeBounds.Count) throw new ArgumentException($"{series.Count} series but {degreeBounds.Count} degree bounds", nameof(degreeBounds));
        if (labels is not null && labels.Count != series.Count) throw new ArgumentException("one label per series is needed", nameof(labels));
        var ring = series[0].Ring;
        int n = int.MaxValue;
        for (int i = 0; i < series.Count; i++)
        {
            ArgumentNullException.ThrowIfNull(series[i]);
            if (!series[i].Ring.Equals(ring)) throw new Algebra.IncompatibleRingException($"series {i} is in {series[i].Ring}, series 0 in {ring}");
            if (degreeBounds[i] < 0) throw new ArgumentException($"degree bound {i} is negative", nameof(degreeBounds));
            n = Math.Min(n, series[i].Precision);
        }
        if (n == int.MaxValue) throw new ArgumentException("all series are exact: give at least one a finite precision (the number of terms to fit)", nameof(series));
        var names = labels?.ToArray() ?? Enumerable.Range(0, series.Count).Select(i => $"f{i}").ToArray();
        return FindCore(ring, series, degreeBounds, n, minimumConfirmations, names);
    }

    private static GuessResult<PolynomialRelation<T>> FindCore<T>(PowerSeriesRing<T> ring, IReadOnlyList<PowerSeries<T>> f, IReadOnlyList<int> deg,
        int n, int minimumConfirmations, string[] labels)
    {
        var d = ring.Domain;
        int r = f.Count;
        var offset = new int[r + 1];
        for (int i = 0; i < r; i++) offset[i + 1] = offset[i] + deg[i] + 1;
        int k = offset[r];
        var ech = new IncrementalEchelon<T>(d, k);
        int lastIncrease = -1;
        for (int row = 0; row < n; row++)
        {
            var eq = new T[k];
            for (int i = 0; i < r; i++)
                for (int j = 0; j <= deg[i]; j++)
                    eq[offset[i] + j] = row >= j ? f[i].Get(row - j) : d.Zero;
            if (ech.Add(eq)) lastIncrease = row;
        }
        var basis = ech.Nullspace();
        int used = lastIncrease + 1;
        if (basis.Count == 0)
            return GuessResult<PolynomialRelation<T>>.NotFound(used, 0, minimumConfirmations,
                $"no relation with degrees ≤ ({string.Join(", ", deg)}) fits the {n} known terms");
        T[] best = basis[0];
        int bestSupport = int.MaxValue;
        foreach (var v in basis)
        {
            int s = v.Count(c => !d.IsZero(c));
            if (s < bestSupport) { best = v; bestSupport = s; }
        }
        int first = Array.FindIndex(best, c => !d.IsZero(c));
        var scale = d.Inverse(best[first]);
        var polys = new PowerSeries<T>[r];
        for (int i = 0; i < r; i++)
        {
            var c = new T[deg[i] + 1];
            for (int j = 0; j <= deg[i]; j++) c[j] = d.Multiply(best[offset[i] + j], scale);
            polys[i] = ring.Polynomial(c);
        }
        // Exact check: Σ P_i f_i = O(x^n).
        var sum = ring.O(n);
        for (int i = 0; i < r; i++) sum += polys[i] * f[i];
        if (!sum.Truncate(n).IsZero) throw new InvalidOperationException("internal error: the Hermite–Padé relation does not check");
        var rel = new PolynomialRelation<T>(polys, labels, basis.Count);
        return GuessResult<PolynomialRelation<T>>.Judge(rel, used, n, minimumConfirmations,
            $"a relation with degrees ≤ ({string.Join(", ", deg)}){(basis.Count > 1 ? $" (solution space of dimension {basis.Count})" : "")}");
    }

    /// <summary>Guesses a polynomial equation P₀(x) + P₁(x)·y + … + P_r(x)·y^r = 0 satisfied by the series y,
    /// trying r = 1 … <paramref name="maxDegreeInY"/> and, for each, degrees 0 … <paramref name="maxDegreeInX"/> in x.</summary>
    /// <typeparam name="T">The coefficient type.</typeparam>
    /// <param name="y">The series (finite precision N: its known coefficients are the data).</param>
    /// <param name="maxDegreeInY">Largest r to try, at least 1.</param>
    /// <param name="maxDegreeInX">Largest degree of the P_i to try, non-negative.</param>
    /// <param name="minimumConfirmations">Confirmations required.</param>
    /// <returns>The first confirmed equation, with Polynomials[i] the coefficient of y^i.</returns>
    /// <exception cref="ArgumentException">y is exact, or bounds out of range.</exception>
    public static GuessResult<PolynomialRelation<T>> AlgebraicEquation<T>(PowerSeries<T> y, int maxDegreeInY, int maxDegreeInX,
        int minimumConfirmations = GuessDefaults.MinimumConfirmations)
    {
        ArgumentNullException.ThrowIfNull(y);
        ArgumentOutOfRangeException.ThrowIfLessThan(maxDegreeInY, 1);
        ArgumentOutOfRangeException.ThrowIfNegative(maxDegreeInX);
        if (y.IsExact) throw new ArgumentException("give the series a finite precision: its known coefficients are the data", nameof(y));
        int n = y.Precision;
        var powers = new List<PowerSeries<T>> { y.Ring.One.Truncate(n) };
        var labels = new List<string> { "1" };
        GuessResult<PolynomialRelation<T>>? last = null;
        for (int r = 1; r <= maxDegreeInY; r++)
        {
            powers.Add((powers[^1] * y).Truncate(n));
            labels.Add(r == 1 ? "y" : $"y^{r}");
            for (int dx = 0; dx <= maxDegreeInX; dx++)
            {
                if ((r + 1) * (dx + 1) > n) break;
                var g = FindCore(y.Ring, powers, Enumerable.Repeat(dx, r + 1).ToArray(), n, minimumConfirmations, labels.ToArray());
                if (g.IsFound) return g;
                last = g;
            }
        }
        return GuessResult<PolynomialRelation<T>>.NotFound(last?.TermsUsed ?? 0, last?.TermsConfirmed ?? 0, minimumConfirmations,
            $"no confirmed algebraic equation of degree ≤ {maxDegreeInY} in y and ≤ {maxDegreeInX} in x from {n} terms");
    }

    /// <summary>Guesses a linear differential equation P₀(x)·y + P₁(x)·y′ + … + P_r(x)·y^{(r)} (+ P(x)) = 0 with
    /// polynomial coefficients, trying orders r = 1 … <paramref name="maxOrder"/> and degrees 0 … <paramref name="maxDegreeInX"/>.</summary>
    /// <typeparam name="T">The coefficient type.</typeparam>
    /// <param name="y">The series (finite precision N; the r-th derivative is known to N − r).</param>
    /// <param name="maxOrder">Largest order r to try, at least 1.</param>
    /// <param name="maxDegreeInX">Largest degree of the P_i to try.</param>
    /// <param name="inhomogeneous">Whether to allow a polynomial term P(x) (listed last, label "1").</param>
    /// <param name="minimumConfirmations">Confirmations required.</param>
    /// <returns>The first confirmed equation, with Polynomials[i] the coefficient of y^{(i)}.</returns>
    /// <exception cref="ArgumentException">y is exact, or bounds out of range.</exception>
    public static GuessResult<PolynomialRelation<T>> DifferentialEquation<T>(PowerSeries<T> y, int maxOrder, int maxDegreeInX,
        bool inhomogeneous = false, int minimumConfirmations = GuessDefaults.MinimumConfirmations)
    {
        ArgumentNullException.ThrowIfNull(y);
        ArgumentOutOfRangeException.ThrowIfLessThan(maxOrder, 1);
        ArgumentOutOfRangeException.ThrowIfNegative(maxDegreeInX);
        if (y.IsExact) throw new ArgumentException("give the series a finite precision: its known coefficients are the data", nameof(y));
        var derivs = new List<PowerSeries<T>> { y };
        var labels = new List<string> { "y" };
        GuessResult<PolynomialRelation<T>>? last = null;
        for (int r = 1; r <= maxOrder; r++)
        {
            derivs.Add(derivs[^1].Derivative());
            labels.Add(r <= 3 ? "y" + new string('\'', r) : $"y^({r})");
            var f = new List<PowerSeries<T>>(derivs);
            var l = new List<string>(labels);
            if (inhomogeneous) { f.Add(y.Ring.One); l.Add("1"); }
            int n = y.Precision - r;
            for (int dx = 0; dx <= maxDegreeInX; dx++)
            {
                if (f.Count * (dx + 1) > n) break;
                var g = FindCore(y.Ring, f, Enumerable.Repeat(dx, f.Count).ToArray(), n, minimumConfirmations, l.ToArray());
                if (g.IsFound) return g;
                last = g;
            }
        }
        return GuessResult<PolynomialRelation<T>>.NotFound(last?.TermsUsed ?? 0, last?.TermsConfirmed ?? 0, minimumConfirmations,
            $"no confirmed linear differential equation of order ≤ {maxOrder} with coefficients of degree ≤ {maxDegreeInX}");
    }
}
