using System.Numerics;
using System.Runtime.CompilerServices;
using Integrable.Kernels.LinearAlgebra;
using Integrable.Kernels.Univariate;

namespace Integrable.Kernels;

/// <summary>Dense products with wide coefficients by Kronecker substitution and multi-modular
/// number-theoretic transforms: the operands' mixed-radix cell indices (those of the dense method) are
/// exponents of one variable; the product is computed modulo k word primes q = c·2^20 + 1 by transforms,
/// and every cell is recovered exactly by Garner's mixed-radix Chinese remaindering.</summary>
/// <remarks>
/// <para>Exactness: every product coefficient is a sum of at most min(#A, #B) products a·b, so its
/// magnitude is below 2^(bits a + bits b + ⌈log₂ min(#A, #B)⌉); the primes are taken until their product
/// M exceeds twice that bound, and the symmetric residue in (−M/2, M/2) is the coefficient itself.</para>
/// <para>Cost: k·(3 transforms of length L + L pointwise products) plus k²/2 modular steps per non-zero
/// cell, against #A·#B multi-limb multiply-adds for the classical dense method; worthwhile when the
/// coefficients span several words and the box is well filled (Somos-type iterates after projection
/// onto their affine hull, <see cref="SupportHull"/>).</para>
/// </remarks>
internal static class KroneckerProduct
{
    /// <summary>Largest transform length: 2^20 cells (the primes' 2-adicity).</summary>
    public const int MaxLog = 20;

    private static readonly Lazy<NttPrime[]> LazyPrimes = new(FindPrimes);

    /// <summary>Primes c·2^20 + 1 in (2^29, 2^30), largest first, with primitive roots: about fifty, so products
    /// of up to about 1,400 bits per coefficient. Keeping them within a factor of two of each other lets every
    /// Garner digit be reduced by one conditional subtraction.</summary>
    private static NttPrime[] FindPrimes()
    {
        var list = new List<NttPrime>();
        for (ulong c = (1UL << (30 - MaxLog)) - 1; c >= 1UL << (29 - MaxLog); c--)
        {
            ulong q = (c << MaxLog) + 1;
            if (Integrable.Numbers.Primes.IsPrime(q)) list.Add(new NttPrime((uint)q, NttMultiplier.FindPrimitiveRoot((uint)q)));
        }
        return [.. list];
    }

    /// <summary>The number of primes whose product exceeds 2^(bits + 1), or 0 when there are not enough.</summary>
    internal static int PrimesFor(int bits)
    {
        var primes = LazyPrimes.Value;
        double have = 0;
        for (int k = 0; k < primes.Length; k++)
        {
            have += Math.Log2(primes[k].Q);
            if (have > bits + 1) return k + 1;
        }
        return 0;
    }

    /// <summary>On the current thread: true forces this method for every product whose box allows it, false
    /// turns it off, null (the default) lets the cost estimate decide (tests and benchmarks).</summary>
    [ThreadStatic] internal static bool? Force;

    /// <summary>Whether the transform method is expected to beat the classical dense method for #A·#B products
    /// with coefficients of <paramref name="bitsA"/> and <paramref name="bitsB"/> bits into a product box of
    /// <paramref name="cells"/> cells (k primes: k·L·(1.5·log₂ L + 1) transform steps plus k²/2 Garner
    /// steps per cell, against #A·#B multiply-adds costing about as much as one transform step per pair of
    /// 32-bit limbs).</summary>
    public static bool Worth(long countA, long countB, int bitsA, int bitsB, long cells)
    {
        if (cells > 1L << MaxLog) return false;
        int bits = BoundBits(countA, countB, bitsA, bitsB);
        int k = PrimesFor(bits);
        if (k == 0) return false;
        if (Force is { } forced) return forced;
        double len = BitOperations.RoundUpToPowerOf2((ulong)cells);
        double transform = k * len * (1.5 * Math.Log2(len) + 1 + 0.5 * k);
        double classical = (double)countA * countB * Math.Max(1, (bitsA + 31) / 32) * Math.Max(1, (bitsB + 31) / 32);
        return transform < classical;
    }

    /// <summary>Bit length bound for every product coefficient (sign excluded).</summary>
    private static int BoundBits(long countA, long countB, int bitsA, int bitsB) =>
        bitsA + bitsB + (int)Math.Ceiling(Math.Log2(Math.Max(1, Math.Min(countA, countB)))) + 1;

