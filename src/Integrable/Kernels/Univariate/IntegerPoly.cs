using System.Runtime.CompilerServices;
using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Kernels.Univariate;

/// <summary>Dense polynomials over Z (BigInteger arrays, index = exponent, trimmed) with multi-modular
/// algorithms over the 62-bit primes of <see cref="Primes.Large"/>: products, exact division, gcd and
/// resultant. Every result that comes out of a modular computation is verified exactly or is backed
/// by a proven bound (Hadamard for resultants, coefficient bounds for products).</summary>
internal static class IntegerPoly
{
    /// <summary>Below this shorter length products are computed directly (Int128 or BigInteger schoolbook).</summary>
    internal static int ModularProductThreshold = 24;

    /// <summary>Tests set this to take the modular product path whenever the threshold allows.</summary>
    internal static bool ForceModularProduct;

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static BigInteger[] Trim(BigInteger[] a)
    {
        int n = a.Length;
        while (n > 0 && a[n - 1].IsZero) n--;
        return n == a.Length ? a : a[..n];
    }

    /// <summary>Largest absolute value of a coefficient.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static BigInteger MaxNorm(ReadOnlySpan<BigInteger> a)
    {
        var m = BigInteger.Zero;
        foreach (var c in a)
        {
            var x = BigInteger.Abs(c);
            if (x > m) m = x;
        }
        return m;
    }

    /// <summary>⌈‖a‖₂⌉ (upper bound of the Euclidean norm).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static BigInteger Norm2Ceiling(ReadOnlySpan<BigInteger> a)
    {
        var s = BigInteger.Zero;
        foreach (var c in a) s += c * c;
        var r = RationalReconstruction.Sqrt(s);
        return r * r == s ? r : r + 1;
    }

    /// <summary>gcd of all coefficients (non-negative; 0 for the zero polynomial).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static BigInteger Content(ReadOnlySpan<BigInteger> a)
    {
        var g = BigInteger.Zero;
        foreach (var c in a)
        {
            g = BigInteger.GreatestCommonDivisor(g, c);
            if (g.IsOne) break;
        }
        return g;
    }

    /// <summary>a / c for a scalar dividing every coefficient.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static BigInteger[] DivideScalar(ReadOnlySpan<BigInteger> a, BigInteger c)
    {
        var r = new BigInteger[a.Length];
        for (int i = 0; i < r.Length; i++) r[i] = a[i] / c;
        return r;
    }

