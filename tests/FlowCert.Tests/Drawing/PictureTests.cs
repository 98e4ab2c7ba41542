using System.Globalization;
using System.Xml.Linq;
using FlowCert.Algebra;
using FlowCert.Demo;
using FlowCert.Drawing;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Tests.Graphs.Families;

namespace FlowCert.Tests.Drawing;

/// <summary>
/// Pictures: well-formed SVG ("Scalable Vector Graphics (SVG) 1.1", an XML language) that librsvg renders
/// into a picture holding the colours of its visual language, columns that follow the rounds, labels
/// only on small graphs, the same bytes every time, and DOT that Graphviz accepts.
/// </summary>
public class PictureTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private static FlowResult Solve(string design, FieldSpec field, FlowKind kind = FlowKind.General)
        => FlowSolver.Solve(DemoScenario.Designs().Single(d => d.Name == design).Graph, field, kind);

    private static string Draw(OpenGraph g, FlowResult? r, string name = "picture")
        => SvgPicture.Write(PictureLayout.Arrange(g, r, FlowPicture.TitleFor(name, r)));

    /// <summary>Renders SVG text to PNG with rsvg-convert (Debian librsvg2-bin) and decodes it.</summary>
    internal static PngImage Render(string svg)
    {
        var dir = Directory.CreateTempSubdirectory("flowcert-draw-").FullName;
        try
        {
            var input = Path.Combine(dir, "p.svg");
            var output = Path.Combine(dir, "p.png");
            File.WriteAllText(input, svg);
            var outcome = ExternalProgram.Run("rsvg-convert", "librsvg2-bin", [input, "-o", output]);
            Assert.True(outcome.ExitCode == 0, $"rsvg-convert failed: {outcome.Stderr}");
            return PngImage.Read(File.ReadAllBytes(output));
        }
        finally { Directory.Delete(dir, recursive: true); }
    }

    private static uint Rgb(string hex) => uint.Parse(hex[1..], NumberStyles.HexNumber) << 8 | 0xff;

    [ToolFact("rsvg-convert")]
    public void AFlowPictureRendersWithItsColoursAndTheSizeItDeclares()
    {
        var svg = Draw(Solve("qutrit-patch", FieldSpec.PrimeField(5)).Graph, Solve("qutrit-patch", FieldSpec.PrimeField(5)));
        var root = XDocument.Parse(svg).Root!;
        Assert.Equal(Svg + "svg", root.Name);
        var png = Render(svg);
        Assert.Equal(((int)double.Parse((string)root.Attribute("width")!, CultureInfo.InvariantCulture), (int)double.Parse((string)root.Attribute("height")!, CultureInfo.InvariantCulture)), (png.Width, png.Height));
        var colours = png.Pixels.ToHashSet();
        Assert.True(colours.Count > 50, $"a picture with anti-aliased shapes and text has many colours, found {colours.Count}");
        Assert.Contains(Rgb("#ffffff"), colours);
        Assert.Contains(Rgb(SvgPicture.CorrectionColour), colours);   // arrow heads are filled solid
        Assert.Contains(Rgb(SvgPicture.MeasuredFill), colours);
        Assert.Contains(Rgb(SvgPicture.OutputFill), colours);
        Assert.DoesNotContain(Rgb(SvgPicture.BlockedFill), colours);
    }

    [Fact]
    public void EdgesThatVanishInTheCertificatesFieldAreNotedInTheLegend()
    {
        // The patch's rung r0c2-r1c2 has weight 3: 0 in F3, not in F5 (flows.md section 1: never silently).
        const string Note = "1 edge has weight 0 in F3 and vanishes: r0c2-r1c2 (3)";
        var f3 = Solve("qutrit-patch", FieldSpec.PrimeField(3));
        var legend = XDocument.Parse(Draw(f3.Graph, f3)).Descendants(Svg + "g").Single(g => (string?)g.Attribute("id") == "legend");
        Assert.Contains(legend.Descendants(Svg + "text"), t => t.Value == Note);
        Assert.Contains(Note, DotPicture.Write(f3.Graph, f3, "patch"));
        var f5 = Solve("qutrit-patch", FieldSpec.PrimeField(5));
        Assert.DoesNotContain("vanish", Draw(f5.Graph, f5));
        Assert.DoesNotContain("vanish", DotPicture.Write(f5.Graph, f5, "patch"));
    }

    [ToolFact("rsvg-convert")]
    public void AProofOfAbsenceShowsTheBlockedSetAndNoCorrections()
    {
        var r = Solve("merge-attempt", FieldSpec.Rationals);
        Assert.False(r.HasFlow);
        var svg = Draw(r.Graph, r);
        var doc = XDocument.Parse(svg);
        Assert.Null(doc.Descendants(Svg + "g").FirstOrDefault(g => (string?)g.Attribute("id") == "corrections"));
        var blockedCircles = doc.Descendants(Svg + "circle").Count(c => (string?)c.Attribute("fill") == SvgPicture.BlockedFill);
        Assert.Equal(r.Obstruction!.Nodes.Count + 1, blockedCircles); // one per blocked node, one in the legend
        var colours = Render(svg).Pixels.ToHashSet();
        Assert.Contains(Rgb(SvgPicture.BlockedFill), colours);
        Assert.DoesNotContain(Rgb(SvgPicture.CorrectionColour), colours);
        Assert.Contains("blocked set (2 nodes)", svg);
    }

    /// <summary>
    /// A correction only touches nodes later than the one it corrects (flows.md, section 3), and rounds are
    /// columns from left to right: so every correction arrow must point to the right.
    /// </summary>
    [Fact]
    public void RoundsAreColumnsAndCorrectionsPointToLaterColumns()
    {
        var g = LatticeFamilyTests.Make("hexagonal", "4x6", weights: FlowCert.Graphs.Families.WeightRule.ParseChoice("1,2,3"), seed: 4);
        var r = FlowSolver.Solve(g, FieldSpec.PrimeField(7), FlowKind.General);
        Assert.True(r.HasFlow);
        var p = PictureLayout.Arrange(g, r, "hex");
        for (int k = 0; k < r.Depth; k++)
            Assert.All(r.Rounds[k], v => Assert.Equal(p.ColumnTitles[k].X, p.X[v]));
        Assert.All(g.Outputs, v => Assert.Equal(p.ColumnTitles[^1].X, p.X[v]));
        Assert.Equal("outputs", p.ColumnTitles[^1].Text);
        foreach (var (v, c) in r.Corrections)
            Assert.All(c.Entries, e => Assert.True(p.X[e.Node] > p.X[v], $"correction of {g.Names[v]} reaches {g.Names[e.Node]} to its left"));
    }

    [Fact]
    public void WithoutACertificateHintsOrDistanceFromTheInputsPlaceTheNodes()
    {
        var lattice = LatticeFamilyTests.Make("square", "3x4");
        var hinted = PictureLayout.Arrange(lattice, null, "square");
        Assert.Equal(PictureArrangement.PositionHints, hinted.Arrangement);
        int a = lattice.IndexOf("r0c0"), b = lattice.IndexOf("r2c3");
        Assert.Equal((3 * PictureLayout.HintUnit, 2 * PictureLayout.HintUnit),
            ((hinted.X[b] - hinted.X[a]) / PictureLayout.RoomyScale, (hinted.Y[b] - hinted.Y[a]) / PictureLayout.RoomyScale));
        var wire = new OpenGraph(["a", "b", "c", "lone"], [("a", "b", 1), ("b", "c", 1)], ["a"], ["c"]);
        var layered = PictureLayout.Arrange(wire, null, "wire");
        Assert.Equal(PictureArrangement.DistanceFromInputs, layered.Arrangement);
        var column = (int v) => layered.ColumnTitles.ToList().FindIndex(t => t.X == layered.X[v]);
        Assert.Equal([0, 1, 2, 3], new[] { "a", "b", "c", "lone" }.Select(n => column(wire.IndexOf(n))));
    }

    [Fact]
    public void LargeGraphsAreDrawnWithoutLabelsAndTheLegendSaysSo()
    {
        var g = LatticeFamilyTests.Make("square", "8x8", weights: new FlowCert.Graphs.Families.WeightRule.Constant(2));
        var doc = XDocument.Parse(Draw(g, FlowSolver.Solve(g, FieldSpec.Rationals, FlowKind.General)));
        Assert.DoesNotContain(doc.Descendants(Svg + "g"), e => (string?)e.Attribute("id") is "names" or "weights" or "coefficients");
        Assert.Contains(doc.Descendants(Svg + "text"), t => t.Value.Contains($"not shown above {FlowPicture.MaxLabelledNodes} nodes (64 here)"));
        var small = XDocument.Parse(Draw(LatticeFamilyTests.Make("square", "2x3"), null));
        Assert.Equal(6, small.Descendants(Svg + "g").Single(e => (string?)e.Attribute("id") == "names").Elements().Count());
    }

    [Fact]
    public void TheSameInputGivesTheSameBytesWithFixedDecimals()
    {
        var r = Solve("splitter-pair", FieldSpec.Rationals);
        var first = Draw(r.Graph, r);
        Assert.Equal(first, Draw(r.Graph, r));
        foreach (var number in System.Text.RegularExpressions.Regex.Matches(first, "(?<=\\s(x|y|cx|cy|x1|y1|x2|y2)=\")[^\"]+").Select(m => m.Value))
            Assert.Matches(@"^-?\d+\.\d$", number);
    }

    [ToolFact("dot")]
    public void GraphvizAcceptsTheDotPictures()
    {
        foreach (var r in new[] { Solve("qutrit-patch", FieldSpec.PrimeField(5)), Solve("merge-attempt", FieldSpec.Rationals), Solve("splitter-pair", FieldSpec.PrimeField(2), FlowKind.Causal) })
        {
            var svg = Graphviz.ToSvg(DotPicture.Write(r.Graph, r, FlowPicture.TitleFor("demo", r)));
            XDocument.Parse(svg);
            Assert.Contains(r.HasFlow ? SvgPicture.CorrectionColour : SvgPicture.BlockedFill, svg);
        }
    }
}
