namespace Integrable.RationalFunctions;

/// <summary>Thrown when a rational function has no value where it is asked for one: its denominator
/// vanishes at the evaluation point (a pole, or an indeterminate point where numerator and denominator
/// both vanish), vanishes modulo the prime of a reduction, or becomes zero after a substitution; or a
/// reduction modulo p meets a coefficient whose denominator p divides.</summary>
public sealed class PoleException : ArithmeticException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="message">What has no value, and where.</param>
    public PoleException(string message) : base(message) { }
}
