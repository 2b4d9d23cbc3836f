using Integrable.Polynomials;

namespace Integrable.Clusters;

/// <summary>Seeds whose variables are the generators of a Laurent polynomial ring, for computing cluster
/// variables exactly as Laurent polynomials in the initial cluster (and the frozen variables).</summary>
/// <remarks>By the Laurent phenomenon (Fomin–Zelevinsky, Cluster algebras I, 2002, Thm. 3.1) every cluster
/// variable reached by mutations from such a seed is a Laurent polynomial in its variables, so every exchange
/// division of <see cref="Seed{T}.Mutate(int)"/> is exact.</remarks>
/// <example><code>
/// var seed = LaurentSeeds.Initial(ExchangeMatrix.Parse("[[0,1],[-1,0]]"));   // variables x_1, x_2
/// var s = seed.Mutate(1, 2);   // cluster ((x_2 + 1)/x_1, (x_1 + x_2 + 1)/(x_1 x_2))
/// </code></example>
public static class LaurentSeeds
{
    /// <summary>The seed with exchange matrix <paramref name="matrix"/> whose cluster variables are
    /// <c>x_1</c>, …, <c>x_n</c> and whose frozen variables are <c>y_1</c>, …, <c>y_m</c>, as generators of the
    /// Laurent polynomial ring in these names (in this order).</summary>
    /// <param name="matrix">The extended exchange matrix (n columns, n + m rows).</param>
    /// <returns>The seed over Q[x_1^±1, …, x_n^±1, y_1^±1, …, y_m^±1].</returns>
    /// <exception cref="ArgumentNullException"><paramref name="matrix"/> is null.</exception>
    public static Seed<LaurentPolynomial> Initial(ExchangeMatrix matrix) => Initial(matrix, "x", "y");

    /// <summary>The seed whose cluster variables are <c>{clusterName}_1</c>, …, <c>{clusterName}_n</c> and whose
    /// frozen variables are <c>{frozenName}_1</c>, …, <c>{frozenName}_m</c>.</summary>
    /// <param name="matrix">The extended exchange matrix (n columns, n + m rows).</param>
    /// <param name="clusterName">Base name of the cluster variables.</param>
    /// <param name="frozenName">Base name of the frozen variables (must differ from <paramref name="clusterName"/>
    /// when there are frozen rows).</param>
    /// <returns>The seed.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">A base name is empty, or the two base names coincide while there are frozen rows.</exception>
    public static Seed<LaurentPolynomial> Initial(ExchangeMatrix matrix, string clusterName, string frozenName)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        ArgumentException.ThrowIfNullOrEmpty(clusterName);
        ArgumentException.ThrowIfNullOrEmpty(frozenName);
        if (matrix.FrozenCount > 0 && clusterName == frozenName)
            throw new ArgumentException($"cluster and frozen variables need different names, both are '{clusterName}'", nameof(frozenName));
        var names = Enumerable.Range(1, matrix.MutableCount).Select(i => $"{clusterName}_{i}")
            .Concat(Enumerable.Range(1, matrix.FrozenCount).Select(i => $"{frozenName}_{i}")).ToArray();
        return Initial(matrix, names);
    }

    /// <summary>The seed whose variables x_1, …, x_{n+m} are the generators of the Laurent polynomial ring in
    /// the given names (cluster variables first, then frozen ones).</summary>
    /// <param name="matrix">The extended exchange matrix (n columns, n + m rows).</param>
    /// <param name="names">n + m distinct, non-empty variable names.</param>
    /// <returns>The seed.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">The number of names is not n + m, or a name is empty or repeated.</exception>
    public static Seed<LaurentPolynomial> Initial(ExchangeMatrix matrix, IReadOnlyList<string> names)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        ArgumentNullException.ThrowIfNull(names);
        if (names.Count != matrix.RowCount)
            throw new ArgumentException(
                $"the exchange matrix has {matrix.MutableCount} mutable and {matrix.FrozenCount} frozen rows, so the seed needs {matrix.RowCount} names, got {names.Count}",
                nameof(names));
        var ring = new LaurentPolynomialRing([.. names]);
        return new Seed<LaurentPolynomial>(ring, matrix, Enumerable.Range(0, names.Count).Select(ring.Variable));
    }
}
