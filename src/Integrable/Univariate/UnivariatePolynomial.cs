using System.Diagnostics;
using System.Numerics;
using Integrable.Algebra;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;

namespace Integrable.Univariate;

/// <summary>A dense univariate polynomial with rational coefficients: an element of Q[x].</summary>
/// <remarks>
/// <para>Canonical form: coefficients from degree 0 upwards, each a canonical <see cref="Rational"/>,
/// with no leading zero; the zero polynomial has no coefficients and degree −1.</para>
/// <para>Large products clear denominators and multiply the integer polynomials through images modulo
/// 62-bit primes (transform multiplication) and Chinese remaindering within a proven coefficient
/// bound. Gcds use Brown's modular algorithm and are verified by exact division; exact division is
/// itself modular with exact verification; resultants are modular within the Hadamard bound.
/// Euclidean division with remainder is long division over Q (quadratic).</para>
/// </remarks>
/// <example><code>
/// var x = UnivariatePolynomial.X;
/// var f = (x - 1) * (x - 1) * (2 * x + 3);
/// var roots = f.RationalRoots();            // [(−3/2, 1), (1, 2)]
/// var g = UnivariatePolynomial.Gcd(f, x * x - 1);   // x − 1
/// </code></example>
[DebuggerDisplay("degree {Degree}")]
public sealed partial class UnivariatePolynomial : IRingElement<UnivariatePolynomial>
{
    private readonly Rational[] _c;

    private UnivariatePolynomial(Rational[] trimmed)
    {
        _c = trimmed;
        Debug.Assert(_c.Length == 0 || !_c[^1].IsZero, "leading zero coefficient");
    }

    internal static UnivariatePolynomial CreateUnchecked(Rational[] trimmed) => new(trimmed);

    private static Rational[] Trim(Rational[] a)
    {
        int n = a.Length;
        while (n > 0 && a[n - 1].IsZero) n--;
        return n == a.Length ? a : a[..n];
    }

    /// <summary>The zero polynomial.</summary>
    public static UnivariatePolynomial Zero { get; } = new([]);

    /// <summary>The constant 1.</summary>
    public static UnivariatePolynomial One { get; } = new([Rational.One]);

    /// <summary>The variable x.</summary>
    public static UnivariatePolynomial X { get; } = new([Rational.Zero, Rational.One]);

    /// <summary>The coefficients c₀, …, c_d (no leading zero; empty for zero).</summary>
    public ReadOnlySpan<Rational> Coefficients => _c;

    /// <summary>The degree; −1 for the zero polynomial.</summary>
    public int Degree => _c.Length - 1;

    /// <summary>The leading coefficient; 0 for the zero polynomial.</summary>
    public Rational LeadingCoefficient => _c.Length == 0 ? Rational.Zero : _c[^1];

    /// <summary>The coefficient of x^<paramref name="exponent"/> (0 beyond the degree).</summary>
    /// <param name="exponent">A non-negative exponent.</param>
    /// <returns>The coefficient.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="exponent"/> is negative.</exception>
    public Rational this[int exponent]
    {
        get
        {
            ArgumentOutOfRangeException.ThrowIfNegative(exponent);
            return exponent < _c.Length ? _c[exponent] : Rational.Zero;
        }
    }

    /// <inheritdoc/>
    public bool IsZero => _c.Length == 0;

    /// <inheritdoc/>
    public bool IsOne => _c.Length == 1 && _c[0].IsOne;

    /// <summary>True for constants (including zero).</summary>
    public bool IsConstant => _c.Length <= 1;

    /// <summary>True when the leading coefficient is 1.</summary>
    public bool IsMonic => _c.Length > 0 && _c[^1].IsOne;

    /// <summary>True when every coefficient is an integer.</summary>
    public bool HasIntegerCoefficients
    {
        get
        {
            foreach (var c in _c) if (!c.IsInteger) return false;
            return true;
        }
    }

    /// <summary>The constant polynomial <paramref name="value"/>.</summary>
    /// <param name="value">The constant.</param>
    /// <returns>The polynomial.</returns>
    public static UnivariatePolynomial Constant(Rational value) => value.IsZero ? Zero : new([value]);

