namespace Integrable.Solutions;

/// <summary>Thrown when a series solution cannot be computed: the g-adic iteration does not converge or does not apply,
/// with the reason.</summary>
public sealed class SeriesConvergenceException : ArithmeticException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="reason">Why the iteration fails, in one sentence.</param>
    /// <param name="precision">The g-adic precision reached before the failure (0 when none).</param>
    public SeriesConvergenceException(string reason, int precision) : base(reason)
    {
        Reason = reason;
        Precision = precision;
    }

    /// <summary>Why the iteration fails.</summary>
    public string Reason { get; }

    /// <summary>The g-adic precision reached (the solution was known modulo g^Precision).</summary>
    public int Precision { get; }
}
