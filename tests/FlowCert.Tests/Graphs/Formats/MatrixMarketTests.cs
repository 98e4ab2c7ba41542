using FlowCert.Algebra;
using FlowCert.Graphs;
using FlowCert.Graphs.Families;
using FlowCert.Graphs.Formats;
using FlowCert.Tests.Graphs.Families;

namespace FlowCert.Tests.Graphs.Formats;

/// <summary>Matrix Market coordinate files against "The Matrix Market Exchange Formats: Initial Design" (NISTIR 5935).</summary>
public class MatrixMarketTests
{
    /// <summary>The coordinate example of NISTIR 5935 (section on the coordinate format): a 5 x 5 real general matrix with 8 entries.</summary>
    private const string NistirExample =
        "%%MatrixMarket matrix coordinate real general\n" +
        "%=================================================================================\n" +
        "%\n" +
        "% This ASCII file represents a sparse MxN matrix with L \n" +
        "% nonzeros in the following Matrix Market format:\n" +
        "%\n" +
        "%=================================================================================\n" +
        "  5  5  8\n" +
        "    1     1   1.000e+00\n" +
        "    2     2   1.050e+01\n" +
        "    3     3   1.500e-02\n" +
        "    1     4   6.000e+00\n" +
        "    4     2   2.505e+02\n" +
        "    4     4  -2.800e+02\n" +
        "    4     5   3.332e+01\n" +
        "    5     5   1.200e+01\n";

    [Fact]
    public void TheNistirCoordinateExampleIsReadExactly()
    {
        var m = MatrixMarketReader.ParseMatrix(NistirExample, "nistir.mtx");
        Assert.Equal((5L, 5L, MatrixMarketField.Real, false), (m.Rows, m.Columns, m.Field, m.Symmetric));
        Rational Q(long a, long b = 1) => Rational.Create(a, b);
        // The dense matrix printed beside the example: 1, 10.5, .015, 6, 250.5, -280, 33.32, 12.
        Assert.Equal(
            [(1, 1, Q(1)), (2, 2, Q(21, 2)), (3, 3, Q(3, 200)), (1, 4, Q(6)), (4, 2, Q(501, 2)), (4, 4, Q(-280)), (4, 5, Q(833, 25)), (5, 5, Q(12))],
            m.Entries.Select(e => (e.Row, e.Column, e.Value)).ToList());
        Assert.Equal(9, m.Entries[0].Line);
        // As a graph it is refused: its diagonal is not zero (and it is not symmetric).
        var e = Assert.Throws<GraphFormatException>(() => MatrixMarketReader.ToGraph(m, "nistir.mtx"));
        Assert.Equal((9, 15), (e.Line, e.Column));
        Assert.Contains("self-loops", e.Problem);
    }

    [Fact]
    public void TheNistirExampleWithoutItsDiagonalIsRefusedAsNotSymmetric()
    {
        var offDiagonal = string.Join('\n', NistirExample.Split('\n').Where(l => !System.Text.RegularExpressions.Regex.IsMatch(l, @"^\s+(\d)\s+\1\s+\S*e"))).Replace("5  5  8", "5  5  3");
        var e = Assert.Throws<GraphFormatException>(() => MatrixMarketReader.Parse(offDiagonal, "nistir.mtx"));
        Assert.Equal(9, e.Line);
        Assert.Contains("no mirror entry (4,1)", e.Problem);
    }

    [Theory]
    [InlineData("%%MatrixMarket matrix coordinate pattern symmetric\n3 3 2\n2 1\n3 2\n", "1", "1")]
    [InlineData("%%MatrixMarket matrix coordinate integer symmetric\n% comment\n3 3 2\n2 1 -4\n3 2 +7\n", "-4", "7")]
    [InlineData("%%MatrixMarket matrix coordinate real symmetric\n3 3 2\n2 1 .25\n3 2 -1.5E1\n", "1/4", "-15")]
    [InlineData("%%MatrixMarket matrix coordinate real general\n3 3 4\n2 1 0.5\n1 2 5e-1\n3 2 2\n2 3 2.0\n", "1/2", "2")]
    [InlineData("%%MatrixMarket MATRIX Coordinate REAL Symmetric\n3 3 2\n1 2 1\n3 2 -1\n", "1", "-1")]
    public void SymmetricAndSymmetricGeneralFilesAreAdjacencyMatrices(string text, string w21, string w32)
    {
        var g = MatrixMarketReader.Parse(text, "a.mtx");
        Assert.Equal(["v1", "v2", "v3"], g.Names);
        Assert.Equal(2, g.Edges.Count);
        Assert.Equal(w21, g.Edges.Single(e => (g.Names[e.U], g.Names[e.V]) == ("v1", "v2")).Weight.ToString());
        Assert.Equal(w32, g.Edges.Single(e => (g.Names[e.U], g.Names[e.V]) == ("v2", "v3")).Weight.ToString());
    }

