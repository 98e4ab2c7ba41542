using FlowCert.Algebra;
using FlowCert.Graphs;
using FlowCert.Graphs.Families;

namespace FlowCert.Bench;

/// <summary>The benchmark workloads, all built by the project's own family generator (deterministic).</summary>
public static class Workloads
{
    public static OpenGraph Square(int side) => FamilyGenerator.Generate(new FamilyRequest { Family = "square", Size = $"{side}x{side}" });

    public static OpenGraph Brickwork(int rows, int cols) => FamilyGenerator.Generate(new FamilyRequest { Family = "brickwork", Size = $"{rows}x{cols}" });

    /// <summary>G(n, 1/2) with a third of the nodes as outputs and a sixth as inputs: dense frontier blocks.</summary>
    public static OpenGraph Dense(int n) => FamilyGenerator.Generate(new FamilyRequest
    {
        Family = "random", Size = n.ToString(), Probability = "1/2", InputCount = n / 6, OutputCount = n / 3, Seed = 7,
    });

    /// <summary>
    /// A random band graph: nodes v0..v(n-1), each pair at distance 1..bandwidth-1 joined with probability
    /// 1/2 (seed 11) and every pair at distance exactly bandwidth joined, the first bandwidth/2 nodes
    /// inputs and the last bandwidth nodes outputs. Its flow has about n / bandwidth - 1 layers, each found
    /// on a dense bandwidth x bandwidth block (triangular with a full anti-diagonal, so of full rank).
    /// </summary>
    /// <summary>
    /// The random band graph; with <paramref name="hub"/>, one more output joined to every node of the band.
    /// The hub never corrects anything (the band's corrections stay valid), but it keeps every unprocessed
    /// node on the frontier of every layer: the family where each layer's block spans all unprocessed rows.
    /// </summary>
    /// <summary>
    /// The band graph; with <paramref name="hub"/> one more output joined to every node; with
    /// <paramref name="hubs"/> that many more outputs, each joined to every node with probability 1/2 (they
    /// stay active correctors in every layer, so each layer's block is about n by hubs).
    /// </summary>
    public static OpenGraph Band(int n, int bandwidth, bool hub = false, int hubs = 0)
    {
        var names = Enumerable.Range(0, n).Select(i => "v" + i.ToString("D5", System.Globalization.CultureInfo.InvariantCulture)).ToArray();
        var rng = new Random(11);
        var edges = new List<(string, string, Rational)>();
        for (int i = 0; i < n; i++)
            for (int j = i + 1; j <= Math.Min(n - 1, i + bandwidth); j++)
                if (j == i + bandwidth || rng.Next(2) == 1) edges.Add((names[i], names[j], Rational.One));
        var extra = Enumerable.Range(0, hubs).Select(h => "h" + h.ToString("D5", System.Globalization.CultureInfo.InvariantCulture)).ToArray();
        foreach (var h in extra) edges.AddRange(names.Where(_ => rng.Next(2) == 1).Select(v => (h, v, Rational.One)));
        if (!hub) return new OpenGraph(names.Concat(extra), edges, names.Take(bandwidth / 2), names.TakeLast(bandwidth).Concat(extra));
        edges.AddRange(names.Select(v => ("hub", v, Rational.One)));
        return new OpenGraph(names.Append("hub"), edges, names.Take(bandwidth / 2), names.TakeLast(bandwidth).Append("hub"));
    }

    public static FieldSpec Field(string name) => FieldSpec.Parse(name);
}
