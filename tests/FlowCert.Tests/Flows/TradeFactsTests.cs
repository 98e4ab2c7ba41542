using System.Text;
using FlowCert.Demo;
using FlowCert.Graphs;
using FlowCert.Tests.Oracles;
using FlowCert.Tests.Validation;
using Fractions;

namespace FlowCert.Tests.Flows;

/// <summary>
/// Facts of the trade, each checked by the solver (certificate verified) and by the brute-force oracle.
/// Sources are named beside each check; "common practice" marks a fact with no single source.
/// </summary>
public sealed class TradeFactsTests
{
    private static readonly string[] Fields = ["Q", "F2", "F3", "F5"];

    private static OracleAnswer Both(OpenGraph g, string field, ReferenceKind kind)
    {
        var solver = CertifiedSolve.Run(g, field, kind) ?? throw new InvalidOperationException("field refused");
        var oracle = SubsetDepthOracle.Analyse(ReferenceGraph.From(g), field, kind);
        Assert.True(oracle == solver, $"{field} {kind}: oracle {oracle}, solver {solver}\n{ReferenceGraph.From(g).ToOgraph()}");
        return solver;
    }

    private static OpenGraph Parse(string text) => OgraphReader.Parse(text, "inline.ograph");

    public static string Path(int n)
    {
        var sb = new StringBuilder($"input p0\noutput p{n - 1}\nnode p0\n");
        for (int i = 0; i + 1 < n; i++) sb.Append($"edge p{i} p{i + 1}\n");
        return sb.ToString();
    }

    public static string Lattice(int rows, int cols)
    {
        var sb = new StringBuilder();
        sb.Append("input").Append(string.Concat(Enumerable.Range(0, rows).Select(r => $" r{r}c0"))).Append('\n');
        sb.Append("output").Append(string.Concat(Enumerable.Range(0, rows).Select(r => $" r{r}c{cols - 1}"))).Append('\n');
        for (int r = 0; r < rows; r++)
            for (int c = 0; c < cols; c++)
            {
                sb.Append($"node r{r}c{c}\n");
                if (c + 1 < cols) sb.Append($"edge r{r}c{c} r{r}c{c + 1}\n");
                if (r + 1 < rows) sb.Append($"edge r{r}c{c} r{r + 1}c{c}\n");
            }
        return sb.ToString();
    }

    [Theory]
    [InlineData(1)] [InlineData(2)] [InlineData(3)] [InlineData(5)] [InlineData(8)] [InlineData(12)]
    public void PathWithInputAndOutputAtItsEndsHasCausalFlowOfDepthNMinusOne(int n)
    {
        // common practice: a path is a wire; each node is corrected by its successor, one round per node
        var g = Parse(Path(n));
        foreach (var field in Fields)
        {
            var causal = n <= 12 ? Both(g, field, ReferenceKind.Causal) : CertifiedSolve.Run(g, field, ReferenceKind.Causal)!.Value;
            Assert.Equal(new OracleAnswer(true, n - 1), causal);
        }
    }

    [Theory]
    [InlineData(1, 1)] [InlineData(1, 4)] [InlineData(2, 2)] [InlineData(2, 5)] [InlineData(3, 3)] [InlineData(3, 4)] [InlineData(4, 2)]
    public void SquareLatticeFromFirstToLastColumnHasCausalFlowOfDepthColumnsMinusOne(int rows, int cols)
    {
        // common practice: each node is corrected by its right-hand neighbour, one round per column
        var g = Parse(Lattice(rows, cols));
        foreach (var field in Fields)
        {
            var causal = rows * cols - rows <= 12 ? Both(g, field, ReferenceKind.Causal) : CertifiedSolve.Run(g, field, ReferenceKind.Causal)!.Value;
            Assert.Equal(new OracleAnswer(true, cols - 1), causal);
            var general = CertifiedSolve.Run(g, field, ReferenceKind.General)!.Value;
            Assert.True(general.Exists && general.Depth <= cols - 1);
        }
    }

    [Fact]
    public void EveryCausalFlowIsAGeneralizedFlowSoGeneralizedDepthIsAtMostCausalDepth()
    {
        // "Generalized flow and determinism in measurement-based quantum computation", arXiv:quant-ph/0702212:
        // a causal flow is the generalized flow with g(v) = {f(v)}; hence the minimum generalized depth is at most
        // the minimum causal depth. Checked on seeded random graphs; the causal certificates also pass the
        // section 3 checks in CertificateVerifier, which is the same statement certificate by certificate.
        var rng = new Random(5150);
        int causalFlows = 0, strictlyShallower = 0;
        for (int k = 0; k < 300; k++)
        {
            var g = RandomGraphs.Make(rng, rng.Next(2, 10), 0.3 + 0.4 * rng.NextDouble(), 7, RandomGraphs.IntegerWeights, 0.5, 0.3);
            foreach (var field in Fields)
            {
                var causal = CertifiedSolve.Run(g, field, ReferenceKind.Causal)!.Value;
                var general = CertifiedSolve.Run(g, field, ReferenceKind.General)!.Value;
                if (!causal.Exists) continue;
                causalFlows++;
                Assert.True(general.Exists && general.Depth <= causal.Depth, $"{field}: causal {causal}, general {general}\n{ReferenceGraph.From(g).ToOgraph()}");
                if (general.Depth < causal.Depth) strictlyShallower++;
            }
        }
        Assert.True(causalFlows >= 100, $"only {causalFlows} causal flows in the sample");
        Assert.True(strictlyShallower > 0, "the sample never shows a generalized flow shallower than the causal one");
    }

