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
    public static FlowResult Find<T, TField>(FieldGraph<T, TField> g)
        where T : struct where TField : struct, IField<T>
    {
        var f = g.Field;
        var state = new LayerState(g.Neighbours, g.Graph.Inputs, g.Graph.Outputs);
        var corrections = new Dictionary<int, NodeVector>();
        while (state.UnprocessedCount > 0)
        {
            var frontier = new SortedSet<int>();
            foreach (var c in state.Active)
                foreach (var w in g.Neighbours[c])
                    if (!state.Processed[w]) frontier.Add(w);
            var rows = frontier.ToArray();
            var matrix = new SparseVector<T>[rows.Length];
            for (int r = 0; r < rows.Length; r++)
            {
                var nb = g.Neighbours[rows[r]];
                var wt = g.Weights[rows[r]];
                var idx = new List<int>();
                var val = new List<T>();
                for (int k = 0; k < nb.Length; k++)
                    if (state.IsCorrector[nb[k]]) { idx.Add(nb[k]); val.Add(wt[k]); }
                matrix[r] = new SparseVector<T>(idx.ToArray(), val.ToArray());
            }
            var elimination = Elimination.Run(f, matrix);
            var solutions = elimination.SolveUnitVectors();
            if (solutions.Count == 0)
                return Result(g, state, corrections, Obstruction(g, state.Unprocessed(), rows, elimination));
            var layer = solutions.Keys.Select(r => rows[r]).Order().ToArray();
            foreach (var (r, c) in solutions)
                corrections[rows[r]] = ToNodeVector(f, c.Indices, c.Values);
            state.AddLayer(layer);
        }
        return Result(g, state, corrections, null);
    }

    private static BlockedSet Obstruction<T, TField>(FieldGraph<T, TField> g, int[] blocked, int[] rows, IEliminationResult<T> elimination)
        where T : struct where TField : struct, IField<T>
    {
        var f = g.Field;
        var witnesses = new List<NodeVector>();
        var covered = new HashSet<int>(rows);
        // Unprocessed nodes with no corrector neighbour have a zero row in A[U, C]: one witness covers them all.
        var isolated = blocked.Where(v => !covered.Contains(v)).ToArray();
        if (isolated.Length > 0)
            witnesses.Add(ToNodeVector(f, isolated, isolated.Select(_ => f.One).ToArray()));
        covered = [.. isolated];
        foreach (var y in elimination.LeftKernel())
        {
            var nodes = y.Indices.Select(r => rows[r]).ToArray();
            if (nodes.All(covered.Contains)) continue;
            witnesses.Add(ToNodeVector(f, nodes, y.Values));
            covered.UnionWith(nodes);
        }
        return new BlockedSet(blocked, witnesses);
    }

    internal static NodeVector ToNodeVector<T, TField>(TField f, int[] nodes, T[] values)
        where T : struct where TField : struct, IField<T>
        => new(nodes.Zip(values).Select(p => (p.First, f.Format(p.Second))).OrderBy(p => p.Item1).ToList());

    internal static FlowResult Result<T, TField>(FieldGraph<T, TField> g, LayerState state, Dictionary<int, NodeVector> corrections, BlockedSet? obstruction, FlowKind kind = FlowKind.General)
        where T : struct where TField : struct, IField<T>
        => new()
        {
            Graph = g.Graph,
            Field = g.Spec,
            Kind = kind,
            Rounds = obstruction is null ? state.Rounds() : [],
            Corrections = obstruction is null ? corrections : new Dictionary<int, NodeVector>(),
            Obstruction = obstruction,
            VanishedEdges = g.Vanished,
        };
}
