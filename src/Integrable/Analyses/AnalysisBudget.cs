namespace Integrable.Analyses;

/// <summary>Limits on the work an analysis may do: terms per value, wall-clock time, degree and
/// series precision. An analysis that reaches a limit stops and returns a partial report whose
/// <c>Limit</c> names it (or throws <see cref="BudgetExceededException"/> when no partial answer makes sense).</summary>
/// <remarks>Immutable; derive variants with <c>with</c> expressions.</remarks>
/// <example><code>
/// var budget = AnalysisBudget.Default with { MaxTerms = 10_000, TimeLimit = TimeSpan.FromSeconds(5) };
/// var report = LaurentPhenomenon.Check(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 1"), 12, budget: budget);
/// </code></example>
public sealed record AnalysisBudget
{
    /// <summary>Defaults: 500 000 terms per value, no time limit, degree at most 2·10⁶, series precision at most 64 terms.</summary>
    public static AnalysisBudget Default { get; } = new();

    /// <summary>No limits except the series precision (64 terms).</summary>
    public static AnalysisBudget Unlimited { get; } = new() { MaxTerms = int.MaxValue, MaxDegree = long.MaxValue };

    /// <summary>Largest number of terms a value (a Laurent polynomial, an intermediate result) may have.</summary>
    public int MaxTerms { get; init; } = 500_000;

    /// <summary>Wall-clock limit, or null for none.</summary>
    public TimeSpan? TimeLimit { get; init; }

    /// <summary>Largest degree a degree-growth computation may reach.</summary>
    public long MaxDegree { get; init; } = 2_000_000;

    /// <summary>Largest relative precision (number of terms) of the ε-series in a singularity-confinement test.</summary>
    public int MaxPrecision { get; init; } = 64;
}
