namespace FlowCert.Cli;

/// <summary>
/// The standard input and error of the run in progress (CliApp.Run sets them on its thread, so tests can
/// run commands in parallel in-process): for reading a graph from "-" and for warnings.
/// </summary>
public static class Terminal
{
    [ThreadStatic] private static TextReader? input;
    [ThreadStatic] private static TextWriter? error;

    /// <summary>Standard input of this run.</summary>
    public static TextReader In { get => input ?? Console.In; set => input = value; }

    /// <summary>Standard error of this run.</summary>
    public static TextWriter Error { get => error ?? Console.Error; set => error = value; }

    /// <summary>Writes one warning in the one shape every command uses: <c>flowcert: warning: ...</c> on standard error.</summary>
    public static void Warn(string text, TextWriter? to = null) => (to ?? Error).WriteLine($"flowcert: warning: {Escaped.Of(text)}");
}
