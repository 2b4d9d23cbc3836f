namespace Integrable.Text;

/// <summary>A named quantity, optionally subscripted: <c>g</c>, <c>x_n</c>, <c>x_{n+1}</c>, <c>T_{a+1,n}</c>, <c>α</c>.</summary>
/// <remarks>
/// <para>The subscripts are kept as parsed expressions, so a later layer can read shifts such as <c>n+1</c>.</para>
/// <para><see cref="Name"/> is the canonical text: the base name, then nothing (no subscripts), <c>_s</c> when
/// there is one subscript that is a plain name or a non-negative integer, otherwise <c>_{s1,s2,…}</c> with
/// each subscript in canonical text without spaces. So <c>x_n</c> and <c>x_{n}</c> are both <c>x_n</c>, and
/// <c>T_{ a + 1 , n }</c> is <c>T_{a+1,n}</c>. Two symbols are equal exactly when their names are equal.</para>
/// </remarks>
/// <example><code>
/// var s = (SymbolExpression)ExpressionParser.Parse("x_{ n - 1 }");
/// // s.BaseName == "x", s.Name == "x_{n-1}", s.Subscripts[0] is the sum n - 1
/// </code></example>
public sealed record SymbolExpression : Expression
{
    private static readonly IReadOnlyList<Expression> NoSubscripts = Array.AsReadOnly(Array.Empty<Expression>());

    /// <summary>Creates a symbol.</summary>
    /// <param name="baseName">A letter (ASCII or Greek) followed by letters and digits, e.g. <c>x</c>, <c>R2</c>, <c>β</c>.</param>
    /// <param name="subscripts">The subscript expressions, or null/empty for none.</param>
    /// <param name="span">Where it was read from.</param>
    /// <exception cref="ArgumentException"><paramref name="baseName"/> is not a name, a subscript is null, or the tree is deeper than <see cref="Expression.MaxDepth"/>.</exception>
    public SymbolExpression(string baseName, IEnumerable<Expression>? subscripts = null, SourceSpan span = default)
        : this(span, ValidateName(baseName), Validate(subscripts is null ? [] : [.. subscripts])) { }

    private SymbolExpression(SourceSpan span, string baseName, Expression[] subscripts)
        : base(span, DepthAbove(subscripts, e => e))
    {
        BaseName = baseName;
        Subscripts = subscripts.Length == 0 ? NoSubscripts : Array.AsReadOnly(subscripts);
        Name = ExpressionFormatter.SymbolName(baseName, subscripts);
    }

    /// <summary>Creates a symbol from parts the parser has already checked.</summary>
    internal static SymbolExpression FromOwned(string baseName, Expression[] subscripts, SourceSpan span) => new(span, baseName, subscripts);

    /// <summary>The name without subscripts, e.g. <c>T</c> for <c>T_{a,n}</c>.</summary>
    public string BaseName { get; }

    /// <summary>The subscript expressions in order (empty when there are none).</summary>
    public IReadOnlyList<Expression> Subscripts { get; }

    /// <summary>The canonical name, e.g. <c>x_n</c>, <c>x_{n+1}</c>, <c>T_{a+1,n}</c>.</summary>
    public string Name { get; }

    /// <inheritdoc/>
    internal override int BindingLevel => 5;

    /// <summary>Equality by canonical name (spans ignored).</summary>
    /// <param name="other">The other symbol.</param>
    /// <returns>True when the names are equal.</returns>
    public bool Equals(SymbolExpression? other) => other is not null && Name == other.Name;

    /// <summary>A hash of the canonical name.</summary>
    /// <returns>The hash code.</returns>
    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(Name);

    private static string ValidateName(string baseName)
    {
        ArgumentNullException.ThrowIfNull(baseName);
        if (!IdentifierRules.IsIdentifier(baseName))
            throw new ArgumentException($"'{baseName}' is not a name: use a letter (ASCII or Greek) followed by letters and digits.", nameof(baseName));
        return baseName;
    }

    private static Expression[] Validate(Expression[] subscripts)
    {
        foreach (var s in subscripts)
            if (s is null) throw new ArgumentException("A subscript is null.", nameof(subscripts));
        return subscripts;
    }
}
