namespace Integrable.Clusters;

/// <summary>Thrown when text describing an exchange matrix or a mutation sequence is malformed.</summary>
/// <remarks>The message quotes the offending part of the text and <see cref="Position"/> gives its
/// 0-based character offset, so a caller can point at it.</remarks>
public sealed class ClusterFormatException : FormatException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="text">The whole text that was being read.</param>
    /// <param name="position">0-based character offset of the problem in <paramref name="text"/>.</param>
    /// <param name="problem">What was wrong, e.g. "expected ','".</param>
    public ClusterFormatException(string text, int position, string problem)
        : base($"{problem} at position {position} in \"{text}\"")
    {
        Text = text;
        Position = position;
    }

    /// <summary>The text that was being read.</summary>
    public string Text { get; }

    /// <summary>0-based character offset of the problem in <see cref="Text"/>.</summary>
    public int Position { get; }
}
