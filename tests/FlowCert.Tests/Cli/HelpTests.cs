namespace FlowCert.Tests.Cli;

/// <summary>Help is not an error: every command prints its usage and exits 0 (common practice for command-line tools).</summary>
public class HelpTests
{
    [Theory]
    [InlineData("solve")]
    [InlineData("demo")]
    [InlineData("schedule")]
    [InlineData("simulate")]
    [InlineData("generate")]
    [InlineData("convert")]
    [InlineData("draw")]
    public void EveryCommandPrintsItsHelpAndExitsZero(string command)
    {
        var run = Flowcert.InProcess(command, "--help");
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains(command, run.Stdout);
        Assert.DoesNotContain("internal error", run.Stderr);
    }

    [Fact]
    public void TheRootHelpListsEveryCommand()
    {
        var run = Flowcert.InProcess("--help");
        Assert.Equal(0, run.ExitCode);
        foreach (var c in new[] { "solve", "demo", "schedule", "simulate", "generate", "convert", "draw" })
            Assert.Contains(c, run.Stdout);
    }
}
