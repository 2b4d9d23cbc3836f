namespace Integrable.Text;

/// <summary>Which characters make up names: ASCII letters and Greek letters start a name; ASCII digits may follow.</summary>
internal static class IdentifierRules
{
    public static bool IsLetter(char c) =>
        c is >= 'a' and <= 'z' or >= 'A' and <= 'Z' || (c is >= '\u0370' and <= '\u03FF' && char.IsLetter(c));

    public static bool IsDigit(char c) => c is >= '0' and <= '9';

    public static bool IsIdentifier(string s)
    {
        if (string.IsNullOrEmpty(s) || !IsLetter(s[0])) return false;
        foreach (char c in s)
            if (!IsLetter(c) && !IsDigit(c)) return false;
        return true;
    }
}
