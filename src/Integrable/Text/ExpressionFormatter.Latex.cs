using System.Text;

namespace Integrable.Text;

public static partial class ExpressionFormatter
{
    /// <summary>LaTeX markup of <paramref name="expression"/> for display (math mode, without delimiters).</summary>
    /// <param name="expression">The expression.</param>
    /// <returns>Markup such as <c>3\,x^{2} - \frac{1}{2}\,z</c>: quotients as <c>\frac</c> (a product's divisors
    /// gathered in one denominator), subscripts and exponents in braces, factors separated by thin spaces
    /// (<c>\cdot</c> before a factor that starts with a digit), Greek letters and spelled Greek names (<c>alpha</c>) as commands,
    /// other multi-letter names in <c>\mathit</c>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="expression"/> is null.</exception>
    public static string ToLatex(Expression expression)
    {
        ArgumentNullException.ThrowIfNull(expression);
        var sb = new StringBuilder();
        WriteLatex(sb, expression, SumLevel);
        return sb.ToString();
    }

    /// <summary>LaTeX markup <c>left = right</c> of <paramref name="equation"/>.</summary>
    /// <param name="equation">The equation.</param>
    /// <returns>The markup.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="equation"/> is null.</exception>
    public static string ToLatex(Equation equation)
    {
        ArgumentNullException.ThrowIfNull(equation);
        return ToLatex(equation.Left) + " = " + ToLatex(equation.Right);
    }

    private static void WriteLatex(StringBuilder sb, Expression e, int minLevel, bool compact = false)
    {
        bool brackets = Level(e) < minLevel;
        if (brackets) sb.Append("\\left(");
        switch (e)
        {
            case NumberExpression n:
                sb.Append(FormatNumber(n.Value));
                break;
            case SymbolExpression s:
                sb.Append(LatexName(s.BaseName));
                if (s.Subscripts.Count > 0)
                {
                    sb.Append("_{");
                    for (int i = 0; i < s.Subscripts.Count; i++)
                    {
                        if (i > 0) sb.Append(',');
                        WriteLatex(sb, s.Subscripts[i], SumLevel, compact: true);
                    }
                    sb.Append('}');
                }
                break;
            case NegationExpression g:
                sb.Append('-');
                WriteLatex(sb, g.Operand, UnaryLevel, compact);
                break;
            case PowerExpression p:
                WriteLatex(sb, p.Base, AtomLevel, compact);
                sb.Append("^{");
                WriteLatex(sb, p.Exponent, SumLevel, compact);
                sb.Append('}');
                break;
            case SumExpression sum:
                for (int i = 0; i < sum.Terms.Count; i++)
                {
                    var t = sum.Terms[i];
                    if (i > 0) sb.Append(compact ? (t.IsSubtracted ? "-" : "+") : (t.IsSubtracted ? " - " : " + "));
                    WriteLatex(sb, t.Value, ProductLevel, compact);
                }
                break;
            case ProductExpression prod:
                WriteLatexProduct(sb, prod);
                break;
            default:
                throw new InvalidOperationException($"Unknown expression node {e.GetType().Name}.");
        }
        if (brackets) sb.Append("\\right)");
    }

    /// <summary>A product without divisors as factors joined by thin spaces; with divisors as one fraction, or as a
    /// numeric fraction followed by the other factors when every divisor is a number (<c>\frac{1}{2}\,z</c>).</summary>
    private static void WriteLatexProduct(StringBuilder sb, ProductExpression prod)
    {
        var numerator = new List<Expression>();
        var denominator = new List<Expression>();
        foreach (var f in prod.Factors) (f.IsDivisor ? denominator : numerator).Add(f.Value);
        if (denominator.Count == 0)
        {
            WriteLatexFactors(sb, numerator);
            return;
        }
        if (denominator.TrueForAll(d => d is NumberExpression))
        {
            var numbers = numerator.FindAll(f => f is NumberExpression);
            var others = numerator.FindAll(f => f is not NumberExpression);
            sb.Append("\\frac{");
            if (numbers.Count == 0) sb.Append('1');
            else WriteLatexFactors(sb, numbers);
            sb.Append("}{");
            WriteLatexFactors(sb, denominator);
            sb.Append('}');
            if (others.Count > 0)
            {
                sb.Append("\\,");
                WriteLatexFactors(sb, others, afterFraction: true);
            }
            return;
        }
        sb.Append("\\frac{");
        if (numerator.Count == 0) sb.Append('1');
        else WriteLatexFactors(sb, numerator);
        sb.Append("}{");
        WriteLatexFactors(sb, denominator);
        sb.Append('}');
    }

