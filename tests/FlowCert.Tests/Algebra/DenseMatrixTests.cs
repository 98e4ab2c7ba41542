using System.Numerics;
using FlowCert.Algebra;
using Fractions;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// Gauss-Jordan elimination of <see cref="DenseMatrix{T, TField}"/> over Q, F_2, F_3 and F_(2^61-1) on
/// random matrices of every rank: row echelon shape, solutions multiplied back, left-kernel vectors
/// multiplied back and counted, ranks against an independent elimination (<see cref="ReferenceRank"/>).
/// Facts of linear algebra used here (rank-nullity, Fredholm alternative) are common practice.
/// </summary>
public class DenseMatrixTests
{
    /// <summary>A random matrix; about a third are a product of two thin factors, to get low rank.</summary>
    public static DenseMatrix<T, TField> RandomMatrix<T, TField>(TField f, Random rng, Func<Random, T> sample, int rows, int cols)
        where T : struct where TField : struct, IField<T>
    {
        var m = new DenseMatrix<T, TField>(f, rows, cols);
        T Sparse() => rng.Next(3) == 0 ? f.Zero : sample(rng);
        if (rng.Next(3) == 0)
        {
            int k = rng.Next(0, Math.Min(rows, cols) + 1);
            var left = new T[rows, k];
            var right = new T[k, cols];
            for (int i = 0; i < rows; i++) for (int l = 0; l < k; l++) left[i, l] = Sparse();
            for (int l = 0; l < k; l++) for (int j = 0; j < cols; j++) right[l, j] = Sparse();
            for (int i = 0; i < rows; i++)
                for (int j = 0; j < cols; j++)
                {
                    var s = f.Zero;
                    for (int l = 0; l < k; l++) s = f.Add(s, f.Multiply(left[i, l], right[l, j]));
                    m[i, j] = s;
                }
        }
        else
        {
            for (int i = 0; i < rows; i++) for (int j = 0; j < cols; j++) m[i, j] = Sparse();
        }
        if (rows > 1 && rng.Next(4) == 0) // a repeated row forces a left kernel
            for (int j = 0; j < cols; j++) m[rng.Next(rows), j] = m[0, j];
        return m;
    }

    public static T[,] Entries<T, TField>(DenseMatrix<T, TField> m) where T : struct where TField : struct, IField<T>
    {
        var e = new T[m.Rows, m.Columns];
        for (int i = 0; i < m.Rows; i++) for (int j = 0; j < m.Columns; j++) e[i, j] = m[i, j];
        return e;
    }

    private static T Dot<T, TField>(TField f, IReadOnlyList<T> x, IReadOnlyList<T> y) where T : struct where TField : struct, IField<T>
    {
        var s = f.Zero;
        for (int i = 0; i < x.Count; i++) s = f.Add(s, f.Multiply(x[i], y[i]));
        return s;
    }

    /// <summary>Every check of this class on one matrix.</summary>
    internal static void CheckElimination<T, TField>(TField f, DenseMatrix<T, TField> a, ulong prime, Random rng, Func<Random, T> sample)
        where T : struct where TField : struct, IField<T>
    {
        var original = Entries(a);
        int rows = a.Rows, cols = a.Columns;
        string Show() => string.Join(" / ", Enumerable.Range(0, rows).Select(i => string.Join(" ", Enumerable.Range(0, cols).Select(j => f.Format(original[i, j])))));

        // Rank against the independent elimination.
        int rank = a.Rank();
        Assert.True(ReferenceRank.Of(original, prime) == rank, $"rank {rank} disagrees with the reference for {Show()}");

        // Reduced row echelon form, spanning the same row space.
        var (r, pivots) = a.RowReduce();
        Assert.Equal(rank, pivots.Length);
        for (int k = 0; k < pivots.Length; k++)
        {
            if (k > 0) Assert.True(pivots[k] > pivots[k - 1]);
            for (int j = 0; j < pivots[k]; j++) Assert.True(f.IsZero(r[k, j]), "entry left of a pivot");
            for (int i = 0; i < rows; i++)
                Assert.True(f.AreEqual(r[i, pivots[k]], i == k ? f.One : f.Zero), $"pivot column {pivots[k]} is not a unit column");
        }
        for (int i = rank; i < rows; i++) for (int j = 0; j < cols; j++) Assert.True(f.IsZero(r[i, j]), "non-zero row below the rank");
        var stacked = new T[2 * rows, cols];
        for (int i = 0; i < rows; i++) for (int j = 0; j < cols; j++) { stacked[i, j] = original[i, j]; stacked[rows + i, j] = r[i, j]; }
        Assert.Equal(rank, ReferenceRank.Of(stacked, prime)); // rows of R lie in the row space of A

        // Consistent right-hand sides: a solution exists, multiplies back, and is zero off the pivot columns.
        var x0 = Enumerable.Range(0, cols).Select(_ => sample(rng)).ToArray();
        var b0 = a.Multiply(x0);
        var x = a.Solve(b0);
        Assert.NotNull(x);
        Assert.Equal(b0, a.Multiply(x));
        for (int j = 0; j < cols; j++) if (!pivots.Contains(j)) Assert.True(f.IsZero(x[j]), "free variable not zero");

        // Left kernel: right count (rank-nullity), each vector kills A, and they are independent.
        var kernel = a.LeftKernel();
        Assert.Equal(rows - rank, kernel.Count);
        foreach (var y in kernel)
        {
            Assert.Equal(rows, y.Length);
            for (int j = 0; j < cols; j++)
                Assert.True(f.IsZero(Dot(f, y, Enumerable.Range(0, rows).Select(i => original[i, j]).ToArray())), "y^T A != 0");
        }
        var k2 = new T[kernel.Count, rows];
        for (int t = 0; t < kernel.Count; t++) for (int i = 0; i < rows; i++) k2[t, i] = kernel[t][i];
        Assert.Equal(kernel.Count, ReferenceRank.Of(k2, prime));

        // Arbitrary right-hand sides: solved exactly when consistent; otherwise the left kernel proves it
        // (Fredholm alternative: A x = b has no solution iff some y with y^T A = 0 has y.b != 0).
        for (int t = 0; t < 3; t++)
        {
            var b = Enumerable.Range(0, rows).Select(_ => sample(rng)).ToArray();
            var aug = new T[rows, cols + 1];
            for (int i = 0; i < rows; i++) { for (int j = 0; j < cols; j++) aug[i, j] = original[i, j]; aug[i, cols] = b[i]; }
            bool consistent = ReferenceRank.Of(aug, prime) == rank;
            var xb = a.Solve(b);
            Assert.Equal(consistent, xb is not null);
            if (xb is not null) Assert.Equal(b, a.Multiply(xb));
            else Assert.Contains(kernel, y => !f.IsZero(Dot(f, y, b)));
        }

        // Nothing above changed the matrix.
        Assert.Equal(original, Entries(a));
    }

