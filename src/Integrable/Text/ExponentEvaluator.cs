using Integrable.Numbers;

namespace Integrable.Text;

/// <summary>Reads the value of a power's exponent: a constant expression (no symbols) whose exact value is an
/// integer of absolute value at most <see cref="PowerExpression.MaxExponent"/>.</summary>
/// <remarks>Intermediate values are capped at <see cref="MaxBits"/> bits so that input such as
/// <c>x^(9^9^9)</c> is rejected quickly instead of computing a huge number.</remarks>
internal static class ExponentEvaluator
{
    /// <summary>Largest numerator or denominator bit length allowed while evaluating an exponent.</summary>
    public const int MaxBits = 1024;

    /// <summary>Why an exponent was rejected and which sub-expression is at fault.</summary>
    public readonly record struct Failure(string Reason, Expression Culprit);

    public static bool TryEvaluate(Expression exponent, out int value, out Failure failure)
    {
        value = 0;
        if (!TryValue(exponent, out var r, out failure)) return false;
        if (!r.IsInteger)
        {
            failure = new Failure($"the exponent {r} is not an integer", exponent);
            return false;
        }
        if (Rational.Abs(r) > PowerExpression.MaxExponent)
        {
            failure = new Failure($"the exponent {r} is beyond the limit of ±{PowerExpression.MaxExponent}", exponent);
            return false;
        }
        value = (int)(long)r;
        return true;
    }

    private static bool TryValue(Expression e, out Rational value, out Failure failure)
    {
        value = default;
        failure = default;
        switch (e)
        {
            case NumberExpression n:
                value = n.Value;
                break;
            case SymbolExpression s:
                failure = new Failure($"the exponent must be an integer constant, but it contains the symbol '{s.Name}'", s);
                return false;
            case NegationExpression g:
                if (!TryValue(g.Operand, out value, out failure)) return false;
                value = -value;
                break;
            case SumExpression sum:
                foreach (var t in sum.Terms)
                {
                    if (!TryValue(t.Value, out var v, out failure)) return false;
                    value = t.IsSubtracted ? value - v : value + v;
                    if (!Fits(value, e, out failure)) return false;
                }
                return true;
            case ProductExpression p:
                value = Rational.One;
                foreach (var f in p.Factors)
                {
                    if (!TryValue(f.Value, out var v, out failure)) return false;
                    if (f.IsDivisor && v.IsZero)
                    {
                        failure = new Failure("division by zero in the exponent", f.Value);
                        return false;
                    }
                    value = f.IsDivisor ? value / v : value * v;
                    if (!Fits(value, e, out failure)) return false;
                }
                return true;
            case PowerExpression w:
                if (!TryValue(w.Base, out var b, out failure)) return false;
                int k = w.ExponentValue;
                if (b.IsZero && k < 0)
                {
                    failure = new Failure("division by zero in the exponent (zero to a negative power)", w);
                    return false;
                }
                long bits = Math.Max(b.Numerator.GetBitLength(), b.Denominator.GetBitLength());
                if (bits > 1 && bits * Math.Abs((long)k) > MaxBits)
                {
                    failure = new Failure("a number in the exponent is too large", w);
                    return false;
                }
                value = b.Pow(k);
                break;
            default:
                throw new InvalidOperationException($"Unknown expression node {e.GetType().Name}.");
        }
        return Fits(value, e, out failure);
    }

    private static bool Fits(Rational value, Expression at, out Failure failure)
    {
        failure = default;
        if (value.IsSmall || Math.Max(value.Numerator.GetBitLength(), value.Denominator.GetBitLength()) <= MaxBits) return true;
        failure = new Failure("a number in the exponent is too large", at);
        return false;
    }
}
