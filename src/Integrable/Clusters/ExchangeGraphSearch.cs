using System.Runtime.CompilerServices;

namespace Integrable.Clusters;

/// <summary>Breadth-first search over seeds, shared by the fingerprint and the exact explorations.</summary>
/// <remarks>
/// Cluster variables are interned: each distinct value gets an id. Seed s is stored in flat buffers as
/// the ids at its n mutable positions, the same ids sorted (its cluster as a set, the search key), and
/// its row-major (n + m)×n exchange matrix. Seeds are numbered in the order they are found, which is
/// breadth-first order, so the queue is just a cursor. Lookups of a candidate cluster go through an
/// alternate span key and allocate nothing; only new seeds write to the buffers.
/// </remarks>
/// <typeparam name="T">The value type of a cluster variable.</typeparam>
internal abstract class ExchangeGraphSearch<T> where T : notnull
{
    private readonly Dictionary<T, int> _ids;
    private int _n, _cells, _count;
    private int[] _idBuf = [], _keyBuf = [], _matBuf = [], _hash = [], _depth = [], _parentDirection = [];

    protected ExchangeGraphSearch(IEqualityComparer<T>? comparer) => _ids = new Dictionary<T, int>(comparer);

    /// <summary>Distinct cluster variable values, indexed by id.</summary>
    protected List<T> Values { get; } = new();

    /// <summary>Hook called when a value is given an id (e.g. to cache its inverse).</summary>
    protected virtual void OnRegistered(int id, T value) { }

    /// <summary>The new variable of μ_k (0-based k) of the seed whose mutable positions hold the ids
    /// <paramref name="ids"/> and whose row-major matrix is <paramref name="b"/>; <paramref name="depth"/>
    /// is the depth of the new seed.</summary>
    protected abstract T Exchange(int[] ids, int[] b, int k, int depth);

    /// <summary>Thrown when the new variable of a mutation has the same value as a variable of the seed
    /// it comes from, so values cannot identify the variables (a degenerate evaluation point).</summary>
    internal sealed class DegenerateValuesException(int direction, int depth)
        : Exception($"the mutation in direction {direction} at depth {depth} gives a value already present in the seed");

    private int Register(T value)
    {
        int id = Values.Count;
        _ids.Add(value, id);
        Values.Add(value);
        OnRegistered(id, value);
        return id;
    }

