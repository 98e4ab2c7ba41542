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
/// and no node of U is.
/// </summary>
internal sealed class LabelledSystem
{
    /// <summary>The node of each row, and whether it is v's self row; rows in node order, the self row last.</summary>
    public (int Node, bool Self)[] Rows { get; }
    /// <summary>The unknowns, by node, sorted.</summary>
    public int[] Columns { get; }
    public BitMatrix Matrix { get; }
    public bool[] RightHandSide { get; }

    public LabelledSystem(bool[][] adjacency, OpenGraph graph, bool[] inU, int[] unprocessed, int v)
    {
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
        Matrix = new BitMatrix(Rows.Length, Columns.Length);
        RightHandSide = new bool[Rows.Length];
        for (int r = 0; r < Rows.Length; r++)
        {
            var (u, self) = Rows[r];
            for (int k = 0; k < Columns.Length; k++)
            {
                int c = Columns[k];
                Matrix[r, k] = self
                    ? c == u
                    : adjacency[u][c] ^ (c == u && graph.Label(u) == MeasurementLabel.Y);
            }
            RightHandSide[r] = self || (u == v && lv != MeasurementLabel.YZ);
        }
    }

    /// <summary>The correction set p(v) (sorted nodes), or null when the system has no solution.</summary>
    public int[]? Solve()
    {
        var x = Matrix.Solve(RightHandSide);
        return x is null ? null : Enumerable.Range(0, Columns.Length).Where(k => x[k]).Select(k => Columns[k]).ToArray();
    }

    /// <summary>
    /// A witness y with y^T M = 0 and y^T b = 1 (flows.md 9.5): the first vector of the reduced left-kernel
    /// basis with an odd right-hand side; null when the system is solvable.
    /// </summary>
    public RowWitness? Witness(int v)
    {
        foreach (var y in Matrix.LeftKernel())
        {
            bool parity = false;
            for (int r = 0; r < y.Length; r++) if (y[r] && RightHandSide[r]) parity = !parity;
            if (!parity) continue;
            var rows = new List<int>();
            bool self = false;
            for (int r = 0; r < y.Length; r++)
            {
                if (!y[r]) continue;
                if (Rows[r].Self) self = true; else rows.Add(Rows[r].Node);
            }
            return new RowWitness(v, rows, self);
        }
        return null;
    }
}
