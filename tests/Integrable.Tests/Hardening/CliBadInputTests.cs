using System.Diagnostics;
using Integrable.Cli;
using Xunit;

namespace Integrable.Tests.Hardening;

/// <summary>The command-line tool under bad input: malformed equations, unknown options, missing values,
/// non-numeric numbers and conflicting flags. Every case must give exactly one line on stderr that starts
/// with <c>integrable: </c>, exit code 2, and nothing on stdout that a script could mistake for a result.</summary>
public class CliBadInputTests
{
    private const string Somos4 = "x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2";
    private const string Lyness = "x_{n+1} x_{n-1} = x_n + 1";

    /// <summary>Bad arguments shared by every command that reads an equation.</summary>
    private static readonly string[][] EquationTail =
    [
        [],                                         // equation missing
        ["x_{n+1} = (x_n"],                         // unbalanced bracket
        ["x_{n+1} = x_n +"],                        // ends too early
        ["x_{n+1} = x_n $ 2"],                      // stray character
        [""],                                       // empty equation
        ["x_{n+1}^2 = x_n + 1"],                    // not linear in the highest shift
        ["x_{2n} = x_n"],                           // subscript not index plus integer
        ["x_{n+1} = y_n"],                          // two unknowns
        ["x_{n+1} x_{n*1} = x_n^2 + 1"],            // the same term written two ways
        [Lyness, "--no-such-option"],               // unknown option
        [Lyness, "--steps"],                        // missing value
        [Lyness, "--steps", "ten"],                 // non-numeric
        [Lyness, "--steps", "-3"],                  // negative
        [Lyness, "--steps", "99999999999999999999"],// too large for the type
        [Lyness, "--steps", "3", "--steps", "4"],   // repeated option
        [Lyness, "--set", "a"],                     // malformed assignment
        [Lyness, "--set", "a=1/0"],                 // undefined value
        [Lyness, "--set", "x_n=3"],                 // not a parameter
        [Lyness, "--json", "--latex"],              // conflicting outputs
        [Lyness, "extra positional"],               // second equation
    ];

