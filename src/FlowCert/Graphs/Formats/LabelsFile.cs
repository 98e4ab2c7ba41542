namespace FlowCert.Graphs.Formats;

/// <summary>
/// The measurement labels of a graph6, sparse6 or Matrix Market graph, given beside it (docs/formats.md):
/// one <c>NODE LABEL</c> a line, <c>#</c> comments and blank lines ignored. Errors name file, line and column.
/// </summary>
public static class LabelsFile
{
    private static readonly NodeValueFile Syntax = new("a labels file", $"NODE LABEL, LABEL one of {MeasurementLabels.Choices}", "label");

    /// <summary>Reads a labels file for <paramref name="graph"/> and returns the graph with them.</summary>
    public static OpenGraph Apply(OpenGraph graph, string path) => FromLines(graph, Syntax.Read(path, graph));

    /// <summary>Applies labels text to <paramref name="graph"/>; throws <see cref="GraphFormatException"/> on the first problem.</summary>
    public static OpenGraph Apply(OpenGraph graph, string text, string fileName) => FromLines(graph, Syntax.Lines(text, fileName, graph));

    private static OpenGraph FromLines(OpenGraph graph, IEnumerable<NodeValueLine> lines)
    {
        var labels = new Dictionary<int, MeasurementLabel>();
        foreach (var line in lines)
        {
            if (!MeasurementLabels.TryParse(line.Value, out var label))
                throw line.Error(0, $"unknown label '{Excerpt.Of(line.Value)}': write {MeasurementLabels.Choices}");
            labels[line.Node] = label;
        }
        return graph.WithLabels(labels);
    }
}
