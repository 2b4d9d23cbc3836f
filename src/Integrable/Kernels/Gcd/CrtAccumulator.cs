using System.Runtime.CompilerServices;
using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Kernels.Gcd;

/// <summary>Chinese remaindering of polynomial images modulo several word primes, coefficient by
/// coefficient, in Garner's mixed-radix form with symmetric digits: value = d₀ + d₁·p₀ + d₂·p₀p₁ + …
/// with dᵢ ∈ (−pᵢ/2, pᵢ/2], which is the symmetric residue modulo the product M. Adding a prime costs
/// O(number of primes) word operations per coefficient and no big-integer arithmetic; a zero new digit
/// for every coefficient means the lift did not change ("stable").</summary>
internal sealed class CrtAccumulator
{
    private readonly int _n;
    private int _count;
    private int[] _exps = [];
    private readonly List<long[]> _digits = new();   // per prime, one digit per coefficient
    private readonly List<ulong> _primes = new();
    private int[] _top = [];                          // per coefficient: index of its highest non-zero digit (−1: zero)
    private double _log2Modulus;

    public CrtAccumulator(int vars) => _n = vars;

    public int PrimeCount => _primes.Count;

    public int Count => _count;

    public double Log2Modulus => _log2Modulus;

    /// <summary>The first exponent vector (the leading monomial), valid when there is at least one prime.</summary>
    public ReadOnlySpan<int> Leading => _exps.AsSpan(0, _n);

    public void Reset()
    {
        _count = 0;
        _exps = [];
        _digits.Clear();
        _primes.Clear();
        _top = [];
        _log2Modulus = 0;
    }

    /// <summary>Upper bound on log2 |value| over all coefficients: with top digit d_j,
    /// |value| &lt; (|d_j| + 1)·p₀⋯p_{j−1}.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public double Log2MaxAbs()
    {
        int k = _primes.Count;
        var prefix = new double[k];
        for (int i = 1; i < k; i++) prefix[i] = prefix[i - 1] + Math.Log2(_primes[i - 1]);
        double best = 0;
        for (int c = 0; c < _count; c++)
        {
            int j = _top[c];
            if (j < 0) continue;
            double v = prefix[j] + Math.Log2(Math.Abs((double)_digits[j][c]) + 1);
            if (v > best) best = v;
        }
        return best;
    }

    /// <summary>Adds the image modulo the prime of <paramref name="f"/>; returns true when every new digit is zero.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public bool Add(SparseModPoly image, in ModP f)
    {
        int n = _n;
        ulong p = f.P;
        if (_primes.Count == 0)
        {
            _count = image.Count;
            _exps = image.Exps.AsSpan(0, image.Count * n).ToArray();
            var d0 = new long[_count];
            _top = new int[_count];
            for (int i = 0; i < _count; i++) { d0[i] = f.Symmetric(image.Coeffs[i]); _top[i] = d0[i] == 0 ? -1 : 0; }
            _digits.Add(d0);
            _primes.Add(p);
            _log2Modulus = Math.Log2(p);
            return false;
        }
        MergeSupport(image);
        int k = _primes.Count;
        // pk[i] = p_i mod p; minv = (p_0⋯p_{k−1})⁻¹ mod p
        var pk = new ulong[k];
        ulong mk = 1;
        for (int i = 0; i < k; i++) { pk[i] = _primes[i] % p; mk = f.Mul(mk, pk[i]); }
        ulong minv = f.Inv(mk);
        var digits = new long[_count];
        bool stable = true;
        int j = 0;
        for (int c = 0; c < _count; c++)
        {
            ulong r = 0;
            if (j < image.Count && PolynomialAdd.Compare(_exps.AsSpan(c * n, n), image.Exps.AsSpan(j * n, n)) == 0)
                r = image.Coeffs[j++];
            // current value mod p by Horner over the mixed-radix digits
            ulong v = 0;
            for (int i = _top[c]; i >= 0; i--)
            {
                long d = _digits[i][c];
                ulong dr = d >= 0 ? (ulong)d : (ulong)(d + (long)p);
                v = f.Add(f.Mul(v, pk[i]), dr);
            }
            ulong nd = f.Mul(f.Sub(r, v), minv);
            if (nd != 0)
            {
                stable = false;
                digits[c] = f.Symmetric(nd);
                _top[c] = k;
            }
        }
        _digits.Add(digits);
        _primes.Add(p);
        _log2Modulus += Math.Log2(p);
        return stable;
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void MergeSupport(SparseModPoly image)
    {
        int n = _n, union = 0, i = 0, j = 0;
        while (i < _count || j < image.Count)
        {
            int c = i == _count ? -1 : j == image.Count ? 1 : PolynomialAdd.Compare(_exps.AsSpan(i * n, n), image.Exps.AsSpan(j * n, n));
            if (c >= 0) i++;
            if (c <= 0) j++;
            union++;
        }
        if (union == _count) return;
        var exps = new int[union * n];
        var top = new int[union];
        var map = new int[_count];
        i = 0; j = 0;
        int r = 0;
        while (i < _count || j < image.Count)
        {
            int c = i == _count ? -1 : j == image.Count ? 1 : PolynomialAdd.Compare(_exps.AsSpan(i * n, n), image.Exps.AsSpan(j * n, n));
            if (c >= 0) { Array.Copy(_exps, i * n, exps, r * n, n); top[r] = _top[i]; map[i] = r; i++; }
            else { Array.Copy(image.Exps, j * n, exps, r * n, n); top[r] = -1; }
            if (c <= 0) j++;
            r++;
        }
        for (int k = 0; k < _digits.Count; k++)
        {
            var nd = new long[union];
            var od = _digits[k];
            for (int c = 0; c < _count; c++) nd[map[c]] = od[c];
            _digits[k] = nd;
        }
        _exps = exps;
        _top = top;
        _count = union;
    }

    /// <summary>The symmetric lift of every coefficient, zero coefficients dropped.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public IntPoly Reconstruct()
    {
        int n = _n;
        var pref = new BigInteger[_primes.Count];
        BigInteger m = BigInteger.One;
        for (int i = 0; i < _primes.Count; i++) { pref[i] = m; m *= _primes[i]; }
        var coeffs = new List<Rational>(_count);
        var exps = new List<int>(_count * n);
        for (int c = 0; c < _count; c++)
        {
            int top = _top[c];
            if (top < 0) continue;
            BigInteger v = BigInteger.Zero;
            if (top == 0) v = _digits[0][c];
            else
                for (int i = top; i >= 0; i--) v += _digits[i][c] * pref[i];
            if (v.IsZero) continue;
            coeffs.Add(new Rational(v));
            for (int x = 0; x < n; x++) exps.Add(_exps[c * n + x]);
        }
        return new IntPoly(n, coeffs.ToArray(), exps.ToArray());
    }
}
