using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Flows;

/// <summary>
/// The linear system over F_2 of flows.md 9.4 for one unprocessed measured node v, given the unprocessed
/// set U (docs/algorithms.md, "Labelled systems"). Unknowns: x_c for c in (V \ U) \ I, for c in U \ I
/// labelled X or Y, and for v itself when v is not an input and is labelled XZ, YZ or Z. Rows:
/// <list type="bullet">
/// <item>for u in U, u != v, not labelled Z: (A x)(u) + [u labelled Y] x_u = 0;</item>
/// <item>v's condition row, unless v is labelled Z: (A x)(v) + [v labelled Y] x_v = 1, and 0 for YZ;</item>
/// <item>v's self row when v is labelled XZ, YZ or Z: x_v = 1 (an all-zero row when v is an input).</item>
/// </list>
/// Its solutions are exactly the correction sets p(v) allowed when every node outside U is later than v
/// and no node of U is. The system is eliminated once, by the shared F_2 kernel (<see cref="BitElimination"/>),
/// as the block [[M, b], [0, 1]]: its rows in reverse order after a first row t = (0 ... 0 1), so that
/// the canonical solution of B c = e_t is (x, 1) with x the solution of M x = b whose free unknowns are
/// zero, and the left-kernel vectors with y_t = 1 are the witnesses y^T M = 0, y^T b = 1.
/// </summary>
internal sealed class LabelledSystem
{
    private readonly IEliminationResult<ulong> elimination;

    /// <summary>The node v whose corrections the system describes.</summary>
    public int Node { get; }

    /// <summary>The node of each row, and whether it is v's self row; rows in node order, the self row last.</summary>
    public (int Node, bool Self)[] Rows { get; }
    /// <summary>The unknowns, by node, sorted.</summary>
    public int[] Columns { get; }

    public LabelledSystem(bool[][] adjacency, OpenGraph graph, bool[] inU, int[] unprocessed, int v)
    {
        Node = v;
        int n = graph.NodeCount;
        var columns = new List<int>();
        for (int c = 0; c < n; c++)
        {
            if (graph.Inputs.Contains(c)) continue;
            var label = graph.Label(c);
            if (!inU[c] || label is MeasurementLabel.X or MeasurementLabel.Y) columns.Add(c);
            else if (c == v && label is MeasurementLabel.XZ or MeasurementLabel.YZ or MeasurementLabel.Z) columns.Add(c);
        }
        Columns = columns.ToArray();
        var rows = new List<(int, bool)>();
        foreach (var u in unprocessed)
            if (graph.Label(u) != MeasurementLabel.Z) rows.Add((u, false));
        var lv = graph.Label(v);
        if (lv is MeasurementLabel.XZ or MeasurementLabel.YZ or MeasurementLabel.Z) rows.Add((v, true));
        Rows = rows.ToArray();
        // Row r of M (with b in column z = Columns.Length) is row m - r of the block; row 0 is t.
        int m = Rows.Length, z = Columns.Length;
        var block = new SparseVector<ulong>[m + 1];
        block[0] = SparseVector<ulong>.Unit(z, 1);
        var entries = new List<int>();
        for (int r = 0; r < m; r++)
        {
            var (u, self) = Rows[r];
            entries.Clear();
            for (int k = 0; k < Columns.Length; k++)
            {
                int c = Columns[k];
                if (self ? c == u : adjacency[u][c] ^ (c == u && graph.Label(u) == MeasurementLabel.Y)) entries.Add(k);
            }
            if (self || (u == v && lv != MeasurementLabel.YZ)) entries.Add(z);
            block[m - r] = new SparseVector<ulong>(entries.ToArray(), entries.Select(_ => 1UL).ToArray());
        }
        // The packed kernel itself rather than the field's choice: its left kernel is in reduced echelon
        // form (BitElimination.Run), which Witness reads the published witness from.
        elimination = BitElimination.Run(block);
    }

    /// <summary>The correction set p(v) (sorted nodes): the solution whose free unknowns are zero; null when there is none.</summary>
    public int[]? Solve()
        => elimination.SolveUnitVectors().TryGetValue(0, out var c)
            ? c.Indices.Where(k => k < Columns.Length).Select(k => Columns[k]).ToArray()
            : null;

    /// <summary>
    /// A witness y with y^T M = 0 and y^T b = 1 (flows.md 9.5); null when the system is solvable. It is the
    /// vector of the reduced echelon basis of the block's left kernel with y_t = 1 (the only one with an
    /// entry at t, its first column): the row combination that Gauss-Jordan elimination of [M | b], pivots
    /// taken column by column and the first free row with a one as pivot, reduces to 0 = 1 first.
    /// </summary>
    public RowWitness? Witness()
    {
        if (elimination.LeftKernel().FirstOrDefault(y => y.Indices[0] == 0) is not { Indices: not null } witness) return null;
        int m = Rows.Length;
        var rows = new List<int>();
        bool self = false;
        foreach (var r in witness.Indices.Skip(1).Select(id => m - id).Order())
            if (Rows[r].Self) self = true; else rows.Add(Rows[r].Node);
        return new RowWitness(Node, rows, self);
    }
}
