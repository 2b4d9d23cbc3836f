namespace Integrable.Tests.Hardening;

/// <summary>Iteration counts for the randomized suites. CI runs the base counts; a long run sets
/// <c>INTEGRABLE_FUZZ_MULTIPLIER</c> (an integer ≥ 1) to multiply every count, e.g.
/// <c>INTEGRABLE_FUZZ_MULTIPLIER=20 dotnet test … --filter Hardening</c>. Every failure report carries the
/// CsCheck seed, so a failing input can be replayed with <c>seed:</c>.</summary>
internal static class FuzzSettings
{
    /// <summary>The multiplier read from the environment (1 when unset or malformed).</summary>
    public static int Multiplier { get; } =
        int.TryParse(Environment.GetEnvironmentVariable("INTEGRABLE_FUZZ_MULTIPLIER"), out int m) && m >= 1 ? m : 1;

    /// <summary>The iteration count for a suite whose CI count is <paramref name="baseCount"/>.</summary>
    public static int Iterations(int baseCount) => checked(baseCount * Multiplier);
}
