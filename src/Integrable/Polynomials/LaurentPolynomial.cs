using System.Diagnostics;
using System.Runtime.InteropServices;
using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Polynomials;

/// <summary>An element of the Laurent polynomial ring Q[x₁^±1, …, xₙ^±1]: a finite sum of terms
/// c·x₁^e₁⋯xₙ^eₙ with rational c ≠ 0 and integer exponents of any sign.</summary>
/// <remarks>
/// <para><b>Canonical form.</b> Terms are stored as a flat coefficient array and a flat term-major
/// exponent array (n entries per term), sorted in strictly <b>descending lexicographic order of the
/// signed exponent vectors</b>, variable 0 (the ring's first variable) most significant. This order is
/// translation invariant (multiplying by a monomial keeps it), so the leading term of a product is
/// the product of the leading terms. No coefficient is zero; the zero polynomial has no terms. Every
/// public factory and operation returns this form, so equality is structural and the hash code is
/// the hash of the canonical arrays.</para>
/// <para><b>Performance.</b> Multiplication packs exponent vectors into machine words and runs
/// Johnson's heap method or a dense array method on integer coefficients (64/128/192-bit
/// accumulators, big integers only when needed); see the kernels in <c>Integrable.Kernels</c>.</para>
/// <para>Immutable and thread-safe. Operations between polynomials of different rings throw
/// <see cref="IncompatibleRingException"/>; unify the rings first.</para>
/// </remarks>
/// <example><code>
/// var r = new LaurentPolynomialRing("x", "y");
/// LaurentPolynomial x = r.Variable("x"), y = r.Variable("y");
/// var p = 3 * x.Pow(2) * y.Pow(-1) - new Rational(1, 2) * y + 1;
/// Console.WriteLine(p);          // 3*x^2*y^-1 - 1/2*y + 1
/// </code></example>
[DebuggerDisplay("{DebuggerText,nq}")]
public sealed partial class LaurentPolynomial : IRingElement<LaurentPolynomial>
{
    private readonly LaurentPolynomialRing _ring;
    private readonly Rational[] _coeffs;
    private readonly int[] _exps;
    private int _hash; // 0 = not computed yet

    /// <summary>Trusted constructor: the arrays must already be canonical and are not copied.</summary>
    internal LaurentPolynomial(LaurentPolynomialRing ring, Rational[] coeffs, int[] exps)
    {
        _ring = ring;
        _coeffs = coeffs;
        _exps = exps;
        AssertCanonical();
    }

    internal LaurentPolynomial WithRing(LaurentPolynomialRing ring) => new(ring, _coeffs, _exps);

    internal Rational[] CoeffArray => _coeffs;

    internal int[] ExpArray => _exps;

    /// <summary>The ring this polynomial belongs to.</summary>
    public LaurentPolynomialRing Ring => _ring;

    /// <summary>The number of terms (0 for the zero polynomial).</summary>
    public int TermCount => _coeffs.Length;

    /// <summary>The coefficients, one per term, in canonical (descending lex) order.</summary>
    public ReadOnlySpan<Rational> Coefficients => _coeffs;

    /// <summary>The exponent vectors, term-major: term t occupies entries [t·n, (t+1)·n).</summary>
    public ReadOnlySpan<int> Exponents => _exps;

    /// <summary>The exponent vector of one term.</summary>
    /// <param name="term">Term index, 0 ≤ term &lt; <see cref="TermCount"/>.</param>
    /// <returns>The n exponents of that term.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="term"/> is out of range.</exception>
    public ReadOnlySpan<int> ExponentsOf(int term)
    {
        CheckTerm(term);
        int n = _ring.VariableCount;
        return _exps.AsSpan(term * n, n);
    }

    /// <summary>One term: coefficient and exponent vector.</summary>
    /// <param name="term">Term index, 0 ≤ term &lt; <see cref="TermCount"/>.</param>
    /// <returns>The term.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="term"/> is out of range.</exception>
    public LaurentTerm Term(int term)
    {
        CheckTerm(term);
        int n = _ring.VariableCount;
        return new LaurentTerm(_coeffs[term], _exps.AsSpan(term * n, n));
    }

    /// <summary>The terms in canonical order, for <c>foreach</c> (no allocation).</summary>
    public LaurentTermEnumerator Terms => new(_coeffs, _exps, _ring.VariableCount);

    /// <summary>The coefficient of the leading (first, lex-largest) term.</summary>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    public Rational LeadingCoefficient => _coeffs.Length > 0 ? _coeffs[0] : throw new InvalidOperationException("The zero polynomial has no leading coefficient.");

