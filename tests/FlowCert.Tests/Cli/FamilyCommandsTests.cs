using System.Xml.Linq;
using FlowCert.Certificates;
using FlowCert.Cli;
using FlowCert.Graphs;

namespace FlowCert.Tests.Cli;

/// <summary>The generate, convert and draw commands, solve on every readable format, and their exit codes.</summary>
public sealed class FamilyCommandsTests : IDisposable
{
    private readonly string dir = Directory.CreateTempSubdirectory("flowcert-families-").FullName;

    public void Dispose() => Directory.Delete(dir, recursive: true);

    private string P(string name) => Path.Combine(dir, name);

    private static (int Code, string Out, string Err) Run(params string[] args)
    {
        var (o, e) = (new StringWriter(), new StringWriter());
        int code = CliApp.Run(args, o, e);
        return (code, o.ToString(), e.ToString());
    }

    private string[] Files() => Directory.GetFiles(dir).Select(Path.GetFileName).Order().ToArray()!;

    /// <summary>The three-command workflow of the README: generate a 20 x 21 brickwork state, solve it, draw the certificate.</summary>
    [Fact]
    public void GenerateSolveDrawWorkflow()
    {
        var gen = Run("generate", "brickwork", "--size", "20x21", "--random-weights", "1,2,-1/2", "--seed", "3", "--out", P("bw.ograph"));
        Assert.Equal((0, ""), (gen.Code, gen.Err));
        Assert.Contains("420 nodes", gen.Out);
        var solve = Run("solve", P("bw.ograph"), "--field", "5", "--out", P("bw.json"));
        Assert.Equal(0, solve.Code);
        var certificate = CertificateReader.ReadFile(P("bw.json"));
        Assert.True(certificate.HasFlow);
        var draw = Run("draw", P("bw.ograph"), "--cert", P("bw.json"), "--out", P("bw.svg"));
        Assert.Equal((0, ""), (draw.Code, draw.Err));
        var svg = XDocument.Load(P("bw.svg"));
        Assert.Contains(svg.Descendants(), e => e.Value.StartsWith($"bw.ograph: generalized flow over F5, minimum depth {certificate.Depth}"));
        Assert.Equal(["bw.json", "bw.ograph", "bw.svg"], Files());
        var again = Run("generate", "brickwork", "--size", "20x21", "--random-weights", "1,2,-1/2", "--seed", "3", "--out", P("bw2.ograph"));
        Assert.Equal(0, again.Code);
        Assert.Equal(File.ReadAllBytes(P("bw.ograph")), File.ReadAllBytes(P("bw2.ograph")));
    }

    [Fact]
    public void SolveAndConvertReadGraph6WithNamedInputsAndOutputs()
    {
        // The path v0 - v1 - v2 - v3 in graph6: bits 101001 for (0,1) (0,2) (1,2) (0,3) (1,3) (2,3), so "Ch".
        File.WriteAllText(P("wire.g6"), "Ch\n");
        var solve = Run("solve", P("wire.g6"), "--inputs", "v0", "--outputs", "v3", "--flow", "causal", "--out", P("wire.json"));
        Assert.Equal(0, solve.Code);
        Assert.Equal(3, CertificateReader.ReadFile(P("wire.json")).Depth);
        var convert = Run("convert", P("wire.g6"), P("wire.ograph"), "--inputs", "v0", "--outputs", "v3");
        Assert.Equal(0, convert.Code);
        Assert.Equal("input v0\noutput v3\nedge v0 v1 1\nedge v1 v2 1\nedge v2 v3 1\n", File.ReadAllText(P("wire.ograph")));
        var toMtx = Run("convert", P("wire.ograph"), P("wire.mtx"));
        Assert.Equal(0, toMtx.Code);
        Assert.Contains("keeps no inputs or outputs", toMtx.Out);
        Assert.Equal(0, Run("convert", P("wire.mtx"), P("wire.s6")).Code);
        Assert.Equal(3, FlowCert.Graphs.Formats.Sparse6.Parse(File.ReadAllText(P("wire.s6")), "wire.s6").Edges.Count);
        // Matrix Market numbers from 1: v2 is the second node of the path, so the only corrector to start
        // from touches two measured nodes at once (v1 and v3): no flow.
        Assert.Equal(1, Run("solve", P("wire.mtx"), "--inputs", "v1", "--outputs", "v2").Code);
        Assert.Equal(0, Run("draw", P("wire.g6"), "--inputs", "v0", "--outputs", "v3", "--cert", P("wire.json"), "--out", P("wire.dot")).Code);
        Assert.StartsWith("digraph flow_picture {", File.ReadAllText(P("wire.dot")));
    }

