using System.Collections.Immutable;
using System.Text;

namespace Integrable.Clusters;

/// <summary>A quiver without loops or 2-cycles on vertices 1, …, n + m, of which 1, …, n are mutable and
/// n + 1, …, n + m are frozen: the skew-symmetric case of an <see cref="ExchangeMatrix"/>, with
/// b_ij = #(arrows i→j) − #(arrows j→i).</summary>
/// <remarks>
/// <para>Arrows between two frozen vertices carry no information in the exchange matrix and are not
/// allowed. Opposite arrows given to the constructor cancel in pairs (2-cycles are removed), so a
/// quiver is determined by its skew-symmetric matrix and equality compares that matrix.</para>
/// <para>Mutation at a mutable vertex k (Fomin–Zelevinsky, Cluster algebras I, 2002, §4): for every
/// path i→k→j add an arrow i→j, reverse every arrow at k, then remove 2-cycles. It agrees with
/// <see cref="ExchangeMatrix.Mutate(int)"/> on the matrix.</para>
/// </remarks>
/// <example><code>
/// var q = new Quiver(3, 0, [new Arrow(1, 2, 2), new Arrow(2, 3, 2), new Arrow(3, 1, 2)]);   // Markov
/// ExchangeMatrix b = q.ToMatrix();                                                       // [[0,2,-2],[-2,0,2],[2,-2,0]]
/// </code></example>
public sealed class Quiver : IEquatable<Quiver>
{
    private readonly int[] _net;   // _net[i * N + j] = #(i→j) − #(j→i), 0-based, N = n + m
    private readonly int _hash;

    /// <summary>Creates a quiver from its arrows.</summary>
    /// <param name="mutableCount">n ≥ 1, the number of mutable vertices (numbered 1…n).</param>
    /// <param name="frozenCount">m ≥ 0, the number of frozen vertices (numbered n+1…n+m).</param>
    /// <param name="arrows">The arrows; parallel bundles add up and opposite arrows cancel.</param>
    /// <exception cref="ArgumentNullException"><paramref name="arrows"/> is null.</exception>
    /// <exception cref="ArgumentException">A count is out of range, or an arrow has a vertex out of
    /// range, is a loop, joins two frozen vertices, or has multiplicity below 1.</exception>
    public Quiver(int mutableCount, int frozenCount, IEnumerable<Arrow> arrows)
    {
        ArgumentNullException.ThrowIfNull(arrows);
        if (mutableCount < 1) throw new ArgumentException($"a quiver needs at least one mutable vertex, got {mutableCount}", nameof(mutableCount));
        if (frozenCount < 0) throw new ArgumentException($"the number of frozen vertices must be >= 0, got {frozenCount}", nameof(frozenCount));
        MutableCount = mutableCount;
        FrozenCount = frozenCount;
        int N = mutableCount + frozenCount;
        var net = new long[N * N];
        foreach (var a in arrows)
        {
            if ((uint)(a.From - 1) >= (uint)N || (uint)(a.To - 1) >= (uint)N)
                throw new ArgumentException($"arrow {a} has a vertex outside 1..{N}", nameof(arrows));
            if (a.From == a.To) throw new ArgumentException($"arrow {a} is a loop; quivers of cluster algebras have none", nameof(arrows));
            if (a.From > mutableCount && a.To > mutableCount)
                throw new ArgumentException($"arrow {a} joins two frozen vertices (they are {mutableCount + 1}..{N})", nameof(arrows));
            if (a.Multiplicity < 1) throw new ArgumentException($"arrow {a} has multiplicity {a.Multiplicity} < 1", nameof(arrows));
            net[(a.From - 1) * N + a.To - 1] += a.Multiplicity;
            net[(a.To - 1) * N + a.From - 1] -= a.Multiplicity;
        }
        _net = new int[N * N];
        for (int p = 0; p < net.Length; p++)
        {
            if (net[p] > int.MaxValue || net[p] < -int.MaxValue)
                throw new ArgumentException($"arrows between vertices {p / N + 1} and {p % N + 1} number more than {int.MaxValue}", nameof(arrows));
            _net[p] = (int)net[p];
        }
        _hash = Hash();
    }

