using FlowCert.Algebra;
using FlowCert.Flows;

namespace FlowCert.Schedules;

/// <summary>A flow certificate that cannot be turned into a schedule; the message names the node.</summary>
public sealed class ScheduleException(string message) : Exception(message);

/// <summary>
/// The correction vectors of a flow result parsed into a field, with A c_v computed there, and the round
/// of every node. Checks the shape (rounds partition the measured nodes, one parsable correction vector
/// per measured node), not the flow conditions (the certificate reader has already checked that every value is a canonical element of the field): see <see cref="FlowConditionCheck"/>.
/// </summary>
internal sealed class CorrectionSystem<T, TField> where T : struct where TField : struct, IField<T>
{
    /// <summary>The graph with its weights in the field.</summary>
    public FieldGraph<T, TField> Graph { get; }
    /// <summary>c_v for every measured v.</summary>
    public IReadOnlyDictionary<int, SparseVector<T>> Correction { get; }
    /// <summary>A c_v for every measured v (A taken in the field).</summary>
    public IReadOnlyDictionary<int, SparseVector<T>> Image { get; }
    /// <summary>The round of every node: 1..depth for measured nodes, 0 for outputs.</summary>
    public int[] RoundOf { get; }
    /// <summary>Measured nodes in measurement order: round by round, by node index within a round.</summary>
    public int[] Order { get; }

    private CorrectionSystem(FieldGraph<T, TField> graph, Dictionary<int, SparseVector<T>> c, Dictionary<int, SparseVector<T>> image, int[] roundOf, int[] order)
    {
        Graph = graph; Correction = c; Image = image; RoundOf = roundOf; Order = order;
    }

    /// <summary>
    /// Parses the corrections of a flow result. Throws <see cref="ScheduleException"/> for a noflow result
    /// or a malformed schedule, <see cref="WeightNotInFieldException"/> for a weight with no value in the field.
    /// </summary>
    public static CorrectionSystem<T, TField> Create(FlowResult r, TField field)
    {
        var g = r.Graph;
        if (!r.HasFlow)
            throw new ScheduleException("the certificate says no flow exists (verdict noflow): there is no schedule to run");
        var graph = new FieldGraph<T, TField>(g, field, r.Field);
        var roundOf = new int[g.NodeCount];
        var order = new List<int>();
        for (int k = 0; k < r.Rounds.Count; k++)
        {
            if (r.Rounds[k].Count == 0) throw new ScheduleException($"round {k + 1} is empty");
            foreach (var v in r.Rounds[k].Order())
            {
                if (g.Outputs.Contains(v)) throw new ScheduleException($"output {g.Names[v]} is scheduled for measurement in round {k + 1}");
                if (roundOf[v] != 0) throw new ScheduleException($"node {g.Names[v]} is measured twice (rounds {roundOf[v]} and {k + 1})");
                roundOf[v] = k + 1;
                order.Add(v);
            }
        }
        foreach (var v in g.Measured)
            if (roundOf[v] == 0) throw new ScheduleException($"measured node {g.Names[v]} is in no round");
        var c = new Dictionary<int, SparseVector<T>>();
        var image = new Dictionary<int, SparseVector<T>>();
        foreach (var v in r.Corrections.Keys)
            if (roundOf[v] == 0) throw new ScheduleException($"node {g.Names[v]} has a correction vector but is not measured");
        foreach (var v in order)
        {
            if (!r.Corrections.TryGetValue(v, out var vector)) throw new ScheduleException($"measured node {g.Names[v]} has no correction vector");
            var idx = new List<int>();
            var val = new List<T>();
            var values = vector.Values<T>();
            for (int k = 0; k < vector.Count; k++)
            {
                if (field.IsZero(values[k])) continue;
                idx.Add(vector.Nodes[k]); val.Add(values[k]);
            }
            var cv = new SparseVector<T>(idx.ToArray(), val.ToArray());
            c[v] = cv;
            image[v] = Multiply(graph, cv);
        }
        return new CorrectionSystem<T, TField>(graph, c, image, roundOf, order.ToArray());
    }

    /// <summary>A x for a sparse x, with A the weighted adjacency matrix in the field.</summary>
    public static SparseVector<T> Multiply(FieldGraph<T, TField> graph, SparseVector<T> x)
    {
        var f = graph.Field;
        var sum = new SortedDictionary<int, T>();
        for (int k = 0; k < x.Count; k++)
        {
            int u = x.Indices[k];
            var nb = graph.Neighbours[u];
            var wt = graph.Weights[u];
            for (int j = 0; j < nb.Length; j++)
            {
                var term = f.Multiply(wt[j], x.Values[k]);
                sum[nb[j]] = sum.TryGetValue(nb[j], out var s) ? f.Add(s, term) : term;
            }
        }
        var nonZero = sum.Where(kv => !f.IsZero(kv.Value)).ToArray();
        return new SparseVector<T>(nonZero.Select(kv => kv.Key).ToArray(), nonZero.Select(kv => kv.Value).ToArray());
    }

    /// <summary>True when w is later than v: an output, or measured in a later round (flows.md section 2).</summary>
    public bool IsLater(int w, int v) => RoundOf[w] == 0 || RoundOf[w] > RoundOf[v];
}
