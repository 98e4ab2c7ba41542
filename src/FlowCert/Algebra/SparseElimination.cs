namespace FlowCert.Algebra;

/// <summary>
/// Gauss-Jordan elimination of a sparse matrix B (rows 0..m-1, arbitrary non-negative column ids)
/// that records the row operations, giving at once: which unit vectors e_r lie in the column space of
/// B, a canonical solution of B c = e_r for each of them, and a basis of the left kernel of B.
/// Columns are taken in increasing order, so the pivot columns are the greedy column basis and the
/// solution that is zero off the pivot columns does not depend on which row is chosen as a pivot
/// (rows are chosen shortest first only to limit fill-in).
/// </summary>
internal sealed class SparseElimination<T, TField> : IEliminationResult<T> where T : struct where TField : struct, IField<T>
{
    private readonly TField f;
    private readonly SparseVector<T>[] reduced;   // R = T B, row by row
    private readonly SparseVector<T>[] transform; // T, row by row, over row ids of B
    private readonly List<(int Column, int Row)> pivots = [];
    private readonly bool[] isPivotRow;

    /// <summary>Eliminates the given rows (the matrix B, one sparse row per entry).</summary>
    public SparseElimination(TField field, IReadOnlyList<SparseVector<T>> rows)
    {
        f = field;
        int m = rows.Count;
        reduced = new SparseVector<T>[m];
        transform = new SparseVector<T>[m];
        isPivotRow = new bool[m];
        int entries = 0;
        for (int r = 0; r < m; r++) entries += rows[r].Count;
        var occurrences = new Dictionary<int, List<int>>(entries); // at most one column per entry: never rehashed
        for (int r = 0; r < m; r++)
        {
            reduced[r] = rows[r];
            transform[r] = SparseVector<T>.Unit(r, f.One);
            foreach (var c in rows[r].Indices) Occurrences(occurrences, c).Add(r);
        }
        var columns = occurrences.Keys.ToList();
        columns.Sort();
        foreach (var col in columns)
        {
            var holders = occurrences[col];
            int pivot = -1;
            foreach (var r in holders)
            {
                if (isPivotRow[r] || f.IsZero(reduced[r].Get(f, col))) continue;
                if (pivot < 0 || reduced[r].Count < reduced[pivot].Count || (reduced[r].Count == reduced[pivot].Count && r < pivot)) pivot = r;
            }
            if (pivot < 0) continue;
            var inv = f.Inverse(reduced[pivot].Get(f, col));
            if (!f.AreEqual(inv, f.One))
            {
                reduced[pivot] = reduced[pivot].Scale(f, inv);
                transform[pivot] = transform[pivot].Scale(f, inv);
            }
            foreach (var r in holders.Count == 1 ? holders : holders.Distinct().ToList())
            {
                if (r == pivot) continue;
                var entry = reduced[r].Get(f, col);
                if (f.IsZero(entry)) continue;
                var factor = f.Negate(entry);
                var before = reduced[r];
                reduced[r] = before.AddScaled(f, factor, reduced[pivot]);
                transform[r] = transform[r].AddScaled(f, factor, transform[pivot]);
                foreach (var c in reduced[r].Indices)
                    if (before.Get(f, c) is var old && f.IsZero(old)) Occurrences(occurrences, c).Add(r);
            }
            isPivotRow[pivot] = true;
            pivots.Add((col, pivot));
        }
    }

    private static List<int> Occurrences(Dictionary<int, List<int>> map, int col)
    {
        if (!map.TryGetValue(col, out var list)) map[col] = list = [];
        return list;
    }

    /// <summary>
    /// The reduced row echelon form of B without its zero rows, in pivot order: a basis of the row space
    /// that depends only on the row space (columns taken in increasing id).
    /// </summary>
    public IReadOnlyList<SparseVector<T>> ReducedRows() => pivots.Select(p => reduced[p.Row]).ToList();

    /// <summary>The rank of B.</summary>
    public int Rank => pivots.Count;

    /// <summary>A basis of the left kernel {y : y^T B = 0}, as vectors over row ids, in row order.</summary>
    public IReadOnlyList<SparseVector<T>> LeftKernel()
    {
        var basis = new List<SparseVector<T>>();
        for (int r = 0; r < isPivotRow.Length; r++)
            if (!isPivotRow[r]) basis.Add(transform[r]);
        return basis;
    }

    /// <summary>
    /// For every row r whose unit vector e_r is in the column space of B, the canonical c with B c = e_r
    /// (zero off the pivot columns), as a map from column id to value. Rows missing from the map are
    /// exactly those in the support of some left-kernel vector.
    /// </summary>
    public Dictionary<int, SparseVector<T>> SolveUnitVectors()
    {
        var blocked = new HashSet<int>();
        foreach (var y in LeftKernel()) foreach (var r in y.Indices) blocked.Add(r);
        var entries = new Dictionary<int, List<(int Col, T Val)>>(isPivotRow.Length);
        foreach (var (col, p) in pivots)
        {
            var t = transform[p];
            for (int k = 0; k < t.Count; k++)
            {
                int r = t.Indices[k];
                if (blocked.Contains(r)) continue;
                if (!entries.TryGetValue(r, out var list)) entries[r] = list = [];
                list.Add((col, t.Values[k]));
            }
        }
        var result = new Dictionary<int, SparseVector<T>>(isPivotRow.Length);
        for (int r = 0; r < isPivotRow.Length; r++)
        {
            if (blocked.Contains(r)) continue;
            if (!entries.TryGetValue(r, out var list)) { result[r] = new SparseVector<T>([], []); continue; }
            var cols = new int[list.Count];
            var vals = new T[list.Count];
            for (int k = 0; k < list.Count; k++) (cols[k], vals[k]) = list[k];
            Array.Sort(cols, vals);
            result[r] = new SparseVector<T>(cols, vals);
        }
        return result;
    }
}
