using FlowCert.Simulation;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// A flow is sufficient for determinism: "Generalized flow and determinism in measurement-based quantum
/// computation" (arXiv:quant-ph/0702212) for qubits, "Outcome determinism in measurement-based quantum
/// computation with qudits" (arXiv:2109.13810) for prime dimensions. Every certified random pattern must
/// therefore give the all-zero branch's map, up to a phase, in every branch, with equal probabilities.
/// </summary>
public class RandomDeterminismTests
{
    [Theory]
    [InlineData(2, 80, 2002)]
    [InlineData(3, 80, 3003)]
    [InlineData(5, 60, 5005)]
    public void EveryCertifiedRandomPatternIsDeterministicInEveryBranch(int p, int count, int seed)
    {
        var corpus = RandomFlowCorpus.Certificates(p, count, seed);
        Assert.Equal(count, corpus.Count);
        Assert.Contains(corpus, c => c.Result.Kind == FlowCert.Flows.FlowKind.General);
        Assert.Contains(corpus, c => c.Result.Kind == FlowCert.Flows.FlowKind.Causal);
        int exhaustive = 0;
        for (int i = 0; i < corpus.Count; i++)
        {
            var (name, result) = corpus[i];
            var pattern = QuditPattern.FromFlow(result, null, (ulong)i);
            Assert.Empty(pattern.Violations);
            var report = PatternSimulator.Run(pattern, SimulationCases.Budget(pattern, (ulong)i));
            Assert.True(report.MaxDeviation <= 1e-9, $"{name}: deviation {report.MaxDeviation}");
            Assert.True(report.RelativeSpread <= 1e-9, $"{name}: probabilities from {report.MinProbability} to {report.MaxProbability}");
            Assert.True(report.Deterministic, name);
            Assert.True(report.BranchesCompared >= 2 || report.TotalBranches == 1, $"{name}: only {report.BranchesCompared} branch(es) compared");
            if (report.Exhaustive)
            {
                exhaustive++;
                // Completeness of every measurement: the branch probabilities of one input state add up to 1.
                Assert.True(Math.Abs(report.ProbabilitySum - 1) <= 1e-9, $"{name}: probabilities add up to {report.ProbabilitySum}");
            }
        }
        Assert.True(exhaustive > 0, "no pattern was small enough to enumerate every branch");
    }
}
