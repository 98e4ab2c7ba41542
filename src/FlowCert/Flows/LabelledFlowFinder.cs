using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Flows;

/// <summary>
/// Generalized flow with measurement planes (flows.md 9.2) and Pauli flow (9.3) over F_2, of minimum
/// depth by the maximally delayed construction (9.4): each step solves, for every unprocessed node v,
/// the <see cref="LabelledSystem"/> of v relative to the unprocessed set, and adds every solvable node as
/// the next layer. When none is solvable, the unprocessed set is blocked and each node's system yields
/// its witness (9.5). With only plane labels the Pauli conditions are those of 9.2, so one finder serves both.
/// </summary>
internal static class LabelledFlowFinder
{
    public static FlowResult Find<T, TField>(FieldGraph<T, TField> g, FlowKind kind)
        where T : struct where TField : struct, IField<T>
    {
        var graph = g.Graph;
        int n = graph.NodeCount;
        var adjacency = new bool[n][];
        for (int u = 0; u < n; u++)
        {
            adjacency[u] = new bool[n];
            foreach (var w in g.Neighbours[u]) adjacency[u][w] = true;
        }
        var inU = new bool[n];
        for (int v = 0; v < n; v++) inU[v] = !graph.Outputs.Contains(v);
        var layers = new List<int[]>();
        var corrections = new Dictionary<int, NodeVector>();
        BlockedSet? blocked = null;
        while (true)
        {
            var unprocessed = Enumerable.Range(0, n).Where(v => inU[v]).ToArray();
            if (unprocessed.Length == 0) break;
            var layer = new List<int>();
            var unsolvable = new List<LabelledSystem>();
            foreach (var v in unprocessed)
            {
                var system = new LabelledSystem(adjacency, graph, inU, unprocessed, v);
                var p = system.Solve();
                if (p is null) { unsolvable.Add(system); continue; }
                layer.Add(v);
                corrections[v] = LayeredSearch.ToNodeVector(g, p, p.Select(_ => g.Field.One).ToArray());
            }
            if (layer.Count == 0)
            {
                // Every node's system is unsolvable: each gives its witness from its one elimination.
                var witnesses = unsolvable
                    .Select(s => s.Witness() ?? throw new InvalidOperationException($"node {graph.Names[s.Node]} is unsolvable but has no witness"))
                    .ToList();
                blocked = new BlockedSet(unprocessed, []) { NodeWitnesses = witnesses };
                break;
            }
            foreach (var v in layer) inU[v] = false;
            layers.Add(layer.ToArray());
        }
        return new FlowResult
        {
            Graph = graph,
            Field = g.Spec,
            Kind = kind,
            Rounds = blocked is null ? Enumerable.Reverse(layers).Select(l => (IReadOnlyList<int>)l).ToList() : [],
            Corrections = blocked is null ? corrections : new Dictionary<int, NodeVector>(),
            Obstruction = blocked,
            VanishedEdges = g.Vanished,
        };
    }
}
