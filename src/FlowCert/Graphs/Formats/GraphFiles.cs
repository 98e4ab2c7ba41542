namespace FlowCert.Graphs.Formats;

/// <summary>The graph file formats, each tied to one file extension.</summary>
public enum GraphFileFormat
{
    /// <summary><c>.ograph</c>: the line format of docs/formats.md.</summary>
    Ograph,
    /// <summary><c>.g6</c>: graph6.</summary>
    Graph6,
    /// <summary><c>.s6</c>: sparse6.</summary>
    Sparse6,
    /// <summary><c>.mtx</c>: Matrix Market coordinate.</summary>
    MatrixMarket,
    /// <summary><c>.json</c>: the graph object of a certificate.</summary>
    Json,
    /// <summary><c>.dot</c>: Graphviz (written only).</summary>
    Dot,
}

/// <summary>
/// Reads and writes graph files by their extension. Formats that have no inputs and outputs (graph6,
/// sparse6, Matrix Market) take them from lists of node names given beside the file; formats that have
/// them refuse such lists, so that a file never means two things.
/// </summary>
public static class GraphFiles
{
    private static readonly (string Extension, GraphFileFormat Format)[] Extensions =
    [
        (".ograph", GraphFileFormat.Ograph), (".g6", GraphFileFormat.Graph6), (".s6", GraphFileFormat.Sparse6),
        (".mtx", GraphFileFormat.MatrixMarket), (".json", GraphFileFormat.Json), (".dot", GraphFileFormat.Dot),
    ];

    /// <summary>The format of a path by its extension (case-insensitive); throws <see cref="GraphFileException"/> for any other.</summary>
    public static GraphFileFormat FormatOf(string path)
    {
        var ext = Path.GetExtension(path);
        foreach (var (e, f) in Extensions)
            if (string.Equals(e, ext, StringComparison.OrdinalIgnoreCase)) return f;
        throw new GraphFileException(
            $"{path}: unknown graph file extension '{ext}': use {string.Join(", ", Extensions.Select(x => x.Extension))}");
    }

    /// <summary>
    /// The format of a text without a file name (standard input), from its first characters: <c>{</c>
    /// JSON, <c>%%MatrixMarket</c> Matrix Market, <c>:</c> or <c>&gt;&gt;sparse6&lt;&lt;</c> sparse6,
    /// <c>&gt;&gt;graph6&lt;&lt;</c> or one line of graph6 characters (63 to 126) graph6; anything else .ograph.
    /// </summary>
    public static GraphFileFormat Detect(string text)
    {
        var start = text.AsSpan().TrimStart(" \t\r\n\ufeff");
        if (start.StartsWith("{")) return GraphFileFormat.Json;
        if (start.StartsWith("%%MatrixMarket", StringComparison.OrdinalIgnoreCase)) return GraphFileFormat.MatrixMarket;
        if (start.StartsWith(":") || start.StartsWith(">>sparse6<<")) return GraphFileFormat.Sparse6;
        if (start.StartsWith(">>graph6<<")) return GraphFileFormat.Graph6;
        var first = start.IndexOfAny('\n', '\r') is var end and >= 0 ? start[..end] : start;
        // An .ograph line starts with a keyword, a comment or a blank; a graph6 line is one word of characters 63..126
        foreach (var keyword in (string[])["input", "output", "node", "edge", "at", "#"])
            if (first.StartsWith(keyword, StringComparison.Ordinal)) return GraphFileFormat.Ograph;
        if (first.Length > 0 && !first.ContainsAnyExceptInRange((char)63, (char)126)) return GraphFileFormat.Graph6;
        return GraphFileFormat.Ograph;
    }

    /// <summary>True for the formats that name their own inputs and outputs.</summary>
    public static bool HasTerminals(GraphFileFormat f) => f is GraphFileFormat.Ograph or GraphFileFormat.Json;

