using Integrable.Numbers;

namespace Integrable.Polynomials;

/// <summary>Mutable collector of terms for a <see cref="LaurentPolynomial"/>: add terms in any
/// order, then <see cref="ToPolynomial"/> sorts them, combines equal exponents and drops zeros.</summary>
/// <remarks>Not thread-safe. The builder can be reused after <see cref="ToPolynomial"/> (it keeps
/// its terms) or emptied with <see cref="Clear"/>.</remarks>
/// <example><code>
/// var b = ring.CreateBuilder();
/// b.Add(3, [2, -1]);
/// b.Add(new Rational(-1, 2), [0, 1]);
/// LaurentPolynomial p = b.ToPolynomial();
/// </code></example>
public sealed class LaurentPolynomialBuilder
{
    private readonly LaurentPolynomialRing _ring;
    private readonly int _n;
    private Rational[] _coeffs;
    private int[] _exps;
    private int _count;

    /// <summary>An empty builder for <paramref name="ring"/>.</summary>
    /// <param name="ring">The ring of the polynomial to build.</param>
    /// <exception cref="ArgumentNullException"><paramref name="ring"/> is null.</exception>
    public LaurentPolynomialBuilder(LaurentPolynomialRing ring) : this(ring, 8) { }

    internal LaurentPolynomialBuilder(LaurentPolynomialRing ring, int capacity)
    {
        ArgumentNullException.ThrowIfNull(ring);
        _ring = ring;
        _n = ring.VariableCount;
        capacity = Math.Max(capacity, 4);
        _coeffs = new Rational[capacity];
        _exps = new int[capacity * _n];
    }

    /// <summary>The ring of the polynomial being built.</summary>
    public LaurentPolynomialRing Ring => _ring;

    /// <summary>Number of terms added so far (before combining).</summary>
    public int Count => _count;

    /// <summary>Adds the term c·x^e.</summary>
    /// <param name="coefficient">The coefficient (zero is accepted and ignored).</param>
    /// <param name="exponents">One exponent per ring variable.</param>
    /// <returns>This builder.</returns>
    /// <exception cref="ArgumentException"><paramref name="exponents"/> has the wrong length.</exception>
    public LaurentPolynomialBuilder Add(Rational coefficient, ReadOnlySpan<int> exponents)
    {
        _ring.CheckExponentLength(exponents.Length, nameof(exponents));
        if (coefficient.IsZero) return this;
        if (_count == _coeffs.Length)
        {
            Array.Resize(ref _coeffs, _count * 2);
            Array.Resize(ref _exps, _count * 2 * _n);
        }
        _coeffs[_count] = coefficient;
        exponents.CopyTo(_exps.AsSpan(_count * _n, _n));
        _count++;
        return this;
    }

    /// <summary>Adds every term of a polynomial of the same ring.</summary>
    /// <param name="polynomial">The polynomial to add.</param>
    /// <returns>This builder.</returns>
    /// <exception cref="Algebra.IncompatibleRingException">The polynomial belongs to another ring.</exception>
    public LaurentPolynomialBuilder Add(LaurentPolynomial polynomial)
    {
        ArgumentNullException.ThrowIfNull(polynomial);
        if (!_ring.Equals(polynomial.Ring))
            throw new Algebra.IncompatibleRingException($"Cannot add an element of {polynomial.Ring} to a builder for {_ring}.");
        foreach (var t in polynomial.Terms) Add(t.Coefficient, t.Exponents);
        return this;
    }

    /// <summary>Removes all terms.</summary>
    public void Clear() => _count = 0;

    /// <summary>The canonical polynomial equal to the sum of the added terms.</summary>
    /// <returns>The polynomial (zero when no terms or everything cancelled).</returns>
    public LaurentPolynomial ToPolynomial()
    {
        int n = _n, count = _count;
        if (count == 0) return _ring.Zero;
        var order = new int[count];
        for (int i = 0; i < count; i++) order[i] = i;
        var exps = _exps;
        Array.Sort(order, (a, b) =>
        {
            int c = LaurentPolynomial.CompareLex(exps.AsSpan(b * n, n), exps.AsSpan(a * n, n));
            return c != 0 ? c : a.CompareTo(b);
        });
        var outC = new Rational[count];
        var outE = new int[count * n];
        int m = 0;
        for (int k = 0; k < count;)
        {
            int first = order[k];
            var e = exps.AsSpan(first * n, n);
            Rational sum = _coeffs[first];
            int k2 = k + 1;
            while (k2 < count && e.SequenceEqual(exps.AsSpan(order[k2] * n, n))) sum += _coeffs[order[k2++]];
            if (!sum.IsZero)
            {
                outC[m] = sum;
                e.CopyTo(outE.AsSpan(m * n, n));
                m++;
            }
            k = k2;
        }
        if (m < count)
        {
            Array.Resize(ref outC, m);
            Array.Resize(ref outE, m * n);
        }
        return new LaurentPolynomial(_ring, outC, outE);
    }
}
