using FlowCert.Graphs.Formats;
using System.CommandLine;
using FlowCert.Circuits;
using FlowCert.Flows;
using FlowCert.Simulation;

namespace FlowCert.Cli;

/// <summary>
/// <c>flowcert circuit CERT [--angles FILE] [--format text|json|qasm] [--out FILE]</c>: the circuit read off a
/// causal flow (docs/circuits.md).
/// </summary>
public static class CircuitCommand
{
    public static Command Create(TextWriter stdout)
    {
        var cert = new PathArgument("CERT") { Description = "a causal-flow certificate over F_p (JSON) written by flowcert solve" };
        var angles = new PathOption("--angles") { Description = "measurement parameters, NODE VALUE lines (docs/circuits.md); unlisted nodes 0" };
        var format = new Option<string>("--format") { Description = "text, json or qasm (OpenQASM 3.0, qubits only)", DefaultValueFactory = _ => "text" };
        var output = new PathOption("--out") { Description = "write the circuit to this file instead of standard output" };
        var cmd = new Command("circuit", "The circuit a causal flow implements: one wire per output, a Fourier-type gate per flow step, a controlled phase per other edge; exit 0, or 2") { cert, angles, format, output };
        cmd.SetAction(p => Execute(p.GetValue(cert)!, p.GetValue(angles), p.GetValue(format)!, p.GetValue(output), stdout));
        return cmd;
    }

    public static int Execute(string certPath, string? anglesPath, string format, string? outPath, TextWriter stdout)
    {
        Func<CausalCircuit, string> writer = format switch
        {
            "text" => CircuitWriters.Text,
            "json" => CircuitWriters.Json,
            "qasm" => CircuitWriters.Qasm,
            _ => throw new UserInputException($"'{format}' is not a circuit format: write text, json or qasm."),
        };
        var result = ScheduleCommand.Read(certPath);
        string text;
        try
        {
            MeasurementAngles? angles = null;
            if (anglesPath is not null && !result.Field.IsRationals && result.Field.Prime <= int.MaxValue)
                angles = MeasurementAngles.Read(anglesPath, result.Graph, (int)result.Field.Prime);
            text = writer(CausalCircuit.Extract(result, angles));
        }
        catch (CircuitException e) { throw new UserInputException($"{certPath}: {e.Message}"); }
        catch (WeightNotInFieldException e) { throw new UserInputException($"{certPath}: {e.Message}"); }
        if (outPath is null) stdout.Write(text);
        else SafeFile.WriteAllText(outPath, text, anglesPath is null ? [certPath] : [certPath, anglesPath]);
        return ExitCode.Flow;
    }
}