    /// <summary>The monomial c·x^k.</summary>
    /// <param name="coefficient">c.</param>
    /// <param name="degree">k ≥ 0.</param>
    /// <returns>The monomial.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="degree"/> is negative.</exception>
    public static UnivariatePolynomial Monomial(Rational coefficient, int degree)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(degree);
        if (coefficient.IsZero) return Zero;
        var c = new Rational[degree + 1];
        c[degree] = coefficient;
        return new(c);
    }

    /// <summary>Σ cᵢ xⁱ from rational coefficients (leading zeros dropped).</summary>
    /// <param name="coefficients">c₀, c₁, … (index = exponent).</param>
    /// <returns>The polynomial.</returns>
    public static UnivariatePolynomial FromCoefficients(params ReadOnlySpan<Rational> coefficients) => new(Trim(coefficients.ToArray()));

    /// <summary>Σ cᵢ xⁱ from integer coefficients.</summary>
    /// <param name="coefficients">c₀, c₁, … (index = exponent).</param>
    /// <returns>The polynomial.</returns>
    public static UnivariatePolynomial FromCoefficients(params ReadOnlySpan<long> coefficients)
    {
        var c = new Rational[coefficients.Length];
        for (int i = 0; i < c.Length; i++) c[i] = coefficients[i];
        return new(Trim(c));
    }

    /// <summary>Σ cᵢ xⁱ from big-integer coefficients.</summary>
    /// <param name="coefficients">c₀, c₁, … (index = exponent).</param>
    /// <returns>The polynomial.</returns>
    public static UnivariatePolynomial FromCoefficients(ReadOnlySpan<BigInteger> coefficients)
    {
        var c = new Rational[coefficients.Length];
        for (int i = 0; i < c.Length; i++) c[i] = coefficients[i];
        return new(Trim(c));
    }

    /// <summary>The monic polynomial Π (x − rᵢ) (balanced product tree).</summary>
    /// <param name="roots">The roots, repeated for multiplicity.</param>
    /// <returns>The product; 1 for no roots.</returns>
    public static UnivariatePolynomial FromRoots(params ReadOnlySpan<Rational> roots)
    {
        if (roots.IsEmpty) return One;
        var level = new UnivariatePolynomial[roots.Length];
        for (int i = 0; i < roots.Length; i++) level[i] = new(Trim([-roots[i], Rational.One]));
        while (level.Length > 1)
        {
            var next = new UnivariatePolynomial[(level.Length + 1) / 2];
            for (int i = 0; i < next.Length; i++)
                next[i] = 2 * i + 1 < level.Length ? level[2 * i] * level[2 * i + 1] : level[2 * i];
            level = next;
        }
        return level[0];
    }

    /// <summary>A copy of the coefficients.</summary>
    /// <returns>c₀, …, c_d.</returns>
    public Rational[] ToArray() => (Rational[])_c.Clone();

    /// <summary>The image modulo p (coefficients a/b ↦ a·b⁻¹).</summary>
    /// <param name="field">The field Z/pZ.</param>
    /// <returns>The reduced polynomial (its degree drops when p divides the leading numerator).</returns>
    /// <exception cref="DivideByZeroException">p divides a denominator.</exception>
    public PolynomialModP ReduceModulo(PrimeField field)
    {
        ArgumentNullException.ThrowIfNull(field);
        var r = new ulong[_c.Length];
        for (int i = 0; i < r.Length; i++) r[i] = field.FromRational(_c[i]);
        return PolynomialModP.CreateUnchecked(PolyModContext.For(field), PolyMod.Trim(r));
    }

    // ------------------------------------------------------------------ integer views

    /// <summary>(F, d) with this = F/d, F ∈ Z[x], d &gt; 0 the lcm of the denominators.</summary>
    internal (BigInteger[] Numerators, BigInteger Denominator) ToIntegerPolynomial()
    {
        var den = BigInteger.One;
        foreach (var c in _c)
        {
            if (c.IsInteger) continue;
            var d = c.Denominator;
            den = den / BigInteger.GreatestCommonDivisor(den, d) * d;
        }
        var f = new BigInteger[_c.Length];
        for (int i = 0; i < f.Length; i++)
        {
            var c = _c[i];
            f[i] = c.IsInteger ? c.Numerator * den : c.Numerator * (den / c.Denominator);
        }
        return (f, den);
    }

    /// <summary>(c, F) with this = c·F, F primitive in Z[x] with positive leading coefficient (c carries the sign).</summary>
    internal (Rational Content, BigInteger[] Primitive) ToPrimitive()
    {
        var (f, den) = ToIntegerPolynomial();
        if (f.Length == 0) return (Rational.Zero, f);
        var g = IntegerPoly.Content(f);
        if (f[^1].Sign < 0) g = -g;
        var prim = g.IsOne ? f : IntegerPoly.DivideScalar(f, g);
        return (new Rational(g, den), prim);
    }

    internal static UnivariatePolynomial FromIntegers(BigInteger[] f, Rational scale)
    {
        var c = new Rational[f.Length];
        for (int i = 0; i < c.Length; i++) c[i] = scale.IsOne ? (Rational)f[i] : f[i] * scale;
        return new(Trim(c));
    }

    // ------------------------------------------------------------------ equality

    /// <inheritdoc/>
    public bool Equals(UnivariatePolynomial? other) => other is not null && _c.AsSpan().SequenceEqual(other._c);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as UnivariatePolynomial);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        foreach (var c in _c) h.Add(c);
        return h.ToHashCode();
    }

    /// <summary>Equality of coefficients.</summary>
    /// <param name="left">First polynomial.</param>
    /// <param name="right">Second polynomial.</param>
    /// <returns>True when equal.</returns>
    public static bool operator ==(UnivariatePolynomial? left, UnivariatePolynomial? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Inequality.</summary>
    /// <param name="left">First polynomial.</param>
    /// <param name="right">Second polynomial.</param>
    /// <returns>True when different.</returns>
    public static bool operator !=(UnivariatePolynomial? left, UnivariatePolynomial? right) => !(left == right);
}
