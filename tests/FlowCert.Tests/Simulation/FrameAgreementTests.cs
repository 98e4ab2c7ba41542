using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Schedules;
using FlowCert.Simulation;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// The schedule's linear forms, evaluated at a branch's outcomes, are exactly the frames the simulator
/// tracked in that branch; and the simulator's outcomes are the raw ones re-read through the Z-frame.
/// </summary>
public class FrameAgreementTests
{
    private static void AssertAgreement(string name, FlowResult result, ulong seed)
    {
        var schedule = ScheduleBuilder.Build(result);
        var f = new PrimeField(result.Field.Prime);
        var pattern = QuditPattern.FromFlow(result, null, seed);
        long Evaluate(LinearForm form, int[] m)
        {
            ulong sum = 0;
            foreach (var (v, c) in form.Terms)
            {
                Assert.Equal(result.Field.Prime, c.Prime);
                sum = f.Add(sum, f.Multiply(c.AsResidue, (ulong)m[v]));
            }
            return (long)sum;
        }
        var framed = schedule.Frames.Select(fr => fr.Node).ToHashSet();
        int branches = 0;
        OutcomeTreeSimulator.Run(pattern, SimulationCases.Budget(pattern, seed), branch =>
        {
            branches++;
            foreach (var fr in schedule.Frames)
            {
                Assert.True(Evaluate(fr.X, branch.Outcome) == branch.FrameX[fr.Node], $"{name}: X-frame of {result.Graph.Names[fr.Node]}");
                Assert.True(Evaluate(fr.Z, branch.Outcome) == branch.FrameZ[fr.Node], $"{name}: Z-frame of {result.Graph.Names[fr.Node]}");
            }
            foreach (var v in pattern.Order)
            {
                if (!framed.Contains(v)) Assert.True(branch.FrameX[v] == 0 && branch.FrameZ[v] == 0, $"{name}: round-1 node with a frame");
                Assert.Equal((branch.Raw[v] - branch.FrameZ[v] + pattern.Dimension) % pattern.Dimension, branch.Outcome[v]);
            }
        });
        Assert.True(branches > 1, $"{name}: only {branches} branch(es)");
    }

    [Theory]
    [InlineData("qutrit-patch.F3.general.json")]
    [InlineData("loop-wire.F5.causal.json")]
    [InlineData("splitter-pair.F3.general.json")]
    public void DemoScheduleFramesEqualTheSimulatorsFramesInEveryBranch(string file)
        => AssertAgreement(file, SimulationCases.Demo(file), 5);

    [Theory]
    [InlineData(2, 20, 22)]
    [InlineData(3, 20, 33)]
    [InlineData(5, 15, 55)]
    public void RandomScheduleFramesEqualTheSimulatorsFramesInEveryBranch(int p, int count, int seed)
    {
        var corpus = RandomFlowCorpus.Certificates(p, count, seed);
        for (int i = 0; i < corpus.Count; i++) AssertAgreement(corpus[i].Name, corpus[i].Result, (ulong)i);
    }
}
