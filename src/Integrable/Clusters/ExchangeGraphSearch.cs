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

        var seedIds = new List<int[]> { first };
        var seedMatrix = new List<ExchangeMatrix> { matrix };
        var seedDepth = new List<int> { 0 };
        var seedParentDirection = new List<int> { -1 };
        var index = new Dictionary<ClusterKey, int> { [ClusterKey.Of(first)] = 0 };
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
            var b = seedMatrix[s];
            int depth = seedDepth[s] + 1;
            for (int k = 0; k < n; k++)
            {
                if (k == seedParentDirection[s]) continue;   // μ_k is an involution: that edge leads back
                T value = Exchange(ids, b, k, depth);
                var newIds = (int[])ids.Clone();
                bool known = _ids.TryGetValue(value, out int id);
                newIds[k] = known ? id : -1;
                if (known && index.TryGetValue(ClusterKey.Of(newIds), out int t))
                {
                    Verify(newIds, b, k, seedIds[t], seedMatrix[t]);
                    continue;
                }
                // A new seed.
                if (seedIds.Count >= options.MaxSeeds)
                {
                    complete = false;
                    break;
                }
                if (!known) newIds[k] = Register(value);
                index.Add(ClusterKey.Of(newIds), seedIds.Count);
                queue.Enqueue(seedIds.Count);
                seedIds.Add(newIds);
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

    /// <summary>Checks that a seed reached again, μ_k of the seed with matrix <paramref name="parent"/>,
    /// has the recorded matrix up to the relabelling that matches the clusters.</summary>
    private static void Verify(int[] ids, ExchangeMatrix parent, int k, int[] recordedIds, ExchangeMatrix recorded)
    {
        int n = ids.Length;
        Span<int> pi = n <= 64 ? stackalloc int[n] : new int[n];
        for (int i = 0; i < n; i++)
            pi[i] = Array.IndexOf(recordedIds, ids[i]);
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

    /// <summary>A cluster as a set: the sorted ids of its variables.</summary>
    private readonly struct ClusterKey : IEquatable<ClusterKey>
    {
        private readonly int[] _sorted;
        private readonly int _hash;

        private ClusterKey(int[] sorted)
        {
            _sorted = sorted;
            var h = new HashCode();
            foreach (int x in sorted) h.Add(x);
            _hash = h.ToHashCode();
        }

        public static ClusterKey Of(int[] ids)
        {
            var s = (int[])ids.Clone();
            Array.Sort(s);
            return new ClusterKey(s);
        }

        public bool Equals(ClusterKey other) => _hash == other._hash && _sorted.AsSpan().SequenceEqual(other._sorted);

        public override bool Equals(object? obj) => obj is ClusterKey k && Equals(k);

        public override int GetHashCode() => _hash;
    }
}
