using System.Globalization;
using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Text;

/// <summary>Splits input text into tokens. Never throws on bad text: a character that cannot start a token
/// becomes an <see cref="TokenKind.Invalid"/> token, so the parser reports the leftmost problem.</summary>
internal static class Tokenizer
{
    public static List<Token> Tokenize(string input)
    {
        var tokens = new List<Token>(input.Length / 2 + 1);
        int i = 0;
        while (i < input.Length)
        {
            char c = input[i];
            if (char.IsWhiteSpace(c)) { i++; continue; }
            if (IdentifierRules.IsDigit(c)) { tokens.Add(ReadNumber(input, ref i)); continue; }
            if (IdentifierRules.IsLetter(c))
            {
                int start = i;
                while (i < input.Length && (IdentifierRules.IsLetter(input[i]) || IdentifierRules.IsDigit(input[i]))) i++;
                tokens.Add(new Token(TokenKind.Identifier, start, i - start));
                continue;
            }
            var kind = c switch
            {
                '+' => TokenKind.Plus,
                '-' => TokenKind.Minus,
                '*' => TokenKind.Star,
                '/' => TokenKind.Slash,
                '^' => TokenKind.Caret,
                '(' => TokenKind.LeftParen,
                ')' => TokenKind.RightParen,
                '{' => TokenKind.LeftBrace,
                '}' => TokenKind.RightBrace,
                ',' => TokenKind.Comma,
                '=' => TokenKind.EqualsSign,
                '_' => TokenKind.Underscore,
                _ => TokenKind.Invalid,
            };
            if (kind != TokenKind.Invalid) { tokens.Add(new Token(kind, i, 1)); i++; continue; }
            int length = char.IsHighSurrogate(c) && i + 1 < input.Length && char.IsLowSurrogate(input[i + 1]) ? 2 : 1;
            tokens.Add(new Token(TokenKind.Invalid, i, length));
            i += length;
        }
        tokens.Add(new Token(TokenKind.End, input.Length, 0));
        return tokens;
    }

    /// <summary>Scans <c>digits</c> or <c>digits.digits</c>.</summary>
    private static Token ReadNumber(string input, ref int i)
    {
        int start = i;
        while (i < input.Length && IdentifierRules.IsDigit(input[i])) i++;
        if (i + 1 < input.Length && input[i] == '.' && IdentifierRules.IsDigit(input[i + 1]))
        {
            i++;
            while (i < input.Length && IdentifierRules.IsDigit(input[i])) i++;
        }
        return new Token(TokenKind.Number, start, i - start);
    }

    /// <summary>True for a number token written without a decimal point.</summary>
    public static bool IsIntegerLiteral(string input, Token t) => input.AsSpan(t.Start, t.Length).IndexOf('.') < 0;

    /// <summary>The exact value of a number token.</summary>
    public static Rational NumberValue(string input, Token t)
    {
        var text = input.AsSpan(t.Start, t.Length);
        int dot = text.IndexOf('.');
        if (dot < 0) return new Rational(ParseDigits(text));
        var digits = string.Concat(text[..dot], text[(dot + 1)..]);
        return new Rational(ParseDigits(digits), BigInteger.Pow(10, text.Length - dot - 1));
    }

    private static BigInteger ParseDigits(ReadOnlySpan<char> digits) =>
        digits.Length <= 18
            ? long.Parse(digits, NumberStyles.None, CultureInfo.InvariantCulture)
            : BigInteger.Parse(digits, NumberStyles.None, CultureInfo.InvariantCulture);

    /// <summary>Why an <see cref="TokenKind.Invalid"/> token cannot start a token.</summary>
    public static string DescribeInvalid(string input, Token t) => DescribeBadCharacter(input, t.Start, t.Length);

    private static string DescribeBadCharacter(string input, int i, int length)
    {
        char c = input[i];
        if (c == '.')
        {
            bool digitBefore = i > 0 && IdentifierRules.IsDigit(input[i - 1]);
            bool digitAfter = i + 1 < input.Length && IdentifierRules.IsDigit(input[i + 1]);
            if (digitBefore && !digitAfter) return "a decimal point must be followed by a digit";
            if (!digitBefore && digitAfter) return "a decimal number must start with a digit, e.g. 0.5";
            return "unexpected '.'";
        }
        int codePoint = length == 2 ? char.ConvertToUtf32(c, input[i + 1]) : c;
        string shown = char.IsControl(c) || char.IsSurrogate(c) && length == 1
            ? $"U+{codePoint:X4}"
            : $"'{input.Substring(i, length)}' (U+{codePoint:X4})";
        string hint = c switch
        {
            '\u2212' or '\u2013' or '\u2014' => "; use '-'",
            '\u00D7' or '\u00B7' or '\u22C5' or '\u2219' => "; use '*' or a space",
            '\u00F7' or '\u2215' => "; use '/'",
            '\u00B2' or '\u00B3' or '\u00B9' => "; write powers with '^'",
            '[' or ']' => "; use round brackets",
            _ => "",
        };
        return $"unexpected character {shown}{hint}";
    }
}
