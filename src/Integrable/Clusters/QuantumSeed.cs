using System.Collections.Immutable;
using System.Text;
using Integrable.Polynomials;

namespace Integrable.Clusters;

/// <summary>Thrown when a matrix Λ is not compatible with an exchange matrix B̃: B̃ᵀΛ must be [D | 0] with D
/// diagonal with positive entries (Berenstein–Zelevinsky 2005, Definition 3.1). <see cref="Row"/> and
/// <see cref="Column"/> name (1-based) an offending entry of B̃ᵀΛ, or of Λ when Λ itself is malformed.</summary>
public sealed class CompatibilityException : ArgumentException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="row">1-based row of the offending entry.</param>
    /// <param name="column">1-based column of the offending entry.</param>
    /// <param name="value">The entry's value.</param>
    /// <param name="message">What is wrong.</param>
    public CompatibilityException(int row, int column, long value, string message) : base(message)
    {
        Row = row;
        Column = column;
        Value = value;
    }

    /// <summary>1-based row of the offending entry.</summary>
    public int Row { get; }

    /// <summary>1-based column of the offending entry.</summary>
    public int Column { get; }

    /// <summary>The offending entry's value.</summary>
    public long Value { get; }
}

/// <summary>A quantum seed (Λ, B̃, X): an exchange matrix B̃ with n columns and N = n + m rows, a compatible
/// skew-symmetric N×N matrix Λ, and N quasi-commuting cluster variables Y_1, …, Y_N (Y_i Y_j = q^{λ_ij} Y_j Y_i)
/// that are elements of the quantum torus of the initial seed; quantum mutation keeps them there (quantum
/// Laurent phenomenon).</summary>
/// <remarks>
/// <para>Source: A. Berenstein, A. Zelevinsky, "Quantum cluster algebras", Adv. Math. 195 (2005) 405–455.
/// Compatibility: B̃ᵀΛ = [D | 0], D = diag(d_1, …, d_n) with d_j &gt; 0 (checked; <see cref="Diagonal"/>).
/// Mutation μ_k: with E the N×N matrix equal to the identity except e_kk = −1 and e_ik = [−b_ik]₊ (i ≠ k),
/// Λ' = EᵀΛE and B̃' is the usual matrix mutation; the new variable is
/// Y_k' = M(−e_k + Σ_i [b_ik]₊ e_i) + M(−e_k + Σ_i [−b_ik]₊ e_i), where M(a) is the normalised monomial of
/// the current seed, M(a) = t^{−Σ_{i&lt;j} a_i a_j λ_ij} Y_1^{a_1} ⋯ Y_N^{a_N} (t = q^{1/2}). It is computed as
/// the exact left quotient Y_k \ (t^{Λ(e_k, v₊)} M(v₊) + t^{Λ(e_k, v₋)} M(v₋)); a failed division (which the
/// quantum Laurent phenomenon, BZ 2005 Cor. 5.2, excludes) raises <see cref="ExchangeDivisionException"/>.</para>
/// <para>Directions are 1-based, as for <see cref="Seed{T}"/>. Instances are immutable.</para>
/// </remarks>
/// <example><code>
/// var seed = QuantumSeed.Initial(ExchangeMatrix.Parse("[[0,1],[-1,0]]"), new[,] { { 0, 1 }, { -1, 0 } });
/// var s = seed.Mutate(1, 2, 1, 2, 1);   // back to the initial variables, swapped
/// </code></example>
public sealed class QuantumSeed
{
    private readonly int[,] _lambda;
    private readonly QuantumLaurentPolynomial[] _y;

    private QuantumSeed(QuantumTorus torus, ExchangeMatrix matrix, int[,] lambda, QuantumLaurentPolynomial[] y, ImmutableArray<long> diagonal)
    {
        Torus = torus;
        Matrix = matrix;
        _lambda = lambda;
        _y = y;
        Diagonal = diagonal;
    }

