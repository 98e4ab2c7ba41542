using System.Runtime.CompilerServices;
using System.Numerics;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace FlowCert.Algebra;

/// <summary>
/// Dense elimination over F_2 (<see cref="IField{T}.Eliminate"/> of <see cref="BinaryField"/>): [B | I] with rows packed 64 entries
/// to a word in one array, brought to reduced echelon form. Pivots are found a few at a time; the pivot
/// rows of a group are reduced among themselves, every combination of them is tabulated once (Gray code
/// order, one XOR per table entry), and each other row then takes one table lookup and one XOR per group
/// instead of one XOR per pivot: the Method of Four Russians (as published in "Efficient Multiplication
/// of Dense Matrices over GF(2)", arXiv:0811.1714, from memory; the grouping here is this project's own). Row XORs use
/// 256-bit vectors.
/// </summary>
internal static class BitElimination
{
    private const int Group = 8;

    /// <summary>True when packed bits are no larger than a few times the sparse entries.</summary>
    public static bool PaysOff(IReadOnlyList<SparseVector<ulong>> rows) => EchelonTransform<ulong>.PaysOff(rows, 4, 64);

    /// <summary>Eliminates B over F_2: the reduced echelon form of [B | I].</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
    public static IEliminationResult<ulong> Run(IReadOnlyList<SparseVector<ulong>> rows)
    {
        var index = EchelonTransform<ulong>.ColumnIndexOf(rows);
        var ids = index.Ids;
        int m = rows.Count, n = ids.Length, w = n + m, s = (w + 63) >> 6;
        var a = new ulong[(long)m * s];
        for (int r = 0; r < m; r++)
        {
            foreach (var c in rows[r].Indices) Set(a, (long)r * s, index.Of(c));
            Set(a, (long)r * s, n + r);
        }
        var pivots = Rref(a, m, w);
        int k = 0;
        while (k < pivots.Length && pivots[k] < n) k++;
        var kernel = new SparseVector<ulong>[m - k];
        var pivotIds = new int[k];
        for (int r = 0; r < k; r++) pivotIds[r] = ids[pivots[r]];
        var idx = new int[m];
        for (int r = k; r < m; r++)
        {
            // The set bits of the I part, word by word.
            int count = 0;
            long start = (long)r * s;
            for (int j = n; j < w;)
            {
                ulong word = a[start + (j >> 6)] >> (j & 63);
                int limit = Math.Min(64 - (j & 63), w - j);
                if (limit < 64) word &= (1UL << limit) - 1;
                while (word != 0)
                {
                    idx[count++] = j + BitOperations.TrailingZeroCount(word) - n;
                    word &= word - 1;
                }
                j += limit;
            }
            var ones = new ulong[count];
            Array.Fill(ones, 1UL);
            kernel[r - k] = new SparseVector<ulong>(idx.AsSpan(0, count).ToArray(), ones);
        }
        // The I part of rows 0..k-1, transposed (bit a of row r set when entry (a, r) is one), so that the
        // solution of row r is read off one packed row.
        int ks = (k + 63) >> 6;
        var transposed = new ulong[(long)m * ks];
        for (int row = 0; row < k; row++)
        {
            long start = (long)row * s;
            for (int j = n; j < w;)
            {
                ulong word = a[start + (j >> 6)] >> (j & 63);
                int limit = Math.Min(64 - (j & 63), w - j);
                if (limit < 64) word &= (1UL << limit) - 1;
                while (word != 0)
                {
                    int r = j + BitOperations.TrailingZeroCount(word) - n;
                    transposed[(long)r * ks + (row >> 6)] |= 1UL << (row & 63);
                    word &= word - 1;
                }
                j += limit;
            }
        }
        return new EchelonTransform<ulong>(m, pivotIds, r =>
        {
            int count = 0;
            for (int q = 0; q < ks; q++) count += BitOperations.PopCount(transposed[(long)r * ks + q]);
            var cols = new int[count];
            int t = 0;
            for (int q = 0; q < ks; q++)
                for (ulong word = transposed[(long)r * ks + q]; word != 0; word &= word - 1)
                    cols[t++] = pivotIds[(q << 6) + BitOperations.TrailingZeroCount(word)];
            var ones = new ulong[count];
            Array.Fill(ones, 1UL);
            return new SparseVector<ulong>(cols, ones);
        }, kernel);
    }

    private static void Set(ulong[] a, long rowStart, int k) => a[rowStart + (k >> 6)] |= 1UL << (k & 63);

