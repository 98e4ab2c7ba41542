using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Tests.Flows.Labels;

/// <summary>
/// Which witness a labelled proof of absence publishes (docs/algorithms.md, "Proof of absence with labels"):
/// for every blocked node v, the row combination of the first row that Gauss-Jordan elimination of v's
/// system [M | b] (pivots column by column, the first free row with a one as pivot) reduces to 0 = 1.
/// The system is rebuilt here from its definition and eliminated by a plain Gauss-Jordan written for
/// this test, so the published bytes do not depend on how the solver's shared kernel computes it.
/// </summary>
public class LabelledWitnessTests
{
    [Fact]
    public void EachWitnessIsTheFirstRowGaussJordanReducesToZeroEqualsOne()
    {
        var rng = new Random(2718);
        int blockedNodes = 0, withSelf = 0;
        for (int i = 0; i < 600; i++)
        {
            var labels = i % 2 == 0 ? LabelledGraphs.Planes : MeasurementLabels.All;
            var g = LabelledGraphs.Make(rng, rng.Next(3, 16), 12, labels);
            var result = FlowSolver.Solve(g, FieldSpec.PrimeField(2), i % 2 == 0 ? FlowKind.General : FlowKind.Pauli);
            if (result.Obstruction is not { NodeWitnesses: { } witnesses } blocked) continue;
            var u = blocked.Nodes.ToHashSet();
            Assert.Equal(blocked.Nodes, witnesses.Select(w => w.Node));
            foreach (var w in witnesses)
            {
                var (rows, self) = ReferenceWitness(g, u, w.Node);
                Assert.Equal(rows, w.Rows);
                Assert.Equal(self, w.Self);
                blockedNodes++;
                if (self) withSelf++;
            }
        }
        Assert.True(blockedNodes > 200 && withSelf > 10, $"{blockedNodes} blocked nodes, {withSelf} witnesses with the self row");
    }

    // v's system relative to U, by its definition, and the witness of plain Gauss-Jordan over F_2.
    private static (List<int> Rows, bool Self) ReferenceWitness(OpenGraph g, HashSet<int> u, int v)
    {
        int n = g.NodeCount;
        var a = new bool[n, n];
        foreach (var e in g.Edges)
            if (default(BinaryField).FromRational(e.Weight) != 0) a[e.U, e.V] = a[e.V, e.U] = true;
        bool XOrY(int c) => g.Label(c) is MeasurementLabel.X or MeasurementLabel.Y;
        bool SelfRow(int c) => g.Label(c) is MeasurementLabel.XZ or MeasurementLabel.YZ or MeasurementLabel.Z;
        var columns = Enumerable.Range(0, n).Where(c => !g.Inputs.Contains(c) && (!u.Contains(c) || XOrY(c) || (c == v && SelfRow(c)))).ToArray();
        var rowNodes = u.Order().Where(x => g.Label(x) != MeasurementLabel.Z).Select(x => (Node: x, Self: false)).ToList();
        if (SelfRow(v)) rowNodes.Add((v, true));
        int m = rowNodes.Count, k = columns.Length;
        // [M | b | I], one bool array a row.
        var rows = new bool[m][];
        for (int r = 0; r < m; r++)
        {
            var (x, self) = rowNodes[r];
            rows[r] = new bool[k + 1 + m];
            for (int j = 0; j < k; j++)
                rows[r][j] = self ? columns[j] == x : a[x, columns[j]] ^ (columns[j] == x && g.Label(x) == MeasurementLabel.Y);
            rows[r][k] = self || (x == v && g.Label(v) != MeasurementLabel.YZ);
            rows[r][k + 1 + r] = true;
        }
        var pivot = new bool[m];
        for (int j = 0; j < k; j++)
        {
            int p = Enumerable.Range(0, m).FirstOrDefault(r => !pivot[r] && rows[r][j], -1);
            if (p < 0) continue;
            for (int r = 0; r < m; r++)
                if (r != p && rows[r][j])
                    for (int q = 0; q < rows[r].Length; q++) rows[r][q] ^= rows[p][q];
            pivot[p] = true;
        }
        int first = Enumerable.Range(0, m).First(r => !pivot[r] && rows[r][k]);
        var y = Enumerable.Range(0, m).Where(r => rows[first][k + 1 + r]).ToList();
        return (y.Where(r => !rowNodes[r].Self).Select(r => rowNodes[r].Node).ToList(), y.Any(r => rowNodes[r].Self));
    }
}
