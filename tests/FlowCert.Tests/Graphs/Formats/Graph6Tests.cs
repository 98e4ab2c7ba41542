using System.Text;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using FlowCert.Tests.Graphs.Families;

namespace FlowCert.Tests.Graphs.Formats;

/// <summary>
/// graph6 and sparse6 against the examples of "nauty and Traces User's Guide, formats.txt" and against
/// Debian's nauty programs, which both write the graphs we read and read the graphs we write.
/// </summary>
public class Graph6Tests
{
    private static byte[] Bytes(string s) => Encoding.ASCII.GetBytes(s);

    // formats.txt, section "Small nonnegative integers": its three examples.
    [Theory]
    [InlineData(30L, new byte[] { 93 })]
    [InlineData(12345L, new byte[] { 126, 66, 63, 120 })]
    [InlineData(460175067L, new byte[] { 126, 126, 63, 90, 90, 90, 90, 90 })]
    public void SizeEncodingMatchesTheFormatsTxtExamples(long n, byte[] expected)
    {
        Assert.Equal(expected, Bytes(SixBitText.EncodeSize(n)));
        var line = new SixBitText.GraphLine(Encoding.ASCII.GetString(expected), 1, 1);
        Assert.Equal((n, expected.Length), SixBitText.DecodeSize(line, 0, "n.g6"));
    }

    // formats.txt, section "Bit vectors": 1000101100011100 is stored as 97 112 111.
    [Fact]
    public void BitVectorExampleOfFormatsTxt()
    {
        var bits = "1000101100011100".Select(c => c == '1').ToList();
        var sb = new StringBuilder();
        SixBitText.AppendBits(sb, bits);
        Assert.Equal(new byte[] { 97, 112, 111 }, Bytes(sb.ToString()));
    }

    // formats.txt, section "Description of graph6 format": n = 5 with edges 0-2 0-4 1-3 3-4 is "DQc".
    [Fact]
    public void Graph6ExampleOfFormatsTxt()
    {
        var g = Graph6.Parse("DQc\n", "example.g6");
        Assert.Equal(5, g.NodeCount);
        Assert.Equal([(0, 2), (0, 4), (1, 3), (3, 4)], NautyTools.Edges(g));
        Assert.Empty(g.Inputs);
        Assert.Equal("DQc\n", Graph6.Write(g));
        Assert.Equal(5, Graph6.Parse(">>graph6<<DQc", "header.g6").NodeCount);
    }

    // formats.txt, section "Description of sparse6 format": ":Fa@x^" is n = 7 with edges 0-1 0-2 1-2 5-6,
    // the last pair being padding.
    [Fact]
    public void Sparse6ExampleOfFormatsTxt()
    {
        var g = Sparse6.Parse(":Fa@x^\n", "example.s6");
        Assert.Equal(7, g.NodeCount);
        Assert.Equal([(0, 1), (0, 2), (1, 2), (5, 6)], NautyTools.Edges(g));
        Assert.Equal(":Fa@x^\n", Sparse6.Write(g));
    }

    /// <summary>
    /// Every graph on 5 vertices from nauty-geng (34 of them up to isomorphism: OEIS A000088, from
    /// memory) is read with the edges nauty-showg prints for it, and written back to the same line.
    /// </summary>
    [ToolFact("nauty-geng nauty-showg")]
    public void AllGraphsOnFiveVerticesFromGengRoundTrip()
    {
        var lines = NautyTools.Run("nauty-geng", "-q", "5").Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(34, lines.Length);
        var shown = NautyTools.WithFile(lines, NautyTools.ShowEdges);
        for (int k = 0; k < lines.Length; k++)
        {
            var g = Graph6.Parse(lines[k], "geng.g6");
            Assert.Equal(shown[k].N, g.NodeCount);
            Assert.Equal(shown[k].Edges, NautyTools.Edges(g));
            Assert.Equal(lines[k] + "\n", Graph6.Write(g));
        }
    }

    /// <summary>sparse6 written by nauty-copyg -s for every graph on 6 vertices reads as the same graph as its graph6 line.</summary>
    [ToolFact("nauty-geng nauty-copyg")]
    public void Sparse6WrittenByNautyReadsAsTheSameGraph()
    {
        var g6 = NautyTools.Run("nauty-geng", "-q", "6").Split('\n', StringSplitOptions.RemoveEmptyEntries);
        var s6 = NautyTools.WithFile(g6, path => NautyTools.Run("nauty-copyg", "-s", "-q", path)).Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(156, g6.Length); // graphs on 6 vertices: OEIS A000088 (from memory)
        Assert.Equal(g6.Length, s6.Length);
        for (int k = 0; k < g6.Length; k++)
        {
            var fromSparse = Sparse6.Parse(s6[k], "copyg.s6");
            Assert.Equal(NautyTools.Edges(Graph6.Parse(g6[k], "geng.g6")), NautyTools.Edges(fromSparse));
            Assert.Equal(s6[k] + "\n", Sparse6.Write(fromSparse));
        }
    }

