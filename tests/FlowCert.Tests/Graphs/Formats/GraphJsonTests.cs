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

/// <summary>
/// Only JSON as RFC 8259 ("The JavaScript Object Notation (JSON) Data Interchange Format",
/// DOI 10.17487/RFC8259, identifier from memory) defines it is read, in .json graphs and in certificates; everything Json.NET
/// would tolerate beyond it is refused with its line and column.
/// </summary>
public class StrictJsonTests
{
    private const string Good = "{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": []}";

    [Theory]
    [InlineData("{'inputs': [], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": []}", 1, 2, "single quotes")]
    [InlineData("{\"inputs\": ['a'], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": []}", 1, 13, "single quotes")]
    [InlineData("{inputs: [], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": []}", 1, 2, "keys are strings in double quotes")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\",], \"edges\": []}", 1, 45, "trailing comma before ']'")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": [],\n}", 2, 1, "trailing comma before '}'")]
    [InlineData("{\"inputs\": [], // none\n \"outputs\": [], \"nodes\": [\"a\"], \"edges\": []}", 1, 16, "comments are not JSON")]
    [InlineData("{\"inputs\": [], \"outputs\": [],\n /* x */ \"nodes\": [\"a\"], \"edges\": []}", 2, 2, "comments are not JSON")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": []}\0", 1, 59, "NUL")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\0\"], \"edges\": []}", 1, 43, "must be escaped")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": [], \"x\": NaN}", 1, 65, "was expected, found 'N'")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": [], \"x\": 0x10}", 1, 65, "not a JSON number")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": [], \"x\": 01}", 1, 65, "start with 0")]
    [InlineData("{\"inputs\": [], \"outputs\": [], \"nodes\": [\"a\"], \"edges\": [], \"x\": \"\\q\"}", 1, 66, "unknown escape")]
    [InlineData("{\"inputs\": [] \"outputs\": []}", 1, 15, "',' or '}' expected")]
    [InlineData("", 1, 1, "the file is empty")]
    [InlineData(" \n\t", 2, 2, "only white space")]
    [InlineData("{\"inputs\": [],\n \"outputs\": [[", 2, 14, "array opened here is closed")]
    public void LenientJsonIsRefusedWithLineAndColumn(string text, int line, int column, string problem)
    {
        foreach (var read in new Action[] { () => GraphJson.Parse(text, "bad.json"), () => CertificateReader.Parse(text, "bad.json") })
        {
            var e = Record.Exception(read);
            var (file, l, c, p) = e switch
            {
                GraphFormatException g => (g.File, g.Line, g.Column, g.Problem),
                CertificateFormatException f => (f.File, f.Line, f.Column, f.Message),
                _ => throw new Xunit.Sdk.XunitException($"expected an input error, got {e?.ToString() ?? "none"}"),
            };
            Assert.Equal(("bad.json", line, column), (file, l, c));
            Assert.Contains(problem, p);
        }
    }

    [Fact]
    public void StrictJsonWithEveryValueKindAndEscapeIsRead()
    {
        Assert.Equal("input\noutput\nnode a\n", CanonicalForm.Write(GraphJson.Parse(Good, "g.json")));
        var spaced = " \r\n{ \"inputs\" : [ ] ,\t\"outputs\":[],\"nodes\":[\"\\u0061\"],\"edges\":[ ]}\r\n";
        Assert.Equal("input\noutput\nnode a\n", CanonicalForm.Write(GraphJson.Parse(spaced, "g.json")));
        // every certificate of the corpus is strict JSON
        foreach (var path in Directory.GetFiles(Path.Combine(FlowCert.Tests.Certificates.CorpusTests.RepositoryRoot(), "certificates"), "*.json"))
            CertificateReader.Parse(File.ReadAllText(path), path);
    }
}
