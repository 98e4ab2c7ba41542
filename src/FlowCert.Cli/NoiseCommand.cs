using System.CommandLine;
using System.Globalization;
using FlowCert.Algebra;
using FlowCert.Graphs.Formats;
using FlowCert.Noise;

namespace FlowCert.Cli;

/// <summary>
/// <c>flowcert noise CERT [--db D | --sweep FROM:TO:STEP] [--phases FILE] [--target V] [--format text|json]</c>: the exact
/// added noise of a continuous-variable flow pattern under finite squeezing (docs/noise.md).
/// </summary>
public static class NoiseCommand
{
    public static Command Create(TextWriter stdout)
    {
        var cert = new PathArgument("CERT") { Description = "a flow certificate over Q (JSON) written by flowcert solve" };
        var db = new Option<string?>("--db") { Description = "a squeezing level in dB (10 dB is r = ln(10)/2): added variance, dB and coherent-state fidelity there" };
        var sweep = new Option<string?>("--sweep") { Description = "FROM:TO:STEP in dB: a table of the noise over squeezing levels" };
        var phases = new PathOption("--phases") { Description = "a file of 'NODE t' lines: the Gaussian phase exp(i t q^2/2) before each p measurement (exact; default 0)" };
        var target = new Option<string?>("--target") { Description = "V: the least squeezing (dB) at which every output quadrature's (with more outputs than inputs: every finite direction's) added variance is at most V vacuum units" };
        var format = OutputFormat.TextOrJson("the report");
        var json = new Option<bool>("--json") { Description = "the same as --format json: one JSON object with the exact matrices (rationals as strings)" };
        var cmd = new Command("noise", "Exact added noise of a continuous-variable flow pattern under finite squeezing; exit 0, 1 if the corrections fail, 2 for bad input")
            { cert, db, sweep, phases, target, format, json };
        cmd.SetAction(p => Execute(p.GetValue(cert)!, p.GetValue(db), p.GetValue(sweep), p.GetValue(phases), p.GetValue(target),
            OutputFormat.IsJson(p.GetValue(format)!, p.GetValue(json), "noise"), stdout));
        return cmd;
    }

    public static int Execute(string certPath, string? dbText, string? sweepText, string? phasesPath, string? targetText, bool json, TextWriter stdout)
    {
        if (dbText is not null && sweepText is not null) throw new UserInputException("give --db or --sweep, not both.");
        var flow = ScheduleCommand.Read(certPath);
        try
        {
            var request = new NoiseRequest(
                dbText is null ? null : Level(dbText, "--db"),
                sweepText is null ? null : Sweep(sweepText),
                targetText is null ? null : Target(targetText));
            var phases = phasesPath is null ? null : PhaseFile.Read(phasesPath, flow.Graph);
            var report = NoiseAnalysis.Analyze(flow, phases);
            stdout.Write(json ? NoiseJson.Write(report, request) : NoiseText.Write(report, request, certPath));
            return report.Valid ? ExitCode.Flow : ExitCode.NoFlow;
        }
        catch (NoiseInputException e) { throw new UserInputException($"{certPath}: {e.Message}"); }
    }

    private static double Level(string text, string option)
        => double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var x) && double.IsFinite(x) && x >= 0
            ? x : throw new UserInputException($"{option} '{text}' is not a squeezing level: write a number of dB, 0 or more (such as 10 or 12.5).");

    private static IReadOnlyList<double> Sweep(string text)
    {
        var parts = text.Split(':');
        if (parts.Length != 3) throw new UserInputException($"--sweep '{text}' is not FROM:TO:STEP (in dB, such as 0:15:3).");
        return NoiseRequest.SweepLevels(Level(parts[0], "--sweep FROM"), Level(parts[1], "--sweep TO"), Level(parts[2], "--sweep STEP"));
    }

    private static Rational Target(string text)
        => Rational.TryParse(text, out var v) && v.Sign > 0
            ? v : throw new UserInputException($"--target '{text}' is not a positive exact number of vacuum units (such as 1/10 or 0.25).");
}
