using Integrable.Analyses;
using Integrable.Numbers;

namespace Integrable.Tests.Analyses;

/// <summary>A slow obvious reference for univariate rational functions over Z/pZ: dense coefficient
/// arrays, schoolbook products and Euclid's gcd, reduced with a monic denominator.</summary>
internal sealed record NaiveFraction(ulong[] Num, ulong[] Den);

internal sealed class NaiveLineField(PrimeField field) : ILineField<NaiveFraction>
{
    public PrimeField Field { get; } = field;
    public NaiveFraction Zero => new([], [1]);
    public NaiveFraction One => new([1], [1]);
    public NaiveFraction FromInteger(long value) => Residue(Field.FromInteger(value));
    public NaiveFraction FromRational(Rational value) => Residue(Field.FromRational(value));
    public NaiveFraction Residue(ulong c) => c == 0 ? Zero : new([c], [1]);
    public NaiveFraction Line(ulong a, ulong b) => new(Trim([a, b]), [1]);
    public NaiveFraction Reduce(NaiveFraction v) => v;
    public (int Numerator, int Denominator) Degrees(NaiveFraction v) => (v.Num.Length - 1, v.Den.Length - 1);
    public bool IsZero(NaiveFraction a) => a.Num.Length == 0;
    public bool AreEqual(NaiveFraction a, NaiveFraction b) => a.Num.AsSpan().SequenceEqual(b.Num) && a.Den.AsSpan().SequenceEqual(b.Den);
    public NaiveFraction Negate(NaiveFraction a) => new(a.Num.Select(Field.Negate).ToArray(), a.Den);
    public NaiveFraction Add(NaiveFraction a, NaiveFraction b) => Make(Plus(Mul(a.Num, b.Den), Mul(b.Num, a.Den)), Mul(a.Den, b.Den));
    public NaiveFraction Subtract(NaiveFraction a, NaiveFraction b) => Add(a, Negate(b));
    public NaiveFraction Multiply(NaiveFraction a, NaiveFraction b) => Make(Mul(a.Num, b.Num), Mul(a.Den, b.Den));
    public bool TryDivide(NaiveFraction a, NaiveFraction b, out NaiveFraction q)
    {
        q = Zero;
        if (b.Num.Length == 0) return false;
        q = Make(Mul(a.Num, b.Den), Mul(a.Den, b.Num));
        return true;
    }

    private NaiveFraction Make(ulong[] n, ulong[] d)
    {
        if (n.Length == 0) return Zero;
        var g = Gcd(n, d);
        n = DivExact(n, g);
        d = DivExact(d, g);
        ulong inv = Field.Inverse(d[^1]);
        return new(n.Select(c => Field.Multiply(c, inv)).ToArray(), d.Select(c => Field.Multiply(c, inv)).ToArray());
    }

    private static ulong[] Trim(ulong[] a)
    {
        int n = a.Length;
        while (n > 0 && a[n - 1] == 0) n--;
        return a[..n];
    }

    private ulong[] Plus(ulong[] a, ulong[] b)
    {
        var r = new ulong[Math.Max(a.Length, b.Length)];
        for (int i = 0; i < r.Length; i++) r[i] = Field.Add(i < a.Length ? a[i] : 0, i < b.Length ? b[i] : 0);
        return Trim(r);
    }

    private ulong[] Mul(ulong[] a, ulong[] b)
    {
        if (a.Length == 0 || b.Length == 0) return [];
        var r = new ulong[a.Length + b.Length - 1];
        for (int i = 0; i < a.Length; i++)
            for (int j = 0; j < b.Length; j++) r[i + j] = Field.Add(r[i + j], Field.Multiply(a[i], b[j]));
        return Trim(r);
    }

    private (ulong[] Q, ulong[] R) DivRem(ulong[] a, ulong[] b)
    {
        var r = (ulong[])a.Clone();
        var q = new ulong[Math.Max(a.Length - b.Length + 1, 0)];
        ulong inv = Field.Inverse(b[^1]);
        for (int i = a.Length - b.Length; i >= 0; i--)
        {
            ulong c = Field.Multiply(r[i + b.Length - 1], inv);
            q[i] = c;
            if (c == 0) continue;
            for (int j = 0; j < b.Length; j++) r[i + j] = Field.Subtract(r[i + j], Field.Multiply(c, b[j]));
        }
        return (Trim(q), Trim(r));
    }

    private ulong[] Gcd(ulong[] a, ulong[] b)
    {
        while (b.Length > 0) (a, b) = (b, DivRem(a, b).R);
        return a;
    }

    private ulong[] DivExact(ulong[] a, ulong[] b) => DivRem(a, b).Q;
}
