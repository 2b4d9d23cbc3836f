using System.Buffers;
using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;

namespace Integrable.Kernels.Univariate;

/// <summary>Polynomial products modulo a word prime p &lt; 2^62 by number-theoretic transforms over up
/// to six NTT primes q &lt; 2^30 and Chinese remaindering (Garner) back to p.</summary>
/// <remarks>
/// <para>The product of two polynomials with coefficients in [0, p) has integer coefficients below
/// min(len a, len b)·(p − 1)²; with k primes whose product exceeds that bound (times the number of
/// products summed in the transform domain) the integer coefficients are recovered exactly by Garner's
/// mixed-radix algorithm and then reduced mod p. For p = 2^31 − 1 three primes suffice up to length 2^23;
/// for p near 2^62 five or six are needed.</para>
/// <para>When p itself is an NTT prime below 2^30 with enough 2-adicity, a single transform modulo p
/// is used directly (no remaindering).</para>
/// </remarks>
internal sealed class NttMultiplier
{
    // NTT primes c·2^23 + 1 < 2^30 (all with 2-adicity ≥ 23), largest first, with a primitive root each.
    private static readonly (uint Q, uint Root)[] PrimeTable =
    [
        (998244353, 3), (897581057, 3), (880803841, 26), (754974721, 11), (645922817, 3), (595591169, 3),
    ];

    private static readonly NttPrime[] SharedPrimes = CreatePrimes();

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static NttPrime[] CreatePrimes()
    {
        var r = new NttPrime[PrimeTable.Length];
        for (int i = 0; i < r.Length; i++) r[i] = new NttPrime(PrimeTable[i].Q, PrimeTable[i].Root);
        return r;
    }

    private readonly ModulusReducer _mod;
    private readonly bool _small;                 // p < 2^32
    private readonly NttPrime[] _primes;          // the transform primes (or just p itself)
    private readonly bool _direct;                // p is the single transform prime
    private readonly BigInteger[] _prefixProducts; // q_0⋯q_{i−1} as exact integers, i = 0..k
    private readonly ulong[] _prefixModP;          // q_0⋯q_{i−1} mod p
    private readonly uint[][] _garnerInv;          // _garnerInv[i][j] = q_j^{-1}·R mod q_i (j < i)
    private readonly bool _finalVector;            // 2^30 ≤ p < 2^31: last Garner step in 32-bit lanes
    private readonly uint _pInv32, _c1Mont, _c2Mont; // p^{-1} mod 2^32; q0·2^32 mod p; q0q1·2^32 mod p

    public NttMultiplier(ulong p)
    {
        _mod = new ModulusReducer(p);
        _small = p < (1UL << 32);
        uint directRoot = 0;
        if (p < (1UL << 30) && p > 2 && BitOperations.TrailingZeroCount(p - 1) >= NttPrime.MaxLog)
            directRoot = FindPrimitiveRoot((uint)p);
        if (directRoot != 0)
        {
            _direct = true;
            _primes = [new NttPrime((uint)p, directRoot)];
        }
        else _primes = SharedPrimes;
        int k = _primes.Length;
        _prefixProducts = new BigInteger[k + 1];
        _prefixModP = new ulong[k + 1];
        _prefixProducts[0] = BigInteger.One;
        for (int i = 0; i < k; i++) _prefixProducts[i + 1] = _prefixProducts[i] * _primes[i].Q;
        for (int i = 0; i <= k; i++) _prefixModP[i] = (ulong)(_prefixProducts[i] % p);
        if (!_direct && k >= 3 && p >= (1UL << 30) && p < (1UL << 31))
        {
            _finalVector = true;
            uint inv = 1;
            for (int i = 0; i < 5; i++) inv *= 2 - (uint)p * inv;
            _pInv32 = inv;
            _c1Mont = (uint)((_prefixModP[1] << 32) % p);
            _c2Mont = (uint)((UInt128)_prefixModP[2] * (1UL << 32) % p);
        }
        _maxTerms = new long[k + 1];
        var sq = new BigInteger(p - 1) * (p - 1);
        for (int i = 1; i <= k; i++)
        {
            var t = sq.IsZero ? new BigInteger(long.MaxValue) : (_prefixProducts[i] - 1) / sq;
            _maxTerms[i] = t > long.MaxValue ? long.MaxValue : (long)t;
        }
        _garnerInv = new uint[k][];
        for (int i = 0; i < k; i++)
        {
            _garnerInv[i] = new uint[i];
            var qi = _primes[i];
            for (int j = 0; j < i; j++)
                _garnerInv[i][j] = qi.ToMont(qi.PowMod(_primes[j].Q % qi.Q, qi.Q - 2));
        }
    }

