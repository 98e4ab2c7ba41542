using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Tests.Noise;

/// <summary>
/// Seeded random small open graphs over Q with a flow, certified the way a user would (FlowSolver,
/// CertificateWriter, CertificateReader), both kinds of flow, with random phases. By default as many outputs
/// as inputs; with <c>moreOutputs</c> > 0, 1 to moreOutputs more outputs than inputs (0 to 2 inputs).
/// </summary>
public static class QCertificateCorpus
{
    public static IReadOnlyList<(string Name, FlowResult Flow, Dictionary<int, Rational> Phases)> Certificates(int count, int seed, int moreOutputs = 0)
    {
        var random = new Random(seed);
        var found = new List<(string, FlowResult, Dictionary<int, Rational>)>();
        Rational[] weights = [1, -1, 2, Rational.Create(1, 2), Rational.Create(-3, 2), 3];
        for (int attempt = 0; found.Count < count; attempt++)
        {
            if (attempt > 200 * count) throw new InvalidOperationException($"only {found.Count} flows in {attempt} random graphs");
            int n = random.Next(3, moreOutputs > 0 ? 9 : 8);
            var names = Enumerable.Range(0, n).Select(i => $"m{i}").ToArray();
            var edges = new List<(string, string, Rational)>();
            for (int u = 0; u < n; u++)
                for (int v = u + 1; v < n; v++)
                    if (random.NextDouble() < 0.45) edges.Add((names[u], names[v], weights[random.Next(weights.Length)]));
            int k = moreOutputs > 0 ? random.Next(0, 3) : random.Next(1, Math.Min(3, n - 1) + 1);
            int extra = moreOutputs > 0 ? random.Next(1, moreOutputs + 1) : 0;
            if (k + extra >= n) continue;
            var ins = names.OrderBy(_ => random.Next()).Take(k).ToArray();
            var outs = names.OrderBy(_ => random.Next()).Take(k + extra).ToArray();
            var g = new OpenGraph(names, edges, ins, outs);
            foreach (var kind in new[] { FlowKind.General, FlowKind.Causal })
            {
                var solved = FlowSolver.Solve(g, FieldSpec.Rationals, kind);
                if (!solved.HasFlow || solved.Depth == 0 || found.Count >= count) continue;
                var name = $"Q seed {seed}{(moreOutputs > 0 ? $" +{extra} outputs" : "")} graph {attempt} {FlowKinds.Name(kind)}";
                var flow = CertificateReader.Parse(CertificateWriter.Write(solved), name);
                var phases = new Dictionary<int, Rational>();
                foreach (var v in g.Measured)
                    if (random.Next(3) == 0) phases[v] = Rational.Create(random.Next(-4, 5), random.Next(1, 4));
                found.Add((name, flow, phases));
            }
        }
        return found;
    }
}
