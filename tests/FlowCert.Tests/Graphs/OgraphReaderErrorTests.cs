using FlowCert.Graphs;

namespace FlowCert.Tests.Graphs;

/// <summary>
/// Every error class of the .ograph format (docs/formats.md, "Graph text file"): each case pins the
/// line, the column (first character of the offending token, a tab counting as one column) and what the
/// message says.
/// </summary>
public class OgraphReaderErrorTests
{
    private const string File = "designs/patch.ograph";

    private static GraphFormatException Refuse(string text, int line, int column)
    {
        var e = Assert.Throws<GraphFormatException>(() => OgraphReader.Parse(text, File));
        Assert.Equal(File, e.File);
        Assert.True(line == e.Line && column == e.Column, $"expected {line}:{column}, got {e.Line}:{e.Column} ({e.Problem})");
        Assert.StartsWith($"{File}:{line}:{column}: ", e.Message);
        Assert.EndsWith(e.Problem, e.Message);
        return e;
    }

    [Theory]
    [InlineData("input a\nedge a b\n  vertex c\n", 3, 3, "'vertex'")]
    [InlineData("Input a\nedge a b\n", 1, 1, "'Input'")]
    [InlineData("edge a b\nedges b c\n", 2, 1, "'edges'")]
    [InlineData("# only a comment\n\n\t\tweight a b 2\n", 3, 3, "'weight'")]
    [InlineData("edge a b\n1 2 3\n", 2, 1, "'1'")]
    public void UnknownKeyword(string text, int line, int column, string quoted)
    {
        var e = Refuse(text, line, column);
        Assert.Contains("unknown keyword", e.Problem);
        Assert.Contains(quoted, e.Problem);
        Assert.Contains("input, output, node, edge, at or measure", e.Problem); // says what would be accepted
    }

    [Theory]
    [InlineData("edge a 1b\n", 1, 8, "1b")]
    [InlineData("edge -a b\n", 1, 6, "-a")]
    [InlineData("node ok a$b\n", 1, 9, "a$b")]
    [InlineData("node a\tb c!\n", 1, 10, "c!")]
    [InlineData("edge a b\ninput a .b\n", 2, 9, ".b")]
    [InlineData("edge a b\noutput b\u00e9\n", 2, 8, "b\u00e9")]        // ASCII only
    [InlineData("edge a b\nat 9a 1 2\n", 2, 4, "9a")]
    [InlineData("edge x y\nedge y \"z\"\n", 2, 8, "\"z\"")]
    public void BadName(string text, int line, int column, string name)
    {
        var e = Refuse(text, line, column);
        Assert.Contains($"bad node name '{name}'", e.Problem);
        Assert.Contains("starts with a letter or '_'", e.Problem);
    }

    [Theory]
    [InlineData("edge a b 1e3\n", 10, "1e3")]
    [InlineData("edge a b 1/0\n", 10, "1/0")]
    [InlineData("edge a b .5\n", 10, ".5")]
    [InlineData("edge a b 1.\n", 10, "1.")]
    [InlineData("edge a b +1\n", 10, "+1")]
    [InlineData("edge a b one\n", 10, "one")]
    [InlineData("edge  a  b  1//2\n", 13, "1//2")]
    public void BadWeight(string text, int column, string weight)
    {
        var e = Refuse(text, 1, column);
        Assert.Contains($"bad weight '{weight}'", e.Problem);
        Assert.Contains("a/b", e.Problem);
    }

    [Theory]
    [InlineData("0")]
    [InlineData("0/3")]
    [InlineData("0.0")]
    [InlineData("-0")]
    [InlineData("-0.000")]
    public void ZeroWeight(string weight)
    {
        var e = Refuse($"input a\n\nedge a b {weight}   # vanishing coupling\n", 3, 10);
        Assert.Contains("weight of edge a b is zero", e.Problem);
    }

    [Theory]
    [InlineData("edge a\n", 1, 1, "'edge' takes two node names")]
    [InlineData("edge\n", 1, 1, "'edge' takes two node names")]
    [InlineData("edge a b 1 2\n", 1, 12, "'edge' takes two node names")]
    [InlineData("\t edge a\n", 1, 3, "'edge' takes two node names")]
    [InlineData("edge a b\nnode\n", 2, 1, "'node' needs at least one node name")]
    [InlineData("edge a b\nat a 1\n", 2, 1, "'at' takes a node name and two coordinates")]
    [InlineData("edge a b\nat a 1 2 3\n", 2, 10, "'at' takes a node name and two coordinates")]
    public void WrongTokenCount(string text, int line, int column, string problem)
        => Assert.Contains(problem, Refuse(text, line, column).Problem);

    [Fact]
    public void SelfLoop()
    {
        var e = Refuse("input a\nedge a b\nedge  b b 2\n", 3, 9);
        Assert.Contains("self-loop on node b", e.Problem);
    }

    [Theory]
    [InlineData("edge a b\n\nedge b a 2\n", 3, 6)]      // reversed orientation
    [InlineData("edge a b\nedge a b\n", 2, 6)]          // same orientation
    [InlineData("edge p q -1/2\n# the same coupling again, written differently\nnode r\n  edge q p -0.5\n", 4, 8)]
    public void SameEdgeTwiceGivesBothLineNumbers(string text, int line, int column)
    {
        var e = Refuse(text, line, column);
        Assert.Contains("appears twice", e.Problem);
        var first = text.Split('\n').Select((l, i) => (l, i)).First(x => x.l.TrimStart().StartsWith("edge")).i + 1;
        Assert.Contains($"lines {first} and {line}", e.Problem);
    }

