using Integrable.Numbers;

namespace Integrable.LinearAlgebra;

/// <summary>Which exact elimination runs over Q.</summary>
internal enum EliminationMethod
{
    /// <summary>Chosen by the dispatcher from the shape and entry sizes.</summary>
    Auto,

    /// <summary>Images modulo word-size primes, Chinese remaindering, rational reconstruction, exact check.</summary>
    Multimodular,

    /// <summary>Fraction-free (Bareiss) elimination over Z.</summary>
    FractionFree,
}

/// <summary>Internal knobs of the exact elimination over Q, for tests and benchmarks (forcing a method,
/// injecting the prime sequence to provoke unlucky primes, capping the number of primes).</summary>
internal sealed class EliminationOptions
{
    public static EliminationOptions Default { get; } = new();

    /// <summary>The i-th prime to use; null (the default) lets the elimination choose between
    /// <see cref="Primes.Large"/> and the half-word primes by the size of the matrix.</summary>
    public Func<int, ulong>? PrimeSequence { get; init; }

    public EliminationMethod Method { get; init; } = EliminationMethod.Auto;

    /// <summary>Most primes the multimodular method may use before it falls back to fraction-free
    /// elimination; null means the number that the Hadamard bound guarantees, plus a margin for unlucky primes.</summary>
    public int? PrimeLimit { get; init; }

    /// <summary>When set, records what happened.</summary>
    public EliminationDiagnostics? Diagnostics { get; init; }
}

/// <summary>What an exact elimination did (filled in when passed through <see cref="EliminationOptions"/>).</summary>
internal sealed class EliminationDiagnostics
{
    public EliminationMethod MethodUsed { get; set; }
    public int PrimesUsed { get; set; }
    public int UnluckyPrimes { get; set; }
    public int ReconstructionFailures { get; set; }
    public int Verifications { get; set; }
    public int VerificationFailures { get; set; }
    public bool FellBackToFractionFree { get; set; }
    public TimeSpan ClearingTime { get; set; }
    public TimeSpan ModularTime { get; set; }
    public TimeSpan ReconstructionTime { get; set; }
    public TimeSpan VerificationTime { get; set; }

    public override string ToString() =>
        $"method={MethodUsed} primes={PrimesUsed} unlucky={UnluckyPrimes} reconFail={ReconstructionFailures} verifications={Verifications} " +
        $"verifyFail={VerificationFailures} fallback={FellBackToFractionFree} clear={ClearingTime.TotalMilliseconds:F2}ms " +
        $"modular={ModularTime.TotalMilliseconds:F2}ms recon={ReconstructionTime.TotalMilliseconds:F2}ms verify={VerificationTime.TotalMilliseconds:F2}ms";
}
