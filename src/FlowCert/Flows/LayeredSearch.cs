using FlowCert.Algebra;

namespace FlowCert.Flows;

/// <summary>What one step of the backwards construction found: the next layer's corrections, or a blocked set.</summary>
internal readonly record struct LayerOutcome(IReadOnlyDictionary<int, NodeVector>? Layer, BlockedSet? Blocked)
{
    public static LayerOutcome Found(IReadOnlyDictionary<int, NodeVector> layer) => new(layer, null);
    public static LayerOutcome Stuck(BlockedSet blocked) => new(null, blocked);
}

/// <summary>
/// The maximally delayed construction shared by both kinds of flow (flows.md section 5): starting from
/// the outputs, ask the kind-specific step for the next layer until every node is processed (a flow; the
/// layers reversed are the rounds) or the step is stuck (no flow; the step names the blocked set).
/// </summary>
internal static class LayeredSearch
{
    public static FlowResult Run<T, TField>(FieldGraph<T, TField> g, FlowKind kind, Func<LayerState, LayerOutcome> step,
        IProgress<SolveProgress>? progress = null)
        where T : struct where TField : struct, IField<T>
    {
        var state = new LayerState(g.Neighbours, g.Graph.Inputs, g.Graph.Outputs);
        var corrections = new Dictionary<int, NodeVector>(state.UnprocessedCount); // its final size when there is a flow
        BlockedSet? blocked = null;
        while (state.UnprocessedCount > 0 && blocked is null)
        {
            var outcome = step(state);
            if (outcome.Layer is { } layer)
            {
                foreach (var (v, c) in layer) corrections[v] = c;
                state.AddLayer(layer.Keys.Order().ToArray());
                progress?.Report(new SolveProgress(state.Layers.Count, g.Graph.NodeCount - state.UnprocessedCount, g.Graph.NodeCount));
            }
            else blocked = outcome.Blocked;
        }
        return new FlowResult
        {
            Graph = g.Graph,
            Field = g.Spec,
            Kind = kind,
            Rounds = blocked is null ? state.Rounds() : [],
            Corrections = blocked is null ? corrections : new Dictionary<int, NodeVector>(),
            Obstruction = blocked,
            VanishedEdges = g.Vanished,
        };
    }

    /// <summary>A node vector of the graph's field from parallel arrays (any order).</summary>
    public static NodeVector ToNodeVector<T, TField>(FieldGraph<T, TField> g, IReadOnlyList<int> nodes, IReadOnlyList<T> values)
        where T : struct where TField : struct, IField<T>
        => NodeVector.Create(g.Spec, nodes, values);
}
