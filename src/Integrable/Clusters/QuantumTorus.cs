using System.Collections.Immutable;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Clusters;

/// <summary>The quantum torus of a skew-symmetric integer m×m matrix Λ: the Q[t^{±1}]-algebra with basis
/// the normalised monomials X^a (a ∈ Zᵐ) and product X^a X^b = t^{Λ(a,b)} X^{a+b}, where
/// Λ(a, b) = aᵀΛb and t stands for q^{1/2}.</summary>
/// <remarks>
/// <para>Source: A. Berenstein, A. Zelevinsky, "Quantum cluster algebras", Adv. Math. 195 (2005) 405–455,
/// Section 2 (there written X^e X^f = q^{Λ(e,f)/2} X^{e+f}). The generators X_i = X^{e_i} quasi-commute:
/// X_i X_j = q^{λ_ij} X_j X_i = t^{2λ_ij} X_j X_i. The normalised monomial X^a is invariant under the bar
/// involution t ↦ t^{−1}.</para>
/// <para>Coefficients are Laurent polynomials over Q in one variable (default name <c>t</c>). Elements are
/// <see cref="QuantumLaurentPolynomial"/>s; instances are immutable.</para>
/// </remarks>
/// <example><code>
/// var torus = new QuantumTorus(new[,] { { 0, 1 }, { -1, 0 } });
/// var x1 = torus.Generator(1);
/// var x2 = torus.Generator(2);
/// var p = x1 * x2;                 // t·X^(1,1)
/// bool b = x1 * x2 == torus.Power(2) * x2 * x1;   // true: X1 X2 = q X2 X1
/// </code></example>
public sealed class QuantumTorus : IEquatable<QuantumTorus>
{
    private readonly int[,] _lambda;

    /// <summary>The torus of <paramref name="lambda"/>.</summary>
    /// <param name="lambda">Λ, a skew-symmetric integer m×m matrix, m ≥ 1.</param>
    /// <param name="parameter">The name of t = q^{1/2} in the coefficient ring.</param>
    /// <param name="variables">Names of X_1, …, X_m for printing (default x1, …, xm).</param>
    /// <exception cref="ArgumentException">Λ is not square or not skew-symmetric (naming the entry), or
    /// the names do not fit.</exception>
    public QuantumTorus(int[,] lambda, string parameter = "t", IReadOnlyList<string>? variables = null)
    {
        ArgumentNullException.ThrowIfNull(lambda);
        ArgumentNullException.ThrowIfNull(parameter);
        int m = lambda.GetLength(0);
        if (m == 0 || lambda.GetLength(1) != m)
            throw new ArgumentException($"Λ must be a non-empty square matrix, got {lambda.GetLength(0)}×{lambda.GetLength(1)}", nameof(lambda));
        for (int i = 0; i < m; i++)
            for (int j = i; j < m; j++)
                if (lambda[i, j] != -lambda[j, i])
                    throw new ArgumentException($"Λ is not skew-symmetric: entry ({i + 1},{j + 1}) = {lambda[i, j]} but ({j + 1},{i + 1}) = {lambda[j, i]}", nameof(lambda));
        _lambda = (int[,])lambda.Clone();
        Rank = m;
        variables ??= [.. Enumerable.Range(1, m).Select(i => "x" + i)];
        if (variables.Count != m || variables.Distinct().Count() != m || variables.Contains(parameter))
            throw new ArgumentException($"give {m} distinct variable names different from '{parameter}'", nameof(variables));
        VariableNames = [.. variables];
        Coefficients = new LaurentPolynomialRing(parameter);
        Zero = new QuantumLaurentPolynomial(this, [], []);
        One = Monomial(new int[m]);
    }

    /// <summary>m, the number of generators.</summary>
    public int Rank { get; }

    /// <summary>The ring Q[t^{±1}] of coefficients.</summary>
    public LaurentPolynomialRing Coefficients { get; }

    /// <summary>Names of the generators, for printing.</summary>
    public ImmutableArray<string> VariableNames { get; }

    /// <summary>The entry λ_ij (1-based).</summary>
    /// <param name="i">Row.</param>
    /// <param name="j">Column.</param>
    /// <returns>λ_ij.</returns>
    public int this[int i, int j] => _lambda[i - 1, j - 1];

