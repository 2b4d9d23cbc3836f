namespace Integrable.Text;

/// <summary>Reads expressions and equations written as on paper: <c>x_{n+1} x_{n-1} = x_n^2 + 1</c>,
/// <c>R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})</c>, <c>3*x^2*y^-1 - 1/2*z + 1</c>.</summary>
/// <remarks>
/// <para><b>Grammar</b> (whitespace is free except around <c>_</c>):</para>
/// <code>
/// equation := sum '=' sum
/// sum      := product (('+' | '-') product)*
/// product  := unary (('*' | '/') unary | unary-without-sign)*      juxtaposition = '*'
/// unary    := ('-' | '+') unary | power
/// power    := primary ('^' unary)?                                  right-associative
/// primary  := number | symbol | '(' sum ')'
/// symbol   := name ('_' (name | integer | '{' sum (',' sum)* '}'))?   no space around '_'
/// name     := letter (letter | digit)*        letter: a-z, A-Z, Greek;  digit: 0-9
/// number   := digit+ ('.' digit+)?            exact; no sign, no exponent notation
/// </code>
/// <para><b>Precedence</b>, tightest first: <c>^</c> (right-associative); unary <c>-</c>/<c>+</c>;
/// <c>*</c>, <c>/</c> and juxtaposition (one level, left-associative); binary <c>+</c>/<c>-</c> (left-associative).
/// So <c>-x^2</c> = −(x²), <c>2^3^2</c> = 2⁹, <c>x^-1</c> = 1/x, <c>a/b c</c> = (a/b)·c and
/// <c>1/2 x</c> = <c>1/2x</c> = (1/2)·x (juxtaposition does <b>not</b> bind tighter than <c>/</c>).
/// Juxtaposition applies when a number, name or <c>(</c> follows an operand: <c>2 x y^3</c>, <c>2x</c>,
/// <c>g R (R + 1)</c>, <c>(x+1)(x-1)</c>, <c>x_n x_{n-1}</c>; a number directly after a number
/// (<c>2 3</c>, <c>x^2 3</c>, <c>x_1 2</c>) is an error. A name runs over letters and digits, so <c>xy</c> is one
/// name; write <c>x y</c> for a product. There are no function calls: <c>f(x)</c> is f·x, and every name is a symbol.
/// There is no exponent notation: <c>2e5</c> is 2·e5.</para>
/// <para><b>Exponents</b> must be constant expressions with an integer value (<c>x^(1+1)</c> is allowed,
/// <c>x^y</c> and <c>x^2.5</c> are not), at most <see cref="PowerExpression.MaxExponent"/> in absolute value.</para>
/// <para><b>Subscripts</b>: <c>x_n</c>, <c>x_1</c>, <c>x_{n+1}</c>, <c>T_{a+1,n}</c>; see
/// <see cref="SymbolExpression.Name"/> for the canonical name (<c>x_n</c> and <c>x_{n}</c> are the same symbol).</para>
/// <para><b>Limits</b>: at most <see cref="MaxNestingDepth"/> nested levels, where each bracket <c>(</c>, brace
/// <c>{</c>, unary sign and <c>^</c> opens a level.</para>
/// <para><b>Errors</b>: every malformed input raises <see cref="ExpressionParseException"/> with the position of the
/// leftmost problem (a UTF-16 index into the input, or its length when the input ends too early).</para>
/// </remarks>
/// <example><code>
/// Expression e = ExpressionParser.Parse("2x y^3 - 1/2 z");
/// Equation q = ExpressionParser.ParseEquation("x_{n+1} x_{n-1} = x_n^2 + 1");
/// IReadOnlyList&lt;Expression&gt; list = ExpressionParser.ParseList("x_n, y_n + 1");
/// </code></example>
public static class ExpressionParser
{
    /// <summary>The largest number of nested levels (brackets, braces, unary signs, exponents).</summary>
    public const int MaxNestingDepth = 200;

    /// <summary>Parses one expression.</summary>
    /// <param name="text">The text, e.g. <c>x_{n+1} + 2 x_n^-1</c>.</param>
    /// <returns>The syntax tree; node spans point into <paramref name="text"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="text"/> is null.</exception>
    /// <exception cref="ExpressionParseException"><paramref name="text"/> is not a well-formed expression.</exception>
    public static Expression Parse(string text) => new Parser(Required(text)).ParseExpression();

    /// <summary>Parses an equation <c>left = right</c> with exactly one <c>=</c>.</summary>
    /// <param name="text">The text, e.g. <c>x_{n+1} x_{n-1} = x_n^2 + 1</c>.</param>
    /// <returns>The equation.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="text"/> is null.</exception>
    /// <exception cref="ExpressionParseException"><paramref name="text"/> is not a well-formed equation.</exception>
    public static Equation ParseEquation(string text) => new Parser(Required(text)).ParseEquation();

    /// <summary>Parses a comma-separated list of expressions (commas inside subscript braces do not split).</summary>
    /// <param name="text">The text, e.g. <c>x_n, y_n + 1, T_{a,n}</c>.</param>
    /// <returns>The expressions in order (at least one).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="text"/> is null.</exception>
    /// <exception cref="ExpressionParseException">An item is malformed or empty.</exception>
    public static IReadOnlyList<Expression> ParseList(string text) => new Parser(Required(text)).ParseExpressionList().AsReadOnly();

    /// <summary>Parses a comma-separated list of equations, e.g. a system of recurrences.</summary>
    /// <param name="text">The text, e.g. <c>x_{n+1} = y_n, y_{n+1} = x_n + 1</c>.</param>
    /// <returns>The equations in order (at least one).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="text"/> is null.</exception>
    /// <exception cref="ExpressionParseException">An item is malformed or empty.</exception>
    public static IReadOnlyList<Equation> ParseEquationList(string text) => new Parser(Required(text)).ParseEquationList().AsReadOnly();

    private static string Required(string text) => text ?? throw new ArgumentNullException(nameof(text));
}
