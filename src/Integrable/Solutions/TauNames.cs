using System.Text.RegularExpressions;
using Integrable.Polynomials;

namespace Integrable.Solutions;

/// <summary>Internal names of the shifted tau functions (τ_{n+s} is the variable <c>TAUp{s}</c> or <c>TAUm{−s}</c>) and
/// their printing.</summary>
internal static partial class TauNames
{
    public static string Variable(int shift) => shift >= 0 ? $"TAUp{shift}" : $"TAUm{-shift}";

    public static string Term(int shift, string index = "n") =>
        shift == 0 ? $"τ_{index}" : shift > 0 ? $"τ_{{{index}+{shift}}}" : $"τ_{{{index}-{-shift}}}";

    public static string Show(string text, string index = "n") =>
        Pattern().Replace(text.Replace("*", " ", StringComparison.Ordinal), m => Term((m.Groups[1].Value == "m" ? -1 : 1) * int.Parse(m.Groups[2].Value, System.Globalization.CultureInfo.InvariantCulture), index));

    public static string Show(LaurentPolynomial p, string index = "n") => Show(p.ToString(), index);

    [GeneratedRegex("TAU([mp])([0-9]+)")]
    private static partial Regex Pattern();
}
