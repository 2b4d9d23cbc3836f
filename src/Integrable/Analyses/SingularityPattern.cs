using System.Collections.Immutable;
using Integrable.Numbers;

namespace Integrable.Analyses;

/// <summary>The outcome for one singular value s: the orbit started from free initial data and
/// x = s + ε, its terms as ε-series, the singularity pattern, and whether (and where) it is confined.</summary>
/// <example><code>
/// var p = report.Singularities[0];
/// Console.WriteLine($"{{{string.Join(", ", p.Pattern.Select(e => e.Symbol))}}} confined: {p.IsConfined}");
/// </code></example>
public sealed class SingularityPattern
{
    internal SingularityPattern(Rational singularValue, ImmutableArray<SingularityEntry> terms, int patternLength, bool confined,
        bool recovers, int precision, ImmutableArray<Rational> freeData, string reason, int? cycleLength = null)
    {
        CycleLength = cycleLength;
        SingularValue = singularValue;
        Terms = terms;
        PatternLength = patternLength;
        IsConfined = confined;
        RecoversInitialData = recovers;
        Precision = precision;
        FreeData = freeData;
        Reason = reason;
    }

    /// <summary>The singular value s (the orbit starts with x = s + ε).</summary>
    public Rational SingularValue { get; }

    /// <summary>Every term computed, from the singular one on.</summary>
    public ImmutableArray<SingularityEntry> Terms { get; }

    /// <summary>The number of terms in the pattern (for a confined singularity: the terms before the orbit is regular again).</summary>
    public int PatternLength { get; }

    /// <summary>The pattern: the first <see cref="PatternLength"/> terms.</summary>
    public ImmutableArray<SingularityEntry> Pattern => Terms[..Math.Min(PatternLength, Terms.Length)];

    /// <summary>For a cyclic pattern (the orbit returns to the singular initial state, as for periodic maps): the
    /// number of steps until it does; otherwise null.</summary>
    public int? CycleLength { get; }

    /// <summary>True for a cyclic pattern (see <see cref="CycleLength"/>).</summary>
    public bool IsCyclic => CycleLength is not null;

    /// <summary>True when, after the pattern, a full state of regular terms follows that depends on the free
    /// initial data, or when the pattern is cyclic (the orbit returns to its singular initial state).</summary>
    public bool IsConfined { get; }

    /// <summary>True when the regular state after the pattern depends on the free initial data (it changes when they change).</summary>
    public bool RecoversInitialData { get; }

    /// <summary>The index of the first regular term after the pattern (for a cyclic pattern: of the term where
    /// the orbit is back at the singular state), or null when not confined.</summary>
    public long? ConfinedAt => IsConfined ? Terms[PatternLength].Index : null;

    /// <summary>The relative precision (number of ε-terms) of the series used.</summary>
    public int Precision { get; }

    /// <summary>The values given to the free initial data (the other initial values).</summary>
    public ImmutableArray<Rational> FreeData { get; }

    /// <summary>Why the singularity is or is not confined, in words.</summary>
    public string Reason { get; }

    /// <summary>The pattern as text, e.g. <c>{0, ∞^2, 0}</c>.</summary>
    public string PatternText => "{" + string.Join(", ", Pattern.Select(e => e.Symbol)) + "}";

    /// <summary>Text such as <c>x = 0 + ε: pattern {0, ∞^2, 0}, confined at x_4</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => $"x = {SingularValue} + ε: pattern {PatternText}, {Verdict}";

    internal string Verdict => IsCyclic ? $"cyclic (back at the singular state at {Terms[PatternLength].Term})"
        : IsConfined ? $"confined at {Terms[PatternLength].Term}" : "NOT confined";
}
