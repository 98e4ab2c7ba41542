using static FlowCert.Tests.Cli.ScheduleCommandTests;

namespace FlowCert.Tests.Cli;

public class SimulateCommandTests
{
    [Fact]
    public void ACertifiedPatternIsDeterministicExitZero()
    {
        var (code, o, _) = Run("simulate", Corpus("splitter-pair.ograph"), "--cert", Corpus("splitter-pair.F3.general.json"));
        Assert.Equal(0, code);
        Assert.Contains("verdict      deterministic", o);
        Assert.Contains("9 of 9", o);
    }

    [Fact]
    public void TheSameSeedPrintsTheSameReport()
    {
        string[] args = ["simulate", Corpus("loop-wire.ograph"), "--cert", Corpus("loop-wire.F5.general.json"), "--branches", "20", "--seed", "12"];
        var first = Run(args);
        Assert.Equal(0, first.Code);
        Assert.Equal(first.Out, Run(args).Out);
    }

    [Fact]
    public void SampledBranchesAreNamedAsSuch()
    {
        var (code, o, _) = Run("simulate", Corpus("qutrit-patch.ograph"), "--cert", Corpus("qutrit-patch.F3.causal.json"), "--branches", "5", "--seed", "9");
        Assert.Equal(0, code);
        Assert.Contains("5 sampled", o);
    }

    [Fact]
    public void TheContinuousVariableCaseIsExplainedAndRefused()
    {
        var (code, _, e) = Run("simulate", Corpus("loop-wire.ograph"), "--cert", Corpus("loop-wire.Q.general.json"));
        Assert.Equal(2, code);
        Assert.Contains("continuous-variable", e);
        Assert.Contains("--field 3", e);
    }

    [Theory]
    [InlineData("5", "does not match")]
    [InlineData("4", "not a prime")]
    public void AWrongDimensionIsRefused(string dim, string expected)
    {
        var (code, _, e) = Run("simulate", Corpus("splitter-pair.ograph"), "--cert", Corpus("splitter-pair.F3.general.json"), "--dim", dim);
        Assert.Equal(2, code);
        Assert.Contains(expected, e);
    }

    [Fact]
    public void TooManyAmplitudesAreRefusedWithTheCount()
    {
        var (code, _, e) = Run("simulate", Corpus("qutrit-patch.ograph"), "--cert", Corpus("qutrit-patch.F5.general.json"));
        Assert.Equal(2, code);
        Assert.Contains("5^10 = 9765625 amplitudes", e);
    }

    [Fact]
    public void AGraphThatIsNotTheCertificatesIsRefused()
    {
        var (code, _, e) = Run("simulate", Corpus("loop-wire.ograph"), "--cert", Corpus("splitter-pair.F3.general.json"));
        Assert.Equal(2, code);
        Assert.Contains("different graphs", e);
    }

    [Fact]
    public void ACorruptedCertificateIsSimulatedWithAWarningAndExitsOne()
    {
        var dir = Directory.CreateTempSubdirectory("flowcert-simulate-").FullName;
        try
        {
            var text = File.ReadAllText(Corpus("qutrit-patch.F3.general.json")).Replace("\"r0c0\": {\"r0c1\": \"1\"}", "\"r0c0\": {\"r0c1\": \"2\"}");
            var cert = Path.Combine(dir, "bad.json");
            File.WriteAllText(cert, text);
            var (code, o, e) = Run("simulate", Corpus("qutrit-patch.ograph"), "--cert", cert);
            Assert.Equal(1, code);
            Assert.Contains("condition 2", e);
            Assert.Contains("outcome-dependent", o);
        }
        finally { Directory.Delete(dir, true); }
    }
}
