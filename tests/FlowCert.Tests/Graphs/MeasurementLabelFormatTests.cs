using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using FlowCert.Tests.Cli;

namespace FlowCert.Tests.Graphs;

/// <summary>Measurement labels in the graph formats (docs/formats.md): `measure` lines, the canonical form,
/// JSON `labels`, `--labels` files, and the refusals of `solve` (exit 2, one sentence, nothing written).</summary>
public class MeasurementLabelFormatTests
{
    private const string Wire = "input i\noutput o\nedge i a\nedge a o\n";

    private static GraphFormatException Refuse(string text, int line, int column, string fragment)
    {
        var e = Assert.Throws<GraphFormatException>(() => OgraphReader.Parse(text, "w.ograph"));
        Assert.True(line == e.Line && column == e.Column, $"expected {line}:{column}, got {e.Line}:{e.Column} ({e.Problem})");
        Assert.Contains(fragment, e.Problem);
        return e;
    }

    [Fact]
    public void MeasureLineErrorsNameLineAndColumn()
    {
        Refuse(Wire + "measure o X\n", 5, 9, "node o is an output (line 2)");
        Refuse(Wire + "measure a XYZ\n", 5, 11, "unknown label 'XYZ': write XY, XZ, YZ, X, Y or Z");
        Refuse(Wire + "measure a xz\n", 5, 11, "unknown label 'xz'");
        Refuse(Wire + "measure a X\n\nmeasure a Y\n", 7, 9, "node a has two labels (lines 5 and 7)");
        Refuse(Wire + "measure q X\n", 5, 9, "unknown node q in 'measure'");
        Refuse(Wire + "measure a\n", 5, 1, "'measure' takes a node name and a label");
        Refuse(Wire + "measure a X Y\n", 5, 13, "'measure' takes a node name and a label");
        Refuse(Wire + "plane a XZ\n", 5, 1, "reserved");
    }

    [Fact]
    public void CanonicalFormGainsMeasureLinesOnlyForLabelsOtherThanXy()
    {
        var plain = OgraphReader.Parse(Wire, "w.ograph");
        var explicitXy = OgraphReader.Parse(Wire + "measure a XY\nmeasure i XY\n", "w.ograph");
        Assert.False(explicitXy.HasLabels);
        Assert.Equal(CanonicalForm.Write(plain), CanonicalForm.Write(explicitXy));
        Assert.Equal(CanonicalForm.Sha256(plain), CanonicalForm.Sha256(explicitXy));
        var labelled = OgraphReader.Parse("measure i Y\n" + Wire + "measure a XZ\n", "w.ograph");
        Assert.Equal("input i\noutput o\nedge a i 1\nedge a o 1\nmeasure a XZ\nmeasure i Y\n", CanonicalForm.Write(labelled));
        Assert.Equal(MeasurementLabel.XZ, labelled.Label(labelled.IndexOf("a")));
        Assert.Equal(MeasurementLabel.XY, labelled.Label(labelled.IndexOf("o")));
        // a label other than XY changes the canonical text, hence its hash
        Assert.NotEqual(CanonicalForm.Sha256(plain), CanonicalForm.Sha256(labelled));
    }

    [Fact]
    public void JsonGraphsCarryLabelsAndReadThemBack()
    {
        var g = OgraphReader.Parse(Wire + "measure a YZ\nmeasure i X\n", "w.ograph");
        var json = GraphJson.Write(g);
        Assert.Contains("  \"labels\": {\"a\": \"YZ\", \"i\": \"X\"}\n}", json);
        Assert.Equal(CanonicalForm.Write(g), CanonicalForm.Write(GraphJson.Parse(json, "g.json")));
        Assert.DoesNotContain("labels", GraphJson.Write(OgraphReader.Parse(Wire, "w.ograph")));
        var onOutput = json.Replace("\"a\": \"YZ\"", "\"o\": \"YZ\"");
        Assert.Contains("node o is an output", Assert.Throws<GraphFormatException>(() => GraphJson.Parse(onOutput, "g.json")).Problem);
        var unknown = json.Replace("\"YZ\"", "\"W\"");
        Assert.Contains("unknown label for node a", Assert.Throws<GraphFormatException>(() => GraphJson.Parse(unknown, "g.json")).Problem);
    }

