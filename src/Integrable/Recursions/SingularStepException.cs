namespace Integrable.Recursions;

/// <summary>Thrown when iterating a recursion reaches a term that cannot be computed in the chosen
/// domain: a division by zero (a singular orbit) or a division that is not exact (for example a
/// non-Laurent term in the Laurent-polynomial domain).</summary>
public sealed class SingularStepException : ArithmeticException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="index">Index of the term that could not be computed.</param>
    /// <param name="term">The term's name, e.g. <c>x_7</c>.</param>
    /// <param name="reason">What failed.</param>
    /// <param name="inner">The underlying evaluation failure.</param>
    public SingularStepException(long index, string term, string reason, Exception? inner = null)
        : base($"cannot compute {term} (step {index}): {reason}", inner)
    {
        Index = index;
        Term = term;
        Reason = reason;
    }

    /// <summary>Index of the term that could not be computed.</summary>
    public long Index { get; }

    /// <summary>The term's name.</summary>
    public string Term { get; }

    /// <summary>What failed.</summary>
    public string Reason { get; }
}
