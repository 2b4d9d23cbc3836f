namespace Integrable.Analyses;

/// <summary>How a period (or its absence) was established.</summary>
public enum PeriodVerification
{
    /// <summary>x_{n+p} = x_n was checked as an exact identity of rational functions in the initial values.</summary>
    Symbolic,
    /// <summary>The identity was checked at random points modulo random large primes; the report gives a
    /// bound on the probability of error from the degree bound of the iterates (Schwartz–Zippel).</summary>
    Probabilistic,
    /// <summary>No period up to the bound: for each p a point where x_{n+p} ≠ x_n (exact modulo a prime) disproves it.</summary>
    Counterexamples,
}
