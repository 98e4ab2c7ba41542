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
    [InlineData("4", "--dim 4: 4 is composite")]
    [InlineData("1", "--dim 1: 1 is not a prime")]
    [InlineData("Q", "--dim Q: a qudit dimension is a prime")]
    public void AWrongDimensionIsRefused(string dim, string expected)
    {
        var (code, _, e) = Run("simulate", Corpus("splitter-pair.ograph"), "--cert", Corpus("splitter-pair.F3.general.json"), "--dim", dim);
        Assert.Equal(2, code);
        Assert.Contains(expected, e);
    }

    [Fact]
    public void TheQutritPatchOverF5RunsWithinItsWidth()
    {
        // 5^10 amplitudes for the whole state, but never more than 3 live nodes and 2 references at once.
        var (code, o, _) = Run("simulate", Corpus("qutrit-patch.ograph"), "--cert", Corpus("qutrit-patch.F5.general.json"), "--branches", "20");
        Assert.Equal(0, code);
        Assert.Contains("8 qudits, at most 3 live at once + 2 reference = 3125 amplitudes at the peak", o);
    }

    [Fact]
    public void ATooWideScheduleIsRefusedWithTheCount()
    {
        // A 10 x 2 square patch over F_5: eleven nodes are live at once beside ten references, 5^21 amplitudes.
        var dir = Directory.CreateTempSubdirectory("flowcert-simulate-").FullName;
        try
        {
            var graph = Path.Combine(dir, "wide.ograph");
            var cert = Path.Combine(dir, "wide.json");
            Assert.Equal(0, Run("generate", "square", "--size", "10x2", "--out", graph).Code);
            Assert.Equal(0, Run("solve", graph, "--field", "5", "--flow", "causal", "--out", cert).Code);
            var (code, o, e) = Run("simulate", graph, "--cert", cert);
            Assert.Equal(2, code);
            Assert.Equal("", o);
            Assert.Contains("up to 11 of 20 qudits of dimension 5 live at once, with 10 reference qudits for the inputs: 5^21 = 476837158203125 amplitudes, more than the limit", e);
            Assert.Single(e.Trim().Split('\n'));
        }
        finally { Directory.Delete(dir, true); }
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

    [Fact]
    public void ACertificateOverAPrimeBeyondTheIntegerRangeIsBadInputNotACrash()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", "input a\noutput b\nedge a b\n");
        var cert = w.PathOf("wire.F2147483659.json");
        Assert.Equal(0, Run("solve", graph, "--field", "2147483659", "--out", cert).Code);
        var (code, o, e) = Run("simulate", graph, "--cert", cert);
        Assert.Equal(2, code);
        Assert.Equal("", o);
        Assert.Contains("F2147483659", e);
        Assert.DoesNotContain("internal error", e);
        Assert.Single(e.TrimEnd('\n').Split('\n'));
    }

    [Fact]
    public void AGraphWithoutNodesIsTheTrivialDeterministicPattern()
    {
        using var w = new Workspace();
        var graph = w.Write("empty.ograph", "# no nodes at all\n");
        var cert = w.PathOf("empty.F3.json");
        Assert.Equal(0, Run("solve", graph, "--field", "3", "--out", cert).Code);
        var (code, o, e) = Run("simulate", graph, "--cert", cert);
        Assert.True(code == 0, e);
        Assert.Contains("branches     1 of 1", o);
        Assert.Contains("verdict      deterministic", o);
    }

    [Fact]
    public void TheGraphIsReadInAnyGraphFormatWithInputsAndOutputsBesideIt()
    {
        using var w = new Workspace();
        var graph = w.Write("path.g6", "Bg\n"); // graph6 of the path v0 - v1 - v2
        var cert = w.PathOf("path.F3.json");
        Assert.Equal(0, Run("solve", graph, "--field", "3", "--inputs", "v0", "--outputs", "v2", "--out", cert).Code);
        var (code, o, e) = Run("simulate", graph, "--inputs", "v0", "--outputs", "v2", "--cert", cert);
        Assert.True(code == 0, e);
        Assert.Contains("verdict      deterministic", o);
        // Without the terminals it is another graph than the certificate's.
        var other = Run("simulate", graph, "--cert", cert);
        Assert.Equal(2, other.Code);
        Assert.Contains("different graphs", other.Err);
    }

    [Theory]
    [InlineData("1048577")]
    [InlineData("99999999999")]
    public void MoreSampledBranchesThanTheExhaustiveLimitAreRefused(string k)
    {
        var (code, o, e) = Run("simulate", Corpus("splitter-pair.ograph"), "--cert", Corpus("splitter-pair.F3.general.json"), "--branches", k);
        Assert.Equal(2, code);
        Assert.Equal("", o);
        Assert.Contains("at most 1048576", e);
    }

    [Fact]
    public void EdgesThatVanishInTheFieldAreAWarningOnStandardError()
    {
        // The patch's rung r0c2-r1c2 has weight 3, which is 0 in F3 (flows.md section 1: never silently).
        var (code, o, e) = Run("simulate", Corpus("qutrit-patch.ograph"), "--cert", Corpus("qutrit-patch.F3.general.json"), "--branches", "3");
        Assert.Equal(0, code);
        Assert.Equal($"flowcert: warning: {Corpus("qutrit-patch.F3.general.json")}: 1 edge has weight 0 in F3 and vanishes: r0c2-r1c2 (3)\n", e);
        Assert.DoesNotContain("vanish", o);
        // The splitter pair's weights 1 and -1 never vanish: nothing on standard error.
        Assert.Equal("", Run("simulate", Corpus("splitter-pair.ograph"), "--cert", Corpus("splitter-pair.F3.general.json")).Err);
    }
}
