namespace FlowCert.Algebra;

/// <summary>
/// The result of a dense kernel: the reduced row echelon form of [B | I], columns of B first in increasing
/// id. That form is unique (the matrix has full row rank), and it holds everything the flow search asks:
/// its first k rows have their pivots on the greedy column basis of B and carry, in their I part, the
/// canonical solutions of B c = e_r; the other m - k rows have their pivots in the I part and are the left
/// kernel of B in reduced echelon form. Facts of linear algebra, common practice.
/// </summary>
internal sealed class EchelonTransform<T> : IEliminationResult<T> where T : struct
{
    private readonly int m;
    private readonly int[] pivotColumnIds;
    private readonly SparseVector<T>[] solutionRows;
    private readonly SparseVector<T>[] kernel;

    /// <summary>Wraps the I part of [B | I] in echelon form: rows 0..k-1 (pivots on columns of B, with their ids) and rows k..m-1.</summary>
    public EchelonTransform(int m, int[] pivotColumnIds, SparseVector<T>[] solutionRows, SparseVector<T>[] kernel)
    {
        this.m = m;
        this.pivotColumnIds = pivotColumnIds;
        this.solutionRows = solutionRows;
        this.kernel = kernel;
    }

    /// <summary>The distinct column ids of the rows, increasing.</summary>
    public static int[] ColumnIds(IReadOnlyList<SparseVector<T>> rows)
    {
        var seen = new HashSet<int>();
        foreach (var r in rows) foreach (var c in r.Indices) seen.Add(c);
        var ids = seen.ToArray();
        Array.Sort(ids);
        return ids;
    }

    /// <summary>
    /// True when a dense m x (n + m) array is no larger than <paramref name="factor"/> times the non-zero
    /// entries (the m x m part is tested first, so sparse blocks cost no column count).
    /// </summary>
    public static bool PaysOff(IReadOnlyList<SparseVector<T>> rows, long factor, int entriesPerCell = 1)
    {
        long m = rows.Count, entries = 0;
        foreach (var r in rows) entries += r.Count;
        if (m < 2 || m * ((m + entriesPerCell - 1) / entriesPerCell) > factor * entries) return false;
        long n = ColumnIds(rows).Length;
        return m * ((n + m + entriesPerCell - 1) / entriesPerCell) <= factor * entries;
    }

    /// <inheritdoc/>
    public int Rank => pivotColumnIds.Length;

    /// <inheritdoc/>
    public IReadOnlyList<SparseVector<T>> LeftKernel() => kernel;

    /// <inheritdoc/>
    public Dictionary<int, SparseVector<T>> SolveUnitVectors()
    {
        var blocked = new bool[m];
        foreach (var y in kernel) foreach (var r in y.Indices) blocked[r] = true;
        var cols = new List<int>[m];
        var vals = new List<T>[m];
        for (int a = 0; a < solutionRows.Length; a++)
        {
            var t = solutionRows[a];
            for (int q = 0; q < t.Count; q++)
            {
                int r = t.Indices[q];
                if (blocked[r]) continue;
                (cols[r] ??= []).Add(pivotColumnIds[a]);
                (vals[r] ??= []).Add(t.Values[q]);
            }
        }
        var result = new Dictionary<int, SparseVector<T>>();
        for (int r = 0; r < m; r++)
            if (!blocked[r]) result[r] = cols[r] is null ? new SparseVector<T>([], []) : new SparseVector<T>(cols[r].ToArray(), vals[r].ToArray());
        return result;
    }
}
