namespace Integrable.Text;

/// <summary>Recursive-descent parser over the token list; one instance reads one input. See
/// <see cref="ExpressionParser"/> for the grammar.</summary>
/// <remarks>Each call of <see cref="ParseUnary"/> below the top opens one nesting level (a bracket, a brace,
/// a unary sign or an exponent); <see cref="_depth"/> counts them, so deep input gives a typed error
/// instead of exhausting the stack.</remarks>
internal sealed class Parser
{
    private readonly string _input;
    private readonly List<Token> _tokens;
    private int _index;
    private int _depth = -1;
    private int _lastEnd;
    private TokenKind _lastKind = TokenKind.End;

    public Parser(string input)
    {
        _input = input;
        _tokens = Tokenizer.Tokenize(input);
    }

    private Token Current => _tokens[_index];

    // ---- entry points -------------------------------------------------------------------------

    public Expression ParseExpression()
    {
        RequireNotEmpty();
        var e = ParseSum();
        ExpectEnd();
        return e;
    }

    public Equation ParseEquation()
    {
        RequireNotEmpty();
        var eq = ParseOneEquation();
        ExpectEnd();
        return eq;
    }

    public List<Expression> ParseExpressionList()
    {
        RequireNotEmpty();
        var items = new List<Expression> { ParseSum() };
        while (Current.Kind == TokenKind.Comma)
        {
            Advance();
            items.Add(ParseSum());
        }
        ExpectEnd();
        return items;
    }

    public List<Equation> ParseEquationList()
    {
        RequireNotEmpty();
        var items = new List<Equation> { ParseOneEquation() };
        while (Current.Kind == TokenKind.Comma)
        {
            Advance();
            items.Add(ParseOneEquation());
        }
        ExpectEnd();
        return items;
    }

    private Equation ParseOneEquation()
    {
        var left = ParseSum();
        if (Current.Kind != TokenKind.EqualsSign)
            throw Current.Kind == TokenKind.End ? Error(Current, "expected '=' in an equation") : Unexpected(Current);
        Advance();
        var right = ParseSum();
        if (Current.Kind == TokenKind.EqualsSign) throw Error(Current, "an equation has exactly one '='");
        return new Equation(left, right);
    }

    // ---- grammar ------------------------------------------------------------------------------

    /// <summary>sum := product (('+' | '-') product)*</summary>
    private Expression ParseSum()
    {
        int start = Current.Start;
        var first = ParseProduct();
        if (Current.Kind is not (TokenKind.Plus or TokenKind.Minus)) return first;
        var terms = new List<SumTerm> { new(first) };
        while (Current.Kind is TokenKind.Plus or TokenKind.Minus)
        {
            bool subtract = Advance().Kind == TokenKind.Minus;
            terms.Add(new SumTerm(ParseProduct(), subtract));
        }
        return SumExpression.FromOwned([.. terms], SpanFrom(start));
    }

    /// <summary>product := unary (('*' | '/') unary | juxtaposed-unary)*</summary>
    private Expression ParseProduct()
    {
        int start = Current.Start;
        var first = ParseUnary();
        List<ProductFactor>? factors = null;
        while (true)
        {
            var t = Current;
            bool divisor;
            if (t.Kind is TokenKind.Star or TokenKind.Slash)
            {
                Advance();
                if (t.Kind == TokenKind.Star && Current.Kind == TokenKind.Star && Current.Start == t.End)
                    throw Error(Current, "unexpected '*' (write powers with '^')");
                divisor = t.Kind == TokenKind.Slash;
            }
            else if (t.Kind is TokenKind.Number or TokenKind.Identifier or TokenKind.LeftParen)
            {
                if (t.Kind == TokenKind.Number && _lastKind == TokenKind.Number)
                    throw Error(t, "missing operator between two numbers");
                divisor = false; // juxtaposition: same as '*'
            }
            else break;
            factors ??= [new ProductFactor(first)];
            factors.Add(new ProductFactor(ParseUnary(), divisor));
        }
        return factors is null ? first : ProductExpression.FromOwned([.. factors], SpanFrom(start));
    }

    /// <summary>unary := ('-' | '+') unary | power</summary>
    private Expression ParseUnary()
    {
        var t = Current;
        if (++_depth > ExpressionParser.MaxNestingDepth)
            throw Error(t, $"the expression is nested deeper than {ExpressionParser.MaxNestingDepth} levels");
        Expression result;
        if (t.Kind == TokenKind.Minus)
        {
            Advance();
            var operand = ParseUnary();
            result = new NegationExpression(operand, SpanFrom(t.Start));
        }
        else if (t.Kind == TokenKind.Plus)
        {
            Advance();
            result = ParseUnary();
        }
        else result = ParsePower();
        _depth--;
        return result;
    }