    /// <summary>
    /// Brings the m x w packed matrix (rows of ceil(w/64) words) to reduced row echelon form in place,
    /// columns left to right; returns the pivot column of each non-zero row, in order.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
    public static int[] Rref(ulong[] a, int m, int w)
    {
        int s = (w + 63) >> 6;
        var pivots = new List<int>();
        var table = new ulong[(1 << Group) * s];
        var groupCols = new int[Group];
        var applied = new int[m]; // how many of the group's pivots each row below the group has seen
        int row = 0, col = 0;
        while (row < m && col < w)
        {
            // Find up to Group pivots. A candidate row is brought up to date with the group's pivots only
            // when it is examined; the group's pivot rows are kept reduced among themselves.
            int found = 0, first = row, from = col >> 6, len = s - from;
            Array.Clear(applied, first, m - first);
            for (; col < w && row < m && found < Group; col++)
            {
                int pr = -1;
                for (int i = row; i < m && pr < 0; i++)
                {
                    for (int g = applied[i]; g < found; g++)
                        if (Bit(a, i, s, groupCols[g])) Xor(Row(a, i, s, from), Row(a, first + g, s, from));
                    applied[i] = found;
                    if (Bit(a, i, s, col)) pr = i;
                }
                if (pr < 0) continue;
                if (pr != row) SwapRows(Row(a, pr, s, from), Row(a, row, s, from));
                var prow = Row(a, row, s, from);
                for (int g = 0; g < found; g++)
                    if (Bit(a, first + g, s, col)) Xor(Row(a, first + g, s, from), prow);
                groupCols[found++] = col;
                pivots.Add(col);
                row++;
            }
            if (found == 0) break;
            // Every combination of the group's pivot rows, each made from a smaller one by one XOR.
            for (int g = 0; g < found; g++)
            {
                int size = 1 << g;
                var src = Row(a, first + g, s, from);
                for (int t = 0; t < size; t++) XorInto(table.AsSpan((size + t) * len, len), table.AsSpan(t * len, len), src);
            }
            // Every other row: its bits in the group's columns pick the combination that clears them.
            for (int i = 0; i < m; i++)
            {
                if (i == first) { i += found - 1; continue; }
                int key = 0;
                for (int g = 0; g < found; g++) if (Bit(a, i, s, groupCols[g])) key |= 1 << g;
                if (key != 0) Xor(Row(a, i, s, from), table.AsSpan(key * len, len));
            }
        }
        return pivots.ToArray();
    }

    private static bool Bit(ulong[] a, int i, int s, int col) => (a[(long)i * s + (col >> 6)] >> (col & 63) & 1) != 0;

    private static Span<ulong> Row(ulong[] a, int i, int s, int fromWord)
        => a.AsSpan((int)((long)i * s + fromWord), s - fromWord);

    /// <summary>target = x XOR y (target does not overlap x or y).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void XorInto(Span<ulong> target, ReadOnlySpan<ulong> x, ReadOnlySpan<ulong> y)
    {
        int j = 0;
        if (Vector256.IsHardwareAccelerated)
        {
            ref var t0 = ref MemoryMarshal.GetReference(target);
            ref var x0 = ref MemoryMarshal.GetReference(x);
            ref var y0 = ref MemoryMarshal.GetReference(y);
            for (; j + 4 <= target.Length; j += 4)
                (Vector256.LoadUnsafe(ref x0, (nuint)j) ^ Vector256.LoadUnsafe(ref y0, (nuint)j)).StoreUnsafe(ref t0, (nuint)j);
        }
        for (; j < target.Length; j++) target[j] = x[j] ^ y[j];
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
    private static void Xor(Span<ulong> target, ReadOnlySpan<ulong> source)
    {
        int j = 0;
        if (Vector256.IsHardwareAccelerated)
        {
            ref var t0 = ref MemoryMarshal.GetReference(target);
            ref var s0 = ref MemoryMarshal.GetReference(source);
            for (; j + 4 <= target.Length; j += 4)
                (Vector256.LoadUnsafe(ref t0, (nuint)j) ^ Vector256.LoadUnsafe(ref s0, (nuint)j)).StoreUnsafe(ref t0, (nuint)j);
        }
        for (; j < target.Length; j++) target[j] ^= source[j];
    }

    private static void SwapRows(Span<ulong> x, Span<ulong> y)
    {
        for (int j = 0; j < x.Length; j++) (x[j], y[j]) = (y[j], x[j]);
    }
}
