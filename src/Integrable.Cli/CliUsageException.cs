namespace Integrable.Cli;

/// <summary>Bad command-line input (unknown command or option, missing or malformed value,
/// conflicting flags): reported as one line on stderr with exit code 2.</summary>
internal sealed class CliUsageException(string message) : Exception(message);
