using CsCheck;
using Integrable.Clusters;

namespace Integrable.Tests.Clusters;

/// <summary>Random skew-symmetrizable exchange matrices for property tests: B = S·diag(d) with S
/// skew-symmetric, so d_i b_ij = d_i d_j S_ij = −d_j b_ji; frozen rows are arbitrary.</summary>
internal static class ClusterGenerators
{
    public static readonly Gen<ExchangeMatrix> Matrix =
        from n in Gen.Int[1, 6]
        from m in Gen.Int[0, 3]
        from d in Gen.Int[1, 3].Array[n]
        from upper in Gen.Int[-3, 3].Array[n * n]
        from frozen in Gen.Int[-3, 3].Array[m * n]
        select Build(n, m, d, upper, frozen);

    public static readonly Gen<ExchangeMatrix> SkewSymmetric =
        from n in Gen.Int[1, 6]
        from m in Gen.Int[0, 3]
        from upper in Gen.Int[-3, 3].Array[n * n]
        from frozen in Gen.Int[-3, 3].Array[m * n]
        select Build(n, m, Enumerable.Repeat(1, n).ToArray(), upper, frozen);

    private static ExchangeMatrix Build(int n, int m, int[] d, int[] upper, int[] frozen)
    {
        var b = new int[(n + m) * n];
        for (int i = 0; i < n; i++)
            for (int j = i + 1; j < n; j++)
            {
                int s = upper[i * n + j];
                b[i * n + j] = s * d[j];
                b[j * n + i] = -s * d[i];
            }
        Array.Copy(frozen, 0, b, n * n, m * n);
        return ExchangeMatrix.FromRows(n, m, b);
    }
}