    public static TheoryData<string[]> Cases()
    {
        var data = new TheoryData<string[]>();
        foreach (var command in new[] { "laurent", "growth", "period", "confine", "integrals", "series", "tau", "analyze" })
            foreach (var tail in EquationTail)
            {
                // "--steps" means the number of steps for every command but period (which has --max).
                var t = command == "period" ? tail.Select(a => a == "--steps" ? "--max" : a).ToArray() : tail;
                data.Add([command, .. t]);
            }
        foreach (var tail in EquationTail.Where(t => !t.Contains("--latex")))
            data.Add(["iterate", .. tail, "--initial", "1,1"]);
        string[][] more =
        [
            [],
            ["iterate", Lyness],                                            // --initial missing
            ["iterate", Lyness, "--initial", "1,x"],                        // non-numeric initial value
            ["iterate", Lyness, "--initial", "1"],                          // too few initial values
            ["iterate", Lyness, "--initial", "1,2,3"],                      // too many initial values
            ["iterate", Lyness, "--initial", "1,,2"],                       // empty item
            ["iterate", Lyness, "--initial", "1/0,1"],                      // zero denominator
            ["iterate", Lyness, "--initial", "1,1", "--mod", "12"],         // not a prime
            ["iterate", Lyness, "--initial", "1,1", "--mod", "p"],          // not a number
            ["iterate", Lyness, "--initial", "1,1", "--mod", "7", "--float"], // conflicting domains
            ["iterate", Somos4, "--initial", "1,1,1,1", "--steps", "x"],
            ["mutate"],                                                     // no matrix
            ["mutate", "--matrix", "[[0,1],[1,0]]", "--sequence", "1"],     // not skew-symmetrizable
            ["mutate", "--matrix", "[[0,1],[-1,0]", "--sequence", "1"],     // bracket
            ["mutate", "--matrix", "[[0,a],[-1,0]]", "--sequence", "1"],    // non-integer entry
            ["mutate", "--matrix", "[[0,1],[-1,0]]", "--sequence", "3"],    // direction out of range
            ["mutate", "--matrix", "[[0,1],[-1,0]]", "--sequence", "0"],    // directions start at 1
            ["mutate", "--matrix", "[[0,1],[-1,0]]", "--sequence", "1,x"],
            ["mutate", "--matrix", "[[0,1],[-1,0]]", "--type", "A2"],       // both matrix and type
            ["mutate", "--type", "Q7"],                                     // unknown type
            ["mutate", "--matrix", "[[0,1],[-1,0]]", "--initial", "1"],     // too few values
            ["explore", "--matrix", "[[0,1],[-1,0]]", "--limit", "0"],
            ["explore", "--matrix", "[[0,1],[-1,0]]", "--limit", "many"],
            ["explore"],
            ["laurent", "--matrix", "[[0,1],[-1,0]]", "--mutations", "1,9"],
            ["laurent", Somos4, "--max-terms", "0"],
            ["laurent", Somos4, "--time-limit", "soon"],
            ["growth", Somos4, "--max-degree", "-1"],
            ["confine", Lyness, "--value", "1,abc"],
            ["confine", Lyness, "--start", "x"],
            ["period", Lyness, "--points", "0"],
            ["integrals", Lyness, "--degree", "0"],
            ["integrals", Lyness, "--periodic", "a=1"],
            ["integrals", "x_{n+1} x_{n-1} = x_n + n"],                     // non-autonomous
            ["series", "R_n = 1 + g R_n (R_{n-1} + R_{n+1})", "--parameter", "h", "--order", "5"],
            ["series", "R_n = 1 + g R_n (R_{n-1} + R_{n+1})", "--parameter", "g", "--order", "-5"],
            ["series", "R_n = 1 + g R_n (R_{n-1} + R_{n+1})", "--parameter", "g", "--boundary", "R_0"],
            ["tau", "R_n = 1 + g R_n (R_{n-1} + R_{n+1})", "--parameter", "g", "--boundary", "R_0=0", "--initial", "1,2"],
            ["tau", Lyness, "--initial", "1,x"],
            ["analyze", Lyness, "--degree", "0"],
            ["demo", "--steps", "0"],
            ["nosuchcommand"],
            ["--nosuchflag"],
        ];
        foreach (var m in more) if (m.Length > 0) data.Add(m);
        return data;
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void BadInput_OneLineMessage_ExitCode2_NothingOnStdout(string[] args)
    {
        var o = new StringWriter();
        var e = new StringWriter();
        int exit = CommandLineApp.Run(args, o, e);
        string stderr = e.ToString();
        Assert.True(exit == 2, $"exit {exit} for [{string.Join(" | ", args)}]; stderr: {stderr}; stdout: {o}");
        Assert.Equal("", o.ToString());
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
        Assert.StartsWith("integrable: ", stderr);
        Assert.True(stderr.Length > "integrable: ".Length + 5, stderr);
    }

    /// <summary>The same contract across a real process boundary (exit code and streams as a shell sees
    /// them), on the built tool next to the test assembly.</summary>
    [Theory]
    [InlineData("iterate", "x_{n+1} = (x_n", "--initial", "1")]
    [InlineData("growth", Lyness, "--steps", "ten")]
    [InlineData("nosuchcommand")]
    public async Task BadInput_RealProcess_ExitCode2(params string[] args)
    {
        string tool = Path.Combine(AppContext.BaseDirectory, "Integrable.Cli.dll");
        Assert.True(File.Exists(tool), $"built tool not found at {tool}");
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        start.ArgumentList.Add(tool);
        foreach (var a in args) start.ArgumentList.Add(a);
        using var p = Process.Start(start)!;
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEndAsync();
        using var timeout = new CancellationTokenSource(TimeSpan.FromSeconds(60));
        await p.WaitForExitAsync(timeout.Token);
        Assert.Equal(2, p.ExitCode);
        Assert.Equal("", await stdout);
        string err = await stderr;
        Assert.Single(err.TrimEnd('\n').Split('\n'));
        Assert.StartsWith("integrable: ", err);
    }
}
