using Integrable.Recursions;
using Integrable.Text;

namespace Integrable.Cli;

/// <summary>Turns equation text from the command line into library objects, mapping the library's
/// typed input errors onto one-line usage errors.</summary>
internal static class EquationInput
{
    public static Recurrence ReadRecurrence(string text)
    {
        try
        {
            return Recurrence.Parse(text);
        }
        catch (ExpressionParseException e)
        {
            throw new CliUsageException($"cannot read the equation: {e.Reason} at position {e.Position}");
        }
        catch (EquationException e)
        {
            throw new CliUsageException($"cannot read the equation: {e.Reason} (at position {e.Position})");
        }
    }
}
