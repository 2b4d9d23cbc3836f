namespace Integrable.Series;

/// <summary>The outcome of a plain fixed-point iteration y ← F(x, y) on power series
/// (<see cref="SeriesEquations.Iterate{T}"/>).</summary>
/// <typeparam name="T">The coefficient type.</typeparam>
/// <remarks>The iteration counts as converging x-adically when the valuations of the successive changes
/// y_{k+1} − y_k strictly increase (each step fixes at least one more coefficient); it stops when a change
/// vanishes modulo x^order, and then <see cref="Solution"/> satisfies y = F(x, y) modulo x^order exactly.</remarks>
/// <example><code>
/// var r = PowerSeriesRing.Rationals;
/// var it = SeriesEquations.Iterate(r, y => 1 + r.X * y * y, 20);
/// if (it.Converged) Console.WriteLine(it.Solution);   // Catalan numbers
/// </code></example>
public sealed class FixedPointIteration<T>
{
    internal FixedPointIteration(bool converged, PowerSeries<T> last, int steps, IReadOnlyList<int> changeValuations, string explanation)
    {
        Converged = converged;
        LastIterate = last;
        Steps = steps;
        ChangeValuations = changeValuations;
        Explanation = explanation;
    }

    /// <summary>True when a fixed point modulo x^order was reached.</summary>
    public bool Converged { get; }

    /// <summary>The fixed point.</summary>
    /// <exception cref="InvalidOperationException">The iteration did not converge (see <see cref="Explanation"/>).</exception>
    public PowerSeries<T> Solution => Converged ? LastIterate : throw new InvalidOperationException($"no fixed point: {Explanation}");

    /// <summary>The last iterate computed (the solution when converged).</summary>
    public PowerSeries<T> LastIterate { get; }

    /// <summary>Number of evaluations of F.</summary>
    public int Steps { get; }

    /// <summary>Valuation of each non-zero change y_{k+1} − y_k, in order.</summary>
    public IReadOnlyList<int> ChangeValuations { get; }

    /// <summary>Why the iteration stopped.</summary>
    public string Explanation { get; }

    /// <inheritdoc/>
    public override string ToString() => (Converged ? "converged: " : "not converged: ") + Explanation;
}
