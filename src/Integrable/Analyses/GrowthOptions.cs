using Integrable.Numbers;

namespace Integrable.Analyses;

/// <summary>Options of a degree-growth analysis.</summary>
/// <example><code>
/// var options = new GrowthOptions { Budget = AnalysisBudget.Default with { MaxDegree = 100_000 } };
/// </code></example>
public sealed record GrowthOptions
{
    /// <summary>Default options.</summary>
    public static GrowthOptions Default { get; } = new();

    /// <summary>Values for some or all parameters; the others get random (generic) values on each line.</summary>
    public IReadOnlyDictionary<string, Rational>? ParameterValues { get; init; }

    /// <summary>Seed of the random lines and primes (results are reproducible for a fixed seed).</summary>
    public int RandomSeed { get; init; } = 1998;

    /// <summary>Bit size of the random primes of the lines (31 by default, at most 62).</summary>
    public int PrimeBits { get; init; } = 31;

    /// <summary>Extra degrees that must confirm the fitted generating function (default 5).</summary>
    public int MinimumConfirmations { get; init; } = Guessing.GuessDefaults.MinimumConfirmations;

    /// <summary>Whether to confirm the first degrees by exact iterates (reduced rational functions over Q) where cheap.</summary>
    public bool ExactConfirmation { get; init; } = true;

    /// <summary>Index of the first initial value (matters for non-autonomous equations).</summary>
    public long Start { get; init; }

    /// <summary>Limits: <see cref="AnalysisBudget.MaxDegree"/> and <see cref="AnalysisBudget.TimeLimit"/> stop the iteration (the report keeps the degrees found).</summary>
    public AnalysisBudget Budget { get; init; } = AnalysisBudget.Default;
}
