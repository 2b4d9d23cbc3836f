using System.Numerics;
using CsCheck;
using Fractions;
using Integrable.Kernels;
using Integrable.LinearAlgebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Series;
using Xunit;

namespace Integrable.Tests.Hardening;

/// <summary>Differential fuzzing of the kernels that have fast paths (packed exponents, word-size
/// coefficients, heap and dense multiplication, exact division, modular gcd, modular nullspace, Newton
/// series) against slow references that are obviously correct: dictionaries of BigInteger/Fraction
/// coefficients, schoolbook elimination with <see cref="Fraction"/>, and order-by-order series
/// recursion. Inputs are biased to the edges (coefficients at and just past 64 bits, negative exponents,
/// many variables, zero and unit inputs, rank-deficient matrices). CsCheck prints the seed of a failure;
/// <c>INTEGRABLE_FUZZ_MULTIPLIER</c> scales the counts (see <see cref="FuzzSettings"/>).</summary>
public class KernelDifferentialTests
{
    private static readonly BigInteger Two63 = BigInteger.One << 63, Two64 = BigInteger.One << 64;

    /// <summary>Coefficients: small, word-boundary (±(2^63 − 1), ±2^63, 2^64 ± 1) and wide.</summary>
    private static readonly Gen<BigInteger> Coefficient = Gen.Frequency(
        (6, Gen.Int[-9, 9].Select(i => new BigInteger(i))),
        (2, Gen.OneOf(Two63 - 1, -(Two63 - 1), Two63, -Two63, Two64 - 1, Two64 + 1, -(Two64 + 1), Two63 + 1)),
        (1, Gen.Long.Select(l => new BigInteger(l))),
        (1, Gen.Select(Gen.Long, Gen.Long).Select((a, b) => (new BigInteger(a) << 64) + b)));

    private static Gen<Dictionary<string, BigInteger>> Poly(int vars, int maxTerms, int minExp, int maxExp) =>
        Gen.Select(Coefficient, Gen.Int[minExp, maxExp].Array[vars]).Array[0, maxTerms].Select(Normalise);

    private static Dictionary<string, BigInteger> Normalise((BigInteger C, int[] E)[] terms)
    {
        var d = new Dictionary<string, BigInteger>();
        foreach (var (c, e) in terms)
        {
            string key = string.Join(",", e);
            d[key] = d.GetValueOrDefault(key) + c;
        }
        foreach (var k in d.Where(kv => kv.Value.IsZero).Select(kv => kv.Key).ToList()) d.Remove(k);
        return d;
    }

    private static Dictionary<string, BigInteger> NaiveProduct(Dictionary<string, BigInteger> a, Dictionary<string, BigInteger> b)
    {
        var r = new List<(BigInteger, int[])>();
        foreach (var (ka, ca) in a)
            foreach (var (kb, cb) in b)
            {
                var ea = ka.Length == 0 ? [] : ka.Split(',').Select(int.Parse).ToArray();
                var eb = kb.Length == 0 ? [] : kb.Split(',').Select(int.Parse).ToArray();
                r.Add((ca * cb, ea.Zip(eb, (x, y) => x + y).ToArray()));
            }
        return Normalise([.. r]);
    }

    private static LaurentPolynomialRing RingOf(int n) => new([.. Enumerable.Range(0, n).Select(i => $"v{i}")]);

    private static LaurentPolynomial Build(LaurentPolynomialRing ring, Dictionary<string, BigInteger> terms)
    {
        var b = ring.CreateBuilder();
        foreach (var (k, c) in terms)
            b.Add(new Rational(c), k.Length == 0 ? [] : k.Split(',').Select(int.Parse).ToArray());
        return b.ToPolynomial();
    }

    private static Dictionary<string, BigInteger> Read(LaurentPolynomial p)
    {
        var d = new Dictionary<string, BigInteger>();
        foreach (var t in p.Terms)
        {
            Assert.Equal(BigInteger.One, t.Coefficient.Denominator);
            d[string.Join(",", t.Exponents.ToArray())] = t.Coefficient.Numerator;
        }
        return d;
    }

