using System.Text.RegularExpressions;
using FlowCert.Tests.Certificates;

namespace FlowCert.Tests;

/// <summary>
/// Sources are cited by title and identifier only, never by their authors (the project's rule for
/// citations). Two usual ways a person's name slips in are caught: the Latin abbreviation for "and
/// others" after a first author, and two capitalised names joined by a hyphen or dash as the label of a model. Published methods keep their usual names, so the
/// method names used in this repository are allowed.
/// </summary>
public partial class CitationStyleTests
{
    private static readonly string[] AllowedMethodNames = ["Box-Muller", "Gauss-Jordan", "Lucas-Lehmer", "Miller-Rabin"];

    private static readonly string[] Folders = ["src", "tests", "docs", "bench", "checker"];
    private static readonly string[] Extensions = [".cs", ".md", ".ograph"];

    [GeneratedRegex(@"\bet\.?\s+al\b")]
    private static partial Regex EtAl();

    [GeneratedRegex(@"\b\p{Lu}\p{Ll}+[-\u2013\u2014]\p{Lu}\p{Ll}+\b")]
    private static partial Regex JoinedNames();

    private static IEnumerable<string> SourceFiles()
    {
        var root = CorpusTests.RepositoryRoot();
        foreach (var folder in Folders.Select(f => Path.Combine(root, f)).Where(Directory.Exists))
            foreach (var file in Directory.EnumerateFiles(folder, "*", SearchOption.AllDirectories))
            {
                var relative = Path.GetRelativePath(root, file).Replace('\\', '/');
                if (relative.Split('/').Any(part => part is "bin" or "obj")) continue;
                if (Extensions.Contains(Path.GetExtension(file))) yield return relative;
            }
    }

    [Fact]
    public void NoCitationNamesItsAuthors()
    {
        var root = CorpusTests.RepositoryRoot();
        var files = SourceFiles().ToList();
        Assert.Contains("src/FlowCert/Graphs/Families/RandomGraphs.cs", files);
        var found = new List<string>();
        foreach (var file in files)
        {
            var lines = File.ReadAllLines(Path.Combine(root, file));
            for (int i = 0; i < lines.Length; i++)
            {
                foreach (Match m in EtAl().Matches(lines[i])) found.Add($"{file}:{i + 1}: {m.Value}");
                foreach (Match m in JoinedNames().Matches(lines[i]))
                    if (!AllowedMethodNames.Contains(m.Value)) found.Add($"{file}:{i + 1}: {m.Value}");
            }
        }
        Assert.True(found.Count == 0, "author names beside citations (cite by title and identifier):\n" + string.Join("\n", found));
    }
}
