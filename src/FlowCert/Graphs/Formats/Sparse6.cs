using System.Text;

namespace FlowCert.Graphs.Formats;

/// <summary>
/// sparse6 ("nauty and Traces User's Guide, formats.txt", section "Description of sparse6 format"):
/// ':' N(n) and a list of (b, x) pairs of 1 + k bits, k the number of bits of n - 1. Reading follows the
/// published decoder: b = 1 moves to the next vertex v, x &gt; v jumps to v = x, otherwise {x, v} is an
/// edge; an incomplete pair at the end is discarded. Loops and repeated edges (allowed by sparse6) are
/// errors here, as is the incremental form (';'). Nodes and weights as for <see cref="Graph6"/>.
/// </summary>
public static class Sparse6
{
    /// <summary>The optional header at the start of a file.</summary>
    public const string Header = ">>sparse6<<";

    /// <summary>Parses a file holding one graph.</summary>
    public static OpenGraph Parse(string text, string fileName)
    {
        var line = SixBitText.SingleLine(text, fileName, Header, "sparse6");
        if (line.Text[0] == ';')
            throw new GraphFormatException(fileName, line.Line, line.FirstColumn, "incremental sparse6 (';') is not read: write the whole graph with ':'");
        if (line.Text[0] != ':')
            throw new GraphFormatException(fileName, line.Line, line.FirstColumn, "a sparse6 line starts with ':' (a graph6 line would be named .g6)");
        var (n, pos) = SixBitText.DecodeSize(line, 1, fileName);
        SixBitText.CheckReadableSize(n, line, fileName);
        int k = BitLength(n - 1);
        long totalBits = 6L * (line.Text.Length - pos);
        int Bit(long b) => (SixBitText.Value(line, pos + (int)(b / 6), fileName) >> (5 - (int)(b % 6))) & 1;

        var edges = new List<(long, long)>();
        var seen = new Dictionary<(long, long), int>();
        long v = 0;
        for (long at = 0; at + 1 + k <= totalBits; at += 1 + k)
        {
            int column = line.FirstColumn + pos + (int)(at / 6);
            long x = 0;
            for (int t = 1; t <= k; t++) x = (x << 1) | (long)Bit(at + t);
            if (Bit(at) == 1) v++;
            if (v >= n) break;
            if (x > v) { v = x; if (v >= n) break; continue; }
            if (x == v)
                throw new GraphFormatException(fileName, line.Line, column, $"loop on vertex {x}: an open graph has no edge from a node to itself");
            if (seen.TryGetValue((x, v), out var firstColumn))
                throw new GraphFormatException(fileName, line.Line, column, $"edge {x}-{v} appears twice (first at column {firstColumn}): an open graph has no repeated edges");
            seen[(x, v)] = column;
            edges.Add((x, v));
        }
        // Every byte must still be a data byte, even in the padding.
        for (int p = pos; p < line.Text.Length; p++) SixBitText.Value(line, p, fileName);
        return SixBitText.Graph(n, edges);
    }

    /// <summary>The sparse6 line of a graph, ending in LF; vertices numbered as for <see cref="Graph6.Write"/>.</summary>
    public static string Write(OpenGraph g)
    {
        var number = Graph6.VertexNumbers(g, "sparse6");
        int n = g.NodeCount;
        int k = BitLength(n - 1);
        var edges = g.Edges.Select(e => Graph6.Ordered(number[e.U], number[e.V]))
            .OrderBy(e => e.Item2).ThenBy(e => e.Item1).ToList();
        var bits = new List<bool>();
        void Pair(bool b, int x)
        {
            bits.Add(b);
            for (int t = k - 1; t >= 0; t--) bits.Add(((x >> t) & 1) == 1);
        }
        int current = 0;
        foreach (var (u, w) in edges)
        {
            if (w == current) Pair(false, u);
            else if (w == current + 1) { Pair(true, u); current = w; }
            else { Pair(true, w); Pair(false, u); current = w; }
        }
        int pad = (6 - bits.Count % 6) % 6;
        // The published special case: when n = 2^k and the last vertex reached is n - 2, padding with 1s
        // would read as a loop on n - 1, so the padding starts with a 0.
        if (k < 6 && n == 1 << k && current == n - 2 && pad >= k + 1) { bits.Add(false); pad--; }
        for (int p = 0; p < pad; p++) bits.Add(true);
        var sb = new StringBuilder(":").Append(SixBitText.EncodeSize(n));
        SixBitText.AppendBits(sb, bits);
        return sb.Append('\n').ToString();
    }

    private static int BitLength(long value)
    {
        int k = 0;
        for (; value > 0; value >>= 1) k++;
        return k;
    }
}
