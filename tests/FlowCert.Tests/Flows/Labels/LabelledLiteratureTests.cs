using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Tests.Oracles;
using FlowCert.Tests.Validation;

namespace FlowCert.Tests.Flows.Labels;

/// <summary>Published facts about Pauli flow and generalized flow with planes, each with its source.</summary>
public sealed class LabelledLiteratureTests
{
    private static readonly FieldSpec F2 = FieldSpec.PrimeField(2);

    /// <summary>
    /// With every node measured in the XY plane, a Pauli flow exists iff a generalized flow (gflow) exists,
    /// with the same minimum depth: every condition of Pauli flow that mentions X, Y or Z labels is vacuous
    /// ("Generalized flow and determinism in measurement-based quantum computation", arXiv:quant-ph/0702212;
    /// "An algebraic interpretation of Pauli flow, leading to faster flow-finding algorithms",
    /// arXiv:2410.23439). The gflow comes from the XY-only solver path (version-1 certificate), the Pauli
    /// flow from the labelled finder (version 2): two independent routes, on graphs of up to 12 nodes.
    /// </summary>
    [Fact]
    public void AllXyPauliFlowExistsIffGflowWithTheSameMinimumDepth()
    {
        var rng = new Random(70212);
        int flows = 0, graphs = 0;
        for (int i = 0; i < 600; i++)
        {
            int n = rng.Next(2, 13);
            var g = i % 2 == 0
                ? RandomGraphs.Make(rng, n, 0.2 + 0.4 * rng.NextDouble(), 12, RandomGraphs.IntegerWeights)
                : RandomGraphs.MakeWithChains(rng, n, rng.Next(1, Math.Min(4, n) + 1), 0.3 * rng.NextDouble(), RandomGraphs.IntegerWeights);
            var gflow = FlowSolver.Solve(g, F2, FlowKind.General);
            var pauli = FlowSolver.Solve(g, F2, FlowKind.Pauli);
            graphs++;
            Assert.True(gflow.HasFlow == pauli.HasFlow && (!gflow.HasFlow || gflow.Depth == pauli.Depth),
                $"gflow {(gflow.HasFlow ? gflow.Depth : "none")}, Pauli flow {(pauli.HasFlow ? pauli.Depth : "none")}\n{LabelledBruteForceTests.OgraphText(g)}");
            Assert.Contains("\"version\": 1", CertificateWriter.Write(gflow));
            var text = CertificateWriter.Write(pauli);
            Assert.Contains("\"version\": 2", text);
            if (g.Measured.Length <= 6)
                Assert.Null(LabelledCertificateVerifier.Check(text, LabelledReference.From(g), g.Names));
            if (gflow.HasFlow) flows++;
        }
        Assert.True(flows >= 100 && graphs - flows >= 100, $"{flows} of {graphs} graphs have a flow: the sample is lopsided");
    }

    /// <summary>
    /// Every generalized flow with planes is a Pauli flow for the same labels, so the minimum Pauli depth is
    /// at most the minimum gflow depth (arXiv:quant-ph/0702212; "Relating measurement patterns to circuits via
    /// Pauli flow", EPTCS 343, doi:10.4204/EPTCS.343.4): the solver's gflow certificate, rounds and sets
    /// unchanged, must satisfy the conditions of flows.md 9.3 as checked by the brute force's predicate.
    /// </summary>
    [Fact]
    public void EveryGeneralizedFlowWithPlanesIsAPauliFlow()
    {
        var rng = new Random(343);
        int checkedFlows = 0;
        for (int i = 0; i < 8000 && checkedFlows < 100; i++)
        {
            var g = LabelledGraphs.MakeWithChains(rng, rng.Next(3, 9), LabelledGraphs.Planes, xyShare: 0.75);
            if (!g.HasLabels) continue;
            var general = FlowSolver.Solve(g, F2, FlowKind.General);
            var pauli = FlowSolver.Solve(g, F2, FlowKind.Pauli);
            if (!general.HasFlow) continue;
            Assert.True(pauli.HasFlow && pauli.Depth <= general.Depth, LabelledBruteForceTests.OgraphText(g));
            var asPauli = CertificateWriter.Write(general with { Kind = FlowKind.Pauli });
            Assert.Null(LabelledCertificateVerifier.Check(asPauli, LabelledReference.From(g), g.Names));
            checkedFlows++;
        }
        Assert.True(checkedFlows >= 60, $"only {checkedFlows} generalized flows with planes were found");
    }

