using FlowCert.Algebra;

namespace FlowCert.Flows;

/// <summary>
/// When the flow search stops eliminating each layer's block afresh and carries one reduced form from
/// layer to layer instead (<see cref="CarriedEchelon{T, TField}"/>): over F_p with p odd (F_2 keeps its packed
/// bit kernel, Q its multi-modular one, both much faster per entry than the carried form's word
/// arithmetic), once the block's rank bound min(rows, columns) is at least <see cref="Ratio"/> times the
/// last layer's size and <see cref="MinRank"/>, and the dense rows fit in <see cref="MaxEntries"/> entries.
/// </summary>
internal readonly record struct CarryRule(int Ratio, int MinRank, long MaxEntries)
{
    /// <summary>The rule of the command line: a fresh elimination costs about min(m, c) row passes at a few
    /// entries per instruction, a carried layer about twice the layer's size in passes at one entry each.</summary>
    public static readonly CarryRule Default = new(4, 64, 1L << 24);
    /// <summary>Carry from the second layer on (the first has no layer before it), whatever the sizes (tests: both ways must agree byte for byte).</summary>
    public static readonly CarryRule Always = new(0, 0, long.MaxValue);
    /// <summary>Never carry.</summary>
    public static readonly CarryRule Never = new(0, int.MaxValue, 0);
}

/// <summary>
/// Generalized flow of minimum depth over a field (flows.md sections 3, 5, 6). Each layer eliminates only
/// the frontier block A[F, C'] (unprocessed rows F touching active correctors C'), solves B c = e_v for
/// every frontier row at once, and adds every solvable row as the next layer. When no row is solvable,
/// the unprocessed set is blocked, and the left kernel of the block gives the witnesses. On dense blocks
/// with thin layers the reduced form is carried from layer to layer (<see cref="CarryRule"/>); its answers
/// are the same canonical ones, so the certificate is the same byte for byte.
/// </summary>
internal static class GeneralFlowFinder
{
    public static FlowResult Find<T, TField>(FieldGraph<T, TField> g, IProgress<SolveProgress>? progress, CarryRule rule)
        where T : struct where TField : struct, IField<T>
    {
        CarriedEchelon<T, TField>? carried = null;
        return LayeredSearch.Run(g, FlowKind.General, state => Step(g, state, rule, ref carried), progress);
    }

    private static LayerOutcome Step<T, TField>(FieldGraph<T, TField> g, LayerState state, CarryRule rule, ref CarriedEchelon<T, TField>? carried)
        where T : struct where TField : struct, IField<T>
    {
        var rows = state.Frontier();
        if (carried is not null) Advance(g, state, carried);
        else if (ShouldCarry<TField>(state, rows.Length, rule)) carried = Carry(g, state, rows);
        var elimination = carried is not null ? carried.Result(rows) : Elimination.Run(g.Field, Block(g, state, rows));
        var solutions = elimination.SolveUnitVectors();
        if (solutions.Count == 0)
            return LayerOutcome.Stuck(Obstruction(g, state.Unprocessed(), rows, elimination));
        var layer = new Dictionary<int, NodeVector>(solutions.Count);
        foreach (var (r, c) in solutions) layer[rows[r]] = NodeVector.Take(g.Spec, c.Indices, c.Values); // the solutions are made afresh for this layer
        return LayerOutcome.Found(layer);
    }

    private static bool ShouldCarry<TField>(LayerState state, int rowCount, CarryRule rule)
    {
        long rankBound = Math.Min(rowCount, state.Active.Length);
        long capacity = state.UnprocessedCount; // every later row and corrector is unprocessed now
        return typeof(TField) == typeof(PrimeField) && state.Layers.Count > 0
            && rankBound >= rule.MinRank && rankBound >= (long)rule.Ratio * state.Layers[^1].Length
            && capacity * (2 * capacity + state.Active.Length) <= rule.MaxEntries; // each row: X over rows, R over columns
    }

    /// <summary>The reduced form of this layer's block, built column by column, to be carried from now on.</summary>
    private static CarriedEchelon<T, TField> Carry<T, TField>(FieldGraph<T, TField> g, LayerState state, int[] rows)
        where T : struct where TField : struct, IField<T>
    {
        var form = new CarriedEchelon<T, TField>(g.Field, state.UnprocessedCount, state.Active.Length + state.UnprocessedCount);
        foreach (var r in rows) form.AddZeroRow(r);
        var active = state.Active.ToArray();
        Array.Sort(active);
        foreach (var c in active) AddCorrector(g, state, form, c);
        return form;
    }

    /// <summary>The last layer leaves the rows and its nodes that may correct join the columns.</summary>
    private static void Advance<T, TField>(FieldGraph<T, TField> g, LayerState state, CarriedEchelon<T, TField> form)
        where T : struct where TField : struct, IField<T>
    {
        var layer = state.Layers[^1];
        foreach (var v in layer) form.DeleteRow(v);
        foreach (var v in layer)
            foreach (var w in g.Neighbours[v])
                if (state.UnprocessedNeighbours[w] == 0 && form.HasColumn(w)) form.RemoveZeroColumn(w); // a corrector gone inactive
        foreach (var v in layer)
            if (state.IsCorrector[v])
                foreach (var u in g.Neighbours[v])
                    if (!state.Processed[u] && !form.HasRow(u)) form.AddZeroRow(u); // a node new to the frontier: zero on the old columns
        foreach (var v in layer)
            if (state.IsCorrector[v]) AddCorrector(g, state, form, v);
    }

    private static void AddCorrector<T, TField>(FieldGraph<T, TField> g, LayerState state, CarriedEchelon<T, TField> form, int c)
        where T : struct where TField : struct, IField<T>
    {
        var nb = g.Neighbours[c];
        var wt = g.Weights[c];
        var ids = new List<int>(nb.Length);
        var values = new List<T>(nb.Length);
        for (int k = 0; k < nb.Length; k++)
            if (!state.Processed[nb[k]]) { ids.Add(nb[k]); values.Add(wt[k]); }
        if (ids.Count > 0) form.AddColumn(c, System.Runtime.InteropServices.CollectionsMarshal.AsSpan(ids), System.Runtime.InteropServices.CollectionsMarshal.AsSpan(values));
    }

    /// <summary>The frontier block A[F, C'] as sparse rows.</summary>
    private static SparseVector<T>[] Block<T, TField>(FieldGraph<T, TField> g, LayerState state, int[] rows)
        where T : struct where TField : struct, IField<T>
    {
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
        return matrix;
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
