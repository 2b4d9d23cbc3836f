namespace Integrable.Solutions;

/// <summary>One term c·n^Degree·λ^{Exponent·n} of an exponential-polynomial tau function τ_n = Σ c_i n^{d_i} λ^{e_i n}.</summary>
/// <param name="Exponent">The integer e with the term growing like λ^{e n}.</param>
/// <param name="Degree">The power of n in front (repeated roots), non-negative.</param>
public sealed record ExponentialTerm(int Exponent, int Degree = 0);