    public static TheoryData<string> WrittenGraphs() => ["square", "hexagonal", "brickwork", "random", "padding"];

    /// <summary>
    /// Graphs we write, in both formats, are read by nauty-showg with the edges we meant: vertices are
    /// the nodes in natural order of their names. "padding" covers the special case of formats.txt
    /// where n = 2^k and vertex n - 2 is the last one with an edge.
    /// </summary>
    [ToolTheory("nauty-showg")]
    [MemberData(nameof(WrittenGraphs))]
    public void NautyReadsWhatWeWrite(string which)
    {
        OpenGraph[] graphs = which switch
        {
            "square" => [LatticeFamilyTests.Make("square", "4x5")],
            "hexagonal" => [LatticeFamilyTests.Make("hexagonal", "3x4", periodic: false)],
            "brickwork" => [LatticeFamilyTests.Make("brickwork", "6x13")],
            "random" => [FlowCert.Graphs.Families.FamilyGenerator.Generate(new() { Family = "random", Size = "70", Probability = "1/9", Seed = 3 })],
            _ => [.. new[] { 4, 8, 16 }.Select(n => new OpenGraph(
                    Enumerable.Range(0, n).Select(i => $"v{i}"), [("v0", $"v{n - 2}", FlowCert.Algebra.Rational.One)], [], []))],
        };
        foreach (var g in graphs)
        {
            var order = NaturalNameOrder.Sort(g);
            var number = new int[g.NodeCount];
            for (int k = 0; k < order.Length; k++) number[order[k]] = k;
            var expected = g.Edges.Select(e => (Math.Min(number[e.U], number[e.V]), Math.Max(number[e.U], number[e.V]))).Order().ToList();
            foreach (var text in new[] { Graph6.Write(g), Sparse6.Write(g) })
            {
                var shown = NautyTools.WithFile([text], NautyTools.ShowEdges).Single();
                Assert.Equal(g.NodeCount, shown.N);
                Assert.Equal(expected, shown.Edges);
            }
        }
    }

    [Theory]
    [InlineData("DQ ", 1, 3, "outside 63..126")]
    [InlineData("DQ", 1, 3, "ends early")]
    [InlineData("DQcc", 1, 4, "unexpected byte")]
    [InlineData("DQc\nDQc\n", 2, 1, "second graph")]
    [InlineData("\n\n", 1, 1, "no graph")]
    [InlineData(":Fa@x^", 1, 1, "sparse6")]
    [InlineData("~", 1, 2, "ends inside the number of nodes")]
    public void MalformedGraph6NamesLineAndColumn(string text, int line, int column, string problem)
    {
        var e = Assert.Throws<GraphFormatException>(() => Graph6.Parse(text, "bad.g6"));
        Assert.Equal(("bad.g6", line, column), (e.File, e.Line, e.Column));
        Assert.Contains(problem, e.Problem);
    }

    [Theory]
    [InlineData(":AN", 1, 3, "loop")]      // n = 2, k = 1: pair (0,0) is a loop on vertex 0, then padding
    [InlineData(":B_", 1, 3, "twice")]     // n = 3, k = 2: pairs (1,0) (0,0) are edge 0-1 twice
    [InlineData("DQc", 1, 1, "starts with ':'")]
    [InlineData(";Fa@x^", 1, 1, "incremental")]
    [InlineData(":Fa@x ", 1, 6, "outside 63..126")]
    public void MalformedSparse6NamesLineAndColumn(string text, int line, int column, string problem)
    {
        var e = Assert.Throws<GraphFormatException>(() => Sparse6.Parse(text, "bad.s6"));
        Assert.Equal(("bad.s6", line, column), (e.File, e.Line, e.Column));
        Assert.Contains(problem, e.Problem);
    }

    [Fact]
    public void WeightsOtherThanOneAreRefusedByBothWriters()
    {
        var g = LatticeFamilyTests.Make("square", "2x2", weights: FlowCert.Graphs.Families.WeightRule.ParsePerDirection("v=2"));
        Assert.Contains("weight 2", Assert.Throws<GraphFileException>(() => Graph6.Write(g)).Message);
        Assert.Contains("weight 2", Assert.Throws<GraphFileException>(() => Sparse6.Write(g)).Message);
    }
}
