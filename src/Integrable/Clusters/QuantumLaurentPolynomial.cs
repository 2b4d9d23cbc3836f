using System.Text;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Clusters;

/// <summary>An element Σ c_a X^a of a <see cref="QuantumTorus"/>: a finite sum of normalised monomials X^a
/// with coefficients c_a in Q[t^{±1}] (t = q^{1/2}); multiplication is not commutative.</summary>
/// <remarks>Canonical form: terms sorted by exponent vector in decreasing lexicographic order, no zero
/// coefficient. Instances are immutable; equality is term by term (elements of different tori are never
/// equal).</remarks>
public sealed class QuantumLaurentPolynomial : IEquatable<QuantumLaurentPolynomial>
{
    private readonly int[] _exps;               // term-major, Rank per term
    private readonly LaurentPolynomial[] _coeffs;

    internal QuantumLaurentPolynomial(QuantumTorus torus, int[] exps, LaurentPolynomial[] coeffs)
    {
        Torus = torus;
        _exps = exps;
        _coeffs = coeffs;
    }

    /// <summary>The torus this element lives in.</summary>
    public QuantumTorus Torus { get; }

    /// <summary>Number of monomials.</summary>
    public int TermCount => _coeffs.Length;

    /// <summary>True for zero.</summary>
    public bool IsZero => _coeffs.Length == 0;

    /// <summary>The exponent vector of term <paramref name="term"/> (0-based, decreasing lex order).</summary>
    /// <param name="term">The term index.</param>
    /// <returns>The exponents.</returns>
    public ReadOnlySpan<int> ExponentsOf(int term) => _exps.AsSpan(term * Torus.Rank, Torus.Rank);

    /// <summary>The coefficient of term <paramref name="term"/>.</summary>
    /// <param name="term">The term index.</param>
    /// <returns>A Laurent polynomial in t.</returns>
    public LaurentPolynomial CoefficientOf(int term) => _coeffs[term];

    /// <summary>The coefficient of X^a (zero when absent).</summary>
    /// <param name="exponents">a.</param>
    /// <returns>c_a.</returns>
    public LaurentPolynomial Coefficient(ReadOnlySpan<int> exponents)
    {
        for (int t = 0; t < _coeffs.Length; t++)
            if (ExponentsOf(t).SequenceEqual(exponents)) return _coeffs[t];
        return Torus.Coefficients.Zero;
    }

    /// <summary>Sum.</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand (same torus).</param>
    /// <returns>The sum.</returns>
    /// <exception cref="IncompatibleRingException">The tori differ.</exception>
    public static QuantumLaurentPolynomial operator +(QuantumLaurentPolynomial left, QuantumLaurentPolynomial right)
    {
        Same(left, right);
        var acc = new Accumulator(left.Torus);
        acc.AddAll(left, left.Torus.Coefficients.One);
        acc.AddAll(right, left.Torus.Coefficients.One);
        return acc.Build();
    }

    /// <summary>Difference.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend (same torus).</param>
    /// <returns>The difference.</returns>
    public static QuantumLaurentPolynomial operator -(QuantumLaurentPolynomial left, QuantumLaurentPolynomial right)
    {
        Same(left, right);
        var acc = new Accumulator(left.Torus);
        acc.AddAll(left, left.Torus.Coefficients.One);
        acc.AddAll(right, -left.Torus.Coefficients.One);
        return acc.Build();
    }

    /// <summary>Negation.</summary>
    /// <param name="value">The element.</param>
    /// <returns>−value.</returns>
    public static QuantumLaurentPolynomial operator -(QuantumLaurentPolynomial value) =>
        new(value.Torus, value._exps, [.. value._coeffs.Select(c => -c)]);

