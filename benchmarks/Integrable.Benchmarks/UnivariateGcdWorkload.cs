using Integrable.Univariate;

namespace Integrable.Benchmarks;

/// <summary>Gcd of two random dense polynomials of degrees d and d − 1 over Z/pZ (coprime: the full
/// remainder sequence), by half-GCD (<c>-- UniGcd d [p|large] [reps]</c>).</summary>
public sealed class UnivariateGcdWorkload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "UniGcd";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        var (d, f, reps) = UnivariateWorkloadSupport.Parse(args, 10000);
        var a = UnivariateWorkloadSupport.Random(f, d, 3);
        var b = UnivariateWorkloadSupport.Random(f, d - 1, 4);
        PolynomialModP g = a;
        var (wall, cpu) = UnivariateWorkloadSupport.Measure(reps, () => g = PolynomialModP.Gcd(a, b));
        return $"degree={d} seconds={Timing.Seconds(wall)} cpu={Timing.Seconds(cpu)} p={f.Modulus} gcddeg={g.Degree} reps={reps}";
    }
}
