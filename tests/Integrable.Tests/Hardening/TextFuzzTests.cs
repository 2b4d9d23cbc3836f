using System.Diagnostics;
using System.Text;
using CsCheck;
using Integrable.Recursions;
using Integrable.Text;
using Xunit;
using Xunit.Abstractions;

namespace Integrable.Tests.Hardening;

/// <summary>Fuzzing of the text front door (expression parser and equation reader): every input either
/// parses — and then prints back to text that parses to the same tree — or raises the typed error with a
/// position inside the input. No other exception, no stack overflow, no input slower than a second.
/// CI runs a little over 100,000 inputs; <see cref="FuzzSettings"/> multiplies that for long runs.</summary>
public class TextFuzzTests(ITestOutputHelper output)
{
    private static readonly TimeSpan PerInputLimit = TimeSpan.FromSeconds(1);

    // Valid equations of the kinds researchers type; the mutation suites start from these.
    private static readonly string[] Corpus =
    [
        "x_{n+1} x_{n-1} = x_n^2 + 1",
        "R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})",
        "x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2",
        "T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n}",
        "x_{n+1} + x_{n-1} = x_n + 1/x_n^2",
        "y_{n+3} y_n = y_{n+2} y_{n+1} + w",
        "u_{n+1} = (a + u_n)/u_{n-1}",
        "x_{n+1} x_{n-1} = x_n^2 - 3/4 x_n + n",
        "z_{n+2} = z_{n+1}^(-2) * (z_n - 1/2)",
        "q_{k+1} q_{k-1} = q_k^2 + α q_k",
    ];

    private const string Alphabet = "xynRTgak_{}()+-*/^,=.0123456789 \t\r\nαé\u2212\u00B7\uD83D\uDE00\uD800[]$;!\0";

    private static readonly Gen<string> Token = Gen.OneOf(
        Gen.OneOf("x", "x_n", "x_{n+1}", "x_{n-1}", "T_{a,n}", "g", "n", "α", "x_{x_n}", "R_{n+k}", "_", "__", "x_", "x_{", "x_{}"),
        Gen.OneOf("+", "-", "*", "/", "^", "=", ",", "(", ")", "{", "}", "^-", "**", "==", "\u2212", "\u00B7"),
        Gen.OneOf("0", "1", "2", "10", "3/4", "0.5", ".", "1.", "1e5", "18446744073709551616", "99999999999999999999999999999"),
        Gen.OneOf(" ", "\t", "\n", "", "😀", "\uD800", "\u0301", "\u202E", "é", "\0"),
        Gen.Int[0, 60].Select(k => new string('(', k)),
        Gen.Int[0, 60].Select(k => new string(')', k)),
        Gen.Long[0, long.MaxValue].Select(v => v.ToString()));

    private int _count;

    [Fact]
    public void Parse_RandomTokenSequences_ParseOrFailWithPosition()
    {
        Token.Array[0, 24].Select(ts => string.Concat(ts)).Sample(CheckAll, iter: FuzzSettings.Iterations(30_000));
        Report();
    }

    [Fact]
    public void Parse_RandomCharacterStrings_ParseOrFailWithPosition()
    {
        Gen.Char[Alphabet].Array[0, 40].Select(cs => new string(cs)).Sample(CheckAll, iter: FuzzSettings.Iterations(27_000));
        Report();
    }

    [Fact]
    public void Parse_MutatedEquations_ParseOrFailWithPosition()
    {
        Gen.Select(Gen.Int[0, Corpus.Length - 1], Gen.Select(Gen.Int[0, 4], Gen.Int[0, 10_000], Gen.Char[Alphabet]).Array[1, 4])
            .Select((i, edits) => Mutate(Corpus[i], edits))
            .Sample(CheckAll, iter: FuzzSettings.Iterations(40_000));
        Report();
    }

    [Fact]
    public void Parse_EveryTruncationAndSplice_ParseOrFailWithPosition()
    {
        foreach (var text in Corpus)
            for (int i = 0; i <= text.Length; i++)
            {
                CheckAll(text[..i]);
                CheckAll(text[i..]);
                foreach (var other in Corpus) CheckAll(text[..i] + other[Math.Min(i, other.Length)..]);
            }
        Report();
    }

    [Theory]
    [InlineData(10)]
    [InlineData(199)]
    [InlineData(200)]
    [InlineData(201)]
    [InlineData(5_000)]
    public void Parse_DeepNesting_ParsesOrIsRefusedCleanly(int depth)
    {
        CheckAll(new string('(', depth) + "x" + new string(')', depth));
        CheckAll(new string('(', depth) + "x");
        CheckAll(string.Concat(Enumerable.Repeat("-", depth)) + "x");
        CheckAll(string.Concat(Enumerable.Repeat("x^", depth)) + "2");
        CheckAll(string.Concat(Enumerable.Repeat("x_{", depth)) + "n" + new string('}', depth));
        CheckAll(string.Concat(Enumerable.Repeat("1/", depth)) + "x");
        CheckAll("x_{n+1} = " + string.Concat(Enumerable.Repeat("(x_n+", depth)) + "1" + new string(')', depth));
        CheckAll(string.Join(" + ", Enumerable.Repeat("x_n", depth)) + " = x_{n+1}");
    }

