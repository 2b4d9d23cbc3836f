namespace Integrable.Kernels.Univariate;
internal static class Prof
{
    public static long[] T = new long[16];
    public static long[] C = new long[16];
    public static long Now => System.Diagnostics.Stopwatch.GetTimestamp();
    public static void Add(int i, long t0) { T[i] += System.Diagnostics.Stopwatch.GetTimestamp() - t0; C[i]++; }
    public static string Report() { var s = ""; for (int i = 0; i < 16; i++) if (C[i] > 0) s += $" [{i}]{T[i] / (double)System.Diagnostics.Stopwatch.Frequency:F3}s/{C[i]}"; return s; }
}
