namespace Integrable.Text;

/// <summary>A sum of at least two terms, each added or subtracted, evaluated left to right:
/// <c>a - b + c</c> has the terms (+a, −b, +c).</summary>
/// <remarks>The first term is never subtracted (a leading minus is a <see cref="NegationExpression"/>).
/// A bracketed sum inside a sum stays a nested node.</remarks>
/// <example><code>
/// var e = new SumExpression([new(new SymbolExpression("x")), new(new NumberExpression(1), IsSubtracted: true)]);
/// // prints as x - 1
/// </code></example>
public sealed record SumExpression : Expression
{
    private readonly SumTerm[] _terms;
    private readonly IReadOnlyList<SumTerm> _view;

    /// <summary>Creates a sum.</summary>
    /// <param name="terms">At least two terms; the first is not subtracted.</param>
    /// <param name="span">Where it was read from.</param>
    /// <exception cref="ArgumentException">Fewer than two terms, a subtracted first term, a null term, or a tree deeper than <see cref="Expression.MaxDepth"/>.</exception>
    public SumExpression(IEnumerable<SumTerm> terms, SourceSpan span = default)
        : this(span, Validate([.. terms ?? throw new ArgumentNullException(nameof(terms))])) { }

    private SumExpression(SourceSpan span, SumTerm[] terms) : base(span, DepthAbove(terms, t => t.Value))
    {
        _terms = terms;
        _view = Array.AsReadOnly(terms);
    }

    /// <summary>Creates a sum from an array the caller gives away (the parser), after validation.</summary>
    internal static SumExpression FromOwned(SumTerm[] terms, SourceSpan span) => new(span, Validate(terms));

    /// <summary>The terms in written order.</summary>
    public IReadOnlyList<SumTerm> Terms => _view;

    /// <inheritdoc/>
    internal override int BindingLevel => 1;

    /// <summary>Structural equality (spans ignored).</summary>
    /// <param name="other">The other sum.</param>
    /// <returns>True when the terms and their signs are equal, in order.</returns>
    public bool Equals(SumExpression? other) => other is not null && base.Equals(other) && _terms.AsSpan().SequenceEqual(other._terms);

    /// <summary>A hash of the terms.</summary>
    /// <returns>The hash code.</returns>
    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(base.GetHashCode());
        foreach (var t in _terms) h.Add(t);
        return h.ToHashCode();
    }

    private static SumTerm[] Validate(SumTerm[] terms)
    {
        if (terms.Length < 2) throw new ArgumentException("A sum needs at least two terms.", nameof(terms));
        if (terms[0].IsSubtracted) throw new ArgumentException("The first term of a sum cannot be subtracted; use NegationExpression.", nameof(terms));
        foreach (var t in terms)
            if (t.Value is null) throw new ArgumentException("A sum term is null.", nameof(terms));
        return terms;
    }
}
