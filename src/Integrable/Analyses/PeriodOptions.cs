using Integrable.Numbers;

namespace Integrable.Analyses;

/// <summary>Options of a period search: parameter values (the others stay symbolic, i.e. random at
/// every sample point and formal in the symbolic check), the number of random modular points, the seed
/// of the random choices, whether to attempt the exact symbolic check, and the budget.</summary>
/// <example><code>
/// var options = new PeriodOptions { ParameterValues = new Dictionary&lt;string, Rational&gt; { ["a"] = 1 } };
/// </code></example>
public sealed record PeriodOptions
{
    /// <summary>Default options.</summary>
    public static PeriodOptions Default { get; } = new();

    /// <summary>Values for some or all parameters; the others are symbolic.</summary>
    public IReadOnlyDictionary<string, Rational>? ParameterValues { get; init; }

    /// <summary>Number of random points modulo random primes near 2^61 (at least 1; default 3).</summary>
    public int Points { get; init; } = 3;

    /// <summary>Seed of the random choices (the result is reproducible for a fixed seed).</summary>
    public int RandomSeed { get; init; } = 20_261_202;

    /// <summary>Whether to try the exact symbolic identity x_{n+p} = x_n (reduced rational functions over Q) before falling back to the probabilistic bound.</summary>
    public bool SymbolicCheck { get; init; } = true;

    /// <summary>Index of the first initial value (matters for non-autonomous equations).</summary>
    public long Start { get; init; }

    /// <summary>Limits (the symbolic check also stops at 50 000 terms per value).</summary>
    public AnalysisBudget Budget { get; init; } = AnalysisBudget.Default;
}
