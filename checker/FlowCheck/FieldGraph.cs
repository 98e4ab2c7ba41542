namespace FlowCheck;

/// <summary>The embedded graph read into the field: adjacency (compressed rows) of the non-zero weights.</summary>
public sealed class FieldGraph
{
    public Field Field { get; }
    public Graph Graph { get; }
    readonly int[] start, adjacent, weight;
    readonly Rational[] values;
    /// <summary>Edges whose weight is 0 in the field: they are absent from the adjacency.</summary>
    public List<(int U, int V, int W)> Vanished { get; } = [];

    public FieldGraph(Graph graph, Field field)
    {
        (Field, Graph) = (field, graph);
        var (n, reduced) = (graph.Names.Length, new Rational?[graph.Weights.Count]);
        (start, values) = (new int[n + 1], new Rational[graph.Weights.Count]);
        var kept = new List<(int U, int V, int W)>();
        foreach (var e in graph.Edges)
        {
            var w = reduced[e.W] ??= field.Reduce(graph.Weights[e.W]) ?? throw new InvalidCertificate(
                $"edge {Name(e.U)} {Name(e.V)}: weight {Json.Cut(graph.WeightText[e.W])} has no meaning in {field.Name} (p divides the denominator)");
            values[e.W] = w;
            if (w.Num.IsZero) { Vanished.Add(e); continue; }
            kept.Add(e);
            (start[e.U + 1], start[e.V + 1]) = (start[e.U + 1] + 1, start[e.V + 1] + 1);
        }
        for (var i = 0; i < n; i++) start[i + 1] += start[i];
        (adjacent, weight) = (new int[start[n]], new int[start[n]]);
        var fill = start[..n];
        foreach (var (u, v, w) in kept)
        {
            (adjacent[fill[u]], weight[fill[u]++]) = (v, w);
            (adjacent[fill[v]], weight[fill[v]++]) = (u, w);
        }
    }

    public int Count => Graph.Names.Length;
    /// <summary>A sum of field elements per node, accumulated in <paramref name="sum"/>.</summary>
    public void Add(Dictionary<int, Rational> sum, int node, Rational x) => sum[node] = sum.TryGetValue(node, out var y) ? Field.Add(y, x) : x;
    public string Name(int node) => Graph.Names[node];
    public bool IsInput(int node) => Graph.Input[node];

    /// <summary>The rank of a measured node (a node that is not an output); otherwise throws "<paramref name="where"/>: NAME is not a measured node".</summary>
    public int Measured(string name, string where) => Graph.Index.TryGetValue(name, out var v) && !IsOutput(v) ? v
        : throw new InvalidCertificate($"{where}: {Json.Cut(name)} is not a measured node");
    public bool IsOutput(int node) => Graph.Output[node];

    /// <summary>The neighbours of a node in the field, with the weight of the edge.</summary>
    public IEnumerable<(int Node, Rational A)> Neighbours(int node)
    {
        for (var k = start[node]; k < start[node + 1]; k++) yield return (adjacent[k], values[weight[k]]);
    }
}
