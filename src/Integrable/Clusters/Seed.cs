using System.Collections.Immutable;
using System.Text;
using Integrable.Algebra;

namespace Integrable.Clusters;

/// <summary>A seed (x̃, B̃) of a cluster algebra of geometric type: n cluster variables and m frozen
/// (coefficient) variables x_1, …, x_{n+m}, elements of a ring T, together with an
/// <see cref="ExchangeMatrix"/> with n columns and n + m rows.</summary>
/// <typeparam name="T">The ring element type: numbers (<c>Rational</c>, residues of <c>PrimeField</c>)
/// for evaluating at a point, or Laurent polynomials for the exact cluster variables.</typeparam>
/// <remarks>
/// <para>Mutation μ_k (1-based k, 1 ≤ k ≤ n) replaces x_k by
/// x_k' = (Π x_i^[b_ik]₊ + Π x_i^[−b_ik]₊) / x_k (product over all n + m variables), computed with the
/// ring's exact division <see cref="IRing{T}.TryDivide"/>, and mutates B̃
/// (<see cref="ExchangeMatrix.Mutate(int)"/>). A failed division raises
/// <see cref="ExchangeDivisionException"/> naming the direction and the step. Frozen variables never
/// change.</para>
/// <para>To work with the cluster variables themselves, take T = Laurent polynomials over Q in
/// x_1, …, x_{n+m} and start from the seed whose variables are the ring's generators; by the Laurent
/// phenomenon (Fomin–Zelevinsky, Cluster algebras I, 2002, Thm. 3.1) every division is then exact.</para>
/// <para>Instances are immutable. Two seeds are equal when their rings are equal, their matrices are
/// equal and their variables are equal position by position under the ring's
/// <see cref="IRing{T}.AreEqual"/>; the hash code depends on the matrix only.</para>
/// </remarks>
/// <example><code>
/// var b = ExchangeMatrix.Parse("[[0,1],[-1,0]]");
/// var s = new Seed&lt;Rational&gt;(RationalField.Instance, b, [new Rational(2), new Rational(3)]);
/// var t = s.Mutate(1, 2, 1, 2, 1);   // five steps: the variables are (3, 2), the matrix is −B
/// </code></example>
public sealed class Seed<T> : IEquatable<Seed<T>>
{
    private readonly T[] _x;

    /// <summary>Creates a seed.</summary>
    /// <param name="ring">The ring of the variables.</param>
    /// <param name="matrix">The extended exchange matrix, n columns and n + m rows.</param>
    /// <param name="variables">x_1, …, x_{n+m}: the n cluster variables, then the m frozen variables.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">The number of variables is not n + m.</exception>
    public Seed(IRing<T> ring, ExchangeMatrix matrix, IEnumerable<T> variables)
    {
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(matrix);
        ArgumentNullException.ThrowIfNull(variables);
        var x = variables.ToArray();
        if (x.Length != matrix.RowCount)
            throw new ArgumentException(
                $"the exchange matrix has {matrix.MutableCount} mutable and {matrix.FrozenCount} frozen rows, " +
                $"so the seed needs {matrix.RowCount} variables, got {x.Length}", nameof(variables));
        Ring = ring;
        Matrix = matrix;
        _x = x;
    }

    private Seed(IRing<T> ring, ExchangeMatrix matrix, T[] x, bool _)
    {
        Ring = ring;
        Matrix = matrix;
        _x = x;
    }

    /// <summary>The ring of the variables.</summary>
    public IRing<T> Ring { get; }

    /// <summary>The extended exchange matrix B̃.</summary>
    public ExchangeMatrix Matrix { get; }

    /// <summary>n: the number of cluster (mutable) variables.</summary>
    public int MutableCount => Matrix.MutableCount;

    /// <summary>m: the number of frozen variables.</summary>
    public int FrozenCount => Matrix.FrozenCount;

    /// <summary>All variables x_1, …, x_{n+m} (position p holds x_{p+1}).</summary>
    public ImmutableArray<T> Variables => ImmutableArray.Create(_x);

    /// <summary>The cluster: the mutable variables x_1, …, x_n (position p holds x_{p+1}).</summary>
    public ImmutableArray<T> Cluster => ImmutableArray.Create(_x, 0, MutableCount);

    /// <summary>The frozen variables x_{n+1}, …, x_{n+m} (position p holds x_{n+p+1}).</summary>
    public ImmutableArray<T> Frozen => ImmutableArray.Create(_x, MutableCount, FrozenCount);

    /// <summary>The variable x_i.</summary>
    /// <param name="i">1-based index, 1 ≤ i ≤ n + m.</param>
    /// <returns>x_i.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="i"/> is out of range.</exception>
    public T this[int i] =>
        (uint)(i - 1) < (uint)_x.Length
            ? _x[i - 1]
            : throw new ArgumentOutOfRangeException(nameof(i), i, $"variable index must be in 1..{_x.Length}");

