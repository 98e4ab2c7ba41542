using FlowCert.Graphs;

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
}