    /// <summary>The quantum torus of the initial seed, where every cluster variable lives.</summary>
    public QuantumTorus Torus { get; }

    /// <summary>The exchange matrix B̃.</summary>
    public ExchangeMatrix Matrix { get; }

    /// <summary>d_1, …, d_n with B̃ᵀΛ = [D | 0] (position p holds d_{p+1}).</summary>
    public ImmutableArray<long> Diagonal { get; }

    /// <summary>The cluster and frozen variables Y_1, …, Y_N (position p holds Y_{p+1}).</summary>
    public ImmutableArray<QuantumLaurentPolynomial> Variables => [.. _y];

    /// <summary>The entry λ_ij of the seed's Λ (1-based).</summary>
    /// <param name="i">Row.</param>
    /// <param name="j">Column.</param>
    /// <returns>λ_ij.</returns>
    public int Lambda(int i, int j) => _lambda[i - 1, j - 1];

    /// <summary>A copy of the seed's Λ (0-based).</summary>
    /// <returns>The matrix.</returns>
    public int[,] LambdaArray() => (int[,])_lambda.Clone();

    /// <summary>The initial quantum seed: Y_i = X_i, the generators of the quantum torus of Λ.</summary>
    /// <param name="matrix">B̃ (n columns, N rows).</param>
    /// <param name="lambda">Λ, N×N, skew-symmetric and compatible with B̃.</param>
    /// <param name="parameter">Name of t = q^{1/2}.</param>
    /// <returns>The seed.</returns>
    /// <exception cref="CompatibilityException">Λ has the wrong size, is not skew-symmetric, or B̃ᵀΛ is not
    /// [D | 0] with D positive diagonal; the exception names the offending entry.</exception>
    public static QuantumSeed Initial(ExchangeMatrix matrix, int[,] lambda, string parameter = "t")
    {
        var d = CheckCompatible(matrix, lambda);
        var torus = new QuantumTorus(lambda, parameter);
        var y = Enumerable.Range(1, matrix.RowCount).Select(torus.Generator).ToArray();
        return new QuantumSeed(torus, matrix, (int[,])lambda.Clone(), y, d);
    }

