using Newtonsoft.Json.Linq;

namespace FlowCert.Tests.Cli;

/// <summary>
/// The command as a real process (`dotnet FlowCert.Cli.dll ...`), with relative paths from its working
/// folder: exit codes reach the shell, messages reach stderr, and the files match the in-process run.
/// </summary>
public class ProcessRunTests
{
    [Fact]
    public void ExitCodesAndOutputOfARealProcess()
    {
        using var w = new Workspace();
        w.Write("wire.ograph", Designs.Wire);
        w.Write("merge.ograph", Designs.Merge);
        w.Write("broken.ograph", Designs.Broken);

        var flow = Flowcert.AsProcess(w.Root.FullName, "solve", "wire.ograph", "--out", "wire.json");
        Assert.True(flow.ExitCode == 0, flow.ToString());
        Assert.Contains("flow of minimum depth 3", flow.Stdout);

        var noFlow = Flowcert.AsProcess(w.Root.FullName, "solve", "merge.ograph", "--out", "merge.json", "--json");
        Assert.True(noFlow.ExitCode == 1, noFlow.ToString());
        Assert.Equal("noflow", (string?)JObject.Parse(noFlow.Stdout)["verdict"]);

        var bad = Flowcert.AsProcess(w.Root.FullName, "solve", "broken.ograph", "--out", "broken.json");
        Assert.True(bad.ExitCode == 2, bad.ToString());
        Assert.StartsWith("flowcert: broken.ograph:3:10: ", bad.Stderr);
        Assert.Equal("", bad.Stdout);

        var composite = Flowcert.AsProcess(w.Root.FullName, "solve", "wire.ograph", "--field", "6", "--out", "six.json");
        Assert.True(composite.ExitCode == 2, composite.ToString());
        Assert.Contains("\"Composite dimensions\"", composite.Stderr);

        w.AssertExactly("wire.ograph", "merge.ograph", "broken.ograph", "wire.json", "merge.json");

        // The same certificates as an in-process run.
        Assert.Equal(0, Flowcert.InProcess("solve", w.PathOf("wire.ograph"), "--out", w.PathOf("wire.in.json")).ExitCode);
        Assert.Equal(1, Flowcert.InProcess("solve", w.PathOf("merge.ograph"), "--out", w.PathOf("merge.in.json")).ExitCode);
        Assert.Equal(w.Bytes("wire.json"), w.Bytes("wire.in.json"));
        Assert.Equal(w.Bytes("merge.json"), w.Bytes("merge.in.json"));
    }

    [Fact]
    public void TheDemoAsARealProcess()
    {
        using var w = new Workspace();
        var run = Flowcert.AsProcess(w.Root.FullName, "demo", "--out-dir", "out");
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Equal("", run.Stderr);
        Assert.Equal(0, Flowcert.InProcess("demo", "--out-dir", w.PathOf("in")).ExitCode);
        var files = Directory.GetFiles(w.PathOf("in")).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray();
        Assert.Equal(files, Directory.GetFiles(w.PathOf("out")).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray());
        Assert.All(files, f => Assert.Equal(w.Bytes("in/" + f), w.Bytes("out/" + f)));
        Assert.DoesNotContain(w.Listing(), f => f.EndsWith(".tmp"));
    }
}
