using System.Diagnostics;
using FlowCert.Graphs;
using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Cli;

/// <summary>
/// Regression tests for the failures found by trying FlowCert as an attacker would (issue 12): each was an
/// exit 3, a stack trace, a destroyed special file, or a message that echoed megabytes of input.
/// </summary>
public class HostileInputTests
{
    // The 17th, 33rd, 65th ... new name first seen on a `node` line overran the reader's table.
    [Theory]
    [InlineData(19)]
    [InlineData(40)]
    [InlineData(200)]
    public void ManyNewNamesOnOneNodeLineAreRead(int count)
    {
        var names = Enumerable.Range(0, count).Select(i => "n" + i).ToArray();
        var text = $"input n0\noutput n1\nnode {string.Join(' ', names)}\nedge n0 n1\n";
        var g = OgraphReader.Parse(text, "n.ograph");
        Assert.Equal(count, g.NodeCount);
        foreach (var n in names) Assert.True(g.Contains(n), n);

        using var w = new Workspace();
        var path = w.Write("n.ograph", text);
        var run = Flowcert.InProcess("solve", path);
        Assert.True(run.ExitCode is 0 or 1, run.ToString());
        Assert.DoesNotContain("internal error", run.Stderr);
    }

    [Fact]
    public void TheReadersStreamedAndWholeTextPathsAgree()
    {
        var text = "input a\noutput c\r\nedge a b 2\nedge b c -1/2\n# end";
        using var w = new Workspace();
        var path = w.Write("g.ograph", text);
        Assert.Equal(CanonicalForm.Write(OgraphReader.Parse(text, "g.ograph")), CanonicalForm.Write(OgraphReader.ReadFile(path)));
    }

    [Fact]
    public void CarriageReturnOnlyLineEndsAreRefusedWithTheirPlace()
    {
        var e = Assert.Throws<GraphFormatException>(() => OgraphReader.Parse("input a\routput b\redge a b\r", "cr.ograph"));
        Assert.Equal(1, e.Line);
        Assert.Equal(8, e.Column);
        Assert.Contains("carriage return", e.Message);
    }

    [Fact]
    public void AnOverlongLineIsAnInputErrorNotExhaustedMemory()
    {
        using var w = new Workspace();
        var path = w.PathOf("long.ograph");
        using (var f = new StreamWriter(path))
        {
            f.Write("# ");
            var block = new string('x', 1 << 20);
            for (int i = 0; i <= OgraphReader.MaxLineLength >> 20; i++) f.Write(block);
        }
        var run = Flowcert.InProcess("solve", path);
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("longer than", run.Stderr);
    }

    public static TheoryData<string> SpecialTargets() => new() { "/dev/null", "/dev/full" };

    // Renaming over a device made it a regular file (as root this replaced /dev/null).
    [Theory]
    [MemberData(nameof(SpecialTargets))]
    public void OutOntoADeviceIsRefusedAndTheDeviceStays(string device)
    {
        if (OperatingSystem.IsWindows() || !File.Exists(device)) return;
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("solve", graph, "--out", device);
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("character device", run.Stderr);
        Assert.Equal(FlowCert.Cli.FileKind.CharDevice, FlowCert.Cli.FileKind.Of(device));
    }

    [Fact]
    public void OutOntoASymlinkOrFifoIsRefusedAndBothStay()
    {
        if (OperatingSystem.IsWindows()) return;
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        var target = w.Write("target.txt", "keep me");
        File.CreateSymbolicLink(w.PathOf("link.json"), target);
        var run = Flowcert.InProcess("solve", graph, "--out", w.PathOf("link.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("symbolic link", run.Stderr);
        Assert.Equal("keep me", w.Read("target.txt"));
        Assert.NotNull(new FileInfo(w.PathOf("link.json")).LinkTarget);

        using (var mk = Process.Start("mkfifo", w.PathOf("pipe.json"))) mk.WaitForExit();
        run = Flowcert.InProcess("solve", graph, "--out", w.PathOf("pipe.json"));
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("FIFO", run.Stderr);
        w.AssertExactly("wire.ograph", "target.txt", "link.json", "pipe.json");
    }

    [Fact]
    public void AStaleTemporaryOfTheSameTargetIsRemoved()
    {
        using var w = new Workspace();
        var graph = w.Write("wire.ograph", Designs.Wire);
        // A process id far above pid_max (2^22) is never alive.
        w.Write(".wire.json.99999999.flowcert-tmp", "left by a killed run");
        var run = Flowcert.InProcess("solve", graph, "--out", w.PathOf("wire.json"));
        Assert.True(run.ExitCode == 0, run.ToString());
        w.AssertExactly("wire.ograph", "wire.json");
    }

    private static string SolvedWire(Workspace w)
    {
        var graph = w.Write("wire.ograph", Designs.Wire);
        var run = Flowcert.InProcess("solve", graph, "--out", w.PathOf("wire.json"));
        Assert.True(run.ExitCode == 0, run.ToString());
        return w.Read("wire.json");
    }

    // Json.NET holds an integer beyond 64 bits as a BigInteger; a cast to long threw OverflowException (exit 3).
    [Theory]
    [InlineData("depth", "9223372036854775808")]
    [InlineData("version", "9223372036854775808")]
    [InlineData("depth", "\"3\"")]
    [InlineData("version", "\"3\"")]
    public void AnIntegerOutOfRangeOrAStringInACertificateIsExitTwo(string key, string value)
    {
        using var w = new Workspace();
        var cert = JObject.Parse(SolvedWire(w));
        cert[key] = JToken.Parse(value);
        var bad = w.Write("bad.json", cert.ToString());
        foreach (var args in new[] { new[] { "schedule", bad }, new[] { "draw", w.PathOf("wire.ograph"), "--cert", bad, "--out", w.PathOf("x.svg") } })
        {
            var run = Flowcert.InProcess(args);
            Assert.True(run.ExitCode == 2, string.Join(' ', args) + "\n" + run);
            Assert.Contains("bad.json:", run.Stderr);
            Assert.DoesNotContain("internal error", run.Stderr);
            if (value.StartsWith('"')) Assert.Contains($"{key} must be a JSON number such as 3, not the string \"3\"", run.Stderr);
        }
    }

    [Fact]
    public void MessagesRepeatAtMostEightyCharactersOfTheInput()
    {
        using var w = new Workspace();
        var longName = "x" + new string('y', 5000);
        var path = w.Write("g.ograph", $"input a\noutput b\nedge a b\nfoo{longName}\n");
        var run = Flowcert.InProcess("solve", path);
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("...", run.Stderr);
        Assert.True(run.Stderr.Length < 400, run.Stderr);
    }
}
