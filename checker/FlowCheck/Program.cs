using System.Diagnostics;

namespace FlowCheck;

/// <summary>The command line: flowcheck CERT [--graph GRAPH] [--quiet]. Exit 0 valid, 1 invalid, 2 unreadable input.</summary>
public static class Program
{
    public const string Usage = "usage: flowcheck CERT [--graph GRAPH] [--quiet] | --help | --version";

    // Stryker disable once Conditional: whether standard error is a terminal cannot be changed from a test
    public static int Main(string[] args) => Run(args, Console.Out, Console.Error, Console.IsErrorRedirected ? null : (1000, 200));

    /// <summary>Runs the checker; <paramref name="progress"/> is null when standard error is not a terminal, else how
    /// long a run goes before it shows a progress line there and how often the line is redrawn (milliseconds).</summary>
    public static int Run(string[] args, TextWriter stdout, TextWriter stderr, (long AfterMs, long EveryMs)? progress = null)
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
        var meter = new Progress(progress is not null && !args.Contains("--quiet") ? stderr : null, progress ?? (0, 0));
        try
        {
            var fileGraph = graphPath is null ? null : OgraphReader.Read(graphPath);
            using var json = new Json(certPath, meter);
            var lines = Certificate.Check(json, fileGraph, graphPath, meter);
            meter.Done();
            foreach (var line in lines) stdout.WriteLine(line);
            return 0;
        }
        catch (InvalidCertificate e) { meter.Done(); stdout.WriteLine($"invalid: {OneLine(e.Message)}"); return 1; }
        catch (UnreadableInput e) { meter.Done(); stderr.WriteLine($"unreadable: {OneLine(e.Message)}"); return 2; }
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

/// <summary>One progress line on a terminal's standard error, shown once a run has taken <c>AfterMs</c> (a second
/// from the command line), redrawn at most every <c>EveryMs</c> (200) and erased at the end; silent when
/// <paramref name="terminal"/> is null.</summary>
public sealed class Progress(TextWriter? terminal, (long AfterMs, long EveryMs) timing)
{
    readonly Stopwatch clock = Stopwatch.StartNew();
    long next = timing.AfterMs;
    bool shown;

    /// <summary>True when a line is due; the caller then calls <see cref="Show"/>.</summary>
    public bool Due => terminal is not null && clock.ElapsedMilliseconds >= next;

    public void Show(string what)
    {
        var now = clock.ElapsedMilliseconds;
        (next, shown) = (now + timing.EveryMs, true);
        terminal!.Write($"\r{$"flowcheck: {what}, {now / 1000.0:F1} s elapsed",-79}");
    }

    public void Done() { if (shown) terminal!.Write("\r" + new string(' ', 79) + "\r"); shown = false; }
}
