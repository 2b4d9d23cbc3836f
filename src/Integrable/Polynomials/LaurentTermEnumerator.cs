using Integrable.Numbers;

namespace Integrable.Polynomials;

/// <summary>Enumerates the terms of a <see cref="LaurentPolynomial"/> in canonical order without
/// allocating; use with <c>foreach (var t in p.Terms)</c>.</summary>
public ref struct LaurentTermEnumerator
{
    private readonly Rational[] _coeffs;
    private readonly int[] _exps;
    private readonly int _n;
    private int _index;

    internal LaurentTermEnumerator(Rational[] coeffs, int[] exps, int n)
    {
        _coeffs = coeffs;
        _exps = exps;
        _n = n;
        _index = -1;
    }

    /// <summary>Returns this enumerator (enables <c>foreach</c>).</summary>
    /// <returns>This enumerator.</returns>
    public readonly LaurentTermEnumerator GetEnumerator() => this;

    /// <summary>Advances to the next term.</summary>
    /// <returns>False after the last term.</returns>
    public bool MoveNext() => ++_index < _coeffs.Length;

    /// <summary>The current term.</summary>
    public readonly LaurentTerm Current => new(_coeffs[_index], _exps.AsSpan(_index * _n, _n));
}