    // Repeats are found after reading (by sorting the edges), but the error is the one a line-by-line reader
    // gives: the repeat whose second occurrence comes first, with the line of its first occurrence.
    [Theory]
    [InlineData("edge a b\nedge c d\nedge c d\nedge b a\n", 3, 6, "edge c d appears twice (lines 2 and 3)")]
    [InlineData("edge a b\nedge c d\nedge d c\nedge a b\nedge a b\n", 3, 6, "edge d c appears twice (lines 2 and 3)")]
    [InlineData("edge x y\nedge a b\nedge y x 3\nedge b a\nedge a b\n", 3, 6, "edge y x appears twice (lines 1 and 3)")]
    [InlineData("edge a b\nedge a b\nedge a b\n", 2, 6, "edge a b appears twice (lines 1 and 2)")]
    public void OfSeveralRepeatedEdgesTheFirstRepeatInTheFileIsNamed(string text, int line, int column, string problem)
        => Assert.Equal(problem, Refuse(text, line, column).Problem);

    [Theory]
    [InlineData("input x\nedge a b\n", 1, 7, "x", "input")]
    [InlineData("edge a b\noutput b  y\n", 2, 11, "y", "output")]
    [InlineData("edge a b\nat z 1 2\n", 2, 4, "z", "at")]
    [InlineData("output y\ninput x\nedge a b\n", 1, 8, "y", "output")]   // the first unknown reference in the file
    public void UnknownNodeInInputOutputOrAt(string text, int line, int column, string node, string keyword)
    {
        var e = Refuse(text, line, column);
        Assert.Contains($"unknown node {node} in '{keyword}'", e.Problem);
        Assert.Contains("declare it with an 'edge' or 'node' line", e.Problem);
    }

    [Theory]
    [InlineData("input a\nedge a b\ninput b a\n", 3, 9, "a", "input", 1)]
    [InlineData("output b\nedge a b\n\noutput   b\n", 4, 10, "b", "output", 1)]
    [InlineData("edge a b\noutput a b\noutput b\n", 3, 8, "b", "output", 2)]
    public void NodeListedTwiceAsInputOrOutputGivesBothLineNumbers(string text, int line, int column, string node, string keyword, int firstLine)
    {
        var e = Refuse(text, line, column);
        Assert.Contains($"node {node} is listed twice as {keyword} (lines {firstLine} and {line})", e.Problem);
    }

    [Theory]
    [InlineData("edge a b\nplane a XY\n", 2, 1)]
    [InlineData("edge a b\n   plane\n", 2, 4)]
    public void PlaneIsReserved(string text, int line, int column)
        => Assert.Contains("'plane' is reserved for a later version", Refuse(text, line, column).Problem);

    [Theory]
    [InlineData("edge a b\nat a 1e3 2\n", 6, "1e3")]
    [InlineData("edge a b\nat a 1 .5\n", 8, ".5")]
    [InlineData("edge a b\nat a 1 2/3\n", 8, "2/3")]
    public void BadCoordinate(string text, int column, string coordinate)
        => Assert.Contains($"bad coordinate '{coordinate}'", Refuse(text, 2, column).Problem);

    [Fact]
    public void LinesAreCountedTheSameWithCrlfLineEnds()
    {
        var e = Refuse("input a\r\nedge a b\r\n\r\nedge a\tb\t0\r\n", 4, 10);
        Assert.Contains("is zero", e.Problem);
    }

    [Fact]
    public void ReadFileNamesThePathGiven()
    {
        var dir = Directory.CreateTempSubdirectory("flowcert-graphs-");
        try
        {
            var path = Path.Combine(dir.FullName, "bad.ograph");
            System.IO.File.WriteAllText(path, "edge a b\nedge b c 0/7\n");
            var e = Assert.Throws<GraphFormatException>(() => OgraphReader.ReadFile(path));
            Assert.Equal(path, e.File);
            Assert.StartsWith($"{path}:2:10: ", e.Message);
        }
        finally { dir.Delete(true); }
    }

    [Theory]
    [InlineData("1234567890")]
    [InlineData("1.1234567890")]
    public void ACoordinateWithMoreThanNineDigitsOnASideIsRefusedWithItsColumn(string coordinate)
    {
        var e = Assert.Throws<FlowCert.Graphs.GraphFormatException>(() => FlowCert.Graphs.OgraphReader.Parse($"edge a b\nat a 0 {coordinate}\n", "hint.ograph"));
        Assert.Equal((2, 8), (e.Line, e.Column));
        Assert.Contains("at most 9 digits", e.Message);
    }

    [Theory]
    [InlineData("a\n")]
    [InlineData("a\r")]
    [InlineData("")]
    public void ANameWithALineBreakOrNothingIsNotAValidName(string name)
        // .NET's '$' also matches before a final newline; names must end at the end of the text.
        => Assert.False(FlowCert.Graphs.OgraphReader.IsValidName(name));
}
