using System.Collections.Immutable;
using System.Numerics;
using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Recursions;

public sealed partial class QSystem
{
    /// <summary>The dimensions of the fundamental Kirillov–Reshetikhin modules W^{(a)}_1, a = 1, …, r, for
    /// the classical types and G_2 in Bourbaki numbering (the initial data Q_{a,1} of the dimension solution).</summary>
    /// <returns>dim W^{(1)}_1, …, dim W^{(r)}_1.</returns>
    /// <remarks>As modules of the simple Lie algebra (Chari, On the fermionic formula and the
    /// Kirillov–Reshetikhin conjecture, 2001; Hatayama–Kuniba–Okado–Takagi–Yamada 1999):
    /// A_r: V(ω_a), of dimension C(r+1, a);
    /// B_r: V(ω_a) ⊕ V(ω_{a−2}) ⊕ … for a &lt; r with V(ω_b) = Λ^b of the vector representation, and the spin
    /// representation V(ω_r) of dimension 2^r;
    /// C_r: V(ω_a), of dimension C(2r, a) − C(2r, a − 2);
    /// D_r: V(ω_a) ⊕ V(ω_{a−2}) ⊕ … for a ≤ r − 2, and the half-spin representations (2^{r−1}) at a = r − 1, r;
    /// G_2 (α_1 short): V(ω_1) = 7 and V(ω_2) ⊕ V(0) = 14 + 1.</remarks>
    /// <exception cref="NotSupportedException">The type is E or F, or the Cartan matrix is not numbered as
    /// in Bourbaki (<see cref="TypeName"/> is null); give Q_{a,1} explicitly to <see cref="Solve{T}"/>.</exception>
    public ImmutableArray<BigInteger> FundamentalKirillovReshetikhinDimensions()
    {
        if (TypeName is null)
            throw new NotSupportedException("the Cartan matrix is not a finite type in Bourbaki numbering, so the Kirillov–Reshetikhin dimensions are not tabulated; give Q_{a,1} explicitly");
        char family = TypeName[0];
        int r = Rank;
        var dims = new BigInteger[r];
        for (int a = 1; a <= r; a++)
        {
            dims[a - 1] = family switch
            {
                'A' => Binomial(r + 1, a),
                'B' => a < r ? AlternatingSum(2 * r + 1, a) : BigInteger.Pow(2, r),
                'C' => Binomial(2 * r, a) - Binomial(2 * r, a - 2),
                'D' => a <= r - 2 ? AlternatingSum(2 * r, a) : BigInteger.Pow(2, r - 1),
                'G' => a == 1 ? 7 : 15,
                _ => throw new NotSupportedException(
                    $"the dimensions of the Kirillov–Reshetikhin modules W^(a)_1 of type {TypeName} are not tabulated; give Q_{{a,1}} explicitly"),
            };
        }
        return ImmutableArray.Create(dims);
    }

    /// <summary>The dimension solution Q_{a,n} = dim W^{(a)}_n of the Kirillov–Reshetikhin Q-system from
    /// Q_{a,0} = 1 and Q_{a,1} = <see cref="FundamentalKirillovReshetikhinDimensions"/> (the minus sign is
    /// used whatever <see cref="Convention"/> is).</summary>
    /// <returns>The solution over Q (all values are integers).</returns>
    /// <exception cref="NotSupportedException">See <see cref="FundamentalKirillovReshetikhinDimensions"/>.</exception>
    public QSystemSolution<Rational> KirillovReshetikhinDimensions()
    {
        var level1 = FundamentalKirillovReshetikhinDimensions().Select(v => new Rational(v)).ToList();
        return WithConvention(QSystemConvention.KirillovReshetikhin)
            .Solve(RationalField.Instance, Enumerable.Repeat(Rational.One, Rank).ToList(), level1);
    }

    /// <summary>C(n, k) + C(n, k − 2) + C(n, k − 4) + … (dimensions of Λ^k ⊕ Λ^{k−2} ⊕ …).</summary>
    private static BigInteger AlternatingSum(int n, int k)
    {
        var s = BigInteger.Zero;
        for (int j = k; j >= 0; j -= 2) s += Binomial(n, j);
        return s;
    }

    private static BigInteger Binomial(int n, int k)
    {
        if (k < 0 || k > n) return BigInteger.Zero;
        var b = BigInteger.One;
        for (int i = 1; i <= k; i++) b = b * (n - k + i) / i;
        return b;
    }
}