    private Quiver(int n, int m, int[] net)
    {
        MutableCount = n;
        FrozenCount = m;
        _net = net;
        _hash = Hash();
    }

    /// <summary>The quiver of a skew-symmetric exchange matrix: b_ij arrows i→j when b_ij &gt; 0, for
    /// every row i (frozen rows give arrows to and from frozen vertices) and column j.</summary>
    /// <param name="matrix">The matrix; its principal part must be skew-symmetric.</param>
    /// <returns>The quiver.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="matrix"/> is null.</exception>
    /// <exception cref="ArgumentException">The principal part is skew-symmetrizable but not
    /// skew-symmetric, so it has no quiver (it is a valued quiver).</exception>
    public static Quiver FromMatrix(ExchangeMatrix matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        if (!matrix.IsSkewSymmetric)
            throw new ArgumentException(
                $"the principal part of {matrix} is not skew-symmetric (symmetriser " +
                $"{string.Join(",", matrix.Symmetrizer)}), so it is not the matrix of a quiver", nameof(matrix));
        int n = matrix.MutableCount, m = matrix.FrozenCount, N = n + m;
        var net = new int[N * N];
        for (int i = 0; i < N; i++)
            for (int j = 0; j < n; j++)
            {
                int v = matrix.At(i, j);
                net[i * N + j] = v;
                net[j * N + i] = -v;
            }
        return new Quiver(n, m, net);
    }

    /// <summary>The exchange matrix: b_ij = #(i→j) − #(j→i) for 1 ≤ i ≤ n + m, 1 ≤ j ≤ n.</summary>
    /// <returns>The (n + m)×n matrix.</returns>
    public ExchangeMatrix ToMatrix()
    {
        int n = MutableCount, N = VertexCount;
        var b = new int[N * n];
        for (int i = 0; i < N; i++)
            for (int j = 0; j < n; j++)
                b[i * n + j] = _net[i * N + j];
        var d = new long[n];
        Array.Fill(d, 1L);
        return ExchangeMatrix.CreateUnchecked(n, FrozenCount, b, d);
    }

    /// <summary>n: the number of mutable vertices 1…n.</summary>
    public int MutableCount { get; }

    /// <summary>m: the number of frozen vertices n+1…n+m.</summary>
    public int FrozenCount { get; }

    /// <summary>n + m: the number of vertices.</summary>
    public int VertexCount => MutableCount + FrozenCount;

    /// <summary>Whether a vertex is frozen.</summary>
    /// <param name="vertex">1-based vertex.</param>
    /// <returns>True for n+1…n+m.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="vertex"/> is out of range.</exception>
    public bool IsFrozen(int vertex)
    {
        CheckVertex(vertex, nameof(vertex));
        return vertex > MutableCount;
    }

    /// <summary>The number of arrows from one vertex to another (0 when the arrows go the other way).</summary>
    /// <param name="from">1-based tail.</param>
    /// <param name="to">1-based head.</param>
    /// <returns>max(0, b_from,to).</returns>
    /// <exception cref="ArgumentOutOfRangeException">A vertex is out of range.</exception>
    public int ArrowCount(int from, int to)
    {
        CheckVertex(from, nameof(from));
        CheckVertex(to, nameof(to));
        return Math.Max(0, _net[(from - 1) * VertexCount + to - 1]);
    }

    /// <summary>All arrow bundles, ordered by tail then head, each pair of vertices at most once.</summary>
    public ImmutableArray<Arrow> Arrows
    {
        get
        {
            int N = VertexCount;
            var list = ImmutableArray.CreateBuilder<Arrow>();
            for (int i = 0; i < N; i++)
                for (int j = 0; j < N; j++)
                    if (_net[i * N + j] > 0) list.Add(new Arrow(i + 1, j + 1, _net[i * N + j]));
            return list.ToImmutable();
        }
    }

    /// <summary>Quiver mutation at a mutable vertex.</summary>
    /// <param name="k">1-based mutable vertex, 1 ≤ k ≤ n.</param>
    /// <returns>μ_k of this quiver.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="k"/> is not a mutable vertex.</exception>
    /// <exception cref="OverflowException">An arrow count does not fit in 32 bits.</exception>
    public Quiver Mutate(int k)
    {
        if ((uint)(k - 1) >= (uint)MutableCount)
            throw new ArgumentOutOfRangeException(nameof(k), k, $"mutation vertex {k} is out of range: mutable vertices are 1..{MutableCount}");
        return MutateAt(k - 1);
    }

