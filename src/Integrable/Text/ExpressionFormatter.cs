using System.Globalization;
using System.Numerics;
using System.Text;
using Integrable.Numbers;

namespace Integrable.Text;

/// <summary>Prints expressions as canonical plain text (which parses back to an equal tree) and as LaTeX.</summary>
/// <remarks>
/// <para>Plain text uses explicit <c>*</c>, spaces around binary <c>+</c> and <c>-</c> only, no spaces elsewhere,
/// and the fewest brackets that keep the tree: <c>3*x^2*y^-1 - 1/2*z + 1</c>, <c>-(a*b)</c>, <c>(x + 1)^2</c>,
/// <c>a + (b + c)</c>. Inside subscripts the text has no spaces at all: <c>x_{n+1}</c>.</para>
/// </remarks>
/// <example><code>
/// string s = ExpressionFormatter.ToText(ExpressionParser.Parse("2x y^3 - 1/2 z"));      // "2*x*y^3 - 1/2*z"
/// string t = ExpressionFormatter.ToLatex(ExpressionParser.Parse("x_{n+1}^2/(x_n + 1)")); // "\frac{x_{n+1}^{2}}{x_{n} + 1}"
/// </code></example>
public static partial class ExpressionFormatter
{
    // Binding levels (Expression.BindingLevel): a child printed where a higher level is required gets brackets.
    private const int SumLevel = 1, ProductLevel = 2, UnaryLevel = 3, PowerLevel = 4, AtomLevel = 5;

    /// <summary>Canonical plain text of <paramref name="expression"/>.</summary>
    /// <param name="expression">The expression.</param>
    /// <returns>Text that <see cref="ExpressionParser.Parse(string)"/> reads back to an equal expression.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="expression"/> is null.</exception>
    public static string ToText(Expression expression)
    {
        ArgumentNullException.ThrowIfNull(expression);
        var sb = new StringBuilder();
        WriteText(sb, expression, SumLevel, compact: false);
        return sb.ToString();
    }

    /// <summary>Canonical plain text <c>left = right</c> of <paramref name="equation"/>.</summary>
    /// <param name="equation">The equation.</param>
    /// <returns>Text that <see cref="ExpressionParser.ParseEquation(string)"/> reads back to an equal equation.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="equation"/> is null.</exception>
    public static string ToText(Equation equation)
    {
        ArgumentNullException.ThrowIfNull(equation);
        return ToText(equation.Left) + " = " + ToText(equation.Right);
    }

    /// <summary>The canonical name of a symbol (see <see cref="SymbolExpression.Name"/>).</summary>
    internal static string SymbolName(string baseName, IReadOnlyList<Expression> subscripts)
    {
        if (subscripts.Count == 0) return baseName;
        if (subscripts.Count == 1 && IsPlainSubscript(subscripts[0]))
            return baseName + "_" + ToCompactText(subscripts[0]);
        var sb = new StringBuilder(baseName).Append("_{");
        for (int i = 0; i < subscripts.Count; i++)
        {
            if (i > 0) sb.Append(',');
            WriteText(sb, subscripts[i], SumLevel, compact: true);
        }
        return sb.Append('}').ToString();
    }

    private static bool IsPlainSubscript(Expression e) =>
        e is SymbolExpression { Subscripts.Count: 0 } || e is NumberExpression { Value.IsInteger: true };

    private static string ToCompactText(Expression e)
    {
        var sb = new StringBuilder();
        WriteText(sb, e, SumLevel, compact: true);
        return sb.ToString();
    }

    private static int Level(Expression e) => e.BindingLevel;

    private static void WriteText(StringBuilder sb, Expression e, int minLevel, bool compact)
    {
        bool brackets = Level(e) < minLevel;
        if (brackets) sb.Append('(');
        switch (e)
        {
            case NumberExpression n:
                sb.Append(FormatNumber(n.Value));
                break;
            case SymbolExpression s:
                sb.Append(s.Name);
                break;
            case NegationExpression g:
                sb.Append('-');
                WriteText(sb, g.Operand, UnaryLevel, compact);
                break;
            case PowerExpression p:
                WriteText(sb, p.Base, AtomLevel, compact);
                sb.Append('^');
                WriteText(sb, p.Exponent, UnaryLevel, compact);
                break;
            case SumExpression sum:
                for (int i = 0; i < sum.Terms.Count; i++)
                {
                    var t = sum.Terms[i];
                    if (i > 0) sb.Append(compact ? (t.IsSubtracted ? "-" : "+") : (t.IsSubtracted ? " - " : " + "));
                    WriteText(sb, t.Value, ProductLevel, compact);
                }
                break;
            case ProductExpression prod:
                for (int i = 0; i < prod.Factors.Count; i++)
                {
                    var f = prod.Factors[i];
                    if (i > 0) sb.Append(f.IsDivisor ? '/' : '*');
                    WriteText(sb, f.Value, UnaryLevel, compact);
                }
                break;
            default:
                throw new InvalidOperationException($"Unknown expression node {e.GetType().Name}.");
        }
        if (brackets) sb.Append(')');
    }

    /// <summary>A literal as digits: <c>12</c>, <c>0.125</c> (the value has a finite decimal form by construction).</summary>
    private static string FormatNumber(Rational value)
    {
        if (value.IsInteger) return value.ToString();
        var num = value.Numerator;
        var den = value.Denominator;
        int twos = 0, fives = 0;
        for (var d = den; d.IsEven; d >>= 1) twos++;
        for (var d = den; (d % 5).IsZero; d /= 5) fives++;
        int places = Math.Max(twos, fives);
        var scaled = num * BigInteger.Pow(10, places) / den;
        var digits = scaled.ToString(CultureInfo.InvariantCulture).PadLeft(places + 1, '0');
        return digits[..^places] + "." + digits[^places..];
    }
}
