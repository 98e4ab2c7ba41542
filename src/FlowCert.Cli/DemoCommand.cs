using System.CommandLine;
using FlowCert.Certificates;
using FlowCert.Demo;
using FlowCert.Flows;

namespace FlowCert.Cli;

/// <summary><c>flowcert demo [--out-dir DIR]</c>: the built-in scenario, solved and certified.</summary>
public static class DemoCommand
{
    public static Command Create(TextWriter stdout)
    {
        var outDir = new PathOption("--out-dir") { Description = "folder for the demo graphs and certificates", DefaultValueFactory = _ => "flowcert-demo" };
        var cmd = new Command("demo", "Solve the built-in Merrow Reach designs over Q, F2, F3 and F5 and write their certificates") { outDir };
        cmd.SetAction(p => Execute(p.GetValue(outDir)!, stdout));
        return cmd;
    }

    public static int Execute(string outDir, TextWriter o)
    {
        Directory.CreateDirectory(outDir);
        o.WriteLine("Merrow Reach lab (a fictional team): which of this week's designs run deterministically?");
        o.WriteLine();
        int written = 0;
        foreach (var design in DemoScenario.Designs())
        {
            var g = design.Graph;
            SafeFile.WriteAllText(Path.Combine(outDir, design.Name + ".ograph"), design.Text);
            o.WriteLine($"{design.Name}: {g.NodeCount} nodes, {g.Edges.Count} edges, inputs {string.Join(" ", g.SortedInputs.Select(v => g.Names[v]))}, outputs {string.Join(" ", g.SortedOutputs.Select(v => g.Names[v]))}");
            foreach (var field in design.Fields)
            {
                var cells = new List<string>();
                foreach (var kind in DemoScenario.Kinds)
                {
                    FlowResult r;
                    try { r = FlowSolver.Solve(g, field, kind); }
                    catch (WeightNotInFieldException e) { cells.Add($"{CertificateWriter.KindName(kind)}: undefined ({e.Message})"); continue; }
                    var file = $"{design.Name}.{field.Name}.{CertificateWriter.KindName(kind)}.json";
                    SafeFile.WriteAllText(Path.Combine(outDir, file), CertificateWriter.Write(r));
                    written++;
                    cells.Add(r.Obstruction is { } b
                        ? $"{CertificateWriter.KindName(kind)}: no flow, blocked {{{string.Join(" ", b.Nodes.Select(v => g.Names[v]))}}}"
                        : $"{CertificateWriter.KindName(kind)}: depth {r.Depth}");
                    if (kind == FlowKind.General && r.VanishedEdges.Count > 0)
                        cells[^1] += $" ({r.VanishedEdges.Count} edge(s) vanish in {field.Name})";
                }
                o.WriteLine($"  {field.Name,-3} {string.Join(" | ", cells)}");
            }
            o.WriteLine();
        }
        o.WriteLine($"{written} certificates written to {outDir}/ ; check one with: dotnet run --project checker/FlowCheck -- {outDir}/splitter-pair.Q.general.json");
        return ExitCode.Flow;
    }
}
