using FlowCert.Graphs;
using Fractions;

namespace FlowCert.Tests.Graphs;

/// <summary>
/// The .ograph reader reads in 64 Ki-character chunks and assembles lines in a buffer that starts at 256
/// characters and doubles; its table of declared names starts at 16 and doubles. Seeded random files whose
/// lines and totals straddle every one of those boundaries must read the same through a file stream and from
/// a string, and a canonical form written and read back must be identical (common practice for readers).
/// </summary>
public class OgraphReaderStreamingTests
{
    [Theory]
    [InlineData(1, 15)]
    [InlineData(2, 17)]
    [InlineData(3, 300)]
    [InlineData(4, 5000)]
    [InlineData(5, 20000)]
    public void RandomFilesAcrossGrowthBoundariesReadTheSameEveryWay(int seed, int nodes)
    {
        var rng = new Random(seed);
        var names = Enumerable.Range(0, nodes).Select(i => $"q{i}_{rng.Next(1000)}").Distinct().ToArray();
        var lines = new List<string> { $"input {names[0]}", $"output {names[^1]}" };
        // Long node lines (past 256 characters, some past 65,536) and edges with varied weights.
        for (int i = 0; i < names.Length;)
        {
            int take = Math.Min(names.Length - i, 1 + rng.Next(8000));
            lines.Add("node " + string.Join(rng.Next(2) == 0 ? " " : "\t", names.Skip(i).Take(take)));
            i += take;
        }
        string[] weights = ["", " 2", " -1/2", " 0.25", " 5/3"];
        for (int e = 0; e < nodes; e++)
        {
            int u = rng.Next(names.Length), v = rng.Next(names.Length);
            if (u != v) lines.Add($"edge {names[u]} {names[v]}{weights[rng.Next(weights.Length)]}  # e{e}");
        }
        // Edges may repeat at random; keep the first of each pair so the file stays valid.
        var seen = new HashSet<(string, string)>();
        lines = lines.Where(l =>
        {
            if (!l.StartsWith("edge ")) return true;
            var t = l.Split(' ');
            var key = string.CompareOrdinal(t[1], t[2]) < 0 ? (t[1], t[2]) : (t[2], t[1]);
            return seen.Add(key);
        }).ToList();
        var text = string.Join(rng.Next(2) == 0 ? "\n" : "\r\n", lines) + (rng.Next(2) == 0 ? "\n" : "");

        var path = Path.Combine(Path.GetTempPath(), $"flowcert-stream-{seed}-{Environment.ProcessId}.ograph");
        File.WriteAllText(path, text);
        try
        {
            if (nodes >= 20000) Assert.Contains(lines, l => l.Length > 1 << 16);
            var fromString = OgraphReader.Parse(text, path);
            var fromStream = OgraphReader.ReadFile(path);
            Assert.Equal(names.Length, fromStream.NodeCount);
            var canonical = CanonicalForm.Write(fromStream);
            Assert.Equal(CanonicalForm.Write(fromString), canonical);
            Assert.Equal(canonical, CanonicalForm.Write(OgraphReader.Parse(canonical, "c.ograph")));
        }
        finally { File.Delete(path); }
    }

    /// <summary>
    /// The reader against a reading written here from docs/formats.md alone: node indices in ordinal order
    /// of the names, each edge once with U &lt; V, its weight the value written (checked with the Fractions
    /// NuGet package; more distinct weights than the reader remembers, 4,096), and for a node placed twice
    /// the later <c>at</c> line. Seeded random files (common practice).
    /// </summary>
    [Theory]
    [InlineData(11, 300, 6000)]
    [InlineData(12, 3000, 9000)]
    public void EdgesWeightsAndPositionsAreThoseWritten(int seed, int nodes, int edges)
    {
        var rng = new Random(seed);
        var names = Enumerable.Range(0, nodes).Select(i => $"v{rng.Next(1_000_000)}x{i}").ToArray();
        var lines = new List<string> { $"input {names[0]}", $"output {names[^1]}" };
        var expectedEdges = new Dictionary<(string, string), Fraction>();
        while (expectedEdges.Count < edges)
        {
            var (a, b) = (names[rng.Next(nodes)], names[rng.Next(nodes)]);
            var key = string.CompareOrdinal(a, b) < 0 ? (a, b) : (b, a);
            if (a == b || expectedEdges.ContainsKey(key)) continue;
            var (num, den) = (rng.Next(1, 100_000) * (rng.Next(2) == 0 ? 1 : -1), rng.Next(1, 50));
            expectedEdges[key] = new Fraction(num, den);
            lines.Add(den == 1 && rng.Next(2) == 0 ? $"edge {a} {b} {num}" : $"edge {a} {b} {num}/{den}");
        }
        foreach (var n in names) lines.Add($"node {n}");
        for (int k = 0; k < nodes; k++)
            lines.Insert(rng.Next(2, lines.Count + 1), $"at {names[rng.Next(nodes)]} {rng.Next(-50, 50)} {rng.Next(-50, 50)}");
        var expectedAt = new Dictionary<string, (int, int)>();
        foreach (var t in lines.Where(l => l.StartsWith("at ")).Select(l => l.Split(' ')))
            expectedAt[t[1]] = (int.Parse(t[2]), int.Parse(t[3])); // in file order: the later line wins
        var g = OgraphReader.Parse(string.Join("\n", lines) + "\n", "random.ograph");

        Assert.Equal(names.OrderBy(n => n, StringComparer.Ordinal), g.Names);
        Assert.Equal(expectedEdges.Count, g.Edges.Count);
        var previous = (-1, -1);
        foreach (var e in g.Edges)
        {
            Assert.True(e.U < e.V && (e.U, e.V).CompareTo(previous) > 0, $"edge {e.U} {e.V} out of order");
            previous = (e.U, e.V);
            var w = expectedEdges[(g.Names[e.U], g.Names[e.V])];
            Assert.True(w.Numerator * e.Weight.Denominator == e.Weight.Numerator * w.Denominator, $"{g.Names[e.U]} {g.Names[e.V]}: {e.Weight}, expected {w}");
        }
        Assert.True(expectedEdges.Values.Distinct().Count() > 4096);
        Assert.Equal(expectedAt.Count, g.Positions.Count);
        foreach (var (n, (x, y)) in expectedAt)
            Assert.Equal(new PositionHint(x, y), g.Positions[g.IndexOf(n)]);
    }
}
