using FlowCert.Certificates;
using FlowCert.Demo;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;

namespace FlowCert.Tests.Graphs.Formats;

/// <summary>The JSON graph object: the same lines as a certificate's "graph" (docs/formats.md), read back, and its errors.</summary>
public class GraphJsonTests
{
    public static TheoryData<string> Designs() => [.. DemoScenario.Designs().Select(d => d.Name)];

    [Theory]
    [MemberData(nameof(Designs))]
    public void TheJsonFormIsTheCertificatesGraphObjectOnItsOwn(string design)
    {
        var g = DemoScenario.Designs().Single(d => d.Name == design).Graph;
        var certificate = CertificateWriter.Write(FlowSolver.Solve(g, FlowCert.Algebra.FieldSpec.Rationals, FlowKind.General)).Split('\n');
        int start = Array.IndexOf(certificate, "  \"graph\": {"), end = Array.IndexOf(certificate, "  },", start);
        var inner = certificate[(start + 1)..end].Select(l => l[2..]);
        var expected = "{\n" + string.Concat(inner.Select(l => l + "\n")) + "}\n";
        var json = GraphJson.Write(g);
        Assert.Equal(expected, json);
        Assert.Equal(CanonicalForm.Write(g), CanonicalForm.Write(GraphJson.Parse(json, "g.json")));
    }

    [Fact]
    public void AGraphWithoutEdgesWritesAnEmptyListAndKeysMayComeInAnyOrder()
    {
        var g = new OpenGraph(["a"], [], ["a"], ["a"]);
        Assert.Equal("{\n  \"inputs\": [\"a\"],\n  \"outputs\": [\"a\"],\n  \"nodes\": [\"a\"],\n  \"edges\": []\n}\n", GraphJson.Write(g));
        var shuffled = "{\"edges\": [[\"b\", \"a\", \"0.5\"]], \"nodes\": [\"b\", \"a\"], \"outputs\": [\"b\"], \"inputs\": []}";
        Assert.Equal("input\noutput b\nedge a b 1/2\n", CanonicalForm.Write(GraphJson.Parse(shuffled, "s.json")));
    }

    [Theory]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": [], \"extra\": 1}", 1, 60, "unknown key 'extra'")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\"]}", 1, 1, "key 'edges' is missing")]
    [InlineData("{\"inputs\": [], \"outputs\": [],\n \"nodes\": [\"a\", \"9b\"], \"edges\": []}", 2, 17, "bad node name '9b'")]
    [InlineData("{\"inputs\": [\"z\"], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": []}", 1, 13, "unknown node z in inputs")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\", \"b\"],\n \"edges\": [[\"a\", \"b\", \"0\"]]}", 2, 23, "zero")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\", \"b\"],\n \"edges\": [[\"a\", \"b\", 2]]}", 2, 23, "bad weight")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\"],\n \"edges\": [[\"a\", \"a\", \"1\"]]}", 2, 18, "self-loop")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\", \"a\"], \"edges\": []}", 1, 46, "listed twice")]
    [InlineData("{\"inputs\": [],\n \"outputs\": [", 2, 13, "")]
    [InlineData("[]", 1, 1, "one object")]
    public void MalformedJsonNamesLineAndColumn(string text, int line, int column, string problem)
    {
        var e = Assert.Throws<GraphFormatException>(() => GraphJson.Parse(text, "bad.json"));
        Assert.Equal(("bad.json", line, column), (e.File, e.Line, e.Column));
        Assert.Contains(problem, e.Problem);
    }
}
