using System.Diagnostics.CodeAnalysis;
using Integrable.Numbers;

namespace Integrable.LinearAlgebra;

public sealed partial class RationalMatrix
{
    /// <summary>The verified echelon data, computed once.</summary>
    internal EchelonData<Rational> Echelon()
    {
        var e = Volatile.Read(ref _echelon);
        if (e is not null) return e;
        e = RationalElimination.Echelon(_data, RowCount, ColumnCount, EliminationOptions.Default);
        Interlocked.CompareExchange(ref _echelon, e, null);
        return Volatile.Read(ref _echelon)!;
    }

    /// <summary>The rank.</summary>
    /// <returns>The dimension of the row (and column) space.</returns>
    public int Rank() => Echelon().Rank;

    /// <summary>The reduced row echelon form and the pivot columns.</summary>
    /// <returns>The verified reduced row echelon form.</returns>
    public RowEchelonForm<RationalMatrix> ReducedRowEchelonForm() => BuildEchelonForm(Echelon());

    internal static RowEchelonForm<RationalMatrix> BuildEchelonForm(EchelonData<Rational> e)
    {
        int m = e.Rows, n = e.Cols, r = e.Rank, nf = e.FreeColumns.Length;
        var d = new Rational[m * n];
        for (int k = 0; k < r; k++)
        {
            d[k * n + e.PivotColumns[k]] = Rational.One;
            for (int q = 0; q < nf; q++) d[k * n + e.FreeColumns[q]] = e.Reduced[k * nf + q];
        }
        return new RowEchelonForm<RationalMatrix>(new RationalMatrix(m, n, d), e.PivotColumns, e.FreeColumns);
    }

    /// <summary>A basis of the right kernel {x : A·x = 0}, one basis vector per row.</summary>
    /// <returns>A (<see cref="ColumnCount"/> − rank) × <see cref="ColumnCount"/> matrix.</returns>
    /// <remarks>The basis is the canonical one read off the reduced row echelon form: the vector of
    /// the free column f has 1 in column f, 0 in the other free columns and minus the reduced-form
    /// entries of column f in the pivot columns (so it vanishes after column f). Rows are ordered by
    /// free column. The result has been verified exactly: A times each vector is zero and the count is
    /// the nullity.
    /// <para>Performance: rows are first scaled to integers (by the lcm of each row's denominators).
    /// For huge rational entries this scaling (gcds and exact divisions of big integers) dominates the
    /// cost; a caller that knows a common denominator of each row — for monomials evaluated at a point
    /// x = a/b, y = c/d, the factor b^D·d^D — should pass the integer rows instead: the kernel is the
    /// same and the scaling disappears.</para></remarks>
    public RationalMatrix Nullspace() => BuildKernel(Echelon(), ColumnCount);

    internal static RationalMatrix BuildKernel(EchelonData<Rational> e, int columns)
    {
        int r = e.Rank, nfAll = e.FreeColumns.Length;
        int nf = 0;
        while (nf < nfAll && e.FreeColumns[nf] < columns) nf++;
        var d = new Rational[nf * columns];
        for (int q = 0; q < nf; q++)
        {
            d[q * columns + e.FreeColumns[q]] = Rational.One;
            for (int k = 0; k < r; k++)
            {
                int pc = e.PivotColumns[k];
                if (pc >= columns) continue;
                var x = e.Reduced[k * nfAll + q];
                if (!x.IsZero) d[q * columns + pc] = -x;
            }
        }
        return new RationalMatrix(nf, columns, d);
    }

    /// <summary>Solves A·x = b.</summary>
    /// <param name="rightHandSide">The vector b, with <see cref="RowCount"/> entries.</param>
    /// <returns>The verified solution set: inconsistent, or the particular solution with zero free
    /// variables plus the kernel of A.</returns>
    /// <exception cref="DimensionMismatchException">b has the wrong length.</exception>
    public LinearSystemSolution<Rational, RationalMatrix> Solve(ReadOnlySpan<Rational> rightHandSide) =>
        Solve(rightHandSide, EliminationOptions.Default);

