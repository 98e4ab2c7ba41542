using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Simulation;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// The width-following simulator (nodes prepared as the schedule needs them, measured nodes discarded)
/// against the full state-vector reference it replaced (<see cref="FullStateSimulator"/>): the same
/// branches in the same order, with the same raw outcomes, frames and output maps, on every certified
/// graph small enough for both (common practice: a rewrite checked against the code it replaces).
/// </summary>
public class WidthFollowingTests
{
    private const double Tolerance = 1e-10;

    private static int CompareWithReference(string name, FlowResult result, ulong seed, FrameFault faults = FrameFault.None)
    {
        var pattern = QuditPattern.FromFlow(result, null, seed);
        var branches = SimulationCases.Budget(pattern, seed);
        var reference = new List<BranchRecord>();
        var width = new List<BranchRecord>();
        FullStateSimulator.Explore(pattern, branches, faults, reference.Add);
        OutcomeTreeSimulator.Explore(pattern, branches, faults, width.Add);
        Assert.Equal(reference.Count, width.Count);
        for (int k = 0; k < reference.Count; k++)
        {
            var (a, b) = (reference[k], width[k]);
            Assert.Equal(a.Raw, b.Raw);
            Assert.Equal(a.Outcome, b.Outcome);
            Assert.Equal(a.FrameX, b.FrameX);
            Assert.Equal(a.FrameZ, b.FrameZ);
            Assert.Equal(a.OutputMap.RowCount, b.OutputMap.RowCount);
            Assert.Equal(a.OutputMap.ColumnCount, b.OutputMap.ColumnCount);
            double difference = (a.OutputMap - b.OutputMap).FrobeniusNorm();
            Assert.True(difference < Tolerance, $"{name}, branch {string.Join("", a.Raw)}: the maps differ by {difference}");
        }
        Assert.True(pattern.Plan.PeakLive <= result.Graph.NodeCount);
        return reference.Count;
    }

    [Theory]
    [InlineData(2, 90, 7202)]
    [InlineData(3, 70, 7303)]
    [InlineData(5, 50, 7505)]
    public void TheWidthFollowingSimulatorGivesTheReferenceBranchMaps(int p, int count, int seed)
    {
        var corpus = RandomFlowCorpus.Certificates(p, count, seed);
        Assert.Equal(count, corpus.Count);
        int branches = 0;
        for (int i = 0; i < corpus.Count; i++) branches += CompareWithReference(corpus[i].Name, corpus[i].Result, (ulong)(50 + i));
        Assert.True(branches >= 2 * count, $"only {branches} branches compared over F{p}");
    }

    [Theory]
    [InlineData(3, 20, 8303)]
    [InlineData(5, 10, 8505)]
    public void TheTwoSimulatorsAgreeUnderEveryFrameFaultToo(int p, int count, int seed)
    {
        // The faulty conventions give outcome-dependent maps: agreement there is agreement branch by branch, not only on M_0.
        var corpus = RandomFlowCorpus.Certificates(p, count, seed);
        foreach (var fault in new[] { FrameFault.FlipCorrectionSign, FrameFault.FlipReadout, FrameFault.SkipAngleAdaptation })
            for (int i = 0; i < corpus.Count; i++) CompareWithReference($"{corpus[i].Name} {fault}", corpus[i].Result, (ulong)i, fault);
    }

    [Theory]
    [MemberData(nameof(SignConventionTests.DemoFiles), MemberType = typeof(SignConventionTests))]
    public void TheDemoCertificatesGiveTheReferenceBranchMaps(string file)
        => Assert.True(CompareWithReference(file, SimulationCases.Demo(file), 3) > 1);

    [Fact]
    public void ALongWireKeepsTwoNodesLive()
    {
        // A wire a0 - a1 - ... - a11 over F_3: measuring a_k needs a_k and a_(k+1) only, so at most two
        // graph nodes are ever live, however long the wire (the reference would hold 3^13 amplitudes).
        var text = "input a0\noutput a11\n" + string.Concat(Enumerable.Range(0, 11).Select(k => $"edge a{k} a{k + 1}\n"));
        var g = OgraphReader.Parse(text, "wire.ograph");
        var result = FlowSolver.Solve(g, FieldSpec.PrimeField(3), FlowKind.Causal);
        var pattern = QuditPattern.FromFlow(result, null, 1);
        Assert.Equal(2, pattern.Plan.PeakLive);
        Assert.Equal(3, pattern.Plan.PeakQudits);
        Assert.True(OutcomeTreeSimulator.Run(pattern, OutcomeBranches.Sample(30, 1)).Deterministic);
    }
}
