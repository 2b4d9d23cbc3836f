using System.Collections.Immutable;
using System.Text;

namespace Integrable.Clusters;

/// <summary>The exchange relation of a seed in one direction k, as data:
/// x_k·x_k' = Π_i x_i^{p_i} + Π_i x_i^{q_i}, with p_i = [b_ik]₊ and q_i = [−b_ik]₊ over the n mutable
/// and m frozen variables x_1, …, x_{n+m}.</summary>
/// <remarks>Exponent vectors have length n + m; position p holds the exponent of x_{p+1}. At most one
/// of p_i, q_i is non-zero for each i, and p_k = q_k = 0.</remarks>
/// <example><code>
/// var r = ExchangeMatrix.Parse("[[0,-1,2,-1],[1,0,-3,2],[-2,3,0,-1],[1,-2,1,0]]").ExchangeRelation(1);
/// // r.ToString() == "x_1 x_1' = x_2 x_4 + x_3^2"
/// </code></example>
public sealed class ExchangeRelation : IEquatable<ExchangeRelation>
{
    internal ExchangeRelation(int direction, int mutableCount, int[] plus, int[] minus)
    {
        Direction = direction;
        MutableCount = mutableCount;
        PlusExponents = ImmutableArray.Create(plus);
        MinusExponents = ImmutableArray.Create(minus);
    }

    /// <summary>The 1-based direction k.</summary>
    public int Direction { get; }

    /// <summary>n, the number of mutable variables (the rest of the exponent vector is frozen).</summary>
    public int MutableCount { get; }

    /// <summary>Exponents [b_ik]₊ of the first monomial (position p: variable x_{p+1}).</summary>
    public ImmutableArray<int> PlusExponents { get; }

    /// <summary>Exponents [−b_ik]₊ of the second monomial (position p: variable x_{p+1}).</summary>
    public ImmutableArray<int> MinusExponents { get; }

    /// <summary>Text such as <c>x_1 x_1' = x_2 x_4 + x_3^2</c>; frozen variables are x_{n+1}, …, x_{n+m}.</summary>
    /// <returns>The relation as text.</returns>
    public override string ToString() =>
        $"x_{Direction} x_{Direction}' = {Monomial(PlusExponents)} + {Monomial(MinusExponents)}";

    private static string Monomial(ImmutableArray<int> exponents)
    {
        var sb = new StringBuilder();
        for (int i = 0; i < exponents.Length; i++)
        {
            if (exponents[i] == 0) continue;
            if (sb.Length > 0) sb.Append(' ');
            sb.Append("x_").Append(i + 1);
            if (exponents[i] != 1) sb.Append('^').Append(exponents[i]);
        }
        return sb.Length == 0 ? "1" : sb.ToString();
    }

    /// <inheritdoc/>
    public bool Equals(ExchangeRelation? other) =>
        other is not null && other.Direction == Direction && other.MutableCount == MutableCount
        && other.PlusExponents.AsSpan().SequenceEqual(PlusExponents.AsSpan())
        && other.MinusExponents.AsSpan().SequenceEqual(MinusExponents.AsSpan());

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as ExchangeRelation);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(Direction);
        foreach (int e in PlusExponents) h.Add(e);
        foreach (int e in MinusExponents) h.Add(e);
        return h.ToHashCode();
    }
}
