using System.CommandLine;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;

namespace FlowCert.Cli;

/// <summary><c>flowcert convert IN --out OUT [--inputs NAMES] [--outputs NAMES]</c> (or <c>convert IN OUT</c>, the older spelling): from one graph format to another, by extension.</summary>
public static class ConvertCommand
{
    /// <summary>The --inputs option shared by every command that reads a graph file.</summary>
    public static Option<string?> InputsOption() => new("--inputs")
        { Description = "inputs of a .g6, .s6 or .mtx graph: node names separated by commas or spaces" };

    /// <summary>The --outputs option shared by every command that reads a graph file.</summary>
    public static Option<string?> OutputsOption() => new("--outputs")
        { Description = "outputs of a .g6, .s6 or .mtx graph: node names separated by commas or spaces" };

    public static Command Create(TextWriter stdout)
    {
        var input = new PathArgument("IN") { Description = "graph to read: .ograph, .g6, .s6, .mtx or .json" };
        var output = new PathArgument("OUT") { Description = "graph to write (the older spelling of --out)", Arity = System.CommandLine.ArgumentArity.ZeroOrOne };
        var outOption = new PathOption("--out") { Description = "graph to write: .ograph (canonical form), .g6, .s6, .mtx, .json or .dot" };
        var inputs = InputsOption();
        var outputs = OutputsOption();
        var cmd = new Command("convert", "Convert a graph between file formats, chosen by the file extensions") { input, output, outOption, inputs, outputs };
        cmd.SetAction(p =>
        {
            string? positional = p.GetValue(output), option = p.GetValue(outOption);
            if (positional is not null && option is not null && positional != option)
                throw new UserInputException($"two outputs given ({positional} and --out {option}): give one, with --out");
            var target = option ?? positional ?? throw new UserInputException("convert needs the file to write: flowcert convert IN --out OUT");
            return Execute(p.GetValue(input)!, target, p.GetValue(inputs), p.GetValue(outputs), stdout);
        });
        return cmd;
    }

    public static int Execute(string inPath, string outPath, string? inputs, string? outputs, TextWriter stdout)
    {
        var format = GraphFiles.FormatOf(outPath);
        var g = GraphInput.Read(inPath, inputs, outputs);
        // The canonical form carries no position hints (docs/formats.md), so .ograph output is exactly it.
        var text = format == GraphFileFormat.Ograph ? Graphs.CanonicalForm.Write(g) : GraphFiles.Write(g, format);
        SafeFile.WriteAllText(outPath, text, inPath);
        stdout.WriteLine($"wrote {Escaped.Of(outPath)}: {Counted.Of(g.NodeCount, "node")}, {Counted.Of(g.Edges.Count, "edge")}, {Counted.Of(g.Inputs.Count, "input")}, {Counted.Of(g.Outputs.Count, "output")}" + TerminalsNote(g, format));
        return ExitCode.Flow;
    }

    /// <summary>A reminder when a file cannot hold the inputs and outputs it was written with.</summary>
    public static string TerminalsNote(Graphs.OpenGraph g, GraphFileFormat format)
        => format is GraphFileFormat.Graph6 or GraphFileFormat.Sparse6 or GraphFileFormat.MatrixMarket && g.Inputs.Count + g.Outputs.Count > 0
            ? " (this format keeps no inputs or outputs: name them with --inputs and --outputs when reading it)"
            : "";
}