    /// <summary>A copy of Λ (0-based).</summary>
    /// <returns>The matrix.</returns>
    public int[,] ToArray() => (int[,])_lambda.Clone();

    /// <summary>The zero element.</summary>
    public QuantumLaurentPolynomial Zero { get; }

    /// <summary>The unit X^0.</summary>
    public QuantumLaurentPolynomial One { get; }

    /// <summary>Λ(a, b) = aᵀΛb.</summary>
    /// <param name="a">First exponent vector.</param>
    /// <param name="b">Second exponent vector.</param>
    /// <returns>The form's value.</returns>
    public long Form(ReadOnlySpan<int> a, ReadOnlySpan<int> b)
    {
        long s = 0;
        for (int i = 0; i < Rank; i++)
        {
            if (a[i] == 0) continue;
            long row = 0;
            for (int j = 0; j < Rank; j++) row += (long)_lambda[i, j] * b[j];
            s += a[i] * row;
        }
        return s;
    }

    /// <summary>The normalised monomial c·X^a.</summary>
    /// <param name="exponents">a, one integer per generator.</param>
    /// <param name="coefficient">c (default 1), a Laurent polynomial in t of <see cref="Coefficients"/>.</param>
    /// <returns>The monomial.</returns>
    /// <exception cref="ArgumentException">Wrong length.</exception>
    public QuantumLaurentPolynomial Monomial(ReadOnlySpan<int> exponents, LaurentPolynomial? coefficient = null)
    {
        if (exponents.Length != Rank) throw new ArgumentException($"the torus has {Rank} generators, got {exponents.Length} exponents", nameof(exponents));
        var c = coefficient ?? Coefficients.One;
        if (!c.Ring.Equals(Coefficients)) throw new ArgumentException($"the coefficient must lie in {Coefficients}", nameof(coefficient));
        return c.IsZero ? Zero : new QuantumLaurentPolynomial(this, exponents.ToArray(), [c]);
    }

    /// <summary>The generator X_i (1-based).</summary>
    /// <param name="i">1 ≤ i ≤ m.</param>
    /// <returns>X^{e_i}.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="i"/> is out of range.</exception>
    public QuantumLaurentPolynomial Generator(int i)
    {
        if (i < 1 || i > Rank) throw new ArgumentOutOfRangeException(nameof(i), i, $"generators are 1..{Rank}");
        var e = new int[Rank];
        e[i - 1] = 1;
        return Monomial(e);
    }

    /// <summary>The scalar t^k (so q = t²).</summary>
    /// <param name="k">The exponent.</param>
    /// <returns>t^k·X^0.</returns>
    public QuantumLaurentPolynomial Power(int k) => Scalar(TPower(k));

    /// <summary>A scalar c·X^0.</summary>
    /// <param name="c">A Laurent polynomial in t.</param>
    /// <returns>The element.</returns>
    public QuantumLaurentPolynomial Scalar(LaurentPolynomial c) => Monomial(new int[Rank], c);

    internal LaurentPolynomial TPower(long k) => Coefficients.Monomial(Rational.One, [checked((int)k)]);

    /// <inheritdoc/>
    public bool Equals(QuantumTorus? other)
    {
        if (other is null) return false;
        if (ReferenceEquals(this, other)) return true;
        if (Rank != other.Rank || !Coefficients.Equals(other.Coefficients) || !VariableNames.SequenceEqual(other.VariableNames)) return false;
        for (int i = 0; i < Rank; i++)
            for (int j = 0; j < Rank; j++)
                if (_lambda[i, j] != other._lambda[i, j]) return false;
        return true;
    }

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as QuantumTorus);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(Rank);
        foreach (var v in _lambda) h.Add(v);
        return h.ToHashCode();
    }

    /// <summary>Text such as <c>quantum torus of [[0,1],[-1,0]]</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var rows = Enumerable.Range(0, Rank).Select(i => "[" + string.Join(",", Enumerable.Range(0, Rank).Select(j => _lambda[i, j])) + "]");
        return "quantum torus of [" + string.Join(",", rows) + "]";
    }
}
