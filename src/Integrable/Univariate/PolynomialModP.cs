using System.Diagnostics;
using Integrable.Algebra;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;

namespace Integrable.Univariate;

/// <summary>A dense univariate polynomial over the prime field Z/pZ (p &lt; 2^62): an element of
/// (Z/pZ)[x].</summary>
/// <remarks>
/// <para>Canonical form: the coefficient array holds residues in [0, p) from degree 0 upwards with no
/// leading zero; the zero polynomial has no coefficients and degree −1. Values are immutable; every
/// operation returns a new polynomial over the same <see cref="PrimeField"/>, and mixing two fields
/// throws <see cref="IncompatibleRingException"/>.</para>
/// <para>Multiplication is schoolbook (128-bit delayed reduction), Karatsuba, or number-theoretic
/// transforms over three to six 30-bit primes with Chinese remaindering back to p, by operand length;
/// division is long division or Newton iteration for the reversed reciprocal; the gcd is Euclid or
/// half-GCD (subquadratic, O(M(n) log n)). Thresholds are internal and documented in the kernels.</para>
/// </remarks>
/// <example><code>
/// var f = new PrimeField(101);
/// var x = PolynomialModP.X(f);
/// var p = (x + 1) * (x - 2);
/// var g = PolynomialModP.Gcd(p, x * x - 4);   // x − 2
/// </code></example>
[DebuggerDisplay("degree {Degree} mod {Modulus}")]
public sealed partial class PolynomialModP : IRingElement<PolynomialModP>
{
    private readonly ulong[] _c;
    internal readonly PolyModContext Context;
    private ulong[]? _reciprocal;   // cached power-series inverse of the reversal, for Newton division by this polynomial

    private PolynomialModP(PolyModContext context, ulong[] trimmed)
    {
        Context = context;
        _c = trimmed;
        AssertCanonical();
    }

    /// <summary>Wraps a trimmed array of reduced residues without copying or checking (kernels only).</summary>
    internal static PolynomialModP CreateUnchecked(PolyModContext context, ulong[] trimmed) => new(context, trimmed);

    [Conditional("DEBUG")]
    private void AssertCanonical()
    {
        Debug.Assert(_c.Length == 0 || _c[^1] != 0, "leading zero coefficient");
        foreach (var c in _c) Debug.Assert(c < Context.P, "unreduced coefficient");
    }

    /// <summary>The coefficient field Z/pZ.</summary>
    public PrimeField Field => Context.Field;

    /// <summary>The prime p.</summary>
    public ulong Modulus => Context.P;

    /// <summary>The coefficients c₀, c₁, …, c_d (residues in [0, p), no leading zero; empty for zero).</summary>
    public ReadOnlySpan<ulong> Coefficients => _c;

    /// <summary>The degree; −1 for the zero polynomial.</summary>
    public int Degree => _c.Length - 1;

    /// <summary>The leading coefficient; 0 for the zero polynomial.</summary>
    public ulong LeadingCoefficient => _c.Length == 0 ? 0 : _c[^1];

    /// <summary>The coefficient of x^<paramref name="exponent"/> (0 beyond the degree).</summary>
    /// <param name="exponent">A non-negative exponent.</param>
    /// <returns>The residue.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="exponent"/> is negative.</exception>
    public ulong this[int exponent]
    {
        get
        {
            ArgumentOutOfRangeException.ThrowIfNegative(exponent);
            return exponent < _c.Length ? _c[exponent] : 0;
        }
    }

    /// <inheritdoc/>
    public bool IsZero => _c.Length == 0;

    /// <inheritdoc/>
    public bool IsOne => _c.Length == 1 && _c[0] == 1;

    /// <summary>True when the polynomial is a constant (including zero).</summary>
    public bool IsConstant => _c.Length <= 1;

    /// <summary>True when the leading coefficient is 1.</summary>
    public bool IsMonic => _c.Length > 0 && _c[^1] == 1;

    // ------------------------------------------------------------------ factories

    /// <summary>The zero polynomial over <paramref name="field"/>.</summary>
    /// <param name="field">The coefficient field.</param>
    /// <returns>0.</returns>
    public static PolynomialModP Zero(PrimeField field) => new(Ctx(field), []);

    /// <summary>The constant 1 over <paramref name="field"/>.</summary>
    /// <param name="field">The coefficient field.</param>
    /// <returns>1.</returns>
    public static PolynomialModP One(PrimeField field) => new(Ctx(field), [1]);

    /// <summary>The variable x over <paramref name="field"/>.</summary>
    /// <param name="field">The coefficient field.</param>
    /// <returns>x.</returns>
    public static PolynomialModP X(PrimeField field) => new(Ctx(field), [0, 1]);

    /// <summary>The constant <paramref name="value"/> mod p.</summary>
    /// <param name="field">The coefficient field.</param>
    /// <param name="value">Any integer; it is reduced.</param>
    /// <returns>The constant polynomial.</returns>
    public static PolynomialModP Constant(PrimeField field, long value)
    {
        var ctx = Ctx(field);
        ulong r = field.FromInteger(value);
        return new(ctx, r == 0 ? [] : [r]);
    }

