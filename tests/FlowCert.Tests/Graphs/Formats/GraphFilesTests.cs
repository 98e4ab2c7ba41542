using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using FlowCert.Tests.Graphs.Families;

namespace FlowCert.Tests.Graphs.Formats;

/// <summary>Format choice by extension, inputs and outputs for formats without them, conversions, and DOT for Graphviz.</summary>
public class GraphFilesTests
{
    [Theory]
    [InlineData("a.ograph", GraphFileFormat.Ograph)]
    [InlineData("dir/b.G6", GraphFileFormat.Graph6)]
    [InlineData("c.s6", GraphFileFormat.Sparse6)]
    [InlineData("d.mtx", GraphFileFormat.MatrixMarket)]
    [InlineData("e.json", GraphFileFormat.Json)]
    [InlineData("f.dot", GraphFileFormat.Dot)]
    public void TheExtensionChoosesTheFormat(string path, GraphFileFormat format) => Assert.Equal(format, GraphFiles.FormatOf(path));

    [Fact]
    public void UnknownExtensionsAndReadingDotAreRefused()
    {
        Assert.Contains("'.txt'", Assert.Throws<GraphFileException>(() => GraphFiles.FormatOf("g.txt")).Message);
        Assert.Contains("not read", Assert.Throws<GraphFileException>(() => GraphFiles.Read("g.dot")).Message);
    }

    [Fact]
    public void FormatsWithoutTerminalsTakeThemFromNameLists()
    {
        var g = GraphFiles.Parse("DQc\n", "five.g6", GraphFileFormat.Graph6, "v0, v1", "v3 v4");
        Assert.Equal(["v0", "v1"], g.SortedInputs.Select(v => g.Names[v]));
        Assert.Equal(["v3", "v4"], g.SortedOutputs.Select(v => g.Names[v]));
        Assert.Empty(GraphFiles.Parse("DQc\n", "five.g6", GraphFileFormat.Graph6).Inputs);
        var unknown = Assert.Throws<GraphFileException>(() => GraphFiles.Parse("DQc\n", "five.g6", GraphFileFormat.Graph6, "v5"));
        Assert.Contains("input v5 is not a node of five.g6 (its nodes are v0 to v4)", unknown.Message);
        Assert.Contains("listed twice", Assert.Throws<GraphFileException>(() => GraphFiles.Parse("DQc", "f.g6", GraphFileFormat.Graph6, null, "v1,v1")).Message);
        var own = Assert.Throws<GraphFileException>(() => GraphFiles.Parse("input a\nnode a\n", "a.ograph", GraphFileFormat.Ograph, "a"));
        Assert.Contains("names its own inputs", own.Message);
    }

    /// <summary>A weighted lattice survives .ograph -> .json -> .mtx -> .ograph; its unweighted twin survives .g6 and .s6 (up to the documented renaming).</summary>
    [Fact]
    public void ConversionsKeepTheGraph()
    {
        var weighted = LatticeFamilyTests.Make("brickwork", "3x9", weights: FlowCert.Graphs.Families.WeightRule.ParseChoice("1,-1/2,3"), seed: 5);
        var viaJson = GraphFiles.Parse(GraphFiles.Write(weighted, GraphFileFormat.Json), "w.json", GraphFileFormat.Json);
        Assert.Equal(CanonicalForm.Write(weighted), CanonicalForm.Write(viaJson));
        var order = NaturalNameOrder.Sort(weighted);
        var inputs = string.Join(",", weighted.SortedInputs.Select(v => "v" + (Array.IndexOf(order, v) + 1)));
        var viaMtx = GraphFiles.Parse(GraphFiles.Write(viaJson, GraphFileFormat.MatrixMarket), "w.mtx", GraphFileFormat.MatrixMarket, inputs);
        Assert.Equal(weighted.Edges.Select(e => e.Weight).Order(), viaMtx.Edges.Select(e => e.Weight).Order());
        Assert.Equal(weighted.Inputs.Count, viaMtx.Inputs.Count);
        var plain = LatticeFamilyTests.Make("brickwork", "3x9");
        foreach (var f in new[] { GraphFileFormat.Graph6, GraphFileFormat.Sparse6 })
        {
            var back = GraphFiles.Parse(GraphFiles.Write(plain, f), "p", f);
            var renamed = new OpenGraph(plain.Names.Select(n => "v" + Array.IndexOf(NaturalNameOrder.Sort(plain), plain.IndexOf(n))),
                plain.Edges.Select(e => ("v" + Array.IndexOf(NaturalNameOrder.Sort(plain), e.U), "v" + Array.IndexOf(NaturalNameOrder.Sort(plain), e.V), e.Weight)), [], []);
            Assert.Equal(CanonicalForm.Write(renamed), CanonicalForm.Write(back));
        }
    }

    [Fact]
    public void TheOgraphWriterKeepsPositionHintsAndTheReaderReadsThemBack()
    {
        var g = LatticeFamilyTests.Make("cubic", "2x2x2");
        var text = GraphFiles.Write(g, GraphFileFormat.Ograph);
        Assert.Contains("at x1y1z1 2.8 1.4\n", text);
        var back = GraphFiles.Parse(text, "c.ograph", GraphFileFormat.Ograph);
        Assert.Equal(g.Positions.OrderBy(p => p.Key), back.Positions.OrderBy(p => p.Key));
    }

    /// <summary>DOT written for a weighted graph with positions, and for names that need quoting, is accepted by Graphviz's dot.</summary>
    [ToolFact("dot")]
    public void GraphvizAcceptsTheDotWeWrite()
    {
        var lattice = LatticeFamilyTests.Make("hexagonal", "3x4", weights: FlowCert.Graphs.Families.WeightRule.ParseChoice("1,-1/2"), seed: 1);
        var odd = new OpenGraph(["a.b", "c:d", "e-f", "_g"], [("a.b", "c:d", 2), ("c:d", "e-f", -1), ("e-f", "_g", 1)], ["a.b"], ["_g", "a.b"]);
        foreach (var g in new[] { lattice, odd })
        {
            var svg = FlowCert.Tests.Drawing.Graphviz.ToSvg(DotWriter.Write(g)).Replace("&#45;", "-"); // Graphviz writes '-' as a character reference
            Assert.Contains("<svg", svg);
            foreach (var name in g.Names) Assert.Contains($">{name}</text>", svg);
        }
    }
}
