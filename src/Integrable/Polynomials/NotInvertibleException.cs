namespace Integrable.Polynomials;

/// <summary>Thrown when an operation needs the inverse of an element that has none in its ring:
/// a negative power of a Laurent polynomial that is not a monomial, or a negative power of a value
/// that the target ring cannot divide by during substitution or evaluation.</summary>
public sealed class NotInvertibleException : ArithmeticException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="message">What could not be inverted, and where.</param>
    public NotInvertibleException(string message) : base(message) { }
}
