using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Schedules;
using FlowCert.Simulation;
using FlowCert.Tests.Flows.Labels;
using Xunit.Abstractions;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// Labelled qubit patterns (flows.md section 9) simulated branch by branch: every certificate the solver
/// writes, read back from its text, gives the same map in every outcome branch up to a phase, with equal
/// probabilities (tolerance 1e-9), for random angles on every planar node and a random input; dropping one
/// entry of one correction set so that a condition of 9.2/9.3 fails makes the pattern outcome-dependent
/// (negative controls). A Pauli measurement has no free angle, so a wrong correction around Pauli-measured
/// nodes can happen to act on the remaining state as one of its stabilizers: for Pauli certificates at
/// least 90% of the controls must be outcome-dependent (the count is printed), for certificates with plane
/// labels only, every one. That a flow of this kind makes the pattern deterministic is the theorem of
/// "Generalized flow and determinism in measurement-based quantum computation", arXiv:quant-ph/0702212.
/// </summary>
public sealed class LabelledSimulationTests(ITestOutputHelper output)
{
    private static List<(string Name, FlowResult Result)> Corpus(int count, int seed)
    {
        var rng = new Random(seed);
        var list = new List<(string, FlowResult)>();
        for (int i = 0; list.Count < count && i < 40 * count; i++)
        {
            bool planes = i % 2 == 0;
            var labels = planes ? LabelledGraphs.Planes : MeasurementLabels.All;
            int n = rng.Next(3, 9);
            var g = i % 3 == 0 ? LabelledGraphs.MakeWithChains(rng, n, labels, 0.5) : LabelledGraphs.ChainsWithFewLabels(rng, n, labels);
            if (!g.HasLabels || g.NodeCount + g.Inputs.Count > 12) continue;
            var r = FlowSolver.Solve(g, FieldSpec.PrimeField(2), planes ? FlowKind.General : FlowKind.Pauli);
            if (!r.HasFlow || r.Depth == 0) continue;
            var text = CertificateWriter.Write(r);
            list.Add(($"#{i}\n{LabelledBruteForceTests.OgraphText(g)}", CertificateReader.Parse(text, "c.json")));
        }
        return list;
    }

    [Fact]
    public void TwoHundredLabelledCertificatesAreDeterministicAndTheirNegativeControlsAreNot()
    {
        var corpus = Corpus(220, 1414);
        Assert.True(corpus.Count >= 200, $"only {corpus.Count} labelled flows");
        var labelsSeen = new HashSet<MeasurementLabel>();
        double worst = 0;
        int controls = 0, controlsDeterministic = 0, pauliControls = 0, pauliDeterministic = 0;
        var failures = new List<string>();
        foreach (var (name, result) in corpus)
        {
            foreach (var v in result.Graph.Measured) labelsSeen.Add(result.Graph.Label(v));
            var pattern = QuditPattern.FromFlow(result, null, (ulong)name.GetHashCode(StringComparison.Ordinal) & 0xFFFF);
            Assert.Empty(pattern.Violations);
            _ = ScheduleBuilder.Build(result);
            var report = OutcomeTreeSimulator.Run(pattern, OutcomeBranches.All);
            worst = Math.Max(worst, report.MaxDeviation);
            if (!report.Deterministic) failures.Add($"{name}: deviation {report.MaxDeviation}, spread {report.RelativeSpread}");

            // Negative control: the first single-entry drop (measurement order) that breaks a condition.
            var control = Drops(result).Select(c => (c, QuditPattern.FromFlow(c, null, 7))).FirstOrDefault(x => x.Item2.Violations.Count > 0);
            if (control.c is null) continue;
            controls++;
            bool pauli = result.Kind == FlowKind.Pauli;
            if (pauli) pauliControls++;
            Assert.Throws<ScheduleException>(() => ScheduleBuilder.Build(control.c));
            if (OutcomeTreeSimulator.Run(control.Item2, OutcomeBranches.All).Deterministic)
            {
                controlsDeterministic++;
                if (pauli) pauliDeterministic++;
                else failures.Add($"{name}: negative control ({string.Join("; ", control.Item2.Violations)}) is deterministic");
            }
        }
        output.WriteLine($"{corpus.Count} labelled certificates, largest deviation {worst:e2}; {controls} negative controls, {controlsDeterministic} deterministic ({pauliDeterministic} of {pauliControls} on Pauli certificates); labels seen: {string.Join(", ", labelsSeen.Order())}");
        Assert.True(failures.Count == 0, string.Join("\n", failures.Take(5)));
        Assert.Equal(MeasurementLabels.All.Length, labelsSeen.Count);
        Assert.True(controls >= 200, $"only {controls} negative controls");
        Assert.True(pauliDeterministic * 10 <= pauliControls, $"{pauliDeterministic} of {pauliControls} Pauli negative controls are deterministic");
    }

    private static IEnumerable<FlowResult> Drops(FlowResult r)
    {
        foreach (var v in r.Rounds.SelectMany(x => x))
        {
            var c = r.Corrections[v];
            var nodes = c.Nodes.ToArray();
            var values = c.Values<ulong>().ToArray();
            for (int k = 0; k < nodes.Length; k++)
            {
                var dropped = NodeVector.Create(r.Field, nodes.Where((_, i) => i != k).ToArray(), values.Where((_, i) => i != k).ToArray());
                yield return r with { Corrections = r.Corrections.ToDictionary(kv => kv.Key, kv => kv.Key == v ? dropped : kv.Value) };
            }
        }
    }
}
