namespace Integrable.Text;

/// <summary>One token of the input: its kind and where it is. Number values and error reasons are read from
/// the input on demand (<see cref="Tokenizer.NumberValue"/>, <see cref="Tokenizer.DescribeInvalid"/>), which keeps
/// the token list small.</summary>
internal readonly record struct Token(TokenKind Kind, int Start, int Length)
{
    public int End => Start + Length;
}
