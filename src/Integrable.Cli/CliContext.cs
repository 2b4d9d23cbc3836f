namespace Integrable.Cli;

/// <summary>Where a command writes: results to <see cref="Out"/>, diagnostics and progress to <see cref="Error"/>.</summary>
internal sealed record CliContext(TextWriter Out, TextWriter Error, CancellationToken Cancellation);
