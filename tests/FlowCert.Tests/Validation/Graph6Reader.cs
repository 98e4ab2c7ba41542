namespace FlowCert.Tests.Validation;

/// <summary>
/// A reader for graph6, the open format of nauty (one undirected simple graph per line), written in the
/// test project to read nauty-geng's output (the product's graph6 reader lives in src/ elsewhere).
/// Format: N(n) then R(x). N(n) is one byte n + 63 for n &lt;= 62, else 126 and three 6-bit groups
/// (n &lt;= 258047), else 126 126 and six 6-bit groups. x lists the upper triangle column by column,
/// (0,1), (0,2), (1,2), (0,3), ..., padded with zeros to a multiple of 6, each group of 6 bits
/// (most significant first) written as the byte value + 63. An optional header ">>graph6&lt;&lt;" may start the line.
/// </summary>
public static class Graph6Reader
{
    /// <summary>A graph as its order and its edges (u &lt; v).</summary>
    public sealed record SimpleGraph(int Order, IReadOnlyList<(int U, int V)> Edges);

    /// <summary>Reads one graph6 line (without the line end).</summary>
    public static SimpleGraph ParseLine(string line)
    {
        const string header = ">>graph6<<";
        if (line.StartsWith(header, StringComparison.Ordinal)) line = line[header.Length..];
        if (line.Length == 0) throw new FormatException("empty graph6 line");
        if (line[0] is ':' or ';' or '&') throw new FormatException("sparse6 or digraph6 line, not graph6");
        foreach (var ch in line)
            if (ch < 63 || ch > 126) throw new FormatException($"byte {(int)ch} is outside 63..126");
        int pos = 0;
        long n;
        if (line[0] != 126) { n = line[0] - 63; pos = 1; }
        else if (line.Length > 1 && line[1] != 126) { n = Groups(line, 1, 3); pos = 4; }
        else { n = Groups(line, 2, 6); pos = 8; }
        if (n > 100_000) throw new FormatException($"order {n} is too large for this test reader");
        long bits = n * (n - 1) / 2;
        long needed = (bits + 5) / 6;
        if (line.Length - pos != needed) throw new FormatException($"order {n} needs {needed} bytes of edges, the line has {line.Length - pos}");
        var edges = new List<(int, int)>();
        long k = 0;
        for (int v = 1; v < n; v++)
            for (int u = 0; u < v; u++, k++)
            {
                int group = line[pos + (int)(k / 6)] - 63;
                if ((group >> (5 - (int)(k % 6)) & 1) != 0) edges.Add((u, v));
            }
        // padding bits must be zero
        for (; k < needed * 6; k++)
            if (((line[pos + (int)(k / 6)] - 63) >> (5 - (int)(k % 6)) & 1) != 0) throw new FormatException("non-zero padding bits");
        return new SimpleGraph((int)n, edges);
    }

    private static long Groups(string line, int start, int count)
    {
        if (line.Length < start + count) throw new FormatException("truncated order");
        long n = 0;
        for (int i = 0; i < count; i++) n = (n << 6) | (long)(line[start + i] - 63);
        return n;
    }

    /// <summary>Reads every non-empty line of a graph6 text.</summary>
    public static List<SimpleGraph> ParseAll(string text)
        => text.Split('\n').Select(l => l.TrimEnd('\r')).Where(l => l.Length > 0).Select(ParseLine).ToList();
}