    /// <summary>Residues of the coefficients modulo p (trimmed).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Reduce(ReadOnlySpan<BigInteger> a, ulong p)
    {
        var r = new ulong[a.Length];
        for (int i = 0; i < r.Length; i++) r[i] = Residue(a[i], p);
        return PolyMod.Trim(r);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong Residue(BigInteger x, ulong p)
    {
        if (x >= long.MinValue && x <= long.MaxValue)
        {
            long v = (long)x % (long)p;
            return (ulong)(v < 0 ? v + (long)p : v);
        }
        var r = BigInteger.Remainder(x, p);
        return (ulong)(r.Sign < 0 ? r + p : r);
    }

    // ------------------------------------------------------------------ products

    /// <summary>The exact product a·b.</summary>
    /// <remarks>Schoolbook (Int128 accumulation when the coefficients allow, BigInteger otherwise) or
    /// images modulo 62-bit primes, by a cost estimate: classical la·lb·w² word products (w words per
    /// coefficient) against k primes × (reductions (la + lb)·w + transforms 5·L·log₂L + remaindering n·k).</remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static BigInteger[] Multiply(ReadOnlySpan<BigInteger> a, ReadOnlySpan<BigInteger> b)
    {
        if (a.IsEmpty || b.IsEmpty) return [];
        int minLen = Math.Min(a.Length, b.Length);
        var na = MaxNorm(a);
        var nb = MaxNorm(b);
        long bits = (long)na.GetBitLength() + (long)nb.GetBitLength() + BitOperations.Log2((uint)minLen) + 1;
        if (minLen >= ModularProductThreshold)
        {
            int n = a.Length + b.Length - 1;
            double w = Math.Max(1.0, Math.Max((double)na.GetBitLength(), (double)nb.GetBitLength()) / 64);
            double k = bits / 61.0 + 1;
            double len = NttMultiplier.TransformLength(n);
            double classical = (double)a.Length * b.Length * w * w;
            double modular = k * ((a.Length + b.Length) * w + 5 * len * Math.Log2(len) + n * k);
            if (modular < classical || ForceModularProduct) return MultiplyModular(a, b, na * nb * minLen);   // |coefficients| ≤ bound
        }
        return bits <= 126 ? MultiplyInt128(a, b) : MultiplySchoolbook(a, b);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static BigInteger[] MultiplyInt128(ReadOnlySpan<BigInteger> a, ReadOnlySpan<BigInteger> b)
    {
        var la = new Int128[a.Length];
        var lb = new Int128[b.Length];
        for (int i = 0; i < la.Length; i++) la[i] = (Int128)a[i];
        for (int i = 0; i < lb.Length; i++) lb[i] = (Int128)b[i];
        int n = a.Length + b.Length - 1;
        var r = new BigInteger[n];
        for (int k = 0; k < n; k++)
        {
            Int128 s = 0;
            int i0 = Math.Max(0, k - lb.Length + 1), i1 = Math.Min(k, la.Length - 1);
            for (int i = i0; i <= i1; i++) s += la[i] * lb[k - i];
            r[k] = (BigInteger)s;
        }
        return Trim(r);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static BigInteger[] MultiplySchoolbook(ReadOnlySpan<BigInteger> a, ReadOnlySpan<BigInteger> b)
    {
        var r = new BigInteger[a.Length + b.Length - 1];
        for (int i = 0; i < a.Length; i++)
        {
            if (a[i].IsZero) continue;
            for (int j = 0; j < b.Length; j++) r[i + j] += a[i] * b[j];
        }
        return Trim(r);
    }

    /// <summary>Product through images modulo enough 62-bit primes that their product exceeds 2·bound.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static BigInteger[] MultiplyModular(ReadOnlySpan<BigInteger> a, ReadOnlySpan<BigInteger> b, BigInteger bound)
    {
        int n = a.Length + b.Length - 1;
        var acc = new MultiModular(n);
        var target = 2 * bound + 1;
        for (int i = 0; acc.Modulus <= target; i++)
        {
            ulong p = Primes.Large(i);
            var ctx = PolyModContext.For(new PrimeField(p));
            var img = PolyMod.Multiply(ctx, Reduce(a, p), Reduce(b, p));
            acc.Add(p, img);
        }
        return Trim(acc.Reconstruct());
    }

    // ------------------------------------------------------------------ exact division

    /// <summary>Exact division over Z: q with q·b = a when b divides a in Z[x] (b non-zero).</summary>
    /// <remarks>Images of the quotient modulo primes not dividing lc(b) are combined until two successive
    /// reconstructions agree and the candidate verifies by exact multiplication, or until the primes'
    /// product exceeds twice the Mignotte-type bound 2^deg q·‖a‖₂ on the coefficients of any true
    /// quotient (then divisibility is refuted). A non-zero remainder modulo any prime refutes it at once.</remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static bool TryDivideExact(BigInteger[] a, BigInteger[] b, out BigInteger[] quotient)
    {
        quotient = [];
        if (b.Length == 0) throw new DivideByZeroException("polynomial division by zero");
        if (a.Length == 0) return true;
        if (a.Length < b.Length) return false;
        if (!BigInteger.Remainder(a[^1], b[^1]).IsZero) return false;
        if (b.Length == 1)
        {
            var q = new BigInteger[a.Length];
            for (int i = 0; i < a.Length; i++)
            {
                q[i] = BigInteger.DivRem(a[i], b[0], out var rem);
                if (!rem.IsZero) return false;
            }
            quotient = q;
            return true;
        }
        // Cheap necessary condition: the constant terms.
        if (!b[0].IsZero && !BigInteger.Remainder(a[0], b[0]).IsZero) return false;
        int lq = a.Length - b.Length + 1;
        var bound = (BigInteger.One << (lq - 1)) * Norm2Ceiling(a);
        var target = 2 * bound + 1;
        var acc = new MultiModular(lq);
        for (int i = 0; ; i++)
        {
            ulong p = Primes.Large(i);
            if (Residue(b[^1], p) == 0) continue;
            var ctx = PolyModContext.For(new PrimeField(p));
            var (qp, rp) = PolyMod.DivRem(ctx, Reduce(a, p), Reduce(b, p));
            if (rp.Length != 0) return false;
            acc.Add(p, qp);
            if (acc.Stable || acc.Modulus > target)
            {
                var c = Trim(acc.Reconstruct());
                var prod = Multiply(c, b);
                if (prod.AsSpan().SequenceEqual(a)) { quotient = c; return true; }
                if (acc.Modulus > target) return false;
            }
        }
    }

    // ------------------------------------------------------------------ gcd

    /// <summary>The primitive gcd (positive leading coefficient) of two non-zero primitive integer
    /// polynomials, by Brown's dense modular algorithm with exact verification.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static BigInteger[] GcdPrimitive(BigInteger[] a, BigInteger[] b)
    {
        if (a.Length == 1 || b.Length == 1) return [BigInteger.One];
        var gamma = BigInteger.GreatestCommonDivisor(a[^1], b[^1]);
        // Landau–Mignotte: every factor h of a has ‖h‖∞ ≤ 2^deg h·‖a‖₂; the images are scaled by γ.
        var bound = gamma * (BigInteger.One << Math.Min(a.Length, b.Length)) * BigInteger.Min(Norm2Ceiling(a), Norm2Ceiling(b));
        var target = 2 * bound + 1;
        MultiModular? acc = null;
        int degree = int.MaxValue;
        for (int i = 0; ; i++)
        {
            ulong p = Primes.Large(i);
            if (Residue(a[^1], p) == 0 || Residue(b[^1], p) == 0) continue;
            var ctx = PolyModContext.For(new PrimeField(p));
            var g = PolyMod.Gcd(ctx, Reduce(a, p), Reduce(b, p));
            int d = g.Length - 1;
            if (d == 0) return [BigInteger.One];
            if (d > degree) continue;                        // unlucky prime
            if (d < degree) { degree = d; acc = new MultiModular(d + 1); }
            var scaled = PolyMod.Scale(ctx.Mod, g, Residue(gamma, p));
            acc!.Add(p, scaled);
            if (acc.Stable || acc.Modulus > target)
            {
                var h = PrimitivePositive(Trim(acc.Reconstruct()));
                if (h.Length == degree + 1 && TryDivideExact(a, h, out _) && TryDivideExact(b, h, out _)) return h;
                // Past the bound a failed check means every prime so far was unlucky (finitely many exist):
                // keep going; a prime giving a lower degree restarts the accumulation.
                if (acc.Count > 4096)
                    throw new InvalidOperationException("modular gcd did not converge (internal error)");
            }
        }
    }

    /// <summary>The primitive part with positive leading coefficient.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static BigInteger[] PrimitivePositive(BigInteger[] a)
    {
        if (a.Length == 0) return a;
        var c = Content(a);
        if (a[^1].Sign < 0) c = -c;
        return c.IsOne ? a : DivideScalar(a, c);
    }

    // ------------------------------------------------------------------ resultant

    /// <summary>res(a, b) of non-zero integer polynomials: images modulo primes not dividing either
    /// leading coefficient, combined beyond twice the Hadamard bound ‖a‖₂^deg b·‖b‖₂^deg a.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static BigInteger Resultant(BigInteger[] a, BigInteger[] b)
    {
        if (a.Length == 0 || b.Length == 0) return BigInteger.Zero;
        int da = a.Length - 1, db = b.Length - 1;
        if (da == 0) return BigInteger.Pow(a[0], db);
        if (db == 0) return BigInteger.Pow(b[0], da);
        var bound = BigInteger.Pow(Norm2Ceiling(a), db) * BigInteger.Pow(Norm2Ceiling(b), da);
        var target = 2 * bound + 1;
        var acc = new MultiModular(1);
        for (int i = 0; acc.Modulus <= target; i++)
        {
            ulong p = Primes.Large(i);
            if (Residue(a[^1], p) == 0 || Residue(b[^1], p) == 0) continue;
            var ctx = PolyModContext.For(new PrimeField(p));
            ulong r = PolyMod.Resultant(ctx, Reduce(a, p), Reduce(b, p));
            acc.Add(p, [r]);
        }
        return acc.Reconstruct()[0];
    }

    /// <summary>Exact evaluation of the homogenised value Σ aᵢ·uⁱ·v^(d−i) = v^d·a(u/v).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static BigInteger EvaluateHomogeneous(ReadOnlySpan<BigInteger> a, BigInteger u, BigInteger v)
    {
        if (a.IsEmpty) return BigInteger.Zero;
        var acc = a[^1];
        var vp = BigInteger.One;
        for (int i = a.Length - 2; i >= 0; i--)
        {
            vp *= v;
            acc = acc * u + a[i] * vp;
        }
        return acc;
    }
}
