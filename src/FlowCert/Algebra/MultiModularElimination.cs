using System.Runtime.CompilerServices;
using System.Numerics;
using System.Runtime.InteropServices;

namespace FlowCert.Algebra;

/// <summary>
/// Dense elimination over Q by the multi-modular method (common practice): the reduced echelon form of
/// [B | I] is computed over F_p for enough primes just below 2^62 (<see cref="ModularElimination"/>),
/// combined by Chinese remaindering and turned back into rationals by rational reconstruction (a
/// half-run extended Euclid), one common denominator per row. How many primes suffice follows from
/// Hadamard's bound on the minors of [L B | L I] (L the common denominator of B). Primes whose pivot
/// columns differ from the earliest seen are dropped (they divide a minor). The result is then checked
/// exactly, T B = R with R in reduced echelon form, before it is used; when the check fails the block is
/// eliminated again with exact rational arithmetic (<see cref="SparseElimination{T, TField}"/>).
/// </summary>
internal static class MultiModularElimination
{
    private static readonly List<ulong> PrimeList = [];

    /// <summary>The i-th prime below 2^62, counting down (deterministic).</summary>
    private static ulong Prime(int i)
    {
        lock (PrimeList)
        {
            ulong c = PrimeList.Count == 0 ? (1UL << 62) - 1 : PrimeList[^1] - 2;
            while (PrimeList.Count <= i)
            {
                if (Primality.IsPrime(c)) PrimeList.Add(c);
                c -= 2;
            }
            return PrimeList[i];
        }
    }

    private const int LargeBlock = 64;

    /// <summary>
    /// True when the block is dense enough for this kernel: the word-sized test of the F_p kernel, and
    /// either at least <see cref="LargeBlock"/> rows or a third of the m x n entries non-zero. Small sparser
    /// blocks (such as the triangular blocks of a band graph of width 32) keep their structure under exact
    /// elimination, which then beats this kernel; from about 64 rows on, exact numbers grow with the rank
    /// and this kernel wins even on triangular blocks (bench/layers, width n/8).
    /// </summary>
    public static bool PaysOff(IReadOnlyList<SparseVector<Rational>> rows)
    {
        if (!ModularElimination.PaysOff(rows)) return false;
        if (rows.Count >= LargeBlock) return true;
        long entries = 0;
        foreach (var r in rows) entries += r.Count;
        return 3 * entries >= (long)rows.Count * EchelonTransform<Rational>.ColumnIndexOf(rows).Ids.Length;
    }

    /// <summary>Eliminates B over Q: verified multi-modular, or exact when verification fails.</summary>
    public static IEliminationResult<Rational> Run(IReadOnlyList<SparseVector<Rational>> rows)
        => (IEliminationResult<Rational>?)TryRun(rows) ?? new SparseElimination<Rational, RationalField>(default, rows);

