using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// Each dense elimination kernel (packed F_2, word-sized F_p with and without delayed reduction,
/// multi-modular Q) against the reference elimination (<see cref="DenseMatrix{T, TField}"/>, plain
/// Gauss-Jordan) and against the sparse kernel the solver used before, on seeded random matrices of every
/// shape class: wide, tall, rank-deficient (products of thin factors) and with zero rows, with gappy column
/// ids and sizes that cross 64-bit words and several pivot groups. Checked: the rank; the solvable rows are
/// exactly those outside the support of the reference left kernel (Fredholm alternative, common practice);
/// each solution multiplies back to e_r, lives on the reference pivot columns and equals the sparse
/// kernel's; the left kernel annihilates B, has m - rank vectors, and its reduced echelon form is the
/// reference's.
/// </summary>
public class DenseKernelTests
{
    private enum Shape { Wide, Tall, RankDeficient, ZeroRows }

    private static SparseVector<T>[] RandomBlock<T, TField>(TField f, Random rng, Shape shape, int maxSide, Func<Random, T> nonZero)
        where T : struct where TField : struct, IField<T>
    {
        int small = rng.Next(1, maxSide / 2), large = rng.Next(maxSide / 2, maxSide + 1);
        var (m, n) = shape == Shape.Tall ? (large, small) : shape == Shape.Wide ? (small, large) : (rng.Next(2, maxSide), rng.Next(2, maxSide));
        T Entry() => rng.Next(2) == 0 ? f.Zero : nonZero(rng);
        var dense = new T[m, n];
        if (shape == Shape.RankDeficient)
        {
            int r = rng.Next(1, Math.Max(2, Math.Min(m, n) / 2));
            var basis = new T[r, n];
            for (int k = 0; k < r; k++) for (int j = 0; j < n; j++) basis[k, j] = Entry();
            for (int i = 0; i < m; i++)
                for (int k = 0; k < r; k++)
                {
                    var c = Entry();
                    for (int j = 0; j < n; j++) dense[i, j] = f.Add(dense[i, j], f.Multiply(c, basis[k, j]));
                }
        }
        else
            for (int i = 0; i < m; i++) for (int j = 0; j < n; j++) dense[i, j] = Entry();
        if (shape == Shape.ZeroRows)
            for (int i = 0; i < m; i++) if (rng.Next(3) == 0) for (int j = 0; j < n; j++) dense[i, j] = f.Zero;
        var rows = new SparseVector<T>[m];
        for (int i = 0; i < m; i++)
        {
            var idx = Enumerable.Range(0, n).Where(j => !f.IsZero(dense[i, j])).ToArray();
            rows[i] = new SparseVector<T>(idx.Select(j => 3 * j + 1).ToArray(), idx.Select(j => dense[i, j]).ToArray());
        }
        return rows;
    }

    private static void Compare<T, TField>(TField f, ulong prime, Func<Random, T> nonZero, int seed, int count, int maxSide,
        Func<SparseVector<T>[], IEliminationResult<T>> kernelUnderTest)
        where T : struct where TField : struct, IField<T>
    {
        var rng = new Random(seed);
        int solved = 0, blocked = 0;
        for (int t = 0; t < count; t++)
        {
            var shape = (Shape)(t % 4);
            var rows = RandomBlock(f, rng, shape, maxSide, nonZero);
            int m = rows.Length;
            var ids = rows.SelectMany(r => r.Indices).Distinct().Order().ToArray();
            var reference = new DenseMatrix<T, TField>(f, m, ids.Length);
            for (int i = 0; i < m; i++)
                for (int k = 0; k < rows[i].Count; k++) reference[i, Array.IndexOf(ids, rows[i].Indices[k])] = rows[i].Values[k];
            var (_, refPivots) = reference.RowReduce();
            var refKernel = reference.LeftKernel();
            var e = kernelUnderTest(rows);
            var sparse = new SparseElimination<T, TField>(f, rows);
            string where = $"case {t} ({shape}, {m} x {ids.Length})";

            Assert.True(refPivots.Length == e.Rank, $"{where}: rank {e.Rank}, reference {refPivots.Length}");

            var kernel = e.LeftKernel();
            Assert.Equal(m - e.Rank, kernel.Count);
            foreach (var y in kernel)
                foreach (var col in ids)
                {
                    var s = f.Zero;
                    for (int k = 0; k < y.Count; k++) s = f.Add(s, f.Multiply(y.Values[k], rows[y.Indices[k]].Get(f, col)));
                    Assert.True(f.IsZero(s), $"{where}: y^T B != 0");
                }
            var echelon = new SparseElimination<T, TField>(f, kernel).ReducedRows();
            var refEchelon = new SparseElimination<T, TField>(f, refKernel.Select(y => Sparse(f, y)).ToList()).ReducedRows();
            Assert.Equal(refEchelon.Count, echelon.Count);
            for (int k = 0; k < echelon.Count; k++)
            {
                Assert.Equal(refEchelon[k].Indices, echelon[k].Indices);
                Assert.True(refEchelon[k].Values.Zip(echelon[k].Values).All(p => f.AreEqual(p.First, p.Second)), $"{where}: kernel echelon form differs");
            }

            var solutions = e.SolveUnitVectors();
            var expected = sparse.SolveUnitVectors();
            var pivotIds = refPivots.Select(j => ids[j]).ToHashSet();
            for (int r = 0; r < m; r++)
            {
                bool solvable = refKernel.All(y => f.IsZero(y[r]));
                Assert.True(solvable == solutions.ContainsKey(r), $"{where}: row {r} solvable is {solvable}");
                if (!solvable) { blocked++; continue; }
                solved++;
                var c = solutions[r];
                Assert.All(c.Indices, id => Assert.Contains(id, pivotIds));
                for (int i = 0; i < m; i++)
                {
                    var s = f.Zero;
                    for (int k = 0; k < c.Count; k++) s = f.Add(s, f.Multiply(rows[i].Get(f, c.Indices[k]), c.Values[k]));
                    Assert.True(f.AreEqual(i == r ? f.One : f.Zero, s), $"{where}: (B c)[{i}] wrong for row {r}");
                }
                Assert.Equal(expected[r].Indices, c.Indices);
                Assert.True(expected[r].Values.Zip(c.Values).All(p => f.AreEqual(p.First, p.Second)), $"{where}: solution of row {r} differs from the sparse kernel's");
            }
        }
        Assert.True(solved > count && blocked > count / 4, $"solved {solved}, blocked {blocked}");
        _ = prime;
    }

