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
    /// <summary>The matrix M, row by row (true is 1).</summary>
    public bool[][] Matrix { get; }
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
        Matrix = new bool[Rows.Length][];
        RightHandSide = new bool[Rows.Length];
        for (int r = 0; r < Rows.Length; r++)
        {
            var (u, self) = Rows[r];
            Matrix[r] = new bool[Columns.Length];
            for (int k = 0; k < Columns.Length; k++)
            {
                int c = Columns[k];
                Matrix[r][k] = self
                    ? c == u
                    : adjacency[u][c] ^ (c == u && graph.Label(u) == MeasurementLabel.Y);
            }
            RightHandSide[r] = self || (u == v && lv != MeasurementLabel.YZ);
        }
    }

    /// <summary>The correction set p(v) (sorted nodes), or null when the system has no solution.</summary>
    public int[]? Solve()
    {
        var reduced = new GaussJordan2(Matrix, RightHandSide);
        if (reduced.Inconsistent() is not null) return null;
        return reduced.Solution().Select(k => Columns[k]).ToArray();
    }

    /// <summary>
    /// A witness y with y^T M = 0 and y^T b = 1 (flows.md 9.5): the row combination that reduces to 0 = 1
    /// first (in row order after Gauss-Jordan elimination); null when the system is solvable.
    /// </summary>
    public RowWitness? Witness(int v)
    {
        if (new GaussJordan2(Matrix, RightHandSide).Inconsistent() is not { } y) return null;
        var rows = new List<int>();
        bool self = false;
        for (int r = 0; r < y.Length; r++)
        {
            if (!y[r]) continue;
            if (Rows[r].Self) self = true; else rows.Add(Rows[r].Node);
        }
        return new RowWitness(v, rows, self);
    }
}

/// <summary>
/// Gauss-Jordan elimination over F_2 of [M | b | I], rows packed 64 entries to a word; pivots are taken
/// column by column, lowest column first, so the solution with free unknowns zero is unique.
/// </summary>
internal sealed class GaussJordan2
{
    private readonly ulong[][] rows;
    private readonly int columns, m;
    private readonly List<(int Column, int Row)> pivots = [];
    private readonly bool[] isPivotRow;

    public GaussJordan2(bool[][] matrix, bool[] rhs)
    {
        m = matrix.Length;
        columns = m == 0 ? 0 : matrix[0].Length;
        int width = columns + 1 + m, words = (width + 63) / 64;
        rows = new ulong[m][];
        isPivotRow = new bool[m];
        for (int r = 0; r < m; r++)
        {
            rows[r] = new ulong[words];
            for (int k = 0; k < columns; k++) if (matrix[r][k]) Set(rows[r], k);
            if (rhs[r]) Set(rows[r], columns);
            Set(rows[r], columns + 1 + r);
        }
        for (int k = 0; k < columns; k++)
        {
            int pivot = -1;
            for (int r = 0; r < m && pivot < 0; r++) if (!isPivotRow[r] && Get(rows[r], k)) pivot = r;
            if (pivot < 0) continue;
            for (int r = 0; r < m; r++)
                if (r != pivot && Get(rows[r], k))
                    for (int w = 0; w < words; w++) rows[r][w] ^= rows[pivot][w];
            isPivotRow[pivot] = true;
            pivots.Add((k, pivot));
        }
    }

    private static bool Get(ulong[] row, int k) => (row[k >> 6] >> (k & 63) & 1) != 0;
    private static void Set(ulong[] row, int k) => row[k >> 6] |= 1UL << (k & 63);

    /// <summary>The row combination y (over the original rows) of the first row that reads 0 = 1, or null.</summary>
    public bool[]? Inconsistent()
    {
        for (int r = 0; r < m; r++)
            if (!isPivotRow[r] && Get(rows[r], columns))
                return Enumerable.Range(0, m).Select(j => Get(rows[r], columns + 1 + j)).ToArray();
        return null;
    }

    /// <summary>The unknowns equal to 1 in the solution whose free unknowns are 0, sorted.</summary>
    public IEnumerable<int> Solution() => pivots.Where(p => Get(rows[p.Row], columns)).Select(p => p.Column).Order();
}
