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
    public CompactRows<int> Neighbours { get; }
    /// <summary>The non-zero field weights aligned with <see cref="Neighbours"/>.</summary>
    public CompactRows<T> Weights { get; }
    /// <summary>Edges whose weight is zero in the field, in the graph's edge order.</summary>
    public IReadOnlyList<WeightedEdge> Vanished { get; }

    /// <summary>Maps the weights of <paramref name="graph"/> into <paramref name="field"/>; throws <see cref="WeightNotInFieldException"/> naming the edge when a weight has no value there.</summary>
    public FieldGraph(OpenGraph graph, TField field, FieldSpec spec)
    {
        Graph = graph; Field = field; Spec = spec;
        int n = graph.NodeCount;
        // Two passes over the edges into two flat arrays (no per-node arrays): count, then fill.
        var degree = new int[n];
        var mapped = new T[graph.Edges.Count];
        var kept = new bool[graph.Edges.Count];
        var vanished = new List<WeightedEdge>();
        Rational lastWeight = default;
        T lastMapped = field.Zero;
        for (int k = 0; k < graph.Edges.Count; k++)
        {
            var e = graph.Edges[k];
            if (k > 0 && e.Weight.Equals(lastWeight)) mapped[k] = lastMapped; // runs of one weight (often all 1) map once
            else try { mapped[k] = lastMapped = field.FromRational(lastWeight = e.Weight); }
            catch (NotInFieldException)
            {
                throw new WeightNotInFieldException(
                    $"edge {graph.Names[e.U]} {graph.Names[e.V]} has weight {e.Weight}, which has no value in {spec.Name}: {spec.Prime} divides its denominator");
            }
            if (field.IsZero(mapped[k])) { vanished.Add(e); continue; }
            kept[k] = true;
            degree[e.U]++;
            degree[e.V]++;
        }
        var start = new int[n + 1];
        for (int i = 0; i < n; i++) start[i + 1] = start[i] + degree[i];
        var targets = new int[start[n]];
        var weights = new T[start[n]];
        var fill = start[..n];
        for (int k = 0; k < graph.Edges.Count; k++)
        {
            if (!kept[k]) continue;
            var (u, v) = (graph.Edges[k].U, graph.Edges[k].V);
            (targets[fill[u]], weights[fill[u]++]) = (v, mapped[k]);
            (targets[fill[v]], weights[fill[v]++]) = (u, mapped[k]);
        }
        // Edges come sorted by (U, V), which already sorts every list; sort anyway if a list is not.
        for (int i = 0; i < n; i++)
            for (int j = start[i] + 1; j < start[i + 1]; j++)
                if (targets[j - 1] > targets[j]) { Array.Sort(targets, weights, start[i], degree[i]); break; }
        Neighbours = new CompactRows<int>(start, targets);
        Weights = new CompactRows<T>(start, weights);
        Vanished = vanished;
    }

    /// <summary>A[u][v] in the field (zero when not adjacent).</summary>
    public T Weight(int u, int v)
    {
        int k = Neighbours[u].BinarySearch(v);
        return k >= 0 ? Weights[u][k] : Field.Zero;
    }
}

/// <summary>Rows of different lengths stored end to end in one array: row i is items[start[i] .. start[i + 1]).</summary>
internal sealed class CompactRows<TItem>(int[] start, TItem[] items)
{
    /// <summary>The number of rows.</summary>
    public int Count => start.Length - 1;

    /// <summary>Row i.</summary>
    public ReadOnlySpan<TItem> this[int i] => items.AsSpan(start[i], start[i + 1] - start[i]);
}