    /// <summary>The modulus p.</summary>
    public ulong Modulus => _mod.P;

    /// <summary>Largest transform length used (2^23; tests lower it to exercise the chunked paths).</summary>
    internal static int MaxLength = 1 << NttPrime.MaxLog;

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static uint FindPrimitiveRoot(uint p)
    {
        ulong n = p - 1;
        var factors = new List<ulong>();
        ulong m = n;
        for (ulong f = 2; f * f <= m; f++)
            if (m % f == 0) { factors.Add(f); while (m % f == 0) m /= f; }
        if (m > 1) factors.Add(m);
        for (uint g = 2; g < p; g++)
        {
            bool ok = true;
            foreach (var f in factors)
                if (BigInteger.ModPow(g, n / f, p).IsOne) { ok = false; break; }
            if (ok) return g;
        }
        return 0;
    }

    /// <summary>Number of transform primes needed so that output coefficients made of at most
    /// <paramref name="terms"/> coefficient products (each ≤ (p − 1)²) are recovered exactly.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public int PrimesFor(long terms)
    {
        if (_direct) return 1;
        for (int k = 1; k <= _primes.Length; k++)
            if (terms <= _maxTerms[k]) return k;
        throw new ArgumentOutOfRangeException(nameof(terms), terms, "product too long for the transform primes");
    }

    // _maxTerms[k] = largest number of summed coefficient products recoverable with k primes.
    private long[] _maxTerms = [];

    /// <summary>Smallest power of two ≥ n.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static int TransformLength(int n) => n <= 1 ? 1 : (int)BitOperations.RoundUpToPowerOf2((uint)n);

    /// <summary>The full product a·b into dst (length la + lb − 1), both operands non-empty.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void Multiply(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, Span<ulong> dst)
    {
        int n = a.Length + b.Length - 1;
        int len = TransformLength(n);
        if (len > MaxLength) { MultiplyChunked(a, b, dst); return; }
        int k = PrimesFor(Math.Min(a.Length, b.Length));
        bool square = a.Length == b.Length && Unsafe.AreSame(ref Unsafe.AsRef(in a[0]), ref Unsafe.AsRef(in b[0]));
        using var fa = Transform(a, len, k);
        if (square) fa.MultiplyPointwise(fa);
        else
        {
            using var fb = Transform(b, len, k);
            fa.MultiplyPointwise(fb);
        }
        fa.InverseTo(dst[..n]);
    }

