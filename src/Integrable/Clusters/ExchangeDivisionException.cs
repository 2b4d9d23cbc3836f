namespace Integrable.Clusters;

/// <summary>Thrown when an exchange relation x_k·x_k' = P + M cannot be solved for x_k' because the
/// ring's exact division of P + M by x_k fails (x_k is zero in a field, or does not divide in a ring
/// such as Laurent polynomials).</summary>
public sealed class ExchangeDivisionException : ArithmeticException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="direction">The 1-based mutation direction k.</param>
    /// <param name="step">The 1-based step of the mutation sequence (or search depth) at which it failed.</param>
    /// <param name="detail">Extra detail, e.g. the divisor's text.</param>
    public ExchangeDivisionException(int direction, int step, string detail)
        : base($"mutation in direction {direction} at step {step}: {detail}")
    {
        Direction = direction;
        Step = step;
    }

    /// <summary>The 1-based mutation direction k whose exchange relation failed.</summary>
    public int Direction { get; }

    /// <summary>The 1-based step at which it failed: the position in a mutation sequence, the index of
    /// the new term of a recurrence, or the search depth of an exchange-graph exploration.</summary>
    public int Step { get; }
}
