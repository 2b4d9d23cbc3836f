namespace Integrable.Algebra;

/// <summary>Thrown when an operation mixes elements of different rings (different variables, moduli
/// or precisions) that were not explicitly unified.</summary>
public sealed class IncompatibleRingException : ArgumentException
{
    /// <summary>Creates the exception with a message naming both rings.</summary>
    /// <param name="message">What was mixed.</param>
    public IncompatibleRingException(string message) : base(message) { }
}
