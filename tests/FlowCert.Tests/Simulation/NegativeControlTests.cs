using FlowCert.Flows;
using FlowCert.Schedules;
using FlowCert.Simulation;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// Negative controls: a certificate with one correction vector corrupted so that flows.md section 3
/// fails must simulate as outcome-dependent (otherwise the determinism test could not fail).
/// Over F_p with p &gt;= 3 the vector is scaled by 2, so (A c_v)(v) = 2 and condition 2 fails; over F_2
/// one entry is dropped, choosing the first entry whose removal breaks a condition.
/// </summary>
public class NegativeControlTests
{
    private static FlowResult Replace(FlowResult r, int v, NodeVector vector)
        => r with { Corrections = r.Corrections.ToDictionary(kv => kv.Key, kv => kv.Key == v ? vector : kv.Value) };

    private static IEnumerable<FlowResult> Corruptions(FlowResult r)
    {
        int p = (int)r.Field.Prime;
        foreach (var v in r.Rounds.SelectMany(x => x))
        {
            var c = r.Corrections[v];
            var nodes = c.Nodes.ToArray();
            var values = c.Values<ulong>().ToArray();
            if (p >= 3)
                yield return Replace(r, v, NodeVector.Create(r.Field, nodes, values.Select(x => x * 2 % (ulong)p).ToArray()));
            else
                for (int k = 0; k < nodes.Length; k++)
                    yield return Replace(r, v, NodeVector.Create(r.Field, nodes.Where((_, i) => i != k).ToArray(), values.Where((_, i) => i != k).ToArray()));
        }
    }

    [Theory]
    [InlineData(2, 30, 2121)]
    [InlineData(3, 30, 3131)]
    [InlineData(5, 20, 5151)]
    public void ACorruptedCorrectionVectorMakesThePatternOutcomeDependent(int p, int count, int seed)
    {
        var corpus = RandomFlowCorpus.Certificates(p, count, seed);
        foreach (var (name, result) in corpus)
        {
            // The first corruption (in measurement order) that fails section 3; there is always one.
            var (corrupted, pattern) = Corruptions(result)
                .Select((c, i) => (c, QuditPattern.FromFlow(c, null, (ulong)i)))
                .First(x => x.Item2.Violations.Count > 0);
            Assert.Throws<ScheduleException>(() => ScheduleBuilder.Build(corrupted));
            var report = OutcomeTreeSimulator.Run(pattern, SimulationCases.Budget(pattern, 11));
            Assert.False(report.Deterministic, $"{name}: corrupted ({string.Join("; ", pattern.Violations)}) yet deviation only {report.MaxDeviation}");
        }
    }

    [Fact]
    public void TheDemoQutritPatchWithOneScaledCorrectionIsOutcomeDependent()
    {
        var result = SimulationCases.Demo("qutrit-patch.F3.general.json");
        var corrupted = Corruptions(result).First();
        var pattern = QuditPattern.FromFlow(corrupted, null, 1);
        Assert.Contains(pattern.Violations, v => v.Contains("condition 2"));
        Assert.False(OutcomeTreeSimulator.Run(pattern, OutcomeBranches.All).Deterministic);
    }
}
