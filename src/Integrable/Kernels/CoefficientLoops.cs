using System.Runtime.CompilerServices;

namespace Integrable.Kernels;

/// <summary>The plain row and block loops of the dense kernels, written once over any
/// <see cref="ICoefficientOps{TCoef, TAcc}"/>; coefficient families whose loops need nothing special
/// (wide accumulators, multi-limb and big-integer coefficients) delegate to these.</summary>
internal static class CoefficientLoops
{
    /// <summary>dest[off_j] += a·b_j for j &lt; count (offsets in bytes).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAddRow<TOps, TC, TAcc>(ref TAcc dest, TC a, ref TC b, ref nint off, int count)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        for (int j = 0; j < count; j++)
            TOps.MulAdd(ref Unsafe.AddByteOffset(ref dest, Unsafe.Add(ref off, j)), a, Unsafe.Add(ref b, j));
    }

    /// <summary>buf[la_i + lb_j] −= a_i·b_j for every i &lt; na, j &lt; nb.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void MulSubBlock<TOps, TC, TAcc>(ref TAcc buf, ref TC a, ref int la, int na, ref TC b, ref int lb, int nb)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        for (int i = 0; i < na; i++)
        {
            ref TAcc row = ref Unsafe.Add(ref buf, Unsafe.Add(ref la, i));
            var ai = Unsafe.Add(ref a, i);
            for (int j = 0; j < nb; j++)
                TOps.MulSub(ref Unsafe.Add(ref row, Unsafe.Add(ref lb, j)), ai, Unsafe.Add(ref b, j));
        }
    }

    /// <summary>buf[la_i + lb_j] += a_i·b_j for every i &lt; na, j &lt; nb (lb in bytes).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void MulAddBlock<TOps, TC, TAcc>(ref TAcc buf, ref TC a, ref int la, int na, ref TC b, ref nint lb, int nb)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        for (int i = 0; i < na; i++)
            MulAddRow<TOps, TC, TAcc>(ref Unsafe.Add(ref buf, Unsafe.Add(ref la, i)), Unsafe.Add(ref a, i), ref b, ref lb, nb);
    }
}