    /// <summary>The cyclic product a·b mod (x^len − 1), len a power of two, into dst (length len).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void MultiplyCyclic(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, int len, Span<ulong> dst)
    {
        int k = PrimesFor(Math.Min(Math.Min(a.Length, b.Length), len));
        using var fa = TransformWrapped(a, len, k);
        using var fb = TransformWrapped(b, len, k);
        fa.MultiplyPointwise(fb);
        fa.InverseTo(dst[..len]);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void MultiplyChunked(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, Span<ulong> dst)
    {
        // Beyond the largest transform: split both operands into blocks of half the maximal length.
        int block = MaxLength / 2;
        dst.Clear();
        var tmp = new ulong[2 * block - 1];
        for (int i = 0; i < a.Length; i += block)
        {
            var ai = a.Slice(i, Math.Min(block, a.Length - i));
            for (int j = 0; j < b.Length; j += block)
            {
                var bj = b.Slice(j, Math.Min(block, b.Length - j));
                var t = tmp.AsSpan(0, ai.Length + bj.Length - 1);
                Multiply(ai, bj, t);
                var d = dst.Slice(i + j, t.Length);
                for (int r = 0; r < t.Length; r++) d[r] = _mod.Add(d[r], t[r]);
            }
        }
    }

    /// <summary>Forward transforms of <paramref name="poly"/> (zero-padded) modulo the first
    /// <paramref name="k"/> primes at length <paramref name="len"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public Transformed Transform(ReadOnlySpan<ulong> poly, int len, int k)
    {
        if (poly.Length > len) throw new ArgumentException("polynomial longer than the transform", nameof(poly));
        var t = new Transformed(this, len, k);
        for (int i = 0; i < k; i++)
        {
            var pr = _primes[i];
            pr.EnsureTables(BitOperations.Log2((uint)len));
            var s = t.Row(i);
            pr.Load(poly, s, _small);
            pr.Forward(s);
        }
        return t;
    }

    /// <summary>An uninitialised transform buffer (for accumulating pointwise products).</summary>
    public Transformed Allocate(int len, int k) => new(this, len, k);

    /// <summary>Forward transforms of <paramref name="poly"/> reduced mod x^len − 1 (folded).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public Transformed TransformWrapped(ReadOnlySpan<ulong> poly, int len, int k)
    {
        if (poly.Length <= len) return Transform(poly, len, k);
        var folded = ArrayPool<ulong>.Shared.Rent(len);
        try
        {
            var f = folded.AsSpan(0, len);
            poly[..len].CopyTo(f);
            for (int i = len; i < poly.Length; i += len)
            {
                var part = poly.Slice(i, Math.Min(len, poly.Length - i));
                for (int j = 0; j < part.Length; j++) f[j] = _mod.Add(f[j], part[j]);
            }
            return Transform(f, len, k);
        }
        finally { ArrayPool<ulong>.Shared.Return(folded); }
    }

    /// <summary>A polynomial transformed modulo k primes at one length; rows are pooled arrays,
    /// returned by <see cref="Dispose"/>.</summary>
    internal sealed class Transformed : IDisposable
    {
        private readonly NttMultiplier _owner;
        private uint[]? _data;
        public readonly int Length;
        public readonly int Primes;

        public Transformed(NttMultiplier owner, int len, int k)
        {
            _owner = owner;
            Length = len;
            Primes = k;
            _data = ArrayPool<uint>.Shared.Rent(len * k);
        }

        public Span<uint> Row(int i) => _data.AsSpan(i * Length, Length);

        /// <summary>this ← this ∘ other (pointwise, Montgomery factor R⁻¹ accounted for in the inverse).</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public void MultiplyPointwise(Transformed other)
        {
            Check(other);
            for (int i = 0; i < Primes; i++)
                _owner._primes[i].PointwiseMontMul(Row(i), other.Row(i));
        }

        /// <summary>this ← a ∘ b.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public void SetProduct(Transformed a, Transformed b)
        {
            Check(a); Check(b);
            for (int i = 0; i < Primes; i++)
                _owner._primes[i].PointwiseMontMulTo(Row(i), a.Row(i), b.Row(i));
        }

        /// <summary>this ← this + a ∘ b.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public void AddProduct(Transformed a, Transformed b)
        {
            Check(a); Check(b);
            for (int i = 0; i < Primes; i++)
                _owner._primes[i].PointwiseMontMulAdd(Row(i), a.Row(i), b.Row(i));
        }

        /// <summary>this ← this − a ∘ b.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public void SubtractProduct(Transformed a, Transformed b)
        {
            Check(a); Check(b);
            for (int i = 0; i < Primes; i++)
                _owner._primes[i].PointwiseMontMulSub(Row(i), a.Row(i), b.Row(i));
        }

        /// <summary>Multiplies every value by R = 2^32 (so that a later Montgomery product with it is an
        /// ordinary product of normal-form values).</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public void ScaleByR()
        {
            for (int i = 0; i < Primes; i++)
                _owner._primes[i].ScaleMont(Row(i), _owner._primes[i].R2ModQ);
        }

        /// <summary>A transform at length <paramref name="len"/> (a power of two dividing this length, at
        /// least 16) over the first <paramref name="primes"/> primes, taken from this one: the first len
        /// values of a decimation-in-frequency transform are the transform of the polynomial reduced mod
        /// x^len − 1, so for polynomials shorter than len nothing needs recomputing.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public Transformed Prefix(int len, int primes)
        {
            if (len > Length || Length % len != 0 || primes > Primes || len < 16)
                throw new InvalidOperationException("prefix shape not available");
            var t = new Transformed(_owner, len, primes);
            for (int i = 0; i < primes; i++) Row(i)[..len].CopyTo(t.Row(i));
            return t;
        }

        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        private void Check(Transformed o)
        {
            if (o.Length != Length || o.Primes != Primes) throw new InvalidOperationException("transform shapes differ");
        }

        /// <summary>Inverse transforms (destroying this buffer) and remainders mod p of the first
        /// dst.Length coefficients of the (cyclic) product.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public void InverseTo(Span<ulong> dst)
        {
            for (int i = 0; i < Primes; i++) _owner._primes[i].Inverse(Row(i));
            _owner.Garner(this, dst);
        }

        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public void Dispose()
        {
            if (_data is not null) ArrayPool<uint>.Shared.Return(_data);
            _data = null;
        }
    }

    /// <summary>Vectorised Garner digits for three primes (eight coefficients at a time); the final
    /// t0 + t1·q0 + t2·q0·q1 mod p (p &lt; 2^32, sum &lt; 2^64) stays scalar. Returns the count done.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private unsafe int GarnerThreeVector(Span<uint> r0, Span<uint> r1, Span<uint> r2, Span<ulong> dst, int count, uint s0, uint s1, uint s2)
    {
        var p0 = _primes[0]; var p1 = _primes[1]; var p2 = _primes[2];
        var q0 = Vector256.Create(p0.Q); var q1 = Vector256.Create(p1.Q); var q2 = Vector256.Create(p2.Q);
        var qi0 = Vector256.Create(p0.QInv); var qi1 = Vector256.Create(p1.QInv); var qi2 = Vector256.Create(p2.QInv);
        var vs0 = Vector256.Create(s0); var vs1 = Vector256.Create(s1); var vs2 = Vector256.Create(s2);
        var i10 = Vector256.Create(_garnerInv[1][0]);
        var i20 = Vector256.Create(_garnerInv[2][0]);
        var i21 = Vector256.Create(_garnerInv[2][1]);
        ulong c1 = _prefixModP[1], c2 = _prefixModP[2];
        var mod = _mod;
        var vp = Vector256.Create((uint)_mod.P);
        var vpinv = Vector256.Create(_pInv32);
        var vc1 = Vector256.Create(_c1Mont);
        var vc2 = Vector256.Create(_c2Mont);
        uint* t0s = stackalloc uint[8];
        uint* t1s = stackalloc uint[8];
        uint* t2s = stackalloc uint[8];
        int j = 0;
        fixed (uint* a0 = r0)
        fixed (uint* a1 = r1)
        fixed (uint* a2 = r2)
        fixed (ulong* d = dst)
        {
            if (_finalVector && NttPrime.Use512)
            {
                var w0 = Vector512.Create(p0.Q); var w1 = Vector512.Create(p1.Q); var w2 = Vector512.Create(p2.Q);
                var wi0 = Vector512.Create(p0.QInv); var wi1 = Vector512.Create(p1.QInv); var wi2 = Vector512.Create(p2.QInv);
                var ws0 = Vector512.Create(s0); var ws1 = Vector512.Create(s1); var ws2 = Vector512.Create(s2);
                var wi10 = Vector512.Create(_garnerInv[1][0]);
                var wi20 = Vector512.Create(_garnerInv[2][0]);
                var wi21 = Vector512.Create(_garnerInv[2][1]);
                var wp = Vector512.Create((uint)_mod.P);
                var wpinv = Vector512.Create(_pInv32);
                var wc1 = Vector512.Create(_c1Mont);
                var wc2 = Vector512.Create(_c2Mont);
                for (; j + 16 <= count; j += 16)
                {
                    var t0 = NttPrime.WMontMul(Avx512F.LoadVector512(a0 + j), ws0, w0, wi0);
                    var x1 = NttPrime.WMontMul(Avx512F.LoadVector512(a1 + j), ws1, w1, wi1);
                    var t1 = NttPrime.WMontMul(NttPrime.WSub(x1, Avx512F.Min(t0, Avx512F.Subtract(t0, w1)), w1), wi10, w1, wi1);
                    var x2 = NttPrime.WMontMul(Avx512F.LoadVector512(a2 + j), ws2, w2, wi2);
                    x2 = NttPrime.WMontMul(NttPrime.WSub(x2, Avx512F.Min(t0, Avx512F.Subtract(t0, w2)), w2), wi20, w2, wi2);
                    var t2 = NttPrime.WMontMul(NttPrime.WSub(x2, Avx512F.Min(t1, Avx512F.Subtract(t1, w2)), w2), wi21, w2, wi2);
                    var u1 = NttPrime.WMontMul(t1, wc1, wp, wpinv);
                    var u2 = NttPrime.WMontMul(t2, wc2, wp, wpinv);
                    var sum = NttPrime.WAdd(NttPrime.WAdd(t0, u1, wp), u2, wp);
                    Avx512F.Store(d + j, Avx512F.ConvertToVector512UInt64(sum.GetLower()));
                    Avx512F.Store(d + j + 8, Avx512F.ConvertToVector512UInt64(sum.GetUpper()));
                }
            }
            for (; j + 8 <= count; j += 8)
            {
                var t0 = NttPrime.VMontMul(Avx.LoadVector256(a0 + j), vs0, q0, qi0);
                var x1 = NttPrime.VMontMul(Avx.LoadVector256(a1 + j), vs1, q1, qi1);
                var t0m1 = Avx2.Min(t0, Avx2.Subtract(t0, q1));                 // t0 mod q1 (t0 < 2·q1)
                var t1 = NttPrime.VMontMul(NttPrime.VSub(x1, t0m1, q1), i10, q1, qi1);
                var x2 = NttPrime.VMontMul(Avx.LoadVector256(a2 + j), vs2, q2, qi2);
                var t0m2 = Avx2.Min(t0, Avx2.Subtract(t0, q2));
                x2 = NttPrime.VMontMul(NttPrime.VSub(x2, t0m2, q2), i20, q2, qi2);
                var t1m2 = Avx2.Min(t1, Avx2.Subtract(t1, q2));
                var t2 = NttPrime.VMontMul(NttPrime.VSub(x2, t1m2, q2), i21, q2, qi2);
                if (_finalVector)
                {
                    // 2^30 ≤ p < 2^31: t0 < p already; t1·q0 and t2·q0q1 mod p by Montgomery modulo p
                    // (constants pre-multiplied by 2^32), then two modular additions, all in lanes.
                    var u1 = NttPrime.VMontMul(t1, vc1, vp, vpinv);
                    var u2 = NttPrime.VMontMul(t2, vc2, vp, vpinv);
                    var sum = NttPrime.VAdd(NttPrime.VAdd(t0, u1, vp), u2, vp);
                    Avx.Store(d + j, Avx2.ConvertToVector256Int64(sum.GetLower()).AsUInt64());
                    Avx.Store(d + j + 4, Avx2.ConvertToVector256Int64(sum.GetUpper()).AsUInt64());
                    continue;
                }
                Avx.Store(t0s, t0); Avx.Store(t1s, t1); Avx.Store(t2s, t2);
                for (int u = 0; u < 8; u++)
                    dst[j + u] = mod.Reduce64(t0s[u] + t1s[u] * c1 + t2s[u] * c2);
            }
        }
        return j;
    }

    /// <summary>Recombines inverse-transformed rows (still carrying the factor len·R⁻¹) to residues mod p.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal void Garner(Transformed t, Span<ulong> dst)
    {
        int k = t.Primes, len = t.Length, count = Math.Min(dst.Length, len);
        Span<uint> scale = stackalloc uint[k];
        for (int i = 0; i < k; i++)
        {
            var pr = _primes[i];
            uint linv = pr.PowMod((uint)(len % pr.Q), pr.Q - 2);
            scale[i] = pr.ToMont(pr.ToMont(linv));   // len⁻¹·R² : MontMul(x, ·) = x·len⁻¹·R
        }
        var mod = _mod;
        if (k == 1)
        {
            var r0 = t.Row(0);
            var p0 = _primes[0];
            uint s0 = scale[0];
            if (_direct)
                for (int j = 0; j < count; j++) dst[j] = p0.MontMul(r0[j], s0);
            else
                for (int j = 0; j < count; j++) dst[j] = mod.Reduce64(p0.MontMul(r0[j], s0));
        }
        else if (k == 2 && _small)
        {
            var r0 = t.Row(0); var r1 = t.Row(1);
            var p0 = _primes[0]; var p1 = _primes[1];
            uint s0 = scale[0], s1 = scale[1], i10 = _garnerInv[1][0];
            ulong c1 = _prefixModP[1];
            for (int j = 0; j < count; j++)
            {
                uint t0 = p0.MontMul(r0[j], s0);
                uint x1 = p1.MontMul(r1[j], s1);
                uint t1 = p1.MontMul(p1.Sub(x1, p1.Fold(t0)), i10);
                dst[j] = mod.Reduce64(t0 + t1 * c1);
            }
        }
        else if (k == 3 && _small)
        {
            var r0 = t.Row(0); var r1 = t.Row(1); var r2 = t.Row(2);
            var p0 = _primes[0]; var p1 = _primes[1]; var p2 = _primes[2];
            uint s0 = scale[0], s1 = scale[1], s2 = scale[2];
            uint i10 = _garnerInv[1][0], i20 = _garnerInv[2][0], i21 = _garnerInv[2][1];
            uint q1 = p1.Q, q2 = p2.Q;
            ulong c1 = _prefixModP[1], c2 = _prefixModP[2];
            int j = 0;
            if (System.Runtime.Intrinsics.X86.Avx2.IsSupported && NttPrime.AllowVector)
                j = GarnerThreeVector(r0, r1, r2, dst, count, s0, s1, s2);
            for (; j < count; j++)
            {
                uint t0 = p0.MontMul(r0[j], s0);
                uint x1 = p1.MontMul(r1[j], s1);
                uint t1 = p1.MontMul(p1.Sub(x1, p1.Fold(t0)), i10);
                uint x2 = p2.MontMul(r2[j], s2);
                x2 = p2.MontMul(p2.Sub(x2, p2.Fold(t0)), i20);
                uint t2 = p2.MontMul(p2.Sub(x2, p2.Fold(t1)), i21);
                dst[j] = mod.Reduce64(t0 + t1 * c1 + t2 * c2);
            }
        }
        else
        {
            Span<uint> digits = stackalloc uint[k];
            for (int j = 0; j < count; j++)
            {
                ulong hi = 0, lo = 0;
                for (int i = 0; i < k; i++)
                {
                    var pr = _primes[i];
                    uint x = pr.MontMul(t.Row(i)[j], scale[i]);
                    var inv = _garnerInv[i];
                    for (int m = 0; m < i; m++)
                    {
                        x = pr.MontMul(pr.Sub(x, pr.Fold(digits[m])), inv[m]);
                    }
                    digits[i] = x;
                    ulong ph = Math.BigMul(x, _prefixModP[i], out ulong pl);
                    lo += pl;
                    hi += ph + (lo < pl ? 1UL : 0UL);
                }
                dst[j] = mod.Reduce128(hi, lo);
            }
        }
        if (dst.Length > count) dst[count..].Clear();
    }
}
