using Integrable.Numbers;

namespace Integrable.Text;

/// <summary>One token of the input: its kind, where it is, and for numbers the exact value.</summary>
internal readonly record struct Token(TokenKind Kind, int Start, int Length)
{
    public int End => Start + Length;

    /// <summary>Exact value of a number token.</summary>
    public Rational Value { get; init; }

    /// <summary>True for a number written without a decimal point.</summary>
    public bool IsInteger { get; init; }

    /// <summary>Why an <see cref="TokenKind.Invalid"/> token is wrong.</summary>
    public string? Reason { get; init; }
}
