using System.Text;

namespace FlowCert.Cli;

/// <summary>
/// Text from the input (file names, messages that quote the input) as the command echoes it: control
/// characters written as \n, \t, \r or \uXXXX (as flowcheck does), so that input cannot move the
/// cursor, change colours or forge lines on the user's terminal.
/// </summary>
public static class Escaped
{
    /// <summary>The text with every control character escaped; nothing is cut.</summary>
    public static string Of(string text)
    {
        if (!text.Any(char.IsControl)) return text;
        var sb = new StringBuilder(text.Length + 16);
        foreach (var c in text)
        {
            if (c == '\n') sb.Append("\\n");
            else if (c == '\t') sb.Append("\\t");
            else if (c == '\r') sb.Append("\\r");
            else if (char.IsControl(c)) sb.Append($"\\u{(int)c:x4}");
            else sb.Append(c);
        }
        return sb.ToString();
    }
}