    /// <summary>The verified multi-modular result, or null when it cannot be verified.</summary>
    /// <param name="rows">The block.</param>
    /// <param name="primeCount">For tests: use this many primes instead of what the bound asks.</param>
    internal static EchelonTransform<Rational>? TryRun(IReadOnlyList<SparseVector<Rational>> rows, int? primeCount = null)
    {
        var index = EchelonTransform<Rational>.ColumnIndexOf(rows);
        var ids = index.Ids;
        int m = rows.Count, n = ids.Length, w = n + m;
        // Integer form: [L B | L I], L the least common multiple of the denominators.
        var l = BigInteger.One;
        foreach (var r in rows) foreach (var v in r.Values) l = l / BigInteger.GreatestCommonDivisor(l, v.Denominator) * v.Denominator;
        var cols = new int[m][];
        var ints = new BigInteger[m][];
        long hadamardBits = 0;
        for (int r = 0; r < m; r++)
        {
            var row = rows[r];
            cols[r] = new int[row.Count];
            ints[r] = new BigInteger[row.Count];
            var sumSq = l * l;
            for (int q = 0; q < row.Count; q++)
            {
                cols[r][q] = index.Of(row.Indices[q]);
                ints[r][q] = row.Values[q].Numerator * (l / row.Values[q].Denominator);
                sumSq += ints[r][q] * ints[r][q];
            }
            hadamardBits += (long)(sumSq.GetBitLength() + 1) / 2;
        }
        // Numerators and denominators are minors, at most 2^hadamardBits, so M > 2^(2 hadamardBits + 1)
        // always suffices; the actual sizes are usually far smaller, so start with few primes and double.
        int needed = primeCount ?? (int)((2 * hadamardBits + 2 + 60) / 61);
        var primes = new List<ulong>();
        var images = new List<ulong[]>();
        int[]? profile = null;
        int next = 0, target = primeCount ?? Math.Min(needed, 4);
        BigInteger[][]? num;
        BigInteger[] den = new BigInteger[m];
        while (true)
        {
            while (primes.Count < target)
            {
                if (next > 4 * needed + 16) return null;
                ulong p = Prime(next++);
                if (l % p == 0) continue;
                var a = new ulong[(long)m * w];
                ulong lp = (ulong)(l % p);
                for (int r = 0; r < m; r++)
                {
                    for (int q = 0; q < cols[r].Length; q++) a[(long)r * w + cols[r][q]] = Residue(ints[r][q], p);
                    a[(long)r * w + n + r] = lp;
                }
                var piv = ModularElimination.Rref(p, a, m, w);
                int cmp = profile is null ? -1 : Compare(piv, profile);
                if (cmp > 0) continue; // p divides a minor: its pivots come later
                if (cmp < 0) { profile = piv; primes.Clear(); images.Clear(); }
                primes.Add(p);
                images.Add(a);
            }
            num = Reconstruct(m, w, primes, images, den);
            if (num is not null && Verify(m, n, profile!, num, den, cols, ints, l, ref next)) break;
            if (primeCount is not null || target >= needed) return null;
            target = Math.Min(needed, 2 * target);
        }
        var pivots = profile!;
        int k = 0;
        while (k < m && pivots[k] < n) k++;
        var kernel = new SparseVector<Rational>[m - k];
        var pivotIds = new int[k];
        for (int r = 0; r < k; r++) pivotIds[r] = ids[pivots[r]];
        for (int r = k; r < m; r++)
        {
            var idx = new List<int>();
            var val = new List<Rational>();
            for (int j = 0; j < m; j++)
                if (!num[r][n + j].IsZero) { idx.Add(j); val.Add(Rational.Create(num[r][n + j], den[r])); }
            kernel[r - k] = new SparseVector<Rational>(idx.ToArray(), val.ToArray());
        }
        var numerators = num;
        return new EchelonTransform<Rational>(m, pivotIds, (int row, int col, out Rational v) =>
        {
            var x = numerators[row][n + col];
            v = x.IsZero ? Rational.Zero : Rational.Create(x, den[row]);
            return !x.IsZero;
        }, kernel);
    }

    private static int Compare(int[] a, int[] b)
    {
        for (int i = 0; i < Math.Min(a.Length, b.Length); i++) if (a[i] != b[i]) return a[i].CompareTo(b[i]);
        return b.Length.CompareTo(a.Length);
    }

    private static ulong Residue(BigInteger v, ulong p)
    {
        var r = (ulong)BigInteger.Abs(v % p);
        return v.Sign < 0 && r != 0 ? p - r : r;
    }

    /// <summary>
    /// Rows of [R | T] as integer numerators over one denominator per row, from their images modulo the
    /// primes, or null when some entry has no reconstruction within the bound.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
    private static BigInteger[][]? Reconstruct(int m, int w, List<ulong> primes, List<ulong[]> images, BigInteger[] den)
    {
        var crt = new Crt(primes);
        var num = new BigInteger[m][];
        var residues = new ulong[primes.Count];
        var dmod = new ulong[primes.Count];
        var dq = new ulong[primes.Count];
        for (int r = 0; r < m; r++)
        {
            var y = num[r] = new BigInteger[w];
            var d = BigInteger.One;
            for (int t = 0; t < primes.Count; t++) { dmod[t] = 1; dq[t] = Shoup.Quotient(1, primes[t]); }
            for (int j = 0; j < w; j++)
            {
                long e = (long)r * w + j;
                bool zero = true;
                for (int t = 0; t < primes.Count; t++)
                {
                    residues[t] = Shoup.Multiply(dmod[t], dq[t], images[t][e], primes[t]);
                    zero &= residues[t] == 0;
                }
                if (zero) continue;
                var x = crt.Combine(residues);
                if (BigInteger.Abs(x) <= crt.Bound) { y[j] = x; continue; }
                if (crt.Reconstruct(x) is not var (nn, dd) || d * dd > crt.Bound) return null;
                // The entry is nn / (d dd): every earlier numerator scales by dd.
                for (int q = 0; q < j; q++) if (!y[q].IsZero) y[q] *= dd;
                d *= dd;
                for (int t = 0; t < primes.Count; t++) { dmod[t] = (ulong)(d % primes[t]); dq[t] = Shoup.Quotient(dmod[t], primes[t]); }
                y[j] = nn;
            }
            den[r] = d;
        }
        return num;
    }