    [Theory]
    [InlineData("x^99999999999999999999999")]
    [InlineData("x_{n+1} = x_n^4294967297")]
    [InlineData("x_{n+1} = x_n^(-2147483648)")]
    [InlineData("x_{n+1} = x_n^2147483647 + 1")]
    [InlineData("x_{n+99999999999} = x_n")]
    [InlineData("x_{n+2147483647} x_{n-2147483648} = 1")]
    [InlineData("x_{n+65} = x_n")]
    [InlineData("x_{n+1} = 123456789012345678901234567890123456789/987654321098765432109876543210 x_n")]
    [InlineData("x_{n+1} = 0.00000000000000000000000000000000000000001 x_n")]
    [InlineData("x_{n+1} = x_n^0.5")]
    [InlineData("x_{n+1}^2 = x_n")]
    [InlineData("x_{n+1} x_{n+1} = x_n")]
    [InlineData("x_{n+1} = x_{n+1}")]
    [InlineData("0 = 0")]
    [InlineData("x_n = x_n + 1")]
    [InlineData("x_{n+1} = 1/(x_n - x_n)")]
    [InlineData("")]
    [InlineData("   ")]
    [InlineData("=")]
    [InlineData("x_{n+1} = x_n = x_{n-1}")]
    public void Parse_HugeOrDegenerateInputs_ParseOrFailWithPosition(string text)
    {
        CheckAll(text);
        CheckAll(text + new string('9', 2_000));
    }

    [Fact]
    public void Parse_HugeNumberLiteral_IsReadExactlyAndQuickly()
    {
        string digits = "1" + new string('0', 20_000);
        CheckAll(digits);
        CheckAll("x_{n+1} = " + digits + " x_n");
    }

    private static string Mutate(string text, (int Kind, int At, char C)[] edits)
    {
        var sb = new StringBuilder(text);
        foreach (var (kind, at, c) in edits)
        {
            int i = sb.Length == 0 ? 0 : at % sb.Length;
            switch (kind)
            {
                case 0: sb.Insert(i, c); break;
                case 1: if (sb.Length > 0) sb.Remove(i, 1); break;
                case 2: if (sb.Length > 0) sb[i] = c; break;
                case 3: // duplicate a slice
                    int len = Math.Min(1 + at % 7, sb.Length - i);
                    if (len > 0) sb.Insert(i, sb.ToString(i, len));
                    break;
                default: // swap neighbours
                    if (i + 1 < sb.Length) (sb[i], sb[i + 1]) = (sb[i + 1], sb[i]);
                    break;
            }
        }
        return sb.ToString();
    }

    /// <summary>Runs the input through every text entry point; counts it once.</summary>
    private void CheckAll(string text)
    {
        Interlocked.Increment(ref _count);
        var clock = Stopwatch.StartNew();
        CheckExpression(text);
        CheckEquation(text);
        CheckRecurrence(text);
        clock.Stop();
        Assert.True(clock.Elapsed < PerInputLimit, $"input took {clock.Elapsed.TotalMilliseconds:F0} ms: {Shorten(text)}");
    }

    private static void CheckExpression(string text)
    {
        Expression e;
        try { e = ExpressionParser.Parse(text); }
        catch (ExpressionParseException ex) { AssertInside(ex, text); return; }
        string printed = ExpressionFormatter.ToText(e);
        Expression back;
        try { back = ExpressionParser.Parse(printed); }
        catch (ExpressionParseException ex) { throw new Xunit.Sdk.XunitException($"printed form of {Shorten(text)} does not parse: {printed}\n{ex.Message}"); }
        Assert.Equal(e, back);
    }

    private static void CheckEquation(string text)
    {
        Equation eq;
        try { eq = ExpressionParser.ParseEquation(text); }
        catch (ExpressionParseException ex) { AssertInside(ex, text); return; }
        string printed = ExpressionFormatter.ToText(eq);
        Assert.Equal(eq, ExpressionParser.ParseEquation(printed));
    }

    private static void CheckRecurrence(string text)
    {
        try
        {
            var r = Recurrence.Parse(text);
            Assert.InRange(r.Order, 1, 64);
            Assert.Equal(r.Order + r.Parameters.Length + (r.IsAutonomous ? 0 : 1), r.Rule.InputCount);
        }
        catch (ExpressionParseException ex) { AssertInside(ex, text); }
        catch (EquationException ex)
        {
            Assert.InRange(ex.Span.Start, 0, text.Length);
            Assert.InRange(ex.Span.End, ex.Span.Start, text.Length);
            Assert.False(string.IsNullOrWhiteSpace(ex.Reason));
        }
    }

    private static void AssertInside(ExpressionParseException ex, string text)
    {
        Assert.Equal(text, ex.Input);
        Assert.InRange(ex.Position, 0, text.Length);
        Assert.InRange(ex.Position + ex.Length, ex.Position, text.Length);
        Assert.False(string.IsNullOrWhiteSpace(ex.Reason));
        Assert.Contains("^", ex.Message);
    }

    private static string Shorten(string text) => text.Length <= 120 ? text : text[..120] + $"… ({text.Length} chars)";

    private void Report() => output.WriteLine($"fuzzed inputs: {_count} (multiplier {FuzzSettings.Multiplier})");
}
