using System.Globalization;
using Integrable.Numbers;

namespace Integrable.Cli;

/// <summary>Reading comma-separated values and <c>name=value</c> assignments from the command line.</summary>
internal static class ValueLists
{
    public static List<Rational> ParseRationals(string text, string option)
    {
        var parts = text.Split(',', StringSplitOptions.TrimEntries);
        var list = new List<Rational>();
        for (int i = 0; i < parts.Length; i++)
        {
            if (!Rational.TryParse(parts[i], out var r))
                throw new CliUsageException($"--{option}: value {i + 1} '{parts[i]}' is not a rational number (use p, p/q or a decimal)");
            list.Add(r);
        }
        return list;
    }

    public static List<double> ParseDoubles(string text, string option)
    {
        var parts = text.Split(',', StringSplitOptions.TrimEntries);
        var list = new List<double>();
        for (int i = 0; i < parts.Length; i++)
        {
            if (Rational.TryParse(parts[i], out var r)) { list.Add(r.ToDouble()); continue; }
            if (double.TryParse(parts[i], NumberStyles.Float, CultureInfo.InvariantCulture, out var d) && double.IsFinite(d)) { list.Add(d); continue; }
            throw new CliUsageException($"--{option}: value {i + 1} '{parts[i]}' is not a number");
        }
        return list;
    }

    /// <summary>Parses "g=1/12,a=2" (also several --set occurrences joined by commas).</summary>
    public static Dictionary<string, Rational> ParseAssignments(string? text)
    {
        var result = new Dictionary<string, Rational>(StringComparer.Ordinal);
        if (string.IsNullOrWhiteSpace(text)) return result;
        foreach (var part in text.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries))
        {
            int eq = part.IndexOf('=');
            if (eq <= 0) throw new CliUsageException($"--set: '{part}' is not of the form name=value");
            var name = part[..eq].Trim();
            if (!Rational.TryParse(part[(eq + 1)..], out var value))
                throw new CliUsageException($"--set: value of {name} '{part[(eq + 1)..]}' is not a rational number");
            if (!result.TryAdd(name, value)) throw new CliUsageException($"--set: {name} is set twice");
        }
        return result;
    }
}
