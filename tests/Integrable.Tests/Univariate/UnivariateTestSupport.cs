using System.Numerics;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;
using Integrable.Univariate;

namespace Integrable.Tests.Univariate;

/// <summary>Sets the univariate thresholds for the lifetime of the scope and restores them afterwards.</summary>
internal sealed class ThresholdScope : IDisposable
{
    private readonly int _kara = UnivariateThresholds.Karatsuba, _ntt = UnivariateThresholds.Ntt,
        _newton = UnivariateThresholds.NewtonDivision, _hgcd = UnivariateThresholds.HalfGcd,
        _hbase = UnivariateThresholds.HalfGcdBase, _qmul = UnivariatePolynomial.ModularMultiplyThreshold,
        _zmul = IntegerPoly.ModularProductThreshold, _mat = UnivariateThresholds.MatrixTransform;
    private readonly double _factor = UnivariateThresholds.TransformCostFactor;
    private readonly long _newtonWork = UnivariateThresholds.NewtonDivisionWork;
    private readonly int _maxLen = NttMultiplier.MaxLength;
    private readonly bool _vector = NttPrime.AllowVector, _vector512 = NttPrime.AllowVector512, _forceZ = IntegerPoly.ForceModularProduct;

    public ThresholdScope(int? karatsuba = null, int? ntt = null, int? newton = null, int? halfGcd = null,
        int? halfGcdBase = null, bool? vector = null, int? rationalModular = null, int? integerModular = null,
        int? matrixTransform = null, double? transformCostFactor = null, bool? vector512 = null, int? maxTransform = null)
    {
        if (maxTransform is int mx) NttMultiplier.MaxLength = mx;
        if (vector512 is bool v5) NttPrime.AllowVector512 = v5;
        if (matrixTransform is int mt) UnivariateThresholds.MatrixTransform = mt;
        if (transformCostFactor is double tf) UnivariateThresholds.TransformCostFactor = tf;
        if (karatsuba is int k) UnivariateThresholds.Karatsuba = k;
        if (ntt is int n) UnivariateThresholds.Ntt = n;
        if (newton is int d) { UnivariateThresholds.NewtonDivision = d; UnivariateThresholds.NewtonDivisionWork = d; }
        if (halfGcd is int h) UnivariateThresholds.HalfGcd = h;
        if (halfGcdBase is int hb) UnivariateThresholds.HalfGcdBase = hb;
        if (vector is bool v) NttPrime.AllowVector = v;
        if (rationalModular is int q) UnivariatePolynomial.ModularMultiplyThreshold = q;
        if (integerModular is int z) { IntegerPoly.ModularProductThreshold = z; IntegerPoly.ForceModularProduct = true; }
    }

    public void Dispose()
    {
        UnivariateThresholds.Karatsuba = _kara;
        UnivariateThresholds.Ntt = _ntt;
        UnivariateThresholds.NewtonDivision = _newton;
        UnivariateThresholds.NewtonDivisionWork = _newtonWork;
        UnivariateThresholds.HalfGcd = _hgcd;
        UnivariateThresholds.HalfGcdBase = _hbase;
        NttPrime.AllowVector = _vector;
        NttPrime.AllowVector512 = _vector512;
        NttMultiplier.MaxLength = _maxLen;
        UnivariatePolynomial.ModularMultiplyThreshold = _qmul;
        IntegerPoly.ModularProductThreshold = _zmul;
        IntegerPoly.ForceModularProduct = _forceZ;
        UnivariateThresholds.MatrixTransform = _mat;
        UnivariateThresholds.TransformCostFactor = _factor;
    }
}

internal static class UnivariateTestSupport
{
    /// <summary>Moduli covering the code paths: tiny, NTT-friendly (direct transform), just below 2^31 and
    /// 2^32 (three transform primes), and large (five or six transform primes).</summary>
    public static readonly ulong[] Moduli =
    [
        2, 3, 101, 65537, 998244353, 2147483647, 4294967291, 2305843009213693951, Primes.Large(0),
    ];

    public static TheoryData<ulong> ModuliData()
    {
        var d = new TheoryData<ulong>();
        foreach (var p in Moduli) d.Add(p);
        return d;
    }

    public static ulong NextResidue(this Random rng, ulong p) => (ulong)rng.NextInt64(0, (long)Math.Min(p, (ulong)long.MaxValue)) % p;

    /// <summary>A random polynomial of exactly the given degree (−1 gives zero).</summary>
    public static PolynomialModP RandomPoly(Random rng, PrimeField f, int degree)
    {
        if (degree < 0) return PolynomialModP.Zero(f);
        var c = new ulong[degree + 1];
        for (int i = 0; i <= degree; i++) c[i] = rng.NextResidue(f.Modulus);
        if (c[degree] == 0) c[degree] = 1;
        return PolynomialModP.FromCoefficients(f, c);
    }

    public static PolynomialModP RandomMonic(Random rng, PrimeField f, int degree)
    {
        var c = RandomPoly(rng, f, degree).ToArray();
        c[degree] = 1;
        return PolynomialModP.FromCoefficients(f, c);
    }

    /// <summary>Quadratic reference product with exact BigInteger arithmetic (independent of the kernels).</summary>
    public static ulong[] ReferenceProduct(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, ulong p)
    {
        if (a.IsEmpty || b.IsEmpty) return [];
        var r = new BigInteger[a.Length + b.Length - 1];
        for (int i = 0; i < a.Length; i++)
            for (int j = 0; j < b.Length; j++)
                r[i + j] += (BigInteger)a[i] * b[j];
        var res = new ulong[r.Length];
        for (int i = 0; i < r.Length; i++) res[i] = (ulong)(r[i] % p);
        int n = res.Length;
        while (n > 0 && res[n - 1] == 0) n--;
        return res[..n];
    }

    /// <summary>Determinant modulo p by Gaussian elimination (BigInteger arithmetic).</summary>
    public static ulong DeterminantModP(BigInteger[,] m, ulong p)
    {
        int n = m.GetLength(0);
        var a = new BigInteger[n, n];
        for (int i = 0; i < n; i++) for (int j = 0; j < n; j++) a[i, j] = ((m[i, j] % p) + p) % p;
        BigInteger det = 1;
        for (int col = 0; col < n; col++)
        {
            int piv = -1;
            for (int r = col; r < n; r++) if (!a[r, col].IsZero) { piv = r; break; }
            if (piv < 0) return 0;
            if (piv != col)
            {
                for (int j = 0; j < n; j++) (a[piv, j], a[col, j]) = (a[col, j], a[piv, j]);
                det = p - det;
            }
            det = det * a[col, col] % p;
            var inv = BigInteger.ModPow(a[col, col], p - 2, p);
            for (int r = col + 1; r < n; r++)
            {
                if (a[r, col].IsZero) continue;
                var factor = a[r, col] * inv % p;
                for (int j = col; j < n; j++) a[r, j] = ((a[r, j] - factor * a[col, j]) % p + p) % p;
            }
        }
        return (ulong)(det % p);
    }

    /// <summary>The Sylvester matrix of f (degree m) and g (degree n), size m + n.</summary>
    public static BigInteger[,] Sylvester(ReadOnlySpan<BigInteger> f, ReadOnlySpan<BigInteger> g)
    {
        int m = f.Length - 1, n = g.Length - 1, size = m + n;
        var s = new BigInteger[size, size];
        for (int i = 0; i < n; i++)
            for (int j = 0; j <= m; j++) s[i, i + j] = f[m - j];
        for (int i = 0; i < m; i++)
            for (int j = 0; j <= n; j++) s[n + i, i + j] = g[n - j];
        return s;
    }
}