    /// <summary>
    /// The exact check. Row r of [R | T] is num[r] / den[r]; R must be in reduced echelon form with the
    /// given pivots (zero before its pivot, one at it, zero at the other pivots), and the integer matrix
    /// E = T' (L B) - L R' (primes: numerators) must vanish. E is checked modulo fresh primes whose product
    /// exceeds the bound (m max|L B| + L) max|num| on its entries, so E = 0 exactly (an integer smaller in
    /// size than a multiple of it is zero; common practice). Then T B = R with T invertible, so R is the
    /// reduced echelon form of B, which is unique, and T holds the canonical solutions and kernel.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
    private static bool Verify(int m, int n, int[] pivots, BigInteger[][] num, BigInteger[] den, int[][] cols, BigInteger[][] ints, BigInteger l, ref int next)
    {
        if (pivots.Length != m) return false;
        long maxBits = 0;
        var maxB = BigInteger.Zero;
        for (int r = 0; r < m; r++)
        {
            var y = num[r];
            if (den[r].Sign <= 0 || y[pivots[r]] != den[r]) return false;
            for (int j = 0; j < pivots[r]; j++) if (!y[j].IsZero) return false;
            for (int q = 0; q < m; q++) if (q != r && !y[pivots[q]].IsZero) return false;
            foreach (var v in y) maxBits = Math.Max(maxBits, (long)BigInteger.Abs(v).GetBitLength());
            foreach (var b in ints[r]) maxB = BigInteger.Max(maxB, BigInteger.Abs(b));
        }
        var bound = (m * maxB + l) << (int)maxBits;
        var product = BigInteger.One;
        int w = num[0].Length;
        var yq = new ulong[w];
        var acc = new ulong[n];
        while (product <= bound)
        {
            ulong q = Prime(next++);
            product *= q;
            var bq = new ulong[m][];
            for (int i = 0; i < m; i++)
            {
                bq[i] = new ulong[ints[i].Length];
                for (int k = 0; k < ints[i].Length; k++) bq[i][k] = Residue(ints[i][k], q);
            }
            ulong lq = Residue(l, q), lqq = Shoup.Quotient(lq, q);
            for (int r = 0; r < m; r++)
            {
                for (int j = 0; j < w; j++) yq[j] = num[r][j].IsZero ? 0 : Residue(num[r][j], q);
                Array.Clear(acc);
                for (int i = 0; i < m; i++)
                {
                    ulong t = yq[n + i];
                    if (t == 0) continue;
                    ulong tq = Shoup.Quotient(t, q);
                    var ci = cols[i];
                    var bi = bq[i];
                    for (int k = 0; k < ci.Length; k++)
                    {
                        ulong s = acc[ci[k]] + Shoup.Multiply(t, tq, bi[k], q);
                        acc[ci[k]] = Math.Min(s, s - q);
                    }
                }
                for (int j = 0; j < n; j++) if (acc[j] != Shoup.Multiply(lq, lqq, yq[j], q)) return false;
            }
        }
        return true;
    }

    /// <summary>Chinese remaindering for a fixed list of primes (Garner's mixed radix form) and rational reconstruction.</summary>
    private sealed class Crt
    {
        private readonly ulong[] p;
        private readonly ulong[] inverse, inverseQ; // (p_0 ... p_{t-1})^-1 mod p_t and its Shoup quotient
        private readonly ulong[,] radix, radixQ;     // p_j mod p_t and its Shoup quotient, j < t
        private readonly ulong[] digits, limbs;
        public BigInteger Modulus { get; }
        /// <summary>floor(sqrt(M / 2)): numerators and denominators up to this are reconstructed uniquely.</summary>
        public BigInteger Bound { get; }
        private readonly BigInteger half;

