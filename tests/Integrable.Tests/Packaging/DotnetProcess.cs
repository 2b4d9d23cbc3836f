using System.Diagnostics;

namespace Integrable.Tests.Packaging;

/// <summary>Runs the dotnet command line from a test, in a clean environment (the MSBuild variables
/// of the running test host removed), with a time limit.</summary>
internal static class DotnetProcess
{
    public static string RepositoryRoot { get; } = FindRoot();

    public static string Configuration =>
#if DEBUG
        "Debug";
#else
        "Release";
#endif

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "Integrable.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("Integrable.sln not found above the test assembly");
    }

    /// <summary>Runs <c>dotnet args</c> in <paramref name="workingDirectory"/>; returns the exit code and the combined output.</summary>
    public static (int ExitCode, string Output) Run(string workingDirectory, TimeSpan timeout, params string[] args)
    {
        var start = new ProcessStartInfo(Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } host && File.Exists(host) ? host : "dotnet")
        {
            WorkingDirectory = workingDirectory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var a in args) start.ArgumentList.Add(a);
        foreach (var key in start.Environment.Keys.ToList())
            if (key.StartsWith("MSBuild", StringComparison.OrdinalIgnoreCase) || key.StartsWith("VSTEST", StringComparison.OrdinalIgnoreCase))
                start.Environment.Remove(key);
        start.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        start.Environment["DOTNET_NOLOGO"] = "1";
        start.Environment["DOTNET_SKIP_FIRST_TIME_EXPERIENCE"] = "1";
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(timeout))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException($"dotnet {string.Join(' ', args)} did not finish within {timeout.TotalSeconds} s");
        }
        process.WaitForExit();
        return (process.ExitCode, stdout.Result + stderr.Result);
    }
}
