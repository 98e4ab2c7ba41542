using System.CommandLine;
using FlowCert.Algebra;
using FlowCert.Flows;
using FlowCert.Certificates;
using FlowCert.Graphs;
using FlowCert.Graphs.Families;
using FlowCert.Graphs.Formats;

namespace FlowCert.Cli;

/// <summary>Exit codes of every command.</summary>
public static class ExitCode
{
    public const int Flow = 0, NoFlow = 1, BadInput = 2, Internal = 3;
}

/// <summary>A mistake in how the command was called or in a file it was given; exit code 2.</summary>
public sealed class UserInputException(string message) : Exception(message);

/// <summary>The <c>flowcert</c> command: parses arguments, runs one subcommand, maps errors to exit codes.</summary>
public static class CliApp
{
    public static int Run(string[] args, TextWriter stdout, TextWriter stderr, TextReader? stdin = null)
    {
        Terminal.In = stdin ?? Console.In;
        Terminal.Error = stderr;
        // A plain command named flowcert (a RootCommand takes the name of the running assembly, FlowCert.Cli)
        var root = new Command("flowcert", "flowcert: exact flows for measurement-based quantum computing on weighted graph states");
        var version = new Option<bool>("--version") { Description = "Show the version" };
        root.Options.Add(new System.CommandLine.Help.HelpOption());
        root.Options.Add(version);
        root.SetAction(p =>
        {
            if (!p.GetValue(version))
            {
                stderr.WriteLine("flowcert: give a command (solve, demo, schedule, simulate, generate, convert, draw).");
                stderr.WriteLine("Run 'flowcert --help' for usage.");
                return ExitCode.BadInput;
            }
            stdout.WriteLine($"flowcert {CertificateWriter.ProducerVersion}");
            return ExitCode.Flow;
        });
        root.Subcommands.Add(SolveCommand.Create(stdout));
        root.Subcommands.Add(DemoCommand.Create(stdout));
        root.Subcommands.Add(ScheduleCommand.Create(stdout));
        root.Subcommands.Add(SimulateCommand.Create(stdout, stderr));
        root.Subcommands.Add(GenerateCommand.Create(stdout));
        root.Subcommands.Add(ConvertCommand.Create(stdout));
        root.Subcommands.Add(DrawCommand.Create(stdout));
        root.Subcommands.Add(CircuitCommand.Create(stdout));
        root.Subcommands.Add(PrimesCommand.Create(stdout));
        root.Subcommands.Add(NoiseCommand.Create(stdout));
        var parsed = root.Parse(args);
        if (parsed.Errors.Count > 0)
        {
            foreach (var e in parsed.Errors) stderr.WriteLine($"flowcert: {Escaped.Of(e.Message)}");
            stderr.WriteLine("Run 'flowcert --help' for usage.");
            return ExitCode.BadInput;
        }
        try
        {
            PathSymbols.RefuseEmpty(parsed);
            return parsed.Invoke(new InvocationConfiguration { Output = stdout, Error = stderr, EnableDefaultExceptionHandler = false });
        }
        catch (Exception e) when (e is GraphFormatException or FieldSpecException or WeightNotInFieldException or UserInputException
            or GraphFileException or FamilyParameterException or CertificateFormatException)
        {
            stderr.WriteLine($"flowcert: {Escaped.Of(e.Message)}");
            return ExitCode.BadInput;
        }
        catch (Exception e) when (e is FileNotFoundException or DirectoryNotFoundException or UnauthorizedAccessException or IOException)
        {
            stderr.WriteLine($"flowcert: {Escaped.Of(e.Message)}");
            return ExitCode.BadInput;
        }
        catch (Exception e)
        {
            stderr.WriteLine($"flowcert: internal error: {e}");
            return ExitCode.Internal;
        }
    }

    /// <summary>Parses --flow.</summary>
    public static FlowKind ParseKind(string text)
        => FlowKinds.TryParse(text, out var kind) ? kind : throw new UserInputException($"'{text}' is not a kind of flow: write general or causal.");
}