    /// <summary>power := primary ('^' unary)?   (right-associative through unary → power)</summary>
    private Expression ParsePower()
    {
        int start = Current.Start;
        var b = ParsePrimary();
        if (Current.Kind != TokenKind.Caret) return b;
        Advance();
        var exponent = ParseUnary();
        if (!ExponentEvaluator.TryEvaluate(exponent, out int value, out var failure))
            throw Error(failure.Culprit.Span, failure.Reason);
        return PowerExpression.FromChecked(b, exponent, value, SpanFrom(start));
    }

    /// <summary>primary := number | symbol | '(' sum ')'</summary>
    private Expression ParsePrimary()
    {
        var t = Current;
        switch (t.Kind)
        {
            case TokenKind.Number:
                Advance();
                return new NumberExpression(Tokenizer.NumberValue(_input, t), SpanOf(t));
            case TokenKind.Identifier:
                return ParseSymbol();
            case TokenKind.LeftParen:
                Advance();
                var inner = ParseSum();
                if (Current.Kind != TokenKind.RightParen)
                    throw Current.Kind == TokenKind.End ? Error(t, "unclosed '('") : Unexpected(Current);
                Advance();
                return inner.WithSpan(SpanFrom(t.Start));
            default:
                throw Unexpected(t);
        }
    }

    /// <summary>symbol := name ('_' (name | integer | '{' sum (',' sum)* '}'))?   with no space around '_'</summary>
    private Expression ParseSymbol()
    {
        var id = Advance();
        string baseName = _input.Substring(id.Start, id.Length);
        if (Current.Kind != TokenKind.Underscore || Current.Start != id.End)
            return SymbolExpression.FromOwned(baseName, [], SpanOf(id));
        var underscore = Advance();
        var t = Current;
        if (t.Kind == TokenKind.End || t.Start != underscore.End)
            throw new ExpressionParseException(_input, underscore.End, 0, "expected a subscript directly after '_'");
        Expression[] subscripts;
        switch (t.Kind)
        {
            case TokenKind.LeftBrace:
                Advance();
                var list = new List<Expression> { ParseSum() };
                while (Current.Kind == TokenKind.Comma)
                {
                    Advance();
                    list.Add(ParseSum());
                }
                if (Current.Kind != TokenKind.RightBrace)
                    throw Current.Kind == TokenKind.End ? Error(t, "unclosed '{'") : Unexpected(Current);
                Advance();
                subscripts = [.. list];
                break;
            case TokenKind.Identifier:
                Advance();
                subscripts = [SymbolExpression.FromOwned(_input.Substring(t.Start, t.Length), [], SpanOf(t))];
                break;
            case TokenKind.Number when Tokenizer.IsIntegerLiteral(_input, t):
                Advance();
                subscripts = [new NumberExpression(Tokenizer.NumberValue(_input, t), SpanOf(t))];
                break;
            case TokenKind.Number:
                throw Error(t, "a subscript without braces must be a name or an integer; use braces, e.g. x_{...}");
            default:
                throw Error(t, "expected a subscript after '_': a name, an integer or {...}");
        }
        if (Current.Kind == TokenKind.Underscore && Current.Start == _lastEnd)
            throw Error(Current, "a subscript cannot carry its own subscript here; use braces, e.g. x_{a_1}");
        return SymbolExpression.FromOwned(baseName, subscripts, SpanFrom(id.Start));
    }

    // ---- helpers ------------------------------------------------------------------------------

    private Token Advance()
    {
        var t = _tokens[_index];
        if (t.Kind != TokenKind.End) _index++;
        _lastEnd = t.End;
        _lastKind = t.Kind;
        return t;
    }

    private void RequireNotEmpty()
    {
        if (Current.Kind == TokenKind.End) throw Error(Current, "empty input");
    }

    private void ExpectEnd()
    {
        var t = Current;
        switch (t.Kind)
        {
            case TokenKind.End: return;
            case TokenKind.RightParen: throw Error(t, "unmatched ')'");
            case TokenKind.RightBrace: throw Error(t, "unmatched '}'");
            default: throw Unexpected(t);
        }
    }

    private ExpressionParseException Unexpected(Token t) => t.Kind switch
    {
        TokenKind.End => Error(t, "unexpected end of input"),
        TokenKind.Invalid => Error(t, Tokenizer.DescribeInvalid(_input, t)),
        _ => Error(t, $"unexpected '{_input.Substring(t.Start, t.Length)}'"),
    };

    private ExpressionParseException Error(Token t, string reason) => new(_input, t.Start, t.Length, reason);

    private ExpressionParseException Error(SourceSpan span, string reason) => new(_input, span.Start, span.Length, reason);

    private SourceSpan SpanOf(Token t) => new(_input, t.Start, t.Length);

    private SourceSpan SpanFrom(int start) => new(_input, start, _lastEnd - start);
}
