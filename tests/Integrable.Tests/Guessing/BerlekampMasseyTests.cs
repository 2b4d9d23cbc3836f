using Integrable.Guessing;
using Integrable.Numbers;

namespace Integrable.Tests.Guessing;

public class BerlekampMasseyTests
{
    [Fact]
    public void Find_Fibonacci_RecoversRecurrence()
    {
        // Fibonacci numbers, OEIS A000045: a_n = a_{n−1} + a_{n−2}, a_0 = 0, a_1 = 1.
        var a = new Rational[25];
        a[0] = 0; a[1] = 1;
        for (int n = 2; n < a.Length; n++) a[n] = a[n - 1] + a[n - 2];
        var g = BerlekampMassey.Find(a);
        Assert.True(g.IsFound, g.Explanation);
        Assert.Equal(2, g.Value.Order);
        Assert.Equal(new Rational[] { 1, 1 }, g.Value.Coefficients.ToArray());
        Assert.Equal(4, g.TermsUsed);
        Assert.Equal(21, g.TermsConfirmed);
        Assert.Equal(a, g.Value.Terms(25));
        Assert.Equal("a(n) = a(n-1) + a(n-2)", g.Value.ToString());
    }

    [Fact]
    public void Find_RandomOrder5_OverQ()
    {
        var rng = new Random(42);
        var c = new Rational[5];
        for (int i = 0; i < 5; i++) c[i] = new Rational(rng.Next(-9, 10), rng.Next(1, 5));
        c[4] = new Rational(rng.Next(1, 9), 7);
        var a = new Rational[30];
        for (int n = 0; n < a.Length; n++)
        {
            if (n < 5) { a[n] = rng.Next(-20, 21); continue; }
            Rational s = 0;
            for (int i = 0; i < 5; i++) s += c[i] * a[n - 1 - i];
            a[n] = s;
        }
        var g = BerlekampMassey.Find(a);
        Assert.True(g.IsFound, g.Explanation);
        Assert.Equal(c, g.Value.Coefficients.ToArray());
        Assert.Equal(10, g.TermsUsed);
        Assert.Equal(20, g.TermsConfirmed);
    }

    [Fact]
    public void Find_RandomOrder5_ModP()
    {
        var f = new PrimeField(1_000_000_007);
        var rng = new Random(7);
        var c = new ulong[5];
        for (int i = 0; i < 5; i++) c[i] = (ulong)rng.NextInt64(1, (long)f.Modulus);
        var a = new ulong[24];
        for (int n = 0; n < a.Length; n++)
        {
            if (n < 5) { a[n] = (ulong)rng.NextInt64(0, (long)f.Modulus); continue; }
            ulong s = 0;
            for (int i = 0; i < 5; i++) s = f.Add(s, f.Multiply(c[i], a[n - 1 - i]));
            a[n] = s;
        }
        var g = BerlekampMassey.Find(f, a);
        Assert.True(g.IsFound, g.Explanation);
        Assert.Equal(c, g.Value.Coefficients.ToArray());
        Assert.Equal(a, g.Value.Terms(a.Length));
    }

    [Fact]
    public void Find_TooFewTerms_NotFoundButCandidate()
    {
        // a_n = 2a_{n−1} − a_{n−3} + 3a_{n−4} + a_{n−5}: 13 terms leave only 3 confirmations.
        var a = new Rational[13];
        for (int n = 0; n < 5; n++) a[n] = n * n + 1;
        for (int n = 5; n < a.Length; n++) a[n] = 2 * a[n - 1] - a[n - 3] + 3 * a[n - 4] + a[n - 5];
        var g = BerlekampMassey.Find(a);
        Assert.False(g.IsFound);
        Assert.NotNull(g.Candidate);
        Assert.Equal(3, g.TermsConfirmed);
        Assert.Throws<InvalidOperationException>(() => g.Value);
        Assert.True(BerlekampMassey.Find(a, minimumConfirmations: 3).IsFound);
    }

    [Fact]
    public void Find_UnreducedResidue_Throws()
    {
        var f = new PrimeField(101);
        Assert.Throws<ArgumentOutOfRangeException>(() => BerlekampMassey.Find(f, new ulong[] { 1, 200 }));
    }
}
