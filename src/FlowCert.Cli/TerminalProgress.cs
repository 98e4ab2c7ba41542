using System.Diagnostics;
using FlowCert.Flows;

namespace FlowCert.Cli;

/// <summary>
/// One progress line on standard error when it is a terminal: what the command is doing and the time so
/// far, drawn by a timer once the run has taken a second, redrawn five times a second, erased at the end.
/// </summary>
internal sealed class TerminalProgress : IProgress<SolveProgress>, IDisposable
{
    private readonly TextWriter terminal;
    private readonly string command;
    private readonly Stopwatch clock = Stopwatch.StartNew();
    private readonly Timer timer;
    private readonly object gate = new();
    private volatile string status;
    private bool shown, done;

    /// <summary>Starts the clock; the first line is drawn after <paramref name="delayMs"/> (never with <see cref="Timeout.Infinite"/>, for tests that call <see cref="Draw"/>).</summary>
    public TerminalProgress(TextWriter terminal, string command, string status, int delayMs = 1000)
    {
        (this.terminal, this.command, this.status) = (terminal, command, status);
        timer = new Timer(_ => Draw(), null, delayMs, delayMs == Timeout.Infinite ? Timeout.Infinite : 200);
    }

    /// <summary>The step now running, such as "reading g.ograph".</summary>
    public void Phase(string text) => status = text;

    /// <summary>Called by the solver after each layer.</summary>
    public void Report(SolveProgress p) => status = $"layer {p.Layers:N0}, {p.NodesProcessed:N0} of {p.NodeCount:N0} nodes";

    /// <summary>Draws the line now (the timer calls this).</summary>
    internal void Draw()
    {
        lock (gate)
        {
            if (done) return;
            var line = $"{command}: {status}, {clock.Elapsed.TotalSeconds:F1} s";
            terminal.Write("\r" + (line.Length > 79 ? line[..79] : line.PadRight(79)));
            terminal.Flush();
            shown = true;
        }
    }

    public void Dispose()
    {
        lock (gate)
        {
            if (done) return;
            done = true;
            timer.Dispose();
            if (shown) terminal.Write("\r" + new string(' ', 79) + "\r");
            terminal.Flush();
        }
    }
}