    private static void AssertSame(Dictionary<string, BigInteger> expected, Dictionary<string, BigInteger> actual)
    {
        Assert.Equal(expected.Count, actual.Count);
        foreach (var (k, c) in expected) Assert.Equal(c, actual.GetValueOrDefault(k));
    }

    public static TheoryData<string> Algorithms => new() { "Auto", "Heap", "Dense" };

    [Theory]
    [MemberData(nameof(Algorithms))]
    public void Multiply_EdgeInputs_EveryPathMatchesNaive(string algorithm)
    {
        var force = Enum.Parse<MultiplyAlgorithm>(algorithm);
        Gen.Int[1, 9].SelectMany(n => Gen.Select(Gen.Const(n), Poly(n, 14, -3, 5), Poly(n, 14, -2, 6), Gen.Int[0, 1_000_000]))
            .Sample((vars, a, b, salt) =>
        {
            var ring = RingOf(vars);
            var pa = Build(ring, a);
            var pb = salt % 7 == 0 ? ring.One : salt % 11 == 0 ? ring.Zero : Build(ring, b);
            var rb = Read(pb);
            PolynomialMultiply.Force = force;
            try
            {
                var product = pa * pb;
                AssertSame(NaiveProduct(a, rb), Read(product));
                // exact division undoes the product on every path
                if (!pb.IsZero)
                {
                    Assert.True(product.TryDivideExact(pb, out var q));
                    AssertSame(a, Read(q));
                    // a non-divisible dividend is reported, never answered with a wrong quotient
                    if (Read(pb).Count > 1)
                    {
                        var off = product + ring.One;
                        if (off.TryDivideExact(pb, out var q2)) AssertSame(Read(off), NaiveProduct(Read(q2), Read(pb)));
                    }
                }
            }
            finally { PolynomialMultiply.Force = MultiplyAlgorithm.Auto; }
        }, iter: FuzzSettings.Iterations(300), threads: 1);
    }

    /// <summary>Coefficients of 60–200 bits: the multi-limb path (up to 191 bits) and its hand-over to big integers.</summary>
    private static readonly Gen<BigInteger> WideCoefficient = Gen.Frequency(
        (3, Gen.Int[-9, 9].Select(i => new BigInteger(i))),
        (4, Gen.Select(Gen.Int[60, 200], Gen.Long, Gen.Long, Gen.Long, Gen.Bool).Select((bits, x, y, z, neg) =>
        {
            var v = ((new BigInteger((ulong)x) << 128) + (new BigInteger((ulong)y) << 64) + new BigInteger((ulong)z)) | (BigInteger.One << (bits - 1));
            v &= (BigInteger.One << bits) - 1;
            return neg ? -v : v;
        })),
        (1, Gen.OneOf((BigInteger.One << 191) - 1, -((BigInteger.One << 191) - 1), BigInteger.One << 191, (BigInteger.One << 127) + 1)));

    [Theory]
    [MemberData(nameof(Algorithms))]
    public void MultiplyDivide_MultiLimbCoefficients_MatchBigIntegerPath(string algorithm) =>
        MultiLimbRoundTrip(Enum.Parse<MultiplyAlgorithm>(algorithm), WideCoefficient, maxTerms: 12, pinFourLimbs: Gen.Const(false));

    /// <summary>Coefficients of 150–262 bits around both multi-limb lines (191 bits for three limbs, 255 for
    /// four), with the exact edge values 2^191 ± 1, 2^255 − 1 and 2^255.</summary>
    private static readonly Gen<BigInteger> FourLimbCoefficient = Gen.Frequency(
        (3, Gen.Int[-9, 9].Select(i => new BigInteger(i))),
        (5, Gen.Select(Gen.Int[150, 262], Gen.Long.Array[5], Gen.Bool).Select((bits, limbs, neg) =>
        {
            var v = BigInteger.Zero;
            foreach (var l in limbs) v = (v << 64) + new BigInteger((ulong)l);
            v = (v & ((BigInteger.One << bits) - 1)) | (BigInteger.One << (bits - 1));
            return neg ? -v : v;
        })),
        (1, Gen.OneOf((BigInteger.One << 191) + 1, -((BigInteger.One << 191) - 1), (BigInteger.One << 255) - 1,
            -((BigInteger.One << 255) - 1), BigInteger.One << 255, (BigInteger.One << 254) + 3)));

