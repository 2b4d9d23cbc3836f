namespace Integrable.Clusters;

public sealed partial class ExchangeMatrix
{
    /// <summary>Relabels the mutable directions by a permutation σ of 1…n: the result R has
    /// R[σ(i), σ(j)] = B[i, j] for mutable i, j and R[r, σ(j)] = B[r, j] for frozen rows r (frozen rows
    /// are not moved).</summary>
    /// <param name="sigma">The permutation as its images: position p holds σ(p + 1), 1-based.</param>
    /// <returns>The relabelled matrix.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="sigma"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="sigma"/> is not a permutation of 1…n.</exception>
    public ExchangeMatrix Permute(IReadOnlyList<int> sigma)
    {
        var s = CheckPermutation(sigma, MutableCount, nameof(sigma));
        return PermuteUnchecked(s);
    }

    /// <summary>Finds a relabelling σ of the mutable directions with <paramref name="other"/> =
    /// <c>Permute(σ)</c>, i.e. other[σ(i), σ(j)] = this[i, j] and other[r, σ(j)] = this[r, j] on frozen
    /// rows; the lexicographically first such σ is returned.</summary>
    /// <param name="other">The target matrix.</param>
    /// <returns>σ as 1-based images (position p holds σ(p + 1)), or null when the matrices differ by no
    /// relabelling (including different shapes).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="other"/> is null.</exception>
    /// <remarks>Backtracking over candidate images, pruned by the multiset of entries in each row and
    /// column and by the frozen entries of each column; exponential in the worst case but immediate
    /// for the sizes met in practice (n ≤ 20).</remarks>
    public int[]? FindPermutationTo(ExchangeMatrix other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (other.MutableCount != MutableCount || other.FrozenCount != FrozenCount) return null;
        int n = MutableCount;
        var sigs = new string[n];
        var otherSigs = new string[n];
        for (int i = 0; i < n; i++)
        {
            sigs[i] = Signature(i);
            otherSigs[i] = other.Signature(i);
        }
        var sigma = new int[n];
        var used = new bool[n];
        return Search(0) ? sigma.Select(x => x + 1).ToArray() : null;

        bool Search(int i)
        {
            if (i == n) return true;
            for (int p = 0; p < n; p++)
            {
                if (used[p] || sigs[i] != otherSigs[p]) continue;
                bool ok = true;
                for (int j = 0; j < i && ok; j++)
                    ok = other.At(p, sigma[j]) == At(i, j) && other.At(sigma[j], p) == At(j, i);
                for (int r = n; r < RowCount && ok; r++)
                    ok = other.At(r, p) == At(r, i);
                if (!ok) continue;
                sigma[i] = p;
                used[p] = true;
                if (Search(i + 1)) return true;
                used[p] = false;
            }
            return false;
        }
    }

    /// <summary>A relabelling-invariant description of direction <paramref name="i"/> (0-based).</summary>
    private string Signature(int i)
    {
        int n = MutableCount;
        var row = new int[n];
        var column = new int[n];
        for (int j = 0; j < n; j++)
        {
            row[j] = At(i, j);
            column[j] = At(j, i);
        }
        Array.Sort(row);
        Array.Sort(column);
        var frozen = new int[FrozenCount];
        for (int r = 0; r < FrozenCount; r++) frozen[r] = At(n + r, i);
        return string.Join(',', row) + ";" + string.Join(',', column) + ";" + string.Join(',', frozen);
    }

    /// <summary>Relabelling with 0-based images (σ(i) = <paramref name="sigma"/>[i]), unchecked.</summary>
    internal ExchangeMatrix PermuteUnchecked(int[] sigma)
    {
        int n = MutableCount;
        var dst = new int[_b.Length];
        var d = new long[n];
        for (int i = 0; i < n; i++)
        {
            d[sigma[i]] = _d[i];
            for (int j = 0; j < n; j++)
                dst[sigma[i] * n + sigma[j]] = _b[i * n + j];
        }
        for (int r = n; r < RowCount; r++)
            for (int j = 0; j < n; j++)
                dst[r * n + sigma[j]] = _b[r * n + j];
        return new ExchangeMatrix(n, FrozenCount, dst, d);
    }

    /// <summary>Validates a 1-based permutation of 1…n and returns it 0-based.</summary>
    internal static int[] CheckPermutation(IReadOnlyList<int> sigma, int n, string paramName)
    {
        ArgumentNullException.ThrowIfNull(sigma, paramName);
        if (sigma.Count != n)
            throw new ArgumentException($"a permutation of the {n} mutable directions needs {n} images, got {sigma.Count}", paramName);
        var s = new int[n];
        var seen = new bool[n];
        for (int i = 0; i < n; i++)
        {
            int v = sigma[i];
            if ((uint)(v - 1) >= (uint)n)
                throw new ArgumentException($"image σ({i + 1}) = {v} is out of range 1..{n}", paramName);
            if (seen[v - 1])
                throw new ArgumentException($"image {v} occurs twice, so the list is not a permutation of 1..{n}", paramName);
            seen[v - 1] = true;
            s[i] = v - 1;
        }
        return s;
    }
}
