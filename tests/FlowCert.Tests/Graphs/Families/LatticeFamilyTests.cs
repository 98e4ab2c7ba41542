using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Graphs.Families;
using FlowCert.Graphs.Formats;

namespace FlowCert.Tests.Graphs.Families;

/// <summary>
/// Node and edge counts of every lattice against closed formulas, the promised inputs, outputs and
/// positions, and flows on the lattices used for measurement-based computation.
/// </summary>
public class LatticeFamilyTests
{
    internal static OpenGraph Make(string family, string size, bool periodic = false, WeightRule? weights = null, ulong seed = 0)
        => FamilyGenerator.Generate(new FamilyRequest { Family = family, Size = size, Periodic = periodic, Weights = weights ?? WeightRule.Unit, Seed = seed });

    private static string[] Names(OpenGraph g, IEnumerable<int> nodes) => nodes.Select(v => g.Names[v]).Order(StringComparer.Ordinal).ToArray();

    private static string[] Column(int rows, int col) => Enumerable.Range(0, rows).Select(i => $"r{i}c{col}").Order(StringComparer.Ordinal).ToArray();

    // Common practice: a path of n nodes has n - 1 edges, a cycle n.
    [Theory]
    [InlineData(1, false, 0)]
    [InlineData(2, false, 1)]
    [InlineData(9, false, 8)]
    [InlineData(3, true, 3)]
    [InlineData(10, true, 10)]
    public void LineHasNMinusOneEdgesAndARingHasN(int n, bool periodic, int edges)
    {
        var g = Make("line", $"{n}", periodic);
        Assert.Equal(n, g.NodeCount);
        Assert.Equal(edges, g.Edges.Count);
        Assert.Equal(["c0"], Names(g, g.Inputs));
        Assert.Equal([$"c{n - 1}"], Names(g, g.Outputs));
    }

    // Common practice: an R x C grid has R(C-1) horizontal and C(R-1) vertical edges; wrapping the rows
    // into a cylinder adds C more vertical edges.
    [Theory]
    [InlineData(1, 1)]
    [InlineData(1, 7)]
    [InlineData(4, 5)]
    [InlineData(7, 3)]
    [InlineData(20, 20)]
    public void SquareLatticeCountsInputsAndOutputs(int r, int c)
    {
        var g = Make("square", $"{r}x{c}");
        Assert.Equal(r * c, g.NodeCount);
        Assert.Equal(r * (c - 1) + c * (r - 1), g.Edges.Count);
        Assert.Equal(Column(r, 0), Names(g, g.Inputs));
        Assert.Equal(Column(r, c - 1), Names(g, g.Outputs));
        Assert.Equal(r * c, g.Positions.Count);
        Assert.Equal(new PositionHint(c - 1, r - 1), g.Positions[g.IndexOf($"r{r - 1}c{c - 1}")]);
        if (r >= 3) Assert.Equal(r * (c - 1) + c * r, Make("square", $"{r}x{c}", periodic: true).Edges.Count);
    }

    // Common practice: in a honeycomb drawn as a brick wall, every row is a path (R(C-1) edges) and rows
    // i, i+1 meet at the columns j with i + j even: ceil(C/2) columns for even i, floor(C/2) for odd i.
    // With an even number of rows, wrapping adds the missing half: R(C-1) + RC/2 in all.
    [Theory]
    [InlineData(1, 5)]
    [InlineData(2, 2)]
    [InlineData(3, 4)]
    [InlineData(4, 7)]
    [InlineData(5, 5)]
    [InlineData(6, 8)]
    public void HexagonalLatticeCountsAndDegrees(int r, int c)
    {
        var g = Make("hexagonal", $"{r}x{c}");
        int evenPairs = r / 2, oddPairs = (r - 1) / 2; // row pairs (i, i+1) with i even / odd
        Assert.Equal(r * c, g.NodeCount);
        Assert.Equal(r * (c - 1) + evenPairs * ((c + 1) / 2) + oddPairs * (c / 2), g.Edges.Count);
        Assert.True(Degrees(g).All(d => d <= 3), "a honeycomb node has at most three neighbours");
        Assert.Equal(Column(r, 0), Names(g, g.Inputs));
        Assert.Equal(Column(r, c - 1), Names(g, g.Outputs));
        if (r % 2 == 0)
        {
            var cylinder = Make("hexagonal", $"{r}x{c}", periodic: true);
            Assert.Equal(r * (c - 1) + r * c / 2, cylinder.Edges.Count);
            var degree = Degrees(cylinder);
            for (int v = 0; v < cylinder.NodeCount; v++)
            {
                int col = int.Parse(cylinder.Names[v][(cylinder.Names[v].IndexOf('c') + 1)..]);
                if (col > 0 && col < c - 1) Assert.Equal(3, degree[v]); // two row neighbours and one across
            }
        }
    }

