using FlowCert.Cli;

namespace FlowCert.Tests.Cli;

public class ScheduleCommandTests
{
    internal static (int Code, string Out, string Err) Run(params string[] args)
    {
        var (o, e) = (new StringWriter(), new StringWriter());
        return (CliApp.Run(args, o, e), o.ToString(), e.ToString());
    }

    internal static string Corpus(string file) => Path.Combine(FlowCert.Tests.Certificates.CorpusTests.RepositoryRoot(), "certificates", file);

    [Fact]
    public void AFlowCertificatePrintsItsTable()
    {
        var (code, o, _) = Run("schedule", Corpus("qutrit-patch.F3.general.json"));
        Assert.Equal(0, code);
        Assert.Contains("longest chain of dependencies", o);
        Assert.Contains("r0c2  round 3", o);
    }

    [Theory]
    [InlineData("csv", "kind,node,round,source,x,z")]
    [InlineData("json", "\"format\": \"flowcert-schedule\"")]
    public void ToolFormatsArePrinted(string format, string expected)
    {
        var (code, o, _) = Run("schedule", Corpus("splitter-pair.F3.general.json"), "--format", format);
        Assert.Equal(0, code);
        Assert.Contains(expected, o);
    }

    [Fact]
    public void ANoflowCertificateIsABadInputWithAClearMessage()
    {
        var (code, o, e) = Run("schedule", Corpus("merge-attempt.F2.general.json"));
        Assert.Equal(2, code);
        Assert.Equal("", o);
        Assert.Contains("merge-attempt.F2.general.json", e);
        Assert.Contains("no flow exists", e);
    }

    [Fact]
    public void AnUnknownFormatAndAMalformedCertificateAreBadInput()
    {
        Assert.Equal(2, Run("schedule", Corpus("splitter-pair.F3.general.json"), "--format", "xml").Code);
        var dir = Directory.CreateTempSubdirectory("flowcert-schedule-").FullName;
        try
        {
            var broken = Path.Combine(dir, "broken.json");
            File.WriteAllText(broken, "{\"format\": \"flowcert-certificate\"");
            var (code, _, e) = Run("schedule", broken);
            Assert.Equal(2, code);
            Assert.Contains("broken.json", e);
        }
        finally { Directory.Delete(dir, true); }
    }

    [Fact]
    public void OutWritesTheFileAndPrintsNothing()
    {
        var dir = Directory.CreateTempSubdirectory("flowcert-schedule-").FullName;
        try
        {
            var target = Path.Combine(dir, "s.json");
            var (code, o, _) = Run("schedule", Corpus("qutrit-patch.F3.general.json"), "--format", "json", "--out", target);
            Assert.Equal(0, code);
            Assert.Equal("", o);
            Assert.StartsWith("{", File.ReadAllText(target));
            Assert.Single(Directory.GetFiles(dir));
        }
        finally { Directory.Delete(dir, true); }
    }
}