    private static void RunRandom<T, TField>(TField f, ulong prime, Func<Random, T> sample, int seed, int count)
        where T : struct where TField : struct, IField<T>
    {
        var rng = new Random(seed);
        for (int t = 0; t < count; t++)
        {
            int rows = rng.Next(1, 9), cols = rng.Next(1, 9);
            CheckElimination(f, RandomMatrix(f, rng, sample, rows, cols), prime, rng, sample);
        }
    }

    [Fact]
    public void EliminationOverQ() => RunRandom<Rational, RationalField>(default, 0, FieldSamples.SmallRational, 11, 300);

    [Fact]
    public void EliminationOverF2() => RunRandom<ulong, PrimeField>(new PrimeField(2), 2, r => FieldSamples.Residue(r, 2), 12, 300);

    [Fact]
    public void EliminationOverF3() => RunRandom<ulong, PrimeField>(new PrimeField(3), 3, r => FieldSamples.Residue(r, 3), 13, 300);

    [Fact]
    public void EliminationOverFMersenne61()
        => RunRandom<ulong, PrimeField>(new PrimeField(FieldSamples.Mersenne61), FieldSamples.Mersenne61, r => FieldSamples.Residue(r, FieldSamples.Mersenne61), 14, 300);

    [Fact]
    public void RankOfSmallIntegerMatricesOverQAgreesWithFractionsAndBoundsEveryPrimeRank()
    {
        var rng = new Random(15);
        for (int t = 0; t < 400; t++)
        {
            int rows = rng.Next(1, 8), cols = rng.Next(1, 8);
            var ints = new int[rows, cols];
            var q = new DenseMatrix<Rational, RationalField>(default, rows, cols);
            var fr = new Fraction[rows, cols];
            var big = new BigInteger[rows, cols];
            int spread = rng.Next(1, 4);
            for (int i = 0; i < rows; i++)
                for (int j = 0; j < cols; j++)
                {
                    ints[i, j] = rng.Next(-spread, spread + 1);
                    q[i, j] = ints[i, j];
                    fr[i, j] = new Fraction(ints[i, j]);
                    big[i, j] = ints[i, j];
                }
            int rankQ = q.Rank();
            Assert.Equal(ReferenceRank.OverQ(fr), rankQ);
            foreach (ulong p in (ulong[])[2, 3, FieldSamples.Mersenne61])
            {
                var m = new DenseMatrix<ulong, PrimeField>(new PrimeField(p), rows, cols);
                var f = new PrimeField(p);
                for (int i = 0; i < rows; i++) for (int j = 0; j < cols; j++) m[i, j] = f.FromRational(ints[i, j]);
                int rankP = m.Rank();
                Assert.Equal(ReferenceRank.ModP(big, p), rankP);
                // Reduction mod p cannot raise the rank (a non-zero minor mod p is non-zero over Z).
                Assert.True(rankP <= rankQ);
            }
        }
    }

    [Fact]
    public void EmptyAndZeroMatricesBehave()
    {
        var f = new PrimeField(3);
        var zero = new DenseMatrix<ulong, PrimeField>(f, 3, 2);
        Assert.Equal(0, zero.Rank());
        Assert.Equal(3, zero.LeftKernel().Count);
        Assert.Equal([0UL, 0UL], zero.Solve([0, 0, 0])!);
        Assert.Null(zero.Solve([0, 1, 0]));
        var noColumns = new DenseMatrix<ulong, PrimeField>(f, 2, 0);
        Assert.Equal(0, noColumns.Rank());
        Assert.Empty(noColumns.Solve([0, 0])!);
        Assert.Null(noColumns.Solve([1, 0]));
    }
}
