using System.Text;

namespace FlowCert.Graphs.Formats;

/// <summary>What a message may repeat of the user's input: at most 80 characters, control characters escaped.</summary>
public static class Excerpt
{
    /// <summary>The longest excerpt, in characters, before "..." is appended.</summary>
    public const int MaxLength = 80;

    /// <summary>The text with control characters written as \n, \t, \r or \uXXXX, cut to <see cref="MaxLength"/> characters.</summary>
    public static string Of(string text)
    {
        var sb = new StringBuilder(Math.Min(text.Length, MaxLength) + 8);
        foreach (var c in text)
        {
            if (sb.Length >= MaxLength) return sb.Append("...").ToString();
            if (c == '\n') sb.Append("\\n");
            else if (c == '\t') sb.Append("\\t");
            else if (c == '\r') sb.Append("\\r");
            else if (char.IsControl(c)) sb.Append($"\\u{(int)c:x4}");
            else sb.Append(c);
        }
        return sb.ToString();
    }
}