    /// <summary>Mutation μ_k in direction <paramref name="k"/>.</summary>
    /// <param name="k">The 1-based direction, 1 ≤ k ≤ n.</param>
    /// <returns>The mutated seed.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="k"/> is out of range.</exception>
    /// <exception cref="ExchangeDivisionException">x_k does not divide the right-hand side in the ring.</exception>
    /// <exception cref="OverflowException">A matrix entry does not fit in 32 bits.</exception>
    public Seed<T> Mutate(int k)
    {
        Matrix.CheckDirection(k, null, nameof(k));
        return MutateAt(k - 1, 1);
    }

    /// <summary>Mutates along a sequence of directions, first to last: μ_{k_r} ∘ … ∘ μ_{k_1}.</summary>
    /// <param name="directions">1-based directions, applied in this order.</param>
    /// <returns>The mutated seed (this seed for an empty sequence).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="directions"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A direction is out of range; the message names the step.</exception>
    /// <exception cref="ExchangeDivisionException">An exchange division fails; the exception names the
    /// direction and the step.</exception>
    /// <exception cref="OverflowException">A matrix entry does not fit in 32 bits.</exception>
    public Seed<T> Mutate(IEnumerable<int> directions)
    {
        ArgumentNullException.ThrowIfNull(directions);
        var s = this;
        int step = 0;
        foreach (int k in directions)
        {
            step++;
            Matrix.CheckDirection(k, step, nameof(directions));
            s = s.MutateAt(k - 1, step);
        }
        return s;
    }

    /// <summary>Mutates along the given directions, first to last.</summary>
    /// <param name="directions">1-based directions, applied in this order.</param>
    /// <returns>The mutated seed.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A direction is out of range; the message names the step.</exception>
    /// <exception cref="ExchangeDivisionException">An exchange division fails.</exception>
    /// <exception cref="OverflowException">A matrix entry does not fit in 32 bits.</exception>
    public Seed<T> Mutate(params int[] directions) => Mutate((IEnumerable<int>)directions);

    /// <summary>Relabels the mutable positions by σ: the variable at position i moves to position σ(i),
    /// and the matrix becomes <see cref="ExchangeMatrix.Permute"/>(σ). Frozen variables stay.</summary>
    /// <param name="sigma">σ as 1-based images (position p holds σ(p + 1)).</param>
    /// <returns>The relabelled seed.</returns>
    /// <exception cref="ArgumentException"><paramref name="sigma"/> is not a permutation of 1…n.</exception>
    public Seed<T> Permute(IReadOnlyList<int> sigma)
    {
        var s = ExchangeMatrix.CheckPermutation(sigma, MutableCount, nameof(sigma));
        var x = (T[])_x.Clone();
        for (int i = 0; i < s.Length; i++) x[s[i]] = _x[i];
        return new Seed<T>(Ring, Matrix.PermuteUnchecked(s), x, true);
    }

    /// <summary>The new variable x_k' of μ_k without building the seed (0-based k, unchecked).</summary>
    internal T ExchangeAt(int k, int step)
    {
        var rhs = RingPower.ExchangeSum(Ring, Matrix.Entries, MutableCount, k, i => _x[i]);
        if (!Ring.TryDivide(rhs, _x[k], out var q))
            throw new ExchangeDivisionException(k + 1, step,
                Ring.IsZero(_x[k]) ? $"x_{k + 1} is zero" : $"x_{k + 1} = {_x[k]} does not divide {rhs}");
        return q;
    }

    private Seed<T> MutateAt(int k, int step)
    {
        var q = ExchangeAt(k, step);
        var x = (T[])_x.Clone();
        x[k] = q;
        return new Seed<T>(Ring, Matrix.MutateAt(k), x, true);
    }

    /// <inheritdoc/>
    public bool Equals(Seed<T>? other)
    {
        if (other is null) return false;
        if (ReferenceEquals(this, other)) return true;
        if (!Equals(Ring, other.Ring) || Matrix != other.Matrix) return false;
        for (int i = 0; i < _x.Length; i++)
            if (!Ring.AreEqual(_x[i], other._x[i])) return false;
        return true;
    }

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as Seed<T>);

    /// <inheritdoc/>
    public override int GetHashCode() => Matrix.GetHashCode();

    /// <summary>Text such as <c>(2, 3; [[0,1],[-1,0]])</c>: the variables, then the matrix; frozen
    /// variables follow a bar, as in <c>(2, 3 | 5; …)</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder("(");
        for (int i = 0; i < _x.Length; i++)
        {
            if (i > 0) sb.Append(i == MutableCount ? " | " : ", ");
            sb.Append(_x[i]);
        }
        return sb.Append("; ").Append(Matrix).Append(')').ToString();
    }
}
