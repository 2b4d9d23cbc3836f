using System.Numerics;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Polynomials;

/// <summary>A tiny reader for exactly the text <see cref="LaurentPolynomial.ToString"/> prints
/// (<c>3*x^2*y^-1 - 1/2*z + 1</c>), used to check the round trip until the library's parser is
/// wired in. Variable names are matched against the ring's names (longest first), so names such as
/// <c>x_{n+1}</c> that contain operators are read correctly.</summary>
internal static class TestPolynomialReader
{
    public static LaurentPolynomial Read(LaurentPolynomialRing ring, string text)
    {
        var names = ring.Variables.Select((n, i) => (n, i)).OrderByDescending(p => p.n.Length).ToArray();
        int pos = 0, n = ring.VariableCount;
        var b = ring.CreateBuilder();
        if (text == "0") return ring.Zero;
        bool first = true;
        while (pos < text.Length)
        {
            int sign = 1;
            if (first)
            {
                if (text[pos] == '-') { sign = -1; pos++; }
            }
            else
            {
                Expect(text, ref pos, " ");
                if (text[pos] == '-') sign = -1; else if (text[pos] != '+') throw new FormatException($"sign expected at {pos}");
                pos++;
                Expect(text, ref pos, " ");
            }
            first = false;
            Rational coef = sign;
            var e = new int[n];
            bool needFactor = true;
            while (needFactor)
            {
                var match = names.FirstOrDefault(p => string.CompareOrdinal(text, pos, p.n, 0, p.n.Length) == 0);
                if (match.n is not null)
                {
                    pos += match.n.Length;
                    int k = 1;
                    if (pos < text.Length && text[pos] == '^')
                    {
                        pos++;
                        int start = pos;
                        if (text[pos] == '-') pos++;
                        while (pos < text.Length && char.IsDigit(text[pos])) pos++;
                        k = int.Parse(text[start..pos]);
                    }
                    e[match.i] += k;
                }
                else
                {
                    int start = pos;
                    while (pos < text.Length && (char.IsDigit(text[pos]) || text[pos] == '/')) pos++;
                    if (start == pos) throw new FormatException($"factor expected at {pos} in '{text}'");
                    coef *= Rational.Parse(text[start..pos]);
                }
                needFactor = pos < text.Length && text[pos] == '*';
                if (needFactor) pos++;
            }
            b.Add(coef, e);
        }
        return b.ToPolynomial();
    }

    private static void Expect(string text, ref int pos, string s)
    {
        if (string.CompareOrdinal(text, pos, s, 0, s.Length) != 0) throw new FormatException($"'{s}' expected at {pos} in '{text}'");
        pos += s.Length;
    }
}
