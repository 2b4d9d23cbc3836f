using System.Diagnostics;
using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Polynomials;

/// <summary>The ring Q[x₁^±1, …, xₙ^±1] of Laurent polynomials with rational coefficients in named
/// variables.</summary>
/// <remarks>
/// <para>Immutable and compared by value: two rings are equal when they have the same variable
/// names in the same order. Names are arbitrary non-empty strings (<c>x</c>, <c>g</c>,
/// <c>x_{n+1}</c>, <c>T_{a+1,n}</c>) and are printed verbatim.</para>
/// <para>Elements of different rings never mix silently: use <see cref="Unify"/> to get a common
/// ring and <see cref="Embed"/> to move elements into it.</para>
/// </remarks>
/// <example><code>
/// var r = new LaurentPolynomialRing("x", "y");
/// var x = r.Variable("x");
/// var y = r.Variable(1);
/// var p = (x + y).Pow(2) * x.Pow(-1);   // x + 2*y + x^-1*y^2
/// </code></example>
[DebuggerDisplay("{ToString(),nq}")]
public sealed class LaurentPolynomialRing : IRing<LaurentPolynomial>, IProductSumDivision<LaurentPolynomial>, IEquatable<LaurentPolynomialRing>
{
    private readonly string[] _names;
    private readonly Dictionary<string, int> _index;
    private readonly int _hash;

    /// <summary>Creates the ring in the given variables, in this order (variable 0 is the most
    /// significant in the term order).</summary>
    /// <param name="names">The variable names: at least one, each non-empty, all distinct.</param>
    /// <exception cref="ArgumentNullException"><paramref name="names"/> or one of its entries is null.</exception>
    /// <exception cref="ArgumentException">No names, an empty name, or a repeated name.</exception>
    public LaurentPolynomialRing(params string[] names)
    {
        ArgumentNullException.ThrowIfNull(names);
        if (names.Length == 0) throw new ArgumentException("A Laurent polynomial ring needs at least one variable.", nameof(names));
        _names = (string[])names.Clone();
        _index = new Dictionary<string, int>(StringComparer.Ordinal);
        var hash = new HashCode();
        for (int i = 0; i < _names.Length; i++)
        {
            var name = _names[i] ?? throw new ArgumentNullException(nameof(names), $"Variable name #{i} is null.");
            if (name.Length == 0) throw new ArgumentException($"Variable name #{i} is empty.", nameof(names));
            if (!_index.TryAdd(name, i)) throw new ArgumentException($"Variable name '{name}' appears twice (#{_index[name]} and #{i}).", nameof(names));
            hash.Add(name, StringComparer.Ordinal);
        }
        _hash = hash.ToHashCode();
        Zero = new LaurentPolynomial(this, [], []);
        One = new LaurentPolynomial(this, [Rational.One], new int[_names.Length]);
    }

    /// <summary>The variable names in order.</summary>
    public IReadOnlyList<string> Variables => _names;

    /// <summary>The number of variables n.</summary>
    public int VariableCount => _names.Length;

    /// <summary>The position of a variable.</summary>
    /// <param name="name">The variable name.</param>
    /// <returns>Its index, or −1 when <paramref name="name"/> is not a variable of this ring.</returns>
    public int IndexOf(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        return _index.TryGetValue(name, out int i) ? i : -1;
    }

    /// <summary>True when <paramref name="name"/> is a variable of this ring.</summary>
    /// <param name="name">The variable name.</param>
    /// <returns>Whether the ring has that variable.</returns>
    public bool Contains(string name) => IndexOf(name) >= 0;

    /// <summary>The variable x_i.</summary>
    /// <param name="index">The variable's position, 0 ≤ index &lt; n.</param>
    /// <returns>The polynomial x_<paramref name="index"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="index"/> is out of range.</exception>
    public LaurentPolynomial Variable(int index)
    {
        CheckIndex(index);
        var e = new int[_names.Length];
        e[index] = 1;
        return new LaurentPolynomial(this, [Rational.One], e);
    }

    /// <summary>The variable with the given name.</summary>
    /// <param name="name">The variable name.</param>
    /// <returns>The polynomial consisting of that variable.</returns>
    /// <exception cref="ArgumentException"><paramref name="name"/> is not a variable of this ring.</exception>
    public LaurentPolynomial Variable(string name) => Variable(RequireIndex(name));

    /// <summary>The zero polynomial.</summary>
    public LaurentPolynomial Zero { get; }