    [Theory]
    [InlineData("bad.g6", "DQ \n", "bad.g6:1:3: byte ' ' is outside 63..126")]
    [InlineData("bad.s6", ":AN\n", "bad.s6:1:3: loop on vertex 0")]
    [InlineData("bad.mtx", "%%MatrixMarket matrix coordinate real symmetric\n3 3 1\n2 1 x\n", "bad.mtx:3:5: bad real value 'x'")]
    [InlineData("bad.json", "{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\"],\n \"edges\": [[\"a\", \"b\", \"1\"]]}", "bad.json:2:18: unknown node b")]
    public void MalformedFilesExitTwoWithFileLineAndColumnAndWriteNothing(string name, string text, string message)
    {
        File.WriteAllText(P(name), text);
        foreach (var args in new[] { new[] { "solve", P(name), "--out", P("c.json") }, ["convert", P(name), P("c.ograph")], ["draw", P(name), "--out", P("c.svg")] })
        {
            var r = Run(args);
            Assert.Equal(2, r.Code);
            Assert.Contains(Path.Combine(dir, message), r.Err);
            Assert.Equal([name], Files());
        }
    }

    [Theory]
    [InlineData(new[] { "generate", "pentagonal", "--size", "3", "--out", "x.ograph" }, "unknown family 'pentagonal'")]
    [InlineData(new[] { "generate", "square", "--size", "3x3", "--weight", "2", "--random-weights", "1,2", "--out", "x.ograph" }, "at most one of")]
    [InlineData(new[] { "generate", "square", "--size", "3x3", "--weight", "0", "--out", "x.ograph" }, "zero")]
    [InlineData(new[] { "generate", "square", "--size", "3x3", "--out", "x.txt" }, "unknown graph file extension '.txt'")]
    [InlineData(new[] { "generate", "square", "--size", "3x3", "--weight", "1/2", "--out", "x.g6" }, "graph6 holds only unweighted graphs")]
    [InlineData(new[] { "convert", "x.ograph", "y.dot", "--inputs", "a" }, "names its own inputs")]
    [InlineData(new[] { "draw", "x.ograph", "--out", "x.png" }, "a picture is written as .svg or .dot")]
    public void BadRequestsExitTwoWithAReason(string[] args, string expected)
    {
        File.WriteAllText(P("x.ograph"), "input a\noutput b\nedge a b\n");
        var r = Run(args.Select(a => a.Contains('.') && !a.Contains(',') && !a.Contains('/') ? P(a) : a).ToArray());
        Assert.Equal(2, r.Code);
        Assert.Contains(expected, r.Err);
        Assert.Equal(["x.ograph"], Files());
    }

    [Fact]
    public void DrawingWithACertificateOfAnotherGraphIsRefused()
    {
        Assert.Equal(0, Run("generate", "line", "--size", "4", "--out", P("a.ograph")).Code);
        Assert.Equal(0, Run("generate", "line", "--size", "5", "--out", P("b.ograph")).Code);
        Assert.Equal(0, Run("solve", P("b.ograph"), "--out", P("b.json")).Code);
        var r = Run("draw", P("a.ograph"), "--cert", P("b.json"), "--out", P("a.svg"));
        Assert.Equal(2, r.Code);
        Assert.Contains("certificate of another graph", r.Err);
        Assert.False(File.Exists(P("a.svg")));
        Assert.Equal(CanonicalForm.Write(OgraphReader.ReadFile(P("b.ograph"))), CanonicalForm.Write(CertificateReader.ReadFile(P("b.json")).Graph));
    }
}
