using System.CommandLine;
using System.Globalization;
using FlowCert.Algebra;
using FlowCert.Certificates;
using FlowCert.Graphs;
using FlowCert.Graphs.Formats;
using FlowCert.Schedules;
using FlowCert.Simulation;

namespace FlowCert.Cli;

/// <summary>
/// <c>flowcert simulate GRAPH CERT [--inputs NAMES] [--outputs NAMES] [--field P] [--seed N] [--branches all|K]</c>: runs the certificate's
/// pattern on a state vector and says whether every outcome branch implements the same map.
/// </summary>
public static class SimulateCommand
{
    public static Command Create(TextWriter stdout, TextWriter stderr)
    {
        var graph = new PathArgument("GRAPH") { Description = "the open graph the certificate is about: .ograph, .g6, .s6, .mtx or .json" };
        var inputs = ConvertCommand.InputsOption();
        var outputs = ConvertCommand.OutputsOption();
        var certArgument = CertificateArgument.Positional("a flow certificate over F_p (JSON)");
        var cert = CertificateArgument.Option();
        var dim = new Option<string?>("--field", "--dim") { Description = "qudit dimension, a prime; must equal the certificate's prime (the default; --dim is the older spelling)" };
        var seed = new SeedOption("seed of the random angles, input state and sampled branches", 1);
        var branches = new Option<string>("--branches") { Description = "all (every outcome string) or K (K random ones plus the all-zero one)", DefaultValueFactory = _ => "all" };
        var cmd = new Command("simulate", "Simulate the pattern of a flow certificate over qudits; exit 0 deterministic, 1 outcome-dependent, 2 bad input") { graph, certArgument, cert, inputs, outputs, dim, seed, branches };
        cmd.SetAction(p => Execute(p.GetValue(graph)!,
            CertificateArgument.Resolve(p.GetValue(certArgument), p.GetValue(cert)) ?? throw new UserInputException("simulate needs a certificate: flowcert simulate GRAPH CERT"),
            p.GetResult(dim) is { } given ? $"{given.IdentifierToken?.Value ?? "--field"} {p.GetValue(dim)}" : null, p.GetValue(seed), p.GetValue(branches)!, stdout, stderr,
            p.GetValue(inputs), p.GetValue(outputs)));
        return cmd;
    }

    public static int Execute(string graphPath, string certPath, string? dimText, ulong seed, string branchText, TextWriter o, TextWriter stderr,
        string? inputs = null, string? outputs = null)
    {
        var selection = ParseBranches(branchText, seed);
        ulong? dim = dimText is null ? null : ParseDimension(dimText);   // "--field P" or "--dim P", as typed
        var graph = GraphInput.Read(graphPath, inputs, outputs);
        var result = ScheduleCommand.Read(certPath);
        if (CanonicalForm.Sha256(graph) != CanonicalForm.Sha256(result.Graph))
            throw new UserInputException($"{graphPath} and {certPath} describe different graphs (canonical SHA-256 {CanonicalForm.Sha256(graph)[..12]}... and {CanonicalForm.Sha256(result.Graph)[..12]}...)");
        var vanished = result.VanishedEdges;
        if (vanished.Count > 0) Terminal.Warn($"{certPath}: {VanishingEdges.Warning(result.Graph, result.Field, vanished)}", stderr);
        QuditPattern pattern;
        DeterminismReport report;
        try
        {
            pattern = QuditPattern.FromFlow(result, dim, seed);
            foreach (var problem in pattern.Violations) Terminal.Warn($"{certPath}: {problem}", stderr);
            report = OutcomeTreeSimulator.Run(pattern, selection);
        }
        catch (Exception e) when (e is SimulationException or ScheduleException) { throw new UserInputException($"{certPath}: {e.Message}"); }
        Write(o, graphPath, certPath, result.Field.Name, pattern, report, selection, seed);
        return report.Deterministic ? ExitCode.Flow : ExitCode.NoFlow;
    }

    /// <summary>A qudit dimension is a prime, parsed as every command parses a field (FieldSpec.Parse).</summary>
    private static ulong ParseDimension(string given)
    {
        var text = given[(given.IndexOf(' ') + 1)..];
        FieldSpec spec;
        try { spec = FieldSpec.Parse(text); }
        catch (FieldSpecException e) { throw new UserInputException($"{given}: {e.Message}"); }
        if (spec.IsRationals)
            throw new UserInputException($"{given}: a qudit dimension is a prime; Q is the continuous-variable case, which no state vector can hold.");
        return spec.Prime;
    }

    private static OutcomeBranches ParseBranches(string text, ulong seed)
    {
        if (text == "all") return OutcomeBranches.All;
        if (text.Length == 0 || !text.All(char.IsAsciiDigit))
            throw new UserInputException($"'{text}' is not a branch selection: write all, or a number K of random branches.");
        if (text.All(c => c == '0'))
            throw new UserInputException("--branches 0 would look at no outcome and prove nothing: write all, or a number K of at least 1.");
        if (!int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out var k) || k > OutcomeBranches.MaxExhaustive)
            throw new UserInputException($"--branches {text} is too many: sample at most {OutcomeBranches.MaxExhaustive} branches (2^20, the most 'all' enumerates).");
        return OutcomeBranches.Sample(k, seed);
    }

    private static void Write(TextWriter o, string graphPath, string certPath, string field, QuditPattern pattern, DeterminismReport r, OutcomeBranches selection, ulong seed)
    {
        static string G(double x) => x.ToString("0.###e+0", CultureInfo.InvariantCulture);
        var g = pattern.Graph;
        o.WriteLine($"pattern      {Escaped.Of(graphPath)} with {Escaped.Of(certPath)}: {field}, {Counted.Of(r.MeasuredNodes, "measured node")}, {Counted.Of(g.Outputs.Count, "output")}");
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
