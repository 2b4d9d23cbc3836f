using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Text;

/// <summary>Evaluates expressions in any ring and lists their symbols.</summary>
/// <example><code>
/// var e = ExpressionParser.Parse("(x_n^2 + 1)/x_{n-1}");
/// var values = new Dictionary&lt;string, Rational&gt; { ["x_n"] = 3, ["x_{n-1}"] = 2 };
/// Rational r = ExpressionEvaluator.Evaluate(e, RationalField.Instance, values);   // 5
/// </code></example>
public static class ExpressionEvaluator
{
    /// <summary>Evaluates <paramref name="expression"/> in <paramref name="ring"/>.</summary>
    /// <typeparam name="T">The ring's element type.</typeparam>
    /// <param name="expression">The expression.</param>
    /// <param name="ring">The ring to compute in.</param>
    /// <param name="resolve">Gives the value of each symbol. It may throw <see cref="KeyNotFoundException"/> for an
    /// unknown symbol; that becomes an <see cref="ExpressionEvaluationException"/> pointing at the symbol. Other
    /// exceptions it throws pass through unchanged.</param>
    /// <returns>The value. Numbers enter through <see cref="IRing{T}.FromInteger"/> or <see cref="IRing{T}.FromRational"/>,
    /// powers are computed by repeated squaring, and <c>/</c> and negative powers through
    /// <see cref="IRing{T}.TryDivide"/>. Terms and factors are combined left to right; 0^0 = 1.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ExpressionEvaluationException">A division is not exact (or by zero), a number does not exist in
    /// the ring, or a symbol is unknown; the exception carries the offending sub-expression and its span.</exception>
    public static T Evaluate<T>(Expression expression, IRing<T> ring, Func<SymbolExpression, T> resolve)
    {
        ArgumentNullException.ThrowIfNull(expression);
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(resolve);
        return Eval(expression, ring, resolve);
    }

    /// <summary>Evaluates <paramref name="expression"/> in <paramref name="ring"/> with symbol values looked up by
    /// canonical name (<see cref="SymbolExpression.Name"/>, e.g. <c>x_{n+1}</c>).</summary>
    /// <typeparam name="T">The ring's element type.</typeparam>
    /// <param name="expression">The expression.</param>
    /// <param name="ring">The ring to compute in.</param>
    /// <param name="values">Symbol values by canonical name.</param>
    /// <returns>The value, as for <see cref="Evaluate{T}(Expression, IRing{T}, Func{SymbolExpression, T})"/>.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ExpressionEvaluationException">A symbol has no value, a division is not exact, or a number does
    /// not exist in the ring.</exception>
    public static T Evaluate<T>(Expression expression, IRing<T> ring, IReadOnlyDictionary<string, T> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        return Evaluate(expression, ring, s => values.TryGetValue(s.Name, out var v) ? v : throw new KeyNotFoundException(s.Name));
    }

    /// <summary>The distinct symbols of <paramref name="expression"/> in order of first appearance (left to right).
    /// Symbols inside subscripts are part of their symbol's name and are not listed separately.</summary>
    /// <param name="expression">The expression.</param>
    /// <returns>One representative per canonical name.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="expression"/> is null.</exception>
    public static IReadOnlyList<SymbolExpression> Symbols(Expression expression)
    {
        ArgumentNullException.ThrowIfNull(expression);
        var found = new List<SymbolExpression>();
        Collect(expression, found, new HashSet<string>(StringComparer.Ordinal));
        return found.AsReadOnly();
    }

    private static void Collect(Expression e, List<SymbolExpression> found, HashSet<string> seen)
    {
        switch (e)
        {
            case SymbolExpression s:
                if (seen.Add(s.Name)) found.Add(s);
                break;
            case NegationExpression g:
                Collect(g.Operand, found, seen);
                break;
            case PowerExpression p:
                Collect(p.Base, found, seen); // the exponent is a constant
                break;
            case SumExpression sum:
                foreach (var t in sum.Terms) Collect(t.Value, found, seen);
                break;
            case ProductExpression prod:
                foreach (var f in prod.Factors) Collect(f.Value, found, seen);
                break;
        }
    }

    private static T Eval<T>(Expression e, IRing<T> ring, Func<SymbolExpression, T> resolve)
    {
        switch (e)
        {
            case NumberExpression n:
                return Number(n, ring);
            case SymbolExpression s:
                try { return resolve(s); }
                catch (KeyNotFoundException ex) { throw new ExpressionEvaluationException(s, $"the symbol '{s.Name}' has no value", ex); }
            case NegationExpression g:
                return ring.Negate(Eval(g.Operand, ring, resolve));
            case SumExpression sum:
            {
                var acc = Eval(sum.Terms[0].Value, ring, resolve);
                for (int i = 1; i < sum.Terms.Count; i++)
                {
                    var v = Eval(sum.Terms[i].Value, ring, resolve);
                    acc = sum.Terms[i].IsSubtracted ? ring.Subtract(acc, v) : ring.Add(acc, v);
                }
                return acc;
            }
            case ProductExpression prod:
            {
                var acc = Eval(prod.Factors[0].Value, ring, resolve);
                for (int i = 1; i < prod.Factors.Count; i++)
                {
                    var f = prod.Factors[i];
                    var v = Eval(f.Value, ring, resolve);
                    if (!f.IsDivisor) acc = ring.Multiply(acc, v);
                    else if (!ring.TryDivide(acc, v, out acc))
                        throw new ExpressionEvaluationException(f.Value, ring.IsZero(v) ? "division by zero" : "the division is not exact in this ring");
                }
                return acc;
            }
            case PowerExpression p:
            {
                var b = Eval(p.Base, ring, resolve);
                int k = p.ExponentValue;
                var power = Pow(ring, b, Math.Abs(k));
                if (k >= 0) return power;
                if (ring.TryDivide(ring.One, power, out var inverse)) return inverse;
                throw new ExpressionEvaluationException(p, ring.IsZero(power)
                    ? "division by zero (zero to a negative power)"
                    : "the base of this negative power is not invertible in this ring");
            }
            default:
                throw new InvalidOperationException($"Unknown expression node {e.GetType().Name}.");
        }
    }

    private static T Number<T>(NumberExpression n, IRing<T> ring)
    {
        Rational value = n.Value;
        if (value.TryGetSmall(out long num, out long den) && den == 1) return ring.FromInteger(num);
        try { return ring.FromRational(value); }
        catch (DivideByZeroException ex) { throw new ExpressionEvaluationException(n, $"the number {value} does not exist in this ring", ex); }
    }

    /// <summary>b^k for k ≥ 0 by repeated squaring (right-to-left binary method).</summary>
    private static T Pow<T>(IRing<T> ring, T b, int k)
    {
        if (k == 0) return ring.One;
        T? result = default;
        bool started = false;
        while (true)
        {
            if ((k & 1) != 0)
            {
                result = started ? ring.Multiply(result!, b) : b;
                started = true;
            }
            k >>= 1;
            if (k == 0) return result!;
            b = ring.Multiply(b, b);
        }
    }
}
