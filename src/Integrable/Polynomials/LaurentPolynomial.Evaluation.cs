using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Polynomials;

public sealed partial class LaurentPolynomial
{
    /// <summary>Evaluates at a rational point.</summary>
    /// <param name="point">One value per ring variable.</param>
    /// <returns>The value p(point).</returns>
    /// <exception cref="ArgumentException"><paramref name="point"/> has the wrong length.</exception>
    /// <exception cref="NotInvertibleException">A variable that appears with a negative exponent is
    /// given the value 0.</exception>
    public Rational Evaluate(ReadOnlySpan<Rational> point) => Evaluate(RationalField.Instance, point);

    /// <summary>Evaluates in any commutative ring: coefficients are mapped with
    /// <see cref="IRing{T}.FromRational"/>, and negative powers use
    /// <see cref="IRing{T}.TryDivide"/> to invert the variable's value.</summary>
    /// <typeparam name="T">The element type of the target ring.</typeparam>
    /// <param name="ring">The target ring (Q, Z/pZ, doubles, polynomials, series…).</param>
    /// <param name="point">One value per ring variable.</param>
    /// <returns>The value p(point) in <paramref name="ring"/>.</returns>
    /// <remarks>Nested Horner scheme along the term order: terms sharing the exponents of variables
    /// 0..v−1 are contiguous, so the polynomial is evaluated as Σ_e x_v^e·p_e recursively, with
    /// about one ring multiplication per term plus the powers of the gaps between exponents.</remarks>
    /// <exception cref="ArgumentNullException"><paramref name="ring"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="point"/> has the wrong length.</exception>
    /// <exception cref="NotInvertibleException">A variable appears with a negative exponent and the
    /// ring cannot divide by its value.</exception>
    public T Evaluate<T>(IRing<T> ring, ReadOnlySpan<T> point)
    {
        ArgumentNullException.ThrowIfNull(ring);
        _ring.CheckExponentLength(point.Length, nameof(point));
        if (IsZero) return ring.Zero;
        var inverses = new T[point.Length];
        var haveInverse = new bool[point.Length];
        return EvaluateRange(ring, point, inverses, haveInverse, 0, _coeffs.Length, 0);
    }

    private T EvaluateRange<T>(IRing<T> ring, ReadOnlySpan<T> point, T[] inverses, bool[] haveInverse, int start, int end, int v)
    {
        int n = _ring.VariableCount;
        if (v == n) return ring.FromRational(_coeffs[start]); // exactly one term left
        T acc = default!;
        bool first = true;
        int prevExp = 0;
        int t = start;
        while (t < end)
        {
            int e = _exps[t * n + v];
            int u = t + 1;
            while (u < end && _exps[u * n + v] == e) u++;
            var inner = EvaluateRange(ring, point, inverses, haveInverse, t, u, v + 1);
            if (first) { acc = inner; first = false; }
            else acc = ring.Add(ring.Multiply(acc, Power(ring, point[v], prevExp - e)), inner);
            prevExp = e;
            t = u;
        }
        if (prevExp > 0) acc = ring.Multiply(acc, Power(ring, point[v], prevExp));
        else if (prevExp < 0)
        {
            if (!haveInverse[v])
            {
                if (!ring.TryDivide(ring.One, point[v], out inverses[v]))
                    throw new NotInvertibleException(
                        $"Variable '{_ring.Variables[v]}' appears with exponent {prevExp}, but its value {point[v]} has no inverse in {ring}.");
                haveInverse[v] = true;
            }
            acc = ring.Multiply(acc, Power(ring, inverses[v], -(long)prevExp));
        }
        return acc;
    }

    private static T Power<T>(IRing<T> ring, T x, long k)
    {
        if (k == 1) return x;
        T result = ring.One, sq = x;
        bool any = false;
        while (k > 0)
        {
            if ((k & 1) != 0) { result = any ? ring.Multiply(result, sq) : sq; any = true; }
            k >>= 1;
            if (k > 0) sq = ring.Multiply(sq, sq);
        }
        return result;
    }

    /// <summary>Substitutes a polynomial for one variable: p(…, x_v = value, …).</summary>
    /// <param name="variable">The variable's name.</param>
    /// <param name="value">The polynomial to put in its place (any ring; the result lives in the
    /// union of this ring and <paramref name="value"/>'s ring, see <see cref="LaurentPolynomialRing.Unify"/>).</param>
    /// <returns>The substituted polynomial.</returns>
    /// <exception cref="ArgumentException"><paramref name="variable"/> is not a variable of this ring.</exception>
    /// <exception cref="NotInvertibleException">The variable appears with a negative exponent and
    /// <paramref name="value"/> is not a monomial (not a unit of the Laurent ring).</exception>
    public LaurentPolynomial Substitute(string variable, LaurentPolynomial value)
    {
        ArgumentNullException.ThrowIfNull(value);
        int v = _ring.RequireIndex(variable);
        return Substitute(new Dictionary<string, LaurentPolynomial>(StringComparer.Ordinal) { [_ring.Variables[v]] = value });
    }

    /// <summary>Substitutes a polynomial for the variable at position <paramref name="variable"/>.</summary>
    /// <param name="variable">The variable's index.</param>
    /// <param name="value">The polynomial to put in its place.</param>
    /// <returns>The substituted polynomial.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="variable"/> is out of range.</exception>
    /// <exception cref="NotInvertibleException">A negative power of a non-monomial value is needed.</exception>
    public LaurentPolynomial Substitute(int variable, LaurentPolynomial value)
    {
        _ring.CheckIndex(variable);
        return Substitute(_ring.Variables[variable], value);
    }

    /// <summary>Simultaneous substitution: every variable named in <paramref name="values"/> is
    /// replaced by its polynomial at once (so x → y, y → x swaps them); other variables stay.</summary>
    /// <param name="values">Variable name → replacement polynomial (any rings).</param>
    /// <returns>The result in the union of this ring and the values' rings.</returns>
    /// <exception cref="ArgumentException">A key is not a variable of this ring.</exception>
    /// <exception cref="NotInvertibleException">A variable appears with a negative exponent and its
    /// value is not a monomial.</exception>
    public LaurentPolynomial Substitute(IReadOnlyDictionary<string, LaurentPolynomial> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var target = _ring;
        foreach (var (name, value) in values)
        {
            _ring.RequireIndex(name);
            ArgumentNullException.ThrowIfNull(value, nameof(values));
            target = target.Unify(value.Ring);
        }
        int n = _ring.VariableCount;
        var point = new LaurentPolynomial[n];
        for (int v = 0; v < n; v++)
            point[v] = values.TryGetValue(_ring.Variables[v], out var val) ? target.Embed(val) : target.Variable(_ring.Variables[v]);
        return Evaluate<LaurentPolynomial>(target, point);
    }
}
