using FlowCert.Algebra;

namespace FlowCert.Flows;

/// <summary>
/// Causal flow of minimum depth (flows.md sections 4, 5, 6): a corrector with exactly one unprocessed
/// neighbour v corrects v; every such v joins the next layer, corrected by its smallest such corrector u,
/// with c_v = e_u / A[v][u]. When no corrector has exactly one unprocessed neighbour, the unprocessed
/// set is blocked.
/// </summary>
internal static class CausalFlowFinder
{
    public static FlowResult Find<T, TField>(FieldGraph<T, TField> g, IProgress<SolveProgress>? progress = null)
        where T : struct where TField : struct, IField<T>
        => LayeredSearch.Run(g, FlowKind.Causal, state => Step(g, state), progress);

    private static LayerOutcome Step<T, TField>(FieldGraph<T, TField> g, LayerState state)
        where T : struct where TField : struct, IField<T>
    {
        var chosen = new SortedDictionary<int, int>();
        foreach (var u in state.Active)
        {
            if (state.UnprocessedNeighbours[u] != 1) continue;
            int v = -1;
            foreach (var w in g.Neighbours[u]) if (!state.Processed[w]) { v = w; break; }
            if (!chosen.TryGetValue(v, out var other) || u < other) chosen[v] = u; // the smallest such corrector
        }
        if (chosen.Count == 0) return LayerOutcome.Stuck(new BlockedSet(state.Unprocessed(), []));
        return LayerOutcome.Found(chosen.ToDictionary(
            p => p.Key, p => LayeredSearch.ToNodeVector(g, [p.Value], [g.Field.Inverse(g.Weight(p.Key, p.Value))])));
    }
}
