namespace Integrable.Text;

/// <summary>A node of the syntax tree of an arithmetic expression as typed by a researcher: numbers,
/// symbols (possibly subscripted), sums, products with quotients, integer powers and negation.</summary>
/// <remarks>
/// <para>Nodes are immutable and validated by their constructors, so every tree can be printed by
/// <see cref="ExpressionFormatter.ToText(Expression)"/> and read back by
/// <see cref="ExpressionParser.Parse(string)"/> to an equal tree.</para>
/// <para>Equality is structural and ignores <see cref="Span"/>: <c>Parse("x+1") == Parse("x + 1")</c>.
/// Brackets are not nodes, but they are kept as nesting: <c>a + (b + c)</c> is a sum whose second term is a
/// sum, which differs from the flat sum <c>a + b + c</c>.</para>
/// <para>Every tree has <see cref="Depth"/> at most <see cref="MaxDepth"/>, so walking it recursively is safe.</para>
/// <para>The node types are exactly the six records of this namespace: <see cref="NumberExpression"/>,
/// <see cref="SymbolExpression"/>, <see cref="NegationExpression"/>, <see cref="SumExpression"/>,
/// <see cref="ProductExpression"/> and <see cref="PowerExpression"/>.</para>
/// </remarks>
/// <example><code>
/// Expression e = ExpressionParser.Parse("x_{n+1} x_{n-1} - x_n^2");
/// string text = e.ToString();             // "x_{n+1}*x_{n-1} - x_n^2"
/// </code></example>
public abstract record Expression
{
    /// <summary>The largest allowed <see cref="Depth"/> of a tree.</summary>
    public const int MaxDepth = 1000;

    /// <summary>Initialises the span and the depth.</summary>
    /// <param name="span">Where the node was read from.</param>
    /// <param name="depth">The depth of the node (1 for leaves).</param>
    /// <exception cref="ArgumentException"><paramref name="depth"/> exceeds <see cref="MaxDepth"/>.</exception>
    private protected Expression(SourceSpan span, int depth)
    {
        if (depth > MaxDepth)
            throw new ArgumentException($"The expression would be nested deeper than {MaxDepth} levels.");
        Span = span;
        Depth = depth;
    }

    /// <summary>Where the node was read from (brackets around it included), or <see cref="SourceSpan.None"/>.</summary>
    public SourceSpan Span { get; private protected init; }

    /// <summary>Number of nodes on the longest path from this node down to a leaf (1 for a leaf).</summary>
    public int Depth { get; }

    /// <summary>Structural equality that ignores spans.</summary>
    /// <param name="other">The other expression.</param>
    /// <returns>True when both trees have the same shape, numbers and symbols.</returns>
    public virtual bool Equals(Expression? other) => other is not null && EqualityContract == other.EqualityContract;

    /// <summary>A hash consistent with <see cref="Equals(Expression)"/>.</summary>
    /// <returns>The hash code.</returns>
    public override int GetHashCode() => EqualityContract.GetHashCode();

    /// <summary>The canonical plain text, as <see cref="ExpressionFormatter.ToText(Expression)"/>.</summary>
    /// <returns>Text that parses back to an equal expression.</returns>
    public sealed override string ToString() => ExpressionFormatter.ToText(this);

    /// <summary>How tightly the node binds when printed: 1 sum, 2 product, 3 negation, 4 power, 5 number or symbol.
    /// Being internal and abstract, it also keeps the set of node types closed to this assembly.</summary>
    internal abstract int BindingLevel { get; }

    /// <summary>The same node with another span (used by the parser to include brackets).</summary>
    internal Expression WithSpan(SourceSpan span) => this with { Span = span };

    /// <summary>1 + the largest depth among <paramref name="children"/>.</summary>
    private protected static int DepthAbove<TItem>(IReadOnlyList<TItem> children, Func<TItem, Expression> select)
    {
        int depth = 0;
        for (int i = 0; i < children.Count; i++) depth = Math.Max(depth, select(children[i]).Depth);
        return depth + 1;
    }
}
