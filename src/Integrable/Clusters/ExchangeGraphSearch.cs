using System.Runtime.CompilerServices;

namespace Integrable.Clusters;

/// <summary>Breadth-first search over seeds, shared by the fingerprint and the exact explorations.
/// Cluster variables are interned (each distinct value gets an id); a seed is stored as the ids at its
/// n mutable positions plus its exchange matrix, and keyed by the sorted ids (its cluster as a set).</summary>
/// <typeparam name="T">The value type of a cluster variable.</typeparam>
internal abstract class ExchangeGraphSearch<T> where T : notnull
{
    private readonly Dictionary<T, int> _ids;

    protected ExchangeGraphSearch(IEqualityComparer<T>? comparer) => _ids = new Dictionary<T, int>(comparer);

    /// <summary>Distinct cluster variable values, indexed by id.</summary>
    protected List<T> Values { get; } = new();

    /// <summary>Hook called when a value is given an id (e.g. to cache its inverse).</summary>
    protected virtual void OnRegistered(int id, T value) { }

    /// <summary>The new variable of μ_k (0-based k) of the seed with cluster ids <paramref name="ids"/>
    /// and matrix <paramref name="b"/>; <paramref name="depth"/> is the depth of the new seed.</summary>
    protected abstract T Exchange(int[] ids, ExchangeMatrix b, int k, int depth);

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
        IProgress<ExplorationProgress>? progress, CancellationToken cancellationToken)
    {
        int n = matrix.MutableCount;
        var first = new int[n];
        for (int i = 0; i < n; i++)
        {
            if (_ids.ContainsKey(initialCluster[i]))
                throw new ArgumentException(
                    $"initial cluster variables x_{_ids[initialCluster[i]] + 1} and x_{i + 1} are equal, so they cannot be told apart");
            first[i] = Register(initialCluster[i]);
        }

        var seedIds = new List<int[]> { first };          // ids at the n mutable positions
        var seedKeys = new List<int[]> { Sorted(first) };  // the same ids sorted: the cluster as a set
        var seedMatrix = new List<ExchangeMatrix> { matrix };
        var seedDepth = new List<int> { 0 };
        var seedParentDirection = new List<int> { -1 };
        var index = new Dictionary<int[], int>(ClusterComparer.Instance) { [seedKeys[0]] = 0 };
        var lookup = index.GetAlternateLookup<ReadOnlySpan<int>>();
        Span<int> key = n <= 256 ? stackalloc int[n] : new int[n];
        var queue = new Queue<int>();
        queue.Enqueue(0);
        int maxDepth = 0;
        bool complete = true;
        int nextReport = 1024;

        while (queue.Count > 0 && complete)
        {
            cancellationToken.ThrowIfCancellationRequested();
            int s = queue.Dequeue();
            var ids = seedIds[s];
            var sortedIds = seedKeys[s];
            var b = seedMatrix[s];
            int depth = seedDepth[s] + 1;
            for (int k = 0; k < n; k++)
            {
                if (k == seedParentDirection[s]) continue;   // μ_k is an involution: that edge leads back
                T value = Exchange(ids, b, k, depth);
                if (_ids.TryGetValue(value, out int id))
                {
                    if (Array.IndexOf(ids, id) >= 0) throw new DegenerateValuesException(k + 1, depth);
                    Replace(sortedIds, ids[k], id, key);
                    if (lookup.TryGetValue(key, out int t))
                    {
                        // Seeds are expanded in index order. If t < s, t was expanded already and the same edge was
                        // checked from its side (or created s); μ_k is an involution, so one check per edge suffices.
                        if (t > s) Verify(ids, k, id, b, seedIds[t], seedMatrix[t]);
                        continue;
                    }
                }
                // A new seed.
                if (seedIds.Count >= options.MaxSeeds)
                {
                    complete = false;
                    break;
                }
                int newId = id;
                if (!_ids.ContainsKey(value))
                {
                    newId = Register(value);
                    Replace(sortedIds, ids[k], newId, key);
                }
                var newIds = (int[])ids.Clone();
                newIds[k] = newId;
                var newKey = key.ToArray();
                index.Add(newKey, seedIds.Count);
                queue.Enqueue(seedIds.Count);
                seedIds.Add(newIds);
                seedKeys.Add(newKey);
                seedMatrix.Add(b.MutateAt(k));
                seedDepth.Add(depth);
                seedParentDirection.Add(k);
                maxDepth = Math.Max(maxDepth, depth);
                if (progress is not null && seedIds.Count >= nextReport)
                {
                    nextReport *= 2;
                    progress.Report(new ExplorationProgress(seedIds.Count, Values.Count, queue.Count, maxDepth));
                }
            }
        }
        progress?.Report(new ExplorationProgress(seedIds.Count, Values.Count, queue.Count, maxDepth));
        return (seedIds.Count, Values.Count, complete, maxDepth);
    }

    /// <summary>Thrown when the new variable of a mutation has the same value as a variable of the seed
    /// it comes from, so values cannot identify the variables (a degenerate evaluation point).</summary>
    internal sealed class DegenerateValuesException(int direction, int depth)
        : Exception($"the mutation in direction {direction} at depth {depth} gives a value already present in the seed")
    {
    }

    private static int[] Sorted(int[] ids)
    {
        var s = (int[])ids.Clone();
        Array.Sort(s);
        return s;
    }

    /// <summary>Writes the sorted ids <paramref name="sorted"/> with <paramref name="oldId"/> replaced by
    /// <paramref name="newId"/> into <paramref name="result"/>, keeping it sorted.</summary>
    private static void Replace(int[] sorted, int oldId, int newId, Span<int> result)
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
    /// <paramref name="parent"/>), whose new variable has id <paramref name="newId"/> — has the recorded
    /// matrix up to the relabelling that matches the clusters.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void Verify(int[] ids, int k, int newId, ExchangeMatrix parent, int[] recordedIds, ExchangeMatrix recorded)
    {
        int n = ids.Length;
        Span<int> pi = n <= 256 ? stackalloc int[n] : new int[n];
        for (int i = 0; i < n; i++)
            pi[i] = Array.IndexOf(recordedIds, i == k ? newId : ids[i]);
        for (int i = 0; i < parent.RowCount; i++)
        {
            int ri = i < n ? pi[i] : i;
            for (int j = 0; j < n; j++)
                if (parent.MutatedEntry(k, i, j) != recorded.At(ri, pi[j]))
                    throw new InvalidOperationException(
                        "two seeds with the same cluster have exchange matrices that differ by more than the matching " +
                        $"relabelling ({parent.MutateAt(k)} and {recorded}); either cluster variables collided in the fingerprints " +
                        "(a negligible chance, see ExchangeGraph) or the seed is not determined by its cluster");
        }
    }

    /// <summary>Equality of clusters given as sorted id arrays, with span lookups that allocate nothing.</summary>
    private sealed class ClusterComparer : IEqualityComparer<int[]>, IAlternateEqualityComparer<ReadOnlySpan<int>, int[]>
    {
        public static readonly ClusterComparer Instance = new();

        public bool Equals(int[]? x, int[]? y) => x.AsSpan().SequenceEqual(y);

        public int GetHashCode(int[] obj) => Hash(obj);

        public bool Equals(ReadOnlySpan<int> alternate, int[] other) => alternate.SequenceEqual(other);

        public int GetHashCode(ReadOnlySpan<int> alternate) => Hash(alternate);

        public int[] Create(ReadOnlySpan<int> alternate) => alternate.ToArray();

        private static int Hash(ReadOnlySpan<int> ids)
        {
            var h = new HashCode();
            foreach (int x in ids) h.Add(x);
            return h.ToHashCode();
        }
    }
}
