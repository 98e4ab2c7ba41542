using System.CommandLine;
using System.Globalization;
using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Graphs;
using FlowCert.Schedules;
using FlowCert.Simulation;

namespace FlowCert.Cli;

/// <summary>
/// <c>flowcert simulate GRAPH --cert CERT [--dim P] [--seed N] [--branches all|K]</c>: runs the certificate's
/// pattern on a state vector and says whether every outcome branch implements the same map.
/// </summary>
public static class SimulateCommand
{
    public static Command Create(TextWriter stdout, TextWriter stderr)
    {
        var graph = new Argument<string>("GRAPH") { Description = "the open graph (.ograph) the certificate is about" };
        var cert = new Option<string>("--cert") { Description = "a flow certificate over F_p (JSON)", Required = true };
        var dim = new Option<int?>("--dim") { Description = "qudit dimension; must equal the certificate's prime (the default)" };
        var seed = new Option<ulong>("--seed") { Description = "seed of the random angles, input state and sampled branches", DefaultValueFactory = _ => 1 };
        var branches = new Option<string>("--branches") { Description = "all (every outcome string) or K (K random ones plus the all-zero one)", DefaultValueFactory = _ => "all" };
        var cmd = new Command("simulate", "Simulate the pattern of a flow certificate over qudits; exit 0 deterministic, 1 outcome-dependent, 2 bad input") { graph, cert, dim, seed, branches };
        cmd.SetAction(p => Execute(p.GetValue(graph)!, p.GetValue(cert)!, p.GetValue(dim), p.GetValue(seed), p.GetValue(branches)!, stdout, stderr));
        return cmd;
    }

    public static int Execute(string graphPath, string certPath, int? dim, ulong seed, string branchText, TextWriter o, TextWriter stderr)
    {
        var selection = ParseBranches(branchText, seed);
        if (dim is { } d && (d < 2 || !Primality.IsPrime((ulong)d)))
            throw new UserInputException($"--dim {d} is not a prime: qudit flows are defined for prime dimensions (see the README section \"Composite dimensions\").");
        var graph = OgraphReader.ReadFile(graphPath);
        var result = ScheduleCommand.Read(certPath);
        if (CanonicalForm.Sha256(graph) != CanonicalForm.Sha256(result.Graph))
            throw new UserInputException($"{graphPath} and {certPath} describe different graphs (canonical SHA-256 {CanonicalForm.Sha256(graph)[..12]}... and {CanonicalForm.Sha256(result.Graph)[..12]}...)");
        QuditPattern pattern;
        DeterminismReport report;
        try
        {
            pattern = QuditPattern.FromFlow(result, dim, seed);
            foreach (var problem in pattern.Violations) stderr.WriteLine($"flowcert: warning: {certPath}: {problem}");
            report = PatternSimulator.Run(pattern, selection);
        }
        catch (Exception e) when (e is SimulationException or ScheduleException) { throw new UserInputException($"{certPath}: {e.Message}"); }
        Write(o, graphPath, certPath, result.Field.Name, pattern, report, selection, seed);
        return report.Deterministic ? ExitCode.Flow : ExitCode.NoFlow;
    }

    private static BranchSelection ParseBranches(string text, ulong seed)
    {
        if (text == "all") return BranchSelection.All;
        if (int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out var k)) return BranchSelection.Sample(k, seed);
        throw new UserInputException($"'{text}' is not a branch selection: write all, or a number K of random branches.");
    }

    private static void Write(TextWriter o, string graphPath, string certPath, string field, QuditPattern pattern, DeterminismReport r, BranchSelection selection, ulong seed)
    {
        static string G(double x) => x.ToString("0.###e+0", CultureInfo.InvariantCulture);
        var g = pattern.Graph;
        o.WriteLine($"pattern      {graphPath} with {certPath}: {field}, {r.MeasuredNodes} measured node(s), {g.Outputs.Count} output(s)");
        o.WriteLine($"state        dimension {r.Dimension}: {r.Qudits} qudits + {r.ReferenceQudits} reference = {r.Amplitudes} amplitudes");
        o.WriteLine($"randomness   seed {seed}: a random diagonal unitary D per measured node, one random input state");
        o.WriteLine(r.Exhaustive
            ? $"branches     {r.BranchesCompared} of {r.TotalBranches:0} (every outcome string)"
            : $"branches     {r.BranchesCompared} of {r.TotalBranches:0} ({selection.SampleSize} sampled, duplicates merged, plus the all-zero one)");
        var worst = r.WorstBranch is { } w ? " at raw outcomes " + string.Join(" ", pattern.Order.Select(v => $"{g.Names[v]}={w[v]}")) : "";
        o.WriteLine($"deviation    largest |M_s - e^(it) M_0| / N = {G(r.MaxDeviation)}{worst}");
        o.WriteLine($"probability  per branch for the random input: min {G(r.MinProbability)}, max {G(r.MaxProbability)}, relative spread {G(r.RelativeSpread)}" +
            (r.Exhaustive ? $"; sum {r.ProbabilitySum.ToString("0.############", CultureInfo.InvariantCulture)}" : ""));
        o.WriteLine(r.Deterministic
            ? $"verdict      deterministic: every branch gives the all-zero branch's map up to a phase, with equal probability (tolerance {G(DeterminismReport.Tolerance)})"
            : $"verdict      outcome-dependent: some branch differs from the all-zero branch beyond {G(DeterminismReport.Tolerance)}");
    }
}