    /// <summary>Runs the search from the initial cluster values and matrix.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public (int Seeds, int Variables, bool Complete, int Depth) Run(
        IReadOnlyList<T> initialCluster, ExchangeMatrix matrix, ExplorationOptions options,
        IProgress<ExplorationProgress>? progress, CancellationToken cancellation)
    {
        int n = _n = matrix.MutableCount;
        int cells = _cells = matrix.RowCount * n;
        var ids = new int[n];           // the seed being expanded: ids, sorted ids, matrix
        var sorted = new int[n];
        var b = new int[cells];
        var key = new int[n];           // candidate cluster, sorted
        for (int i = 0; i < n; i++)
        {
            if (_ids.TryGetValue(initialCluster[i], out int same))
                throw new ArgumentException(
                    $"initial cluster variables x_{same + 1} and x_{i + 1} are equal, so they cannot be told apart");
            ids[i] = Register(initialCluster[i]);
        }
        ids.CopyTo(key, 0);
        Array.Sort(key);
        var comparer = new SeedComparer(this);
        var index = new HashSet<int>(comparer);
        var lookup = index.GetAlternateLookup<ReadOnlySpan<int>>();
        Append(ids, key, matrix.Entries, 0, 0);
        index.Add(0);

        int maxDepth = 0;
        bool complete = true;
        int nextReport = 1024;
        int current = 0;
        for (; current < _count && complete; current++)
        {
            cancellation.ThrowIfCancellationRequested();
            int s = current;
            _idBuf.AsSpan(s * n, n).CopyTo(ids);
            _keyBuf.AsSpan(s * n, n).CopyTo(sorted);
            _matBuf.AsSpan(s * cells, cells).CopyTo(b);
            int depth = _depth[s] + 1, parentDirection = _parentDirection[s];
            for (int k = 0; k < n; k++)
            {
                if (k == parentDirection) continue;   // μ_k is an involution: that edge leads back
                T value = Exchange(ids, b, k, depth);
                bool known = _ids.TryGetValue(value, out int id);
                if (known)
                {
                    if (Array.IndexOf(ids, id) >= 0) throw new DegenerateValuesException(k + 1, depth);
                    Replace(sorted, ids[k], id, key);
                    if (lookup.TryGetValue(key, out int t))
                    {
                        // Seeds are expanded in index order. If t < s, t was expanded already and the same edge was
                        // checked from its side (or created s); μ_k is an involution, so one check per edge suffices.
                        if (t > s) Verify(ids, k, id, b, t);
                        continue;
                    }
                }
                // A new seed.
                if (_count >= options.MaxSeeds)
                {
                    complete = false;
                    break;
                }
                if (!known)
                {
                    id = Register(value);
                    Replace(sorted, ids[k], id, key);
                }
                int old = ids[k];
                ids[k] = id;
                index.Add(Append(ids, key, b, k, depth));
                ids[k] = old;
                maxDepth = Math.Max(maxDepth, depth);
                if (progress is not null && _count >= nextReport)
                {
                    nextReport *= 2;
                    progress.Report(new ExplorationProgress(_count, Values.Count, _count - s - 1, maxDepth));
                }
            }
        }
        // When stopped early, the seed being expanded (current − 1 after the loop's increment) and all later
        // ones still have unexamined neighbours.
        int pending = complete ? 0 : _count - (current - 1);
        progress?.Report(new ExplorationProgress(_count, Values.Count, pending, maxDepth));
        return (_count, Values.Count, complete, maxDepth);
    }

    /// <summary>Appends a seed with the given ids and sorted ids, whose matrix is μ_k of
    /// <paramref name="parentMatrix"/> (or <paramref name="parentMatrix"/> itself when
    /// <paramref name="depth"/> is 0), and returns its index.</summary>
    private int Append(int[] ids, int[] key, ReadOnlySpan<int> parentMatrix, int k, int depth)
    {
        int n = _n, cells = _cells, s = _count;
        if (s == _depth.Length)
        {
            int capacity = Math.Max(16, 2 * s);
            Array.Resize(ref _idBuf, capacity * n);
            Array.Resize(ref _keyBuf, capacity * n);
            Array.Resize(ref _matBuf, capacity * cells);
            Array.Resize(ref _hash, capacity);
            Array.Resize(ref _depth, capacity);
            Array.Resize(ref _parentDirection, capacity);
        }
        ids.CopyTo(_idBuf.AsSpan(s * n, n));
        key.CopyTo(_keyBuf.AsSpan(s * n, n));
        var dst = _matBuf.AsSpan(s * cells, cells);
        if (depth == 0) parentMatrix.CopyTo(dst);
        else ExchangeMatrix.MutateInto(parentMatrix, dst, n, cells / n, k);
        _hash[s] = Hash(key);
        _depth[s] = depth;
        _parentDirection[s] = depth == 0 ? -1 : k;
        _count = s + 1;
        return s;
    }

    /// <summary>Writes the sorted ids <paramref name="sorted"/> with <paramref name="oldId"/> replaced by
    /// <paramref name="newId"/> into <paramref name="result"/>, keeping it sorted.</summary>
    private static void Replace(int[] sorted, int oldId, int newId, int[] result)
    {
        int w = 0;
        bool placed = false;
        foreach (int x in sorted)
        {
            if (x == oldId) continue;
            if (!placed && newId < x) { result[w++] = newId; placed = true; }
            result[w++] = x;
        }
        if (!placed) result[w] = newId;
    }

    /// <summary>Checks that a seed reached again — μ_k of the seed (<paramref name="ids"/>,
    /// <paramref name="parent"/>), whose new variable has id <paramref name="newId"/> — has the matrix
    /// recorded for seed <paramref name="t"/> up to the relabelling that matches the clusters.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void Verify(int[] ids, int k, int newId, int[] parent, int t)
    {
        int n = _n, rows = _cells / n;
        var recordedIds = _idBuf.AsSpan(t * n, n);
        var recorded = _matBuf.AsSpan(t * _cells, _cells);
        Span<int> pi = n <= 256 ? stackalloc int[n] : new int[n];
        for (int i = 0; i < n; i++)
            pi[i] = recordedIds.IndexOf(i == k ? newId : ids[i]);
        for (int i = 0; i < rows; i++)
        {
            int ri = i < n ? pi[i] : i;
            for (int j = 0; j < n; j++)
                if (ExchangeMatrix.MutatedEntry(parent, n, k, i, j) != recorded[ri * n + pi[j]])
                    throw new InvalidOperationException(
                        "two seeds with the same cluster have exchange matrices that differ by more than the matching " +
                        "relabelling; either cluster variables collided in the fingerprints (a negligible chance, see " +
                        "ExchangeGraph) or the seed is not determined by its cluster");
        }
    }

    private static int Hash(ReadOnlySpan<int> sortedIds)
    {
        var h = new HashCode();
        foreach (int x in sortedIds) h.Add(x);
        return h.ToHashCode();
    }

    /// <summary>Seeds compared by their clusters (sorted ids in the key buffer), with span lookups.</summary>
    private sealed class SeedComparer(ExchangeGraphSearch<T> search)
        : IEqualityComparer<int>, IAlternateEqualityComparer<ReadOnlySpan<int>, int>
    {
        private ReadOnlySpan<int> Key(int s) => search._keyBuf.AsSpan(s * search._n, search._n);

        public bool Equals(int x, int y) => x == y || Key(x).SequenceEqual(Key(y));

        public int GetHashCode(int s) => search._hash[s];

        public bool Equals(ReadOnlySpan<int> alternate, int other) => alternate.SequenceEqual(Key(other));

        public int GetHashCode(ReadOnlySpan<int> alternate) => Hash(alternate);

        /// <summary>Seeds are added by index, never through the span key.</summary>
        public int Create(ReadOnlySpan<int> alternate) =>
            throw new InvalidOperationException("seeds are added to the index by number, not by cluster");
    }
}
