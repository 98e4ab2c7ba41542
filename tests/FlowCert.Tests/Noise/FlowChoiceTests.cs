using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Noise;

namespace FlowCert.Tests.Noise;

/// <summary>
/// Does the choice of flow change the noise? For patterns with as many outputs as inputs it does not:
/// docs/noise.md proves that S and L are fixed by the graph and the phases (the measured operators'
/// anti-squeezed parts form an invertible square matrix, so the cancelling combination is unique).
/// These tests look for a counterexample among certificate pairs that really differ.
/// </summary>
public class FlowChoiceTests
{
    [Fact]
    public void CausalAndGeneralizedCertificatesThatDifferGiveTheSameExactNoise()
    {
        var random = new Random(2026);
        Rational[] weights = [1, -1, 2, Rational.Create(1, 2), -3];
        int differing = 0, differentDepth = 0;
        for (int attempt = 0; differing < 40; attempt++)
        {
            Assert.True(attempt < 20_000, $"only {differing} differing pairs");
            int n = random.Next(4, 8);
            var names = Enumerable.Range(0, n).Select(i => $"m{i}").ToArray();
            var edges = new List<(string, string, Rational)>();
            for (int u = 0; u < n; u++)
                for (int v = u + 1; v < n; v++)
                    if (random.NextDouble() < 0.45) edges.Add((names[u], names[v], weights[random.Next(weights.Length)]));
            int k = random.Next(1, 4);
            var g = new OpenGraph(names, edges, names.Take(k), names.Skip(n - k));
            var general = FlowSolver.Solve(g, FieldSpec.Rationals, FlowKind.General);
            var causal = FlowSolver.Solve(g, FieldSpec.Rationals, FlowKind.Causal);
            if (!general.HasFlow || !causal.HasFlow || general.Depth == 0) continue;
            string Body(FlowResult r) { var t = CertificateWriter.Write(r); return t[t.IndexOf("\"depth\"")..t.IndexOf("\"producer\"")]; }
            if (Body(general) == Body(causal)) continue; // the same rounds and corrections: nothing to compare
            differing++;
            if (general.Depth != causal.Depth) differentDepth++;
            var phases = g.Measured.Where(_ => random.Next(2) == 0).ToDictionary(v => v, _ => Rational.Create(random.Next(-3, 4), random.Next(1, 3)));
            var a = NoiseAnalysis.Analyze(CertificateReader.Parse(CertificateWriter.Write(general), "general"), phases);
            var b = NoiseAnalysis.Analyze(CertificateReader.Parse(CertificateWriter.Write(causal), "causal"), phases);
            Assert.True(a.Valid && b.Valid);
            Assert.Equal(a.S, b.S);
            Assert.Equal(a.L, b.L);
        }
        Assert.True(differentDepth >= 20, $"{differentDepth} pairs of different depth");
    }

    // The demo's own pair: the Merrow Reach delay-line pair has a generalized flow of depth 1 and a causal flow of depth 2.
    [Fact]
    public void TheDemoPairDiffersInDepthButNotInNoise()
    {
        var text = FlowCert.Demo.DemoScenario.Designs().Single(d => d.Name == "delay-pair").Text;
        var general = PublishedNoiseTests.Certify(text, FlowKind.General);
        var causal = PublishedNoiseTests.Certify(text, FlowKind.Causal);
        Assert.NotEqual(general.Depth, causal.Depth);
        var a = NoiseAnalysis.Analyze(general);
        var b = NoiseAnalysis.Analyze(causal);
        Assert.Equal(a.L, b.L);
        Assert.Contains(a.L.Cast<Rational>(), x => !x.IsZero);
    }
}
