using System.Globalization;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.RationalFunctions;

public sealed partial class RationalFunction
{
    /// <summary>The value at a rational point.</summary>
    /// <param name="point">One value per variable of the field.</param>
    /// <returns>numerator(point)/denominator(point).</returns>
    /// <exception cref="ArgumentException"><paramref name="point"/> has the wrong length.</exception>
    /// <exception cref="PoleException">The denominator vanishes at <paramref name="point"/>.</exception>
    public Rational Evaluate(ReadOnlySpan<Rational> point)
    {
        var d = Denominator.Evaluate(point);
        if (d.IsZero) throw new PoleException($"{this} has no value at {Describe(point)}: the denominator vanishes there{(Numerator.Evaluate(point).IsZero ? " (and so does the numerator)" : "")}.");
        return Numerator.Evaluate(point) / d;
    }

    /// <summary>The reduction modulo p at a point of (Z/pZ)ⁿ.</summary>
    /// <param name="field">The prime field Z/pZ.</param>
    /// <param name="point">One residue per variable.</param>
    /// <returns>numerator(point)·denominator(point)⁻¹ mod p.</returns>
    /// <exception cref="ArgumentException"><paramref name="point"/> has the wrong length.</exception>
    /// <exception cref="PoleException">The denominator vanishes mod p at the point, or p divides the
    /// denominator of a coefficient (the function has no reduction mod p).</exception>
    public ulong Evaluate(PrimeField field, ReadOnlySpan<ulong> point)
    {
        ArgumentNullException.ThrowIfNull(field);
        foreach (var x in point)
            if (x >= field.Modulus) throw new ArgumentOutOfRangeException(nameof(point), x, $"residues must be below {field.Modulus}");
        ulong n, d;
        try
        {
            n = Numerator.Evaluate(field, point);
            d = Denominator.Evaluate(field, point);
        }
        catch (DivideByZeroException ex)
        {
            throw new PoleException($"{this} has no reduction modulo {field.Modulus}: {field.Modulus} divides the denominator of a coefficient ({ex.Message}).");
        }
        if (d == 0) throw new PoleException($"{this} has no value modulo {field.Modulus} at ({string.Join(", ", point.ToArray())}): the denominator vanishes there.");
        return field.Divide(n, d);
    }

