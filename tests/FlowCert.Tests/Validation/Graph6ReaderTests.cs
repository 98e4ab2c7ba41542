namespace FlowCert.Tests.Validation;

/// <summary>
/// The test-side graph6 reader against nauty: the number of graphs nauty-geng lists per order must be
/// the published count of graphs on n unlabeled nodes (OEIS A000088: 1, 1, 2, 4, 11, 34, 156, 1044 for
/// n = 0..7), counted from what we parse, and the edges we read must be those nauty-showg prints.
/// </summary>
public sealed class Graph6ReaderTests
{
    private static readonly int[] A000088 = [1, 1, 2, 4, 11, 34, 156, 1044];

    [ToolFact("nauty-geng")]
    public void GengListsThePublishedNumberOfGraphsForEachOrder()
    {
        // nauty-geng accepts n = 1..32, so order 0 is the one graph6 line "?" (N(0) = 0 + 63), parsed here
        var empty = Graph6Reader.ParseLine("?");
        Assert.Equal(0, empty.Order); // the one graph of order 0 (A000088[0] = 1)
        Assert.Empty(empty.Edges);
        for (int n = 1; n <= 7; n++)
        {
            var graphs = Graph6Reader.ParseAll(PipedProgram.Run("nauty-geng", "nauty", ["-q", n.ToString()]));
            Assert.All(graphs, g => Assert.Equal(n, g.Order));
            Assert.Equal(A000088[n], graphs.Count);
            // up to isomorphism: no two parsed graphs may coincide as labelled graphs either
            Assert.Equal(graphs.Count, graphs.Select(g => string.Join(",", g.Edges)).Distinct().Count());
        }
    }

    [ToolFact("nauty-geng nauty-genrang nauty-showg")]
    public void EdgesMatchNautyShowgForEveryGraphUpToSevenNodesAndALargeRandomGraph()
    {
        var lines = new List<string>();
        for (int n = 1; n <= 7; n++)
            lines.AddRange(PipedProgram.Run("nauty-geng", "nauty", ["-q", n.ToString()]).Split('\n', StringSplitOptions.RemoveEmptyEntries));
        // order 70 uses the four-byte form of N(n); genrang -S fixes the seed
        lines.AddRange(PipedProgram.Run("nauty-genrang", "nauty", ["-g", "-P20", "-S11", "70", "2"]).Split('\n', StringSplitOptions.RemoveEmptyEntries));
        var shown = PipedProgram.Run("nauty-showg", "nauty", ["-e", "-l0"], string.Join("\n", lines) + "\n");
        var expected = ParseShowg(shown);
        Assert.Equal(lines.Count, expected.Count);
        for (int i = 0; i < lines.Count; i++)
        {
            var g = Graph6Reader.ParseLine(lines[i]);
            Assert.Equal(expected[i].Order, g.Order);
            Assert.Equal(expected[i].Edges.OrderBy(e => e).ToList(), g.Edges.OrderBy(e => e).ToList());
        }
        Assert.Equal(70, Graph6Reader.ParseLine(lines[^1]).Order);
    }

    [Fact]
    public void MalformedLinesAreRefused()
    {
        Assert.Throws<FormatException>(() => Graph6Reader.ParseLine("D"));      // 5 nodes need 2 edge bytes
        Assert.Throws<FormatException>(() => Graph6Reader.ParseLine("DQcc"));   // one byte too many
        Assert.Throws<FormatException>(() => Graph6Reader.ParseLine(":Fa@x^")); // sparse6
        Assert.Throws<FormatException>(() => Graph6Reader.ParseLine("A@"));     // padding bit set (order 2 has one edge bit)
        Assert.Equal([(0, 2), (0, 4), (1, 3), (3, 4)], Graph6Reader.ParseLine(">>graph6<<DQc").Edges.Order()); // edges as nauty-showg prints them
    }

    /// <summary>nauty-showg -e: "Graph k, order n." then "n m" then the edges as "u v" pairs.</summary>
    private static List<Graph6Reader.SimpleGraph> ParseShowg(string text)
    {
        var result = new List<Graph6Reader.SimpleGraph>();
        var lines = text.Split('\n', StringSplitOptions.TrimEntries);
        for (int i = 0; i < lines.Length; i++)
        {
            if (!lines[i].StartsWith("Graph ", StringComparison.Ordinal)) continue;
            var counts = lines[i + 1].Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(int.Parse).ToArray();
            var numbers = counts[1] == 0 ? [] : lines[i + 2].Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(int.Parse).ToArray();
            var edges = Enumerable.Range(0, numbers.Length / 2).Select(k => (numbers[2 * k], numbers[2 * k + 1])).ToList();
            Assert.Equal(counts[1], edges.Count);
            result.Add(new Graph6Reader.SimpleGraph(counts[0], edges));
        }
        return result;
    }
}