    /// <summary>
    /// Graphs with a Pauli flow but no generalized flow, whichever plane containing its axis each Pauli node
    /// is given (X in XY or XZ, Y in XY or YZ, Z in XZ or YZ): Pauli flow is strictly more general
    /// (arXiv:quant-ph/0702212, "Relating measurement patterns to circuits via Pauli flow",
    /// doi:10.4204/EPTCS.343.4). Data: found by enumerating every graph of 3 and 4 nodes with one input and one
    /// other node as output and labels XY, X, Y, Z, with a brute force written for this purpose from flows.md
    /// section 9 (none has 3 nodes; 3,168 connected ones have 4). These are the first connected ones found
    /// with an X, a Y and a Z label: the path o - i - a - b with the Pauli nodes on the arm a - b.
    /// </summary>
    [Theory]
    [InlineData("measure b X\n", 2)]
    [InlineData("measure a X\n", 2)]
    [InlineData("measure a X\nmeasure b Y\n", 1)]
    [InlineData("measure a Y\nmeasure b Z\n", 1)]
    public void PauliFlowWithoutAnyGeneralizedFlow(string labels, int pauliDepth)
    {
        var text = "input i\noutput o\nedge i o\nedge i a\nedge a b\n" + labels;
        var g = OgraphReader.Parse(text, "found.ograph");
        var pauli = FlowSolver.Solve(g, F2, FlowKind.Pauli);
        Assert.True(pauli.HasFlow);
        Assert.Equal(pauliDepth, pauli.Depth);
        Assert.Equal(pauliDepth, LabelledBruteForce.MinimumDepth(LabelledReference.From(g), pauli: true));
        Assert.Null(LabelledCertificateVerifier.Check(CertificateWriter.Write(pauli), LabelledReference.From(g), g.Names));
        var planes = new Dictionary<MeasurementLabel, MeasurementLabel[]>
        {
            [MeasurementLabel.X] = [MeasurementLabel.XY, MeasurementLabel.XZ],
            [MeasurementLabel.Y] = [MeasurementLabel.XY, MeasurementLabel.YZ],
            [MeasurementLabel.Z] = [MeasurementLabel.XZ, MeasurementLabel.YZ],
        };
        var pauliNodes = g.Labels.Keys.Order().ToArray();
        int choices = 0;
        foreach (var choice in Choices(pauliNodes.Select(v => planes[g.Label(v)]).ToArray()))
        {
            var planar = g.WithLabels(pauliNodes.Zip(choice).ToDictionary(x => x.First, x => x.Second));
            var general = FlowSolver.Solve(planar, F2, FlowKind.General);
            Assert.False(general.HasFlow, $"a generalized flow exists with {string.Join(", ", choice)}");
            Assert.Null(LabelledBruteForce.MinimumDepth(LabelledReference.From(planar), pauli: false));
            choices++;
        }
        Assert.Equal(1 << pauliNodes.Length, choices);
    }

    /// <summary>The demo's pauli-arm design is one of these graphs (its comment says so): a Pauli flow of depth 2
    /// and no generalized flow with its X node in the XY or the XZ plane (same sources as above).</summary>
    [Fact]
    public void TheDemoPauliArmHasAPauliFlowButNoGeneralizedFlow()
    {
        var g = FlowCert.Demo.DemoScenario.Designs().Single(d => d.Name == "pauli-arm").Graph;
        var pauli = FlowSolver.Solve(g, F2, FlowKind.Pauli);
        Assert.True(pauli.HasFlow && pauli.Depth == 2);
        var arm = g.Labels.Single().Key;
        foreach (var plane in new[] { MeasurementLabel.XY, MeasurementLabel.XZ })
        {
            var planar = g.WithLabels(new Dictionary<int, MeasurementLabel> { [arm] = plane });
            Assert.False(FlowSolver.Solve(planar, F2, FlowKind.General).HasFlow);
            Assert.Null(LabelledBruteForce.MinimumDepth(LabelledReference.From(planar), pauli: false));
        }
        var relay = FlowCert.Demo.DemoScenario.Designs().Single(d => d.Name == "plane-relay").Graph;
        var general = FlowSolver.Solve(relay, F2, FlowKind.General);
        Assert.True(general.HasFlow);
        Assert.Equal(LabelledBruteForce.MinimumDepth(LabelledReference.From(relay), pauli: false), general.Depth);
    }

    private static IEnumerable<MeasurementLabel[]> Choices(MeasurementLabel[][] options)
    {
        if (options.Length == 0) { yield return []; yield break; }
        foreach (var first in options[0])
            foreach (var rest in Choices(options[1..]))
                yield return [first, .. rest];
    }
}
