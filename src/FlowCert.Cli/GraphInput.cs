using System.Text;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;

namespace FlowCert.Cli;

/// <summary>
/// The graph a command reads: a file by its extension, or "-" for standard input, whose format is
/// recognised from its first characters (<see cref="GraphFiles.Detect"/>).
/// </summary>
public static class GraphInput
{
    /// <summary>The name standard input has in messages.</summary>
    public const string StandardInputName = "standard input";

    /// <summary>How the graph's source is named in output: the path, or "standard input" for "-".</summary>
    public static string NameOf(string path) => IsStandardInput(path) ? StandardInputName : path;

    /// <summary>True for the file name "-".</summary>
    public static bool IsStandardInput(string path) => path == "-";

    /// <summary>Reads the graph at <paramref name="path"/>, or from standard input for "-".</summary>
    public static OpenGraph Read(string path, string? inputs, string? outputs)
    {
        if (!IsStandardInput(path)) return GraphFiles.Read(path, inputs, outputs);
        var text = ReadAll(Terminal.In);
        return GraphFiles.Parse(text, StandardInputName, GraphFiles.Detect(text), inputs, outputs);
    }

    // Everything on standard input, refused above the limit files read whole have.
    private static string ReadAll(TextReader reader)
    {
        var sb = new StringBuilder();
        var buffer = new char[1 << 16];
        int n;
        while ((n = reader.Read(buffer, 0, buffer.Length)) > 0)
        {
            if (sb.Length + (long)n > InputText.MaxBytes)
                throw new UserInputException($"{StandardInputName}: more than {InputText.MaxBytes} characters; give a file instead (.ograph files are streamed without a limit)");
            sb.Append(buffer, 0, n);
        }
        return sb.ToString();
    }
}
