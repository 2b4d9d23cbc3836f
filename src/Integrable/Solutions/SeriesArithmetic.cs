using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Solutions;

/// <summary>Power series over Q in the weight variable, seen as an <see cref="IRing{T}"/> so that compiled
/// recursions and equations evaluate in it; quotients are taken to a fixed working precision.</summary>
internal sealed class SeriesArithmetic : IRing<PowerSeries<Rational>>
{
    public SeriesArithmetic(PowerSeriesRing<Rational> ring, int precision)
    {
        Ring = ring;
        Precision = precision;
        Zero = ring.Zero;
        One = ring.One;
    }

    public PowerSeriesRing<Rational> Ring { get; }
    public int Precision { get; }
    public PowerSeries<Rational> Zero { get; }
    public PowerSeries<Rational> One { get; }
    public PowerSeries<Rational> FromInteger(long value) => Ring.Constant(value);
    public PowerSeries<Rational> FromRational(Rational value) => Ring.Constant(value);
    public PowerSeries<Rational> Add(PowerSeries<Rational> a, PowerSeries<Rational> b) => a + b;
    public PowerSeries<Rational> Subtract(PowerSeries<Rational> a, PowerSeries<Rational> b) => a - b;
    public PowerSeries<Rational> Multiply(PowerSeries<Rational> a, PowerSeries<Rational> b) => PowerSeries<Rational>.MultiplyCore(a, b, Precision);
    public PowerSeries<Rational> Negate(PowerSeries<Rational> a) => -a;
    public bool IsZero(PowerSeries<Rational> a) => a.Truncate(Precision).IsZero;
    public bool AreEqual(PowerSeries<Rational> a, PowerSeries<Rational> b) => (a - b).Truncate(Precision).IsZero;

    public bool TryDivide(PowerSeries<Rational> a, PowerSeries<Rational> b, out PowerSeries<Rational> quotient)
    {
        quotient = Zero;
        if (b.IsZero || b.Valuation > 0 && !(a.IsExact && a.IsZero)) return false;
        quotient = PowerSeries<Rational>.Divide(a, b, Precision);
        return true;
    }
}
