using Integrable.Recursions;

namespace Integrable.Analyses;

/// <summary>Degree growth and algebraic entropy of a recursion: the degree d_n of the n-th iterate as a
/// rational function of the initial values, a rational generating function fitted to the degrees, the
/// growth class and, for exponential growth, the entropy log λ with λ given by its minimal polynomial.</summary>
/// <remarks>
/// <para>Degrees are measured on random lines x_i = a_i + b_i t over Z/pZ for random primes p: the iterate
/// is a univariate rational function in t: each step combines fractions without gcds (as the compiled
/// rule dictates) and reduces each new term once (fast products and half-gcd), and
/// its degree max(deg num, deg den) equals d_n unless the line is special. Two independent lines run in
/// lockstep; when they disagree at a step, further lines recomputed from the start decide (the step is
/// redone). Parameters without a value are given random values on each line (generic parameters).
/// The first degrees are also confirmed by exact iterates (reduced rational functions over Q) while these are cheap.</para>
/// <para>Integrable maps have polynomial growth (quadratic for QRT maps and discrete Painlevé
/// equations), non-integrable ones exponential growth: M. Bellon, C.-M. Viallet, "Algebraic entropy",
/// Comm. Math. Phys. 204 (1999) 425–437; J. Hietarinta, C. Viallet, PRL 81 (1998) 325.</para>
/// </remarks>
/// <example><code>
/// var r = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} + x_{n-1} = 1/x_n + 1/x_n^2"), 20);
/// Console.WriteLine(r.Fit.Class);   // Quadratic
/// </code></example>
public static class DegreeGrowth
{
    /// <summary>Analyses a scalar recurrence over <paramref name="steps"/> new terms.</summary>
    /// <param name="recurrence">The recurrence.</param>
    /// <param name="steps">Number of new terms, at least 1 (about 2L + 5 + transient are needed to confirm a generating function of order L).</param>
    /// <param name="options">Parameter values, randomness, budget.</param>
    /// <param name="progress">Receives one report per step.</param>
    /// <param name="cancellation">Cancels the analysis.</param>
    /// <returns>The report (partial, naming the limit, when the degree or time budget stops the iteration).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="recurrence"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="steps"/> &lt; 1 or invalid prime size.</exception>
    /// <exception cref="ArgumentException">A parameter value names no parameter.</exception>
    /// <exception cref="SingularStepException">The map is not defined for generic initial values.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static GrowthReport Analyse(Recurrence recurrence, int steps, GrowthOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(recurrence);
        options ??= GrowthOptions.Default;
        return DegreeEngine.Run(new RecursionMap(recurrence, options.Start), steps, options, f => new UnreducedLineField(f), progress, cancellation);
    }

    /// <summary>Analyses a system; the degree of a step is the largest degree of its new terms.</summary>
    /// <param name="system">The system.</param>
    /// <param name="steps">Number of steps, at least 1.</param>
    /// <param name="options">Parameter values, randomness, budget.</param>
    /// <param name="progress">Receives one report per step.</param>
    /// <param name="cancellation">Cancels the analysis.</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="system"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="steps"/> &lt; 1.</exception>
    /// <exception cref="ArgumentException">A parameter value names no parameter.</exception>
    /// <exception cref="SingularStepException">The map is not defined for generic initial values.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static GrowthReport Analyse(RecurrenceSystem system, int steps, GrowthOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(system);
        return DegreeEngine.Run(new RecursionMap(system), steps, options ?? GrowthOptions.Default, f => new UnreducedLineField(f), progress, cancellation);
    }
}
