namespace FlowCert.Tests.Drawing;

/// <summary>Runs Graphviz's dot (Debian package graphviz) on DOT text and returns the SVG it draws.</summary>
internal static class Graphviz
{
    /// <summary>Fails the test unless dot accepts the text without a word on stderr.</summary>
    public static string ToSvg(string dot)
    {
        var path = Path.GetTempFileName();
        try
        {
            File.WriteAllText(path, dot);
            var outcome = ExternalProgram.Run("dot", "graphviz", ["-Tsvg", path]);
            Assert.True(outcome.ExitCode == 0 && outcome.Stderr.Length == 0, $"dot refused the file: {outcome.Stderr}\n{dot}");
            return outcome.Stdout;
        }
        finally { File.Delete(path); }
    }
}
