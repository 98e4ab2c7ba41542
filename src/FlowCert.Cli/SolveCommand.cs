using System.CommandLine;
using System.Diagnostics;
using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using Newtonsoft.Json;

namespace FlowCert.Cli;

/// <summary><c>flowcert solve GRAPH [--field Q|P] [--flow general|causal] [--out CERT] [--format text|json]</c> (<c>--json</c> is the older spelling of <c>--format json</c>).</summary>
public static class SolveCommand
{
    public static Command Create(TextWriter stdout)
    {
        var graph = new PathArgument("GRAPH") { Description = "the open graph: .ograph, .g6, .s6, .mtx or .json" };
        var inputs = ConvertCommand.InputsOption();
        var outputs = ConvertCommand.OutputsOption();
        var field = new Option<string>("--field") { Description = "Q (rationals, continuous variables) or a prime p (qudits of dimension p)", DefaultValueFactory = _ => "Q" };
        var flow = new Option<string>("--flow") { Description = "general, causal or pauli (pauli and measurement labels need --field 2)", DefaultValueFactory = _ => "general" };
        var labels = ConvertCommand.LabelsOption();
        var output = new PathOption("--out") { Description = "write the certificate (JSON) to this file" };
        var format = new Option<string>("--format") { Description = "text (the summary) or json (one JSON object)", DefaultValueFactory = _ => "text" };
        var json = new Option<bool>("--json") { Description = "the same as --format json (the older spelling)" };
        var quiet = new Option<bool>("--quiet") { Description = "no progress line on a terminal (none is shown with --format json or when standard error is not a terminal)" };
        var cmd = new Command("solve", "Find a minimum-depth flow or prove there is none; exit 0 flow, 1 no flow, 2 bad input") { graph, field, flow, output, format, json, inputs, outputs, quiet, labels };
        cmd.SetAction(p =>
        {
            var asJson = OutputFormat.IsJson(p.GetValue(format)!, p.GetValue(json));
            return Execute(p.GetValue(graph)!, p.GetValue(field)!, p.GetValue(flow)!, p.GetValue(output), asJson, stdout, p.GetValue(inputs), p.GetValue(outputs),
                p.GetValue(quiet) || asJson || Console.IsErrorRedirected ? null : Console.Error, p.GetValue(labels));
        });
        return cmd;
    }

    /// <summary>Runs the command; <paramref name="terminal"/> (standard error, when it is a terminal) gets a progress line.</summary>
    public static int Execute(string graphPath, string fieldText, string flowText, string? outPath, bool json, TextWriter stdout,
        string? inputs = null, string? outputs = null, TextWriter? terminal = null, string? labels = null)
    {
        var spec = FieldSpec.Parse(fieldText);
        var kind = CliApp.ParseKind(flowText);
        var clock = Stopwatch.StartNew();
        double parseSeconds, solveSeconds, writeSeconds;
        FlowResult result;
        using (var progress = terminal is null ? null : new TerminalProgress(terminal, "flowcert solve", $"reading {GraphInput.NameOf(graphPath)}"))
        {
            var g = GraphInput.Read(graphPath, inputs, outputs, labels);
            parseSeconds = clock.Elapsed.TotalSeconds;
            if (g.Inputs.Count == 0 && g.Outputs.Count == 0 && g.NodeCount > 0)
                Terminal.Warn($"{GraphInput.NameOf(graphPath)}: no terminals were given (no inputs and no outputs), so every node is measured; " +
                              "graph6, sparse6 and Matrix Market files carry none: name them with --inputs and --outputs");
            clock.Restart();
            progress?.Phase("solving");
            FlowResult Solve()
            {
                try { return FlowSolver.Solve(g, spec, kind, progress); }
                catch (WeightNotInFieldException e) { throw new UserInputException($"{GraphInput.NameOf(graphPath)}: {e.Message}"); }
                catch (UnsupportedLabelsException e) { throw new UserInputException($"{GraphInput.NameOf(graphPath)}: {e.Message}"); }
            }
            if (outPath is null)
            {
                result = Solve();
                solveSeconds = clock.Elapsed.TotalSeconds;
                writeSeconds = 0;
            }
            else
            {
                // The certificate's head (graph hash and graph block) does not depend on the answer: it is
                // written to the temporary file on another core while the solver runs.
                FlowResult? solved = null;
                double solving = 0;
                SafeFile.Write(outPath, w =>
                {
                    var head = Task.Run(() => CertificateWriter.WriteHead(g, spec, kind, w));
                    try { solved = Solve(); }
                    catch { try { head.Wait(); } catch (AggregateException) { } throw; }
                    solving = clock.Elapsed.TotalSeconds;
                    progress?.Phase($"writing {outPath}");
                    head.GetAwaiter().GetResult();
                    CertificateWriter.WriteBody(solved, w);
                }, labels is null ? [graphPath] : [graphPath, labels]);
                result = solved!;
                solveSeconds = solving;
                writeSeconds = clock.Elapsed.TotalSeconds - solving;
            }
        }
        if (json) WriteJson(stdout, result, parseSeconds, solveSeconds, writeSeconds);
        else Summary.Write(stdout, GraphInput.NameOf(graphPath), result, outPath);
        return result.HasFlow ? ExitCode.Flow : ExitCode.NoFlow;
    }

    private static void WriteJson(TextWriter stdout, FlowResult r, double parse, double solve, double write)
    {
        using var w = new JsonTextWriter(stdout) { Formatting = Formatting.None, CloseOutput = false };
        w.WriteStartObject();
        Summary.WriteVerdictJson(w, r);
        w.WritePropertyName("flow"); w.WriteValue(FlowKinds.Name(r.Kind));
        w.WritePropertyName("field"); w.WriteValue(r.Field.Name);
        w.WritePropertyName("nodes"); w.WriteValue(r.Graph.NodeCount);
        w.WritePropertyName("edges"); w.WriteValue(r.Graph.Edges.Count);
        w.WritePropertyName("measured"); w.WriteValue(r.Graph.NodeCount - r.Graph.Outputs.Count);
        w.WritePropertyName("vanishedEdges");
        w.WriteStartArray();
        foreach (var e in r.VanishedEdges)
        {
            w.WriteStartArray();
            w.WriteValue(r.Graph.Names[e.U]); w.WriteValue(r.Graph.Names[e.V]); w.WriteValue(e.Weight.ToString());
            w.WriteEndArray();
        }
        w.WriteEndArray();
        w.WritePropertyName("blocked"); if (r.Obstruction is null) w.WriteNull(); else w.WriteValue(r.Obstruction.Nodes.Count);
        w.WritePropertyName("graphSha256"); w.WriteValue(CanonicalForm.Sha256(r.Graph));
        w.WritePropertyName("seconds");
        w.WriteStartObject();
        w.WritePropertyName("parse"); w.WriteValue(Math.Round(parse, 6));
        w.WritePropertyName("solve"); w.WriteValue(Math.Round(solve, 6));
        w.WritePropertyName("write"); w.WriteValue(Math.Round(write, 6));
        w.WriteEndObject();
        w.WriteEndObject();
        w.Flush();
        stdout.WriteLine();
    }
}
