using FlowCert.Algebra;
using FlowCert.Graphs;

namespace FlowCert.Tests.Graphs;

/// <summary>What the .ograph reader accepts (docs/formats.md): comments, tabs, CRLF, blank lines, at hints, repeats.</summary>
public class OgraphReaderTests
{
    private static string Name(OpenGraph g, int v) => g.Names[v];
    private static string[] Names(OpenGraph g, IEnumerable<int> nodes) => nodes.Select(v => g.Names[v]).ToArray();

    [Fact]
    public void CommentsTabsCrlfAndBlankLinesAreAccepted()
    {
        const string text =
            "# Merrow Reach (fictional): a wire with decorations\r\n" +
            "\r\n" +
            "input\ta   # the input mode\r\n" +
            "   \t  \r\n" +
            "output c#no space before the comment\r\n" +
            "edge a b\t-1/2\r\n" +
            "\tedge b c 0.25 # read exactly\n" +   // LF and CRLF mixed
            "node spare\r\n" +
            "# the end, without a final line end";
        var g = OgraphReader.Parse(text, "wire.ograph");
        Assert.Equal(["a", "b", "c", "spare"], g.Names);
        Assert.Equal(["a"], Names(g, g.SortedInputs));
        Assert.Equal(["c"], Names(g, g.SortedOutputs));
        Assert.Equal(2, g.Edges.Count);
        Assert.Equal(("a", "b", Rational.Create(-1, 2)), (Name(g, g.Edges[0].U), Name(g, g.Edges[0].V), g.Edges[0].Weight));
        Assert.Equal(("b", "c", Rational.Create(1, 4)), (Name(g, g.Edges[1].U), Name(g, g.Edges[1].V), g.Edges[1].Weight));
        Assert.Equal(["spare"], Names(g, g.IsolatedNodes()));
        Assert.Equal(["a", "b", "spare"], Names(g, g.Measured));
    }

    [Fact]
    public void RepeatsThatTheFormatAllowsAreHarmless()
    {
        // input/output lines may repeat, `node` may name a node twice or name one that has edges,
        // a node may be both input and output, and input/output may come before the node is declared.
        const string text = "input a\ninput\noutput a\noutput d\nnode d d a\nedge a b\nedge b c 3\nnode c\n";
        var g = OgraphReader.Parse(text, "g.ograph");
        Assert.Equal(["a", "b", "c", "d"], g.Names);
        Assert.Equal(["a"], Names(g, g.SortedInputs));
        Assert.Equal(["a", "d"], Names(g, g.SortedOutputs));
        Assert.Equal(["d"], Names(g, g.IsolatedNodes()));
        Assert.Equal(Rational.One, g.Edges[0].Weight); // the default weight
    }

    [Fact]
    public void NamesMayUseEveryAllowedCharacter()
    {
        string[] names = ["_", "a", "Z9", "q.0:1-2_x", "_.:-", "A_b.c"];
        var text = string.Join("\n", names.Select(n => "node " + n));
        var g = OgraphReader.Parse(text, "g.ograph");
        Assert.Equal(names.Order(StringComparer.Ordinal), g.Names);
        Assert.All(names, n => Assert.True(OgraphReader.IsValidName(n)));
        Assert.All(["", "1", "-a", "a b", "a#", "a/b", "\u00e9"], n => Assert.False(OgraphReader.IsValidName(n)));
    }

    [Fact]
    public void AtHintsAreParsedAndIgnoredByTheCanonicalForm()
    {
        const string plain = "input a\noutput c\nedge a b\nedge b c\n";
        const string hinted = "input a\noutput c\nat a 0 0\nedge a b\nat b -1.5 2.25\nedge b c\nat c 3 -0.5\nat a 10 10\n";
        var g = OgraphReader.Parse(hinted, "g.ograph");
        Assert.Equal(3, g.Positions.Count);
        Assert.Equal(new PositionHint(10m, 10m), g.Positions[g.IndexOf("a")]); // the last hint wins
        Assert.Equal(new PositionHint(-1.5m, 2.25m), g.Positions[g.IndexOf("b")]);
        Assert.Equal(new PositionHint(3m, -0.5m), g.Positions[g.IndexOf("c")]);
        var h = OgraphReader.Parse(plain, "g.ograph");
        Assert.Empty(h.Positions);
        Assert.Equal(CanonicalForm.Write(h), CanonicalForm.Write(g));
        Assert.Equal(CanonicalForm.Sha256(h), CanonicalForm.Sha256(g));
        Assert.DoesNotContain("at ", CanonicalForm.Write(g));
    }

    [Fact]
    public void AnEmptyFileIsTheEmptyGraph()
    {
        var g = OgraphReader.Parse("", "empty.ograph");
        Assert.Equal(0, g.NodeCount);
        Assert.Empty(g.Edges);
        Assert.Equal("input\noutput\n", CanonicalForm.Write(g));
    }

    [Fact]
    public void OpenGraphRefusesWhatTheReaderWouldRefuse()
    {
        Assert.Throws<ArgumentException>(() => new OpenGraph(["a"], [("a", "a", Rational.One)], [], []));
        Assert.Throws<ArgumentException>(() => new OpenGraph(["a", "b"], [("a", "b", Rational.Zero)], [], []));
        Assert.Throws<ArgumentException>(() => new OpenGraph(["a", "b"], [("a", "b", Rational.One), ("b", "a", Rational.One)], [], []));
        Assert.Throws<ArgumentException>(() => new OpenGraph(["a"], [], ["x"], []));
        var g = new OpenGraph(["b", "a"], [("b", "a", 2)], ["a"], ["b"]);
        Assert.Throws<ArgumentException>(() => g.IndexOf("c"));
        Assert.False(g.Contains("c"));
        Assert.Equal(new WeightedEdge(0, 1, 2), Assert.Single(g.Edges));
    }
}