    /// <summary>Product in the quantum torus: X^a X^b = t^{Λ(a,b)} X^{a+b}.</summary>
    /// <param name="left">Left factor.</param>
    /// <param name="right">Right factor (same torus).</param>
    /// <returns>left·right.</returns>
    public static QuantumLaurentPolynomial operator *(QuantumLaurentPolynomial left, QuantumLaurentPolynomial right)
    {
        Same(left, right);
        var torus = left.Torus;
        int m = torus.Rank;
        var acc = new Accumulator(torus);
        var sum = new int[m];
        for (int i = 0; i < left.TermCount; i++)
        {
            var a = left.ExponentsOf(i);
            for (int j = 0; j < right.TermCount; j++)
            {
                var b = right.ExponentsOf(j);
                for (int v = 0; v < m; v++) sum[v] = checked(a[v] + b[v]);
                acc.Add(sum, left._coeffs[i] * right._coeffs[j] * torus.TPower(torus.Form(a, b)));
            }
        }
        return acc.Build();
    }

    /// <summary>Product with a scalar of Q[t^{±1}].</summary>
    /// <param name="left">The scalar.</param>
    /// <param name="right">The element.</param>
    /// <returns>left·right.</returns>
    public static QuantumLaurentPolynomial operator *(LaurentPolynomial left, QuantumLaurentPolynomial right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        return right.Torus.Scalar(left) * right;
    }

    /// <summary>Sum (named form of <c>+</c>).</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns>The sum.</returns>
    public static QuantumLaurentPolynomial Add(QuantumLaurentPolynomial left, QuantumLaurentPolynomial right) => left + right;

    /// <summary>Difference (named form of <c>-</c>).</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static QuantumLaurentPolynomial Subtract(QuantumLaurentPolynomial left, QuantumLaurentPolynomial right) => left - right;

    /// <summary>Product (named form of <c>*</c>).</summary>
    /// <param name="left">Left factor.</param>
    /// <param name="right">Right factor.</param>
    /// <returns>The product.</returns>
    public static QuantumLaurentPolynomial Multiply(QuantumLaurentPolynomial left, QuantumLaurentPolynomial right) => left * right;

    /// <summary>Negation (named form).</summary>
    /// <param name="value">The element.</param>
    /// <returns>−value.</returns>
    public static QuantumLaurentPolynomial Negate(QuantumLaurentPolynomial value) => -value;