    /// <summary>The constant polynomial 1.</summary>
    public LaurentPolynomial One { get; }

    /// <summary>A constant polynomial.</summary>
    /// <param name="value">The constant.</param>
    /// <returns>The polynomial <paramref name="value"/> (zero polynomial for 0).</returns>
    public LaurentPolynomial Constant(Rational value) =>
        value.IsZero ? Zero : new LaurentPolynomial(this, [value], new int[_names.Length]);

    /// <summary>The monomial c·x^e.</summary>
    /// <param name="coefficient">The coefficient c (the zero polynomial results when it is 0).</param>
    /// <param name="exponents">The exponent of each variable (length n, any sign).</param>
    /// <returns>The monomial.</returns>
    /// <exception cref="ArgumentException"><paramref name="exponents"/> does not have one entry per variable.</exception>
    public LaurentPolynomial Monomial(Rational coefficient, ReadOnlySpan<int> exponents)
    {
        CheckExponentLength(exponents.Length, nameof(exponents));
        if (coefficient.IsZero) return Zero;
        return new LaurentPolynomial(this, [coefficient], exponents.ToArray());
    }

    /// <summary>A polynomial from terms given in any order; equal exponents are combined and zero
    /// terms dropped.</summary>
    /// <param name="coefficients">One coefficient per term.</param>
    /// <param name="exponents">Term-major exponent vectors, n entries per term.</param>
    /// <returns>The canonical polynomial.</returns>
    /// <exception cref="ArgumentException">The lengths do not match.</exception>
    public LaurentPolynomial FromTerms(ReadOnlySpan<Rational> coefficients, ReadOnlySpan<int> exponents)
    {
        if ((long)coefficients.Length * _names.Length != exponents.Length)
            throw new ArgumentException($"Expected {coefficients.Length} × {_names.Length} exponents, got {exponents.Length}.", nameof(exponents));
        var b = new LaurentPolynomialBuilder(this, coefficients.Length);
        for (int t = 0; t < coefficients.Length; t++)
            b.Add(coefficients[t], exponents.Slice(t * _names.Length, _names.Length));
        return b.ToPolynomial();
    }

    /// <summary>A builder that collects terms in any order.</summary>
    /// <returns>An empty builder for this ring.</returns>
    public LaurentPolynomialBuilder CreateBuilder() => new(this);

    /// <summary>The smallest ring containing the variables of both rings: this ring's variables in
    /// order, followed by those of <paramref name="other"/> that are new, in their order.</summary>
    /// <param name="other">The other ring.</param>
    /// <returns>This ring when it already contains every variable of <paramref name="other"/>.</returns>
    public LaurentPolynomialRing Unify(LaurentPolynomialRing other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (Equals(other)) return this;
        List<string>? extra = null;
        foreach (var name in other._names)
            if (!_index.ContainsKey(name)) (extra ??= []).Add(name);
        if (extra is null) return this;
        return new LaurentPolynomialRing([.. _names, .. extra]);
    }

    /// <summary>Moves a polynomial into this ring, which must contain all of its ring's variables
    /// (in any order).</summary>
    /// <param name="polynomial">A polynomial of any ring.</param>
    /// <returns>The same polynomial as an element of this ring.</returns>
    /// <exception cref="IncompatibleRingException">A variable of the polynomial's ring is missing here.</exception>
    public LaurentPolynomial Embed(LaurentPolynomial polynomial)
    {
        ArgumentNullException.ThrowIfNull(polynomial);
        var from = polynomial.Ring;
        if (Equals(from)) return ReferenceEquals(from, this) ? polynomial : polynomial.WithRing(this);
        var map = new int[from.VariableCount];
        bool identityPrefix = true;
        for (int i = 0; i < map.Length; i++)
        {
            if (!_index.TryGetValue(from._names[i], out map[i]))
                throw new IncompatibleRingException($"Cannot embed a polynomial of {from} into {this}: variable '{from._names[i]}' is missing.");
            if (map[i] != i) identityPrefix = false;
        }
        int n = _names.Length, m = map.Length, terms = polynomial.TermCount;
        var src = polynomial.Exponents;
        var exps = new int[terms * n];
        for (int t = 0; t < terms; t++)
            for (int i = 0; i < m; i++)
                exps[t * n + map[i]] = src[t * m + i];
        var coeffs = polynomial.Coefficients.ToArray();
        // Appending variables at the end keeps the lex order; any other placement may change it.
        if (identityPrefix) return new LaurentPolynomial(this, coeffs, exps);
        return FromTerms(coeffs, exps);
    }