        public Crt(List<ulong> primes)
        {
            p = primes.ToArray();
            int k = p.Length;
            inverse = new ulong[k];
            inverseQ = new ulong[k];
            radix = new ulong[k, k];
            radixQ = new ulong[k, k];
            for (int t = 0; t < k; t++)
            {
                ulong prod = 1;
                for (int j = 0; j < t; j++)
                {
                    radix[t, j] = p[j] % p[t];
                    radixQ[t, j] = Shoup.Quotient(radix[t, j], p[t]);
                    prod = Primality.MulMod(prod, radix[t, j], p[t]);
                }
                inverse[t] = new PrimeField(p[t]).Inverse(prod);
                inverseQ[t] = Shoup.Quotient(inverse[t], p[t]);
            }
            digits = new ulong[k];
            limbs = new ulong[k + 1];
            var mod = BigInteger.One;
            foreach (var q in p) mod *= q;
            Modulus = mod;
            half = mod >> 1;
            Bound = Sqrt(mod >> 1);
        }

        /// <summary>The integer in (-M/2, M/2] with the given residues.</summary>
        [MethodImpl(MethodImplOptions.AggressiveOptimization)] // kernels run once per process: no slow first tier
        public BigInteger Combine(ulong[] r)
        {
            int k = p.Length;
            for (int t = 0; t < k; t++)
            {
                ulong pt = p[t];
                ulong acc = 0; // v_0 + p_0 (v_1 + p_1 (...)) mod p_t, by Horner from the top digit
                for (int j = t - 1; j >= 0; j--)
                {
                    // Every prime lies in (2^61, 2^62), so a digit below p_j is below 2 p_t.
                    ulong d = Math.Min(digits[j], digits[j] - pt);
                    acc = Shoup.Multiply(radix[t, j], radixQ[t, j], acc, pt) + d;
                    acc = Math.Min(acc, acc - pt);
                }
                ulong diff = r[t] >= acc ? r[t] - acc : r[t] + pt - acc;
                digits[t] = Shoup.Multiply(inverse[t], inverseQ[t], diff, pt);
            }
            Array.Clear(limbs);
            int used = 1;
            limbs[0] = digits[k - 1];
            for (int t = k - 2; t >= 0; t--)
            {
                ulong carry = digits[t];
                for (int q = 0; q < used; q++)
                {
                    ulong hi = Math.BigMul(limbs[q], p[t], out ulong lo);
                    lo += carry;
                    if (lo < carry) hi++;
                    limbs[q] = lo;
                    carry = hi;
                }
                if (carry != 0) limbs[used++] = carry;
            }
            var x = new BigInteger(MemoryMarshal.AsBytes(limbs.AsSpan(0, used)), isUnsigned: true);
            return x > half ? x - Modulus : x;
        }

        /// <summary>n / d with n = d x mod M, |n| and d at most <see cref="Bound"/>, or null.</summary>
        public (BigInteger, BigInteger)? Reconstruct(BigInteger x)
        {
            BigInteger r0 = Modulus, r1 = x.Sign < 0 ? x + Modulus : x, t0 = 0, t1 = 1;
            while (r1 > Bound)
            {
                var q = BigInteger.DivRem(r0, r1, out var rem);
                (r0, r1) = (r1, rem);
                (t0, t1) = (t1, t0 - q * t1);
            }
            if (t1.IsZero || BigInteger.Abs(t1) > Bound) return null;
            return t1.Sign < 0 ? (-r1, -t1) : (r1, t1);
        }

        private static BigInteger Sqrt(BigInteger v)
        {
            if (v.IsZero) return 0;
            var x = BigInteger.One << (int)((v.GetBitLength() + 1) / 2);
            while (true)
            {
                var y = (x + v / x) >> 1;
                if (y >= x) return x;
                x = y;
            }
        }
    }
}

/// <summary>Multiplication by a fixed residue with a precomputed quotient (Shoup's method, common practice).</summary>
internal static class Shoup
{
    /// <summary>floor(c 2^64 / p) for c below p.</summary>
    public static ulong Quotient(ulong c, ulong p) => (ulong)(((UInt128)c << 64) / p);

    /// <summary>c y mod p for c below p and p below 2^63, given q = Quotient(c, p).</summary>
    public static ulong Multiply(ulong c, ulong q, ulong y, ulong p)
    {
        ulong r = c * y - Math.BigMul(q, y, out _) * p;
        return Math.Min(r, r - p);
    }
}
