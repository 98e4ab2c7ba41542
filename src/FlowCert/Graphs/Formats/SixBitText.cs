using System.Text;

namespace FlowCert.Graphs.Formats;

/// <summary>
/// The building blocks shared by graph6 and sparse6 ("nauty and Traces User's Guide, formats.txt",
/// sections "Bit vectors" and "Small nonnegative integers"): six bits per byte stored as 63 + value, and
/// the size N(n) in one, four or eight bytes. Also finds the single graph line of a file.
/// </summary>
public static class SixBitText
{
    /// <summary>The largest n that N(n) can hold: 2^36 - 1.</summary>
    public const long MaxSize = (1L << 36) - 1;

    /// <summary>The most nodes a graph read from these formats may have (a guard against runaway sizes).</summary>
    public const long MaxNodesRead = 10_000_000;

    /// <summary>N(n): one byte n + 63 for n &lt;= 62, else 126 and 18 bits, else 126 126 and 36 bits.</summary>
    public static string EncodeSize(long n)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(n);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(n, MaxSize);
        if (n <= 62) return ((char)(n + 63)).ToString();
        var sb = new StringBuilder();
        int groups = n <= 258047 ? 3 : 6;
        sb.Append(groups == 3 ? "~" : "~~");
        for (int g = groups - 1; g >= 0; g--) sb.Append((char)(((n >> (6 * g)) & 63) + 63));
        return sb.ToString();
    }

    /// <summary>Packs bits (big-endian in each group of six, zero-padded on the right) into bytes 63..126.</summary>
    public static void AppendBits(StringBuilder sb, IReadOnlyList<bool> bits)
    {
        for (int start = 0; start < bits.Count; start += 6)
        {
            int value = 0;
            for (int k = 0; k < 6; k++)
                value = (value << 1) | (start + k < bits.Count && bits[start + k] ? 1 : 0);
            sb.Append((char)(value + 63));
        }
    }

    /// <summary>One graph line of a file: its text without the header, its line number, and the column of its first byte.</summary>
    public readonly record struct GraphLine(string Text, int Line, int FirstColumn);

    /// <summary>
    /// Finds the one graph line of a graph6 or sparse6 file: an optional header at the very start, blank
    /// lines ignored, CR before LF ignored. A second graph is an error (FlowCert reads one graph per file).
    /// </summary>
    public static GraphLine SingleLine(string text, string fileName, string header, string formatName)
    {
        var lines = text.Split('\n');
        GraphLine? found = null;
        for (int i = 0; i < lines.Length; i++)
        {
            var line = lines[i].TrimEnd('\r');
            int first = 1;
            if (i == 0 && line.StartsWith(header, StringComparison.Ordinal)) { line = line[header.Length..]; first += header.Length; }
            if (line.Length == 0) continue;
            if (found is not null)
                throw new GraphFormatException(fileName, i + 1, first,
                    $"a second graph (the first is on line {found.Value.Line}): FlowCert reads one graph per {formatName} file");
            found = new GraphLine(line, i + 1, first);
        }
        return found ?? throw new GraphFormatException(fileName, 1, 1, $"no graph: the file holds no {formatName} line");
    }

    /// <summary>Reads the bytes of a graph line as six-bit values, checking each is in 63..126.</summary>
    public static int Value(GraphLine line, int position, string fileName)
    {
        char c = line.Text[position];
        if (c < 63 || c > 126)
            throw new GraphFormatException(fileName, line.Line, line.FirstColumn + position,
                $"byte '{Printable(c)}' is outside 63..126 ('?' to '~'), the range of every data byte");
        return c - 63;
    }

    /// <summary>Decodes N(n) starting at a position; returns n and the position after it.</summary>
    public static (long N, int Next) DecodeSize(GraphLine line, int position, string fileName)
    {
        GraphFormatException Short() => new(fileName, line.Line, line.FirstColumn + line.Text.Length,
            "the line ends inside the number of nodes");
        if (position >= line.Text.Length) throw Short();
        int first = Value(line, position, fileName);
        if (first != 63) return (first, position + 1);
        int groups = 3, start = position + 1;
        if (start < line.Text.Length && line.Text[start] == '~') { groups = 6; start++; }
        if (start + groups > line.Text.Length) throw Short();
        long n = 0;
        for (int g = 0; g < groups; g++) n = (n << 6) | (long)Value(line, start + g, fileName);
        return (n, start + groups);
    }

    /// <summary>Refuses sizes beyond <see cref="MaxNodesRead"/>.</summary>
    public static void CheckReadableSize(long n, GraphLine line, string fileName)
    {
        if (n > MaxNodesRead)
            throw new GraphFormatException(fileName, line.Line, line.FirstColumn,
                $"{n} nodes is more than FlowCert reads from one file ({MaxNodesRead})");
    }

    /// <summary>Node names of a graph read from these formats: v0 .. v(n-1), nauty's vertex numbers.</summary>
    public static string NodeName(long vertex) => NumberedNames.Name(vertex);

    /// <summary>The graph of a decoded line: nodes v0..v(n-1), every edge of weight 1, no inputs or outputs.</summary>
    public static OpenGraph Graph(long n, IEnumerable<(long U, long V)> edges)
    {
        var names = new string[n];
        for (long i = 0; i < n; i++) names[i] = NodeName(i);
        return new OpenGraph(names, edges.Select(e => (names[e.U], names[e.V], Algebra.Rational.One)), [], []);
    }

    private static string Printable(char c) => c is >= ' ' and <= '~' ? c.ToString() : $"\\u{(int)c:x4}";
}
