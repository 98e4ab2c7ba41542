using System.Diagnostics;

namespace FlowCheck;

/// <summary>The command line: flowcheck CERT [--graph GRAPH] [--quiet]. Exit 0 valid, 1 invalid, 2 unreadable input.</summary>
public static class Program
{
    public const string Usage = "usage: flowcheck CERT [--graph GRAPH] [--quiet] | --help | --version";

    public static int Main(string[] args) => Run(args, Console.Out, Console.Error, !Console.IsErrorRedirected);

    /// <summary>Runs the checker; <paramref name="terminal"/> (standard error is a terminal) allows progress lines.</summary>
    public static int Run(string[] args, TextWriter stdout, TextWriter stderr, bool terminal = false)
    {
        if (args is ["--help" or "-h"])
        {
            foreach (var text in new[] { Usage, "Checks a flowcert certificate: exit 0 valid, 1 invalid, 2 unreadable input.",
                "--graph GRAPH: the certificate must be about exactly this .ograph file.", "--quiet: no progress lines on a terminal." }) stdout.WriteLine(text);
            return 0;
        }
        if (args is ["--version"]) { stdout.WriteLine($"flowcheck {typeof(Program).Assembly.GetName().Version?.ToString(3)}"); return 0; }
        if (Arguments(args.Where(a => a != "--quiet").ToArray()) is not var (certPath, graphPath))
        { stderr.WriteLine(Usage); return 2; }
        var progress = new Progress(terminal && !args.Contains("--quiet") ? stderr : null);
        try
        {
            var fileGraph = graphPath is null ? null : OgraphReader.Read(graphPath);
            using var json = new Json(certPath, progress);
            var lines = Certificate.Check(json, fileGraph, graphPath, progress);
            progress.Done();
            foreach (var line in lines) stdout.WriteLine(line);
            return 0;
        }
        catch (InvalidCertificate e) { progress.Done(); stdout.WriteLine($"invalid: {OneLine(e.Message)}"); return 1; }
        catch (UnreadableInput e) { progress.Done(); stderr.WriteLine($"unreadable: {OneLine(e.Message)}"); return 2; }
    }

    /// <summary>Control characters from the input (a newline in a name, say) are shown as \uXXXX escapes.</summary>
    static string OneLine(string message) =>
        string.Concat(message.Select(ch => char.IsControl(ch) ? $"\\u{(int)ch:x4}" : ch.ToString()));

    /// <summary>One certificate path and at most one --graph option; null for anything else.</summary>
    static (string Cert, string? Graph)? Arguments(string[] args)
    {
        string? cert = null, graph = null;
        for (var i = 0; i < args.Length; i++)
            if (args[i] == "--graph" && i + 1 < args.Length && graph is null) graph = args[++i];
            else if (!args[i].StartsWith('-') && cert is null) cert = args[i];
            else return null;
        return cert is null ? null : (cert, graph);
    }
}

/// <summary>One progress line on a terminal's standard error, shown once a run has taken a second, redrawn at
/// most five times a second and erased at the end; silent when <paramref name="terminal"/> is null.</summary>
public sealed class Progress(TextWriter? terminal)
{
    readonly Stopwatch clock = Stopwatch.StartNew();
    long shown = -1;

    /// <summary>True when a line is due (a terminal, a second gone, 200 ms since the last one); the caller then calls <see cref="Show"/>.</summary>
    public bool Due => terminal is not null && clock.ElapsedMilliseconds >= 1000 && clock.ElapsedMilliseconds - shown >= 200;

    public void Show(string what)
    {
        shown = clock.ElapsedMilliseconds;
        terminal!.Write($"\r{$"flowcheck: {what}, {shown / 1000.0:F1} s elapsed",-79}");
    }

    public void Done() { if (shown >= 0) terminal!.Write("\r" + new string(' ', 79) + "\r"); shown = -1; }
}
