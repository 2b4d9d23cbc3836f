using System.Collections.Immutable;
using System.Globalization;

namespace Integrable.Clusters;

/// <summary>Reads mutation sequences typed by a user: 1-based directions separated by commas and/or
/// spaces, optionally in brackets, e.g. <c>1 2 3</c>, <c>1,3,2</c> or <c>[2, 1, 2]</c>.</summary>
/// <remarks>The directions are applied first to last (the first number is the first mutation). Their
/// range is checked against a matrix when they are used, e.g. by <see cref="ExchangeMatrix.Mutate(IEnumerable{int})"/>.</remarks>
/// <example><code>
/// var dirs = MutationSequence.Parse("1, 3, 2");          // [1, 3, 2]
/// var b = ExchangeMatrix.FiniteType("A3").Mutate(dirs);  // μ_2 μ_3 μ_1 (first 1, then 3, then 2)
/// </code></example>
public static class MutationSequence
{
    /// <summary>Parses a mutation sequence.</summary>
    /// <param name="text">The text; empty or blank text (or <c>[]</c>) is the empty sequence.</param>
    /// <returns>The 1-based directions in order.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="text"/> is null.</exception>
    /// <exception cref="ClusterFormatException">A token is not a positive integer, or brackets do not match;
    /// the exception gives the position.</exception>
    public static ImmutableArray<int> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var result = ImmutableArray.CreateBuilder<int>();
        int pos = 0;
        void SkipSpace() { while (pos < text.Length && char.IsWhiteSpace(text[pos])) pos++; }
        SkipSpace();
        char close = '\0';
        if (pos < text.Length && (text[pos] == '[' || text[pos] == '('))
        {
            close = text[pos] == '[' ? ']' : ')';
            pos++;
        }
        bool expectNumber = false;   // true right after a comma
        while (true)
        {
            SkipSpace();
            if (pos >= text.Length || text[pos] == close)
            {
                if (expectNumber) throw new ClusterFormatException(text, pos, "expected a direction after ','");
                break;
            }
            int start = pos;
            while (pos < text.Length && char.IsAsciiDigit(text[pos])) pos++;
            if (pos == start)
                throw new ClusterFormatException(text, pos, $"expected a positive integer direction, found '{text[pos]}'");
            if (!int.TryParse(text.AsSpan(start, pos - start), NumberStyles.None, CultureInfo.InvariantCulture, out int k) || k < 1)
                throw new ClusterFormatException(text, start, $"direction '{text[start..pos]}' is not a positive 32-bit integer (directions start at 1)");
            result.Add(k);
            SkipSpace();
            expectNumber = false;
            if (pos < text.Length && text[pos] == ',') { pos++; expectNumber = true; }
        }
        if (close != '\0')
        {
            if (pos >= text.Length) throw new ClusterFormatException(text, pos, $"expected '{close}' to close the sequence");
            pos++;
            SkipSpace();
        }
        if (pos < text.Length) throw new ClusterFormatException(text, pos, $"unexpected '{text[pos]}' after the sequence");
        return result.ToImmutable();
    }
}
