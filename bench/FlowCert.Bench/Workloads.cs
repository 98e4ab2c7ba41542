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
    public static OpenGraph Band(int n, int bandwidth, bool hub = false)
    {
        var names = Enumerable.Range(0, n).Select(i => "v" + i.ToString("D5", System.Globalization.CultureInfo.InvariantCulture)).ToArray();
        var rng = new Random(11);
        var edges = new List<(string, string, Rational)>();
        for (int i = 0; i < n; i++)
            for (int j = i + 1; j <= Math.Min(n - 1, i + bandwidth); j++)
                if (j == i + bandwidth || rng.Next(2) == 1) edges.Add((names[i], names[j], Rational.One));
        if (!hub) return new OpenGraph(names, edges, names.Take(bandwidth / 2), names.TakeLast(bandwidth));
        edges.AddRange(names.Select(v => ("hub", v, Rational.One)));
        return new OpenGraph(names.Append("hub"), edges, names.Take(bandwidth / 2), names.TakeLast(bandwidth).Append("hub"));
    }

    public static FieldSpec Field(string name) => FieldSpec.Parse(name);
}