    [Fact]
    public void LabelsFilesForGraph6AndTheirErrors()
    {
        using var w = new Workspace();
        // graph6 "Bw": the triangle v0 v1 v2 ("nauty and Traces User's Guide, formats.txt": N = 3, bits 111 for 01, 02, 12)
        var graph = w.Write("p.g6", "Bw\n");
        var labels = w.Write("p.labels", "# labels\nv1 X\n\nv0 XY   # the default\n");
        var run = Flowcert.InProcess("solve", graph, "--inputs", "v0", "--outputs", "v2", "--labels", labels, "--field", "2", "--flow", "pauli", "--out", w.PathOf("c.json"));
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("\"labels\": {\"v1\": \"X\"}", File.ReadAllText(w.PathOf("c.json")));
        foreach (var (text, fragment) in new[]
                 {
                     ("v1 Q\n", ":1:4: unknown label 'Q'"),
                     ("v9 X\n", ":1:1: unknown node 'v9'"),
                     ("v1 X\nv1 Y\n", ":2:1: node v1 has two labels (lines 1 and 2)"),
                     ("v2 X\n", ":1:1: node v2 is an output"),
                     ("v1 X Y\n", ":1:6: a line of a labels file is NODE LABEL"),
                 })
        {
            var bad = w.Write("bad.labels", text);
            var refused = Flowcert.InProcess("solve", graph, "--outputs", "v2", "--labels", bad, "--field", "2", "--flow", "pauli", "--out", w.PathOf("d.json"));
            Assert.True(refused.ExitCode == 2, refused.ToString());
            Assert.Contains("bad.labels" + fragment, refused.Stderr);
            Assert.False(File.Exists(w.PathOf("d.json")));
        }
        var ograph = w.Write("w.ograph", Wire);
        var own = Flowcert.InProcess("solve", ograph, "--labels", labels, "--field", "2");
        Assert.Equal(2, own.ExitCode);
        Assert.Contains("carries its own measurement labels", own.Stderr);
    }

    [Theory]
    [InlineData("measure a XZ\n", "3", "general", "over F3 measurement planes and Pauli measurements are defined here for qubits (field 2); for qudits and continuous variables the right conditions are an open research question")]
    [InlineData("measure a XZ\n", "Q", "general", "over Q measurement planes and Pauli measurements are defined here for qubits")]
    [InlineData("", "5", "pauli", "Pauli flow needs field 2")]
    [InlineData("measure a YZ\n", "2", "causal", "causal flow is defined for XY measurements only")]
    [InlineData("measure a Y\n", "2", "general", "node a is labelled Y, a Pauli measurement: generalized flow takes the planes XY, XZ and YZ only; use --flow pauli.")]
    public void LabelsAreRefusedWhereTheyAreNotDefined(string labels, string field, string flow, string message)
    {
        using var w = new Workspace();
        var graph = w.Write("w.ograph", Wire + labels);
        var run = Flowcert.InProcess("solve", graph, "--field", field, "--flow", flow, "--out", w.PathOf("c.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains(message, run.Stderr);
        Assert.Single(run.Stderr.Trim().Split('\n'));
        w.AssertExactly("w.ograph");
    }

    [Fact]
    public void ConvertKeepsLabelsInOgraphAndJsonAndSaysWhenAFormatDropsThem()
    {
        using var w = new Workspace();
        var graph = w.Write("w.ograph", Wire + "measure a Z\n");
        Assert.Equal(0, Flowcert.InProcess("convert", graph, w.PathOf("w.json")).ExitCode);
        Assert.Contains("\"labels\": {\"a\": \"Z\"}", File.ReadAllText(w.PathOf("w.json")));
        Assert.Equal(0, Flowcert.InProcess("convert", w.PathOf("w.json"), w.PathOf("back.ograph")).ExitCode);
        Assert.EndsWith("measure a Z\n", File.ReadAllText(w.PathOf("back.ograph")));
        var g6 = Flowcert.InProcess("convert", graph, w.PathOf("w.g6"));
        Assert.Equal(0, g6.ExitCode);
        Assert.Contains("keeps no measurement labels", g6.Stdout);
    }
}
