using System.Diagnostics.CodeAnalysis;
using Integrable.Kernels.LinearAlgebra;

namespace Integrable.LinearAlgebra;

public sealed partial class ModularMatrix
{
    internal EchelonData<ulong> Echelon()
    {
        var e = Volatile.Read(ref _echelon);
        if (e is not null) return e;
        e = EchelonOf(Field, _data, RowCount, ColumnCount);
        Interlocked.CompareExchange(ref _echelon, e, null);
        return Volatile.Read(ref _echelon)!;
    }

    internal static EchelonData<ulong> EchelonOf(Numbers.PrimeField field, ReadOnlySpan<ulong> rowMajor, int rows, int cols)
    {
        if (rows == 0 || cols == 0) return new EchelonData<ulong>(rows, cols, [], EchelonData<ulong>.Complement([], cols), []);
        var colMajor = new ulong[rows * cols];
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < cols; j++) colMajor[j * rows + i] = rowMajor[i * cols + j];
        using var ech = ModularEchelon.Compute(colMajor, rows, cols, new ModularReducer(field));
        var free = ech.FreeColumns();
        return new EchelonData<ulong>(rows, cols, ech.PivotColumns, free, ech.ReducedFreeEntries(free));
    }

    /// <summary>The rank.</summary>
    /// <returns>The dimension of the row (and column) space over Z/pZ.</returns>
    public int Rank() => Echelon().Rank;

    /// <summary>The reduced row echelon form and the pivot columns.</summary>
    /// <returns>The reduced row echelon form.</returns>
    public RowEchelonForm<ModularMatrix> ReducedRowEchelonForm()
    {
        var e = Echelon();
        int m = RowCount, n = ColumnCount, r = e.Rank, nf = e.FreeColumns.Length;
        var d = new ulong[m * n];
        for (int k = 0; k < r; k++)
        {
            d[k * n + e.PivotColumns[k]] = 1;
            for (int q = 0; q < nf; q++) d[k * n + e.FreeColumns[q]] = e.Reduced[k * nf + q];
        }
        return new RowEchelonForm<ModularMatrix>(new ModularMatrix(Field, m, n, d), e.PivotColumns, e.FreeColumns);
    }

    /// <summary>A basis of the right kernel {x : A·x = 0}, one basis vector per row.</summary>
    /// <returns>A (<see cref="ColumnCount"/> − rank) × <see cref="ColumnCount"/> matrix.</returns>
    /// <remarks>The canonical basis read off the reduced row echelon form, as in
    /// <see cref="RationalMatrix.Nullspace"/>.</remarks>
    public ModularMatrix Nullspace() => BuildKernel(Echelon(), ColumnCount);

    private ModularMatrix BuildKernel(EchelonData<ulong> e, int columns)
    {
        int r = e.Rank, nfAll = e.FreeColumns.Length;
        int nf = 0;
        while (nf < nfAll && e.FreeColumns[nf] < columns) nf++;
        var d = new ulong[nf * columns];
        for (int q = 0; q < nf; q++)
        {
            d[q * columns + e.FreeColumns[q]] = 1;
            for (int k = 0; k < r; k++)
            {
                int pc = e.PivotColumns[k];
                if (pc < columns) d[q * columns + pc] = Field.Negate(e.Reduced[k * nfAll + q]);
            }
        }
        return new ModularMatrix(Field, nf, columns, d);
    }

    /// <summary>Solves A·x = b over Z/pZ.</summary>
    /// <param name="rightHandSide">The vector b: <see cref="RowCount"/> residues in [0, p).</param>
    /// <returns>The solution set: inconsistent, or the particular solution with zero free variables
    /// plus the kernel of A.</returns>
    /// <exception cref="DimensionMismatchException">b has the wrong length.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An entry of b is not below p.</exception>
    public LinearSystemSolution<ulong, ModularMatrix> Solve(ReadOnlySpan<ulong> rightHandSide)
    {
        if (rightHandSide.Length != RowCount)
            throw new DimensionMismatchException($"the right-hand side has {rightHandSide.Length} entries but the matrix has {RowCount} rows", nameof(rightHandSide));
        CheckResidues(rightHandSide, nameof(rightHandSide));
        int m = RowCount, n = ColumnCount, w = n + 1;
        var aug = new ulong[m * w];
        for (int i = 0; i < m; i++)
        {
            _data.AsSpan(i * n, n).CopyTo(aug.AsSpan(i * w, n));
            aug[i * w + n] = rightHandSide[i];
        }
        var e = EchelonOf(Field, aug, m, w);
        var kernel = BuildKernel(e, n);
        if (e.Rank > 0 && e.PivotColumns[e.Rank - 1] == n)
            return new LinearSystemSolution<ulong, ModularMatrix>(null, kernel, kernel.RowCount);
        var x = new ulong[n];
        int nf = e.FreeColumns.Length, qb = nf - 1;
        for (int k = 0; k < e.Rank; k++) x[e.PivotColumns[k]] = e.Reduced[k * nf + qb];
        return new LinearSystemSolution<ulong, ModularMatrix>(x, kernel, kernel.RowCount);
    }

    /// <summary>The determinant.</summary>
    /// <returns>det A as a residue.</returns>
    /// <exception cref="DimensionMismatchException">The matrix is not square.</exception>
    public ulong Determinant()
    {
        if (!IsSquare) throw new DimensionMismatchException($"a {RowCount}×{ColumnCount} matrix has no determinant: it is not square");
        int n = RowCount;
        if (n == 0) return Field.One;
        var colMajor = Transpose()._data;
        using var ech = ModularEchelon.Compute(colMajor, n, n, new ModularReducer(Field));
        return ech.Determinant();
    }

    /// <summary>The inverse.</summary>
    /// <returns>A⁻¹.</returns>
    /// <exception cref="DimensionMismatchException">The matrix is not square.</exception>
    /// <exception cref="SingularMatrixException">The matrix is singular over Z/pZ.</exception>
    public ModularMatrix Inverse()
    {
        if (!IsSquare) throw new DimensionMismatchException($"a {RowCount}×{ColumnCount} matrix has no inverse: it is not square");
        return TryInverse(out var inv, out int rank) ? inv : throw new SingularMatrixException(RowCount, rank);
    }

    /// <summary>The inverse, when it exists.</summary>
    /// <param name="inverse">A⁻¹ when the call succeeds.</param>
    /// <returns>False when the matrix is singular over Z/pZ.</returns>
    /// <exception cref="DimensionMismatchException">The matrix is not square.</exception>
    public bool TryInverse([NotNullWhen(true)] out ModularMatrix? inverse)
    {
        if (!IsSquare) throw new DimensionMismatchException($"a {RowCount}×{ColumnCount} matrix has no inverse: it is not square");
        return TryInverse(out inverse, out _);
    }

    private bool TryInverse([NotNullWhen(true)] out ModularMatrix? inverse, out int rank)
    {
        int n = RowCount, w = 2 * n;
        var aug = new ulong[n * w];
        for (int i = 0; i < n; i++)
        {
            _data.AsSpan(i * n, n).CopyTo(aug.AsSpan(i * w, n));
            aug[i * w + n + i] = Field.One;
        }
        var e = EchelonOf(Field, aug, n, w);
        rank = 0;
        while (rank < e.Rank && e.PivotColumns[rank] < n) rank++;
        inverse = rank == n ? new ModularMatrix(Field, n, n, e.Reduced) : null;
        return inverse is not null;
    }
}
