using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;

namespace Integrable.Kernels.Univariate;

/// <summary>Number-theoretic transforms of power-of-two length modulo an NTT-friendly prime q &lt; 2^30
/// (q − 1 divisible by a large power of two), on spans of 32-bit residues.</summary>
/// <remarks>
/// <para>Arithmetic is Montgomery with R = 2^32 (signed variant: m = lo(t)·q⁻¹, result hi(t) − hi(m·q),
/// plus q when negative), exact in [0, q) after every operation. Twiddles are stored in Montgomery form,
/// so that MontMul(x, ω·R) = x·ω keeps data in normal form.</para>
/// <para>The forward transform is decimation in frequency (natural order in, permuted order out), the
/// inverse is decimation in time (permuted order in, natural order out), so no bit reversal is ever
/// done. The permutation depends on the code path (AVX2 or scalar, chosen by length, see
/// <see cref="UseVector"/>): transforms are only ever combined pointwise, so the order of the
/// transformed values is irrelevant as long as forward and inverse use the same path.</para>
/// <para>The AVX2 path handles eight lanes at a time; the last three decimation stages (butterfly
/// spans 4, 2, 1) are fused in registers with lane shuffles. Above <see cref="RecursionBlock"/> the
/// transform recurses depth first so each sub-transform stays in cache.</para>
/// </remarks>
internal sealed class NttPrime
{
    /// <summary>The largest supported transform length is 2^MaxLog (every prime used has 2-adicity ≥ 23).</summary>
    public const int MaxLog = 23;

    /// <summary>Length up to which a transform is done stage by stage (fits in L1/L2); larger lengths recurse.</summary>
    internal const int RecursionBlock = 1 << 12;

    /// <summary>When false the AVX2 path is never used (tests force the scalar path with it).</summary>
    internal static bool AllowVector = true;

    public readonly uint Q;
    public readonly uint QInv;     // q^{-1} mod 2^32
    public readonly uint RModQ;    // 2^32 mod q
    public readonly uint R2ModQ;   // 2^64 mod q
    private readonly uint _root;   // a primitive root mod q
    private readonly int _twoAdicity;

    // _fwd[h + j] = ω_{2h}^j·R mod q, _inv[h + j] = ω_{2h}^{-j}·R mod q, for h = 1, 2, 4, …, j < h.
    private uint[] _fwd = [];
    private uint[] _inv = [];
    private int _tableLog = -1;
    private readonly object _lock = new();

    public NttPrime(uint q, uint primitiveRoot)
    {
        if (q >= 1u << 30 || (q & 1) == 0) throw new ArgumentOutOfRangeException(nameof(q));
        Q = q;
        _root = primitiveRoot;
        uint inv = 1;
        for (int i = 0; i < 5; i++) inv *= 2 - q * inv;   // Newton: inverse mod 2^32
        QInv = inv;
        RModQ = (uint)((1UL << 32) % q);
        R2ModQ = (uint)((ulong)RModQ * RModQ % q);
        _twoAdicity = System.Numerics.BitOperations.TrailingZeroCount(q - 1);
        EnsureTables(4);
    }

    /// <summary>Whether transforms of length <paramref name="n"/> take the AVX2 path.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool UseVector(int n) => n >= 16 && AllowVector && Avx2.IsSupported;

