using System.Text;

namespace FlowCert.Graphs.Formats;

/// <summary>What a message may repeat of the user's input: at most 80 characters, control characters escaped.</summary>
public static class Excerpt
{
    /// <summary>The longest excerpt, in characters, before "..." is appended.</summary>
    public const int MaxLength = 80;

    /// <summary>The text with control characters written as \n, \t, \r or \uXXXX, cut to <see cref="MaxLength"/> characters.</summary>
    public static string Of(string text) => Escape(text, MaxLength);

    /// <summary>The text with control characters written as \n, \t, \r or \uXXXX, cut after <paramref name="maxLength"/> characters with "..." (never cut when null).</summary>
    public static string Escape(string text, int? maxLength)
    {
        if (maxLength is null && !text.Any(char.IsControl)) return text;
        var sb = new StringBuilder(Math.Min(text.Length, maxLength ?? text.Length) + 8);
        foreach (var c in text)
        {
            if (sb.Length >= maxLength) return sb.Append("...").ToString();
            if (c == '\n') sb.Append("\\n");
            else if (c == '\t') sb.Append("\\t");
            else if (c == '\r') sb.Append("\\r");
            else if (char.IsControl(c)) sb.Append($"\\u{(int)c:x4}");
            else sb.Append(c);
        }
        return sb.ToString();
    }
}
