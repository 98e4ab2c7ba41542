using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Noise;

namespace FlowCert.Tests.Noise;

/// <summary>Corrupted corrections: an anti-squeezed quadrature reaches an output and its noise grows as e^(2r).</summary>
public class NegativeControlTests
{
    /// <summary>
    /// The certificate with one correction coefficient changed (the first measured node whose correction has
    /// an entry on a later node: that entry doubled), or null when there is none.
    /// </summary>
    internal static FlowResult? Corrupt(FlowResult flow)
    {
        foreach (var round in flow.Rounds)
            foreach (var v in round)
            {
                if (!flow.Corrections.TryGetValue(v, out var c) || c.Count == 0) continue;
                var values = c.Values<Rational>().ToArray();
                values[0] *= 2;
                var corrections = flow.Corrections.ToDictionary(p => p.Key, p => p.Value);
                corrections[v] = NodeVector.Create(flow.Field, c.Nodes, values);
                return flow with { Corrections = corrections };
            }
        return null;
    }

    [Fact]
    public void ACorruptedCorrectionLeavesAnAntiSqueezedTermGrowingAsE2r()
    {
        int seen = 0;
        foreach (var (name, flow, phases) in QCertificateCorpus.Certificates(20, seed: 4242))
        {
            var corrupted = Corrupt(flow);
            if (corrupted is null) continue;
            var report = NoiseAnalysis.Analyze(corrupted, phases);
            Assert.False(report.Valid, name);
            Assert.DoesNotContain(report.Leaks, l => corrupted.Graph.Inputs.Contains(l.Node));
            var row = report.Leaks[0].Row;
            // Growth: from r = 3 to r = 4 the added variance is multiplied by e^2 (up to the e^(-2r) part).
            double ratio = NoiseFigures.AddedVariance(report, row, 4) / NoiseFigures.AddedVariance(report, row, 3);
            Assert.Equal(Math.Exp(2), ratio, 2);
            Assert.Null(NoiseFigures.TargetDecibels(report, Rational.One));
            seen++;
        }
        Assert.True(seen >= 15);
    }

    [Fact]
    public void TheValidCertificatesHaveNoAntiSqueezedTermAndASymplecticIdealMap()
    {
        foreach (var (name, flow, phases) in QCertificateCorpus.Certificates(40, seed: 99))
        {
            var report = NoiseAnalysis.Analyze(flow, phases);
            Assert.True(report.Valid, name);
            // S^T J S = J exactly (J = block-diagonal [[0, 1], [-1, 0]]): the ideal map is symplectic.
            int n = report.S.GetLength(1);
            for (int i = 0; i < n; i++)
                for (int j = 0; j < n; j++)
                {
                    var sum = Rational.Zero;
                    for (int k = 0; k < report.Rows; k += 2)
                        sum += report.S[k, i] * report.S[k + 1, j] - report.S[k + 1, i] * report.S[k, j];
                    var expected = i / 2 == j / 2 && i != j ? (i % 2 == 0 ? Rational.One : -Rational.One) : Rational.Zero;
                    Assert.True(expected == sum, $"{name}: (S^T J S)[{i},{j}] = {sum}");
                }
        }
    }

    // Scaling (flows.md section 11): added variance times e^(2r) is constant in r, and equals the exact diagonal of L L^T.
    [Fact]
    public void AddedVarianceTimesE2rIsConstantInR()
    {
        foreach (var (name, flow, phases) in QCertificateCorpus.Certificates(20, seed: 5))
        {
            var report = NoiseAnalysis.Analyze(flow, phases);
            for (int row = 0; row < report.Rows; row++)
            {
                double exact = NoiseFigures.ToDouble(report.AddedVariance(row));
                foreach (var r in new[] { 0.0, 0.5, 1.1513, 2.0, 3.7 })
                    Assert.Equal(exact, NoiseFigures.AddedVariance(report, row, r) * Math.Exp(2 * r), 9);
            }
        }
    }
}
