using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Tests.Simulation;

/// <summary>
/// Seeded random small open graphs over F_p with their flow certificates, produced the way a user would:
/// FlowSolver, CertificateWriter, CertificateReader. Only graphs with a flow are kept; both kinds of flow.
/// </summary>
public static class RandomFlowCorpus
{
    /// <summary>The largest node count per prime, so p^(nodes + inputs) stays small.</summary>
    public static int MaxNodes(int p) => p switch { 2 => 7, 3 => 6, _ => 5 };

    public static IReadOnlyList<(string Name, FlowResult Result)> Certificates(int p, int count, int seed)
    {
        var random = new Random(seed);
        var field = FieldSpec.PrimeField((ulong)p);
        var found = new List<(string, FlowResult)>();
        for (int attempt = 0; found.Count < count; attempt++)
        {
            if (attempt > 100 * count) throw new InvalidOperationException($"only {found.Count} flows in {attempt} random graphs over F{p}");
            var g = RandomGraph(random, p);
            foreach (var kind in new[] { FlowKind.General, FlowKind.Causal })
            {
                var solved = FlowSolver.Solve(g, field, kind);
                if (!solved.HasFlow || solved.Depth == 0 || found.Count >= count) continue;
                var name = $"F{p} seed {seed} graph {attempt} {FlowKinds.Name(kind)}";
                found.Add((name, CertificateReader.Parse(CertificateWriter.Write(solved), name)));
            }
        }
        return found;
    }

    private static OpenGraph RandomGraph(Random random, int p)
    {
        int n = random.Next(3, MaxNodes(p) + 1);
        var names = Enumerable.Range(0, n).Select(i => $"q{i}").ToArray();
        var edges = new List<(string, string, Rational)>();
        for (int u = 0; u < n; u++)
            for (int v = u + 1; v < n; v++)
                if (random.NextDouble() < 0.5) edges.Add((names[u], names[v], Weight(random, p)));
        int inputs = random.Next(0, Math.Min(2, n - 2) + 1);
        int outputs = random.Next(Math.Max(1, inputs), Math.Min(3, n - 1) + 1);
        var shuffled = names.OrderBy(_ => random.Next()).ToArray();
        // Inputs and outputs drawn independently, so they sometimes overlap (allowed by flows.md section 1).
        var ins = shuffled.Take(inputs).ToArray();
        var outs = names.OrderBy(_ => random.Next()).Take(outputs).ToArray();
        return new OpenGraph(names, edges, ins, outs);
    }

    // Non-zero in F_p: an integer 1..p-1, sometimes negated, sometimes written as k/2 (p odd).
    private static Rational Weight(Random random, int p)
    {
        var k = (long)random.Next(1, p);
        return random.Next(4) switch
        {
            0 => -k,
            1 when p != 2 => Rational.Create(k, 2), // k * 2^-1, non-zero mod an odd prime
            _ => k,
        };
    }
}