    /// <summary>The product of A = Σ a_t·z^ia_t and B = Σ b_t·z^ib_t (integer coefficients, indices in
    /// [0, cells) with every ia + ib &lt; cells): the non-zero coefficients with their indices, highest index
    /// first. <paramref name="square"/>: B is A.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static int Multiply(ReadOnlySpan<BigInteger> ca, ReadOnlySpan<long> ia, ReadOnlySpan<BigInteger> cb, ReadOnlySpan<long> ib,
        long cells, bool square, int bitsA, int bitsB, out long[] indices, out BigInteger[] coefficients)
    {
        int k = PrimesFor(BoundBits(ca.Length, cb.Length, bitsA, bitsB));
        if (k == 0 || cells > 1L << MaxLog) throw new ArgumentOutOfRangeException(nameof(cells), "product outside the transform range");
        var primes = LazyPrimes.Value;
        int len = (int)BitOperations.RoundUpToPowerOf2((ulong)Math.Max(cells, 16));
        int log = BitOperations.Log2((uint)len);
        var fa = new uint[k * len];
        var fb = square ? fa : new uint[k * len];
        Load(ca, ia, primes, k, len, fa);
        if (!square) Load(cb, ib, primes, k, len, fb);
        for (int i = 0; i < k; i++)
        {
            KernelCancellation.Poll();
            var p = primes[i];
            p.EnsureTables(log);
            var ra = fa.AsSpan(i * len, len);
            p.Forward(ra);
            if (square) p.PointwiseMontMul(ra, ra);
            else
            {
                var rb = fb.AsSpan(i * len, len);
                p.Forward(rb);
                p.PointwiseMontMul(ra, rb);
            }
            p.Inverse(ra);
        }
        // len⁻¹·R² in Montgomery form: MontMul(x, ·) undoes the transforms' factor len·R⁻¹.
        var scale = new uint[k];
        for (int i = 0; i < k; i++)
        {
            var p = primes[i];
            scale[i] = p.ToMont(p.ToMont(p.PowMod((uint)(len % p.Q), p.Q - 2)));
        }
        return Reconstruct(fa, primes, k, len, (int)cells, scale, out indices, out coefficients);
    }

    /// <summary>The transform primes, largest first.</summary>
    internal static NttPrime[] TransformPrimes => LazyPrimes.Value;

    /// <summary>Residues of every coefficient modulo the first k primes, placed at the coefficient's cell.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void Load(ReadOnlySpan<BigInteger> c, ReadOnlySpan<long> idx, NttPrime[] primes, int k, int len, uint[] rows)
    {
        Span<ulong> limbs = stackalloc ulong[64];
        for (int t = 0; t < c.Length; t++)
        {
            int words = WordArithmetic.WordCount(c[t]);
            var l = words <= limbs.Length ? limbs[..words] : new ulong[words];
            WordArithmetic.WriteMagnitude(c[t], l);
            bool negative = c[t].Sign < 0;
            for (int i = 0; i < k; i++)
            {
                ulong q = primes[i].Q, r = 0;
                for (int w = words - 1; w >= 0; w--)
                {
                    r = ((r << 32) | (l[w] >> 32)) % q;
                    r = ((r << 32) | (uint)l[w]) % q;
                }
                if (negative && r != 0) r = q - r;
                rows[i * len + (int)idx[t]] = (uint)r;
            }
        }
    }

    /// <summary>Garner's mixed-radix digits and the symmetric integer of every non-zero cell, highest first; row i
    /// holds values modulo q_i that MontMul(·, scale_i) turns into residues.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static int Reconstruct(uint[] rows, NttPrime[] primes, int k, int len, int cells, uint[] scale, out long[] indices, out BigInteger[] coefficients)
    {
        var inv = new uint[k * k];   // inv[i·k + j] = q_j⁻¹·R mod q_i (Montgomery form), j < i
        for (int i = 0; i < k; i++)
        {
            var p = primes[i];
            for (int j = 0; j < i; j++) inv[i * k + j] = p.ToMont(p.PowMod(primes[j].Q % p.Q, p.Q - 2));
        }
        // M = Π q_i and ⌊M/2⌋ as limbs; the value v = Σ d_i·(q_0⋯q_{i−1}) lies in [0, M).
        int limbsM = 1;
        var m = new ulong[k + 1];
        m[0] = 1;
        for (int i = 0; i < k; i++) limbsM = WordArithmetic.MulWordAdd(m, limbsM, primes[i].Q, 0);
        var half = new ulong[limbsM];
        for (int w = limbsM - 1, carry = 0; w >= 0; w--)
        {
            half[w] = (m[w] >> 1) | ((ulong)carry << 63);
            carry = (int)(m[w] & 1);
        }
        var outIdx = new List<long>();
        var outCoef = new List<BigInteger>();
        var digits = new uint[k];
        var v = new ulong[limbsM + 1];
        var d = new ulong[limbsM];
        for (int cell = cells - 1; cell >= 0; cell--)
        {
            if ((cell & 4095) == 0) KernelCancellation.Poll();
            bool zero = true;
            for (int i = 0; i < k && zero; i++) zero = rows[i * len + cell] == 0;
            if (zero) continue;
            for (int i = 0; i < k; i++)
            {
                var p = primes[i];
                uint x = p.MontMul(rows[i * len + cell], scale[i]);
                for (int j = 0; j < i; j++) x = p.MontMul(p.Sub(x, p.Fold(digits[j])), inv[i * k + j]);
                digits[i] = x;
            }
            bool allZero = true;
            for (int i = 0; i < k && allZero; i++) allZero = digits[i] == 0;
            if (allZero) continue;   // a transform value q stands for 0
            // Horner: v = d_{k−1}; v = v·q_i + d_i for i = k−2 … 0.
            Array.Clear(v);
            v[0] = digits[k - 1];
            int used = 1;
            for (int i = k - 2; i >= 0; i--) used = WordArithmetic.MulWordAdd(v, used, primes[i].Q, digits[i]);
            BigInteger value;
            if (Compare(v, half, limbsM) > 0)
            {
                // v − M < 0: magnitude M − v.
                ulong borrow = 0;
                for (int w = 0; w < limbsM; w++)
                {
                    ulong a = m[w], b = v[w];
                    ulong r = a - b - borrow;
                    borrow = (a < b || (a == b && borrow != 0)) ? 1UL : 0UL;
                    d[w] = r;
                }
                value = WordArithmetic.ToBigInteger(d, negative: true);
            }
            else value = WordArithmetic.ToBigInteger(v.AsSpan(0, limbsM), negative: false);
            outIdx.Add(cell);
            outCoef.Add(value);
        }
        indices = [.. outIdx];
        coefficients = [.. outCoef];
        return indices.Length;
    }

    private static int Compare(ulong[] a, ulong[] b, int limbs)
    {
        for (int w = Math.Max(limbs, a.Length) - 1; w >= 0; w--)
        {
            ulong x = w < a.Length ? a[w] : 0, y = w < limbs ? b[w] : 0;
            if (x != y) return x > y ? 1 : -1;
        }
        return 0;
    }
}
