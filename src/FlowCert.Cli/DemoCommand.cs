using System.CommandLine;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using FlowCert.Certificates;
using FlowCert.Demo;
using FlowCert.Flows;
using FlowCert.Flows.Primes;
using FlowCert.Algebra.Factoring;

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
            o.WriteLine($"{design.Name}: {g.NodeCount} nodes, {g.Edges.Count} edges, inputs {string.Join(" ", g.SortedInputs.Select(v => g.Names[v]).Order(NaturalNameOrder.Instance))}, outputs {string.Join(" ", g.SortedOutputs.Select(v => g.Names[v]).Order(NaturalNameOrder.Instance))}");
            foreach (var field in design.Fields)
            {
                FlowResult[] results;
                try { results = DemoScenario.Kinds.Select(k => FlowSolver.Solve(g, field, k)).ToArray(); }
                catch (WeightNotInFieldException e) { o.WriteLine($"  {field.Name,-3} not defined: {e.Message}"); continue; }
                var cells = new List<string>();
                foreach (var r in results)
                {
                    var kind = FlowKinds.Name(r.Kind);
                    SafeFile.WriteAllText(Path.Combine(outDir, $"{design.Name}.{field.Name}.{kind}.json"), CertificateWriter.Write(r));
                    written++;
                    cells.Add(r.Obstruction is { } b
                        ? $"{kind}: no flow, blocked {{{string.Join(" ", b.Nodes.Select(v => g.Names[v]).Order(NaturalNameOrder.Instance))}}}"
                        : $"{kind}: depth {r.Depth}");
                }
                var vanished = results[0].VanishedEdges.Count;
                o.WriteLine($"  {field.Name,-3} {string.Join(" | ", cells)}{(vanished > 0 ? $"   ({Counted.Of(vanished, "edge")} {(vanished == 1 ? "vanishes" : "vanish")} in {field.Name})" : "")}");
            }
            o.WriteLine();
        }
        WritePrimeSurveyScene(outDir, o);
        o.Write(NoiseScene.Text());
        o.WriteLine();
        o.WriteLine($"{written} certificates written to {Escaped.Of(outDir)}/ ; check one with: dotnet run --project checker/FlowCheck -- {Escaped.Of(outDir)}/splitter-pair.Q.general.json");
        return ExitCode.Flow;
    }

    // The scene "choosing a prime dimension": one design surveyed over every prime (flowcert primes; docs/primes.md).
    private static void WritePrimeSurveyScene(string outDir, TextWriter o)
    {
        var design = DemoScenario.Designs().Single(d => d.Name == DemoScenario.PrimeSurveyDesign);
        o.WriteLine($"Choosing a prime dimension: the lab surveys {design.Name} over every prime at once (flowcert primes)");
        var survey = PrimeSurvey.Run(design.Graph, FlowKind.General, new FactoringBudget(TimeSpan.FromSeconds(PrimesCommand.DefaultFactorSeconds)));
        PrimesReport.WriteTable(o, Path.Combine(outDir, design.Name + ".ograph"), survey, null, []);
        o.WriteLine();
    }
}