    /// <summary>
    /// Reads a graph file. For graph6, sparse6 and Matrix Market files, <paramref name="inputs"/> and
    /// <paramref name="outputs"/> name the inputs and outputs (comma- or space-separated; none when null);
    /// for the others they must be null.
    /// </summary>
    public static OpenGraph Read(string path, string? inputs = null, string? outputs = null)
    {
        var format = FormatOf(path);
        if (format == GraphFileFormat.Dot)
            throw new GraphFileException($"{path}: DOT files are written for Graphviz, not read: use .ograph, .g6, .s6, .mtx or .json");
        if (format == GraphFileFormat.Ograph)
        {
            RefuseSeparateTerminals(path, format, inputs, outputs);
            return OgraphReader.ReadFile(path);
        }
        return Parse(InputText.ReadAll(path), path, format, inputs, outputs);
    }

    /// <summary>Parses text of a given format; see <see cref="Read"/>.</summary>
    public static OpenGraph Parse(string text, string fileName, GraphFileFormat format, string? inputs = null, string? outputs = null)
    {
        RefuseSeparateTerminals(fileName, format, inputs, outputs);
        var graph = format switch
        {
            GraphFileFormat.Ograph => OgraphReader.Parse(text, fileName),
            GraphFileFormat.Json => GraphJson.Parse(text, fileName),
            GraphFileFormat.Graph6 => Graph6.Parse(text, fileName),
            GraphFileFormat.Sparse6 => Sparse6.Parse(text, fileName),
            GraphFileFormat.MatrixMarket => MatrixMarketReader.Parse(text, fileName),
            _ => throw new GraphFileException($"{fileName}: {format} files are not read"),
        };
        return HasTerminals(format) ? graph : WithTerminals(graph, fileName, ParseNames(inputs), ParseNames(outputs));
    }

    private static void RefuseSeparateTerminals(string fileName, GraphFileFormat format, string? inputs, string? outputs)
    {
        if (HasTerminals(format) && (inputs is not null || outputs is not null))
            throw new GraphFileException(
                $"{fileName} names its own inputs and outputs: separate lists are for .g6, .s6 and .mtx files only");
    }

    /// <summary>Writes a graph in a format: .ograph is the canonical form followed by the graph's <c>at</c> lines.</summary>
    public static string Write(OpenGraph g, GraphFileFormat format) => format switch
    {
        GraphFileFormat.Ograph => OgraphWriter.Write(g),
        GraphFileFormat.Json => GraphJson.Write(g),
        GraphFileFormat.Graph6 => Graph6.Write(g),
        GraphFileFormat.Sparse6 => Sparse6.Write(g),
        GraphFileFormat.MatrixMarket => MatrixMarketWriter.Write(g),
        GraphFileFormat.Dot => DotWriter.Write(g),
        _ => throw new GraphFileException($"{format} files are not written"),
    };

    /// <summary>Splits a list of node names at commas and white space; null or blank gives no names.</summary>
    public static IReadOnlyList<string> ParseNames(string? list)
        => list is null ? [] : list.Split([',', ' ', '\t', '\n', '\r'], StringSplitOptions.RemoveEmptyEntries);

    /// <summary>The same graph with the given inputs and outputs; every name must be a node, none twice in one list.</summary>
    public static OpenGraph WithTerminals(OpenGraph g, string fileName, IReadOnlyList<string> inputs, IReadOnlyList<string> outputs)
    {
        void Check(IReadOnlyList<string> names, string role)
        {
            var seen = new HashSet<string>(StringComparer.Ordinal);
            foreach (var n in names)
            {
                if (!g.Contains(n))
                {
                    var order = NaturalNameOrder.Sort(g);
                    throw new GraphFileException(order.Length == 0
                        ? $"{role} {n} is not a node of {fileName}, which has no nodes"
                        : $"{role} {n} is not a node of {fileName} (its nodes are {g.Names[order[0]]} to {g.Names[order[^1]]})");
                }
                if (!seen.Add(n)) throw new GraphFileException($"{role} {n} is listed twice");
            }
        }
        Check(inputs, "input");
        Check(outputs, "output");
        var positions = g.Positions.ToDictionary(kv => g.Names[kv.Key], kv => kv.Value);
        return new OpenGraph(g.Names, g.Edges.Select(e => (g.Names[e.U], g.Names[e.V], e.Weight)), inputs, outputs, positions);
    }
}
