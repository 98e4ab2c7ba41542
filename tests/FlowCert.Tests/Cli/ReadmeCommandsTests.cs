using System.Diagnostics;
using System.Text.RegularExpressions;
using FlowCert.Tests.Certificates;

namespace FlowCert.Tests.Cli;

/// <summary>
/// Every concrete command the README shows (an indented line starting with one of the run prefixes and
/// holding no placeholder) is run, in README order, in a scratch folder that holds a copy of
/// certificates/. A command may report "no flow" (exit 1) but never bad input (2) or a crash (3).
/// </summary>
public partial class ReadmeCommandsTests
{
    private static readonly (string Prefix, string Program)[] Programs =
    [
        ("dotnet run --project src/FlowCert.Cli -- ", "FlowCert.Cli.dll"),
        ("dotnet run --project checker/FlowCheck -- ", "flowcheck.dll"),
    ];

    [GeneratedRegex(@"\[|\b[A-Z]{3,}\b")]
    private static partial Regex Placeholder();

    internal static List<string> ConcreteCommands(string readme)
        => readme.Split('\n')
            .Where(l => l.StartsWith("    ") && Programs.Any(p => l.Trim().StartsWith(p.Prefix)))
            .Select(l => l.Trim())
            .Where(l => !Placeholder().IsMatch(l))
            .ToList();

    [Fact]
    public void EveryConcreteReadmeCommandRuns()
    {
        var root = CorpusTests.RepositoryRoot();
        var commands = ConcreteCommands(File.ReadAllText(Path.Combine(root, "README.md")));
        Assert.Contains(commands, c => c.EndsWith("-- demo"));
        Assert.True(commands.Count >= 10, $"only {commands.Count} README commands recognised");
        var scratch = Directory.CreateTempSubdirectory("flowcert-readme-").FullName;
        try
        {
            Directory.CreateDirectory(Path.Combine(scratch, "certificates"));
            foreach (var f in Directory.GetFiles(Path.Combine(root, "certificates")))
                File.Copy(f, Path.Combine(scratch, "certificates", Path.GetFileName(f)));
            foreach (var command in commands)
            {
                var (prefix, program) = Programs.First(p => command.StartsWith(p.Prefix));
                var (code, output) = Run(Locate(root, program), command[prefix.Length..], scratch);
                Assert.True(code is 0 or 1, $"README command failed with exit {code}: {command}\n{output}");
            }
        }
        finally { Directory.Delete(scratch, recursive: true); }
    }

    private static string Locate(string root, string program)
    {
        var here = Path.Combine(AppContext.BaseDirectory, program);
        if (File.Exists(here)) return here;
        var config = new DirectoryInfo(AppContext.BaseDirectory).Parent!.Name; // bin/<config>/net10.0
        var checker = Path.Combine(root, "checker", "FlowCheck", "bin", config, "net10.0", program);
        return File.Exists(checker) ? checker : throw new FileNotFoundException($"{program} is not built; run dotnet test FlowCert.sln");
    }

    private static (int Code, string Output) Run(string dll, string arguments, string workingDirectory)
    {
        var start = new ProcessStartInfo("dotnet") { WorkingDirectory = workingDirectory, RedirectStandardOutput = true, RedirectStandardError = true };
        start.ArgumentList.Add(dll);
        foreach (var a in arguments.Split(' ', StringSplitOptions.RemoveEmptyEntries)) start.ArgumentList.Add(a);
        using var p = Process.Start(start)!;
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEnd();
        p.WaitForExit();
        return (p.ExitCode, stdout.Result + stderr);
    }
}
