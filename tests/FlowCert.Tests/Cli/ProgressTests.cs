using FlowCert.Algebra;
using FlowCert.Cli;
using FlowCert.Flows;
using FlowCert.Graphs;

namespace FlowCert.Tests.Cli;

/// <summary>
/// Progress of long runs: the solver reports after every layer through IProgress (the library writes
/// nothing itself); the command line draws one erasable line on a terminal only (common practice for
/// terminal progress lines: carriage return, no newline, blanked at the end).
/// </summary>
public class ProgressTests
{
    private sealed class Recorder : IProgress<SolveProgress>
    {
        public List<SolveProgress> Seen { get; } = [];
        public void Report(SolveProgress value) => Seen.Add(value);
    }

    [Theory]
    [InlineData(FlowKind.General)]
    [InlineData(FlowKind.Causal)]
    public void TheSolverReportsEveryLayerUntilAllNodesAreProcessed(FlowKind kind)
    {
        // A 3 x 5 lattice, inputs on the left column, outputs on the right: a flow of depth 4.
        var g = OgraphReader.Parse(Lattice(3, 5), "lattice.ograph");
        var recorder = new Recorder();
        var result = FlowSolver.Solve(g, FieldSpec.Rationals, kind, recorder);
        Assert.True(result.HasFlow);
        Assert.Equal(result.Depth, recorder.Seen.Count);
        Assert.Equal(Enumerable.Range(1, result.Depth), recorder.Seen.Select(p => p.Layers));
        Assert.All(recorder.Seen, p => Assert.Equal(15, p.NodeCount));
        // Outputs count as processed from the start; each layer adds its nodes, the last one reaches every node.
        var processed = g.Outputs.Count;
        for (int k = 0; k < result.Depth; k++)
        {
            processed += result.Rounds[result.Depth - 1 - k].Count;
            Assert.Equal(processed, recorder.Seen[k].NodesProcessed);
        }
        Assert.Equal(15, recorder.Seen[^1].NodesProcessed);
    }

    [Fact]
    public void NoReportIsMadeWhenTheFirstLayerIsAlreadyBlocked()
    {
        // Two inputs and one output on a path: a - o - b has no flow (the output corrects only one of them).
        var g = OgraphReader.Parse("input a b\noutput o\nedge a o\nedge o b\n", "v.ograph");
        var recorder = new Recorder();
        Assert.False(FlowSolver.Solve(g, FieldSpec.Rationals, FlowKind.General, recorder).HasFlow);
        Assert.Empty(recorder.Seen);
    }

    [Fact]
    public void TheTerminalLineIsRedrawnInPlaceAndErasedAtTheEnd()
    {
        var terminal = new StringWriter();
        var progress = new TerminalProgress(terminal, "flowcert solve", "reading g.ograph", Timeout.Infinite);
        progress.Draw();
        progress.Report(new SolveProgress(3, 1234, 5000));
        progress.Draw();
        progress.Dispose();
        var parts = terminal.ToString().Split('\r');
        Assert.Equal("", parts[0]);
        Assert.StartsWith("flowcert solve: reading g.ograph, ", parts[1]);
        Assert.StartsWith("flowcert solve: layer 3, 1,234 of 5,000 nodes, ", parts[2]);
        Assert.All(parts[1..3], p => Assert.Equal(79, p.Length));
        Assert.Equal(new string(' ', 79), parts[3]);
        Assert.Equal("", parts[4]);
        Assert.DoesNotContain("\n", terminal.ToString());
    }

    [Fact]
    public void NothingIsWrittenWhenTheLineWasNeverDrawn()
    {
        var terminal = new StringWriter();
        new TerminalProgress(terminal, "flowcert solve", "solving", Timeout.Infinite).Dispose();
        Assert.Equal("", terminal.ToString());
    }

    [Fact]
    public void QuietAndJsonRunsAndRedirectedStandardErrorShowNoProgress()
    {
        using var w = new Workspace();
        var graph = w.Write("lattice.ograph", Lattice(3, 5));
        foreach (var extra in new[] { new[] { "--quiet" }, ["--json"], [] })
        {
            var run = Flowcert.InProcess(["solve", graph, .. extra]);
            Assert.True(run.ExitCode == 0, run.ToString());
            Assert.Equal("", run.Stderr);
        }
    }

    private static string Lattice(int rows, int columns)
    {
        var text = new System.Text.StringBuilder();
        text.Append("input").AppendJoin("", Enumerable.Range(0, rows).Select(r => $" r{r}c0")).Append('\n');
        text.Append("output").AppendJoin("", Enumerable.Range(0, rows).Select(r => $" r{r}c{columns - 1}")).Append('\n');
        for (int r = 0; r < rows; r++)
            for (int c = 0; c < columns; c++)
            {
                if (c + 1 < columns) text.Append($"edge r{r}c{c} r{r}c{c + 1}\n");
                if (r + 1 < rows) text.Append($"edge r{r}c{c} r{r + 1}c{c}\n");
            }
        return text.ToString();
    }
}
