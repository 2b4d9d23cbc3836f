using Integrable.Univariate;

namespace Integrable.Benchmarks;

/// <summary>Dense product of two random polynomials of degree d over Z/pZ (<c>-- UniMul d [p|large] [reps]</c>).</summary>
public sealed class UnivariateMulWorkload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "UniMul";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        var (d, f, reps) = UnivariateWorkloadSupport.Parse(args, 10000);
        var a = UnivariateWorkloadSupport.Random(f, d, 1);
        var b = UnivariateWorkloadSupport.Random(f, d, 2);
        PolynomialModP c = a;
        var (wall, cpu) = UnivariateWorkloadSupport.Measure(reps, () => c = a * b);
        return $"degree={d} seconds={Timing.Seconds(wall)} cpu={Timing.Seconds(cpu)} p={f.Modulus} check={c.Evaluate(12345)} reps={reps}";
    }
}