    /// <summary>The four-limb path (<see cref="Magnitude256"/> in <see cref="Int576"/>) against naive big-integer
    /// products and the big-integer division: products, squares (doubled coefficients), exact quotients and a
    /// non-divisible dividend, on every algorithm; half the cases pin four limbs even for small coefficients
    /// (common practice: differential testing against a slow obvious reference).</summary>
    [Theory]
    [MemberData(nameof(Algorithms))]
    public void MultiplyDivide_FourLimbCoefficients_MatchBigIntegerPath(string algorithm) =>
        MultiLimbRoundTrip(Enum.Parse<MultiplyAlgorithm>(algorithm), FourLimbCoefficient, maxTerms: 14, pinFourLimbs: Gen.Bool);

    /// <summary>A·B against the naive product, B² likewise, (A·B)/B = A, and A·B + 1 divided by B as with big
    /// integers only, under one forced algorithm (and, when <paramref name="pinFourLimbs"/> says so, the four-limb path
    /// for every multi-limb coefficient).</summary>
    private static void MultiLimbRoundTrip(MultiplyAlgorithm force, Gen<BigInteger> coefficient, int maxTerms, Gen<bool> pinFourLimbs)
    {
        Gen.Int[1, 5].SelectMany(n => Gen.Select(Gen.Const(n),
                Gen.Select(coefficient, Gen.Int[-2, 4].Array[n]).Array[1, maxTerms].Select(Normalise),
                Gen.Select(coefficient, Gen.Int[-1, 3].Array[n]).Array[1, maxTerms].Select(Normalise), pinFourLimbs))
            .Sample((vars, a, b, pin) =>
            {
                if (a.Count == 0 || b.Count == 0) return;
                var ring = RingOf(vars);
                var pa = Build(ring, a);
                var pb = Build(ring, b);
                PolynomialMultiply.Force = force;
                PolynomialMultiply.ForceFourLimbs = pin;
                try
                {
                    var product = pa * pb;
                    AssertSame(NaiveProduct(a, b), Read(product));
                    AssertSame(NaiveProduct(b, b), Read(pb * pb));
                    Assert.True(product.TryDivideExact(pb, out var q));
                    AssertSame(a, Read(q));
                    var off = product + ring.One;
                    bool divides = off.TryDivideExact(pb, out var q2);
                    PolynomialMultiply.ForceBig = true;
                    Assert.Equal(divides, off.TryDivideExact(pb, out var q3));
                    if (divides) Assert.Equal(q3, q2);
                }
                finally
                {
                    PolynomialMultiply.Force = MultiplyAlgorithm.Auto;
                    PolynomialMultiply.ForceBig = false;
                    PolynomialMultiply.ForceFourLimbs = false;
                }
            }, iter: FuzzSettings.Iterations(300), threads: 1);
    }

    [Fact]
    public void Gcd_RandomCommonFactors_MatchesUnivariateEuclidOverQ()
    {
        // Reference: Euclid's algorithm on dense coefficient lists of Fractions, then made primitive.
        Gen.Select(Gen.Int[-30, 30].Array[1, 6], Gen.Int[-30, 30].Array[1, 6], Gen.Int[-30, 30].Array[2, 5], Gen.Bool)
            .Sample((f, g, h, wide) =>
            {
                var ring = new LaurentPolynomialRing("t");
                BigInteger scale = wide ? Two64 + 1 : BigInteger.One;
                LaurentPolynomial P(int[] cs, BigInteger s)
                {
                    var b = ring.CreateBuilder();
                    for (int i = 0; i < cs.Length; i++) b.Add(new Rational(cs[i] * s), [i]);
                    return b.ToPolynomial();
                }
                var pf = P(f, BigInteger.One); var pg = P(g, scale); var ph = P(h, BigInteger.One);
                if (pf.IsZero || pg.IsZero || ph.IsZero) return;
                var a = pf * pg; var b2 = pf * ph;
                var gcd = a.Gcd(b2);
                var reference = ReferenceGcd(Dense(a), Dense(b2));
                var mine = Dense(gcd);
                Assert.Equal(Primitive(reference), Primitive(mine));
            }, iter: FuzzSettings.Iterations(400), threads: 1);
    }