    internal LinearSystemSolution<Rational, RationalMatrix> Solve(ReadOnlySpan<Rational> rightHandSide, EliminationOptions options)
    {
        if (rightHandSide.Length != RowCount)
            throw new DimensionMismatchException($"the right-hand side has {rightHandSide.Length} entries but the matrix has {RowCount} rows", nameof(rightHandSide));
        int m = RowCount, n = ColumnCount, w = n + 1;
        var aug = new Rational[m * w];
        for (int i = 0; i < m; i++)
        {
            _data.AsSpan(i * n, n).CopyTo(aug.AsSpan(i * w, n));
            aug[i * w + n] = rightHandSide[i];
        }
        var e = RationalElimination.Echelon(aug, m, w, options);
        // The reduced form of [A | b] restricted to its first n columns is the reduced form of A.
        var kernel = BuildKernel(e, n);
        if (e.Rank > 0 && e.PivotColumns[e.Rank - 1] == n)
            return new LinearSystemSolution<Rational, RationalMatrix>(null, kernel, kernel.RowCount);
        var x = new Rational[n];
        int nf = e.FreeColumns.Length, qb = nf - 1;   // b's column is the last free column
        for (int k = 0; k < e.Rank; k++) x[e.PivotColumns[k]] = e.Reduced[k * nf + qb];
        return new LinearSystemSolution<Rational, RationalMatrix>(x, kernel, kernel.RowCount);
    }

    /// <summary>The determinant.</summary>
    /// <returns>det A.</returns>
    /// <exception cref="DimensionMismatchException">The matrix is not square.</exception>
    /// <remarks>Up to order 8 by fraction-free elimination; above, modulo enough primes to exceed twice
    /// the Hadamard bound (a proven bound, so the value is exact).</remarks>
    public Rational Determinant() => Determinant(EliminationOptions.Default);

    internal Rational Determinant(EliminationOptions options)
    {
        if (!IsSquare) throw new DimensionMismatchException($"a {RowCount}×{ColumnCount} matrix has no determinant: it is not square");
        return RationalElimination.Determinant(_data, RowCount, options);
    }

    /// <summary>The inverse.</summary>
    /// <returns>A⁻¹, verified exactly (A·A⁻¹ = I).</returns>
    /// <exception cref="DimensionMismatchException">The matrix is not square.</exception>
    /// <exception cref="SingularMatrixException">The matrix is singular.</exception>
    public RationalMatrix Inverse()
    {
        if (!IsSquare) throw new DimensionMismatchException($"a {RowCount}×{ColumnCount} matrix has no inverse: it is not square");
        return TryInverse(EliminationOptions.Default, out var inv, out int rank) ? inv : throw new SingularMatrixException(RowCount, rank);
    }

    /// <summary>The inverse, when it exists.</summary>
    /// <param name="inverse">A⁻¹ when the call succeeds.</param>
    /// <returns>False when the matrix is singular.</returns>
    /// <exception cref="DimensionMismatchException">The matrix is not square.</exception>
    public bool TryInverse([NotNullWhen(true)] out RationalMatrix? inverse)
    {
        if (!IsSquare) throw new DimensionMismatchException($"a {RowCount}×{ColumnCount} matrix has no inverse: it is not square");
        return TryInverse(EliminationOptions.Default, out inverse, out _);
    }

    internal bool TryInverse(EliminationOptions options, [NotNullWhen(true)] out RationalMatrix? inverse, out int rank)
    {
        int n = RowCount, w = 2 * n;
        inverse = null;
        // The reduced form of [A | I] is [I | A⁻¹] exactly when A is invertible; its verification
        // checks [A | I]·(−A⁻¹ e_j; e_j) = 0, i.e. A·A⁻¹ = I.
        var aug = new Rational[n * w];
        for (int i = 0; i < n; i++)
        {
            _data.AsSpan(i * n, n).CopyTo(aug.AsSpan(i * w, n));
            aug[i * w + n + i] = Rational.One;
        }
        var e = RationalElimination.Echelon(aug, n, w, options);
        rank = 0;
        while (rank < e.Rank && e.PivotColumns[rank] < n) rank++;
        if (rank < n) return false;
        // Free columns are exactly n..2n-1, in order.
        inverse = new RationalMatrix(n, n, e.Reduced);
        return true;
    }
}
