using FlowCert.Algebra;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;

namespace FlowCert.Tests.Fuzz;

/// <summary>
/// Property: a random graph written by each writer and read back is the same graph (common practice for
/// file formats). Sizes straddle the readers' growth boundaries: the .ograph name table (16, doubling),
/// its line buffer (256 characters, doubling; names up to 300 characters) and its 64 Ki-character chunks;
/// graph6 and sparse6 size fields (one character below 63 nodes, four from 63; the six-byte form from
/// 258,048, formats.txt of nauty, from memory) and sparse6's bits per vertex (powers of two).
/// graph6, sparse6 and Matrix Market carry no names or terminals: there the graph read back must be the
/// original renamed v0, v1, ... (v1, v2, ... for Matrix Market's rows) in natural order of its names, without inputs and outputs.
/// </summary>
public class RoundTripPropertyTests
{
    private const string First = "abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ_";
    private const string Rest = First + "0123456789.:-";

    private static OpenGraph RandomGraph(Random rng, int n, bool unitWeights, int edgesPerNode = 2)
    {
        var names = new HashSet<string>(StringComparer.Ordinal);
        while (names.Count < n)
        {
            int length = rng.Next(8) == 0 ? 1 + rng.Next(300) : 1 + rng.Next(6);
            var chars = new char[length];
            chars[0] = First[rng.Next(First.Length)];
            for (int i = 1; i < length; i++) chars[i] = Rest[rng.Next(Rest.Length)];
            names.Add(new string(chars));
        }
        var list = names.ToArray();
        var edges = new Dictionary<(int, int), Rational>();
        Rational[] weights = [1, -1, 2, Rational.Create(1, 2), Rational.Create(-3, 4), Rational.Create(5, 8), 7, Rational.Create(1, 3)];
        for (int k = 0; n >= 2 && k < edgesPerNode * n; k++)
        {
            int u = rng.Next(n), v = rng.Next(n);
            if (u == v) continue;
            edges[(Math.Min(u, v), Math.Max(u, v))] = unitWeights ? Rational.One : weights[rng.Next(weights.Length)];
        }
        var inputs = list.Where(_ => rng.Next(5) == 0).ToArray();
        var outputs = list.Where(_ => rng.Next(5) == 0).ToArray();
        return new OpenGraph(list, edges.Select(e => (list[e.Key.Item1], list[e.Key.Item2], e.Value)), inputs, outputs);
    }

    /// <summary>The graph renamed v0, v1, ... (Matrix Market: v1, v2, ...) in natural order of its names, without inputs and outputs.</summary>
    private static OpenGraph Numbered(OpenGraph g, int first = 0)
    {
        var order = NaturalNameOrder.Sort(g);
        var name = new string[g.NodeCount];
        for (int k = 0; k < order.Length; k++) name[order[k]] = NumberedNames.Name(k + first);
        return new OpenGraph(name, g.Edges.Select(e => (name[e.U], name[e.V], e.Weight)), [], []);
    }

    public static TheoryData<int> Sizes() => [0, 1, 2, 3, 4, 5, 8, 9, 15, 16, 17, 31, 32, 33, 62, 63, 64, 65, 255, 256, 257, 1024, 1025, 5000];

    [Theory]
    [MemberData(nameof(Sizes))]
    public void EveryWriterReadsBackTheSameGraph(int n)
    {
        var rng = new Random(n * 31 + 7);
        var g = RandomGraph(rng, n, unitWeights: false);
        var canonical = CanonicalForm.Write(g);
        // .ograph from a string and through a file (the streamed reader), and the JSON graph object
        Assert.Equal(canonical, CanonicalForm.Write(OgraphReader.Parse(OgraphWriter.Write(g), "g.ograph")));
        Assert.Equal(canonical, CanonicalForm.Write(OgraphReader.Parse(canonical, "c.ograph")));
        var path = Path.Combine(Path.GetTempPath(), $"flowcert-roundtrip-{n}-{Environment.ProcessId}.ograph");
        try
        {
            File.WriteAllText(path, OgraphWriter.Write(g));
            Assert.Equal(canonical, CanonicalForm.Write(OgraphReader.ReadFile(path)));
        }
        finally { File.Delete(path); }
        Assert.Equal(canonical, CanonicalForm.Write(GraphJson.Parse(GraphJson.Write(g), "g.json")));
        // Matrix Market holds decimals only: 1/3 is replaced by 3 to keep every weight decimal
        var decimals = new OpenGraph(g.Names, g.Edges.Select(e => (g.Names[e.U], g.Names[e.V], e.Weight.Denominator == 3 ? (Rational)3 : e.Weight)), [], []);
        Assert.Equal(CanonicalForm.Write(Numbered(decimals, first: 1)), CanonicalForm.Write(MatrixMarketReader.Parse(MatrixMarketWriter.Write(decimals), "g.mtx")));
        // graph6 and sparse6 hold unweighted graphs
        var unit = RandomGraph(rng, n, unitWeights: true);
        var expected = CanonicalForm.Write(Numbered(unit));
        Assert.Equal(expected, CanonicalForm.Write(Graph6.Parse(Graph6.Write(unit), "g.g6")));
        Assert.Equal(expected, CanonicalForm.Write(Sparse6.Parse(Sparse6.Write(unit), "g.s6")));
    }

    /// <summary>sparse6 across the size field's switch from four to eight characters at 258,048 nodes (few edges).</summary>
    [Theory]
    [InlineData(258047)]
    [InlineData(258048)]
    public void Sparse6AcrossItsLongSizeField(int n)
    {
        var names = Enumerable.Range(0, n).Select(k => NumberedNames.Name(k)).ToArray();
        var rng = new Random(n);
        var edges = new HashSet<(int, int)>();
        while (edges.Count < 50) { int u = rng.Next(n), v = rng.Next(n); if (u != v) edges.Add((Math.Min(u, v), Math.Max(u, v))); }
        edges.Add((n - 2, n - 1));
        var g = new OpenGraph(names, edges.Select(e => (names[e.Item1], names[e.Item2], Rational.One)), [], []);
        var text = Sparse6.Write(g);
        Assert.StartsWith(n >= 258048 ? ":~~" : ":~", text);
        Assert.Equal(CanonicalForm.Write(g), CanonicalForm.Write(Sparse6.Parse(text, "g.s6")));
    }
}
