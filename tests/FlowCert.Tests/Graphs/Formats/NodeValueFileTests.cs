using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using FlowCert.Noise;
using FlowCert.Simulation;

namespace FlowCert.Tests.Graphs.Formats;

/// <summary>
/// The three files of one NODE VALUE a line (labels, Gaussian phases, angles) share one reader: the same
/// line gives the same error, at the same line and column, from each of them (common practice).
/// </summary>
public class NodeValueFileTests
{
    // A wire i - a - b - o: i an input, o the output.
    private static readonly OpenGraph Wire = OgraphReader.Parse("input i\noutput o\nedge i a\nedge a b\nedge b o\n", "w.ograph");

    private static readonly (string Name, string Value, Action<string> Read)[] Readers =
    [
        ("labels", "X", text => LabelsFile.Apply(Wire, text, "f.txt")),
        ("phases", "1/2", text => PhaseFile.Parse(text, "f.txt", Wire)),
        ("angles", "pi/4", text => MeasurementAngles.Parse(text, "f.txt", Wire, 2)),
        ("angles", "0, pi, 1, 2, 3", text => MeasurementAngles.Parse(text, "f.txt", Wire, 5)),
    ];

    [Theory]
    [InlineData("zz {0}\n", 1, 1, "unknown node 'zz': the graph has no node of that name")]
    [InlineData("# comment\n\t o {0}\n", 2, 3, "node o is an output: outputs are never measured and carry no {1}")]
    [InlineData("a {0}  # first\r\n\n   \na {0}\n", 4, 1, "node a has two {2} (lines 1 and 4)")]
    [InlineData("a {0}\n  b\n", 2, 3, "a line of {3} is NODE ")]
    public void EveryReaderGivesTheSameNodeErrorAtTheSamePlace(string template, int line, int column, string problem)
    {
        foreach (var (name, value, read) in Readers)
        {
            var item = name[..^1];
            var kind = name == "angles" ? "an angles file" : $"a {name} file";
            var e = Assert.Throws<GraphFormatException>(() => read(string.Format(template, value)));
            Assert.Equal(("f.txt", line, column), (e.File, e.Line, e.Column));
            Assert.StartsWith(string.Format(problem, value, item, name, kind), e.Problem);
        }
    }

    [Fact]
    public void ValuesAreReadInFileOrderWithCommentsAndBlankLinesIgnored()
    {
        const string text = "# header\n\na  {0}   # trailing\r\n\tb {0}\n";
        Assert.Equal([MeasurementLabel.X, MeasurementLabel.X], new[] { "a", "b" }.Select(n => LabelsFile.Apply(Wire, string.Format(text, "X"), "f.txt").Label(Wire.IndexOf(n))));
        Assert.Equal(2, PhaseFile.Parse(string.Format(text, "1/2"), "f.txt", Wire).Count);
        var angles = MeasurementAngles.Parse(string.Format(text, "pi / 2"), "f.txt", Wire, 2);
        Assert.Equal(-Math.PI / 2, angles.Of(Wire.IndexOf("b"))[1], 12);
        Assert.Equal(0, angles.Of(Wire.IndexOf("i"))[1]);
    }

    [Fact]
    public void AnErrorInAValueComesBeforeAProblemOfALaterLine()
    {
        var e = Assert.Throws<GraphFormatException>(() => PhaseFile.Parse("a x\nzz 1\n", "f.txt", Wire));
        Assert.Equal((1, 3), (e.Line, e.Column));
        e = Assert.Throws<GraphFormatException>(() => MeasurementAngles.Parse("a 1\nb 2, 3\nzz 1\n", "f.txt", Wire, 2));
        Assert.Equal((2, 3), (e.Line, e.Column));
        Assert.Contains("one angle in its plane, not 2 values", e.Problem);
    }
}