    /// <summary>Checks B̃ᵀΛ = [D | 0] with D diagonal with positive entries and returns d_1, …, d_n.</summary>
    /// <param name="matrix">B̃.</param>
    /// <param name="lambda">Λ.</param>
    /// <returns>The diagonal of D.</returns>
    /// <exception cref="CompatibilityException">The check fails; the exception names the entry.</exception>
    public static ImmutableArray<long> CheckCompatible(ExchangeMatrix matrix, int[,] lambda)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        ArgumentNullException.ThrowIfNull(lambda);
        int N = matrix.RowCount, n = matrix.MutableCount;
        if (lambda.GetLength(0) != N || lambda.GetLength(1) != N)
            throw new CompatibilityException(lambda.GetLength(0), lambda.GetLength(1), 0,
                $"Λ must be {N}×{N} (one row per row of B̃), got {lambda.GetLength(0)}×{lambda.GetLength(1)}");
        for (int i = 0; i < N; i++)
            for (int j = i; j < N; j++)
                if (lambda[i, j] != -lambda[j, i])
                    throw new CompatibilityException(i + 1, j + 1, lambda[i, j],
                        $"Λ is not skew-symmetric: λ_{i + 1},{j + 1} = {lambda[i, j]} but λ_{j + 1},{i + 1} = {lambda[j, i]}");
        var d = new long[n];
        for (int j = 0; j < n; j++)
            for (int l = 0; l < N; l++)
            {
                long s = 0;
                for (int i = 0; i < N; i++) s += (long)matrix[i + 1, j + 1] * lambda[i, l];
                if (l == j)
                {
                    if (s <= 0)
                        throw new CompatibilityException(j + 1, l + 1, s,
                            $"B̃ᵀΛ must be [D | 0] with D positive: its diagonal entry ({j + 1},{l + 1}) is {s}");
                    d[j] = s;
                }
                else if (s != 0)
                    throw new CompatibilityException(j + 1, l + 1, s,
                        $"B̃ᵀΛ must be [D | 0]: its entry ({j + 1},{l + 1}) is {s}, not 0");
            }
        return [.. d];
    }

    /// <summary>For a skew-symmetrizable principal part B (n×n), the exchange matrix with principal
    /// coefficients B̃ = [B; I] and a compatible Λ = [[0, −D], [D, BᵀD]] with D the symmetriser of B
    /// (derived by hand from B̃ᵀΛ = [D | 0]; checked by <see cref="CheckCompatible"/>).</summary>
    /// <param name="principal">B, without frozen rows.</param>
    /// <returns>B̃ and Λ.</returns>
    /// <exception cref="ArgumentException"><paramref name="principal"/> has frozen rows.</exception>
    public static (ExchangeMatrix Matrix, int[,] Lambda) PrincipalCoefficients(ExchangeMatrix principal)
    {
        ArgumentNullException.ThrowIfNull(principal);
        if (principal.FrozenCount != 0) throw new ArgumentException("give the principal part only (no frozen rows)", nameof(principal));
        int n = principal.MutableCount;
        var rows = new int[2 * n * n];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
            {
                rows[i * n + j] = principal[i + 1, j + 1];
                rows[(n + i) * n + j] = i == j ? 1 : 0;
            }
        var bt = ExchangeMatrix.FromRows(n, n, rows);
        var d = principal.Symmetrizer;
        var lambda = new int[2 * n, 2 * n];
        for (int i = 0; i < n; i++)
        {
            lambda[i, n + i] = checked((int)-d[i]);
            lambda[n + i, i] = checked((int)d[i]);
            for (int j = 0; j < n; j++) lambda[n + i, n + j] = checked((int)(principal[j + 1, i + 1] * d[j]));
        }
        CheckCompatible(bt, lambda);
        return (bt, lambda);
    }

    /// <summary>Quantum mutation μ_k.</summary>
    /// <param name="k">1-based direction, 1 ≤ k ≤ n.</param>
    /// <returns>The mutated seed.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="k"/> is out of range.</exception>
    /// <exception cref="ExchangeDivisionException">The exchange division is not exact.</exception>
    public QuantumSeed Mutate(int k)
    {
        Matrix.CheckDirection(k, null, nameof(k));
        return MutateAt(k - 1, 1);
    }

    /// <summary>Mutates along the directions, first to last.</summary>
    /// <param name="directions">1-based directions.</param>
    /// <returns>The mutated seed.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A direction is out of range; the message names the step.</exception>
    /// <exception cref="ExchangeDivisionException">An exchange division is not exact.</exception>
    public QuantumSeed Mutate(params int[] directions)
    {
        ArgumentNullException.ThrowIfNull(directions);
        var s = this;
        for (int step = 1; step <= directions.Length; step++)
        {
            Matrix.CheckDirection(directions[step - 1], step, nameof(directions));
            s = s.MutateAt(directions[step - 1] - 1, step);
        }
        return s;
    }

    /// <summary>The normalised monomial M(a) = t^{−Σ_{i&lt;j} a_i a_j λ_ij} Y_1^{a_1} ⋯ Y_N^{a_N} of this seed,
    /// for a ≥ 0.</summary>
    /// <param name="exponents">a, non-negative, one entry per variable.</param>
    /// <returns>M(a) in the initial torus.</returns>
    /// <exception cref="ArgumentException">Wrong length or a negative entry.</exception>
    public QuantumLaurentPolynomial Monomial(ReadOnlySpan<int> exponents)
    {
        int N = _y.Length;
        if (exponents.Length != N) throw new ArgumentException($"give {N} exponents, got {exponents.Length}", nameof(exponents));
        long twist = 0;
        var r = Torus.One;
        for (int i = 0; i < N; i++)
        {
            if (exponents[i] < 0) throw new ArgumentException($"exponent {i + 1} is negative; only monomials with non-negative exponents are polynomial in the variables", nameof(exponents));
            for (int j = i + 1; j < N; j++) twist += (long)exponents[i] * exponents[j] * _lambda[i, j];
            if (exponents[i] > 0) r *= _y[i].Pow(exponents[i]);
        }
        return Torus.Power(checked((int)-twist)) * r;
    }

    private QuantumSeed MutateAt(int k, int step)
    {
        int N = _y.Length;
        var plus = new int[N];
        var minus = new int[N];
        for (int i = 0; i < N; i++)
        {
            int b = Matrix[i + 1, k + 1];
            if (b > 0) plus[i] = b; else minus[i] = -b;
        }
        long tp = 0, tm = 0;
        for (int j = 0; j < N; j++) { tp += (long)_lambda[k, j] * plus[j]; tm += (long)_lambda[k, j] * minus[j]; }
        var rhs = Torus.Power(checked((int)tp)) * Monomial(plus) + Torus.Power(checked((int)tm)) * Monomial(minus);
        if (!rhs.TryDivideLeft(_y[k], out var fresh))
            throw new ExchangeDivisionException(k + 1, step, $"Y_{k + 1} = {_y[k]} does not divide {rhs} on the left in the quantum torus");
        // Λ' = EᵀΛE with E = identity except column k: e_kk = −1, e_ik = [−b_ik]₊.
        var e = new int[N, N];
        for (int i = 0; i < N; i++) e[i, i] = 1;
        for (int i = 0; i < N; i++) e[i, k] = i == k ? -1 : minus[i];
        var le = Multiply(_lambda, e);
        var lambda = Multiply(Transpose(e), le);
        var matrix = Matrix.Mutate(k + 1);
        var d = CheckCompatible(matrix, lambda); // BZ 2005 Prop. 3.4: always compatible
        var y = (QuantumLaurentPolynomial[])_y.Clone();
        y[k] = fresh;
        return new QuantumSeed(Torus, matrix, lambda, y, d);
    }

    private static int[,] Multiply(int[,] a, int[,] b)
    {
        int n = a.GetLength(0), m = b.GetLength(1), l = a.GetLength(1);
        var c = new int[n, m];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < m; j++)
            {
                long s = 0;
                for (int r = 0; r < l; r++) s += (long)a[i, r] * b[r, j];
                c[i, j] = checked((int)s);
            }
        return c;
    }

    private static int[,] Transpose(int[,] a)
    {
        var t = new int[a.GetLength(1), a.GetLength(0)];
        for (int i = 0; i < a.GetLength(0); i++)
            for (int j = 0; j < a.GetLength(1); j++) t[j, i] = a[i, j];
        return t;
    }

    /// <summary>The classical limit q = 1 of the variables, as Laurent polynomials in the initial cluster
    /// (compare with <see cref="Seed{T}"/> over <paramref name="ring"/>).</summary>
    /// <param name="ring">A Laurent polynomial ring with N variables.</param>
    /// <returns>The specialised variables.</returns>
    public ImmutableArray<LaurentPolynomial> AtClassicalLimit(LaurentPolynomialRing ring) =>
        [.. _y.Select(v => v.AtClassicalLimit(ring))];

    /// <summary>Text: the variables, then B̃ and Λ.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder("(");
        sb.Append(string.Join("; ", _y.Select(v => v.ToString())));
        sb.Append(" | B = ").Append(Matrix).Append(", Λ = [");
        int N = _y.Length;
        for (int i = 0; i < N; i++)
        {
            if (i > 0) sb.Append(',');
            sb.Append('[').Append(string.Join(",", Enumerable.Range(0, N).Select(j => _lambda[i, j]))).Append(']');
        }
        return sb.Append("])").ToString();
    }
}
