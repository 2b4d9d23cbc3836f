namespace Integrable.Guessing;

/// <summary>Defaults shared by the guessing procedures.</summary>
/// <example><code>
/// var g = BerlekampMassey.Find(terms, minimumConfirmations: GuessDefaults.MinimumConfirmations + 5);
/// </code></example>
public static class GuessDefaults
{
    /// <summary>The number of extra terms that must confirm a guess, beyond the terms that determined it,
    /// before it is returned as found (5). A sequence of N terms therefore reveals a linear recurrence of
    /// order at most (N − 5)/2, or a relation with at most N − 5 unknown coefficients.</summary>
    public const int MinimumConfirmations = 5;
}
