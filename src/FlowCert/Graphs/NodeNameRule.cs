namespace FlowCert.Graphs;

/// <summary>
/// The one rule for node names in every format that carries names (.ograph, JSON graphs, label files):
/// a letter or '_', then letters, digits, '_', '.', ':' or '-' (ASCII; docs/formats.md).
/// </summary>
public static class NodeNameRule
{
    /// <summary>True when the characters form a valid node name.</summary>
    public static bool IsValid(ReadOnlySpan<char> s)
    {
        if (s.Length == 0) return false;
        char c0 = s[0];
        if (!(char.IsAsciiLetter(c0) || c0 == '_')) return false;
        for (int i = 1; i < s.Length; i++)
        {
            char c = s[i];
            if (!(char.IsAsciiLetterOrDigit(c) || c is '_' or '.' or ':' or '-')) return false;
        }
        return true;
    }

    /// <summary>The message for an invalid name (the name cut and escaped by <see cref="Formats.Excerpt"/>).</summary>
    public static string Problem(string name)
        => $"bad node name '{Formats.Excerpt.Of(name)}': a name starts with a letter or '_' and continues with letters, digits, '_', '.', ':' or '-'";
}
