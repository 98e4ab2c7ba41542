using FlowCert.Algebra;

namespace FlowCert.Graphs;

/// <summary>An undirected weighted edge between node indices U &lt; V.</summary>
public readonly record struct WeightedEdge(int U, int V, Rational Weight);

/// <summary>An optional drawing position of a node (decimal coordinates as written).</summary>
public readonly record struct PositionHint(decimal X, decimal Y);

/// <summary>
/// An open graph (V, A, I, O) with exact rational weights. Nodes are indexed in ordinal order of their
/// names, so every traversal in index order is deterministic. Immutable.
/// </summary>
public sealed class OpenGraph
{
    /// <summary>Node names, sorted ordinally; the index of a node is its position here.</summary>
    public IReadOnlyList<string> Names { get; }
    /// <summary>Edges with U &lt; V, sorted by (U, V).</summary>
    public IReadOnlyList<WeightedEdge> Edges { get; }
    public IReadOnlySet<int> Inputs { get; }
    public IReadOnlySet<int> Outputs { get; }
    /// <summary>Drawing hints by node index (ignored by the solver).</summary>
    public IReadOnlyDictionary<int, PositionHint> Positions { get; }
    private readonly Dictionary<string, int> index;

    public int NodeCount => Names.Count;

    /// <summary>
    /// Builds a graph from names, edges given by name, inputs and outputs. Throws
    /// <see cref="ArgumentException"/> on an unknown name, a self-loop, a zero weight or a repeated edge.
    /// </summary>
    public OpenGraph(IEnumerable<string> names, IEnumerable<(string U, string V, Rational Weight)> edges,
        IEnumerable<string> inputs, IEnumerable<string> outputs, IReadOnlyDictionary<string, PositionHint>? positions = null)
    {
        var sorted = names.Distinct().ToArray();
        Array.Sort(sorted, StringComparer.Ordinal);
        Names = sorted;
        index = new Dictionary<string, int>(sorted.Length, StringComparer.Ordinal);
        for (int i = 0; i < sorted.Length; i++) index[sorted[i]] = i;
        var list = new List<WeightedEdge>();
        var seen = new HashSet<(int, int)>();
        foreach (var (u, v, w) in edges)
        {
            int a = IndexOf(u), b = IndexOf(v);
            if (a == b) throw new ArgumentException($"self-loop on node {u}");
            if (w.IsZero) throw new ArgumentException($"edge {u} {v} has weight zero");
            var key = a < b ? (a, b) : (b, a);
            if (!seen.Add(key)) throw new ArgumentException($"edge {u} {v} appears twice");
            list.Add(new WeightedEdge(key.Item1, key.Item2, w));
        }
        list.Sort((x, y) => x.U != y.U ? x.U.CompareTo(y.U) : x.V.CompareTo(y.V));
        Edges = list;
        Inputs = inputs.Select(IndexOf).ToHashSet();
        Outputs = outputs.Select(IndexOf).ToHashSet();
        Positions = (positions ?? new Dictionary<string, PositionHint>()).ToDictionary(kv => IndexOf(kv.Key), kv => kv.Value);
    }

    /// <summary>The index of a node name; throws <see cref="ArgumentException"/> for an unknown name.</summary>
    public int IndexOf(string name)
        => index.TryGetValue(name, out var i) ? i : throw new ArgumentException($"unknown node '{name}'");

    public bool Contains(string name) => index.ContainsKey(name);

    /// <summary>Inputs as sorted indices.</summary>
    public int[] SortedInputs => Inputs.Order().ToArray();
    /// <summary>Outputs as sorted indices.</summary>
    public int[] SortedOutputs => Outputs.Order().ToArray();

    /// <summary>Measured nodes M = V \ O, sorted.</summary>
    public int[] Measured => Enumerable.Range(0, NodeCount).Where(v => !Outputs.Contains(v)).ToArray();

    /// <summary>Nodes without any edge, sorted.</summary>
    public int[] IsolatedNodes()
    {
        var touched = new bool[NodeCount];
        foreach (var e in Edges) { touched[e.U] = true; touched[e.V] = true; }
        return Enumerable.Range(0, NodeCount).Where(v => !touched[v]).ToArray();
    }
}
