using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;

namespace FlowCert.Algebra;

/// <summary>
/// Dense Gauss-Jordan elimination over F_p (p below 2^62) on a row-major array of residues: the kernel
/// for dense blocks over F_p (<see cref="IField{T}.Eliminate"/> of <see cref="PrimeField"/>) and for each prime of the multi-modular
/// kernel over Q. Small primes use delayed reduction: while (p-1)^2 (m+1) + p fits in 64 bits a row
/// update is a plain multiply-add (four lanes at a time with AVX2) and entries are reduced only when read
/// as a pivot or multiplier. Larger primes multiply with a precomputed quotient per factor (Shoup's
/// method, common practice), so no division sits in the inner loop.
/// </summary>
internal static class ModularElimination
{
    /// <summary>True when the block is dense enough for this kernel.</summary>
    public static bool PaysOff<T>(IReadOnlyList<SparseVector<T>> rows) where T : struct
        => EchelonTransform<T>.PaysOff(rows, 16);

    /// <summary>Eliminates B over F_p: the reduced echelon form of [B | I].</summary>
    public static IEliminationResult<ulong> Run(ulong p, IReadOnlyList<SparseVector<ulong>> rows)
    {
        var index = EchelonTransform<ulong>.ColumnIndexOf(rows);
        var ids = index.Ids;
        int m = rows.Count, n = ids.Length, w = n + m;
        var a = new ulong[(long)m * w];
        for (int r = 0; r < m; r++)
        {
            var row = rows[r];
            for (int q = 0; q < row.Count; q++) a[(long)r * w + index.Of(row.Indices[q])] = row.Values[q];
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
        var kernel = new SparseVector<ulong>[m - k];
        for (int r = k; r < m; r++)
        {
            var part = a.AsSpan((int)((long)r * w + n), m);
            int count = 0;
            foreach (var x in part) if (x != 0) count++;
            var idx = new int[count];
            var val = new ulong[count];
            for (int j = 0, t = 0; j < m; j++) if (part[j] != 0) { idx[t] = j; val[t++] = part[j]; }
            kernel[r - k] = new SparseVector<ulong>(idx, val);
        }
        var pivotIds = new int[k];
        for (int r = 0; r < k; r++) pivotIds[r] = ids[pivots[r]];
        return new EchelonTransform<ulong>(m, pivotIds, (int row, int col, out ulong v) => (v = a[(long)row * w + n + col]) != 0, kernel);
    }

    /// <summary>
    /// Brings the m x w row-major matrix <paramref name="a"/> (entries below p) to reduced row echelon form
    /// over F_p in place, columns taken left to right; returns the pivot column of each non-zero row, in order.
    /// Pivots are taken in panels: a candidate row is brought up to date with the panel's pivots only when
    /// it is examined, the panel's pivot rows are kept reduced among themselves, and then every other row
    /// receives the whole panel in one pass (one read and write of the row per panel instead of per pivot;
    /// products summed in 64 or 128 bits and reduced once).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
    public static int[] Rref(ulong p, ulong[] a, int m, int w)
    {
        // Each row receives every pivot at most twice (once while examined, once in its panel's pass).
        bool lazy = p < 1UL << 32 && (UInt128)(p - 1) * (p - 1) * (ulong)(2 * m + 2) + p < UInt128.One << 64;
        // Wide sums: row entry plus a panel of products must stay below 2^128.
        int panel = lazy ? 16 : (int)UInt128.Min(32, (UInt128.MaxValue - p) / ((UInt128)(p - 1) * (p - 1) + 1));
        var field = new PrimeField(p);
        var wide = new WideReducer(p);
        var pivots = new List<int>();
        var cols = new int[panel];
        var factors = new ulong[panel];
        var applied = new int[m];
        int row = 0, col = 0;
        while (row < m && col < w)
        {
            int found = 0, first = row, from = col, len = w - from;
            Array.Clear(applied, first, m - first);
            for (; col < w && row < m && found < panel; col++)
            {
                int pr = -1;
                for (int i = row; i < m && pr < 0; i++)
                {
                    var target = Row(a, i, w, from);
                    for (int g = applied[i]; g < found; g++)
                    {
                        var x = lazy ? target[cols[g] - from] % p : target[cols[g] - from];
                        if (x == 0) continue;
                        if (lazy) AddMulLazy(target, Row(a, first + g, w, from), p - x);
                        else AddMulShoup(target, Row(a, first + g, w, from), p - x, p);
                        target[cols[g] - from] = 0;
                    }
                    applied[i] = found;
                    ref var y = ref target[col - from];
                    if (lazy) y %= p;
                    if (y != 0) pr = i;
                }
                if (pr < 0) continue;
                var prow = Row(a, row, w, from);
                if (pr != row) SwapRows(prow, Row(a, pr, w, from));
                if (lazy) for (int j = 0; j < len; j++) prow[j] %= p;
                var inv = field.Inverse(prow[col - from]);
                if (inv != 1) ScaleShoup(prow, inv, p);
                for (int g = 0; g < found; g++)
                {
                    var pg = Row(a, first + g, w, from);
                    var x = pg[col - from];
                    if (x != 0) { AddMulShoup(pg, prow, p - x, p); pg[col - from] = 0; }
                }
                cols[found++] = col;
                pivots.Add(col);
                row++;
            }
            if (found == 0) break;
            for (int i = 0; i < m; i++)
            {
                if (i == first) { i += found - 1; continue; }
                var target = Row(a, i, w, from);
                bool any = false;
                for (int g = 0; g < found; g++)
                {
                    var x = lazy ? target[cols[g] - from] % p : target[cols[g] - from];
                    factors[g] = x == 0 ? 0 : p - x;
                    any |= x != 0;
                }
                if (!any) continue;
                if (lazy) PanelLazy(target, a, first, found, w, from, factors);
                else PanelWide(target, a, first, found, w, from, factors, wide);
                for (int g = 0; g < found; g++) target[cols[g] - from] = 0;
            }
        }
        if (lazy) for (long i = 0; i < a.LongLength; i++) a[i] %= p;
        return pivots.ToArray();
    }

    private static Span<ulong> Row(ulong[] a, int i, int w, int from) => a.AsSpan((int)((long)i * w + from), w - from);

    /// <summary>target += sum_g factors[g] * (pivot row g), unreduced, four lanes at a time with AVX2.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
    private static void PanelLazy(Span<ulong> target, ulong[] a, int first, int found, int w, int from, ulong[] factors)
    {
        int len = target.Length, j = 0;
        if (Avx2.IsSupported && len >= 8)
        {
            ref var t0 = ref MemoryMarshal.GetReference(target);
            ref var s0 = ref a[(long)first * w + from];
            Span<Vector256<uint>> f = stackalloc Vector256<uint>[found];
            for (int g = 0; g < found; g++) f[g] = Vector256.Create((uint)factors[g]);
            for (; j + 4 <= len; j += 4)
            {
                var acc = Vector256.LoadUnsafe(ref t0, (nuint)j);
                nuint at = (nuint)j;
                for (int g = 0; g < found; g++, at += (nuint)w)
                    acc += Avx2.Multiply(Vector256.LoadUnsafe(ref s0, at).AsUInt32(), f[g]);
                acc.StoreUnsafe(ref t0, (nuint)j);
            }
        }
        for (; j < len; j++)
        {
            ulong acc = target[j];
            for (int g = 0; g < found; g++) acc += factors[g] * a[(long)(first + g) * w + from + j];
            target[j] = acc;
        }
    }

    /// <summary>target = target + sum_g factors[g] * (pivot row g) mod p: products summed in 128 bits, one reduction per entry.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
    private static void PanelWide(Span<ulong> target, ulong[] a, int first, int found, int w, int from, ulong[] factors, WideReducer wide)
    {
        for (int j = 0; j < target.Length; j++)
        {
            ulong lo = target[j], hi = 0;
            long at = (long)first * w + from + j;
            for (int g = 0; g < found; g++, at += w)
            {
                ulong ph = Math.BigMul(factors[g], a[at], out ulong pl);
                lo += pl;
                hi += ph + (lo < pl ? 1UL : 0UL);
            }
            target[j] = wide.Reduce(hi, lo);
        }
    }

    /// <summary>Reduces hi 2^64 + lo modulo p below 2^62 with two precomputed quotients (Shoup's method) and no division.</summary>
    private readonly struct WideReducer
    {
        private readonly ulong p, c, cq, oneq;

        public WideReducer(ulong p)
        {
            this.p = p;
            c = (ulong)((UInt128.One << 64) % p);
            cq = (ulong)(((UInt128)c << 64) / p);
            oneq = (ulong)((UInt128.One << 64) / p);
        }

        public ulong Reduce(ulong hi, ulong lo)
        {
            ulong r1 = c * hi - Math.BigMul(cq, hi, out _) * p;   // hi * 2^64 mod p, below 2p
            ulong r2 = lo - Math.BigMul(oneq, lo, out _) * p;     // lo mod p, below 2p
            ulong r = r1 + r2;                                     // below 4p < 2^64
            r = Math.Min(r, r - 2 * p);
            return Math.Min(r, r - p);
        }
    }

    /// <summary>target += factor * source without reduction (factor and source below 2^32).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
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
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
    internal static void AddMulShoup(Span<ulong> target, ReadOnlySpan<ulong> source, ulong factor, ulong p)
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
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
    internal static void ScaleShoup(Span<ulong> row, ulong factor, ulong p)
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
