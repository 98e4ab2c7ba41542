using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>
/// <see cref="BitMatrix"/> is the bit-packed F_2 form of <see cref="DenseMatrix{T, TField}"/>: on random
/// matrices, including widths that cross 64-bit word boundaries, every operation must give the same
/// answer as the dense matrix over PrimeField(2), which DenseMatrixTests checks against a reference.
/// </summary>
public class BitMatrixTests
{
    private static (BitMatrix Bits, DenseMatrix<ulong, PrimeField> Dense) RandomPair(Random rng, int rows, int cols)
    {
        var bits = new BitMatrix(rows, cols);
        var dense = new DenseMatrix<ulong, PrimeField>(new PrimeField(2), rows, cols);
        int density = rng.Next(1, 5); // one in `density` entries is 1
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < cols; j++)
                if (rng.Next(density) == 0) { bits[i, j] = true; dense[i, j] = 1; }
        if (rows > 2 && rng.Next(3) == 0) // repeat a row, XOR of two rows: forces dependencies
            for (int j = 0; j < cols; j++)
            {
                bool v = bits[0, j] ^ bits[1, j];
                bits[rows - 1, j] = v; dense[rows - 1, j] = v ? 1UL : 0UL;
            }
        return (bits, dense);
    }

    private static ulong[] ToField(bool[] v) => v.Select(b => b ? 1UL : 0UL).ToArray();

    public static TheoryData<int> Widths => new() { 1, 5, 63, 64, 65, 127, 128, 129, 200 };

    [Theory]
    [MemberData(nameof(Widths))]
    public void EveryOperationAgreesWithTheDenseMatrixOverF2(int cols)
    {
        var rng = new Random(cols * 7919);
        for (int t = 0; t < 15; t++)
        {
            int rows = rng.Next(1, t % 5 == 0 ? 40 : 12);
            var (bits, dense) = RandomPair(rng, rows, cols);

            var (rb, pb) = bits.RowReduce();
            var (rd, pd) = dense.RowReduce();
            Assert.Equal(pd, pb);
            for (int i = 0; i < rows; i++)
                for (int j = 0; j < cols; j++)
                    Assert.Equal(rd[i, j] == 1, rb[i, j]);
            Assert.Equal(dense.Rank(), bits.Rank());

            var b = Enumerable.Range(0, rows).Select(_ => rng.Next(2) == 0).ToArray();
            var xb = bits.Solve(b);
            var xd = dense.Solve(ToField(b));
            Assert.Equal(xd is null, xb is null);
            if (xb is not null)
            {
                Assert.Equal(xd, ToField(xb));
                Assert.Equal(b, bits.Multiply(xb));
            }
            var x = Enumerable.Range(0, cols).Select(_ => rng.Next(2) == 0).ToArray();
            var consistent = bits.Multiply(x);
            Assert.Equal(dense.Multiply(ToField(x)), ToField(consistent));
            Assert.NotNull(bits.Solve(consistent));

            var kb = bits.LeftKernel();
            var kd = dense.LeftKernel();
            Assert.Equal(kd.Count, kb.Count);
            for (int k = 0; k < kb.Count; k++) Assert.Equal(kd[k], ToField(kb[k]));

            for (int i = 0; i < rows; i++)
                Assert.Equal(Enumerable.Range(0, cols).Count(j => dense[i, j] == 1), bits.RowWeight(i));
        }
    }

    [Fact]
    public void CloneAndRowReduceLeaveTheOriginalAlone()
    {
        var m = new BitMatrix(3, 70);
        m[0, 0] = m[0, 69] = m[1, 0] = m[2, 64] = true;
        var copy = m.Clone();
        copy[0, 0] = false;
        Assert.True(m[0, 0]);
        _ = m.RowReduce();
        _ = m.LeftKernel();
        _ = m.Solve([true, false, true]);
        Assert.True(m[0, 0] && m[0, 69] && m[1, 0] && m[2, 64]);
        Assert.Equal(4, Enumerable.Range(0, 3).Sum(m.RowWeight));
        m[0, 69] = false;
        Assert.False(m[0, 69]);
        Assert.Equal(1, m.RowWeight(0));
    }
}
