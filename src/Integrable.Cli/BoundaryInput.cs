using System.Globalization;
using Integrable.Numbers;
using Integrable.Recursions;

namespace Integrable.Cli;

/// <summary>Reads a boundary condition such as <c>R_0=0</c> or <c>R_{-1}=1/2</c> for the series and tau commands.</summary>
internal static class BoundaryInput
{
    public static (long Index, Rational Value) Read(string text, Recurrence recurrence)
    {
        int eq = text.IndexOf('=', StringComparison.Ordinal);
        if (eq < 0) throw new CliUsageException($"--boundary expects {recurrence.Unknown}_<index>=<value>, got '{text}'");
        string left = text[..eq].Trim(), right = text[(eq + 1)..].Trim();
        string prefix = recurrence.Unknown + "_";
        if (!left.StartsWith(prefix, StringComparison.Ordinal))
            throw new CliUsageException($"--boundary: '{left}' is not a term of {recurrence.Unknown} (write {recurrence.Unknown}_0=0)");
        string idx = left[prefix.Length..].Trim();
        if (idx.StartsWith('{') && idx.EndsWith('}')) idx = idx[1..^1].Trim();
        if (!long.TryParse(idx, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out long index) || Math.Abs(index) > 1_000_000)
            throw new CliUsageException($"--boundary: the index '{idx}' is not an integer");
        var values = ValueLists.ParseRationals(right, "boundary");
        if (values.Count != 1) throw new CliUsageException($"--boundary: give one value, got '{right}'");
        return (index, values[0]);
    }
}
