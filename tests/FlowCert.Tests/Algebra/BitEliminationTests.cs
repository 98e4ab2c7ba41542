using FlowCert.Algebra;

namespace FlowCert.Tests.Algebra;

/// <summary>The packed F_2 elimination must give the sparse elimination's canonical answers exactly.</summary>
public class BitEliminationTests
{
    [Fact]
    public void PackedAndSparseEliminationAgreeOnRandomMatricesOverF2()
    {
        var rng = new Random(20261202);
        var f2 = new PrimeField(2);
        for (int trial = 0; trial < 300; trial++)
        {
            int m = rng.Next(1, 40), n = rng.Next(1, 90);
            double density = rng.NextDouble();
            var supports = new List<int[]>();
            for (int r = 0; r < m; r++)
                supports.Add(Enumerable.Range(0, n).Where(_ => rng.NextDouble() < density).Select(c => 3 * c + 1).ToArray());
            var sparse = new SparseElimination<ulong, PrimeField>(f2, supports.Select(s => new SparseVector<ulong>(s, s.Select(_ => 1UL).ToArray())).ToList());
            var bits = new BitElimination(supports);
            Assert.Equal(sparse.Rank, bits.Rank);
            Assert.Equal(m - sparse.Rank, bits.LeftKernel().Count);
            var a = sparse.SolveUnitVectors();
            var b = bits.SolveUnitVectors();
            Assert.Equal(a.Keys.Order(), b.Keys.Order());
            foreach (var r in a.Keys) Assert.Equal(a[r].Indices, b[r].Indices);
            // The kernel bases may differ, but their reduced echelon forms (what witnesses publish) may not.
            var ka = new SparseElimination<ulong, PrimeField>(f2, sparse.LeftKernel()).ReducedRows();
            var kb = new SparseElimination<ulong, PrimeField>(f2, bits.LeftKernel()).ReducedRows();
            Assert.Equal(ka.Select(v => string.Join(",", v.Indices)), kb.Select(v => string.Join(",", v.Indices)));
            // Each kernel vector really annihilates B (parity of the shared ones in every column).
            foreach (var y in bits.LeftKernel())
                foreach (var col in supports.SelectMany(s => s).Distinct())
                    Assert.Equal(0, y.Indices.Count(r => supports[r].Contains(col)) % 2);
        }
    }
}
