using System.Diagnostics;

namespace Integrable.Analyses;

/// <summary>Measures the wall time of an analysis against its budget and turns limits and cancellation
/// into control flow (an internal exception caught by the analysis, which then builds a partial report).</summary>
internal sealed class BudgetClock
{
    private readonly Stopwatch _watch = Stopwatch.StartNew();

    public BudgetClock(AnalysisBudget budget, CancellationToken cancellation)
    {
        Budget = budget ?? throw new ArgumentNullException(nameof(budget));
        Cancellation = cancellation;
    }

    public AnalysisBudget Budget { get; }

    public CancellationToken Cancellation { get; }

    public TimeSpan Elapsed => _watch.Elapsed;

    /// <summary>Throws <see cref="OperationCanceledException"/> on cancellation and <see cref="BudgetHit"/> past the time limit.</summary>
    public void Check()
    {
        Cancellation.ThrowIfCancellationRequested();
        if (Budget.TimeLimit is { } t && _watch.Elapsed > t) throw new BudgetHit(BudgetLimit.Time, $"time limit {t.TotalSeconds:0.###} s reached");
    }

    public void CheckTerms(int terms)
    {
        if (terms > Budget.MaxTerms) throw new BudgetHit(BudgetLimit.Terms, $"a value has {terms} terms, more than the limit {Budget.MaxTerms}");
    }
}

/// <summary>Internal signal: a budget limit was reached (caught by the analysis).</summary>
internal sealed class BudgetHit(BudgetLimit limit, string message) : Exception(message)
{
    public BudgetLimit Limit { get; } = limit;
}