    private static Fraction[] Dense(LaurentPolynomial p)
    {
        int max = 0;
        foreach (var t in p.Terms) max = Math.Max(max, t.Exponents[0]);
        var r = Enumerable.Repeat(Fraction.Zero, max + 1).ToArray();
        foreach (var t in p.Terms)
        {
            Assert.True(t.Exponents[0] >= 0);
            r[t.Exponents[0]] = new Fraction(t.Coefficient.Numerator, t.Coefficient.Denominator);
        }
        return r;
    }

    private static Fraction[] Trim(Fraction[] a)
    {
        int n = a.Length;
        while (n > 0 && a[n - 1].IsZero) n--;
        return a[..n];
    }

    private static Fraction[] ReferenceGcd(Fraction[] a, Fraction[] b)
    {
        a = Trim(a); b = Trim(b);
        while (b.Length > 0)
        {
            var r = (Fraction[])a.Clone();
            for (int i = r.Length - b.Length; i >= 0; i--)
            {
                var q = r[i + b.Length - 1] / b[^1];
                for (int j = 0; j < b.Length; j++) r[i + j] -= q * b[j];
            }
            (a, b) = (b, Trim(r[..Math.Min(r.Length, b.Length - 1)]));
        }
        return a;
    }

    /// <summary>Strips the low-degree monomial (Laurent units), scales to coprime integers with positive leading coefficient.</summary>
    private static string Primitive(Fraction[] p)
    {
        p = Trim(p);
        int low = 0;
        while (low < p.Length && p[low].IsZero) low++;
        p = p[low..];
        if (p.Length == 0) return "0";
        BigInteger den = p.Aggregate(BigInteger.One, (l, c) => l / BigInteger.GreatestCommonDivisor(l, c.Denominator) * c.Denominator);
        var ints = p.Select(c => c.Numerator * (den / c.Denominator)).ToArray();
        BigInteger g = ints.Aggregate(BigInteger.Zero, BigInteger.GreatestCommonDivisor);
        if (ints[^1].Sign < 0) g = -g;
        return string.Join(",", ints.Select(c => c / g));
    }

    [Fact]
    public void Nullspace_RankDeficientEdgeMatrices_MatchesFractionElimination()
    {
        var entry = Gen.Frequency((8, Gen.Int[-5, 5].Select(i => new BigInteger(i))), (1, Gen.OneOf(Two63 - 1, -Two63, Two64 + 1)));
        Gen.Select(Gen.Int[1, 7], Gen.Int[1, 8], Gen.Int[0, 7]).SelectMany((r, c, rank) =>
            Gen.Select(entry.Array[r * Math.Min(rank, Math.Min(r, c))], entry.Array[Math.Min(rank, Math.Min(r, c)) * c])
               .Select((left, right) => (r, c, k: Math.Min(rank, Math.Min(r, c)), left, right)))
            .Sample(m =>
            {
                // A = L·R has rank at most k: rank-deficient by construction.
                var a = new Fraction[m.r, m.c];
                for (int i = 0; i < m.r; i++)
                    for (int j = 0; j < m.c; j++)
                    {
                        BigInteger s = 0;
                        for (int t = 0; t < m.k; t++) s += m.left[i * m.k + t] * m.right[t * m.c + j];
                        a[i, j] = new Fraction(s);
                    }
                var rows = new Rational[m.r][];
                for (int i = 0; i < m.r; i++) rows[i] = [.. Enumerable.Range(0, m.c).Select(j => new Rational(a[i, j].Numerator))];
                var matrix = RationalMatrix.FromRows(rows);
                var kernel = matrix.Nullspace();
                int referenceRank = ReferenceRank((Fraction[,])a.Clone());
                Assert.Equal(referenceRank, matrix.Rank());
                Assert.Equal(m.c - referenceRank, kernel.RowCount);
                // every basis vector is in the kernel (checked with Fractions)
                var vectors = KernelVectors(kernel, m.c);
                foreach (var v in vectors)
                    for (int i = 0; i < m.r; i++)
                    {
                        var s = Fraction.Zero;
                        for (int j = 0; j < m.c; j++) s += a[i, j] * v[j];
                        Assert.True(s.IsZero);
                    }
                // and the basis is independent
                if (vectors.Count > 0)
                {
                    var basis = new Fraction[vectors.Count, m.c];
                    for (int i = 0; i < vectors.Count; i++) for (int j = 0; j < m.c; j++) basis[i, j] = vectors[i][j];
                    Assert.Equal(vectors.Count, ReferenceRank(basis));
                }
            }, iter: FuzzSettings.Iterations(400), threads: 1);
    }

