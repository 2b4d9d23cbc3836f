using System.Runtime.CompilerServices;

namespace Integrable.Kernels;

/// <summary>Exponent ranges of two operands and the degree box of their product.</summary>
internal readonly struct ProductShape
{
    public readonly int Nvars, CountA, CountB;
    public readonly int[] MinA, MinB;
    public readonly long[] Radix;
    /// <summary>Number of cells of the product's degree box (saturates at long.MaxValue).</summary>
    public readonly long Box;

    public ProductShape(ReadOnlySpan<int> ea, ReadOnlySpan<int> eb, int countA, int countB, int nvars)
    {
        Nvars = nvars; CountA = countA; CountB = countB;
        MinMax(ea, nvars, out MinA, out var maxA);
        MinMax(eb, nvars, out MinB, out var maxB);
        Radix = new long[nvars];
        long box = 1;
        for (int v = 0; v < nvars; v++)
        {
            long lo = (long)MinA[v] + MinB[v], hi = (long)maxA[v] + maxB[v];
            if (lo < int.MinValue || hi > int.MaxValue)
                throw new OverflowException($"Product exponent of variable #{v} leaves the 32-bit range.");
            Radix[v] = hi - lo + 1;
            box = box > long.MaxValue / Radix[v] ? long.MaxValue : box * Radix[v];
        }
        Box = box;
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void MinMax(ReadOnlySpan<int> e, int n, out int[] min, out int[] max)
    {
        min = new int[n];
        max = new int[n];
        min.AsSpan().Fill(int.MaxValue);
        max.AsSpan().Fill(int.MinValue);
        for (int t = 0; t < e.Length; t += n)
            for (int v = 0; v < n; v++)
            {
                int x = e[t + v];
                if (x < min[v]) min[v] = x;
                if (x > max[v]) max[v] = x;
            }
    }
}
