using FlowCert.Graphs.Formats;

namespace FlowCert.Cli;

/// <summary>
/// Text from the input (file names, messages that quote the input) as the command echoes it: control
/// characters written as \n, \t, \r or \uXXXX (as flowcheck does), so that input cannot move the
/// cursor, change colours or forge lines on the user's terminal.
/// </summary>
public static class Escaped
{
    /// <summary>The text with every control character escaped; nothing is cut (<see cref="Excerpt.Escape"/>).</summary>
    public static string Of(string text) => Excerpt.Escape(text, null);
}
