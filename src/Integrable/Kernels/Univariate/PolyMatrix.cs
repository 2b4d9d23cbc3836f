using System.Runtime.CompilerServices;
namespace Integrable.Kernels.Univariate;

/// <summary>A 2×2 matrix of dense polynomials over Z/pZ (trimmed arrays), the transition matrix of a
/// run of Euclidean steps: (a', b')ᵀ = M·(a, b)ᵀ.</summary>
internal sealed class PolyMatrix
{
    public ulong[] M00, M01, M10, M11;

    public PolyMatrix(ulong[] m00, ulong[] m01, ulong[] m10, ulong[] m11)
    {
        M00 = m00; M01 = m01; M10 = m10; M11 = m11;
    }

    public static PolyMatrix Identity() => new([1], [], [], [1]);

    /// <summary>Largest entry length.</summary>
    public int MaxLength => Math.Max(Math.Max(M00.Length, M01.Length), Math.Max(M10.Length, M11.Length));

    /// <summary>Left-multiplies by the quotient step [[0, 1], [1, −q]] in place.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void ApplyQuotient(PolyModContext ctx, ReadOnlySpan<ulong> q)
    {
        var n0 = PolyMod.Subtract(ctx.Mod, M00, PolyMod.Multiply(ctx, q, M10));
        var n1 = PolyMod.Subtract(ctx.Mod, M01, PolyMod.Multiply(ctx, q, M11));
        M00 = M10; M01 = M11;
        M10 = n0; M11 = n1;
    }
}