    /// <summary>Factors joined by <c>\,</c> (<c>\cdot</c> before a digit). A lone factor needs no brackets unless it
    /// follows a fraction; a negation after another factor or a fraction is bracketed.</summary>
    private static void WriteLatexFactors(StringBuilder sb, List<Expression> factors, bool afterFraction = false)
    {
        if (factors.Count == 1 && !afterFraction)
        {
            WriteLatex(sb, factors[0], SumLevel);
            return;
        }
        for (int i = 0; i < factors.Count; i++)
        {
            bool follows = i > 0 || afterFraction;
            var text = new StringBuilder();
            WriteLatex(text, factors[i], follows && factors[i] is NegationExpression ? PowerLevel : UnaryLevel);
            if (i > 0) sb.Append(char.IsAsciiDigit(text[0]) ? "\\cdot " : "\\,");
            sb.Append(text);
        }
    }

    private static string LatexName(string name)
    {
        if (name.Length == 1) return LatexLetter(name[0]);
        if (SpelledGreek.Contains(name)) return "\\" + name;
        var sb = new StringBuilder("\\mathit{");
        foreach (char c in name)
        {
            var letter = LatexLetter(c);
            sb.Append(letter);
            if (letter[0] == '\\') sb.Append(' '); // end the command name
        }
        return sb.ToString().TrimEnd() + "}";
    }

    private static string LatexLetter(char c) => GreekCommands.TryGetValue(c, out var command) ? command : c.ToString();

    private static readonly HashSet<string> SpelledGreek =
    [
        "alpha", "beta", "gamma", "delta", "epsilon", "varepsilon", "zeta", "eta", "theta", "vartheta", "iota",
        "kappa", "lambda", "mu", "nu", "xi", "pi", "varpi", "rho", "varrho", "sigma", "varsigma", "tau", "upsilon",
        "phi", "varphi", "chi", "psi", "omega",
        "Gamma", "Delta", "Theta", "Lambda", "Xi", "Pi", "Sigma", "Upsilon", "Phi", "Psi", "Omega",
    ];

    private static readonly Dictionary<char, string> GreekCommands = new()
    {
        ['α'] = "\\alpha", ['β'] = "\\beta", ['γ'] = "\\gamma", ['δ'] = "\\delta", ['ε'] = "\\varepsilon",
        ['ϵ'] = "\\epsilon", ['ζ'] = "\\zeta", ['η'] = "\\eta", ['θ'] = "\\theta", ['ϑ'] = "\\vartheta",
        ['ι'] = "\\iota", ['κ'] = "\\kappa", ['λ'] = "\\lambda", ['μ'] = "\\mu", ['ν'] = "\\nu", ['ξ'] = "\\xi",
        ['ο'] = "o", ['π'] = "\\pi", ['ϖ'] = "\\varpi", ['ρ'] = "\\rho", ['ϱ'] = "\\varrho", ['σ'] = "\\sigma",
        ['ς'] = "\\varsigma", ['τ'] = "\\tau", ['υ'] = "\\upsilon", ['φ'] = "\\varphi", ['ϕ'] = "\\phi",
        ['χ'] = "\\chi", ['ψ'] = "\\psi", ['ω'] = "\\omega",
        ['Α'] = "A", ['Β'] = "B", ['Γ'] = "\\Gamma", ['Δ'] = "\\Delta", ['Ε'] = "E", ['Ζ'] = "Z", ['Η'] = "H",
        ['Θ'] = "\\Theta", ['Ι'] = "I", ['Κ'] = "K", ['Λ'] = "\\Lambda", ['Μ'] = "M", ['Ν'] = "N", ['Ξ'] = "\\Xi",
        ['Ο'] = "O", ['Π'] = "\\Pi", ['Ρ'] = "P", ['Σ'] = "\\Sigma", ['Τ'] = "T", ['Υ'] = "\\Upsilon",
        ['Φ'] = "\\Phi", ['Χ'] = "X", ['Ψ'] = "\\Psi", ['Ω'] = "\\Omega",
    };
}
