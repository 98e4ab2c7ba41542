using System.Numerics;
using FlowCert.Flows.Primes;
using FlowCert.Tests.Algebra;
using Fractions;

namespace FlowCert.Tests.Flows.Primes;

/// <summary>
/// The Bareiss elimination behind the survey against independent references: rank by Fractions elimination
/// (ReferenceRank), the pivot minor against a Fractions determinant and against d_r (the gcd of every
/// r x r minor, enumerated by brute force), and the left-kernel basis by multiplying back.
/// </summary>
public class FractionFreeEliminationTests
{
    private static Fraction Det(Fraction[,] a0)
    {
        var a = (Fraction[,])a0.Clone();
        int n = a.GetLength(0);
        Fraction det = Fraction.One;
        for (int c = 0; c < n; c++)
        {
            int p = c;
            while (p < n && a[p, c].IsZero) p++;
            if (p == n) return Fraction.Zero;
            if (p != c) { for (int j = 0; j < n; j++) (a[p, j], a[c, j]) = (a[c, j], a[p, j]); det = -det; }
            det = (det * a[c, c]).Reduce();
            for (int i = c + 1; i < n; i++)
            {
                var f = a[i, c] / a[c, c];
                for (int j = c; j < n; j++) a[i, j] = (a[i, j] - f * a[c, j]).Reduce();
            }
        }
        return det;
    }

    private static BigInteger MinorGcd(BigInteger[][] b, int r)
    {
        int m = b.Length, n = b[0].Length;
        var g = BigInteger.Zero;
        foreach (var rows in Subsets(m, r))
            foreach (var cols in Subsets(n, r))
            {
                var sub = new Fraction[r, r];
                for (int i = 0; i < r; i++) for (int j = 0; j < r; j++) sub[i, j] = new Fraction(b[rows[i]][cols[j]]);
                g = BigInteger.GreatestCommonDivisor(g, Det(sub).Numerator);
            }
        return g;
    }

    private static IEnumerable<int[]> Subsets(int n, int k)
    {
        if (k == 0) { yield return []; yield break; }
        for (int first = 0; first <= n - k; first++)
            foreach (var rest in Subsets(n - first - 1, k - 1))
                yield return [first, .. rest.Select(x => x + first + 1)];
    }

    private static BigInteger[][] RandomMatrix(Random rng)
    {
        int m = 1 + rng.Next(6), n = 1 + rng.Next(6);
        var b = new BigInteger[m][];
        for (int i = 0; i < m; i++)
        {
            b[i] = new BigInteger[n];
            // a third of the rows are combinations of earlier rows, so the rank is often below min(m, n)
            if (i > 0 && rng.Next(3) == 0)
                for (int j = 0; j < n; j++) b[i][j] = rng.Next(-2, 3) * b[rng.Next(i)][j] + rng.Next(-1, 2) * b[rng.Next(i)][j];
            else
                for (int j = 0; j < n; j++) b[i][j] = rng.Next(3) == 0 ? 0 : rng.Next(-4, 5);
        }
        return b;
    }

    [Fact]
    public void RankPivotMinorAndKernelAgreeWithIndependentReferences()
    {
        var rng = new Random(4242);
        for (int t = 0; t < 400; t++)
        {
            var b = RandomMatrix(rng);
            int m = b.Length, n = b[0].Length;
            var e = new FractionFreeElimination(b, n);
            var asFractions = new Fraction[m, n];
            for (int i = 0; i < m; i++) for (int j = 0; j < n; j++) asFractions[i, j] = new Fraction(b[i][j]);
            int r = ReferenceRank.OverQ(asFractions);
            Assert.Equal(r, e.Rank);
            // The pivot minor is that r x r minor, and d_r (gcd of all r x r minors) divides it.
            var sub = new Fraction[r, r];
            for (int i = 0; i < r; i++) for (int j = 0; j < r; j++) sub[i, j] = new Fraction(b[e.PivotRows[i]][e.PivotColumns[j]]);
            Assert.Equal(r == 0 ? BigInteger.One : BigInteger.Abs(Det(sub).Numerator), e.PivotMinor);
            Assert.False(e.PivotMinor.IsZero);
            if (r > 0) Assert.True((e.PivotMinor % MinorGcd(b, r)).IsZero);
            // m - r kernel vectors, y^T B = 0, y(own row) = +-minor, independent.
            Assert.Equal(m - r, e.LeftKernel.Count);
            var kernel = new Fraction[Math.Max(1, m - r), m];
            for (int k = 0; k < e.LeftKernel.Count; k++)
            {
                var (row, y) = e.LeftKernel[k];
                Assert.DoesNotContain(row, e.PivotRows);
                Assert.Equal(e.PivotMinor, BigInteger.Abs(y[row]));
                for (int j = 0; j < n; j++)
                {
                    var s = BigInteger.Zero;
                    for (int i = 0; i < m; i++) s += y[i] * b[i][j];
                    Assert.True(s.IsZero, $"y^T B != 0 in column {j}");
                }
                for (int i = 0; i < m; i++) kernel[k, i] = new Fraction(y[i]);
            }
            if (m > r) Assert.Equal(m - r, ReferenceRank.OverQ(kernel));
            // Solvability of B c = e_v over Q: rank [B | e_v] = rank B (Fredholm alternative, by Fractions).
            for (int v = 0; v < m; v++)
            {
                var augmented = new Fraction[m, n + 1];
                for (int i = 0; i < m; i++) { for (int j = 0; j < n; j++) augmented[i, j] = asFractions[i, j]; augmented[i, n] = i == v ? Fraction.One : Fraction.Zero; }
                Assert.Equal(ReferenceRank.OverQ(augmented) == r, e.IsSolvable(v));
                Assert.Equal(e.IsSolvable(v), e.KernelCoordinateGcd(v).IsZero);
            }
        }
    }
}