    [Theory]
    [InlineData("1,2,-1,7", "integer")]
    [InlineData("1", "pattern")]
    [InlineData("1/4,-3/8,5,0.2", "real")]
    public void WrittenFilesRoundTripWithTheNarrowestField(string weights, string field)
    {
        var g = LatticeFamilyTests.Make("square", "3x4", weights: WeightRule.ParseChoice(weights), seed: 2);
        var text = MatrixMarketWriter.Write(g);
        Assert.StartsWith($"%%MatrixMarket matrix coordinate {field} symmetric\n", text);
        var back = MatrixMarketReader.Parse(text, "lattice.mtx");
        Assert.Equal(g.NodeCount, back.NodeCount);
        // Rows are the nodes in natural order, so r0c0 is v1, r0c1 is v2, ... r2c3 is v12.
        var order = NaturalNameOrder.Sort(g);
        string Renamed(int v) => "v" + (Array.IndexOf(order, v) + 1);
        var expected = g.Edges.Select(e => (Renamed(e.U), Renamed(e.V), e.Weight)).Select(Normal).Order().ToList();
        Assert.Equal(expected, back.Edges.Select(e => (back.Names[e.U], back.Names[e.V], e.Weight)).Select(Normal).Order().ToList());
        Assert.Equal(text, MatrixMarketWriter.Write(back), new CommentBlindComparer());
        Assert.Equal(MatrixMarketWriter.Write(back), MatrixMarketWriter.Write(MatrixMarketReader.Parse(MatrixMarketWriter.Write(back), "again.mtx")));
    }

    private static (string, string, string) Normal((string U, string V, Rational W) e)
        => string.CompareOrdinal(e.U, e.V) < 0 ? (e.U, e.V, e.W.ToString()) : (e.V, e.U, e.W.ToString());

    /// <summary>Compares two Matrix Market texts without their comment lines (which carry the node names).</summary>
    private sealed class CommentBlindComparer : IEqualityComparer<string>
    {
        private static string Strip(string s) => string.Join('\n', s.Split('\n').Where(l => !l.StartsWith("% ")));
        public bool Equals(string? x, string? y) => Strip(x!) == Strip(y!);
        public int GetHashCode(string s) => Strip(s).GetHashCode();
    }

    [Fact]
    public void AWeightWithoutAFiniteDecimalIsRefused()
    {
        var g = LatticeFamilyTests.Make("line", "3", weights: new WeightRule.Constant(Rational.Create(1, 3)));
        var e = Assert.Throws<GraphFileException>(() => MatrixMarketWriter.Write(g));
        Assert.Contains("1/3", e.Message);
    }

    [Theory]
    [InlineData("2.505e+02", 501, 2)]
    [InlineData("-2.800e+02", -280, 1)]
    [InlineData(".015", 3, 200)]
    [InlineData("1.500e-02", 3, 200)]
    [InlineData("+3.", 3, 1)]
    [InlineData("7E0", 7, 1)]
    public void DecimalsAreReadExactly(string text, long num, long den)
    {
        Assert.True(ExactDecimal.TryParse(text, out var value));
        Assert.Equal(Rational.Create(num, den), value);
    }

    [Theory]
    [InlineData(".")]
    [InlineData("e5")]
    [InlineData("1e99999")]
    [InlineData("nan")]
    [InlineData("inf")]
    [InlineData("1.2.3")]
    [InlineData("0x10")]
    public void NonDecimalsAreRefused(string text) => Assert.False(ExactDecimal.TryParse(text, out _));

    [Theory]
    [InlineData("% no banner\n", 1, 1, "%%MatrixMarket")]
    [InlineData("%%MatrixMarket matrix array real general\n2 2\n1\n0\n0\n1\n", 1, 23, "array")]
    [InlineData("%%MatrixMarket matrix coordinate complex symmetric\n", 1, 34, "complex")]
    [InlineData("%%MatrixMarket matrix coordinate real hermitian\n", 1, 39, "hermitian")]
    [InlineData("%%MatrixMarket matrix coordinate real symmetric\n3 3 1\n4 1 2\n", 3, 1, "bad row '4'")]
    [InlineData("%%MatrixMarket matrix coordinate real symmetric\n3 3 1\n2 1 two\n", 3, 5, "bad real value 'two'")]
    [InlineData("%%MatrixMarket matrix coordinate integer symmetric\n3 3 1\n2 1 1.5\n", 3, 5, "bad integer value")]
    [InlineData("%%MatrixMarket matrix coordinate real symmetric\n3 3 1\n2 1 1e5000\n", 3, 5, "bad real value '1e5000': its exponent is beyond ±4000; values are read exactly")]
    [InlineData("%%MatrixMarket matrix coordinate real symmetric\n3 3 1\n2 1 -1E-99999999999999999999\n", 3, 5, "its exponent is beyond ±4000")]
    [InlineData("%%MatrixMarket matrix coordinate real symmetric\n3 3 2\n2 1 1\n", 4, 1, "1 of the 2 entries")]
    [InlineData("%%MatrixMarket matrix coordinate real symmetric\n3 3 1\n2 1 1\n3 1 1\n", 4, 1, "more entries")]
    [InlineData("%%MatrixMarket matrix coordinate real symmetric\n3 3 2\n2 1 1\n1 2 1\n", 4, 5, "repeats entry (2,1) of line 3")]
    [InlineData("%%MatrixMarket matrix coordinate real symmetric\n3 3 1\n2 1 0.0\n", 3, 5, "zero")]
    [InlineData("%%MatrixMarket matrix coordinate real general\n3 3 2\n2 1 1\n1 2 2\n", 4, 5, "differ")]
    [InlineData("%%MatrixMarket matrix coordinate pattern symmetric\n3 4 1\n2 1\n", 2, 1, "3 rows and 4 columns")]
    [InlineData("%%MatrixMarket matrix coordinate pattern symmetric\n3 3 1\n2 1 5\n", 3, 5, "I J")]
    public void MalformedFilesNameLineAndColumn(string text, int line, int column, string problem)
    {
        var e = Assert.Throws<GraphFormatException>(() => MatrixMarketReader.Parse(text, "bad.mtx"));
        Assert.Equal(("bad.mtx", line, column), (e.File, e.Line, e.Column));
        Assert.Contains(problem, e.Problem);
    }
}