    /// <summary>Non-negative power.</summary>
    /// <param name="exponent">k ≥ 0.</param>
    /// <returns>this^k.</returns>
    public QuantumLaurentPolynomial Pow(int exponent)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(exponent);
        var r = Torus.One;
        for (int i = 0; i < exponent; i++) r *= this;
        return r;
    }

    /// <summary>Exact left division: finds Q with <paramref name="divisor"/>·Q = this.</summary>
    /// <param name="divisor">The divisor (same torus).</param>
    /// <param name="quotient">Q when the division is exact; zero otherwise.</param>
    /// <returns>True when the divisor divides this element on the left.</returns>
    /// <remarks>Leading-term division in decreasing lexicographic order (compatible with the product,
    /// since the torus is a domain); quotient exponents are confined to the box allowed by the per-variable
    /// degrees, so a non-divisor is recognised in finitely many steps.</remarks>
    public bool TryDivideLeft(QuantumLaurentPolynomial divisor, out QuantumLaurentPolynomial quotient) =>
        TryDivide(divisor, left: true, out quotient);

    /// <summary>Exact right division: finds Q with Q·<paramref name="divisor"/> = this.</summary>
    /// <param name="divisor">The divisor (same torus).</param>
    /// <param name="quotient">Q when the division is exact; zero otherwise.</param>
    /// <returns>True when the divisor divides this element on the right.</returns>
    public bool TryDivideRight(QuantumLaurentPolynomial divisor, out QuantumLaurentPolynomial quotient) =>
        TryDivide(divisor, left: false, out quotient);

    private bool TryDivide(QuantumLaurentPolynomial divisor, bool left, out QuantumLaurentPolynomial quotient)
    {
        Same(this, divisor);
        quotient = Torus.Zero;
        if (divisor.IsZero) return false;
        if (IsZero) return true;
        int m = Torus.Rank;
        var lo = new int[m];
        var hi = new int[m];
        for (int v = 0; v < m; v++)
        {
            lo[v] = MinExponent(v) - divisor.MinExponent(v);
            hi[v] = MaxExponent(v) - divisor.MaxExponent(v);
            if (lo[v] > hi[v]) return false;
        }
        var b = divisor.ExponentsOf(0).ToArray();
        var cb = divisor._coeffs[0];
        var rest = this;
        var q = Torus.Zero;
        var e = new int[m];
        while (!rest.IsZero)
        {
            var r = rest.ExponentsOf(0);
            for (int v = 0; v < m; v++)
            {
                e[v] = r[v] - b[v];
                if (e[v] < lo[v] || e[v] > hi[v]) return false;
            }
            // divisor·c X^e has leading term t^{Λ(b,e)} cb c X^{b+e}; c X^e·divisor has t^{Λ(e,b)} cb c X^{e+b}.
            long twist = left ? Torus.Form(b, e) : Torus.Form(e, b);
            if (!rest._coeffs[0].TryDivideExact(cb * Torus.TPower(twist), out var c)) return false;
            var term = Torus.Monomial(e, c);
            q += term;
            rest -= left ? divisor * term : term * divisor;
        }
        quotient = q;
        return true;
    }

    private int MinExponent(int v)
    {
        int m = int.MaxValue;
        for (int t = 0; t < TermCount; t++) m = Math.Min(m, _exps[t * Torus.Rank + v]);
        return m;
    }

    private int MaxExponent(int v)
    {
        int m = int.MinValue;
        for (int t = 0; t < TermCount; t++) m = Math.Max(m, _exps[t * Torus.Rank + v]);
        return m;
    }

    /// <summary>The bar involution: t ↦ t^{−1} in every coefficient, normalised monomials fixed
    /// (Berenstein–Zelevinsky 2005, Section 6).</summary>
    /// <returns>The image.</returns>
    public QuantumLaurentPolynomial Bar()
    {
        return new QuantumLaurentPolynomial(Torus, _exps, [.. _coeffs.Select(Reflect)]);
    }

    private static LaurentPolynomial Reflect(LaurentPolynomial c)
    {
        var b = c.Ring.CreateBuilder();
        foreach (var term in c.Terms) b.Add(term.Coefficient, [-term.Exponents[0]]);
        return b.ToPolynomial();
    }

    /// <summary>True when every coefficient is a Laurent polynomial in t with non-negative coefficients.</summary>
    public bool HasNonNegativeCoefficients => _coeffs.All(c => c.Coefficients.ToArray().All(r => r.Sign >= 0));

    /// <summary>The classical limit t = 1 (q = 1): Σ c_a(1) x^a in the commutative Laurent ring of
    /// <paramref name="ring"/>, whose variables correspond to the generators in order.</summary>
    /// <param name="ring">A Laurent polynomial ring with <see cref="QuantumTorus.Rank"/> variables.</param>
    /// <returns>The specialisation.</returns>
    /// <exception cref="ArgumentException">The ring has the wrong number of variables.</exception>
    public LaurentPolynomial AtClassicalLimit(LaurentPolynomialRing ring)
    {
        ArgumentNullException.ThrowIfNull(ring);
        if (ring.VariableCount != Torus.Rank)
            throw new ArgumentException($"the ring needs {Torus.Rank} variables, has {ring.VariableCount}", nameof(ring));
        var b = ring.CreateBuilder();
        for (int t = 0; t < TermCount; t++)
        {
            var c = _coeffs[t].Evaluate([Rational.One]);
            if (!c.IsZero) b.Add(c, ExponentsOf(t));
        }
        return b.ToPolynomial();
    }

    /// <inheritdoc/>
    public bool Equals(QuantumLaurentPolynomial? other) =>
        other is not null && Torus.Equals(other.Torus) && _exps.AsSpan().SequenceEqual(other._exps)
        && _coeffs.Length == other._coeffs.Length && _coeffs.Zip(other._coeffs).All(p => p.First == p.Second);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as QuantumLaurentPolynomial);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        foreach (var e in _exps) h.Add(e);
        foreach (var c in _coeffs) h.Add(c);
        return h.ToHashCode();
    }

    /// <summary>Equality.</summary>
    /// <param name="left">First element.</param>
    /// <param name="right">Second element.</param>
    /// <returns>True when equal.</returns>
    public static bool operator ==(QuantumLaurentPolynomial? left, QuantumLaurentPolynomial? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Inequality.</summary>
    /// <param name="left">First element.</param>
    /// <param name="right">Second element.</param>
    /// <returns>True when different.</returns>
    public static bool operator !=(QuantumLaurentPolynomial? left, QuantumLaurentPolynomial? right) => !(left == right);

    /// <summary>Text such as <c>x1^-1 + (t + t^-1)*x1^-1*x2</c>, each product of generators standing for
    /// the normalised monomial X^a.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Format(latex: false);

    /// <summary>LaTeX, with the normalised monomial X^a written as a product of generators.</summary>
    /// <returns>The LaTeX text (math mode, without delimiters).</returns>
    public string ToLatex() => Format(latex: true);

    private string Format(bool latex)
    {
        if (IsZero) return "0";
        var sb = new StringBuilder();
        for (int t = 0; t < TermCount; t++)
        {
            var c = _coeffs[t];
            string cs = latex ? c.ToLatex() : c.ToString();
            bool negative = c.TermCount == 1 && c.LeadingCoefficient.Sign < 0;
            if (negative) { cs = latex ? (-c).ToLatex() : (-c).ToString(); }
            if (t > 0) sb.Append(negative ? " - " : " + ");
            else if (negative) sb.Append('-');
            var mono = new List<string>();
            var e = ExponentsOf(t);
            for (int v = 0; v < e.Length; v++)
            {
                if (e[v] == 0) continue;
                string name = Torus.VariableNames[v];
                if (latex) mono.Add(e[v] == 1 ? name : $"{name}^{{{e[v]}}}");
                else mono.Add(e[v] == 1 ? name : $"{name}^{e[v]}");
            }
            bool unit = c.IsOne || (negative && (-c).IsOne);
            if (mono.Count == 0) sb.Append(cs);
            else
            {
                if (!unit) sb.Append(c.TermCount > 1 ? "(" + cs + ")" : cs).Append(latex ? " " : "*");
                sb.Append(string.Join(latex ? " " : "*", mono));
            }
        }
        return sb.ToString();
    }

    private static void Same(QuantumLaurentPolynomial a, QuantumLaurentPolynomial b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (!a.Torus.Equals(b.Torus)) throw new IncompatibleRingException($"elements of different quantum tori: {a.Torus} and {b.Torus}");
    }

    /// <summary>Sparse accumulation of terms, then sorting into canonical order.</summary>
    private sealed class Accumulator(QuantumTorus torus)
    {
        private readonly Dictionary<int[], LaurentPolynomial> _terms = new(ExponentComparer.Instance);

        public void Add(int[] e, LaurentPolynomial c)
        {
            if (c.IsZero) return;
            if (_terms.TryGetValue(e, out var old)) _terms[e] = old + c;
            else _terms[(int[])e.Clone()] = c;
        }

        public void AddAll(QuantumLaurentPolynomial p, LaurentPolynomial factor)
        {
            for (int t = 0; t < p.TermCount; t++) Add(p.ExponentsOf(t).ToArray(), p._coeffs[t] * factor);
        }

        public QuantumLaurentPolynomial Build()
        {
            var keys = _terms.Where(kv => !kv.Value.IsZero).Select(kv => kv.Key).ToList();
            keys.Sort((x, y) => Lex(y, x));
            int m = torus.Rank;
            var exps = new int[keys.Count * m];
            var coeffs = new LaurentPolynomial[keys.Count];
            for (int i = 0; i < keys.Count; i++)
            {
                keys[i].CopyTo(exps, i * m);
                coeffs[i] = _terms[keys[i]];
            }
            return new QuantumLaurentPolynomial(torus, exps, coeffs);
        }

        private static int Lex(int[] x, int[] y)
        {
            for (int i = 0; i < x.Length; i++)
                if (x[i] != y[i]) return x[i].CompareTo(y[i]);
            return 0;
        }
    }

    private sealed class ExponentComparer : IEqualityComparer<int[]>
    {
        public static readonly ExponentComparer Instance = new();
        public bool Equals(int[]? x, int[]? y) => x.AsSpan().SequenceEqual(y);
        public int GetHashCode(int[] obj)
        {
            var h = new HashCode();
            foreach (var v in obj) h.Add(v);
            return h.ToHashCode();
        }
    }
}
