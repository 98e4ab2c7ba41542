using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Tests.Validation;

namespace FlowCert.Tests.Flows;

/// <summary>
/// Carrying the reduced form from layer to layer (issue 11, target 2) must not change a certificate: the
/// canonical solutions and the reduced left kernel are properties of each layer's block, not of how it was
/// eliminated (the reduced row echelon form is unique, common practice). Seeded random graphs are solved
/// with the form carried from the second layer on and with a fresh elimination every layer; the
/// certificates must be equal byte for byte, flows and proofs of absence alike.
/// </summary>
public class CarriedEliminationTests
{
    private static readonly string[] Fields = ["F3", "F5", "F7", "F1000003", "F2305843009213693951"];

    private static void AssertSameCertificate(OpenGraph g, string field, ref int flows, ref int blocked)
    {
        var spec = FieldSpec.Parse(field);
        var fresh = FlowSolver.Solve(g, spec, FlowKind.General, null, CarryRule.Never);
        var carried = FlowSolver.Solve(g, spec, FlowKind.General, null, CarryRule.Always);
        Assert.Equal(CertificateWriter.Write(fresh), CertificateWriter.Write(carried));
        if (fresh.HasFlow) flows++; else blocked++;
    }

    [Fact]
    public void RandomDenseGraphsGiveTheSameCertificateEitherWay()
    {
        var rng = new Random(20261203);
        int flows = 0, blocked = 0, deep = 0;
        for (int k = 0; k < 300; k++)
        {
            int n = rng.Next(4, 40);
            var g = RandomGraphs.Make(rng, n, 0.1 + 0.4 * rng.NextDouble(), n, RandomGraphs.IntegerWeights, outputShare: 0.3 + 0.3 * rng.NextDouble(), inputShare: 0.1);
            foreach (var field in Fields.Where((_, i) => i == k % Fields.Length))
            {
                AssertSameCertificate(g, field, ref flows, ref blocked);
                var r = FlowSolver.Solve(g, FieldSpec.Parse(field), FlowKind.General, null, CarryRule.Never);
                if (r.HasFlow && r.Depth >= 3) deep++;
            }
        }
        // the sample must exercise both verdicts and flows with layers after the first
        Assert.True(flows >= 30 && blocked >= 30 && deep >= 10, $"flows {flows}, blocked {blocked}, depth 3 or more {deep}");
    }

    /// <summary>Band graphs with hub outputs (the bench/layers family, small): many layers on blocks that stay dense.</summary>
    [Theory]
    [InlineData(60, 6, 0, 1)]
    [InlineData(90, 8, 12, 2)]
    [InlineData(120, 10, 30, 3)]
    [InlineData(80, 5, 20, 4)]
    public void BandGraphsWithHubsGiveTheSameCertificateEitherWay(int n, int width, int hubs, int seed)
    {
        var rng = new Random(seed);
        var names = Enumerable.Range(0, n).Select(i => $"v{i:D4}").ToArray();
        var hubNames = Enumerable.Range(0, hubs).Select(h => $"h{h:D4}").ToArray();
        var edges = new List<(string, string, Rational)>();
        Rational Weight() => rng.Next(1, 6) * (rng.Next(2) == 0 ? 1 : -1);
        for (int i = 0; i < n; i++)
            for (int j = i + 1; j <= Math.Min(n - 1, i + width); j++)
                if (j == i + width || rng.Next(2) == 1) edges.Add((names[i], names[j], j == i + width ? Rational.One : Weight()));
        foreach (var h in hubNames) edges.AddRange(names.Where(_ => rng.Next(2) == 1).Select(v => (h, v, Weight())));
        var g = new OpenGraph(names.Concat(hubNames), edges, names.Take(width / 2), names.TakeLast(width).Concat(hubNames));
        int flows = 0, blocked = 0;
        foreach (var field in Fields) AssertSameCertificate(g, field, ref flows, ref blocked);
        Assert.Equal(Fields.Length, flows + blocked);
        var depth = FlowSolver.Solve(g, FieldSpec.Parse("F3"), FlowKind.General).Depth;
        Assert.True(depth >= 3, $"depth {depth}: the family is meant to have several layers");
    }
}