    /// <summary>The value in any ring that can divide by the denominator's value (Z/pZ, doubles,
    /// series, other rational functions…).</summary>
    /// <typeparam name="T">The ring's element type.</typeparam>
    /// <param name="ring">The target ring.</param>
    /// <param name="point">One value per variable.</param>
    /// <returns>numerator(point)/denominator(point) in <paramref name="ring"/>.</returns>
    /// <exception cref="PoleException">The ring cannot divide by the denominator's value.</exception>
    public T Evaluate<T>(IRing<T> ring, ReadOnlySpan<T> point)
    {
        ArgumentNullException.ThrowIfNull(ring);
        var n = Numerator.Evaluate(ring, point);
        var d = Denominator.Evaluate(ring, point);
        if (!ring.TryDivide(n, d, out var q))
            throw new PoleException($"{this} has no value in {ring} at the given point: {(ring.IsZero(d) ? "the denominator vanishes there" : "the denominator's value is not invertible")}.");
        return q;
    }

    /// <summary>Substitutes a rational function for one variable.</summary>
    /// <param name="variable">The variable's name.</param>
    /// <param name="value">Its replacement (any field; the result lives in the union of the fields).</param>
    /// <returns>The composed function.</returns>
    /// <exception cref="ArgumentException"><paramref name="variable"/> is not a variable of this field.</exception>
    /// <exception cref="PoleException">The denominator becomes zero after substitution.</exception>
    public RationalFunction Substitute(string variable, RationalFunction value)
    {
        ArgumentNullException.ThrowIfNull(variable);
        ArgumentNullException.ThrowIfNull(value);
        Field.PolynomialRing.RequireIndex(variable);
        return Substitute(new Dictionary<string, RationalFunction>(StringComparer.Ordinal) { [variable] = value });
    }

    /// <summary>Simultaneous substitution (composition): every variable named in <paramref name="values"/>
    /// is replaced at once by its rational function; the others stay.</summary>
    /// <param name="values">Variable name → replacement (any fields).</param>
    /// <returns>The composed function, canonical, in the union of the fields.</returns>
    /// <remarks>Each of numerator and denominator is homogenised: P(p₁/q₁, …) = P̃/Π qᵢ^dᵢ with dᵢ the
    /// degree of P in xᵢ and P̃ a polynomial, so the whole composition costs polynomial products and
    /// one final gcd.</remarks>
    /// <exception cref="ArgumentException">A key is not a variable of this field.</exception>
    /// <exception cref="PoleException">The denominator becomes zero after substitution.</exception>
    public RationalFunction Substitute(IReadOnlyDictionary<string, RationalFunction> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var target = Field;
        foreach (var (name, value) in values)
        {
            Field.PolynomialRing.RequireIndex(name);
            ArgumentNullException.ThrowIfNull(value, nameof(values));
            target = target.Unify(value.Field);
        }
        var ring = target.PolynomialRing;
        int n = Field.PolynomialRing.VariableCount;
        var p = new LaurentPolynomial[n];
        var q = new LaurentPolynomial[n];
        for (int v = 0; v < n; v++)
        {
            var name = Field.Variables[v];
            if (values.TryGetValue(name, out var val))
            {
                var e = target.Embed(val);
                p[v] = e.Numerator;
                q[v] = e.Denominator;
            }
            else
            {
                p[v] = ring.Variable(name);
                q[v] = ring.One;
            }
        }
        var dn = Degrees(Numerator);
        var dd = Degrees(Denominator);
        var num = Homogenise(Numerator, p, q, dn, ring);
        var den = Homogenise(Denominator, p, q, dd, ring);
        if (den.IsZero) throw new PoleException($"Substitution into {this} makes the denominator vanish identically.");
        for (int v = 0; v < n; v++)
        {
            if (q[v].IsOne) continue;
            if (dd[v] > dn[v]) num *= q[v].Pow(dd[v] - dn[v]);
            else if (dn[v] > dd[v]) den *= q[v].Pow(dn[v] - dd[v]);
        }
        return Canonical(target, num, den);
    }

    /// <summary>Composition with one rational function per variable, in the field's variable order.</summary>
    /// <param name="values">The replacements of x₁, …, xₙ (any fields).</param>
    /// <returns>this(values₁, …, valuesₙ).</returns>
    /// <exception cref="ArgumentException">Not one value per variable.</exception>
    /// <exception cref="PoleException">The denominator becomes zero after substitution.</exception>
    public RationalFunction Compose(params RationalFunction[] values)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (values.Length != Field.PolynomialRing.VariableCount)
            throw new ArgumentException($"Expected {Field.PolynomialRing.VariableCount} values (one per variable of {Field}), got {values.Length}.", nameof(values));
        var map = new Dictionary<string, RationalFunction>(StringComparer.Ordinal);
        for (int v = 0; v < values.Length; v++) map[Field.Variables[v]] = values[v];
        return Substitute(map);
    }

    private static int[] Degrees(LaurentPolynomial p)
    {
        int n = p.Ring.VariableCount;
        var d = new int[n];
        if (p.IsZero) return d;
        for (int v = 0; v < n; v++) d[v] = p.MaxExponent(v);
        return d;
    }

    /// <summary>Σ c·Π pᵢ^eᵢ·qᵢ^(dᵢ−eᵢ), nested along the term order (terms sharing the leading exponents are contiguous).</summary>
    private static LaurentPolynomial Homogenise(LaurentPolynomial poly, LaurentPolynomial[] p, LaurentPolynomial[] q, int[] d, LaurentPolynomialRing ring)
    {
        if (poly.IsZero) return ring.Zero;
        int n = p.Length;
        var pp = new Dictionary<(int, int), LaurentPolynomial>();
        var qp = new Dictionary<(int, int), LaurentPolynomial>();
        LaurentPolynomial Power(LaurentPolynomial[] b, Dictionary<(int, int), LaurentPolynomial> cache, int v, int k)
        {
            if (k == 0) return ring.One;
            if (!cache.TryGetValue((v, k), out var r)) cache[(v, k)] = r = b[v].Pow(k);
            return r;
        }
        var coeffs = poly.Coefficients.ToArray();
        var exps = poly.Exponents.ToArray();
        LaurentPolynomial Range(int start, int end, int v)
        {
            if (v == n) return ring.Constant(coeffs[start]);
            var acc = ring.Zero;
            int t = start;
            while (t < end)
            {
                int e = exps[t * n + v];
                int u = t + 1;
                while (u < end && exps[u * n + v] == e) u++;
                var inner = Range(t, u, v + 1);
                acc += inner * Power(p, pp, v, e) * Power(q, qp, v, d[v] - e);
                t = u;
            }
            return acc;
        }
        return Range(0, coeffs.Length, 0);
    }

    private string Describe(ReadOnlySpan<Rational> point)
    {
        var parts = new List<string>();
        for (int v = 0; v < point.Length && v < Field.Variables.Count; v++)
            parts.Add(Field.Variables[v] + " = " + point[v].ToString());
        return "(" + string.Join(", ", parts) + ")";
    }
}
