namespace FlowCert.Tests.Cli;

/// <summary>Weak spots a new user met (issue 12), each mended and pinned here.</summary>
public class WeakSpotTests
{
    private const string Wire = "input a\noutput c\nedge a b\nedge b c\n";

    private static void Solve(Workspace w, string graph, string field, string cert)
    {
        var run = Flowcert.InProcess("solve", w.PathOf(graph), "--field", field, "--out", w.PathOf(cert));
        Assert.True(run.ExitCode is 0 or 1, run.ToString());
    }

    [Fact]
    public void DrawRefusesACertificateWhoseCorrectionsAreNotAFlow()
    {
        using var w = new Workspace();
        w.Write("wire.ograph", Wire);
        Solve(w, "wire.ograph", "5", "wire.json");
        var good = w.Read("wire.json");
        Assert.Contains("\"a\": {\"b\": \"1\"}", good);
        w.Write("bad.json", good.Replace("\"a\": {\"b\": \"1\"}", "\"a\": {\"b\": \"2\"}"));
        var run = Flowcert.InProcess("draw", w.PathOf("wire.ograph"), "--cert", w.PathOf("bad.json"), "--out", w.PathOf("x.svg"));
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("bad.json: not drawn, the certificate is invalid: the corrections are not a flow", run.Stderr);
        Assert.Equal(0, Flowcert.InProcess("draw", w.PathOf("wire.ograph"), "--cert", w.PathOf("wire.json"), "--out", w.PathOf("ok.svg")).ExitCode);
        w.AssertExactly("wire.ograph", "wire.json", "bad.json", "ok.svg");
    }

    [Fact]
    public void DrawRefusesAProofOfAbsenceForAGraphThatHasAFlow()
    {
        using var w = new Workspace();
        // a graph with no flow (two measured nodes, one output) and the same graph with one more output
        w.Write("v.ograph", "input a b\noutput c\nedge a c\nedge b c\n");
        Solve(w, "v.ograph", "3", "v.json");
        var noflow = w.Read("v.json");
        Assert.Contains("\"verdict\": \"noflow\"", noflow);
        Assert.Equal(0, Flowcert.InProcess("draw", w.PathOf("v.ograph"), "--cert", w.PathOf("v.json"), "--out", w.PathOf("v.svg")).ExitCode);
        // the same proof with its blocked set changed: the solver finds another one
        var blocked = System.Text.RegularExpressions.Regex.Match(noflow, "\"blocked\": \\[[^\\]]*\\]").Value;
        Assert.NotEqual("", blocked);
        w.Write("other.json", noflow.Replace(blocked, "\"blocked\": [\"a\"]"));
        var run = Flowcert.InProcess("draw", w.PathOf("v.ograph"), "--cert", w.PathOf("other.json"), "--out", w.PathOf("x.svg"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("not drawn, the certificate is invalid", run.Stderr);
        Assert.False(File.Exists(w.PathOf("x.svg")));
    }

    [Fact]
    public void SimulateRefusesZeroBranches()
    {
        using var w = new Workspace();
        w.Write("wire.ograph", Wire);
        Solve(w, "wire.ograph", "3", "wire.json");
        var run = Flowcert.InProcess("simulate", w.PathOf("wire.ograph"), "--cert", w.PathOf("wire.json"), "--branches", "0");
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("--branches 0 would look at no outcome", run.Stderr);
        Assert.Equal("", run.Stdout);
        Assert.Equal(0, Flowcert.InProcess("simulate", w.PathOf("wire.ograph"), "--cert", w.PathOf("wire.json"), "--branches", "1").ExitCode);
    }

    [Fact]
    public void VersionAndUsageSayFlowcert()
    {
        var version = Flowcert.InProcess("--version");
        Assert.Equal(0, version.ExitCode);
        Assert.Equal($"flowcert {FlowCert.Certificates.CertificateWriter.ProducerVersion}\n", version.Stdout.ReplaceLineEndings("\n"));
        foreach (var args in new[] { new[] { "--help" }, new[] { "solve", "--help" }, new[] { "draw", "--help" } })
        {
            var help = Flowcert.InProcess(args);
            Assert.Equal(0, help.ExitCode);
            Assert.Contains($"  flowcert {(args.Length > 1 ? args[0] + " " : "")}", help.Stdout);
            Assert.DoesNotContain("FlowCert.Cli", help.Stdout);
        }
        var none = Flowcert.InProcess();
        Assert.Equal(2, none.ExitCode);
        Assert.Contains("give a command", none.Stderr);
    }

    [Fact]
    public void ADashReadsTheGraphFromStandardInputInSolveConvertAndDraw()
    {
        using var w = new Workspace();
        var solve = Flowcert.WithInput(Wire, "solve", "-", "--field", "3");
        Assert.True(solve.ExitCode == 0, solve.ToString());
        Assert.StartsWith("graph     standard input: 3 nodes, 2 edges", solve.Stdout);
        var convert = Flowcert.WithInput(Wire, "convert", "-", w.PathOf("wire.json"));
        Assert.True(convert.ExitCode == 0, convert.ToString());
        Assert.Contains("\"nodes\": [\"a\", \"b\", \"c\"]", w.Read("wire.json"));
        Assert.Equal(0, Flowcert.WithInput(Wire, "draw", "-", "--out", w.PathOf("wire.svg")).ExitCode);
        // other formats are recognised by their first characters; errors name standard input
        Assert.Equal(1, Flowcert.WithInput("Bw\n", "solve", "-").ExitCode);
        Assert.Equal(0, Flowcert.WithInput(w.Read("wire.json"), "solve", "-").ExitCode);
        var bad = Flowcert.WithInput("input a\nedge a a\n", "solve", "-");
        Assert.Equal(2, bad.ExitCode);
        Assert.StartsWith("flowcert: standard input:2:", bad.Stderr);
        w.AssertExactly("wire.json", "wire.svg");
    }

    [Fact]
    public void SolveWarnsWhenNoTerminalsWereGiven()
    {
        using var w = new Workspace();
        w.Write("k3.g6", "Bw\n");
        var run = Flowcert.InProcess("solve", w.PathOf("k3.g6"));
        Assert.Equal(1, run.ExitCode);
        Assert.Contains("flowcert: warning: ", run.Stderr);
        Assert.Contains("k3.g6: no terminals were given", run.Stderr);
        Assert.Contains("--inputs and --outputs", run.Stderr);
        var named = Flowcert.InProcess("solve", w.PathOf("k3.g6"), "--inputs", "v0", "--outputs", "v1,v2");
        Assert.DoesNotContain("warning", named.Stderr);
    }
}
