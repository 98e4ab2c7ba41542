using System.Diagnostics;
using System.Text.RegularExpressions;
using FlowCert.Tests.Certificates;

namespace FlowCert.Tests.Cli;

/// <summary>
/// Every concrete command README.md and docs/*.md show (an indented line starting with one of the run
/// prefixes, or with `flowcert`/`flowcheck`, which the docs use for them, and holding no placeholder)
/// is run, in page order, in a scratch folder per page that holds a copy of certificates/ and an empty
/// docs/img/. A command may report "no flow" (exit 1) but never bad input (2) or a crash (3). A command
/// whose trailing comment says "not run" is skipped (a million-node benchmark); other comments are
/// dropped. Docs must not point to files outside the repository.
/// </summary>
public partial class ReadmeCommandsTests
{
    private static readonly (string Prefix, string Program)[] Programs =
    [
        ("dotnet run --project src/FlowCert.Cli -- ", "FlowCert.Cli.dll"),
        ("dotnet run --project checker/FlowCheck -- ", "flowcheck.dll"),
        ("dotnet run -c Release --project src/FlowCert.Cli -- ", "FlowCert.Cli.dll"),
        ("flowcert ", "FlowCert.Cli.dll"),
        ("flowcheck ", "flowcheck.dll"),
    ];

    [GeneratedRegex(@"\s+#.*$")]
    private static partial Regex TrailingComment();

    [GeneratedRegex(@"\[|\b[A-Z]{3,}\b")]
    private static partial Regex Placeholder();

    internal static List<string> ConcreteCommands(string readme)
        => readme.Split('\n')
            .Where(l => l.StartsWith("    ") && Programs.Any(p => l.Trim().StartsWith(p.Prefix)))
            .Select(l => l.Trim())
            .Where(l => !TrailingComment().Match(l).Value.Contains("not run"))
            .Select(l => TrailingComment().Replace(l, ""))
            .Where(l => !Placeholder().IsMatch(l))
            .ToList();

    /// <summary>README.md and every page of docs/ that shows a concrete command.</summary>
    internal static List<string> PageNames()
    {
        var root = CorpusTests.RepositoryRoot();
        return new[] { "README.md" }.Concat(Directory.GetFiles(Path.Combine(root, "docs"), "*.md").Order(StringComparer.Ordinal).Select(f => "docs/" + Path.GetFileName(f)))
            .Where(page => ConcreteCommands(File.ReadAllText(Path.Combine(root, page))).Count > 0).ToList();
    }

    public static TheoryData<string> Pages() => [.. PageNames()];

    [Theory]
    [MemberData(nameof(Pages))]
    public void EveryConcreteCommandOfThePageRuns(string page)
    {
        var root = CorpusTests.RepositoryRoot();
        var commands = ConcreteCommands(File.ReadAllText(Path.Combine(root, page)));
        RunAll(root, commands);
    }

    [Fact]
    public void TheDocsPagesThatShowCommandsAreAllFound()
    {
        var pages = PageNames();
        foreach (var page in new[] { "README.md", "docs/families.md", "docs/schedule.md" }) Assert.Contains(page, pages);
    }

    // Absolute paths of a machine (its work and home folders), file URLs and relative links that climb out.
    [GeneratedRegex(@"(?:\.\./)+shared|/w[o]rk/|/h[o]me/|file://|\]\((?:\.\./)+")]
    private static partial Regex OutsidePointer();

    [Fact]
    public void DocsDoNotPointToFilesOutsideTheRepository()
    {
        var root = CorpusTests.RepositoryRoot();
        var pages = new[] { "README.md", "DEVELOPERS.md" }.Select(p => Path.Combine(root, p))
            .Concat(Directory.GetFiles(Path.Combine(root, "docs"), "*.md"));
        foreach (var page in pages)
        {
            var text = File.ReadAllText(page);
            Assert.False(OutsidePointer().IsMatch(text), $"{page} points outside the repository: {OutsidePointer().Match(text).Value}");
            // every relative markdown link resolves inside the repository, to a file or folder that exists
            foreach (Match link in Regex.Matches(text, @"\]\(([^)#:\s]+)(?:#[^)]*)?\)"))
            {
                var target = Path.GetFullPath(Path.Combine(Path.GetDirectoryName(page)!, link.Groups[1].Value));
                Assert.StartsWith(Path.GetFullPath(root), target);
                Assert.True(File.Exists(target) || Directory.Exists(target), $"{page}: link {link.Groups[1].Value} points to nothing");
            }
        }
    }

    [Fact]
    public void TheReadmeShowsTheDemoAndAtLeastTenCommands()
    {
        var root = CorpusTests.RepositoryRoot();
        var commands = ConcreteCommands(File.ReadAllText(Path.Combine(root, "README.md")));
        Assert.Contains(commands, c => c.EndsWith("-- demo"));
        Assert.True(commands.Count >= 10, $"only {commands.Count} README commands recognised");
        // run by EveryConcreteCommandOfThePageRuns("README.md")
        Assert.Contains("README.md", PageNames());
    }

    private static void RunAll(string root, List<string> commands)
    {
        var scratch = Directory.CreateTempSubdirectory("flowcert-readme-").FullName;
        try
        {
            Directory.CreateDirectory(Path.Combine(scratch, "certificates"));
            Directory.CreateDirectory(Path.Combine(scratch, "docs", "img"));
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
