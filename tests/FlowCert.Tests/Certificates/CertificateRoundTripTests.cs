using FlowCert.Certificates;
using FlowCert.Demo;
using FlowCert.Flows;

namespace FlowCert.Tests.Certificates;

public class CertificateRoundTripTests
{
    public static TheoryData<string, string, int> DemoCases()
    {
        var data = new TheoryData<string, string, int>();
        foreach (var d in DemoScenario.Designs())
            foreach (var f in d.Fields)
                foreach (var k in DemoScenario.Kinds)
                    if (DefinedIn(d, f)) data.Add(d.Name, f.Name, (int)k);
        return data;
    }

    // A design whose weights have no value in a field is refused there (covered by the CLI tests).
    private static bool DefinedIn(DemoDesign d, FlowCert.Algebra.FieldSpec f)
        => f.IsRationals || d.Graph.Edges.All(e => e.Weight.Denominator % f.Prime != 0);

    [Theory]
    [MemberData(nameof(DemoCases))]
    public void ReadingAWrittenCertificateAndWritingItAgainGivesTheSameBytes(string design, string field, int kind)
    {
        var d = DemoScenario.Designs().Single(x => x.Name == design);
        var spec = d.Fields.Single(f => f.Name == field);
        var result = FlowSolver.Solve(d.Graph, spec, (FlowKind)kind);
        var text = CertificateWriter.Write(result);
        var again = CertificateWriter.Write(CertificateReader.Parse(text, "demo.json"));
        Assert.Equal(text, again);
    }

    [Theory]
    [InlineData("{", "demo.json:")]
    [InlineData("{\"format\": \"other\"}", "unknown format")]
    public void MalformedCertificatesAreRefusedWithTheFileName(string text, string expected)
    {
        var e = Assert.Throws<CertificateFormatException>(() => CertificateReader.Parse(text, "demo.json"));
        Assert.Contains(expected, e.Message);
    }

    private static string Wire() => CertificateWriter.Write(FlowSolver.Solve(
        FlowCert.Graphs.OgraphReader.Parse("input a\noutput c\nedge a b\nedge b c -1/2\n", "wire.ograph"), FlowCert.Algebra.FieldSpec.Rationals, FlowKind.General));

    // docs/formats.md: "A reader rejects unknown keys, an unknown format, version, flow, field or verdict."
    [Theory]
    [InlineData("\"depth\": 2,", "\"depth\": 2,\n  \"extra\": 1,", "unknown key 'extra' in the certificate")]
    [InlineData("\"depth\": 2,", "\"depth\": 3,", "depth 3 is not the number of rounds (2)")]
    [InlineData("\"field\": \"Q\"", "\"field\": \"F07\"", "field 'F07' is not written canonically")]
    [InlineData("\"verdict\": \"flow\",", "\"verdict\": \"flow\",\n  \"obstruction\": {},", "unknown key 'obstruction'")]
    [InlineData("[\"b\", \"c\", \"-1/2\"]", "[\"b\", \"c\", \"-1/3\"]", "graphSha256 is not the SHA-256")]
    [InlineData("\"a\": {\"b\": \"1\"}", "\"a\": {\"z\": \"1\"}", "unknown node 'z'")]
    // Values are read into the field as they are read (docs/formats.md: "for Q a reduced a/b or a").
    [InlineData("\"a\": {\"b\": \"1\"}", "\"a\": {\"b\": \"2/2\"}", "'2/2' on b is not an element of Q in canonical form")]
    [InlineData("\"a\": {\"b\": \"1\"}", "\"a\": {\"b\": \"0.5\"}", "'0.5' on b is not an element of Q in canonical form")]
    public void AReaderRejectsWhatTheFormatDoesNotAllowNamingLineAndColumn(string from, string to, string expected)
    {
        var text = Wire();
        Assert.Contains(from, text);
        var e = Assert.Throws<CertificateFormatException>(() => CertificateReader.Parse(text.Replace(from, to), "wire.json"));
        Assert.Contains(expected, e.Message);
        Assert.True(e.Line > 1 && e.Column > 0, e.Message);
    }

    [Fact]
    public void ValuesAreReadTypedInTheCertificatesField()
    {
        var r = CertificateReader.Parse(Wire(), "wire.json");
        var b = r.Corrections[r.Graph.IndexOf("b")];
        Assert.Equal([r.Graph.IndexOf("c")], b.Nodes);
        Assert.Equal(FlowCert.Algebra.Rational.Create(-2, 1), b.Values<FlowCert.Algebra.Rational>()[0]);
        Assert.True(b[0].IsNegative);
        Assert.Throws<InvalidOperationException>(() => b.Values<ulong>().Length);
    }

    [Fact]
    public void AnHonestCertificateIsReadBack()
        => Assert.Equal(2, CertificateReader.Parse(Wire(), "wire.json").Depth);
}
