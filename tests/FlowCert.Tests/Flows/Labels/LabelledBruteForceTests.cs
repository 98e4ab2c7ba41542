using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Tests.Oracles;
using FlowCert.Tests.Validation;
using Xunit.Abstractions;

namespace FlowCert.Tests.Flows.Labels;

/// <summary>
/// The solver against the brute force of flows.md section 9 (every schedule, every correction set) on
/// seeded random labelled graphs of up to 8 nodes and 6 measured nodes: existence and minimum depth
/// agree for generalized flow with planes (9.2) and for Pauli flow (9.3), and every certificate is
/// accepted by the test-side verifier and read back to the same bytes.
/// </summary>
public sealed class LabelledBruteForceTests(ITestOutputHelper output)
{
    private static readonly FieldSpec F2 = FieldSpec.PrimeField(2);

    /// <summary>Solves, compares with the brute force, verifies the certificate; returns the depth or null.</summary>
    internal static int? SolveAndCompare(OpenGraph g, FlowKind kind, List<string> failures)
    {
        var result = FlowSolver.Solve(g, F2, kind);
        var reference = LabelledReference.From(g);
        var expected = LabelledBruteForce.MinimumDepth(reference, kind == FlowKind.Pauli);
        int? got = result.HasFlow ? result.Depth : null;
        var text = CertificateWriter.Write(result);
        if (got != expected) failures.Add($"{kind}: solver {got?.ToString() ?? "no flow"}, brute force {expected?.ToString() ?? "no flow"}\n{OgraphText(g)}");
        if (LabelledCertificateVerifier.Check(text, reference, g.Names) is { } problem) failures.Add($"{kind} certificate: {problem}\n{text}");
        if (CertificateWriter.Write(CertificateReader.Parse(text, "c.json")) != text) failures.Add($"{kind}: certificate does not read back to the same bytes\n{text}");
        return got;
    }

    internal static string OgraphText(OpenGraph g) => FlowCert.Graphs.Formats.OgraphWriter.Write(g);

    [Fact]
    public void PlanesAndPauliAgreeWithTheBruteForceOnTwoThousandFourHundredLabelledGraphs()
    {
        var rng = new Random(9009);
        var failures = new List<string>();
        var tally = new SortedDictionary<string, int>();
        void Count(string key) => tally[key] = tally.GetValueOrDefault(key) + 1;
        int labelled = 0;
        for (int i = 0; i < 2400; i++)
        {
            bool planes = i % 2 == 0;
            var labels = planes ? LabelledGraphs.Planes : MeasurementLabels.All;
            var g = i % 4 < 2 ? LabelledGraphs.Make(rng, rng.Next(2, 9), 6, labels) : LabelledGraphs.MakeWithChains(rng, rng.Next(2, 9), labels);
            if (!g.HasLabels) continue;
            labelled++;
            if (planes)
            {
                var d = SolveAndCompare(g, FlowKind.General, failures);
                Count(d is null ? "general: no flow" : $"general: depth {d}");
            }
            var p = SolveAndCompare(g, FlowKind.Pauli, failures);
            Count(p is null ? "pauli: no flow" : $"pauli: depth {p}");
        }
        output.WriteLine($"{labelled} labelled graphs; {string.Join("; ", tally.Select(kv => $"{kv.Key}: {kv.Value}"))}");
        Assert.True(labelled >= 2000, $"only {labelled} labelled graphs");
        Assert.True(tally.Keys.Count(k => k.StartsWith("pauli: depth")) >= 3, "too few Pauli depths were exercised");
        Assert.True(tally.ContainsKey("general: no flow") && tally.ContainsKey("pauli: no flow"), "no proofs of absence were exercised");
        Assert.True(failures.Count == 0, $"{failures.Count} failures, first ones:\n{string.Join("\n", failures.Take(3))}");
    }
}
