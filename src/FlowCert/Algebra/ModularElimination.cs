using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;

namespace FlowCert.Algebra;

/// <summary>
/// Dense Gauss-Jordan elimination over F_p (p below 2^62) on a row-major array of residues: the kernel
/// for dense blocks over F_p (<see cref="PrimeField.Eliminate"/>) and for each prime of the multi-modular
/// kernel over Q. Small primes use delayed reduction: while (p-1)^2 (m+1) + p fits in 64 bits a row
/// update is a plain multiply-add (four lanes at a time with AVX2) and entries are reduced only when read
/// as a pivot or multiplier. Larger primes multiply with a precomputed quotient per factor (Shoup's
/// method, common practice), so no division sits in the inner loop.
/// </summary>
internal static class ModularElimination
{
    /// <summary>True when the block is dense enough for this kernel.</summary>
    public static bool PaysOff<T>(IReadOnlyList<SparseVector<T>> rows) where T : struct
        => EchelonTransform<T>.PaysOff(rows, 8);

    /// <summary>Eliminates B over F_p: the reduced echelon form of [B | I].</summary>
    public static IEliminationResult<ulong> Run(ulong p, IReadOnlyList<SparseVector<ulong>> rows)
    {
        var ids = EchelonTransform<ulong>.ColumnIds(rows);
        int m = rows.Count, n = ids.Length, w = n + m;
        var a = new ulong[(long)m * w];
        for (int r = 0; r < m; r++)
        {
            var row = rows[r];
            for (int q = 0; q < row.Count; q++) a[(long)r * w + Array.BinarySearch(ids, row.Indices[q])] = row.Values[q];
            a[(long)r * w + n + r] = 1;
        }
        var pivots = Rref(p, a, m, w);
        return Split(a, m, n, pivots, ids);
    }

    /// <summary>Reads the I part of a reduced [B | I] (m rows of width n + m) into an <see cref="EchelonTransform{T}"/>.</summary>
    public static EchelonTransform<ulong> Split(ulong[] a, int m, int n, int[] pivots, int[] ids)
    {
        int w = n + m, k = 0;
        while (k < m && pivots[k] < n) k++;
        var top = new SparseVector<ulong>[k];
        var kernel = new SparseVector<ulong>[m - k];
        var pivotIds = new int[k];
        for (int r = 0; r < m; r++)
        {
            var part = a.AsSpan((int)((long)r * w + n), m);
            int count = 0;
            foreach (var x in part) if (x != 0) count++;
            var idx = new int[count];
            var val = new ulong[count];
            for (int j = 0, t = 0; j < m; j++) if (part[j] != 0) { idx[t] = j; val[t++] = part[j]; }
            if (r < k) { top[r] = new SparseVector<ulong>(idx, val); pivotIds[r] = ids[pivots[r]]; }
            else kernel[r - k] = new SparseVector<ulong>(idx, val);
        }
        return new EchelonTransform<ulong>(m, pivotIds, top, kernel);
    }

    /// <summary>
    /// Brings the m x w row-major matrix <paramref name="a"/> (entries below p) to reduced row echelon form
    /// over F_p in place, columns taken left to right; returns the pivot column of each non-zero row, in order.
    /// </summary>
    public static int[] Rref(ulong p, ulong[] a, int m, int w)
    {
        bool lazy = p < 1UL << 32 && (UInt128)(p - 1) * (p - 1) * (ulong)(m + 1) + p < UInt128.One << 64;
        var field = new PrimeField(p);
        var pivots = new List<int>();
        int row = 0;
        for (int col = 0; col < w && row < m; col++)
        {
            int pr = -1;
            for (int i = row; i < m && pr < 0; i++)
            {
                ref var x = ref a[(long)i * w + col];
                if (lazy) x %= p;
                if (x != 0) pr = i;
            }
            if (pr < 0) continue;
            int len = w - col;
            var prow = a.AsSpan((int)((long)row * w + col), len);
            if (pr != row) SwapRows(prow, a.AsSpan((int)((long)pr * w + col), len));
            if (lazy) for (int j = 0; j < len; j++) prow[j] %= p;
            var inv = field.Inverse(prow[0]);
            if (inv != 1) ScaleShoup(prow, inv, p);
            for (int i = 0; i < m; i++)
            {
                if (i == row) continue;
                var target = a.AsSpan((int)((long)i * w + col), len);
                var x = lazy ? target[0] % p : target[0];
                if (x == 0) { target[0] = 0; continue; }
                if (lazy) AddMulLazy(target, prow, p - x);
                else AddMulShoup(target, prow, p - x, p);
                target[0] = 0;
            }
            pivots.Add(col);
            row++;
        }
        if (lazy) for (long i = 0; i < a.LongLength; i++) a[i] %= p;
        return pivots.ToArray();
    }

    /// <summary>target += factor * source without reduction (factor and source below 2^32).</summary>
    private static void AddMulLazy(Span<ulong> target, ReadOnlySpan<ulong> source, ulong factor)
    {
        int j = 0;
        if (Avx2.IsSupported && target.Length >= 8)
        {
            ref var t0 = ref MemoryMarshal.GetReference(target);
            ref var s0 = ref MemoryMarshal.GetReference(source);
            var vf = Vector256.Create((uint)factor);
            for (; j + 4 <= target.Length; j += 4)
            {
                var prod = Avx2.Multiply(Vector256.LoadUnsafe(ref s0, (nuint)j).AsUInt32(), vf);
                (Vector256.LoadUnsafe(ref t0, (nuint)j) + prod).StoreUnsafe(ref t0, (nuint)j);
            }
        }
        for (; j < target.Length; j++) target[j] += factor * source[j];
    }

    /// <summary>target = target + factor * source mod p, all entries below p.</summary>
    private static void AddMulShoup(Span<ulong> target, ReadOnlySpan<ulong> source, ulong factor, ulong p)
    {
        ulong fq = (ulong)(((UInt128)factor << 64) / p);
        for (int j = 0; j < target.Length; j++)
        {
            ulong y = source[j];
            if (y == 0) continue;
            ulong r = factor * y - Math.BigMul(fq, y, out _) * p;
            r = Math.Min(r, r - p);
            ulong s = target[j] + r;
            target[j] = Math.Min(s, s - p);
        }
    }

    /// <summary>row = factor * row mod p, entries below p.</summary>
    private static void ScaleShoup(Span<ulong> row, ulong factor, ulong p)
    {
        ulong fq = (ulong)(((UInt128)factor << 64) / p);
        for (int j = 0; j < row.Length; j++)
        {
            ulong y = row[j];
            ulong r = factor * y - Math.BigMul(fq, y, out _) * p;
            row[j] = Math.Min(r, r - p);
        }
    }

    private static void SwapRows(Span<ulong> x, Span<ulong> y)
    {
        for (int j = 0; j < x.Length; j++) (x[j], y[j]) = (y[j], x[j]);
    }
}
