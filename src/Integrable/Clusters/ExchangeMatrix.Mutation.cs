namespace Integrable.Clusters;

public sealed partial class ExchangeMatrix
{
    /// <summary>Matrix mutation μ_k (Fomin–Zelevinsky, Cluster algebras I, 2002, Def. 4.2):
    /// b'_ij = −b_ij when i = k or j = k, otherwise b'_ij = b_ij + (|b_ik| b_kj + b_ik |b_kj|)/2.
    /// The frozen rows mutate by the same rule; the symmetriser is unchanged.</summary>
    /// <param name="k">The 1-based direction, 1 ≤ k ≤ n.</param>
    /// <returns>μ_k(B̃).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="k"/> is not a mutable direction.</exception>
    /// <exception cref="OverflowException">An entry of the result does not fit in 32 bits.</exception>
    public ExchangeMatrix Mutate(int k)
    {
        CheckDirection(k, null, nameof(k));
        return MutateAt(k - 1);
    }

    /// <summary>Mutates along a sequence of directions, first to last: μ_{k_r} ∘ … ∘ μ_{k_1}.</summary>
    /// <param name="directions">1-based directions k_1, …, k_r, applied in this order.</param>
    /// <returns>The mutated matrix (this matrix for an empty sequence).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="directions"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A direction is out of range; the message names the step.</exception>
    /// <exception cref="OverflowException">An entry does not fit in 32 bits.</exception>
    public ExchangeMatrix Mutate(IEnumerable<int> directions)
    {
        ArgumentNullException.ThrowIfNull(directions);
        var b = this;
        int step = 0;
        foreach (int k in directions)
        {
            step++;
            CheckDirection(k, step, nameof(directions));
            b = b.MutateAt(k - 1);
        }
        return b;
    }

    /// <summary>Mutates along the given directions, first to last.</summary>
    /// <param name="directions">1-based directions, applied in this order.</param>
    /// <returns>The mutated matrix.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A direction is out of range; the message names the step.</exception>
    /// <exception cref="OverflowException">An entry does not fit in 32 bits.</exception>
    public ExchangeMatrix Mutate(params int[] directions) => Mutate((IEnumerable<int>)directions);

    /// <summary>The exchange relation in direction <paramref name="k"/>:
    /// x_k·x_k' = Π x_i^[b_ik]₊ + Π x_i^[−b_ik]₊ over all n + m rows.</summary>
    /// <param name="k">The 1-based direction.</param>
    /// <returns>The two exponent vectors.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="k"/> is not a mutable direction.</exception>
    public ExchangeRelation ExchangeRelation(int k)
    {
        CheckDirection(k, null, nameof(k));
        int n = MutableCount, rows = RowCount;
        var plus = new int[rows];
        var minus = new int[rows];
        for (int i = 0; i < rows; i++)
        {
            int v = _b[i * n + k - 1];
            if (v > 0) plus[i] = v;
            else minus[i] = -v;
        }
        return new ExchangeRelation(k, n, plus, minus);
    }

    /// <summary>Throws unless <paramref name="k"/> is a 1-based mutable direction.</summary>
    /// <param name="k">The direction.</param>
    /// <param name="step">The 1-based step of a sequence, or null for a single mutation.</param>
    /// <param name="paramName">The caller's parameter name.</param>
    internal void CheckDirection(int k, int? step, string paramName)
    {
        if ((uint)(k - 1) >= (uint)MutableCount)
            throw new ArgumentOutOfRangeException(paramName, k,
                step is int s
                    ? $"mutation direction {k} at step {s} is out of range: directions are 1..{MutableCount}"
                    : $"mutation direction {k} is out of range: directions are 1..{MutableCount}");
    }

    /// <summary>μ_k with a 0-based, unchecked direction.</summary>
    internal ExchangeMatrix MutateAt(int k)
    {
        int n = MutableCount, rows = RowCount;
        var src = _b;
        var dst = new int[src.Length];
        for (int i = 0; i < rows; i++)
        {
            int rowOffset = i * n;
            long bik = src[rowOffset + k];
            if (i == k || bik == 0)
            {
                // Row k is negated; a row with b_ik = 0 only has its k-th entry negated (which is 0).
                if (i == k)
                    for (int j = 0; j < n; j++) dst[rowOffset + j] = -src[rowOffset + j];
                else
                    Array.Copy(src, rowOffset, dst, rowOffset, n);
                continue;
            }
            long absBik = Math.Abs(bik);
            int kOffset = k * n;
            for (int j = 0; j < n; j++)
            {
                long bij = src[rowOffset + j];
                if (j == k) { dst[rowOffset + j] = (int)-bij; continue; }
                long bkj = src[kOffset + j];
                long v = bij + (absBik * bkj + bik * Math.Abs(bkj)) / 2;
                if (v > int.MaxValue || v <= int.MinValue)
                    throw new OverflowException(
                        $"mutation in direction {k + 1} makes entry b_{i + 1},{j + 1} = {v}, which does not fit in 32 bits");
                dst[rowOffset + j] = (int)v;
            }
        }
        return new ExchangeMatrix(n, FrozenCount, dst, _d);
    }
}
