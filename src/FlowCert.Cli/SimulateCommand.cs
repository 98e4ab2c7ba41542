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
/// <c>flowcert simulate GRAPH CERT [--inputs NAMES] [--outputs NAMES] [--field P] [--seed N] [--branches all|K]
/// [--angles FILE] [--map] [--expect FILE] [--out FILE]</c>: runs the certificate's pattern on a state vector
/// and says whether every outcome branch implements the same map; prints or writes that map, or checks it
/// against a claimed matrix. <c>--cert CERT</c> and <c>--dim P</c> are the older spellings.
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
        var angles = new PathOption("--angles") { Description = "measurement parameters, NODE VALUE lines (docs/circuits.md); unlisted nodes 0. Without it, random angles unless --map or --expect" };
        var map = new Option<bool>("--map") { Description = "print the implemented map (p^|O| x p^|I| matrix, normalised, global phase fixed), or write it as JSON with --out" };
        var expect = new PathOption("--expect") { Description = "a claimed matrix (JSON); exit 0 when every branch implements it up to a global phase, 1 otherwise" };
        var output = new PathOption("--out") { Description = "with --map: write the map as JSON to this file" };
        var cmd = new Command("simulate", "Simulate the pattern of a flow certificate over qudits; exit 0 deterministic (and as claimed), 1 outcome-dependent (or not as claimed), 2 bad input")
            { graph, certArgument, cert, inputs, outputs, dim, seed, branches, angles, map, expect, output };
        cmd.SetAction(p => Execute(p.GetValue(graph)!,
            CertificateArgument.Resolve(p.GetValue(certArgument), p.GetValue(cert)) ?? throw new UserInputException("simulate needs a certificate: flowcert simulate GRAPH CERT"),
            p.GetResult(dim) is { } given ? $"{given.IdentifierToken?.Value ?? "--field"} {p.GetValue(dim)}" : null, p.GetValue(seed), p.GetValue(branches)!, stdout, stderr,
            p.GetValue(inputs), p.GetValue(outputs), new MapRequest(p.GetValue(angles), p.GetValue(map), p.GetValue(expect), p.GetValue(output))));
        return cmd;
    }

    /// <summary>What --angles, --map, --expect and --out ask for.</summary>
    public sealed record MapRequest(string? Angles = null, bool Map = false, string? Expect = null, string? Out = null)
    {
        /// <summary>Angles come from a file or default to 0 rather than being random.</summary>
        public bool FixedAngles => Angles is not null || Map || Expect is not null;
    }

    /// <summary>The most entries --map prints; a larger map goes to a file with --out.</summary>
    public const int MaxPrintedEntries = 1024;

    public static int Execute(string graphPath, string certPath, string? dimText, ulong seed, string branchText, TextWriter o, TextWriter stderr,
        string? inputs = null, string? outputs = null, MapRequest? request = null)
    {
        request ??= new MapRequest();
        if (request.Out is not null && !request.Map) throw new UserInputException("--out writes the map: give --map with it");
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
        MeasurementAngles? given = null;
        MathNet.Numerics.LinearAlgebra.Matrix<System.Numerics.Complex>? claim = null;
        MapComparison? comparison = null;
        try
        {
            // Angles and claims need p; over Q or a huge prime FromFlow explains the refusal instead.
            bool simulable = !result.Field.IsRationals && result.Field.Prime <= int.MaxValue;
            if (simulable && request.FixedAngles)
            {
                int p = (int)result.Field.Prime;
                given = request.Angles is null ? new MeasurementAngles(p, new Dictionary<int, double[]>())
                    : MeasurementAngles.Read(request.Angles, result.Graph, p);
                double rows = Math.Pow(p, result.Graph.Outputs.Count), columns = Math.Pow(p, result.Graph.Inputs.Count);
                if (request.Map && request.Out is null && rows * columns > MaxPrintedEntries)
                    throw new UserInputException($"the map has {rows:0} x {columns:0} entries, too many to print: write it as JSON with --out FILE");
                if (request.Expect is not null)
                    claim = MapFiles.ReadClaim(InputText.ReadAll(request.Expect), request.Expect, p, (int)rows, (int)columns);
            }
            pattern = QuditPattern.FromFlow(result, dim, seed, given?.Diagonals());
            foreach (var problem in pattern.Violations) Terminal.Warn($"{certPath}: {problem}", stderr);
            report = OutcomeTreeSimulator.Run(pattern, selection);
            if (claim is not null) comparison = MapComparison.Run(pattern, claim, selection);
        }
        catch (Exception e) when (e is SimulationException or ScheduleException) { throw new UserInputException($"{certPath}: {e.Message}"); }
        Write(o, graphPath, certPath, result.Field.Name, pattern, report, selection, seed, request, given);
        if (request.Map) WriteMap(o, request, pattern, report, result.Field.Name, certPath, graphPath);
        if (comparison is not null) WriteComparison(o, request.Expect!, pattern, comparison);
        bool agrees = comparison?.Agrees ?? true;
        return report.Deterministic && agrees ? ExitCode.Flow : ExitCode.NoFlow;
    }

    private static void WriteMap(TextWriter o, MapRequest request, QuditPattern pattern, DeterminismReport report, string field, params string[] inputs)
    {
        if (!report.Deterministic) { o.WriteLine("map          none: the pattern is outcome-dependent, so it implements no single map"); return; }
        var map = ImplementedMap.Of(pattern);
        string Names(IReadOnlyList<string> names) => names.Count == 0 ? "none" : string.Join(" ", names);
        o.WriteLine($"map          {map.Matrix.RowCount} x {map.Matrix.ColumnCount}: rows outputs {Names(map.Outputs)}, columns inputs {Names(map.Inputs)} " +
            "(first node most significant); the all-zero branch times sqrt(p^|M|), global phase fixed");
        if (request.Out is null) o.Write(MapFiles.Text(map));
        else
        {
            SafeFile.WriteAllText(request.Out, MapFiles.Json(map, field), [.. inputs, .. request.Angles is null ? Array.Empty<string>() : [request.Angles]]);
            o.WriteLine($"wrote        {request.Out}");
        }
    }

    // A floating-point figure of the report (deviations, probabilities, tolerances): scientific, at most 4 significant digits.
    private static string G(double x) => x.ToString("0.###e+0", CultureInfo.InvariantCulture);

    private static void WriteComparison(TextWriter o, string claimPath, QuditPattern pattern, MapComparison c)
    {
        var g = pattern.Graph;
        int p = pattern.Dimension;
        var entry = $"entry (out {ImplementedMap.BasisLabel(p, g.Outputs.Count, c.Row)}, in {ImplementedMap.BasisLabel(p, g.Inputs.Count, c.Column)})";
        var branch = pattern.Order.Count == 0 ? "" : " in the branch with raw outcomes " + string.Join(" ", pattern.Order.Select(v => $"{g.Names[v]}={c.Raw[v]}"));
        o.WriteLine(c.Agrees
            ? $"claim        {claimPath}: agrees with {(c.Branches == 1 ? "the 1 branch" : $"all {c.Branches} branches")} up to a global phase (largest entry difference {G(c.Largest)}, tolerance {G(MapComparison.Tolerance)})"
            : $"claim        {claimPath}: differs: largest difference {G(c.Largest)} at {entry}{branch}: computed {MapFiles.Entry(c.Computed, 6)}, " +
              $"claimed {MapFiles.Entry(c.Claimed, 6)} (after the best global phase; tolerance {G(MapComparison.Tolerance)})");
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

    private static void Write(TextWriter o, string graphPath, string certPath, string field, QuditPattern pattern, DeterminismReport r, OutcomeBranches selection, ulong seed,
        MapRequest request, MeasurementAngles? given)
    {
        var g = pattern.Graph;
        o.WriteLine($"pattern      {Escaped.Of(graphPath)} with {Escaped.Of(certPath)}: {field}, {Counted.Of(r.MeasuredNodes, "measured node")}, {Counted.Of(g.Outputs.Count, "output")}");
        o.WriteLine($"state        dimension {r.Dimension}: {r.Qudits} qudits, at most {r.PeakLive} live at once + {r.ReferenceQudits} reference = {r.Amplitudes} amplitudes at the peak");
        o.WriteLine(given is null ? $"randomness   seed {seed}: a random diagonal unitary D per measured node, one random input state"
            : request.Angles is null ? $"angles       0 on every measured node (D = 1, the default of --map and --expect); seed {seed}: one random input state"
            : $"angles       {Escaped.Of(request.Angles)}: {Counted.Of(given.Phases.Count, "node")}, the others 0; seed {seed}: one random input state");
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