    /// <summary>True for the zero polynomial.</summary>
    public bool IsZero => _coeffs.Length == 0;

    /// <summary>True for the constant 1.</summary>
    public bool IsOne => _coeffs.Length == 1 && _coeffs[0].IsOne && AllZero(_exps);

    /// <summary>True for constants, zero included.</summary>
    public bool IsConstant => _coeffs.Length == 0 || (_coeffs.Length == 1 && AllZero(_exps));

    /// <summary>True when there is exactly one term c·x^e (these are the units of the ring).</summary>
    public bool IsMonomial => _coeffs.Length == 1;

    /// <summary>The value of a constant polynomial.</summary>
    /// <returns>The constant (0 for the zero polynomial).</returns>
    /// <exception cref="InvalidOperationException">The polynomial is not constant.</exception>
    public Rational ToConstant()
    {
        if (!IsConstant) throw new InvalidOperationException($"Polynomial with {TermCount} terms is not a constant.");
        return _coeffs.Length == 0 ? Rational.Zero : _coeffs[0];
    }

    /// <summary>Structural (= mathematical) equality; polynomials of different rings are unequal.</summary>
    /// <param name="other">The other polynomial.</param>
    /// <returns>True when the rings and all terms are equal.</returns>
    public bool Equals(LaurentPolynomial? other)
    {
        if (ReferenceEquals(this, other)) return true;
        if (other is null || !_ring.Equals(other._ring)) return false;
        if (_hash != 0 && other._hash != 0 && _hash != other._hash) return false;
        return _coeffs.AsSpan().SequenceEqual(other._coeffs) && _exps.AsSpan().SequenceEqual(other._exps);
    }

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is LaurentPolynomial p && Equals(p);

    /// <summary>Hash of the canonical form (ring, coefficients and exponents).</summary>
    /// <returns>The hash code.</returns>
    public override int GetHashCode()
    {
        int cached = _hash;
        if (cached != 0) return cached;
        var h = new HashCode();
        h.Add(_ring.GetHashCode());
        foreach (var c in _coeffs) h.Add(c);
        h.AddBytes(MemoryMarshal.AsBytes(_exps.AsSpan()));
        int value = h.ToHashCode();
        if (value == 0) value = 1;
        _hash = value;
        return value;
    }

    /// <summary>Equality operator.</summary>
    /// <param name="left">First polynomial.</param>
    /// <param name="right">Second polynomial.</param>
    /// <returns>True when both are null or equal.</returns>
    public static bool operator ==(LaurentPolynomial? left, LaurentPolynomial? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Inequality operator.</summary>
    /// <param name="left">First polynomial.</param>
    /// <param name="right">Second polynomial.</param>
    /// <returns>True when not equal.</returns>
    public static bool operator !=(LaurentPolynomial? left, LaurentPolynomial? right) => !(left == right);

    /// <summary>Checks the canonical-form invariant: strictly descending lex order, no zero
    /// coefficient, consistent array lengths.</summary>
    internal bool IsCanonical()
    {
        int n = _ring.VariableCount;
        if ((long)_coeffs.Length * n != _exps.Length) return false;
        for (int t = 0; t < _coeffs.Length; t++)
        {
            if (_coeffs[t].IsZero) return false;
            if (t > 0 && CompareLex(_exps.AsSpan((t - 1) * n, n), _exps.AsSpan(t * n, n)) <= 0) return false;
        }
        return true;
    }

    /// <summary>Asserts <see cref="IsCanonical"/> in debug builds.</summary>
    [Conditional("DEBUG")]
    internal void AssertCanonical() => Debug.Assert(IsCanonical(), "LaurentPolynomial is not canonical.");

    internal static int CompareLex(ReadOnlySpan<int> a, ReadOnlySpan<int> b)
    {
        for (int i = 0; i < a.Length; i++)
            if (a[i] != b[i]) return a[i] > b[i] ? 1 : -1;
        return 0;
    }

    private static bool AllZero(ReadOnlySpan<int> e) => !e.ContainsAnyExcept(0);

    private void CheckTerm(int term)
    {
        if ((uint)term >= (uint)_coeffs.Length)
            throw new ArgumentOutOfRangeException(nameof(term), term, $"Term index must be in [0, {_coeffs.Length}).");
    }

    private void CheckRing(LaurentPolynomial other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (!ReferenceEquals(_ring, other._ring) && !_ring.Equals(other._ring))
            throw new IncompatibleRingException($"Cannot combine elements of {_ring} and {other._ring}; use LaurentPolynomialRing.Unify and Embed.");
    }

    private string DebuggerText => IsZero ? "0" : $"{TermCount} terms in {_ring}";
}
