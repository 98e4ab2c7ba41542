using FlowCert.Flows;
using FlowCert.Schedules;
using FlowCert.Simulation;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// Each sign of flows.md section 7 is load-bearing: with one of them reversed, a certified pattern over
/// F_3 or F_5 becomes outcome-dependent exactly when the schedule says that sign is used (a non-zero
/// frame of the kind it acts on); when it is not used, nothing changes and the pattern stays deterministic.
/// Over F_2 every reversed sign is the same exponent (-k = k mod 2, so X^-a = X^a and raw + b = raw - b):
/// no test over p = 2 can see a sign; only skipping the adaptation altogether shows there.
/// </summary>
public class SignConventionTests
{
    public static TheoryData<string> DemoFiles() =>
    [
        "qutrit-patch.F3.general.json", "qutrit-patch.F3.causal.json",
        "loop-wire.F5.general.json", "loop-wire.F5.causal.json",
        "splitter-pair.F3.general.json", "splitter-pair.F5.general.json",
    ];

    private static readonly FrameFault[] SignFaults = [FrameFault.FlipCorrectionSign, FrameFault.FlipAngleAdaptation, FrameFault.FlipReadout];

    private static bool Uses(FrameFault fault, FeedForwardSchedule s) => fault switch
    {
        FrameFault.FlipCorrectionSign => SimulationCases.HasSomeFrame(s),
        FrameFault.FlipAngleAdaptation or FrameFault.SkipAngleAdaptation => SimulationCases.AdaptsSomeAngle(s),
        FrameFault.FlipReadout => SimulationCases.RereadsSomeOutcome(s),
        _ => throw new ArgumentOutOfRangeException(nameof(fault)),
    };

    private static void AssertLoadBearing(string name, FlowResult result, ulong seed, out int sensitive)
    {
        sensitive = 0;
        var schedule = ScheduleBuilder.Build(result);
        var pattern = QuditPattern.FromFlow(result, null, seed);
        var branches = SimulationCases.Budget(pattern, seed);
        Assert.True(PatternSimulator.Run(pattern, branches).Deterministic, $"{name}: the correct conventions must be deterministic");
        foreach (var fault in SignFaults.Append(FrameFault.SkipAngleAdaptation))
        {
            var report = PatternSimulator.Run(pattern, branches, fault);
            bool used = Uses(fault, schedule) && (pattern.Dimension > 2 || fault == FrameFault.SkipAngleAdaptation);
            if (used) sensitive++;
            Assert.True(used != report.Deterministic,
                $"{name} with {fault}: expected {(used ? "outcome-dependent" : "deterministic")}, deviation {report.MaxDeviation}");
        }
    }

    [Theory]
    [MemberData(nameof(DemoFiles))]
    public void ReversingAUsedSignMakesADemoPatternOutcomeDependent(string file)
    {
        AssertLoadBearing(file, SimulationCases.Demo(file), 7, out var sensitive);
        Assert.True(sensitive > 0, $"{file} uses no sign at all: choose a design with frames");
    }

    [Theory]
    [InlineData(3, 25, 303)]
    [InlineData(5, 20, 505)]
    [InlineData(2, 25, 202)]
    public void ReversingAUsedSignMakesRandomPatternsOutcomeDependent(int p, int count, int seed)
    {
        int sensitive = 0;
        var corpus = RandomFlowCorpus.Certificates(p, count, seed);
        for (int i = 0; i < corpus.Count; i++)
        {
            AssertLoadBearing(corpus[i].Name, corpus[i].Result, (ulong)(1000 + i), out var s);
            sensitive += s;
        }
        Assert.True(sensitive >= count / 2, $"only {sensitive} sign checks over F{p} could see a difference");
    }

    [Fact]
    public void OverF2EveryReversedSignIsTheSameConvention()
    {
        // -k = k mod 2: the faults that reverse a sign change nothing, on a qubit wire that does use frames.
        var result = FlowSolver.Solve(FlowCert.Graphs.OgraphReader.Parse("input a\noutput d\nedge a b\nedge b c\nedge c d\n", "wire.ograph"),
            FlowCert.Algebra.FieldSpec.PrimeField(2), FlowKind.General);
        var pattern = QuditPattern.FromFlow(result, null, 3);
        Assert.True(SimulationCases.AdaptsSomeAngle(ScheduleBuilder.Build(result)));
        foreach (var fault in SignFaults)
            Assert.True(PatternSimulator.Run(pattern, BranchSelection.All, fault).Deterministic, fault.ToString());
        Assert.False(PatternSimulator.Run(pattern, BranchSelection.All, FrameFault.SkipAngleAdaptation).Deterministic);
    }
}
