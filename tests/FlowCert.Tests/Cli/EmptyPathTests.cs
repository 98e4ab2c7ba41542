namespace FlowCert.Tests.Cli;

/// <summary>
/// Every file or folder argument of every command, given as an empty string, is bad input: exit 2, one
/// line on standard error that says which one is empty, nothing on standard output and nothing written.
/// </summary>
public class EmptyPathTests
{
    private const string Graph = "wire.ograph", Cert = "wire.F3.json";

    /// <summary>Each case: the arguments (GRAPH and CERT stand for real files) and the name the message must give.</summary>
    public static TheoryData<string[], string> Cases() => new()
    {
        { ["solve", ""], "GRAPH" },
        { ["solve", Graph, "--out", ""], "--out" },
        { ["demo", "--out-dir", ""], "--out-dir" },
        { ["schedule", ""], "CERT" },
        { ["schedule", Cert, "--out", ""], "--out" },
        { ["simulate", "", "--cert", Cert], "GRAPH" },
        { ["simulate", Graph, "--cert", ""], "--cert" },
        { ["draw", "", "--out", "p.svg"], "GRAPH" },
        { ["draw", Graph, "--cert", "", "--out", "p.svg"], "--cert" },
        { ["draw", Graph, "--out", ""], "--out" },
        { ["convert", "", "copy.ograph"], "IN" },
        { ["convert", Graph, ""], "OUT" },
        { ["generate", "line", "--size", "3", "--out", ""], "--out" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void AnEmptyPathIsBadInputWithAOneLineMessage(string[] args, string name)
    {
        using var w = new Workspace();
        var graph = w.Write(Graph, "input a\noutput c\nedge a b\nedge b c\n");
        Assert.Equal(0, Flowcert.InProcess("solve", graph, "--field", "3", "--out", w.PathOf(Cert)).ExitCode);
        var actual = args.Select(a => a is Graph or Cert ? w.PathOf(a) : a is "p.svg" or "copy.ograph" ? w.PathOf(a) : a).ToArray();

        var run = Flowcert.InProcess(actual);
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Equal("", run.Stdout);
        Assert.Equal($"flowcert: {name} is empty: give a file or folder name.\n", run.Stderr.ReplaceLineEndings("\n"));
        w.AssertExactly(Graph, Cert);
    }
}