    /// <summary>Mutates at a sequence of vertices, first to last.</summary>
    /// <param name="vertices">1-based mutable vertices, applied in this order.</param>
    /// <returns>The mutated quiver.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="vertices"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A vertex is not mutable; the message names the step.</exception>
    /// <exception cref="OverflowException">An arrow count does not fit in 32 bits.</exception>
    public Quiver Mutate(IEnumerable<int> vertices)
    {
        ArgumentNullException.ThrowIfNull(vertices);
        var q = this;
        int step = 0;
        foreach (int k in vertices)
        {
            step++;
            if ((uint)(k - 1) >= (uint)MutableCount)
                throw new ArgumentOutOfRangeException(nameof(vertices), k,
                    $"mutation vertex {k} at step {step} is out of range: mutable vertices are 1..{MutableCount}");
            q = q.MutateAt(k - 1);
        }
        return q;
    }

    /// <summary>Mutates at the given vertices, first to last.</summary>
    /// <param name="vertices">1-based mutable vertices, applied in this order.</param>
    /// <returns>The mutated quiver.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A vertex is not mutable; the message names the step.</exception>
    /// <exception cref="OverflowException">An arrow count does not fit in 32 bits.</exception>
    public Quiver Mutate(params int[] vertices) => Mutate((IEnumerable<int>)vertices);

    private Quiver MutateAt(int k)
    {
        int N = VertexCount, n = MutableCount;
        var net = new int[N * N];
        for (int i = 0; i < N; i++)
        {
            for (int j = 0; j < N; j++)
            {
                if (i == j || (i >= n && j >= n)) continue;
                long v = _net[i * N + j];
                if (i == k || j == k) { net[i * N + j] = (int)-v; continue; }
                // Paths i→k→j add arrows i→j; paths j→k→i add arrows j→i.
                long ik = _net[i * N + k], kj = _net[k * N + j];
                long ki = -ik, jk = -kj;
                v += Math.Max(0, ik) * Math.Max(0, kj) - Math.Max(0, jk) * Math.Max(0, ki);
                if (v > int.MaxValue || v < -int.MaxValue)
                    throw new OverflowException($"mutation at {k + 1} makes {Math.Abs(v)} arrows between {i + 1} and {j + 1}");
                net[i * N + j] = (int)v;
            }
        }
        return new Quiver(n, FrozenCount, net);
    }

    private void CheckVertex(int v, string name)
    {
        if ((uint)(v - 1) >= (uint)VertexCount)
            throw new ArgumentOutOfRangeException(name, v, $"vertex must be in 1..{VertexCount}");
    }

    private int Hash()
    {
        var h = new HashCode();
        h.Add(MutableCount);
        h.Add(FrozenCount);
        foreach (int x in _net) h.Add(x);
        return h.ToHashCode();
    }

    /// <inheritdoc/>
    public bool Equals(Quiver? other) =>
        other is not null && other._hash == _hash && other.MutableCount == MutableCount
        && other.FrozenCount == FrozenCount && other._net.AsSpan().SequenceEqual(_net);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as Quiver);

    /// <inheritdoc/>
    public override int GetHashCode() => _hash;

    /// <summary>Value equality.</summary>
    /// <param name="left">First quiver.</param>
    /// <param name="right">Second quiver.</param>
    /// <returns>True when both are null or equal.</returns>
    public static bool operator ==(Quiver? left, Quiver? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Value inequality.</summary>
    /// <param name="left">First quiver.</param>
    /// <param name="right">Second quiver.</param>
    /// <returns>True when not equal.</returns>
    public static bool operator !=(Quiver? left, Quiver? right) => !(left == right);

    /// <summary>Text such as <c>quiver(3 mutable, 0 frozen: 1->2 x2, 2->3 x2, 3->1 x2)</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder($"quiver({MutableCount} mutable, {FrozenCount} frozen: ");
        sb.AppendJoin(", ", Arrows);
        return sb.Append(')').ToString();
    }
}
