using System.CommandLine;
using System.Globalization;
using FlowCert.Algebra.Factoring;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Flows.Primes;

namespace FlowCert.Cli;

/// <summary>
/// <c>flowcert primes GRAPH [--flow general|causal] [--out-dir DIR] [--check-up-to N] [--factor-seconds S] [--format text|json]</c>:
/// the answer over every prime at once (docs/primes.md). Exit 0 when every prime is classified (and the
/// audit, if asked, agrees), 1 when some integer could not be classified, 2 bad input, 3 when the audit
/// finds a disagreement (a bug).
/// </summary>
public static class PrimesCommand
{
    /// <summary>The default factoring budget in seconds.</summary>
    public const double DefaultFactorSeconds = 10;

    public static Command Create(TextWriter stdout)
    {
        var graph = new PathArgument("GRAPH") { Description = "the open graph: .ograph, .g6, .s6, .mtx or .json" };
        var flow = new Option<string>("--flow") { Description = "general or causal", DefaultValueFactory = _ => "general" };
        var outDir = new PathOption("--out-dir") { Description = "write the certificate over Q and one per exceptional prime into this folder" };
        var checkUpTo = new Option<string?>("--check-up-to") { Description = "audit: also solve every prime up to N directly and compare with the claim" };
        var seconds = new Option<string>("--factor-seconds") { Description = "time budget for factoring the invariants, in seconds", DefaultValueFactory = _ => "10" };
        var format = OutputFormat.TextOrJson("the table");
        var json = new Option<bool>("--json") { Description = "the same as --format json" };
        var inputs = ConvertCommand.InputsOption();
        var outputs = ConvertCommand.OutputsOption();
        var cmd = new Command("primes", "The verdict and minimum depth over every prime field at once: exceptional primes solved directly, every other prime as over Q")
            { graph, flow, outDir, checkUpTo, seconds, format, json, inputs, outputs };
        cmd.SetAction(p => Execute(p.GetValue(graph)!, p.GetValue(flow)!, p.GetValue(outDir), p.GetValue(checkUpTo), p.GetValue(seconds)!,
            OutputFormat.IsJson(p.GetValue(format)!, p.GetValue(json), "primes"), stdout, p.GetValue(inputs), p.GetValue(outputs)));
        return cmd;
    }

    public static int Execute(string graphPath, string flowText, string? outDir, string? checkUpToText, string secondsText, bool json,
        TextWriter stdout, string? inputs = null, string? outputs = null)
    {
        var kind = CliApp.ParseKind(flowText);
        if (kind == FlowKind.Pauli)
            throw new UserInputException("primes surveys every prime field, but Pauli flow is defined for field 2 only: use solve --field 2 --flow pauli.");
        var budget = ParseSeconds(secondsText);
        ulong? upTo = checkUpToText is null ? null : ParseBound(checkUpToText);
        var g = GraphInput.Read(graphPath, inputs, outputs);
        if (g.HasLabels)
            throw new UserInputException($"{GraphInput.NameOf(graphPath)}: primes surveys every field, but measurement labels other than XY are defined for field 2 only: use solve --field 2.");
        if (g.Inputs.Count == 0 && g.Outputs.Count == 0 && g.NodeCount > 0)
            Terminal.Warn($"{GraphInput.NameOf(graphPath)}: no terminals were given (no inputs and no outputs), so every node is measured; " +
                          "graph6, sparse6 and Matrix Market files carry none: name them with --inputs and --outputs");
        var survey = PrimeSurvey.Run(g, kind, new FactoringBudget(budget));
        var audit = upTo is { } n ? PrimeAudit.Run(survey, n) : null;
        var written = outDir is null ? [] : WriteCertificates(survey, graphPath, outDir);
        if (json) PrimesReport.WriteJson(stdout, GraphInput.NameOf(graphPath), survey, audit, written);
        else PrimesReport.WriteTable(stdout, GraphInput.NameOf(graphPath), survey, audit, written);
        if (audit is { Disagreements.Count: > 0 }) return ExitCode.Internal;
        return survey.IsComplete ? ExitCode.Flow : ExitCode.NoFlow;
    }

    private static TimeSpan ParseSeconds(string text)
    {
        if (!double.TryParse(text, NumberStyles.AllowDecimalPoint, CultureInfo.InvariantCulture, out var s) || !double.IsFinite(s) || s > 86_400)
            throw new UserInputException($"--factor-seconds '{text}' is not a number of seconds from 0 to 86400.");
        return TimeSpan.FromSeconds(s);
    }

    private static ulong ParseBound(string text)
    {
        if (!ulong.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out var n) || n > PrimeAudit.MaxBound)
            throw new UserInputException($"--check-up-to '{text}' is not a whole number from 0 to {PrimeAudit.MaxBound}.");
        return n;
    }

    /// <summary>The file name of one certificate: <c>STEM.FIELD.KIND.json</c>, as the demo names them (STEM is <c>graph</c> for standard input).</summary>
    public static string CertificateName(string graphPath, string field, FlowKind kind)
        => $"{(GraphInput.IsStandardInput(graphPath) ? "graph" : Path.GetFileNameWithoutExtension(graphPath))}.{field}.{FlowKinds.Name(kind)}.json";

    // Like `demo --out-dir`: the folder is created if absent; a regular file of the same name is replaced
    // (asked for by naming the folder), anything else is refused by SafeFile, and the graph is never written over.
    private static List<string> WriteCertificates(PrimeSurvey survey, string graphPath, string outDir)
    {
        if (File.Exists(outDir)) throw new UserInputException($"--out-dir {outDir} is a file, not a folder");
        Directory.CreateDirectory(outDir);
        var results = new List<FlowResult> { survey.Rational };
        results.AddRange(survey.Exceptional.Where(a => a.Result is not null).Select(a => a.Result!));
        var paths = results.Select(r => Path.Combine(outDir, CertificateName(graphPath, r.Field.Name, r.Kind))).ToList();
        // Refuse before writing anything, so a bad target leaves no partial set of certificates behind.
        foreach (var path in paths)
        {
            if (string.Equals(Path.GetFullPath(path), Path.GetFullPath(graphPath), StringComparison.Ordinal))
                throw new UserInputException($"refusing to write {path}: it is an input of this command");
            if (FileKind.Of(Path.GetFullPath(path)) is { } k && k != FileKind.Regular)
                throw new UserInputException($"refusing to write {path}: it is {FileKind.Describe(k)}, not a regular file (remove it or choose another folder)");
        }
        for (int i = 0; i < results.Count; i++) SafeFile.WriteAllText(paths[i], CertificateWriter.Write(results[i]), graphPath);
        return paths;
    }
}
