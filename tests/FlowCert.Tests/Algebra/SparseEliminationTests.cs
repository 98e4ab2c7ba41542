using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// <see cref="SparseElimination{T, TField}"/> on random sparse matrices with gappy column ids, against
/// the dense elimination (itself checked against a reference rank in DenseMatrixTests): rank, left
/// kernel, and SolveUnitVectors, which must return exactly the rows r with e_r in the column space, each
/// with a solution that multiplies back to e_r, lives on the pivot columns (the greedy column basis), and
/// does not depend on the order of the rows. The dense kernels pass the same checks through the
/// dispatcher here, and against the reference one by one in DenseKernelTests.
/// </summary>
public class SparseEliminationTests
{
    private sealed record Case<T>(SparseVector<T>[] Rows, int[] ColumnIds) where T : struct;

    private static Case<T> RandomCase<T, TField>(TField f, Random rng, Func<Random, T> nonZero)
        where T : struct where TField : struct, IField<T>
    {
        int rowCount = rng.Next(0, 13);
        var ids = Enumerable.Range(0, 60).OrderBy(_ => rng.Next()).Take(rng.Next(1, 12)).Order().ToArray();
        var rows = new SparseVector<T>[rowCount];
        for (int r = 0; r < rowCount; r++)
        {
            double density = rng.NextDouble() * 0.6;
            var chosen = ids.Where(_ => rng.NextDouble() < density).ToArray();
            rows[r] = new SparseVector<T>(chosen, chosen.Select(_ => nonZero(rng)).ToArray());
        }
        if (rowCount > 2 && rng.Next(3) == 0) // a scaled copy of another row: a left-kernel vector
            rows[rowCount - 1] = rows[rng.Next(rowCount - 1)].Scale(f, nonZero(rng));
        return new Case<T>(rows, ids);
    }

    private static DenseMatrix<T, TField> Dense<T, TField>(TField f, Case<T> c)
        where T : struct where TField : struct, IField<T>
    {
        var m = new DenseMatrix<T, TField>(f, c.Rows.Length, c.ColumnIds.Length);
        for (int r = 0; r < c.Rows.Length; r++)
            for (int k = 0; k < c.Rows[r].Count; k++)
                m[r, Array.IndexOf(c.ColumnIds, c.Rows[r].Indices[k])] = c.Rows[r].Values[k];
        return m;
    }

    private static void AssertWellFormed<T, TField>(TField f, SparseVector<T> v)
        where T : struct where TField : struct, IField<T>
    {
        Assert.Equal(v.Indices.Length, v.Values.Length);
        for (int k = 0; k < v.Count; k++)
        {
            if (k > 0) Assert.True(v.Indices[k] > v.Indices[k - 1], "indices not strictly increasing");
            Assert.False(f.IsZero(v.Values[k]), "a stored zero");
        }
    }

    private static T[] Unit<T, TField>(TField f, int n, int r) where T : struct where TField : struct, IField<T>
        => Enumerable.Range(0, n).Select(i => i == r ? f.One : f.Zero).ToArray();

