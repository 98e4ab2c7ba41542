namespace FlowCheck;

/// <summary>The command line: flowcheck CERT [--graph GRAPH]. Exit 0 valid, 1 invalid, 2 unreadable input.</summary>
public static class Program
{
    public const string Usage = "usage: flowcheck CERT [--graph GRAPH] | --help | --version";

    public static int Main(string[] args) => Run(args, Console.Out, Console.Error);

    public static int Run(string[] args, TextWriter stdout, TextWriter stderr)
    {
        if (args is ["--help" or "-h"])
        {
            stdout.WriteLine(Usage);
            stdout.WriteLine("Checks a flowcert certificate: exit 0 valid, 1 invalid, 2 unreadable input.");
            stdout.WriteLine("--graph GRAPH: the certificate must be about exactly this .ograph file.");
            return 0;
        }
        if (args is ["--version"])
        {
            stdout.WriteLine($"flowcheck {typeof(Program).Assembly.GetName().Version?.ToString(3)}");
            return 0;
        }
        if (Arguments(args) is not var (certPath, graphPath))
        {
            stderr.WriteLine(Usage);
            return 2;
        }
        try
        {
            var fileGraph = graphPath is null ? null : OgraphReader.Read(graphPath);
            foreach (var line in Certificate.Check(Json.Load(certPath), fileGraph, graphPath)) stdout.WriteLine(line);
            return 0;
        }
        catch (InvalidCertificate e)
        {
            stdout.WriteLine($"invalid: {OneLine(e.Message)}");
            return 1;
        }
        catch (UnreadableInput e)
        {
            stderr.WriteLine($"unreadable: {OneLine(e.Message)}");
            return 2;
        }
    }

    /// <summary>Control characters from the input (a newline in a name, say) are shown as \uXXXX escapes.</summary>
    static string OneLine(string message) =>
        string.Concat(message.Select(ch => char.IsControl(ch) ? $"\\u{(int)ch:x4}" : ch.ToString()));

    /// <summary>One certificate path and at most one --graph option; null for anything else.</summary>
    static (string Cert, string? Graph)? Arguments(string[] args)
    {
        string? cert = null, graph = null;
        for (var i = 0; i < args.Length; i++)
        {
            if (args[i] == "--graph" && i + 1 < args.Length && graph is null) graph = args[++i];
            else if (!args[i].StartsWith('-') && cert is null) cert = args[i];
            else return null;
        }
        return cert is null ? null : (cert, graph);
    }
}
