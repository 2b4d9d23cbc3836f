namespace Integrable.Guessing;

/// <summary>The outcome of guessing a structure (recurrence, rational function, polynomial relation) from
/// finitely many terms, with the evidence: how many terms determined it and how many more confirmed it.</summary>
/// <typeparam name="TValue">The kind of structure guessed.</typeparam>
/// <remarks>A guess is returned as found only when (a) it was checked exactly against every term supplied,
/// and (b) at least <see cref="MinimumConfirmations"/> terms beyond the <see cref="TermsUsed"/> that
/// determined it agree with it (<see cref="TermsConfirmed"/>). A found guess is evidence, not proof: a
/// sequence can follow a pattern for any finite number of terms.</remarks>
/// <example><code>
/// var g = BerlekampMassey.Find(fibonacci);
/// if (g.IsFound) Console.WriteLine($"{g.Value} (used {g.TermsUsed}, confirmed by {g.TermsConfirmed})");
/// </code></example>
public sealed class GuessResult<TValue> where TValue : class
{
    private readonly TValue? _value;

    internal GuessResult(TValue? value, bool found, int termsUsed, int termsConfirmed, int minimumConfirmations, string explanation)
    {
        _value = value;
        IsFound = found;
        TermsUsed = termsUsed;
        TermsConfirmed = termsConfirmed;
        MinimumConfirmations = minimumConfirmations;
        Explanation = explanation;
    }

    internal static GuessResult<TValue> NotFound(int termsUsed, int termsConfirmed, int minimumConfirmations, string explanation) =>
        new(null, false, termsUsed, termsConfirmed, minimumConfirmations, explanation);

    internal static GuessResult<TValue> Judge(TValue candidate, int termsUsed, int totalTerms, int minimumConfirmations, string what)
    {
        int confirmed = Math.Max(0, totalTerms - termsUsed);
        if (confirmed < minimumConfirmations)
            return new(candidate, false, termsUsed, confirmed, minimumConfirmations,
                $"{what} fits all {totalTerms} terms but is determined by {termsUsed} of them, leaving {confirmed} confirmations (at least {minimumConfirmations} required): supply more terms");
        return new(candidate, true, termsUsed, confirmed, minimumConfirmations,
            $"{what} determined by {termsUsed} terms and confirmed by {confirmed} more");
    }

    /// <summary>True when the guess was confirmed by at least <see cref="MinimumConfirmations"/> extra terms.</summary>
    public bool IsFound { get; }

    /// <summary>The guessed structure.</summary>
    /// <exception cref="InvalidOperationException">Nothing was found (see <see cref="Explanation"/>).</exception>
    public TValue Value => IsFound ? _value! : throw new InvalidOperationException($"no guess was found: {Explanation}");

    /// <summary>The best candidate even when it is not confirmed enough (null when there is none).</summary>
    public TValue? Candidate => _value;

    /// <summary>The number of leading terms that determined the guess.</summary>
    public int TermsUsed { get; }

    /// <summary>The number of further terms that the guess was checked against and agreed with.</summary>
    public int TermsConfirmed { get; }

    /// <summary>The confirmations that were required.</summary>
    public int MinimumConfirmations { get; }

    /// <summary>What was found or why nothing was.</summary>
    public string Explanation { get; }

    /// <inheritdoc/>
    public override string ToString() => IsFound ? $"found: {_value} ({Explanation})" : $"not found: {Explanation}";
}
