using Integrable.Numbers;

namespace Integrable.Analyses;

/// <summary>Options of a singularity-confinement test.</summary>
/// <example><code>
/// var options = new ConfinementOptions { SingularValues = [0], Steps = 12 };
/// </code></example>
public sealed record ConfinementOptions
{
    /// <summary>Default options: singular values detected automatically, 10 steps.</summary>
    public static ConfinementOptions Default { get; } = new();

    /// <summary>The singular values s to start from (x = s + ε); null to detect them: 0 and the constant
    /// rational roots of the rule's denominator in each of its variables.</summary>
    public IReadOnlyList<Rational>? SingularValues { get; init; }

    /// <summary>Values for some or all parameters; the others get random rational values (generic parameters).</summary>
    public IReadOnlyDictionary<string, Rational>? ParameterValues { get; init; }

    /// <summary>The number K of steps after the singular term within which the singularity must be confined (default 10).</summary>
    public int Steps { get; init; } = 10;

    /// <summary>Index of the first initial value (matters for non-autonomous equations: the singularity starts at index Start + k − 1).</summary>
    public long Start { get; init; }

    /// <summary>Seed of the random free data.</summary>
    public int RandomSeed { get; init; } = 1991;

    /// <summary>Limits (<see cref="AnalysisBudget.MaxPrecision"/> bounds the ε-series, <see cref="AnalysisBudget.TimeLimit"/> the time).</summary>
    public AnalysisBudget Budget { get; init; } = AnalysisBudget.Default;
}