    private static SparseVector<T> Sparse<T, TField>(TField f, T[] dense) where T : struct where TField : struct, IField<T>
    {
        var idx = Enumerable.Range(0, dense.Length).Where(i => !f.IsZero(dense[i])).ToArray();
        return new SparseVector<T>(idx, idx.Select(i => dense[i]).ToArray());
    }

    [Fact]
    public void PackedF2AgainstTheReference()
        => Compare<ulong, BinaryField>(default, 2, _ => 1UL, 111, 120, 150, rows => BitElimination.Run(rows));

    [Fact]
    public void WordSizedF2WithDelayedReductionAgainstTheReference()
        => Compare<ulong, PrimeField>(new PrimeField(2), 2, _ => 1UL, 112, 60, 90, rows => ModularElimination.Run(2, rows));

    [Fact]
    public void WordSizedF3WithDelayedReductionAgainstTheReference()
        => Compare<ulong, PrimeField>(new PrimeField(3), 3, r => (ulong)r.Next(1, 3), 113, 80, 90, rows => ModularElimination.Run(3, rows));

    [Fact]
    public void WordSizedMersenne61AgainstTheReference()
        => Compare<ulong, PrimeField>(new PrimeField(FieldSamples.Mersenne61), FieldSamples.Mersenne61,
            r => (ulong)r.NextInt64(1, (long)FieldSamples.Mersenne61), 114, 80, 90, rows => ModularElimination.Run(FieldSamples.Mersenne61, rows));

    [Fact]
    public void MultiModularQAgainstTheReference()
        => Compare<Rational, RationalField>(default, 0, r =>
        {
            var q = FieldSamples.SmallRational(r);
            return q.IsZero ? Rational.One : q;
        }, 115, 40, 30, rows => MultiModularElimination.TryRun(rows) ?? throw new InvalidOperationException("the multi-modular result failed its exact check"));

    [Fact]
    public void MultiModularQRejectsAnUnderdeterminedReconstruction()
    {
        // Entries with large numerators: one prime cannot hold the solutions, so the reconstruction or the
        // exact check must fail, and Run falls back to exact elimination with the same canonical answers.
        var rng = new Random(116);
        var rows = Enumerable.Range(0, 12).Select(_ => new SparseVector<Rational>(
            Enumerable.Range(0, 14).ToArray(),
            Enumerable.Range(0, 14).Select(_ => Rational.Create(rng.NextInt64(1, long.MaxValue), rng.Next(1, 1000))).ToArray())).ToArray();
        Assert.Null(MultiModularElimination.TryRun(rows, primeCount: 1));
        var full = MultiModularElimination.TryRun(rows);
        Assert.NotNull(full);
        var exact = new SparseElimination<Rational, RationalField>(default, rows).SolveUnitVectors();
        var fast = full.SolveUnitVectors();
        Assert.Equal(exact.Keys.Order(), fast.Keys.Order());
        foreach (var r in exact.Keys) Assert.Equal(exact[r].Values, fast[r].Values);
    }

    private sealed class FieldName : IFieldVisitor<string>
    {
        public string Visit<T, TField>(TField field) where T : struct where TField : struct, IField<T> => typeof(TField).Name;
    }

    [Fact]
    public void TheDispatchHandsF2ItsOwnFieldType()
    {
        Assert.Equal(nameof(BinaryField), FieldSpec.Parse("2").Accept(new FieldName()));
        Assert.Equal(nameof(PrimeField), FieldSpec.Parse("3").Accept(new FieldName()));
        Assert.Equal(nameof(RationalField), FieldSpec.Parse("Q").Accept(new FieldName()));
    }
}
