using Integrable.Cli;

namespace Integrable.Tests.Cli;

public class CommandLineAppTests
{
    internal static (int Exit, string Out, string Err) Run(params string[] args)
    {
        var o = new StringWriter();
        var e = new StringWriter();
        int code = CommandLineApp.Run(args, o, e);
        return (code, o.ToString(), e.ToString());
    }

    [Fact]
    public void NoArguments_RunsDemo_Succeeds()
    {
        var (exit, stdout, _) = Run();
        Assert.Equal(0, exit);
        Assert.Contains("all integers: yes", stdout);
        Assert.Contains("give the orbit of step 1: yes", stdout);
        // The rest of the job on the same example (a scenario of our own; figures checked by hand on the orbit
        // 1, 1, 1, 3, 5, 17, 29, 99, …: 17 = 6·3 − 1, 29 = 6·5 − 1, 99 = 6·17 − 3).
        Assert.Contains("growth: linear", stdout);
        Assert.Contains("functionally independent: 2 of the 2", stdout);
        Assert.Contains("τ_{n+4} = 6 τ_{n+2} - τ_n", stdout);
    }

    [Theory]
    [InlineData("nosuchcommand")]
    [InlineData("demo", "--steps")]
    [InlineData("demo", "--steps", "abc")]
    [InlineData("demo", "--steps", "0")]
    [InlineData("demo", "--unknown")]
    [InlineData("demo", "extra")]
    [InlineData("demo", "--steps", "3", "--steps", "4")]
    public void BadInput_OneLineOnStderr_ExitCode2_NothingOnStdout(params string[] args)
    {
        var (exit, stdout, stderr) = Run(args);
        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
        Assert.StartsWith("integrable: ", stderr);
    }

    [Fact]
    public void Help_EveryCommand_HasExample()
    {
        foreach (var c in CommandLineApp.Commands)
        {
            var (exit, stdout, _) = Run(c.Name, "--help");
            Assert.Equal(0, exit);
            Assert.Contains("Example:", stdout);
        }
    }
}
