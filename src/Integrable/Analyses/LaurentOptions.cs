using Integrable.Numbers;

namespace Integrable.Analyses;

/// <summary>Options of a Laurent-property check: parameter values (parameters without a value become
/// formal variables of the Laurent ring), the index of the first initial value, and the budget.</summary>
/// <example><code>
/// var options = new LaurentOptions { ParameterValues = new Dictionary&lt;string, Rational&gt; { ["a"] = 2 } };
/// </code></example>
public sealed record LaurentOptions
{
    /// <summary>The default options: all parameters formal, start index 0, default budget.</summary>
    public static LaurentOptions Default { get; } = new();

    /// <summary>Values for some or all parameters; the others stay formal variables.</summary>
    public IReadOnlyDictionary<string, Rational>? ParameterValues { get; init; }

    /// <summary>Index of the first initial value (matters for non-autonomous equations and for names).</summary>
    public long Start { get; init; }

    /// <summary>Limits on terms and time.</summary>
    public AnalysisBudget Budget { get; init; } = AnalysisBudget.Default;
}
