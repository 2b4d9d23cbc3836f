using System.Numerics;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Tests.LinearAlgebra;

/// <summary>Naive textbook algorithms used as independent references (common practice: Gauss–Jordan
/// elimination with exact rationals, the Leibniz formula, Gauss–Jordan over Z/pZ).</summary>
internal static class ReferenceLinearAlgebra
{
    /// <summary>Gauss–Jordan over Q: the reduced row echelon form and the pivot columns.</summary>
    public static (Rational[,] Rref, List<int> Pivots) GaussJordan(RationalMatrix a)
    {
        int m = a.RowCount, n = a.ColumnCount;
        var x = a.ToArray();
        var pivots = new List<int>();
        int r = 0;
        for (int j = 0; j < n && r < m; j++)
        {
            int p = -1;
            for (int i = r; i < m; i++) if (!x[i, j].IsZero) { p = i; break; }
            if (p < 0) continue;
            for (int l = 0; l < n; l++) (x[r, l], x[p, l]) = (x[p, l], x[r, l]);
            var inv = 1 / x[r, j];
            for (int l = 0; l < n; l++) x[r, l] *= inv;
            for (int i = 0; i < m; i++)
            {
                if (i == r || x[i, j].IsZero) continue;
                var f = x[i, j];
                for (int l = 0; l < n; l++) x[i, l] -= f * x[r, l];
            }
            pivots.Add(j);
            r++;
        }
        return (x, pivots);
    }

    /// <summary>Determinant by the Leibniz formula (sum over all permutations).</summary>
    public static Rational Leibniz(RationalMatrix a)
    {
        int n = a.RowCount;
        var perm = Enumerable.Range(0, n).ToArray();
        Rational total = 0;
        Permute(0);
        return total;

        void Permute(int k)
        {
            if (k == n)
            {
                Rational t = Sign(perm);
                for (int i = 0; i < n && !t.IsZero; i++) t *= a[i, perm[i]];
                total += t;
                return;
            }
            for (int i = k; i < n; i++)
            {
                (perm[k], perm[i]) = (perm[i], perm[k]);
                Permute(k + 1);
                (perm[k], perm[i]) = (perm[i], perm[k]);
            }
        }
    }

    private static int Sign(int[] perm)
    {
        int s = 1;
        for (int i = 0; i < perm.Length; i++)
            for (int j = i + 1; j < perm.Length; j++)
                if (perm[i] > perm[j]) s = -s;
        return s;
    }

    /// <summary>Gauss–Jordan over Z/pZ with BigInteger arithmetic.</summary>
    public static (ulong[,] Rref, List<int> Pivots) GaussJordan(ModularMatrix a)
    {
        int m = a.RowCount, n = a.ColumnCount;
        BigInteger p = a.Field.Modulus;
        var x = new BigInteger[m, n];
        for (int i = 0; i < m; i++) for (int j = 0; j < n; j++) x[i, j] = a[i, j];
        var pivots = new List<int>();
        int r = 0;
        for (int j = 0; j < n && r < m; j++)
        {
            int q = -1;
            for (int i = r; i < m; i++) if (!x[i, j].IsZero) { q = i; break; }
            if (q < 0) continue;
            for (int l = 0; l < n; l++) (x[r, l], x[q, l]) = (x[q, l], x[r, l]);
            var inv = BigInteger.ModPow(x[r, j], p - 2, p);
            for (int l = 0; l < n; l++) x[r, l] = x[r, l] * inv % p;
            for (int i = 0; i < m; i++)
            {
                if (i == r || x[i, j].IsZero) continue;
                var f = x[i, j];
                for (int l = 0; l < n; l++) x[i, l] = (((x[i, l] - f * x[r, l]) % p) + p) % p;
            }
            pivots.Add(j);
            r++;
        }
        var res = new ulong[m, n];
        for (int i = 0; i < m; i++) for (int j = 0; j < n; j++) res[i, j] = (ulong)x[i, j];
        return (res, pivots);
    }

    /// <summary>A random integer matrix with entries in [−bound, bound].</summary>
    public static RationalMatrix RandomInteger(Random rng, int rows, int cols, long bound) =>
        RationalMatrix.Create(rows, cols, (_, _) => rng.NextInt64(-bound, bound + 1));

    /// <summary>A random rational matrix with small numerators and denominators.</summary>
    public static RationalMatrix RandomRational(Random rng, int rows, int cols, long bound) =>
        RationalMatrix.Create(rows, cols, (_, _) => new Rational(rng.NextInt64(-bound, bound + 1), rng.NextInt64(1, bound + 1)));

    /// <summary>A random matrix of rank at most <paramref name="rank"/>: a product of random rows × rank and rank × cols matrices.</summary>
    public static RationalMatrix RandomOfRank(Random rng, int rows, int cols, int rank, long bound) =>
        RandomInteger(rng, rows, rank, bound) * RandomInteger(rng, rank, cols, bound);

    /// <summary>A random matrix with entries beyond 64 bits.</summary>
    public static RationalMatrix RandomHuge(Random rng, int rows, int cols, int bits)
    {
        return RationalMatrix.Create(rows, cols, (_, _) =>
        {
            var bytes = new byte[bits / 8 + 1];
            rng.NextBytes(bytes);
            bytes[^1] &= 0x7F;
            var v = new BigInteger(bytes);
            return rng.Next(2) == 0 ? new Rational(v) : new Rational(-v);
        });
    }

    public static RationalMatrix ToMatrix(Rational[,] a) => RationalMatrix.FromArray(a);
}
