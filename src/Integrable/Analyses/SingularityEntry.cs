using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Analyses;

/// <summary>One term of an orbit started at a singular value: its ε-expansion and its behaviour as
/// ε → 0 — infinite of some order (∞^m), equal to a singular value s up to order m (s^m, e.g. 0 or 0²),
/// or regular (finite and not a singular value).</summary>
/// <example><code>
/// foreach (var e in pattern.Entries) Console.Write(e.Symbol + " ");   // 0 ∞^2 0
/// </code></example>
public sealed class SingularityEntry
{
    internal SingularityEntry(long index, string term, LaurentSeries value, bool isInfinite, Rational? limit, int order)
    {
        Index = index;
        Term = term;
        Value = value;
        IsInfinite = isInfinite;
        Limit = limit;
        Order = order;
    }

    /// <summary>The term's index.</summary>
    public long Index { get; }

    /// <summary>The term's name.</summary>
    public string Term { get; }

    /// <summary>The term as a Laurent series in ε (exact arithmetic, finite precision).</summary>
    public LaurentSeries Value { get; }

    /// <summary>True when the term tends to infinity (negative valuation).</summary>
    public bool IsInfinite { get; }

    /// <summary>The limit as ε → 0 when finite.</summary>
    public Rational? Limit { get; }

    /// <summary>For ∞: the order of the pole; for a singular value s: the order m with x − s ~ ε^m; 0 for a regular term.</summary>
    public int Order { get; }

    /// <summary>True when the term is finite and not a singular value.</summary>
    public bool IsRegular => !IsInfinite && Order == 0;

    /// <summary>The pattern symbol: <c>∞</c>, <c>∞^2</c>, <c>0</c>, <c>0^2</c>, <c>1</c>, or <c>f</c> for a regular term.</summary>
    public string Symbol => IsInfinite ? (Order == 1 ? "∞" : $"∞^{Order}")
        : Order == 0 ? "f"
        : Order == 1 ? Limit!.Value.ToString() : $"{Limit!.Value}^{Order}";

    /// <summary>The symbol in LaTeX.</summary>
    public string LatexSymbol => IsInfinite ? (Order == 1 ? "\\infty" : $"\\infty^{{{Order}}}")
        : Order == 0 ? "f"
        : Order == 1 ? Limit!.Value.ToString() : $"{Limit!.Value}^{{{Order}}}";

    /// <summary>Text such as <c>x_3 = -ε + O(ε^5)  [0]</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => $"{Term} = {Value}  [{Symbol}]";
}