    // Common practice: a triangular lattice of R rows of C nodes has R(C-1) row edges and 2C-1 edges
    // between consecutive rows; wrapping an even number of rows adds one more row pair.
    [Theory]
    [InlineData(1, 4)]
    [InlineData(2, 2)]
    [InlineData(3, 5)]
    [InlineData(4, 4)]
    [InlineData(6, 3)]
    public void TriangularLatticeCountsAndDegrees(int r, int c)
    {
        var g = Make("triangular", $"{r}x{c}");
        Assert.Equal(r * c, g.NodeCount);
        Assert.Equal(r * (c - 1) + c * (r - 1) + (r - 1) * (c - 1), g.Edges.Count);
        Assert.True(Degrees(g).All(d => d <= 6), "a triangular-lattice node has at most six neighbours");
        if (r >= 3 && c >= 3) Assert.Equal(6, Degrees(g).Max());
        if (r % 2 == 0 && r >= 4)
        {
            var cylinder = Make("triangular", $"{r}x{c}", periodic: true);
            Assert.Equal(r * (c - 1) + r * c + r * (c - 1), cylinder.Edges.Count);
        }
    }

    // The brickwork state of "Universal blind quantum computation" (arXiv:0807.4154, section on the
    // brickwork state): n rows, m = 8t + 5 columns; each row is a path, and vertical edges sit in 2t + 2
    // columns between the floor(n/2) pairs of rows starting at an odd (1-based) row and in 2t columns
    // between the floor((n-1)/2) pairs starting at an even one.
    [Theory]
    [InlineData(2, 0)]
    [InlineData(3, 1)]
    [InlineData(4, 1)]
    [InlineData(5, 2)]
    [InlineData(20, 2)]
    public void BrickworkCountsMatchTheBlindComputationPaper(int n, int t)
    {
        int m = 8 * t + 5;
        var g = Make("brickwork", $"{n}x{m}");
        Assert.Equal(n * m, g.NodeCount);
        Assert.Equal(n * (m - 1) + (2 * t + 2) * (n / 2) + 2 * t * ((n - 1) / 2), g.Edges.Count);
        Assert.Equal(Column(n, 0), Names(g, g.Inputs));
        Assert.Equal(Column(n, m - 1), Names(g, g.Outputs));
        Assert.True(Degrees(g).All(d => d <= 3), "a brickwork node has at most three neighbours");
        // In 1-based terms the first brick joins rows 1 and 2 at columns 3 and 5.
        Assert.Contains(g.Edges, e => (g.Names[e.U], g.Names[e.V]) == ("r0c2", "r1c2"));
        Assert.Contains(g.Edges, e => (g.Names[e.U], g.Names[e.V]) == ("r0c4", "r1c4"));
        Assert.DoesNotContain(g.Edges, e => (g.Names[e.U], g.Names[e.V]) == ("r0c3", "r1c3"));
    }

    // Common practice: an X x Y x Z grid has (X-1)YZ + X(Y-1)Z + XY(Z-1) edges; wrapping y and z gives
    // (X-1)YZ + 2XYZ.
    [Theory]
    [InlineData(1, 1, 1)]
    [InlineData(2, 3, 4)]
    [InlineData(4, 3, 3)]
    [InlineData(5, 1, 2)]
    public void CubicLatticeCountsAndFaces(int x, int y, int z)
    {
        var g = Make("cubic", $"{x}x{y}x{z}");
        Assert.Equal(x * y * z, g.NodeCount);
        Assert.Equal((x - 1) * y * z + x * (y - 1) * z + x * y * (z - 1), g.Edges.Count);
        Assert.Equal(y * z, g.Inputs.Count);
        Assert.All(g.Inputs, v => Assert.StartsWith("x0y", g.Names[v]));
        Assert.All(g.Outputs, v => Assert.StartsWith($"x{x - 1}y", g.Names[v]));
        Assert.Equal(y * z, g.Outputs.Count);
        if (y >= 3 && z >= 3) Assert.Equal((x - 1) * y * z + 2 * x * y * z, Make("cubic", $"{x}x{y}x{z}", periodic: true).Edges.Count);
    }