    [Fact]
    public void GeneralizedFlowNeedsAtMostAsManyInputsAsOutputs()
    {
        // common practice: a generalized flow makes the pattern implement an isometry from the inputs to the
        // outputs, so |I| <= |O| whenever one exists (no single source named here).
        var rng = new Random(8086);
        int withFlow = 0, tooManyInputs = 0;
        for (int k = 0; k < 400; k++)
        {
            var g = RandomGraphs.Make(rng, rng.Next(2, 10), 0.3 + 0.5 * rng.NextDouble(), 7, RandomGraphs.IntegerWeights, 0.35, 0.45);
            if (g.Inputs.Count > g.Outputs.Count) tooManyInputs++;
            foreach (var field in Fields)
            {
                var general = CertifiedSolve.Run(g, field, ReferenceKind.General)!.Value;
                var oracle = SubsetDepthOracle.Analyse(ReferenceGraph.From(g), field, ReferenceKind.General)!.Value;
                Assert.Equal(oracle, general);
                if (!general.Exists) continue;
                withFlow++;
                Assert.True(g.Inputs.Count <= g.Outputs.Count, $"{field}: flow with |I| > |O|\n{ReferenceGraph.From(g).ToOgraph()}");
            }
        }
        Assert.True(withFlow >= 100 && tooManyInputs >= 50, $"sample too thin: {withFlow} flows, {tooManyInputs} graphs with |I| > |O|");
    }

    [Fact]
    public void WeightTwoEdgeVanishesInF2AndGivesAFlowThatQHasNot()
    {
        // (a) Measured a, b; output o. Over F_2 the weight-2 edge b-o vanishes, so o corrects a alone (its only
        // measured neighbour) and then a corrects b: depth 2. Over Q (and F_3) o touches both a and b with
        // weights 1 and 2, no combination of the single corrector o separates them, and no causal order works.
        var g = Parse("output o\nedge a o 1\nedge b o 2\nedge a b 1\n");
        Assert.Equal(new OracleAnswer(true, 2), Both(g, "F2", ReferenceKind.General));
        Assert.Equal(new OracleAnswer(true, 2), Both(g, "F2", ReferenceKind.Causal));
        foreach (var field in new[] { "Q", "F3", "F5" })
        {
            Assert.False(Both(g, field, ReferenceKind.General).Exists);
            Assert.False(Both(g, field, ReferenceKind.Causal).Exists);
        }
    }

    [Fact]
    public void DeterminantMinusSixGivesAFlowOverQButNotOverF2OrF3()
    {
        // (b) Inputs a, b are measured and only x, y can correct: a generalized flow exists exactly when the
        // 2 x 2 block A[{a,b},{x,y}] is invertible in the field. Its determinant is -6, zero mod 2 and mod 3.
        var g = Parse("input a b\noutput x y\nedge a x 1\nedge a y 1\nedge b x 1\nedge b y -5\n");
        Assert.Equal(new Fraction(-6), Determinant2(new Fraction(1), new Fraction(1), new Fraction(1), new Fraction(-5)));
        Assert.Equal(new OracleAnswer(true, 1), Both(g, "Q", ReferenceKind.General));
        Assert.False(Both(g, "F2", ReferenceKind.General).Exists);
        Assert.False(Both(g, "F3", ReferenceKind.General).Exists);
        Assert.Equal(new OracleAnswer(true, 1), Both(g, "F7", ReferenceKind.General)); // -6 = 1 mod 7
        // no causal flow over Q: x and y each have both a and b as measured neighbours
        Assert.False(Both(g, "Q", ReferenceKind.Causal).Exists);
    }

    [Fact]
    public void DemoSplitterWithDeterminantMinusTwoHasFlowExceptOverF2()
    {
        // (c) The demo's splitter (fictional Merrow Reach design): block [[1, 1], [1, -1]], determinant -2,
        // invertible over Q, F_3 and F_5 but not over F_2.
        var design = DemoScenario.Designs().Single(d => d.Name == "splitter-pair");
        var g = design.Graph;
        var a = ReferenceGraph.From(g).Matrix(FractionArithmetic.Instance)!;
        int ia = g.IndexOf("a"), ib = g.IndexOf("b"), ix = g.IndexOf("x"), iy = g.IndexOf("y");
        Assert.Equal(new Fraction(-2), Determinant2(a[ia][ix], a[ia][iy], a[ib][ix], a[ib][iy]));
        foreach (var field in new[] { "Q", "F3", "F5" })
            Assert.Equal(new OracleAnswer(true, 1), Both(g, field, ReferenceKind.General));
        Assert.False(Both(g, "F2", ReferenceKind.General).Exists);
    }

    private static Fraction Determinant2(Fraction a, Fraction b, Fraction c, Fraction d) => (a * d - b * c).Reduce();
}
