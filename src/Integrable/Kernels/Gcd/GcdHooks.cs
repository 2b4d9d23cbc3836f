namespace Integrable.Kernels.Gcd;

/// <summary>Test hooks and counters of the modular gcd (per thread). Tests put primes or evaluation
/// points here to force unlucky choices, then read the counters to see that they were detected.</summary>
internal static class GcdHooks
{
    /// <summary>Primes the integer gcd uses first (before its own supply), in order.</summary>
    [ThreadStatic] internal static Queue<ulong>? ForcedPrimes;

    /// <summary>Evaluation points the modular recursion uses first (whatever level asks first), in order.</summary>
    [ThreadStatic] internal static Queue<ulong>? ForcedPoints;

    /// <summary>Images discarded because their degree was too high (unlucky prime).</summary>
    [ThreadStatic] internal static int UnluckyPrimes;

    /// <summary>Images discarded because their degree was too high (unlucky evaluation point).</summary>
    [ThreadStatic] internal static int UnluckyPoints;

    /// <summary>Interpolations or Chinese remaindering restarted because a lower degree appeared.</summary>
    [ThreadStatic] internal static int Restarts;

    /// <summary>Candidates that failed the exact verification and made the algorithm continue.</summary>
    [ThreadStatic] internal static int FailedVerifications;

    /// <summary>Calls of the modular recursion (all levels), for cost diagnostics.</summary>
    [ThreadStatic] internal static long ImageCount;

    /// <summary>Time spent per phase (Stopwatch ticks): 0 bounds, 1 reduce, 2 modular images, 3 remaindering, 4 verification.</summary>
    [ThreadStatic] internal static long[]? PhaseTicksStore;

    internal static long[] PhaseTicks => PhaseTicksStore ??= new long[5];

    /// <summary>Number of primes used by the last integer gcd.</summary>
    [ThreadStatic] internal static int PrimesUsed;

    /// <summary>Forces the algorithm of the integer gcd (null = let the dispatcher choose).</summary>
    [ThreadStatic] internal static GcdAlgorithm? ForceAlgorithm;

    /// <summary>Clears the hooks and counters of the current thread.</summary>
    internal static void Reset()
    {
        ForcedPrimes = null;
        ForcedPoints = null;
        UnluckyPrimes = UnluckyPoints = Restarts = FailedVerifications = PrimesUsed = 0;
        ImageCount = 0;
        PhaseTicksStore = null;
        ForceAlgorithm = null;
    }
}

/// <summary>Variants of the modular gcd.</summary>
internal enum GcdAlgorithm
{
    /// <summary>Brown's algorithm interpolating the gcd and both cofactors; degree-based termination,
    /// verification by multiplying back.</summary>
    BrownCofactors,
    /// <summary>Brown's algorithm interpolating the gcd only; termination when the interpolant stops
    /// changing, verification by exact division.</summary>
    BrownGcdOnly,
    /// <summary>Zippel's sparse interpolation of the gcd (three or more variables); verification by
    /// exact division.</summary>
    Zippel,
}
