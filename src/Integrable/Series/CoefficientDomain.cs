using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Series;

/// <summary>The coefficient field of a series ring: field operations, the characteristic, scalar square
/// roots, text, and the truncated-product kernel for coefficient vectors.</summary>
internal abstract class CoefficientDomain<T>
{
    public abstract IRing<T> Ring { get; }
    /// <summary>0 for Q, p for Z/pZ.</summary>
    public abstract ulong Characteristic { get; }
    public T Zero => Ring.Zero;
    public T One => Ring.One;
    public T Add(T a, T b) => Ring.Add(a, b);
    public T Subtract(T a, T b) => Ring.Subtract(a, b);
    public T Multiply(T a, T b) => Ring.Multiply(a, b);
    public T Negate(T a) => Ring.Negate(a);
    public bool IsZero(T a) => Ring.IsZero(a);
    public bool AreEqual(T a, T b) => Ring.AreEqual(a, b);
    public T FromInteger(long v) => Ring.FromInteger(v);
    public abstract bool IsOne(T a);
    /// <summary>Throws <see cref="ArgumentOutOfRangeException"/> when a is not a canonical element (a residue ≥ p).</summary>
    public virtual void Validate(T a, string parameter) { }
    /// <summary>Multiplicative inverse; throws <see cref="DivideByZeroException"/> for zero.</summary>
    public abstract T Inverse(T a);
    /// <summary>a/k for a non-zero integer k; throws <see cref="ArithmeticException"/> when k is zero in the field.</summary>
    public abstract T DivideByInteger(T a, long k);
    /// <summary>A square root of a when the field has one.</summary>
    public abstract bool TrySqrt(T a, out T root);
    public abstract string Format(T a);
    /// <summary>True when the printed form needs parentheses as a factor.</summary>
    public abstract bool NeedsParentheses(T a);
    public abstract int HashOf(T a);
    /// <summary>The first min(n, a.Length + b.Length − 1) coefficients of a·b.</summary>
    public abstract T[] MultiplyTruncated(ReadOnlySpan<T> a, ReadOnlySpan<T> b, int n, bool square);
    public abstract bool Equals(CoefficientDomain<T> other);
    public abstract int DomainHash { get; }
    public abstract string Name { get; }
}

/// <summary>Q as a series coefficient domain.</summary>
internal sealed class RationalDomain : CoefficientDomain<Rational>
{
    public static readonly RationalDomain Instance = new();
    private RationalDomain() { }
    public override IRing<Rational> Ring => RationalField.Instance;
    public override ulong Characteristic => 0;
    public override bool IsOne(Rational a) => a.IsOne;
    public override Rational Inverse(Rational a) => a.Inverse();
    public override Rational DivideByInteger(Rational a, long k) => a / k;
    public override bool TrySqrt(Rational a, out Rational root)
    {
        root = default;
        if (a.Sign < 0) return false;
        var n = RationalReconstruction.Sqrt(a.Numerator);
        var d = RationalReconstruction.Sqrt(a.Denominator);
        if (n * n != a.Numerator || d * d != a.Denominator) return false;
        root = new Rational(n, d);
        return true;
    }
    public override string Format(Rational a) => a.ToString();
    public override bool NeedsParentheses(Rational a) => !a.IsInteger;
    public override int HashOf(Rational a) => a.GetHashCode();
    public override Rational[] MultiplyTruncated(ReadOnlySpan<Rational> a, ReadOnlySpan<Rational> b, int n, bool square) =>
        RationalSeriesKernel.Multiply(a, b, n, square);
    public override bool Equals(CoefficientDomain<Rational> other) => ReferenceEquals(other, this);
    public override int DomainHash => 0;
    public override string Name => "Q";
}

/// <summary>Z/pZ as a series coefficient domain.</summary>
internal sealed class ModularDomain(PrimeField field) : CoefficientDomain<ulong>
{
    public PrimeField Field { get; } = field;
    public override IRing<ulong> Ring => Field;
    public override ulong Characteristic => Field.Modulus;
    public override bool IsOne(ulong a) => a == Field.One;
    public override void Validate(ulong a, string parameter)
    {
        if (a >= Field.Modulus) throw new ArgumentOutOfRangeException(parameter, a, $"coefficients over {Field} must be residues in [0, {Field.Modulus})");
    }
    public override ulong Inverse(ulong a) => Field.Inverse(a);
    public override ulong DivideByInteger(ulong a, long k)
    {
        ulong r = Field.FromInteger(k);
        if (r == 0) throw new ArithmeticException($"division by {k}, which is zero in {Field} (the characteristic is too small for this series operation at this precision)");
        return Field.Divide(a, r);
    }
    public override bool TrySqrt(ulong a, out ulong root) => ModularSquareRoot.TrySqrt(Field, a, out root);
    public override string Format(ulong a) => a.ToString(System.Globalization.CultureInfo.InvariantCulture);
    public override bool NeedsParentheses(ulong a) => false;
    public override int HashOf(ulong a) => a.GetHashCode();
    public override ulong[] MultiplyTruncated(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, int n, bool square) =>
        ModularSeriesKernel.Multiply(Field, a, b, n, square);
    public override bool Equals(CoefficientDomain<ulong> other) => other is ModularDomain m && m.Field.Equals(Field);
    public override int DomainHash => Field.GetHashCode();
    public override string Name => Field.ToString();
}

/// <summary>Square roots modulo a prime (Tonelli–Shanks).</summary>
internal static class ModularSquareRoot
{
    public static bool TrySqrt(PrimeField f, ulong a, out ulong root)
    {
        ulong p = f.Modulus;
        a %= p;
        root = 0;
        if (a == 0) return true;
        if (p == 2) { root = a; return true; }
        if (f.Pow(a, (long)((p - 1) / 2)) != 1) return false;
        ulong q = p - 1; int s = 0;
        while ((q & 1) == 0) { q >>= 1; s++; }
        ulong z = 2;
        while (f.Pow(z, (long)((p - 1) / 2)) != p - 1) z++;
        ulong c = f.Pow(z, (long)q), x = f.Pow(a, (long)((q + 1) / 2)), t = f.Pow(a, (long)q);
        int m = s;
        while (t != 1)
        {
            int i = 0; ulong tt = t;
            while (tt != 1) { tt = f.Multiply(tt, tt); i++; }
            ulong b = c;
            for (int j = 0; j < m - i - 1; j++) b = f.Multiply(b, b);
            x = f.Multiply(x, b); c = f.Multiply(b, b); t = f.Multiply(t, c); m = i;
        }
        root = Math.Min(x, p - x);
        return true;
    }
}
