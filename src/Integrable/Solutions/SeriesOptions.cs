using Integrable.Analyses;
using Integrable.Numbers;

namespace Integrable.Solutions;

/// <summary>Options of <see cref="SeriesSolver"/>.</summary>
public sealed record SeriesOptions
{
    /// <summary>The last power of the weight to compute: coefficients of g^0 … g^Order are returned (default 20).</summary>
    public int Order { get; init; } = 20;

    /// <summary>How many indices to report, from the first unknown one (default 10).</summary>
    public int Count { get; init; } = 10;

    /// <summary>The first window size for boundary-value problems (default: Order + order of the recursion + 1, enough when
    /// x_n − x_∞ = O(g^n)); the window is doubled while the tail check fails, up to <see cref="MaxWindow"/>.</summary>
    public int? Window { get; init; }

    /// <summary>The largest window tried before giving up (default 8192).</summary>
    public int MaxWindow { get; init; } = 8192;

    /// <summary>When true, a boundary-value solution is solved again on a window a quarter larger (at least 4 more indices)
    /// and the reported terms must agree (an empirical stability check on top of the exact tail check; doubles the cost).</summary>
    public bool CheckLargerWindow { get; init; }

    /// <summary>Values of the parameters other than the weight (by name).</summary>
    public IReadOnlyDictionary<string, Rational>? ParameterValues { get; init; }

    /// <summary>The constant term of the limit x_∞ at g = 0, when the equation at g = 0 has several simple rational fixed points.</summary>
    public Rational? LimitAtZero { get; init; }

    /// <summary>Time limit (only <see cref="AnalysisBudget.TimeLimit"/> is used).</summary>
    public AnalysisBudget Budget { get; init; } = AnalysisBudget.Default;
}
