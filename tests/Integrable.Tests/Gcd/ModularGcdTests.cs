using System.Numerics;
using Integrable.Kernels.Gcd;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Gcd;

/// <summary>The modular machinery under forced bad luck: primes and evaluation points are injected
/// through <see cref="GcdHooks"/>, and the counters show that the wrong images were detected.</summary>
public sealed class ModularGcdTests : IDisposable
{
    private static readonly LaurentPolynomialRing R = new("x", "y");

    public ModularGcdTests() => GcdHooks.Reset();

    public void Dispose() => GcdHooks.Reset();

    private static LaurentPolynomial P(string s) => LaurentPolynomial.Parse(R, s);

    private static void AssertGcd(LaurentPolynomial a, LaurentPolynomial b, LaurentPolynomial f)
    {
        var (g, ca, cb) = a.GcdWithCofactors(b);
        Assert.Equal(GcdTestData.Normalised(f), g);
        Assert.Equal(a, g * ca);
        Assert.Equal(b, g * cb);
    }

    [Fact]
    public void UnluckyPrimeFirst_ImageTooHigh_RestartsRemaindering()
    {
        // g − h = p, so gcd(g, h) = 1 over Q but g ≡ h mod p: the image mod p has degree too high.
        ulong p = Primes.Large(200);
        var f = P("x^2 y - 3 x + y^3 + 7");
        var g = P("x y + 2 x + 5") + new Rational(p);
        var h = P("x y + 2 x + 5");
        GcdHooks.ForcedPrimes = new Queue<ulong>([p]);
        AssertGcd(f * g, f * h, f);
        Assert.True(GcdHooks.Restarts >= 1, "the lower-degree image of a good prime must restart the remaindering");
    }

    [Fact]
    public void UnluckyPrimeLater_ImageTooHigh_IsDiscarded()
    {
        // Coefficients past 2^128 need several primes, so the unlucky prime (second) meets a good image.
        ulong good = Primes.Large(201), p = Primes.Large(202);
        var big = new Rational(BigInteger.Pow(3, 90));
        var f = P("x^2 y - 3 x + y^3") + big;
        var g = P("x y + 2 x + 5") + new Rational(p);
        var h = P("x y + 2 x + 5");
        GcdHooks.ForcedPrimes = new Queue<ulong>([good, p]);
        AssertGcd(f * g, f * h, f);
        Assert.True(GcdHooks.UnluckyPrimes >= 1, "the image mod the unlucky prime must be discarded");
    }

    [Fact]
    public void TwoUnluckyPrimes_ConsistentWrongImages_AreRejectedByVerification()
    {
        ulong p1 = Primes.Large(203), p2 = Primes.Large(204);
        var f = P("x^3 - y^2 + x y + 1");
        var g = P("x y + 2 x + 5") + new Rational((BigInteger)p1 * p2);
        var h = P("x y + 2 x + 5");
        GcdHooks.ForcedPrimes = new Queue<ulong>([p1, p2]);
        AssertGcd(f * g, f * h, f);
        // After the second unlucky prime the lift is stable, so the wrong candidate is checked, and rejected.
        Assert.True(GcdHooks.FailedVerifications >= 1, "the wrong candidate must fail the exact check");
        Assert.True(GcdHooks.Restarts >= 1);
    }

    [Fact]
    public void UnluckyPointFirst_ImageTooHigh_RestartsInterpolation()
    {
        // At y = 0 both cofactors x + y and x + 2y become x: the image gcd there is too large.
        var f = P("x + y + 1");
        GcdHooks.ForcedPoints = new Queue<ulong>([0]);
        AssertGcd(f * P("x + y"), f * P("x + 2 y"), f);
        Assert.True(GcdHooks.Restarts >= 1, "the unlucky first image must be replaced by a lower one");
    }

    [Fact]
    public void UnluckyPointLater_ImageTooHigh_IsDiscarded()
    {
        var f = P("x + y + 1");
        GcdHooks.ForcedPoints = new Queue<ulong>([5, 0]);
        AssertGcd(f * P("x + y"), f * P("x + 2 y"), f);
        Assert.True(GcdHooks.UnluckyPoints >= 1, "the image at the unlucky point must be discarded");
    }

    [Fact]
    public void Zippel_LeadingCoefficientWithIntegerContent_Converges()
    {
        // lc_x(g) = 6·y·z has integer content 6: γ must keep it, or γ·g/lc(g) is not integral.
        var ring = new LaurentPolynomialRing("x", "y", "z", "t");
        var g = LaurentPolynomial.Parse(ring, "6 y z x^2 + 5 x t + 7");
        var a = g * LaurentPolynomial.Parse(ring, "4 z x + y - t");
        var b = g * LaurentPolynomial.Parse(ring, "10 y x + t^2 + 1");
        GcdHooks.ForceAlgorithm = GcdAlgorithm.Zippel;
        var (gcd, ca, cb) = a.GcdWithCofactors(b);
        Assert.Equal(g, gcd);
        Assert.Equal(a, gcd * ca);
        Assert.Equal(b, gcd * cb);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    [InlineData(2)]
    public void ForcedAlgorithm_RandomProducts_AgreeWithConstruction(int which)
    {
        var algorithm = which switch { 0 => GcdAlgorithm.BrownCofactors, 1 => GcdAlgorithm.BrownGcdOnly, _ => GcdAlgorithm.Zippel };
        var ring = new LaurentPolynomialRing("x", "y", "z");
        var rng = new Random(77 + (int)algorithm);
        for (int i = 0; i < 10; i++)
        {
            GcdHooks.ForceAlgorithm = algorithm;
            var f = GcdTestData.Random(rng, ring, 5, 3, bits: 70);
            var g = GcdTestData.Random(rng, ring, 4, 3, bits: 20);
            if (i % 3 == 2) { f *= ring.Variable(2) + 3; g *= ring.Variable(1) - ring.Variable(2); } // contents in x and a non-trivial γ
            var h = g * ring.Variable(1) - 1; // gcd(g, y·g − 1) = 1
            var (gcd, ca, cb) = (f * g).GcdWithCofactors(f * h);
            Assert.Equal(GcdTestData.Normalised(f), gcd);
            Assert.Equal(f * g, gcd * ca);
            Assert.Equal(f * h, gcd * cb);
        }
    }
}
