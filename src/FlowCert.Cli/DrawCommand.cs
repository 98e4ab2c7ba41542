using System.CommandLine;
using FlowCert.Certificates;
using FlowCert.Drawing;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;

namespace FlowCert.Cli;

/// <summary><c>flowcert draw GRAPH [CERT] --out FILE.svg|FILE.dot</c>: a picture of a graph, its flow or its blocked set.</summary>
public static class DrawCommand
{
    public static Command Create(TextWriter stdout)
    {
        var graph = new PathArgument("GRAPH") { Description = "the graph: .ograph, .g6, .s6, .mtx or .json" };
        var certArgument = CertificateArgument.Positional("a certificate of this graph: draw its rounds and corrections, or its blocked set");
        var cert = CertificateArgument.Option();
        var inputs = ConvertCommand.InputsOption();
        var outputs = ConvertCommand.OutputsOption();
        var output = new PathOption("--out") { Description = "the picture to write: .svg, or .dot for Graphviz", Required = true };
        var cmd = new Command("draw", "Draw a graph, and with a certificate its flow or proof of absence, as SVG or DOT") { graph, certArgument, cert, inputs, outputs, output };
        cmd.SetAction(p => Execute(p.GetValue(graph)!, CertificateArgument.Resolve(p.GetValue(certArgument), p.GetValue(cert)), p.GetValue(inputs), p.GetValue(outputs), p.GetValue(output)!, stdout));
        return cmd;
    }

    public static int Execute(string graphPath, string? certPath, string? inputs, string? outputs, string outPath, TextWriter stdout)
    {
        var extension = Path.GetExtension(outPath).ToLowerInvariant();
        if (extension is not (".svg" or ".dot"))
            throw new UserInputException($"{outPath}: a picture is written as .svg or .dot");
        var g = GraphInput.Read(graphPath, inputs, outputs);
        FlowResult? result = null;
        if (certPath is not null)
        {
            result = CertificateReader.ReadFile(certPath);
            if (CanonicalForm.Sha256(result.Graph) != CanonicalForm.Sha256(g))
                throw new UserInputException($"{certPath} is a certificate of another graph than {graphPath} (their canonical forms differ)");
            result = result with { Graph = g };
            Verify(result, certPath);
        }
        var title = FlowPicture.TitleFor(GraphInput.IsStandardInput(graphPath) ? GraphInput.StandardInputName : Path.GetFileName(graphPath), result);
        var text = extension == ".svg"
            ? SvgPicture.Write(PictureLayout.Arrange(g, result, title))
            : DotPicture.Write(g, result, title);
        SafeFile.WriteAllText(outPath, text, certPath is null ? [graphPath] : [graphPath, certPath]);
        stdout.WriteLine($"wrote {Escaped.Of(outPath)}");
        return ExitCode.Flow;
    }

    /// <summary>
    /// Refuses a certificate that is not valid before drawing it: a flow must pass the flow conditions
    /// (as schedule checks them); a proof of absence must agree with the solver, which finds no flow and
    /// the same blocked set (a referee checks the witnesses themselves with flowcheck).
    /// </summary>
    private static void Verify(FlowResult result, string certPath)
    {
        if (result.HasFlow)
        {
            try { Schedules.ScheduleBuilder.Build(result); }
            catch (Exception e) when (e is Schedules.ScheduleException or WeightNotInFieldException)
            { throw new UserInputException($"{certPath}: not drawn, the certificate is invalid: {e.Message}"); }
            return;
        }
        FlowResult again;
        try { again = FlowSolver.Solve(result.Graph, result.Field, result.Kind); }
        catch (WeightNotInFieldException e) { throw new UserInputException($"{certPath}: not drawn, the certificate is invalid: {e.Message}"); }
        if (again.HasFlow)
            throw new UserInputException($"{certPath}: not drawn, the certificate is invalid: it claims no flow, but a flow of depth {again.Depth} exists");
        if (!again.Obstruction!.Nodes.Order().SequenceEqual(result.Obstruction!.Nodes.Order()))
            throw new UserInputException($"{certPath}: not drawn, the certificate is invalid: its blocked set is not the one the solver finds");
    }
}
