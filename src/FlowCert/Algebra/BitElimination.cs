using System.Numerics;

namespace FlowCert.Algebra;

/// <summary>
/// Gauss-Jordan elimination over F_2 of [B | I] with rows packed 64 entries to a word: the F_2
/// specialisation of <see cref="SparseElimination{T, TField}"/> with the same results (columns taken in
/// increasing id, so the canonical solutions agree). Pays off when the block is dense.
/// </summary>
internal sealed class BitElimination : IEliminationResult<ulong>
{
    private readonly int[] columnIds;
    private readonly int m, words, transformOffset;
    private readonly ulong[][] rows; // [B | T] per row
    private readonly bool[] isPivotRow;
    private readonly List<(int Column, int Row)> pivots = [];

    /// <summary>True when packed bits are no larger than a few times the sparse entries.</summary>
    public static bool PaysOff(IReadOnlyList<int[]> rowSupports)
    {
        long entries = rowSupports.Sum(r => (long)r.Length);
        long columns = rowSupports.SelectMany(r => r).Distinct().LongCount();
        return rowSupports.Count * ((columns + rowSupports.Count + 63) / 64) <= 4 * entries;
    }

    /// <summary>Eliminates B given by the column ids of the ones in each row.</summary>
    public BitElimination(IReadOnlyList<int[]> rowSupports)
    {
        m = rowSupports.Count;
        columnIds = rowSupports.SelectMany(r => r).Distinct().Order().ToArray();
        var position = new Dictionary<int, int>(columnIds.Length);
        for (int j = 0; j < columnIds.Length; j++) position[columnIds[j]] = j;
        transformOffset = columnIds.Length;
        words = (columnIds.Length + m + 63) / 64;
        rows = new ulong[m][];
        isPivotRow = new bool[m];
        for (int r = 0; r < m; r++)
        {
            rows[r] = new ulong[words];
            foreach (var c in rowSupports[r]) Set(rows[r], position[c]);
            Set(rows[r], transformOffset + r);
        }
        for (int j = 0; j < columnIds.Length; j++)
        {
            int pivot = -1;
            for (int r = 0; r < m && pivot < 0; r++) if (!isPivotRow[r] && Get(rows[r], j)) pivot = r;
            if (pivot < 0) continue;
            var pr = rows[pivot];
            for (int r = 0; r < m; r++)
            {
                if (r == pivot || !Get(rows[r], j)) continue;
                var target = rows[r];
                for (int w = j >> 6; w < words; w++) target[w] ^= pr[w];
            }
            isPivotRow[pivot] = true;
            pivots.Add((columnIds[j], pivot));
        }
    }

    private static bool Get(ulong[] row, int k) => (row[k >> 6] >> (k & 63) & 1) != 0;
    private static void Set(ulong[] row, int k) => row[k >> 6] |= 1UL << (k & 63);

    /// <inheritdoc/>
    public int Rank => pivots.Count;

    private SparseVector<ulong> TransformRow(int r)
    {
        var idx = new List<int>();
        for (int k = 0; k < m; k++) if (Get(rows[r], transformOffset + k)) idx.Add(k);
        return new SparseVector<ulong>(idx.ToArray(), Enumerable.Repeat(1UL, idx.Count).ToArray());
    }

    /// <inheritdoc/>
    public IReadOnlyList<SparseVector<ulong>> LeftKernel()
        => Enumerable.Range(0, m).Where(r => !isPivotRow[r]).Select(TransformRow).ToList();

    /// <inheritdoc/>
    public Dictionary<int, SparseVector<ulong>> SolveUnitVectors()
    {
        var blocked = new bool[m];
        foreach (var y in LeftKernel()) foreach (var r in y.Indices) blocked[r] = true;
        var result = new Dictionary<int, SparseVector<ulong>>();
        for (int r = 0; r < m; r++)
        {
            if (blocked[r]) continue;
            var support = pivots.Where(p => Get(rows[p.Row], transformOffset + r)).Select(p => p.Column).Order().ToArray();
            result[r] = new SparseVector<ulong>(support, Enumerable.Repeat(1UL, support.Length).ToArray());
        }
        return result;
    }
}
