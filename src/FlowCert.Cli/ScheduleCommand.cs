using System.CommandLine;
using FlowCert.Certificates;
using FlowCert.Flows;
using FlowCert.Schedules;

namespace FlowCert.Cli;

/// <summary><c>flowcert schedule CERT [--format text|csv|json] [--out FILE]</c> (<c>--json</c> is <c>--format json</c>): the feed-forward schedule of a flow certificate.</summary>
public static class ScheduleCommand
{
    public static Command Create(TextWriter stdout)
    {
        var cert = new PathArgument("CERT") { Description = "a flow certificate (JSON) written by flowcert solve" };
        var format = new Option<string>("--format") { Description = "text (a readable table), csv or json (for tools; see docs/schedule.md)", DefaultValueFactory = _ => "text" };
        var json = new Option<bool>("--json") { Description = "the same as --format json" };
        var output = new PathOption("--out") { Description = "write the schedule to this file instead of standard output" };
        var cmd = new Command("schedule", "Rounds, the corrections each outcome triggers, every node's frame and feed-forward statistics; exit 0, or 2 for a noflow or invalid certificate") { cert, format, json, output };
        cmd.SetAction(p => Execute(p.GetValue(cert)!, OutputFormat.Chosen(p.GetValue(format)!, p.GetValue(json)), p.GetValue(output), stdout));
        return cmd;
    }

    public static int Execute(string certPath, string format, string? outPath, TextWriter stdout)
    {
        Func<FeedForwardSchedule, string> writer = format switch
        {
            "text" => ScheduleText.Write,
            "csv" => ScheduleCsv.Write,
            "json" => ScheduleJson.Write,
            _ => throw new UserInputException($"'{format}' is not a schedule format: write text, csv or json."),
        };
        var result = Read(certPath);
        FeedForwardSchedule schedule;
        try { schedule = ScheduleBuilder.Build(result); }
        catch (ScheduleException e) { throw new UserInputException($"{certPath}: {e.Message}"); }
        catch (WeightNotInFieldException e) { throw new UserInputException($"{certPath}: {e.Message}"); }
        var text = writer(schedule);
        if (outPath is null) stdout.Write(text);
        else SafeFile.WriteAllText(outPath, text, certPath);
        return ExitCode.Flow;
    }

    /// <summary>Reads a certificate, turning a malformed one into a user error.</summary>
    internal static FlowResult Read(string certPath)
    {
        try { return CertificateReader.ReadFile(certPath); }
        catch (CertificateFormatException e) { throw new UserInputException(e.Message); }
    }
}
