namespace FlowCheck;

/// <summary>The embedded graph read into the field: adjacency of the non-zero weights, node roles.</summary>
public sealed class FieldGraph
{
    public Field Field { get; }
    public HashSet<string> Nodes { get; }
    public HashSet<string> Inputs { get; }
    public HashSet<string> Outputs { get; }
    public Dictionary<string, Dictionary<string, Rational>> Adjacent { get; } = [];
    /// <summary>Edges whose weight is 0 in the field: they are absent from <see cref="Adjacent"/>.</summary>
    public List<Edge> Vanished { get; } = [];

    public FieldGraph(OpenGraph graph, Field field)
    {
        Field = field;
        Nodes = graph.Nodes.ToHashSet();
        Inputs = graph.Inputs.ToHashSet();
        Outputs = graph.Outputs.ToHashSet();
        foreach (var n in graph.Nodes) Adjacent[n] = [];
        foreach (var e in graph.Edges)
        {
            var w = field.Reduce(e.W) ?? throw new InvalidCertificate(
                $"edge {e.U} {e.V}: weight {e.W} has no meaning in {field.Name} (p divides the denominator)");
            if (w.Num.IsZero) { Vanished.Add(e); continue; }
            Adjacent[e.U][e.V] = w;
            Adjacent[e.V][e.U] = w;
        }
    }

    public bool IsMeasured(string node) => Nodes.Contains(node) && !Outputs.Contains(node);
}
