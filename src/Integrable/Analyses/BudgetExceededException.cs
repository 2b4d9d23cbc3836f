namespace Integrable.Analyses;

/// <summary>Thrown when an analysis reaches a budget limit before it can say anything (otherwise it
/// returns a partial report naming the limit).</summary>
public sealed class BudgetExceededException : Exception
{
    /// <summary>Creates the exception.</summary>
    /// <param name="limit">The limit that was reached.</param>
    /// <param name="step">The step at which it was reached (−1 when not tied to a step).</param>
    /// <param name="message">What was being computed.</param>
    public BudgetExceededException(BudgetLimit limit, long step, string message) : base(message)
    {
        Limit = limit;
        Step = step;
    }

    /// <summary>The limit that was reached.</summary>
    public BudgetLimit Limit { get; }

    /// <summary>The step at which it was reached, or −1.</summary>
    public long Step { get; }
}
