using System.Runtime.CompilerServices;
using System.Numerics;

namespace Integrable.Kernels.Univariate;

internal static partial class PolyMod
{
    /// <summary>base^e mod m (m of degree ≥ 1, trimmed) by square and multiply; the reversed reciprocal
    /// of m is computed once when Newton division pays off.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] PowMod(PolyModContext ctx, ulong[] b, BigInteger e, ulong[] m)
    {
        if (m.Length == 0) throw new DivideByZeroException("reduction modulo the zero polynomial");
        if (e.Sign < 0) throw new ArgumentOutOfRangeException(nameof(e), "negative exponent");
        var red = new PolyReducer(ctx, m);
        var result = red.Reduce([1]);
        var x = red.Reduce(b);
        long bits = (long)e.GetBitLength();
        for (long i = bits - 1; i >= 0; i--)
        {
            result = red.Reduce(Square(ctx, result));
            if (!(e >> (int)i).IsEven) result = red.Reduce(Multiply(ctx, result, x));
        }
        return result;
    }

    /// <summary>The distinct roots of f in Z/pZ, sorted (f non-zero). Uses gcd(f, x^p − x) and
    /// Cantor–Zassenhaus splitting gcd(g, (x + δ)^((p−1)/2) − 1) with a fixed-seed generator.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Roots(PolyModContext ctx, ulong[] f)
    {
        var mod = ctx.Mod;
        ulong p = mod.P;
        if (f.Length == 0) throw new ArgumentException("the zero polynomial has every element as a root", nameof(f));
        if (f.Length == 1) return [];
        if (p == 2)
        {
            var r2 = new List<ulong>();
            if (Evaluate(mod, f, 0) == 0) r2.Add(0);
            if (Evaluate(mod, f, 1) == 0) r2.Add(1);
            return r2.ToArray();
        }
        f = MakeMonic(mod, f);
        // g = gcd(f, x^p − x): the product of (x − r) over the distinct roots r.
        var xp = PowMod(ctx, [0, 1], p, f);
        var h = Subtract(mod, xp, [0, 1]);
        var g = Gcd(ctx, f, h);
        var roots = new List<ulong>();
        var rng = new Random(12345);
        SplitLinear(ctx, g, rng, roots);
        roots.Sort();
        return roots.ToArray();
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void SplitLinear(PolyModContext ctx, ulong[] g, Random rng, List<ulong> roots)
    {
        var mod = ctx.Mod;
        if (g.Length <= 1) return;
        if (g.Length == 2)
        {
            roots.Add(mod.Neg(mod.Mul(g[0], mod.Inverse(g[1]))));
            return;
        }
        ulong p = mod.P;
        while (true)
        {
            ulong delta = (ulong)rng.NextInt64(0, (long)Math.Min(p, (ulong)long.MaxValue));
            var w = PowMod(ctx, [delta % p, 1], (p - 1) / 2, g);
            var u = Subtract(mod, w, [1]);
            var d = Gcd(ctx, g, u);
            if (d.Length > 1 && d.Length < g.Length)
            {
                SplitLinear(ctx, d, rng, roots);
                SplitLinear(ctx, DivRem(ctx, g, d).Quotient, rng, roots);
                return;
            }
        }
    }
}
