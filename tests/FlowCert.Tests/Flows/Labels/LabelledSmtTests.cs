using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Tests.Oracles;
using FlowCert.Tests.Validation;
using Xunit.Abstractions;

namespace FlowCert.Tests.Flows.Labels;

/// <summary>
/// The solver against Debian's z3 (SMT-LIB 2, <see cref="LabelledSmtEncoder"/>) on seeded random labelled
/// graphs of up to 12 nodes: for a flow of depth d, "depth at most d - 1" is unsat and "depth at most d"
/// sat; for no flow, "depth at most |M|" is unsat. z3 "unknown" answers (time limit) are counted apart and
/// asked again with a longer limit; only a contradiction fails the test.
/// </summary>
public sealed class LabelledSmtTests(ITestOutputHelper output)
{
    private sealed record Question(string Problem, string Expected, string What, string Graph);

    [Fact]
    public void SolverAgreesWithZ3OnThreeHundredTwentyLabelledGraphs()
    {
        var rng = new Random(120012);
        var questions = new List<Question>();
        var tally = new SortedDictionary<string, int>();
        void Count(string key) => tally[key] = tally.GetValueOrDefault(key) + 1;
        int graphs = 0;
        while (graphs < 320)
        {
            bool planes = graphs % 2 == 0;
            var labels = planes ? LabelledGraphs.Planes : MeasurementLabels.All;
            int n = rng.Next(3, 13);
            var g = graphs % 3 == 0 ? LabelledGraphs.Make(rng, n, 12, labels) : LabelledGraphs.ChainsWithFewLabels(rng, n, labels);
            if (!g.HasLabels) continue;
            graphs++;
            var r = LabelledReference.From(g);
            var text = LabelledBruteForceTests.OgraphText(g);
            foreach (var kind in planes ? new[] { FlowKind.General, FlowKind.Pauli } : [FlowKind.Pauli])
            {
                bool pauli = kind == FlowKind.Pauli;
                var result = FlowSolver.Solve(g, FieldSpec.PrimeField(2), kind);
                Count($"{FlowKinds.Name(kind)} {(result.HasFlow ? "flow" : "noflow")}");
                if (result.HasFlow)
                {
                    if (result.Depth >= 1) questions.Add(new(LabelledSmtEncoder.Encode(r, pauli, result.Depth - 1), "unsat", $"{kind} depth <= {result.Depth - 1}", text));
                    questions.Add(new(LabelledSmtEncoder.Encode(r, pauli, Math.Max(result.Depth, 1)), "sat", $"{kind} depth <= {result.Depth}", text));
                }
                else questions.Add(new(LabelledSmtEncoder.Encode(r, pauli, g.Measured.Length), "unsat", $"{kind} depth <= |M|", text));
            }
        }
        var failures = new List<string>();
        var retry = new List<Question>();
        foreach (var batch in questions.Chunk(60))
        {
            var answers = Z3Runner.CheckAll(batch.Select(q => q.Problem).ToList(), secondsPerQuestion: 10);
            for (int i = 0; i < batch.Length; i++)
            {
                if (answers[i] == "unknown") retry.Add(batch[i]);
                else if (answers[i] != batch[i].Expected) failures.Add($"z3 says {answers[i]} to '{batch[i].What}', expected {batch[i].Expected}\n{batch[i].Graph}");
            }
        }
        int stillUnknown = 0;
        if (retry.Count > 0)
        {
            var answers = Z3Runner.CheckAll(retry.Select(q => q.Problem).ToList(), secondsPerQuestion: 60);
            for (int i = 0; i < retry.Count; i++)
            {
                if (answers[i] == "unknown") stillUnknown++;
                else if (answers[i] != retry[i].Expected) failures.Add($"z3 says {answers[i]} to '{retry[i].What}', expected {retry[i].Expected}\n{retry[i].Graph}");
            }
        }
        output.WriteLine($"{graphs} labelled graphs, {questions.Count} z3 questions; {string.Join("; ", tally.Select(kv => $"{kv.Key}: {kv.Value}"))}; " +
                         $"unknown at 10 s: {retry.Count}, still unknown at 60 s: {stillUnknown}");
        Assert.True(failures.Count == 0, $"{failures.Count} contradictions, first ones:\n{string.Join("\n", failures.Take(3))}");
        Assert.True(tally.GetValueOrDefault("pauli flow") >= 30 && tally.GetValueOrDefault("general flow") >= 10, "too few flows in the sample");
    }
}
