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
        var dst = new int[_b.Length];
        MutateInto(_b, dst, MutableCount, RowCount, k);
        return new ExchangeMatrix(MutableCount, FrozenCount, dst, _d);
    }

    /// <summary>Kernel: writes μ_k of the row-major <paramref name="rows"/>×<paramref name="n"/> matrix
    /// <paramref name="src"/> into <paramref name="dst"/> (0-based k, unchecked; the spans must not overlap).</summary>
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveOptimization)]
    internal static void MutateInto(ReadOnlySpan<int> src, Span<int> dst, int n, int rows, int k)
    {
        var rowK = src.Slice(k * n, n);
        for (int i = 0; i < rows; i++)
        {
            var row = src.Slice(i * n, n);
            var outRow = dst.Slice(i * n, n);
            int bik = row[k];
            if (i == k)
            {
                for (int j = 0; j < n; j++) outRow[j] = -row[j];
                continue;
            }
            if (bik == 0)
            {
                // b'_ij = b_ij for j ≠ k, and b'_ik = −0 = 0.
                row.CopyTo(outRow);
                continue;
            }
            for (int j = 0; j < n; j++)
                outRow[j] = Mutated(row[j], bik, rowK[j], i, j, k);
            outRow[k] = -bik;
        }
    }

    /// <summary>Entry (0-based <paramref name="i"/>, <paramref name="j"/>) of μ_k(B̃) without building it.</summary>
    internal int MutatedEntry(int k, int i, int j) => MutatedEntry(_b, MutableCount, k, i, j);

    /// <summary>Kernel: entry (i, j) of μ_k of the row-major matrix <paramref name="b"/> with <paramref name="n"/> columns.</summary>
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveInlining)]
    internal static int MutatedEntry(ReadOnlySpan<int> b, int n, int k, int i, int j)
    {
        int bij = b[i * n + j];
        if (i == k || j == k) return -bij;
        return Mutated(bij, b[i * n + k], b[k * n + j], i, j, k);
    }

    /// <summary>b_ij + (|b_ik| b_kj + b_ik |b_kj|)/2 for i, j ≠ k, checked to fit in 32 bits (and not
    /// to be <see cref="int.MinValue"/>).</summary>
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveInlining)]
    private static int Mutated(int bij, int bik, int bkj, int i, int j, int k)
    {
        // The correction is non-zero only when b_ik and b_kj have the same sign; it is then b_ik·b_kj·sign.
        if (bik == 0 || bkj == 0 || (bik ^ bkj) < 0) return bij;
        long v = bij + (bik > 0 ? (long)bik * bkj : -(long)bik * bkj);
        if (v > int.MaxValue || v <= int.MinValue) ThrowEntryOverflow(v, i, j, k);
        return (int)v;
    }

    private static void ThrowEntryOverflow(long v, int i, int j, int k) =>
        throw new OverflowException(
            $"mutation in direction {k + 1} makes entry b_{i + 1},{j + 1} = {v}, which does not fit in 32 bits");
}