    /// <summary>The monomial c·x^k.</summary>
    /// <param name="field">The coefficient field.</param>
    /// <param name="coefficient">Any integer; it is reduced.</param>
    /// <param name="degree">The exponent k ≥ 0.</param>
    /// <returns>c·x^k.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="degree"/> is negative.</exception>
    public static PolynomialModP Monomial(PrimeField field, long coefficient, int degree)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(degree);
        var ctx = Ctx(field);
        ulong r = field.FromInteger(coefficient);
        if (r == 0) return new(ctx, []);
        var c = new ulong[degree + 1];
        c[degree] = r;
        return new(ctx, c);
    }

    /// <summary>The polynomial Σ cᵢ xⁱ from residues or any words (reduced mod p); leading zeros are dropped.</summary>
    /// <param name="field">The coefficient field.</param>
    /// <param name="coefficients">c₀, c₁, … (index = exponent).</param>
    /// <returns>The polynomial.</returns>
    public static PolynomialModP FromCoefficients(PrimeField field, ReadOnlySpan<ulong> coefficients)
    {
        var ctx = Ctx(field);
        var c = new ulong[coefficients.Length];
        ulong p = field.Modulus;
        for (int i = 0; i < c.Length; i++) c[i] = coefficients[i] < p ? coefficients[i] : coefficients[i] % p;
        return new(ctx, PolyMod.Trim(c));
    }

    /// <summary>The polynomial Σ cᵢ xⁱ from signed integers (reduced mod p).</summary>
    /// <param name="field">The coefficient field.</param>
    /// <param name="coefficients">c₀, c₁, … (index = exponent).</param>
    /// <returns>The polynomial.</returns>
    public static PolynomialModP FromCoefficients(PrimeField field, params ReadOnlySpan<long> coefficients)
    {
        var ctx = Ctx(field);
        var c = new ulong[coefficients.Length];
        for (int i = 0; i < c.Length; i++) c[i] = field.FromInteger(coefficients[i]);
        return new(ctx, PolyMod.Trim(c));
    }

    /// <summary>The monic polynomial Π (x − rᵢ), built by a balanced product tree.</summary>
    /// <param name="field">The coefficient field.</param>
    /// <param name="roots">The roots rᵢ (any words; reduced mod p), with repetition for multiplicity.</param>
    /// <returns>The product; 1 for no roots.</returns>
    public static PolynomialModP FromRoots(PrimeField field, ReadOnlySpan<ulong> roots)
    {
        var ctx = Ctx(field);
        if (roots.IsEmpty) return new(ctx, [1]);
        var level = new ulong[roots.Length][];
        for (int i = 0; i < roots.Length; i++) level[i] = [ctx.Mod.Neg(roots[i] % ctx.P), 1];
        while (level.Length > 1)
        {
            var next = new ulong[(level.Length + 1) / 2][];
            for (int i = 0; i < next.Length; i++)
                next[i] = 2 * i + 1 < level.Length ? PolyMod.Multiply(ctx, level[2 * i], level[2 * i + 1]) : level[2 * i];
            level = next;
        }
        return new(ctx, level[0]);
    }

    private static PolyModContext Ctx(PrimeField field)
    {
        ArgumentNullException.ThrowIfNull(field);
        return PolyModContext.For(field);
    }

    private static PolyModContext Common(PolynomialModP a, PolynomialModP b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (!ReferenceEquals(a.Context, b.Context) && a.Context.P != b.Context.P)
            throw new IncompatibleRingException($"polynomials over Z/{a.Modulus}Z and Z/{b.Modulus}Z cannot be combined");
        return a.Context;
    }

    /// <summary>A copy of the coefficient array.</summary>
    /// <returns>c₀, c₁, …, c_d.</returns>
    public ulong[] ToArray() => (ulong[])_c.Clone();

    /// <summary>The trimmed coefficient array itself (kernels only; must not be modified).</summary>
    internal ulong[] Raw => _c;

    // ------------------------------------------------------------------ equality

    /// <inheritdoc/>
    public bool Equals(PolynomialModP? other) =>
        other is not null && other.Context.P == Context.P && _c.AsSpan().SequenceEqual(other._c);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as PolynomialModP);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(Context.P);
        h.AddBytes(System.Runtime.InteropServices.MemoryMarshal.AsBytes(_c.AsSpan()));
        return h.ToHashCode();
    }

    /// <summary>Equality of field and coefficients.</summary>
    /// <param name="left">First polynomial.</param>
    /// <param name="right">Second polynomial.</param>
    /// <returns>True when equal.</returns>
    public static bool operator ==(PolynomialModP? left, PolynomialModP? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Inequality.</summary>
    /// <param name="left">First polynomial.</param>
    /// <param name="right">Second polynomial.</param>
    /// <returns>True when different.</returns>
    public static bool operator !=(PolynomialModP? left, PolynomialModP? right) => !(left == right);
}
