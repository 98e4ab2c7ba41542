using FlowCert.Algebra;

namespace FlowCert.Flows;

/// <summary>
/// Generalized flow of minimum depth over a field (flows.md sections 3, 5, 6). Each layer eliminates only
/// the frontier block A[F, C'] (unprocessed rows F touching active correctors C'), solves B c = e_v for
/// every frontier row at once, and adds every solvable row as the next layer. When no row is solvable,
/// the unprocessed set is blocked, and the left kernel of the block gives the witnesses.
/// </summary>
internal static class GeneralFlowFinder
{
    public static FlowResult Find<T, TField>(FieldGraph<T, TField> g, IProgress<SolveProgress>? progress = null)
        where T : struct where TField : struct, IField<T>
        => LayeredSearch.Run(g, FlowKind.General, state => Step(g, state), progress);

    private static LayerOutcome Step<T, TField>(FieldGraph<T, TField> g, LayerState state)
        where T : struct where TField : struct, IField<T>
    {
        var f = g.Field;
        var rows = state.Frontier();
        var matrix = new SparseVector<T>[rows.Length];
        for (int r = 0; r < rows.Length; r++)
        {
            var nb = g.Neighbours[rows[r]];
            var wt = g.Weights[rows[r]];
            int count = 0;
            foreach (var w in nb) if (state.IsCorrector[w]) count++;
            var (idx, val) = (new int[count], new T[count]);
            for (int k = 0, n = 0; k < nb.Length; k++)
                if (state.IsCorrector[nb[k]]) (idx[n], val[n++]) = (nb[k], wt[k]);
            matrix[r] = new SparseVector<T>(idx, val);
        }
        var elimination = Elimination.Run(f, matrix);
        var solutions = elimination.SolveUnitVectors();
        if (solutions.Count == 0)
            return LayerOutcome.Stuck(Obstruction(g, state.Unprocessed(), rows, elimination));
        var layer = new Dictionary<int, NodeVector>(solutions.Count);
        foreach (var (r, c) in solutions) layer[rows[r]] = NodeVector.Take(g.Spec, c.Indices, c.Values); // the solutions are made afresh for this layer
        return LayerOutcome.Found(layer);
    }

    /// <summary>
    /// Witnesses for a blocked set: one vector that is 1 on every blocked node off the frontier (their rows
    /// of A[U, C] are zero), then the reduced echelon basis of the block's left kernel (unique for the
    /// kernel, so independent of how it was computed), each kept only if it covers a node not yet covered.
    /// </summary>
    private static BlockedSet Obstruction<T, TField>(FieldGraph<T, TField> g, int[] blocked, int[] rows, IEliminationResult<T> elimination)
        where T : struct where TField : struct, IField<T>
    {
        var f = g.Field;
        var witnesses = new List<NodeVector>();
        var onFrontier = new HashSet<int>(rows);
        var isolated = blocked.Where(v => !onFrontier.Contains(v)).ToArray();
        if (isolated.Length > 0)
            witnesses.Add(LayeredSearch.ToNodeVector(g, isolated, isolated.Select(_ => f.One).ToArray()));
        var covered = new HashSet<int>(isolated);
        foreach (var y in new SparseElimination<T, TField>(f, elimination.LeftKernel()).ReducedRows())
        {
            var nodes = y.Indices.Select(r => rows[r]).ToArray();
            if (nodes.All(covered.Contains)) continue;
            witnesses.Add(LayeredSearch.ToNodeVector(g, nodes, y.Values));
            covered.UnionWith(nodes);
        }
        return new BlockedSet(blocked, witnesses);
    }
}
