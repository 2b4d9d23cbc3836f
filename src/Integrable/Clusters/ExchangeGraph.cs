using System.Runtime.CompilerServices;
using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Clusters;

/// <summary>Bounded breadth-first exploration of the exchange graph of a seed: the graph whose vertices
/// are seeds up to relabelling of the mutable directions and whose edges are mutations.</summary>
/// <remarks>
/// <para><b>Identification.</b> A cluster variable is identified by its value, and a seed by its
/// cluster (the set of its n cluster variables). A seed is determined by its cluster — for finite type
/// by Fomin–Zelevinsky, Cluster algebras II (2003), and in general for skew-symmetrizable matrices
/// (Gekhtman–Shapiro–Vainshtein conjectured it, 2008; proved by Cao and Li, 2020; from memory). The
/// search still checks it: when a known cluster is reached again, the new exchange matrix must equal
/// the recorded one under the relabelling that matches the cluster variables, else an
/// <see cref="InvalidOperationException"/> reports the contradiction.</para>
/// <para><b>Fingerprints</b> (<see cref="Explore(ExchangeMatrix, ExplorationOptions?, IProgress{ExplorationProgress}?, CancellationToken)"/>).
/// Every variable x_1, …, x_{n+m} of the initial seed is given a pseudo-random non-zero value modulo two
/// primes p, q just below 2^62 (<see cref="Primes.Large"/>), and every cluster variable is represented
/// by its pair of values, computed through the exchange relations. By the Laurent phenomenon
/// (Fomin–Zelevinsky, Cluster algebras I, 2002, Thm. 3.1) two distinct cluster variables u ≠ v differ
/// by N/M with M a monomial and N a non-zero integer polynomial of some degree D; unless p divides
/// every coefficient of N, the Schwartz–Zippel bound gives Pr[N(point) ≡ 0 mod p] ≤ D/(p − 1)
/// ≈ D·2^-62, and the two points are independent, so a false identification of a given pair has
/// probability at most (D·2^-61)². With at most E exchange computations against V distinct variables the
/// total is at most E·V·(D·2^-61)²: for E_8 (E ≈ 10^5, V = 128, D below 100) that is below 2^-80.
/// The exact check is the generic overload run over Laurent polynomials.</para>
/// <para><b>Exact values</b> (<see cref="Explore{T}"/>). The same search over a seed with variables
/// in any ring, identifying variables by exact equality of ring elements. With Laurent polynomials
/// (canonical form, exact division) the identification is exact; with numbers it is a fingerprint at
/// that point.</para>
/// <para>Both searches are deterministic, accept a <see cref="CancellationToken"/> (checked before
/// each seed is expanded) and report <see cref="ExplorationProgress"/> when the number of seeds passes
/// 1024, 2048, 4096, … and once at the end.</para>
/// </remarks>
/// <example><code>
/// var report = ExchangeGraph.Explore(ExchangeMatrix.FiniteType("E8"));
/// // report.SeedCount == 25080, report.ClusterVariableCount == 128, report.Complete
/// </code></example>
public static class ExchangeGraph
{
    private const int Attempts = 3;

    /// <summary>Explores the exchange graph of a cluster algebra given by its exchange matrix,
    /// identifying cluster variables by fingerprints modulo two large primes (see the remarks).</summary>
    /// <param name="matrix">The extended exchange matrix of the initial seed.</param>
    /// <param name="options">Limits; <see cref="ExplorationOptions.Default"/> when null.</param>
    /// <param name="progress">Receives progress reports, or null.</param>
    /// <param name="cancellation">Cancels the search.</param>
    /// <returns>Seed and cluster-variable counts, and whether the exploration is complete.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="matrix"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><see cref="ExplorationOptions.MaxSeeds"/> is below 1.</exception>
    /// <exception cref="OperationCanceledException">The token was cancelled.</exception>
    /// <exception cref="OverflowException">A matrix entry grows beyond 32 bits (infinite type).</exception>
    public static ExchangeGraphReport Explore(
        ExchangeMatrix matrix, ExplorationOptions? options = null,
        IProgress<ExplorationProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(matrix);
        options = CheckOptions(options);
        for (int attempt = 0; attempt < Attempts; attempt++)
        {
            var f = new PrimeField(Primes.Large(2 * attempt));
            var g = new PrimeField(Primes.Large(2 * attempt + 1));
            var random = new Random(options.RandomSeed + attempt);
            var point = new Fingerprint[matrix.RowCount];
            for (int i = 0; i < point.Length; i++)
                point[i] = new Fingerprint((ulong)random.NextInt64(1, (long)f.Modulus), (ulong)random.NextInt64(1, (long)g.Modulus));
            var search = new FingerprintSearch(f, g, point[matrix.MutableCount..]);
            try
            {
                var (seeds, variables, complete, depth) =
                    search.Run(point[..matrix.MutableCount], matrix, options, progress, cancellation);
                return new ExchangeGraphReport(seeds, variables, complete, depth,
                    $"fingerprints: values at pseudo-random points modulo {f.Modulus} and {g.Modulus}");
            }
            catch (FingerprintSearch.ZeroValueException)
            {
                // A cluster variable vanished at the point (probability about D/2^61): choose new primes and points.
            }
            catch (ExchangeGraphSearch<Fingerprint>.DegenerateValuesException)
            {
                // Two variables of one seed collided at the point (equally unlikely): the same remedy.
            }
        }
        throw new InvalidOperationException(
            $"a cluster variable vanished or two collided at the evaluation point in {Attempts} independent attempts; this should not happen");
    }

