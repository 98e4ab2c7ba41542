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
    /// <summary>The inputs I (not prepared in the plus state; never correctors), by node index.</summary>
    public IReadOnlySet<int> Inputs { get; }
    /// <summary>The outputs O (never measured), by node index.</summary>
    public IReadOnlySet<int> Outputs { get; }
    /// <summary>Drawing hints by node index (ignored by the solver).</summary>
    public IReadOnlyDictionary<int, PositionHint> Positions { get; }
    /// <summary>The measurement label of every measured node whose label is not XY, by node index (flows.md section 9).</summary>
    public IReadOnlyDictionary<int, MeasurementLabel> Labels { get; private init; } = EmptyLabels;
    private static readonly Dictionary<int, MeasurementLabel> EmptyLabels = new();
    // Name to index, built on first use (the solver never needs it; readers of certificates do).
    private Dictionary<string, int>? index;
    private Dictionary<string, int> Index => LazyInitializer.EnsureInitialized(ref index, () => BuildIndex((string[])Names));

    /// <summary>The label of a node: XY unless one was given.</summary>
    public MeasurementLabel Label(int v) => Labels.TryGetValue(v, out var l) ? l : MeasurementLabel.XY;

    /// <summary>True when some node has a label other than XY.</summary>
    public bool HasLabels => Labels.Count > 0;

    /// <summary>
    /// The same graph with these labels (by node index) in place of its own; XY entries are dropped (XY is
    /// the default). Throws <see cref="ArgumentException"/> for a label on an output.
    /// </summary>
    public OpenGraph WithLabels(IReadOnlyDictionary<int, MeasurementLabel> labels)
    {
        var kept = new Dictionary<int, MeasurementLabel>();
        foreach (var (v, l) in labels)
        {
            if (v < 0 || v >= NodeCount) throw new ArgumentException($"no node with index {v}");
            if (Outputs.Contains(v)) throw new ArgumentException($"node {Names[v]} is an output: outputs are never measured and carry no label");
            if (l != MeasurementLabel.XY) kept[v] = l;
        }
        return new OpenGraph(Names.ToArray(), (List<WeightedEdge>)Edges, (HashSet<int>)Inputs, (HashSet<int>)Outputs,
            (Dictionary<int, PositionHint>)Positions) { Labels = kept };
    }

    /// <summary>The number of nodes |V|.</summary>
    public int NodeCount => Names.Count;

    /// <summary>
    /// Builds a graph from names, edges given by name, inputs and outputs. Throws
    /// <see cref="ArgumentException"/> on an unknown name, a self-loop, a zero weight or a repeated edge.
    /// </summary>
    public OpenGraph(IEnumerable<string> names, IEnumerable<(string U, string V, Rational Weight)> edges,
        IEnumerable<string> inputs, IEnumerable<string> outputs, IReadOnlyDictionary<string, PositionHint>? positions = null)
    {
        var sorted = SortedDistinct(names);
        Names = sorted;
        index = BuildIndex(sorted);
        var keys = new List<long>();
        var weights = new List<Rational>();
        var seen = new HashSet<long>(PackedEdgeKeyComparer.Instance);
        foreach (var (u, v, w) in edges)
        {
            int a = IndexOf(u), b = IndexOf(v);
            if (a == b) throw new ArgumentException($"self-loop on node {u}");
            if (w.IsZero) throw new ArgumentException($"edge {u} {v} has weight zero");
            long key = a < b ? Pack(a, b) : Pack(b, a);
            if (!seen.Add(key)) throw new ArgumentException($"edge {u} {v} appears twice");
            keys.Add(key);
            weights.Add(w);
        }
        Edges = SortedEdges(keys.ToArray(), weights.ToArray());
        var inputSet = new HashSet<int>();
        foreach (var name in inputs) inputSet.Add(IndexOf(name));
        Inputs = inputSet;
        var outputSet = new HashSet<int>();
        foreach (var name in outputs) outputSet.Add(IndexOf(name));
        Outputs = outputSet;
        var hints = new Dictionary<int, PositionHint>();
        if (positions is not null)
            foreach (var (name, hint) in positions) hints.Add(IndexOf(name), hint);
        Positions = hints;
    }

    private OpenGraph(string[] sortedNames, List<WeightedEdge> edges, HashSet<int> inputs, HashSet<int> outputs,
        Dictionary<int, PositionHint> positions)
    {
        Names = sortedNames;
        Edges = edges;
        Inputs = inputs;
        Outputs = outputs;
        Positions = positions;
    }

    /// <summary>
    /// Builds a graph from already checked parts: distinct names in ordinal order, edges as packed
    /// (U, V) index pairs with U &lt; V, sorted and distinct, with their nonzero weights; inputs, outputs
    /// and positions by index. The graph takes the arrays over.
    /// </summary>
    internal static OpenGraph FromSortedEdges(string[] sortedNames, long[] sortedKeys, Rational[] weights,
        IEnumerable<int> inputs, IEnumerable<int> outputs, Dictionary<int, PositionHint> positions)
    {
        var list = new List<WeightedEdge>(sortedKeys.Length);
        for (int e = 0; e < sortedKeys.Length; e++)
            list.Add(new WeightedEdge((int)(sortedKeys[e] >> 32), (int)(uint)sortedKeys[e], weights[e]));
        return new OpenGraph(sortedNames, list, new HashSet<int>(inputs), new HashSet<int>(outputs), positions);
    }

    private static long Pack(int u, int v) => ((long)u << 32) | (uint)v;

    /// <summary>Edges from packed (U, V) keys, all distinct, sorted by (U, V); sorts both arrays in place.</summary>
    private static List<WeightedEdge> SortedEdges(long[] keys, Rational[] weights)
    {
        Array.Sort(keys, weights);
        var list = new List<WeightedEdge>(keys.Length);
        for (int e = 0; e < keys.Length; e++)
            list.Add(new WeightedEdge((int)(keys[e] >> 32), (int)(uint)keys[e], weights[e]));
        return list;
    }

    private static string[] SortedDistinct(IEnumerable<string> names)
    {
        var all = names.ToArray();
        Array.Sort(all, StringComparer.Ordinal);
        int kept = 0;
        for (int i = 0; i < all.Length; i++)
            if (kept == 0 || !string.Equals(all[i], all[kept - 1], StringComparison.Ordinal)) all[kept++] = all[i];
        Array.Resize(ref all, kept);
        return all;
    }

    private static Dictionary<string, int> BuildIndex(string[] sorted)
    {
        var map = new Dictionary<string, int>(sorted.Length, StringComparer.Ordinal);
        for (int i = 0; i < sorted.Length; i++) map.Add(sorted[i], i);
        return map;
    }

    /// <summary>The index of a node name; throws <see cref="ArgumentException"/> for an unknown name.</summary>
    public int IndexOf(string name)
        => Index.TryGetValue(name, out var i) ? i : throw new ArgumentException($"unknown node '{name}'");

    /// <summary>True when the graph has a node of this name.</summary>
    public bool Contains(string name) => Index.ContainsKey(name);

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

/// <summary>
/// Equality of packed (U, V) edge keys with a mixed hash: the default <see cref="long"/> hash is U xor V,
/// which collides heavily on lattices.
/// </summary>
internal sealed class PackedEdgeKeyComparer : IEqualityComparer<long>
{
    public static readonly PackedEdgeKeyComparer Instance = new();
    public bool Equals(long x, long y) => x == y;
    public int GetHashCode(long key)
    {
        ulong h = (ulong)key * 0x9E3779B97F4A7C15UL;
        return (int)(h >> 32) ^ (int)h;
    }
}
