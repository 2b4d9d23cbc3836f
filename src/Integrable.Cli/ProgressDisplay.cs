using Integrable.Analyses;

namespace Integrable.Cli;

/// <summary>A one-line progress display on stderr (rewritten in place with a carriage return, at most
/// ten times a second), shown only when stderr is the terminal and <c>--quiet</c> was not given.</summary>
internal sealed class ProgressDisplay : IProgress<AnalysisProgress>, IDisposable
{
    private readonly TextWriter _error;
    private readonly bool _enabled;
    private long _lastTicks;
    private int _width;

    public ProgressDisplay(CliContext context, bool quiet)
    {
        _error = context.Error;
        _enabled = !quiet && ReferenceEquals(context.Error, Console.Error) && !Console.IsErrorRedirected;
    }

    /// <summary>True when lines are drawn.</summary>
    public bool Enabled => _enabled;

    public void Report(AnalysisProgress value)
    {
        if (!_enabled) return;
        long now = Environment.TickCount64;
        if (now - _lastTicks < 100 && value.Step < value.TotalSteps) return;
        _lastTicks = now;
        string line = $"{value.Analysis}: step {value.Step}/{value.TotalSteps}  {value.Detail}";
        if (line.Length > 100) line = line[..97] + "...";
        lock (_error)
        {
            _error.Write("\r" + line.PadRight(_width));
            _error.Flush();
            _width = line.Length;
        }
    }

    /// <summary>Shows the name of the analysis that starts.</summary>
    public void Start(string analysis) => Report(new AnalysisProgress(analysis, 0, 1, "starting"));

    /// <summary>Erases the line.</summary>
    public void Dispose()
    {
        if (!_enabled || _width == 0) return;
        lock (_error)
        {
            _error.Write("\r" + new string(' ', _width) + "\r");
            _error.Flush();
            _width = 0;
        }
    }
}
