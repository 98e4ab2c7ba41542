using System.Runtime.CompilerServices;
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
    private readonly Func<int, SparseVector<T>> solution;
    private readonly SparseVector<T>[] kernel;

    /// <summary>Entry (a, r) of the I part of the reduced [B | I], for a row a below the rank: false when it is zero.</summary>
    public delegate bool EntryReader(int a, int r, out T value);

    /// <summary>
    /// Wraps the reduced [B | I]: the pivot column ids of rows 0..k-1, the solution for a row r (column r of
    /// their I part, keyed by pivot column id; asked only for rows outside the kernel's support), and rows
    /// k..m-1 (the left kernel).
    /// </summary>
    public EchelonTransform(int m, int[] pivotColumnIds, Func<int, SparseVector<T>> solution, SparseVector<T>[] kernel)
    {
        this.m = m;
        this.pivotColumnIds = pivotColumnIds;
        this.solution = solution;
        this.kernel = kernel;
    }

    /// <summary>Wraps the reduced [B | I] given a reader of the I part of rows 0..k-1 (solutions read column by column).</summary>
    public EchelonTransform(int m, int[] pivotColumnIds, EntryReader entry, SparseVector<T>[] kernel)
        : this(m, pivotColumnIds, ColumnReader(pivotColumnIds, entry), kernel) { }

    private static Func<int, SparseVector<T>> ColumnReader(int[] pivotColumnIds, EntryReader entry)
    {
        int k = pivotColumnIds.Length;
        var cols = new int[k];
        var vals = new T[k];
        return r =>
        {
            int count = 0;
            for (int a = 0; a < k; a++)
                if (entry(a, r, out var v)) { cols[count] = pivotColumnIds[a]; vals[count++] = v; }
            return new SparseVector<T>(cols[..count], vals[..count]);
        };
    }

    /// <summary>
    /// The distinct column ids of the rows, increasing, and where each id sits among them: a table over
    /// the ids up to the largest when that range is small against the entries, else a binary search.
    /// </summary>
    public static ColumnIndex ColumnIndexOf(IReadOnlyList<SparseVector<T>> rows)
    {
        int max = -1;
        long entries = 0;
        foreach (var r in rows) if (r.Count > 0) { max = Math.Max(max, r.Indices[^1]); entries += r.Count; }
        if (max >= 8 * entries + 64)
        {
            var all = new int[entries];
            int k = 0;
            foreach (var r in rows) foreach (var c in r.Indices) all[k++] = c;
            Array.Sort(all);
            int u = 0;
            for (int q = 0; q < all.Length; q++) if (q == 0 || all[q] != all[q - 1]) all[u++] = all[q];
            return new ColumnIndex(all[..u], null);
        }
        var position = new int[max + 1];
        foreach (var r in rows) foreach (var c in r.Indices) position[c] = 1;
        int n = 0;
        for (int c = 0; c <= max; c++) position[c] = position[c] == 1 ? n++ : -1;
        var ids = new int[n];
        for (int c = 0; c <= max; c++) if (position[c] >= 0) ids[position[c]] = c;
        return new ColumnIndex(ids, position);
    }

    /// <summary>
    /// True when a dense m x (n + m) array (in cells of <paramref name="entriesPerCell"/> entries) is no
    /// larger than <paramref name="factor"/> times the non-zero entries; the m x m part is tested first,
    /// so sparse blocks cost no column count.
    /// </summary>
    public static bool PaysOff(IReadOnlyList<SparseVector<T>> rows, long factor, int entriesPerCell = 1)
    {
        long m = rows.Count, entries = 0;
        foreach (var r in rows) entries += r.Count;
        if (m < 2 || m * ((m + entriesPerCell - 1) / entriesPerCell) > factor * entries) return false;
        long n = ColumnIndexOf(rows).Ids.Length;
        return m * ((n + m + entriesPerCell - 1) / entriesPerCell) <= factor * entries;
    }

    /// <inheritdoc/>
    public int Rank => pivotColumnIds.Length;

    /// <inheritdoc/>
    public IReadOnlyList<SparseVector<T>> LeftKernel() => kernel;

    /// <inheritdoc/>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
    public Dictionary<int, SparseVector<T>> SolveUnitVectors()
    {
        var blocked = new bool[m];
        foreach (var y in kernel) foreach (var r in y.Indices) blocked[r] = true;
        // Column r of the I part, rows 0..k-1, is the solution of B c = e_r on the pivot columns.
        var result = new Dictionary<int, SparseVector<T>>();
        for (int r = 0; r < m; r++) if (!blocked[r]) result[r] = solution(r);
        return result;
    }
}

/// <summary>The distinct column ids of a block, increasing, and the position of an id among them.</summary>
internal readonly struct ColumnIndex(int[] ids, int[]? table)
{
    /// <summary>The distinct ids, increasing.</summary>
    public int[] Ids => ids;

    /// <summary>The position of a column id that occurs in the block.</summary>
    public int Of(int id) => table is null ? Array.BinarySearch(ids, id) : table[id];
}
