using System.Collections.Immutable;
using System.Text;

namespace Integrable.Clusters;

/// <summary>One exchange relation of a <see cref="ClusterRecurrence"/>, written in terms of earlier
/// terms of the sequence: x_j·x_{j−d} = Π_ℓ x_{j−ℓ}^{p_ℓ}·Π_f y_f^{P_f} + Π_ℓ x_{j−ℓ}^{q_ℓ}·Π_f y_f^{Q_f},
/// where y_1, …, y_m are the frozen variables (constant along the sequence).</summary>
/// <remarks>Lag vectors have length <see cref="ClusterRecurrence.Order"/> + <see cref="ClusterRecurrence.Period"/> − 1;
/// position ℓ − 1 holds the exponent of x_{j−ℓ}. Coefficient vectors have length m; position f − 1
/// holds the exponent of y_f.</remarks>
/// <example><code>
/// var r = MutationPeriodicity.FindRecurrence(somos4Matrix)!.Relations[0];
/// // r.DivisorLag == 4, r.PlusExponents == [1, 0, 1, 0], r.MinusExponents == [0, 2, 0, 0]
/// </code></example>
public sealed class RecurrenceRelation : IEquatable<RecurrenceRelation>
{
    internal RecurrenceRelation(int step, int direction, int divisorLag, int[] plus, int[] minus, int[] plusFrozen, int[] minusFrozen)
    {
        Step = step;
        Direction = direction;
        DivisorLag = divisorLag;
        PlusExponents = ImmutableArray.Create(plus);
        MinusExponents = ImmutableArray.Create(minus);
        PlusFrozenExponents = ImmutableArray.Create(plusFrozen);
        MinusFrozenExponents = ImmutableArray.Create(minusFrozen);
    }

    /// <summary>The 1-based step t within the period: this relation gives x_j for j = N + t + p·r
    /// (N the order, r the period, p = 0, 1, 2, …).</summary>
    public int Step { get; }

    /// <summary>The 1-based mutation direction of this step in the seed.</summary>
    public int Direction { get; }

    /// <summary>d: the new term x_j multiplies x_{j−d}, the variable it replaces.</summary>
    public int DivisorLag { get; }

    /// <summary>Exponents of x_{j−ℓ} (position ℓ − 1) in the first monomial.</summary>
    public ImmutableArray<int> PlusExponents { get; }

    /// <summary>Exponents of x_{j−ℓ} (position ℓ − 1) in the second monomial.</summary>
    public ImmutableArray<int> MinusExponents { get; }

    /// <summary>Exponents of the frozen variables y_f (position f − 1) in the first monomial.</summary>
    public ImmutableArray<int> PlusFrozenExponents { get; }

    /// <summary>Exponents of the frozen variables y_f (position f − 1) in the second monomial.</summary>
    public ImmutableArray<int> MinusFrozenExponents { get; }

    /// <summary>The relation with n = j − d, e.g. <c>x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2</c>;
    /// frozen variables are written y_1, y_2, ….</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        $"{Term(DivisorLag)} {Term(0)} = {Monomial(PlusExponents, PlusFrozenExponents)} + {Monomial(MinusExponents, MinusFrozenExponents)}";

    /// <summary>x_{n+offset} in text.</summary>
    private static string Term(int offset) => offset switch
    {
        0 => "x_n",
        > 0 => $"x_{{n+{offset}}}",
        _ => $"x_{{n-{-offset}}}",
    };

    private string Monomial(ImmutableArray<int> lags, ImmutableArray<int> frozen)
    {
        var sb = new StringBuilder();
        for (int f = 0; f < frozen.Length; f++)
            Append(sb, $"y_{f + 1}", frozen[f]);
        // Latest term first: lag 1, 2, … is offset d − 1, d − 2, … from n.
        for (int l = 1; l <= lags.Length; l++)
            Append(sb, Term(DivisorLag - l), lags[l - 1]);
        return sb.Length == 0 ? "1" : sb.ToString();
    }

    private static void Append(StringBuilder sb, string name, int exponent)
    {
        if (exponent == 0) return;
        if (sb.Length > 0) sb.Append(' ');
        sb.Append(name);
        if (exponent != 1) sb.Append('^').Append(exponent);
    }

    /// <inheritdoc/>
    public bool Equals(RecurrenceRelation? other) =>
        other is not null && other.Step == Step && other.Direction == Direction && other.DivisorLag == DivisorLag
        && other.PlusExponents.AsSpan().SequenceEqual(PlusExponents.AsSpan())
        && other.MinusExponents.AsSpan().SequenceEqual(MinusExponents.AsSpan())
        && other.PlusFrozenExponents.AsSpan().SequenceEqual(PlusFrozenExponents.AsSpan())
        && other.MinusFrozenExponents.AsSpan().SequenceEqual(MinusFrozenExponents.AsSpan());

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as RecurrenceRelation);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(Step);
        h.Add(DivisorLag);
        foreach (int e in PlusExponents) h.Add(e);
        foreach (int e in MinusExponents) h.Add(e);
        return h.ToHashCode();
    }
}
