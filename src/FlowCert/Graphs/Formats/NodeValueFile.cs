namespace FlowCert.Graphs.Formats;

/// <summary>
/// The files of one <c>NODE VALUE</c> a line given beside a graph (measurement labels, Gaussian phases,
/// measurement angles): text from <c>#</c> on and blank lines are ignored, spaces and tabs separate the
/// tokens. This reader checks the line's shape and its node (in the graph, not an output, not given
/// before) and hands VALUE, with its line and column, to the caller, which parses it. Every error is a
/// <see cref="GraphFormatException"/> naming file, line and column.
/// </summary>
/// <param name="FileKind">The file in messages, with its article: "a labels file".</param>
/// <param name="Shape">What a line is, for the message on a malformed line: "NODE LABEL, LABEL one of ...".</param>
/// <param name="Item">What a line gives its node, singular and regular: "label" (messages add "s" for two).</param>
/// <param name="ValueIsRestOfLine">VALUE runs to the end of the line (it may hold spaces) rather than being one token.</param>
internal sealed record NodeValueFile(string FileKind, string Shape, string Item, bool ValueIsRestOfLine = false)
{
    /// <summary>The lines of the file at <paramref name="path"/>, read whole within <see cref="InputText.MaxBytes"/>.</summary>
    public IEnumerable<NodeValueLine> Read(string path, OpenGraph graph) => Lines(InputText.ReadAll(path), path, graph);

    /// <summary>
    /// The lines of <paramref name="text"/> that give a node a value, in file order; lazily, so that an error
    /// the caller finds in a VALUE comes before any problem of a later line.
    /// </summary>
    public IEnumerable<NodeValueLine> Lines(string text, string fileName, OpenGraph graph)
    {
        var firstLine = new Dictionary<int, int>();
        var lines = text.Split('\n');
        for (int n = 0; n < lines.Length; n++)
        {
            int lineNumber = n + 1;
            var line = lines[n].TrimEnd('\r');
            int hash = line.IndexOf('#');
            if (hash >= 0) line = line[..hash];
            var tokens = Tokens(line, ValueIsRestOfLine ? 2 : int.MaxValue);
            if (tokens.Count == 0) continue;
            GraphFormatException Error(int token, string problem) => new(fileName, lineNumber, tokens[token].Column, problem);
            if (tokens.Count != 2) throw Error(tokens.Count > 2 ? 2 : 0, $"a line of {FileKind} is {Shape}");
            var name = tokens[0].Text;
            if (!graph.Contains(name)) throw Error(0, $"unknown node '{Excerpt.Of(name)}': the graph has no node of that name");
            int v = graph.IndexOf(name);
            if (graph.Outputs.Contains(v)) throw Error(0, $"node {name} is an output: outputs are never measured and carry no {Item}");
            if (firstLine.TryGetValue(v, out var first)) throw Error(0, $"node {name} has two {Item}s (lines {first} and {lineNumber})");
            firstLine[v] = lineNumber;
            yield return new NodeValueLine(fileName, lineNumber, v, name, tokens[1].Text, tokens[1].Column);
        }
    }

    // The tokens of a line with their 1-based columns; the last of at most `most` runs to the end of the line.
    private static List<(string Text, int Column)> Tokens(string line, int most)
    {
        var list = new List<(string, int)>();
        int i = 0;
        while (i < line.Length)
        {
            if (line[i] is ' ' or '\t') { i++; continue; }
            int start = i;
            if (list.Count == most - 1) i = line.Length;
            else while (i < line.Length && line[i] is not (' ' or '\t')) i++;
            list.Add((line[start..i], start + 1));
        }
        return list;
    }
}

/// <summary>One line of a <see cref="NodeValueFile"/>: its node, the VALUE text and where it stands.</summary>
internal readonly record struct NodeValueLine(string File, int Line, int Node, string Name, string Value, int ValueColumn)
{
    /// <summary>An error in VALUE, <paramref name="offset"/> characters after its first.</summary>
    public GraphFormatException Error(int offset, string problem) => new(File, Line, ValueColumn + offset, problem);
}
