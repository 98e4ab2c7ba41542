using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Flows;

/// <summary>A weight that has no value in the chosen field; names the edge.</summary>
public sealed class WeightNotInFieldException(string message) : Exception(message);

/// <summary>
/// The adjacency of an open graph with its weights mapped into a field: sorted neighbour lists and
/// their non-zero weights. Edges whose weight is zero in the field are left out and listed.
/// </summary>
internal sealed class FieldGraph<T, TField> where T : struct where TField : struct, IField<T>
{
    /// <summary>The field the weights were mapped into.</summary>
    public TField Field { get; }
    /// <summary>The open graph this adjacency comes from.</summary>
    public OpenGraph Graph { get; }
    /// <summary>Which field <see cref="Field"/> is.</summary>
    public FieldSpec Spec { get; }
    /// <summary>Sorted neighbour indices of each node, over edges whose weight is non-zero in the field.</summary>
    public int[][] Neighbours { get; }
    /// <summary>The non-zero field weights aligned with <see cref="Neighbours"/>.</summary>
    public T[][] Weights { get; }
    /// <summary>Edges whose weight is zero in the field, in the graph's edge order.</summary>
    public IReadOnlyList<WeightedEdge> Vanished { get; }

    /// <summary>Maps the weights of <paramref name="graph"/> into <paramref name="field"/>; throws <see cref="WeightNotInFieldException"/> naming the edge when a weight has no value there.</summary>
    public FieldGraph(OpenGraph graph, TField field, FieldSpec spec)
    {
        Graph = graph; Field = field; Spec = spec;
        int n = graph.NodeCount;
        var nb = new List<(int, T)>[n];
        for (int i = 0; i < n; i++) nb[i] = [];
        var vanished = new List<WeightedEdge>();
        foreach (var e in graph.Edges)
        {
            T w;
            try { w = field.FromRational(e.Weight); }
            catch (NotInFieldException)
            {
                throw new WeightNotInFieldException(
                    $"edge {graph.Names[e.U]} {graph.Names[e.V]} has weight {e.Weight}, which has no value in {spec.Name}: {spec.Prime} divides its denominator");
            }
            if (field.IsZero(w)) { vanished.Add(e); continue; }
            nb[e.U].Add((e.V, w));
            nb[e.V].Add((e.U, w));
        }
        Neighbours = new int[n][];
        Weights = new T[n][];
        for (int i = 0; i < n; i++)
        {
            nb[i].Sort((a, b) => a.Item1.CompareTo(b.Item1));
            Neighbours[i] = nb[i].Select(x => x.Item1).ToArray();
            Weights[i] = nb[i].Select(x => x.Item2).ToArray();
        }
        Vanished = vanished;
    }

    /// <summary>A[u][v] in the field (zero when not adjacent).</summary>
    public T Weight(int u, int v)
    {
        int k = Array.BinarySearch(Neighbours[u], v);
        return k >= 0 ? Weights[u][k] : Field.Zero;
    }
}