    /// <summary>Explores the exchange graph from a seed with variables in any ring, identifying cluster
    /// variables by exact equality of ring elements.</summary>
    /// <typeparam name="T">The ring element type.</typeparam>
    /// <param name="initial">The initial seed; its cluster variables must be pairwise distinct.</param>
    /// <param name="options">Limits; <see cref="ExplorationOptions.Default"/> when null (the random seed is unused).</param>
    /// <param name="comparer">Equality of ring elements, which must agree with
    /// <see cref="IRing{T}.AreEqual"/>; the default equality of <typeparamref name="T"/> when null (right
    /// for canonical types such as <c>Rational</c>, residues and Laurent polynomials).</param>
    /// <param name="progress">Receives progress reports, or null.</param>
    /// <param name="cancellation">Cancels the search.</param>
    /// <returns>The counts and the distinct cluster variables found.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="initial"/> is null.</exception>
    /// <exception cref="ArgumentException">Two initial cluster variables are equal, or a mutation gives a
    /// value already present in its seed (the values are not generic enough to identify variables).</exception>
    /// <exception cref="ArgumentOutOfRangeException"><see cref="ExplorationOptions.MaxSeeds"/> is below 1.</exception>
    /// <exception cref="ExchangeDivisionException">An exchange division fails (the step is the search depth).</exception>
    /// <exception cref="OperationCanceledException">The token was cancelled.</exception>
    public static ExchangeGraphExploration<T> Explore<T>(
        Seed<T> initial, ExplorationOptions? options = null, IEqualityComparer<T>? comparer = null,
        IProgress<ExplorationProgress>? progress = null, CancellationToken cancellation = default)
        where T : notnull
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(initial);
        options = CheckOptions(options);
        var search = new RingSearch<T>(initial.Ring, initial.Frozen.ToArray(), comparer);
        int seeds, variables, depth;
        bool complete;
        try
        {
            (seeds, variables, complete, depth) = search.Run(initial.Cluster, initial.Matrix, options, progress, cancellation);
        }
        catch (ExchangeGraphSearch<T>.DegenerateValuesException e)
        {
            throw new ArgumentException(
                $"the values of the initial seed are not generic: {e.Message}, so values cannot tell the cluster variables apart",
                nameof(initial), e);
        }
        var report = new ExchangeGraphReport(seeds, variables, complete, depth,
            $"exact equality of elements of {initial.Ring}");
        return new ExchangeGraphExploration<T>(report, [.. search.FoundValues]);
    }

    private static ExplorationOptions CheckOptions(ExplorationOptions? options)
    {
        options ??= ExplorationOptions.Default;
        if (options.MaxSeeds < 1)
            throw new ArgumentOutOfRangeException(nameof(options), options.MaxSeeds, "MaxSeeds must be at least 1");
        return options;
    }

    /// <summary>A cluster variable's values modulo the two primes.</summary>
    internal readonly record struct Fingerprint(ulong A, ulong B);

    private sealed class FingerprintSearch(PrimeField f, PrimeField g, Fingerprint[] frozen)
        : ExchangeGraphSearch<Fingerprint>(null)
    {
        private readonly List<Fingerprint> _inverse = new();

        internal sealed class ZeroValueException : Exception;

        protected override void OnRegistered(int id, Fingerprint value)
        {
            if (value.A == 0 || value.B == 0) throw new ZeroValueException();
            _inverse.Add(new Fingerprint(f.Inverse(value.A), g.Inverse(value.B)));
        }

        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        protected override Fingerprint Exchange(int[] ids, int[] b, int k, int depth)
        {
            ulong plusA = 1, plusB = 1, minusA = 1, minusB = 1;
            int n = ids.Length, rows = b.Length / n;
            for (int i = 0; i < rows; i++)
            {
                int e = b[i * n + k];
                if (e == 0) continue;
                var v = i < n ? Values[ids[i]] : frozen[i - n];
                if (e > 0)
                {
                    plusA = f.Multiply(plusA, Power(f, v.A, e));
                    plusB = g.Multiply(plusB, Power(g, v.B, e));
                }
                else
                {
                    minusA = f.Multiply(minusA, Power(f, v.A, -e));
                    minusB = g.Multiply(minusB, Power(g, v.B, -e));
                }
            }
            var inv = _inverse[ids[k]];
            return new Fingerprint(f.Multiply(f.Add(plusA, minusA), inv.A), g.Multiply(g.Add(plusB, minusB), inv.B));
        }

        private static ulong Power(PrimeField field, ulong x, int e) => e switch
        {
            1 => x,
            2 => field.Multiply(x, x),
            _ => field.Pow(x, e),
        };
    }

    private sealed class RingSearch<T>(IRing<T> ring, T[] frozen, IEqualityComparer<T>? comparer)
        : ExchangeGraphSearch<T>(comparer) where T : notnull
    {
        public IReadOnlyList<T> FoundValues => Values;

        protected override T Exchange(int[] ids, int[] b, int k, int depth)
        {
            int n = ids.Length;
            var rhs = RingPower.ExchangeSum(ring, b, n, k, i => i < n ? Values[ids[i]] : frozen[i - n]);
            var xk = Values[ids[k]];
            if (!ring.TryDivide(rhs, xk, out var q))
                throw new ExchangeDivisionException(k + 1, depth,
                    ring.IsZero(xk) ? $"x_{k + 1} is zero" : $"x_{k + 1} = {xk} does not divide {rhs}");
            return q;
        }
    }
}