    /// <summary>
    /// The lattices of measurement-based computation carry a causal flow from the first column to the
    /// last ("Determinism in the one-way model", arXiv:quant-ph/0506062: f(v) = the next node of its
    /// row, rounds by column; common practice for these lattices). The solver must find one, of depth at
    /// most the number of columns minus one (that column schedule is one of them).
    /// </summary>
    [Theory]
    [InlineData("square", "5x6", 5)]
    [InlineData("square", "1x9", 8)]
    [InlineData("hexagonal", "6x7", 6)]
    [InlineData("brickwork", "6x13", 12)]
    [InlineData("brickwork", "5x21", 20)]
    [InlineData("cubic", "5x3x3", 4)]
    public void StandardLatticesHaveACausalFlowFromFirstToLastColumn(string family, string size, int columnsMinusOne)
    {
        var g = Make(family, size, weights: WeightRule.ParseChoice("1,2,-1/3"), seed: 11);
        foreach (var field in new[] { FieldSpec.Rationals, FieldSpec.PrimeField(5) })
        {
            var causal = FlowSolver.Solve(g, field, FlowKind.Causal);
            Assert.True(causal.HasFlow, $"{family} {size} over {field.Name} has a causal flow");
            Assert.InRange(causal.Depth, 1, columnsMinusOne);
            var general = FlowSolver.Solve(g, field, FlowKind.General);
            Assert.True(general.HasFlow);
            Assert.True(general.Depth <= causal.Depth, "a causal flow is a generalized flow, so the minimum depth can only drop");
        }
    }

    [Fact]
    public void PerDirectionWeightsLandOnTheirDirections()
    {
        var g = Make("square", "3x3", weights: WeightRule.ParsePerDirection("h=2, v=-1/2"));
        foreach (var e in g.Edges)
        {
            bool sameRow = g.Names[e.U][..2] == g.Names[e.V][..2];
            Assert.Equal(sameRow ? Rational.Create(2, 1) : Rational.Create(-1, 2), e.Weight);
        }
        var hex = Make("hexagonal", "2x4", weights: WeightRule.ParsePerDirection("v=3"));
        Assert.Equal(2, hex.Edges.Count(e => e.Weight == Rational.Create(3, 1))); // columns 0 and 2 join rows 0 and 1
        var e1 = Assert.Throws<FamilyParameterException>(() => Make("square", "2x2", weights: WeightRule.ParsePerDirection("x=2")));
        Assert.Contains("h, v", e1.Message);
    }

    [Fact]
    public void RandomWeightsAreDrawnFromTheListAndFollowTheSeed()
    {
        var list = WeightRule.ParseChoice("1,-1,1/2,7");
        var a = OgraphWriter.Write(Make("triangular", "6x6", weights: list, seed: 42));
        var b = OgraphWriter.Write(Make("triangular", "6x6", weights: list, seed: 42));
        var c = OgraphWriter.Write(Make("triangular", "6x6", weights: list, seed: 43));
        Assert.Equal(a, b);
        Assert.NotEqual(a, c);
        var g = Make("triangular", "6x6", weights: list, seed: 42);
        Assert.All(g.Edges, e => Assert.Contains(e.Weight, list.Values));
        Assert.Equal(4, g.Edges.Select(e => e.Weight).Distinct().Count()); // 85 draws from 4 values miss none (seeded)
    }

    [Fact]
    public void WrittenFileIsTheCanonicalFormFollowedByOneAtLinePerNode()
    {
        var g = Make("hexagonal", "2x3");
        var text = OgraphWriter.Write(g);
        var canonical = CanonicalForm.Write(g);
        Assert.StartsWith(canonical, text);
        var atLines = text[canonical.Length..].Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(g.NodeCount, atLines.Length);
        Assert.Equal("at r0c0 0 0.5", atLines[0]);
        Assert.Equal("at r0c1 0.866 0", atLines[1]);
        var back = OgraphReader.Parse(text, "hex.ograph");
        Assert.Equal(canonical, CanonicalForm.Write(back));
        Assert.Equal(text, OgraphWriter.Write(back));
    }

    [Theory]
    [InlineData("square", "3", "RxC")]
    [InlineData("square", "0x4", "at least 1")]
    [InlineData("cubic", "2x2", "XxYxZ")]
    [InlineData("pentagonal", "2x2", "unknown family")]
    [InlineData("square", "2000x2001", "more than")]
    public void BadSizesAreRefusedWithTheReason(string family, string size, string expected)
    {
        var e = Assert.Throws<FamilyParameterException>(() => Make(family, size));
        Assert.Contains(expected, e.Message);
    }

    [Theory]
    [InlineData("square", "2x5", "3 rows")]
    [InlineData("hexagonal", "3x4", "even number of rows")]
    [InlineData("triangular", "2x4", "at least 4")]
    [InlineData("cubic", "3x2x3", "at least 3")]
    [InlineData("brickwork", "4x5", "takes no periodic")]
    [InlineData("line", "2", "at least 3")]
    public void PeriodicNeedsEnoughRoomToWrapWithoutRepeatingAnEdge(string family, string size, string expected)
    {
        var e = Assert.Throws<FamilyParameterException>(() => Make(family, size, periodic: true));
        Assert.Contains(expected, e.Message);
    }

    internal static int[] Degrees(OpenGraph g)
    {
        var d = new int[g.NodeCount];
        foreach (var e in g.Edges) { d[e.U]++; d[e.V]++; }
        return d;
    }
}
