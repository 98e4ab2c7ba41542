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
}
