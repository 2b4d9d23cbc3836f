namespace Integrable.Text;

/// <summary>The kinds of tokens the tokenizer produces.</summary>
internal enum TokenKind
{
    Number,
    Identifier,
    Plus,
    Minus,
    Star,
    Slash,
    Caret,
    LeftParen,
    RightParen,
    LeftBrace,
    RightBrace,
    Comma,
    EqualsSign,
    Underscore,
    /// <summary>A character that cannot start any token; <see cref="Tokenizer.DescribeInvalid"/> says why.</summary>
    Invalid,
    End,
}
