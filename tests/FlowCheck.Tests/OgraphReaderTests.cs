namespace FlowCheck.Tests;

/// <summary>The checker's own .ograph reader against the grammar of docs/formats.md.</summary>
public class OgraphReaderTests
{
    static OpenGraph Read(string text) => OgraphReader.Read(Support.Write(text, ".ograph"));

    static string Error(string text)
    {
        var path = Support.Write(text, ".ograph");
        var e = Assert.Throws<UnreadableInput>(() => OgraphReader.Read(path));
        Assert.StartsWith(path + ":", e.Message);
        return e.Message[(path.Length + 1)..];
    }

    [Fact]
    public void ReadsTheSpecExampleIntoCanonicalForm()
    {
        var g = Read("# a three-node wire\ninput  a\noutput c\nedge a b            # weight 1\nedge b c -1/2       # exact\nnode spare\n");
        Assert.Equal("input a\noutput c\nnode spare\nedge a b 1\nedge b c -1/2\n", g.Canonical());
    }

    [Fact]
    public void SortsOrdinallyAndReadsDecimalsExactly()
    {
        var g = Read("output z b\ninput _u\ninput B\nedge z b 0.25\nedge B _u -2.50\nedge a.1 a-2 -6/4\nedge b a 007\nat z -1 2.5\n\tnode  q\t\n");
        Assert.Equal("input B _u\noutput b z\nnode q\nedge B _u -5/2\nedge a b 7\nedge a-2 a.1 -3/2\nedge b z 1/4\n", g.Canonical());
    }

    [Fact]
    public void AcceptsCrLfAndEmptyRoleLines()
    {
        var g = Read("input\r\noutput\r\nnode x y\r\nnode x\r\n");
        Assert.Equal("input\noutput\nnode x\nnode y\n", g.Canonical());
    }

    [Theory]
    [InlineData("vertex a\n", "1:1: unknown keyword \"vertex\"")]
    [InlineData("Edge a b\n", "1:1: unknown keyword \"Edge\"")]
    [InlineData("edge a 1b\n", "1:8: bad name \"1b\"")]
    [InlineData("node a\ninput  a b$\n", "2:10: bad name \"b$\"")]
    [InlineData("edge a\n", "1:1: wrong number of tokens: edge U V [W]")]
    [InlineData("edge a b 1 2\n", "1:1: wrong number of tokens: edge U V [W]")]
    [InlineData("edge a a\n", "1:8: self-loop on a")]
    [InlineData("edge a b 0\n", "1:10: bad or zero weight \"0\"")]
    [InlineData("edge a b -0.00\n", "1:10: bad or zero weight \"-0.00\"")]
    [InlineData("edge a b 1/0\n", "1:10: bad or zero weight \"1/0\"")]
    [InlineData("edge a b .5\n", "1:10: bad or zero weight \".5\"")]
    [InlineData("edge a b 1e3\n", "1:10: bad or zero weight \"1e3\"")]
    [InlineData("edge a b +1\n", "1:10: bad or zero weight \"+1\"")]
    [InlineData("edge a b\nedge b a 2\n", "2:1: edge b a given twice (lines 1 and 2)")]
    [InlineData("edge a b\ninput a\ninput b a\n", "3:9: a listed twice as input (lines 2 and 3)")]
    [InlineData("edge a b\noutput b b\n", "2:10: b listed twice as output (lines 2 and 2)")]
    [InlineData("input a\n", "1:7: unknown node a")]
    [InlineData("edge a b\n\noutput  c\n", "3:9: unknown node c")]
    [InlineData("edge a b\nat c 0 0\n", "2:4: unknown node c")]
    [InlineData("edge a b\nat a 0\n", "2:1: wrong number of tokens: at NODE X Y")]
    [InlineData("edge a b\nat a 0 x\n", "2:8: bad coordinate \"x\"")]
    [InlineData("edge a b\nat a 1. 0\n", "2:6: bad coordinate \"1.\"")]
    [InlineData("edge a b\nat a 1234567890 0\n", "2:6: bad coordinate \"1234567890\"")]
    [InlineData("edge a b\nat a 0 0.1234567890\n", "2:8: bad coordinate \"0.1234567890\"")]
    [InlineData("edge a b\nplane a XY\n", "2:1: plane is reserved for a later version")]
    [InlineData("edge a b\t2 # ok\nedge\ta\tc\t1/2/3\n", "2:10: bad or zero weight \"1/2/3\"")]
    public void ErrorsNameLineAndColumn(string text, string message) => Assert.Equal(message, Error(text));

    [Fact]
    public void CoordinatesHaveAtMostNineDigitsEachSide()
    {
        var g = Read("edge a b\nat a -123456789.123456789 987654321\n");
        Assert.Equal("input\noutput\nedge a b 1\n", g.Canonical());
    }

    [Fact]
    public void InputAndOutputMayOverlap()
    {
        var g = Read("edge a b\ninput a\noutput a b\n");
        Assert.Equal("input a\noutput a b\nedge a b 1\n", g.Canonical());
    }
}
