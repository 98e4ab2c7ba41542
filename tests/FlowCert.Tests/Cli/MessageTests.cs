using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Cli;

/// <summary>Messages a new user meets (issue 12): each says what is wrong in the user's terms, and none echoes raw control characters.</summary>
public class MessageTests
{
    private static string Certificate(Workspace w)
    {
        w.Write("wire.ograph", "input a\noutput c\nedge a b\nedge b c\n");
        var run = Flowcert.InProcess("solve", w.PathOf("wire.ograph"), "--field", "3", "--out", w.PathOf("wire.json"));
        Assert.True(run.ExitCode == 0, run.ToString());
        return w.Read("wire.json");
    }

    [Fact]
    public void ACertificateOverF4SaysFourIsNotPrimeAndPointsToTheReadme()
    {
        using var w = new Workspace();
        var bad = w.Write("f4.json", Certificate(w).Replace("\"field\": \"F3\"", "\"field\": \"F4\""));
        var run = Flowcert.InProcess("schedule", bad);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("f4.json:5:12: field 'F4': 4 is composite", run.Stderr);
        Assert.Contains("\"Composite dimensions\"", run.Stderr);
        var unknown = Flowcert.InProcess("schedule", w.Write("r.json", Certificate(w).Replace("\"field\": \"F3\"", "\"field\": \"R\"")));
        Assert.Contains("unknown field 'R': write Q or F followed by a prime", unknown.Stderr);
    }

    [Theory]
    [InlineData("generate", "-1")]
    [InlineData("generate", "18446744073709551616")]
    [InlineData("simulate", "x")]
    public void ABadSeedIsExplainedWithoutNamingADotNetType(string command, string seed)
    {
        using var w = new Workspace();
        string[] args = command == "generate"
            ? ["generate", "line", "--size", "3", "--seed", seed, "--out", w.PathOf("g.ograph")]
            : ["simulate", "g.ograph", "--cert", "c.json", "--seed", seed];
        var run = Flowcert.InProcess(args);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains($"--seed takes a whole number from 0 to 18446744073709551615, not '{seed}'", run.Stderr);
        Assert.DoesNotContain("System.", run.Stderr);
        w.AssertExactly();
    }

    [Fact]
    public void AnExponentTooLargeToHoldExactlyIsNamedAsTheReason()
    {
        using var w = new Workspace();
        var run = Flowcert.InProcess("solve", w.Write("e.ograph", "input a\noutput b\nedge a b 1e999999999\n"));
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("e.ograph:3:10: bad weight '1e999999999': its exponent is beyond ±4000", run.Stderr);
        var mtx = Flowcert.InProcess("solve", w.Write("a.mtx", "%%MatrixMarket matrix coordinate real symmetric\n2 2 1\n2 1 1e5000\n"));
        Assert.Equal(2, mtx.ExitCode);
        Assert.Contains("a.mtx:3:5: bad real value '1e5000': its exponent is beyond ±4000", mtx.Stderr);
    }

    [Fact]
    public void ControlCharactersFromTheInputAreEscapedInEveryMessage()
    {
        using var w = new Workspace();
        // in a node name, in a file name on the command line, in an option's value
        w.Write("e.ograph", "input a\u001b[31m\noutput b\nedge a b\n");
        var name = Flowcert.InProcess("solve", w.PathOf("e.ograph"));
        var file = Flowcert.InProcess("solve", w.PathOf("no\u001b[2Jsuch.ograph"));
        var option = Flowcert.InProcess("solve", w.PathOf("e.ograph"), "--flow", "ca\u0007usal");
        var parse = Flowcert.InProcess("solve", w.PathOf("e.ograph"), "--bogus\u001b");
        foreach (var run in new[] { name, file, option, parse })
        {
            Assert.Equal(2, run.ExitCode);
            Assert.DoesNotContain(run.Stderr.TrimEnd('\n').Replace("\n", ""), c => char.IsControl(c));
            Assert.Contains("\\u00", run.Stderr);
        }
    }
}
