using System.Text;

namespace FlowCert.Graphs.Formats;

/// <summary>
/// graph6 ("nauty and Traces User's Guide, formats.txt", section "Description of graph6 format"): N(n)
/// followed by the upper triangle of the adjacency matrix in the order (0,1),(0,2),(1,2),(0,3),...
/// It has no weights, inputs or outputs: read graphs have weight-1 edges and nodes v0..v(n-1); written
/// graphs number their nodes in natural order of the names (<see cref="NaturalNameOrder"/>) and refuse
/// weights other than 1.
/// </summary>
public static class Graph6
{
    /// <summary>The optional header at the start of a file.</summary>
    public const string Header = ">>graph6<<";

    /// <summary>The most adjacency bits <see cref="Write"/> produces (a graph of about 46 000 nodes).</summary>
    public const long MaxBits = 1L << 30;

    /// <summary>Parses a file holding one graph.</summary>
    public static OpenGraph Parse(string text, string fileName)
    {
        var line = SixBitText.SingleLine(text, fileName, Header, "graph6");
        char lead = line.Text[0];
        if (lead is ':' or ';')
            throw new GraphFormatException(fileName, line.Line, line.FirstColumn, "this is a sparse6 line (it starts with ':' or ';'): name the file .s6");
        if (lead == '&')
            throw new GraphFormatException(fileName, line.Line, line.FirstColumn, "this is a digraph6 line: open graphs are undirected");
        var (n, pos) = SixBitText.DecodeSize(line, 0, fileName);
        SixBitText.CheckReadableSize(n, line, fileName);
        Int128 bits = (Int128)n * (n - 1) / 2;
        Int128 needed = (bits + 5) / 6;
        int have = line.Text.Length - pos;
        if (have < needed)
            throw new GraphFormatException(fileName, line.Line, line.FirstColumn + line.Text.Length,
                $"the line ends early: {n} nodes need {needed} bytes of adjacency after the size, found {have}");
        if (have > needed)
            throw new GraphFormatException(fileName, line.Line, line.FirstColumn + pos + (int)needed,
                $"unexpected byte after the adjacency of {n} nodes (a graph6 line has exactly {needed} bytes after the size)");
        var edges = new List<(long, long)>();
        long k = 0;
        for (long j = 1; j < n; j++)
            for (long i = 0; i < j; i++, k++)
            {
                int value = SixBitText.Value(line, pos + (int)(k / 6), fileName);
                if ((value >> (5 - (int)(k % 6)) & 1) == 1) edges.Add((i, j));
            }
        return SixBitText.Graph(n, edges);
    }

    /// <summary>The graph6 line of a graph, ending in LF. Throws <see cref="GraphFileException"/> for a weight other than 1.</summary>
    public static string Write(OpenGraph g)
    {
        var number = VertexNumbers(g, "graph6");
        int n = g.NodeCount;
        if ((long)n * (n - 1) / 2 > MaxBits)
            throw new GraphFileException($"{n} nodes make a graph6 line of more than {MaxBits / 6} bytes: use .s6 for large sparse graphs");
        var adjacent = new HashSet<(int, int)>(g.Edges.Select(e => Ordered(number[e.U], number[e.V])));
        var bits = new List<bool>(n * (n - 1) / 2);
        for (int j = 1; j < n; j++)
            for (int i = 0; i < j; i++)
                bits.Add(adjacent.Contains((i, j)));
        var sb = new StringBuilder(SixBitText.EncodeSize(n));
        SixBitText.AppendBits(sb, bits);
        return sb.Append('\n').ToString();
    }

    /// <summary>
    /// The vertex number of every node index: its place in natural order of the names. Refuses a graph
    /// with a weight other than 1, which these formats cannot hold.
    /// </summary>
    internal static int[] VertexNumbers(OpenGraph g, string formatName)
    {
        foreach (var e in g.Edges)
            if (e.Weight != Algebra.Rational.One)
                throw new GraphFileException(
                    $"{formatName} holds only unweighted graphs, and edge {g.Names[e.U]} {g.Names[e.V]} has weight {e.Weight}: use .mtx or .json to keep weights");
        var order = NaturalNameOrder.Sort(g);
        var number = new int[g.NodeCount];
        for (int k = 0; k < order.Length; k++) number[order[k]] = k;
        return number;
    }

    internal static (int, int) Ordered(int a, int b) => a < b ? (a, b) : (b, a);
}