    /// <summary>Montgomery product a·b·2^-32 mod q for a·b &lt; q·2^32.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public uint MontMul(uint a, uint b)
    {
        ulong t = (ulong)a * b;
        uint m = (uint)t * QInv;
        uint r = (uint)(t >> 32) - (uint)(((ulong)m * Q) >> 32);
        return r + (Q & (uint)((int)r >> 31));   // branch-free: mispredictions dominate otherwise
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public uint Add(uint a, uint b)
    {
        uint s = a + b - Q;
        return s + (Q & (uint)((int)s >> 31));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public uint Sub(uint a, uint b)
    {
        uint d = a - b;
        return d + (Q & (uint)((int)d >> 31));
    }

    /// <summary>x mod q for x &lt; 2q.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public uint Fold(uint x)
    {
        uint d = x - Q;
        return d + (Q & (uint)((int)d >> 31));
    }

    /// <summary>Plain a·b mod q.</summary>
    public uint MulMod(uint a, uint b) => (uint)((ulong)a * b % Q);

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public uint PowMod(uint a, ulong e)
    {
        ulong r = 1, b = a % Q;
        while (e > 0)
        {
            if ((e & 1) != 0) r = r * b % Q;
            b = b * b % Q;
            e >>= 1;
        }
        return (uint)r;
    }

    /// <summary>Converts a residue to Montgomery form x·R mod q.</summary>
    public uint ToMont(uint x) => (uint)(((ulong)x << 32) % Q);

    /// <summary>Makes sure the twiddle tables cover transforms of length 2^log.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void EnsureTables(int log)
    {
        if (log <= _tableLog) return;
        if (log > MaxLog || log > _twoAdicity)
            throw new ArgumentOutOfRangeException(nameof(log), log, $"transform length 2^{log} exceeds the supported 2^{Math.Min(MaxLog, _twoAdicity)}");
        lock (_lock)
        {
            if (log <= _tableLog) return;
            int n = 1 << log;
            var fwd = GC.AllocateUninitializedArray<uint>(n);
            var inv = GC.AllocateUninitializedArray<uint>(n);
            fwd[0] = inv[0] = 0;
            for (int h = 1; h < n; h <<= 1)
            {
                uint w = PowMod(_root, (Q - 1) / (2UL * (uint)h));
                uint wi = PowMod(w, Q - 2);
                uint wm = ToMont(w), wim = ToMont(wi);
                uint cur = RModQ, curi = RModQ;   // 1 in Montgomery form
                for (int j = 0; j < h; j++)
                {
                    fwd[h + j] = cur;
                    inv[h + j] = curi;
                    cur = MontMul(cur, wm);
                    curi = MontMul(curi, wim);
                }
            }
            _fwd = fwd;
            _inv = inv;
            Volatile.Write(ref _tableLog, log);
        }
    }

    /// <summary>Forward transform in place (length a power of two, tables ensured by the caller).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public unsafe void Forward(Span<uint> a)
    {
        int n = a.Length;
        if (n <= 1) return;
        fixed (uint* pa = a)
        fixed (uint* w = _fwd)
        {
            if (UseVector(n)) ForwardVector(pa, n, w);
            else ForwardScalar(pa, n, w);
        }
    }

    /// <summary>Inverse transform in place, without the 1/n scaling.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public unsafe void Inverse(Span<uint> a)
    {
        int n = a.Length;
        if (n <= 1) return;
        fixed (uint* pa = a)
        fixed (uint* w = _inv)
        {
            if (UseVector(n)) InverseVector(pa, n, w);
            else InverseScalar(pa, n, w);
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private unsafe void ForwardScalar(uint* a, int n, uint* w)
    {
        for (int h = n >> 1; h >= 1; h >>= 1)
            for (int s = 0; s < n; s += 2 * h)
                for (int j = 0; j < h; j++)
                {
                    uint x = a[s + j], y = a[s + j + h];
                    a[s + j] = Add(x, y);
                    a[s + j + h] = MontMul(Sub(x, y), w[h + j]);
                }
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private unsafe void InverseScalar(uint* a, int n, uint* w)
    {
        for (int h = 1; h < n; h <<= 1)
            for (int s = 0; s < n; s += 2 * h)
                for (int j = 0; j < h; j++)
                {
                    uint x = a[s + j], y = MontMul(a[s + j + h], w[h + j]);
                    a[s + j] = Add(x, y);
                    a[s + j + h] = Sub(x, y);
                }
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector256<uint> VMontMul(Vector256<uint> a, Vector256<uint> b, Vector256<uint> q, Vector256<uint> qinv)
    {
        Vector256<ulong> pe = Avx2.Multiply(a, b);
        Vector256<ulong> po = Avx2.Multiply(Avx2.ShiftRightLogical(a.AsUInt64(), 32).AsUInt32(), Avx2.ShiftRightLogical(b.AsUInt64(), 32).AsUInt32());
        Vector256<ulong> me = Avx2.Multiply(pe.AsUInt32(), qinv);
        Vector256<ulong> mo = Avx2.Multiply(po.AsUInt32(), qinv);
        Vector256<ulong> mqe = Avx2.Multiply(me.AsUInt32(), q);
        Vector256<ulong> mqo = Avx2.Multiply(mo.AsUInt32(), q);
        Vector256<uint> t = Avx2.Blend(Avx2.ShiftRightLogical(pe, 32).AsUInt32(), po.AsUInt32(), 0b10101010);
        Vector256<uint> u = Avx2.Blend(Avx2.ShiftRightLogical(mqe, 32).AsUInt32(), mqo.AsUInt32(), 0b10101010);
        Vector256<uint> r = Avx2.Subtract(t, u);
        return Avx2.Min(r, Avx2.Add(r, q));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector512<uint> WMontMul(Vector512<uint> a, Vector512<uint> b, Vector512<uint> q, Vector512<uint> qinv)
    {
        Vector512<ulong> pe = Avx512F.Multiply(a, b);
        Vector512<ulong> po = Avx512F.Multiply(Avx512F.ShiftRightLogical(a.AsUInt64(), 32).AsUInt32(), Avx512F.ShiftRightLogical(b.AsUInt64(), 32).AsUInt32());
        Vector512<ulong> me = Avx512F.Multiply(pe.AsUInt32(), qinv);
        Vector512<ulong> mo = Avx512F.Multiply(po.AsUInt32(), qinv);
        Vector512<ulong> mqe = Avx512F.Multiply(me.AsUInt32(), q);
        Vector512<ulong> mqo = Avx512F.Multiply(mo.AsUInt32(), q);
        var hiMask = Vector512.Create(0xFFFFFFFF00000000UL);
        Vector512<uint> t = Avx512F.Or(Avx512F.ShiftRightLogical(pe, 32), Avx512F.And(po, hiMask)).AsUInt32();
        Vector512<uint> u = Avx512F.Or(Avx512F.ShiftRightLogical(mqe, 32), Avx512F.And(mqo, hiMask)).AsUInt32();
        Vector512<uint> r = Avx512F.Subtract(t, u);
        return Avx512F.Min(r, Avx512F.Add(r, q));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector512<uint> WAdd(Vector512<uint> a, Vector512<uint> b, Vector512<uint> q)
    {
        Vector512<uint> s = Avx512F.Add(a, b);
        return Avx512F.Min(s, Avx512F.Subtract(s, q));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector512<uint> WSub(Vector512<uint> a, Vector512<uint> b, Vector512<uint> q)
    {
        Vector512<uint> d = Avx512F.Subtract(a, b);
        return Avx512F.Min(d, Avx512F.Add(d, q));
    }

    /// <summary>Whether the 512-bit stages are used (stages with butterfly span ≥ 16 and pointwise loops).</summary>
    internal static bool Use512 => AllowVector512 && AllowVector && Avx512F.IsSupported;

    /// <summary>When false the AVX-512 stages are never used (tests and benchmarks compare both).</summary>
    internal static bool AllowVector512 = true;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector256<uint> VAdd(Vector256<uint> a, Vector256<uint> b, Vector256<uint> q)
    {
        Vector256<uint> s = Avx2.Add(a, b);
        return Avx2.Min(s, Avx2.Subtract(s, q));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector256<uint> VSub(Vector256<uint> a, Vector256<uint> b, Vector256<uint> q)
    {
        Vector256<uint> d = Avx2.Subtract(a, b);
        return Avx2.Min(d, Avx2.Add(d, q));
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private unsafe void ForwardVector(uint* a, int n, uint* w)
    {
        var q = Vector256.Create(Q);
        var qinv = Vector256.Create(QInv);
        if (n > RecursionBlock)
        {
            int h = n >> 1;
            DifStage(a, n, h, w, q, qinv);
            ForwardVector(a, h, w);
            ForwardVector(a + h, h, w);
            return;
        }
        for (int h = n >> 1; h >= 8; h >>= 1) DifStage(a, n, h, w, q, qinv);
        // Fused stages h = 4, 2, 1 on 16 elements at a time.
        var w4 = Vector256.Create(w[4], w[5], w[6], w[7], w[4], w[5], w[6], w[7]);
        var w2 = Vector256.Create(w[2], w[3], w[2], w[3], w[2], w[3], w[2], w[3]);
        for (int s = 0; s < n; s += 16)
        {
            var v1 = Avx.LoadVector256(a + s);
            var v2 = Avx.LoadVector256(a + s + 8);
            var x = Avx2.Permute2x128(v1, v2, 0x20);
            var y = Avx2.Permute2x128(v1, v2, 0x31);
            var sx = VAdd(x, y, q);
            var dy = VMontMul(VSub(x, y, q), w4, q, qinv);
            x = Avx2.UnpackLow(sx.AsUInt64(), dy.AsUInt64()).AsUInt32();
            y = Avx2.UnpackHigh(sx.AsUInt64(), dy.AsUInt64()).AsUInt32();
            sx = VAdd(x, y, q);
            dy = VMontMul(VSub(x, y, q), w2, q, qinv);
            x = Avx.Shuffle(sx.AsSingle(), dy.AsSingle(), 0x88).AsUInt32();
            y = Avx.Shuffle(sx.AsSingle(), dy.AsSingle(), 0xDD).AsUInt32();
            Avx.Store(a + s, VAdd(x, y, q));
            Avx.Store(a + s + 8, VSub(x, y, q));
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static unsafe void DifStage(uint* a, int n, int h, uint* w, Vector256<uint> q, Vector256<uint> qinv)
    {
        uint* wh = w + h;
        if (h >= 16 && Use512)
        {
            var q5 = Vector512.Create(q.GetElement(0));
            var qi5 = Vector512.Create(qinv.GetElement(0));
            for (int s = 0; s < n; s += 2 * h)
            {
                uint* x0 = a + s, y0 = a + s + h;
                for (int j = 0; j < h; j += 16)
                {
                    var x = Avx512F.LoadVector512(x0 + j);
                    var y = Avx512F.LoadVector512(y0 + j);
                    Avx512F.Store(x0 + j, WAdd(x, y, q5));
                    Avx512F.Store(y0 + j, WMontMul(WSub(x, y, q5), Avx512F.LoadVector512(wh + j), q5, qi5));
                }
            }
            return;
        }
        for (int s = 0; s < n; s += 2 * h)
        {
            uint* x0 = a + s, y0 = a + s + h;
            for (int j = 0; j < h; j += 8)
            {
                var x = Avx.LoadVector256(x0 + j);
                var y = Avx.LoadVector256(y0 + j);
                Avx.Store(x0 + j, VAdd(x, y, q));
                Avx.Store(y0 + j, VMontMul(VSub(x, y, q), Avx.LoadVector256(wh + j), q, qinv));
            }
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static unsafe void DitStage(uint* a, int n, int h, uint* w, Vector256<uint> q, Vector256<uint> qinv)
    {
        uint* wh = w + h;
        if (h >= 16 && Use512)
        {
            var q5 = Vector512.Create(q.GetElement(0));
            var qi5 = Vector512.Create(qinv.GetElement(0));
            for (int s = 0; s < n; s += 2 * h)
            {
                uint* x0 = a + s, y0 = a + s + h;
                for (int j = 0; j < h; j += 16)
                {
                    var x = Avx512F.LoadVector512(x0 + j);
                    var y = WMontMul(Avx512F.LoadVector512(y0 + j), Avx512F.LoadVector512(wh + j), q5, qi5);
                    Avx512F.Store(x0 + j, WAdd(x, y, q5));
                    Avx512F.Store(y0 + j, WSub(x, y, q5));
                }
            }
            return;
        }
        for (int s = 0; s < n; s += 2 * h)
        {
            uint* x0 = a + s, y0 = a + s + h;
            for (int j = 0; j < h; j += 8)
            {
                var x = Avx.LoadVector256(x0 + j);
                var y = VMontMul(Avx.LoadVector256(y0 + j), Avx.LoadVector256(wh + j), q, qinv);
                Avx.Store(x0 + j, VAdd(x, y, q));
                Avx.Store(y0 + j, VSub(x, y, q));
            }
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private unsafe void InverseVector(uint* a, int n, uint* w)
    {
        var q = Vector256.Create(Q);
        var qinv = Vector256.Create(QInv);
        if (n > RecursionBlock)
        {
            int h = n >> 1;
            InverseVector(a, h, w);
            InverseVector(a + h, h, w);
            DitStage(a, n, h, w, q, qinv);
            return;
        }
        var w4 = Vector256.Create(w[4], w[5], w[6], w[7], w[4], w[5], w[6], w[7]);
        var w2 = Vector256.Create(w[2], w[3], w[2], w[3], w[2], w[3], w[2], w[3]);
        for (int s = 0; s < n; s += 16)
        {
            var x = Avx.LoadVector256(a + s);
            var y = Avx.LoadVector256(a + s + 8);
            var sx = VAdd(x, y, q);
            var dy = VSub(x, y, q);
            x = Avx2.UnpackLow(sx, dy);
            y = VMontMul(Avx2.UnpackHigh(sx, dy), w2, q, qinv);
            sx = VAdd(x, y, q);
            dy = VSub(x, y, q);
            x = Avx2.UnpackLow(sx.AsUInt64(), dy.AsUInt64()).AsUInt32();
            y = VMontMul(Avx2.UnpackHigh(sx.AsUInt64(), dy.AsUInt64()).AsUInt32(), w4, q, qinv);
            sx = VAdd(x, y, q);
            dy = VSub(x, y, q);
            Avx.Store(a + s, Avx2.Permute2x128(sx, dy, 0x20));
            Avx.Store(a + s + 8, Avx2.Permute2x128(sx, dy, 0x31));
        }
        for (int h = 8; h < n; h <<= 1) DitStage(a, n, h, w, q, qinv);
    }

    /// <summary>dst[i] = MontMul(dst[i], src[i]) (pointwise product, times R⁻¹).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public unsafe void PointwiseMontMul(Span<uint> dst, ReadOnlySpan<uint> src)
    {
        int n = dst.Length, i = 0;
        fixed (uint* d = dst)
        fixed (uint* s = src)
        {
            if (Use512)
            {
                var q = Vector512.Create(Q);
                var qinv = Vector512.Create(QInv);
                for (; i + 16 <= n; i += 16)
                    Avx512F.Store(d + i, WMontMul(Avx512F.LoadVector512(d + i), Avx512F.LoadVector512(s + i), q, qinv));
            }
            if (Avx2.IsSupported && AllowVector)
            {
                var q = Vector256.Create(Q);
                var qinv = Vector256.Create(QInv);
                for (; i + 8 <= n; i += 8)
                    Avx.Store(d + i, VMontMul(Avx.LoadVector256(d + i), Avx.LoadVector256(s + i), q, qinv));
            }
            for (; i < n; i++) d[i] = MontMul(d[i], s[i]);
        }
    }

    /// <summary>dst[i] = MontMul(dst[i], c) for a constant c (in the caller's chosen form).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public unsafe void ScaleMont(Span<uint> dst, uint c)
    {
        int n = dst.Length, i = 0;
        fixed (uint* d = dst)
        {
            if (Avx2.IsSupported && AllowVector)
            {
                var q = Vector256.Create(Q);
                var qinv = Vector256.Create(QInv);
                var vc = Vector256.Create(c);
                for (; i + 8 <= n; i += 8)
                    Avx.Store(d + i, VMontMul(Avx.LoadVector256(d + i), vc, q, qinv));
            }
            for (; i < n; i++) d[i] = MontMul(d[i], c);
        }
    }

    /// <summary>dst[i] = (dst[i] + MontMul(a[i], b[i])) mod q: accumulate a pointwise product.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public unsafe void PointwiseMontMulAdd(Span<uint> dst, ReadOnlySpan<uint> a, ReadOnlySpan<uint> b)
    {
        int n = dst.Length, i = 0;
        fixed (uint* d = dst)
        fixed (uint* pa = a)
        fixed (uint* pb = b)
        {
            if (Use512)
            {
                var q = Vector512.Create(Q);
                var qinv = Vector512.Create(QInv);
                for (; i + 16 <= n; i += 16)
                    Avx512F.Store(d + i, WAdd(Avx512F.LoadVector512(d + i), WMontMul(Avx512F.LoadVector512(pa + i), Avx512F.LoadVector512(pb + i), q, qinv), q));
            }
            if (Avx2.IsSupported && AllowVector)
            {
                var q = Vector256.Create(Q);
                var qinv = Vector256.Create(QInv);
                for (; i + 8 <= n; i += 8)
                    Avx.Store(d + i, VAdd(Avx.LoadVector256(d + i), VMontMul(Avx.LoadVector256(pa + i), Avx.LoadVector256(pb + i), q, qinv), q));
            }
            for (; i < n; i++) d[i] = Add(d[i], MontMul(pa[i], pb[i]));
        }
    }

    /// <summary>dst[i] = (dst[i] − MontMul(a[i], b[i])) mod q.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public unsafe void PointwiseMontMulSub(Span<uint> dst, ReadOnlySpan<uint> a, ReadOnlySpan<uint> b)
    {
        int n = dst.Length, i = 0;
        fixed (uint* d = dst)
        fixed (uint* pa = a)
        fixed (uint* pb = b)
        {
            if (Avx2.IsSupported && AllowVector)
            {
                var q = Vector256.Create(Q);
                var qinv = Vector256.Create(QInv);
                for (; i + 8 <= n; i += 8)
                    Avx.Store(d + i, VSub(Avx.LoadVector256(d + i), VMontMul(Avx.LoadVector256(pa + i), Avx.LoadVector256(pb + i), q, qinv), q));
            }
            for (; i < n; i++) d[i] = Sub(d[i], MontMul(pa[i], pb[i]));
        }
    }

    /// <summary>dst[i] = MontMul(a[i], b[i]) written into a separate destination.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public unsafe void PointwiseMontMulTo(Span<uint> dst, ReadOnlySpan<uint> a, ReadOnlySpan<uint> b)
    {
        int n = dst.Length, i = 0;
        fixed (uint* d = dst)
        fixed (uint* pa = a)
        fixed (uint* pb = b)
        {
            if (Use512)
            {
                var q = Vector512.Create(Q);
                var qinv = Vector512.Create(QInv);
                for (; i + 16 <= n; i += 16)
                    Avx512F.Store(d + i, WMontMul(Avx512F.LoadVector512(pa + i), Avx512F.LoadVector512(pb + i), q, qinv));
            }
            if (Avx2.IsSupported && AllowVector)
            {
                var q = Vector256.Create(Q);
                var qinv = Vector256.Create(QInv);
                for (; i + 8 <= n; i += 8)
                    Avx.Store(d + i, VMontMul(Avx.LoadVector256(pa + i), Avx.LoadVector256(pb + i), q, qinv));
            }
            for (; i < n; i++) d[i] = MontMul(pa[i], pb[i]);
        }
    }

    /// <summary>Loads residues x mod q of 64-bit coefficients (each &lt; 2^62) into <paramref name="dst"/>
    /// and zero-fills the rest.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public unsafe void Load(ReadOnlySpan<ulong> src, Span<uint> dst, bool small)
    {
        int m = Math.Min(src.Length, dst.Length), i = 0;
        fixed (ulong* s = src)
        fixed (uint* d = dst)
        {
            if (small)
            {
                // Every coefficient < 2^32: subtract 4q, 2q, q conditionally (4q < 2^32).
                uint q = Q, q2 = 2 * Q, q4 = 4 * Q;
                if (Avx2.IsSupported && AllowVector)
                {
                    var vq = Vector256.Create(q);
                    var vq2 = Vector256.Create(q2);
                    var vq4 = Vector256.Create(q4);
                    for (; i + 8 <= m; i += 8)
                    {
                        var x = Vector256.Narrow(Avx.LoadVector256(s + i), Avx.LoadVector256(s + i + 4));
                        x = Avx2.Min(x, Avx2.Subtract(x, vq4));
                        x = Avx2.Min(x, Avx2.Subtract(x, vq2));
                        x = Avx2.Min(x, Avx2.Subtract(x, vq));
                        Avx.Store(d + i, x);
                    }
                }
                for (; i < m; i++)
                {
                    uint x = (uint)s[i];
                    x = Math.Min(x, x - q4);
                    x = Math.Min(x, x - q2);
                    d[i] = Math.Min(x, x - q);
                }
            }
            else
            {
                uint r2 = R2ModQ;
                for (; i < m; i++)
                {
                    ulong x = s[i];
                    uint hi = MontMul((uint)(x >> 32), r2);              // (x >> 32)·2^32 mod q
                    uint lo = (uint)x;
                    lo = Math.Min(lo, lo - 4 * Q);
                    lo = Math.Min(lo, lo - 2 * Q);
                    lo = Math.Min(lo, lo - Q);
                    d[i] = Add(hi, lo);
                }
            }
        }
        dst[m..].Clear();
    }
}