    /// <summary>The kernel basis: one vector per row.</summary>
    private static List<Fraction[]> KernelVectors(RationalMatrix kernel, int n)
    {
        var list = new List<Fraction[]>();
        for (int v = 0; v < kernel.RowCount; v++)
            list.Add([.. Enumerable.Range(0, n).Select(j => new Fraction(kernel[v, j].Numerator, kernel[v, j].Denominator))]);
        return list;
    }

    private static int ReferenceRank(Fraction[,] a)
    {
        int rows = a.GetLength(0), cols = a.GetLength(1), rank = 0;
        for (int c = 0; c < cols && rank < rows; c++)
        {
            int p = rank;
            while (p < rows && a[p, c].IsZero) p++;
            if (p == rows) continue;
            for (int j = 0; j < cols; j++) (a[rank, j], a[p, j]) = (a[p, j], a[rank, j]);
            for (int i = rank + 1; i < rows; i++)
            {
                if (a[i, c].IsZero) continue;
                var f = a[i, c] / a[rank, c];
                for (int j = c; j < cols; j++) a[i, j] -= f * a[rank, j];
            }
            rank++;
        }
        return rank;
    }

    [Fact]
    public void SolveNewton_RandomAlgebraicEquations_MatchesOrderByOrderRecursion()
    {
        // y = c0 + x·(a + b·y + c·y² + d·y³): Newton against the plain recursion for the coefficients.
        var q = PowerSeriesRing.Rationals;
        Gen.Select(Gen.Int[-4, 4], Gen.Int[-4, 4], Gen.Int[-4, 4], Gen.Int[-4, 4], Gen.Int[-4, 4], Gen.Int[1, 40])
            .Sample((c0, a, b, c, d, order) =>
            {
                var x = q.X;
                var y = SeriesEquations.SolveNewton(q, s => c0 + x * (a + b * s + c * s * s + d * s * s * s), order);
                // reference: y_0 = c0; y_{k} = [x^{k-1}] (a + b y + c y² + d y³) with exact Fractions
                var r = new Fraction[order];
                r[0] = c0;
                for (int k = 1; k < order; k++)
                {
                    var known = r[..k];
                    Fraction Coef(Fraction[] s, int i) => i < s.Length ? s[i] : Fraction.Zero;
                    Fraction[] Mul(Fraction[] u, Fraction[] v)
                    {
                        var w = Enumerable.Repeat(Fraction.Zero, k).ToArray();
                        for (int i = 0; i < k; i++) for (int j = 0; i + j < k; j++) w[i + j] += Coef(u, i) * Coef(v, j);
                        return w;
                    }
                    var y2 = Mul(known, known); var y3 = Mul(y2, known);
                    int m = k - 1;
                    r[k] = (m == 0 ? new Fraction(a) : Fraction.Zero) + b * Coef(known, m) + c * Coef(y2, m) + d * Coef(y3, m);
                }
                for (int k = 0; k < order; k++)
                    Assert.Equal(r[k], new Fraction(y[k].Numerator, y[k].Denominator));
            }, iter: FuzzSettings.Iterations(150), threads: 1);
    }
}
