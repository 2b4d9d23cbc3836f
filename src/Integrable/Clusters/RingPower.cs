using Integrable.Algebra;

namespace Integrable.Clusters;

/// <summary>Small helpers over an <see cref="IRing{T}"/> used by exchange relations.</summary>
internal static class RingPower
{
    /// <summary>x^e for e ≥ 0 by repeated squaring.</summary>
    public static T Pow<T>(IRing<T> ring, T x, int e)
    {
        if (e == 1) return x;
        T result = ring.One;
        while (e > 0)
        {
            if ((e & 1) != 0) result = ring.Multiply(result, x);
            e >>= 1;
            if (e > 0) x = ring.Multiply(x, x);
        }
        return result;
    }

    /// <summary>The right-hand side Π x_i^[b_ik]₊ + Π x_i^[−b_ik]₊ of the exchange relation in the
    /// 0-based direction <paramref name="k"/> of the row-major matrix <paramref name="b"/> with
    /// <paramref name="n"/> columns, where x_i = <paramref name="variable"/>(i).</summary>
    public static T ExchangeSum<T>(IRing<T> ring, ReadOnlySpan<int> b, int n, int k, Func<int, T> variable)
    {
        int rows = b.Length / n;
        T plus = ring.One, minus = ring.One;
        bool plusSet = false, minusSet = false;
        for (int i = 0; i < rows; i++)
        {
            int e = b[i * n + k];
            if (e == 0) continue;
            if (e > 0)
            {
                var f = Pow(ring, variable(i), e);
                plus = plusSet ? ring.Multiply(plus, f) : f;
                plusSet = true;
            }
            else
            {
                var f = Pow(ring, variable(i), -e);
                minus = minusSet ? ring.Multiply(minus, f) : f;
                minusSet = true;
            }
        }
        return ring.Add(plus, minus);
    }
}
