using System.Collections.Immutable;

namespace Integrable.Solutions;

/// <summary>A tau substitution x_n = C·Π τ_{n+a_i} / Π τ_{n+c_j}: the unknown of a recursion written as a ratio of
/// shifted tau functions (numerator shifts a_i, denominator shifts c_j, an optional constant factor C).</summary>
/// <param name="Numerator">The shifts a_i of the numerator factors.</param>
/// <param name="Denominator">The shifts c_j of the denominator factors (empty for x_n = τ_n).</param>
/// <param name="HasConstant">Whether a constant factor C multiplies the ratio.</param>
public sealed record TauAnsatz(ImmutableArray<int> Numerator, ImmutableArray<int> Denominator, bool HasConstant)
{
    /// <summary>The identity substitution x_n = τ_n (the equation is its own tau form when it is bilinear).</summary>
    public static TauAnsatz Identity { get; } = new([0], [], false);

    /// <summary>x_n = τ_{n+1} τ_{n−1} / τ_n².</summary>
    public static TauAnsatz SecondDifference { get; } = new([1, -1], [0, 0], false);

    /// <summary>The small family searched by default: the identity, τ_{n+1}τ_{n−1}/τ_n², and the balanced ratios
    /// C·τ_n τ_{n+k} / (τ_{n+i} τ_{n+k−i}) for 2 ≤ k ≤ <paramref name="maxShift"/>, 1 ≤ i ≤ k/2 (balanced: invariant
    /// under the gauge τ_n → a·b^n·τ_n).</summary>
    /// <param name="maxShift">The largest shift k, at least 2.</param>
    /// <returns>The ansätze, simplest first.</returns>
    public static IReadOnlyList<TauAnsatz> SmallFamily(int maxShift = 4)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(maxShift, 2);
        var list = new List<TauAnsatz> { Identity, SecondDifference };
        for (int k = 2; k <= maxShift; k++)
            for (int i = 1; 2 * i <= k; i++)
                list.Add(new TauAnsatz([0, k], [i, k - i], true));
        return list;
    }

    /// <summary>The substitution as text, e.g. <c>R_n = C τ_n τ_{n+3} / (τ_{n+1} τ_{n+2})</c>.</summary>
    /// <param name="unknown">The unknown's name.</param>
    /// <param name="index">The index name.</param>
    /// <param name="constant">The text of the constant (default C).</param>
    /// <returns>Text.</returns>
    public string ToText(string unknown = "x", string index = "n", string constant = "C")
    {
        string num = Product(Numerator, index);
        string den = Product(Denominator, index);
        string lhs = $"{unknown}_{index} = ";
        string c = HasConstant ? constant + " " : "";
        if (Denominator.Length == 0) return lhs + c + num;
        return lhs + c + num + " / " + (den.Contains(' ', StringComparison.Ordinal) ? $"({den})" : den);
    }

    private static string Product(ImmutableArray<int> shifts, string index) =>
        string.Join(" ", shifts.GroupBy(s => s).Select(g => g.Count() == 1 ? TauNames.Term(g.Key, index) : $"{TauNames.Term(g.Key, index)}^{g.Count()}"));

    /// <inheritdoc/>
    public override string ToString() => ToText();
}