    private static void Check<T, TField>(TField f, ulong prime, Func<Random, T> nonZero, int seed, int count,
        Func<SparseVector<T>[], IEliminationResult<T>>? eliminate = null)
        where T : struct where TField : struct, IField<T>
    {
        eliminate ??= rows => new SparseElimination<T, TField>(f, rows);
        var rng = new Random(seed);
        int solvedRows = 0, blockedRows = 0;
        for (int t = 0; t < count; t++)
        {
            var c = RandomCase(f, rng, nonZero);
            int m = c.Rows.Length, n = c.ColumnIds.Length;
            var dense = Dense(f, c);
            var (_, densePivots) = dense.RowReduce();
            var pivotIds = densePivots.Select(j => c.ColumnIds[j]).ToHashSet();
            var e = eliminate(c.Rows);

            Assert.Equal(dense.Rank(), e.Rank);

            var kernel = e.LeftKernel();
            Assert.Equal(m - e.Rank, kernel.Count);
            var kernelTable = new T[kernel.Count, m];
            for (int k = 0; k < kernel.Count; k++)
            {
                var y = kernel[k];
                AssertWellFormed(f, y);
                var y2 = new T[m];
                for (int r = 0; r < m; r++) y2[r] = y.Get(f, r);
                for (int r = 0; r < m; r++) kernelTable[k, r] = y2[r];
                for (int j = 0; j < n; j++)
                {
                    var s = f.Zero;
                    for (int r = 0; r < m; r++) s = f.Add(s, f.Multiply(y2[r], dense[r, j]));
                    Assert.True(f.IsZero(s), "y^T B != 0");
                }
            }
            Assert.Equal(kernel.Count, ReferenceRank.Of(kernelTable, prime));

            var solutions = e.SolveUnitVectors();
            var kernelSupport = kernel.SelectMany(y => y.Indices).ToHashSet();
            for (int r = 0; r < m; r++)
            {
                var denseSolution = dense.Solve(Unit<T, TField>(f, m, r));
                Assert.Equal(denseSolution is not null, solutions.ContainsKey(r));
                Assert.Equal(kernelSupport.Contains(r), !solutions.ContainsKey(r));
                if (denseSolution is null) { blockedRows++; continue; }
                solvedRows++;
                var sol = solutions[r];
                AssertWellFormed(f, sol);
                Assert.All(sol.Indices, id => Assert.Contains(id, pivotIds));
                // B c = e_r, row by row.
                for (int i = 0; i < m; i++)
                {
                    var s = f.Zero;
                    for (int k = 0; k < sol.Count; k++) s = f.Add(s, f.Multiply(c.Rows[i].Get(f, sol.Indices[k]), sol.Values[k]));
                    Assert.True(f.AreEqual(i == r ? f.One : f.Zero, s), $"(B c)[{i}] wrong for the solution of row {r}");
                }
                // The solution on the pivot columns is unique, so it is the dense one.
                for (int j = 0; j < n; j++) Assert.True(f.AreEqual(denseSolution[j], sol.Get(f, c.ColumnIds[j])));
            }

            // Shuffled rows: the same rank, the same kernel size, the same solution for every row.
            var perm = Enumerable.Range(0, m).OrderBy(_ => rng.Next()).ToArray();
            var shuffled = eliminate(perm.Select(i => c.Rows[i]).ToArray());
            Assert.Equal(e.Rank, shuffled.Rank);
            Assert.Equal(kernel.Count, shuffled.LeftKernel().Count);
            var again = shuffled.SolveUnitVectors();
            Assert.Equal(solutions.Count, again.Count);
            for (int i = 0; i < m; i++)
            {
                Assert.Equal(solutions.ContainsKey(perm[i]), again.ContainsKey(i));
                if (!again.ContainsKey(i)) continue;
                Assert.Equal(solutions[perm[i]].Indices, again[i].Indices);
                Assert.True(solutions[perm[i]].Values.Zip(again[i].Values).All(p => f.AreEqual(p.First, p.Second)),
                    $"solution of row {perm[i]} changed when the rows were shuffled");
            }
        }
        // The random cases exercise both outcomes.
        Assert.True(solvedRows > count && blockedRows > count / 4, $"solved {solvedRows}, blocked {blockedRows}");
    }

    [Fact]
    public void OverQ() => Check<Rational, RationalField>(default, 0, r =>
    {
        var q = FieldSamples.SmallRational(r);
        return q.IsZero ? Rational.One : q;
    }, 21, 400);

    [Fact]
    public void OverF2() => Check<ulong, PrimeField>(new PrimeField(2), 2, _ => 1UL, 22, 400);

    [Fact]
    public void OverF2PackedIntoBits() => Check<ulong, PrimeField>(new PrimeField(2), 2, _ => 1UL, 25, 400,
        rows => BitElimination.Run(rows));

    [Fact]
    public void OverF2ThroughTheDispatcher() => Check<ulong, BinaryField>(default, 2, _ => 1UL, 26, 400,
        rows => Elimination.Run(default(BinaryField), rows));

    [Fact]
    public void OverF3ThroughTheDispatcher() => Check<ulong, PrimeField>(new PrimeField(3), 3, r => (ulong)r.Next(1, 3), 27, 400,
        rows => Elimination.Run(new PrimeField(3), rows));

    [Fact]
    public void OverQThroughTheDispatcher() => Check<Rational, RationalField>(default, 0, r =>
    {
        var q = FieldSamples.SmallRational(r);
        return q.IsZero ? Rational.One : q;
    }, 28, 300, rows => Elimination.Run(default(RationalField), rows));

    [Fact]
    public void OverF3() => Check<ulong, PrimeField>(new PrimeField(3), 3, r => (ulong)r.Next(1, 3), 23, 400);

    [Fact]
    public void OverFMersenne61() => Check<ulong, PrimeField>(new PrimeField(FieldSamples.Mersenne61), FieldSamples.Mersenne61,
        r => (ulong)r.NextInt64(1, (long)FieldSamples.Mersenne61), 24, 400);

    [Fact]
    public void AHandExampleOverQ()
    {
        // Rows: r0 = [1 1 0], r1 = [0 1 1], r2 = [1 2 1] = r0 + r1, on column ids 3, 7, 9.
        SparseVector<Rational>[] rows =
        [
            new([3, 7], [1, 1]),
            new([7, 9], [1, 1]),
            new([3, 7, 9], [1, 2, 1]),
        ];
        var e = new SparseElimination<Rational, RationalField>(default, rows);
        Assert.Equal(2, e.Rank);
        var y = Assert.Single(e.LeftKernel());
        // The left kernel is spanned by (1, 1, -1): every row is in its support, so no e_r is reachable.
        Assert.Equal([0, 1, 2], y.Indices);
        Assert.Equal(y.Values[0], y.Values[1]);
        Assert.Equal(-y.Values[0], y.Values[2]);
        Assert.Empty(e.SolveUnitVectors());
    }
}
