namespace FlowCert.Graphs.Formats;

/// <summary>
/// The measurement labels of a graph6, sparse6 or Matrix Market graph, given beside it (docs/formats.md):
/// one <c>NODE LABEL</c> a line, <c>#</c> comments and blank lines ignored. Errors name file, line and column.
/// </summary>
public static class LabelsFile
{
    /// <summary>Reads a labels file for <paramref name="graph"/> and returns the graph with them.</summary>
    public static OpenGraph Apply(OpenGraph graph, string path) => Apply(graph, InputText.ReadAll(path), path);

    /// <summary>Applies labels text to <paramref name="graph"/>; throws <see cref="GraphFormatException"/> on the first problem.</summary>
    public static OpenGraph Apply(OpenGraph graph, string text, string fileName)
    {
        var labels = new Dictionary<int, MeasurementLabel>();
        var firstLine = new Dictionary<int, int>();
        var lines = text.Split('\n');
        for (int n = 0; n < lines.Length; n++)
        {
            var line = lines[n].TrimEnd('\r');
            int hash = line.IndexOf('#');
            if (hash >= 0) line = line[..hash];
            var tokens = Tokens(line);
            if (tokens.Count == 0) continue;
            GraphFormatException Error(int k, string problem) => new(fileName, n + 1, tokens[Math.Min(k, tokens.Count - 1)].Start + 1, problem);
            if (tokens.Count != 2) throw Error(tokens.Count > 2 ? 2 : 0, $"a line of a labels file is NODE LABEL, LABEL one of {MeasurementLabels.Choices}");
            var name = tokens[0].Text;
            if (!graph.Contains(name)) throw Error(0, $"unknown node '{Excerpt.Of(name)}': {fileName} labels nodes of the graph");
            int v = graph.IndexOf(name);
            if (!MeasurementLabels.TryParse(tokens[1].Text, out var label))
                throw Error(1, $"unknown label '{Excerpt.Of(tokens[1].Text)}': write {MeasurementLabels.Choices}");
            if (firstLine.TryGetValue(v, out var first)) throw Error(0, $"node {name} has two labels (lines {first} and {n + 1})");
            if (graph.Outputs.Contains(v)) throw Error(0, $"node {name} is an output: outputs are never measured and carry no label");
            firstLine[v] = n + 1;
            labels[v] = label;
        }
        return graph.WithLabels(labels);
    }

    private static List<(int Start, string Text)> Tokens(string line)
    {
        var list = new List<(int, string)>();
        int i = 0;
        while (i < line.Length)
        {
            if (line[i] is ' ' or '\t') { i++; continue; }
            int start = i;
            while (i < line.Length && line[i] is not (' ' or '\t')) i++;
            list.Add((start, line[start..i]));
        }
        return list;
    }
}