    /// <summary>Value equality: same variable names in the same order.</summary>
    /// <param name="other">The other ring.</param>
    /// <returns>True when equal.</returns>
    public bool Equals(LaurentPolynomialRing? other)
    {
        if (ReferenceEquals(this, other)) return true;
        if (other is null || other._hash != _hash || other._names.Length != _names.Length) return false;
        for (int i = 0; i < _names.Length; i++)
            if (!string.Equals(_names[i], other._names[i], StringComparison.Ordinal)) return false;
        return true;
    }

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is LaurentPolynomialRing r && Equals(r);

    /// <inheritdoc/>
    public override int GetHashCode() => _hash;

    /// <summary>Value equality of rings.</summary>
    /// <param name="a">First ring.</param>
    /// <param name="b">Second ring.</param>
    /// <returns>True when both are null or equal.</returns>
    public static bool operator ==(LaurentPolynomialRing? a, LaurentPolynomialRing? b) => a is null ? b is null : a.Equals(b);

    /// <summary>Value inequality of rings.</summary>
    /// <param name="a">First ring.</param>
    /// <param name="b">Second ring.</param>
    /// <returns>True when not equal.</returns>
    public static bool operator !=(LaurentPolynomialRing? a, LaurentPolynomialRing? b) => !(a == b);

    /// <summary>Text such as <c>Q[x^±1, y^±1]</c>.</summary>
    /// <returns>The description.</returns>
    public override string ToString() => "Q[" + string.Join(", ", _names.Select(n => n + "^±1")) + "]";

    // ---- IRing<LaurentPolynomial> ----

    /// <inheritdoc/>
    public LaurentPolynomial FromInteger(long value) => Constant(value);

    /// <inheritdoc/>
    public LaurentPolynomial FromRational(Rational value) => Constant(value);

    /// <inheritdoc/>
    public LaurentPolynomial Add(LaurentPolynomial a, LaurentPolynomial b) => Own(a) + b;

    /// <inheritdoc/>
    public LaurentPolynomial Subtract(LaurentPolynomial a, LaurentPolynomial b) => Own(a) - b;

    /// <inheritdoc/>
    public LaurentPolynomial Multiply(LaurentPolynomial a, LaurentPolynomial b) => Own(a) * b;

    /// <inheritdoc/>
    public LaurentPolynomial Negate(LaurentPolynomial a) => -Own(a);

    /// <inheritdoc/>
    public bool IsZero(LaurentPolynomial a) => Own(a).IsZero;

    /// <inheritdoc/>
    public bool AreEqual(LaurentPolynomial a, LaurentPolynomial b) => Own(a) == Own(b);

    /// <summary>Exact division in the Laurent ring (see <see cref="LaurentPolynomial.TryDivideExact"/>).</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor.</param>
    /// <param name="quotient">q with q·b = a on success.</param>
    /// <returns>False when <paramref name="b"/> does not divide <paramref name="a"/> (or is zero).</returns>
    public bool TryDivide(LaurentPolynomial a, LaurentPolynomial b, out LaurentPolynomial quotient) =>
        Own(a).TryDivideExact(b, out quotient);

    bool IProductSumDivision<LaurentPolynomial>.TryDivideProductSum(LaurentPolynomial a, LaurentPolynomial b, LaurentPolynomial c,
        LaurentPolynomial d, LaurentPolynomial e, out LaurentPolynomial quotient) =>
        LaurentPolynomial.TryDivideProductSum(Own(a), b, c, d, e, out quotient);

    private LaurentPolynomial Own(LaurentPolynomial a)
    {
        ArgumentNullException.ThrowIfNull(a);
        if (!Equals(a.Ring))
            throw new IncompatibleRingException($"Element of {a.Ring} used in {this}; use Unify and Embed.");
        return a;
    }

    internal int RequireIndex(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (!_index.TryGetValue(name, out int i))
            throw new ArgumentException($"'{name}' is not a variable of {this}.", nameof(name));
        return i;
    }

    internal void CheckIndex(int index)
    {
        if ((uint)index >= (uint)_names.Length)
            throw new ArgumentOutOfRangeException(nameof(index), index, $"Variable index must be in [0, {_names.Length}) for {this}.");
    }

    internal void CheckExponentLength(int length, string paramName)
    {
        if (length != _names.Length)
            throw new ArgumentException($"Expected {_names.Length} exponents (one per variable of {this}), got {length}.", paramName);
    }
}
