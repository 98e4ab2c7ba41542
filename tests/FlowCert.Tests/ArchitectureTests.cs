using System.Reflection;
using System.Text.RegularExpressions;
using FlowCert.Tests.Certificates;

namespace FlowCert.Tests;

/// <summary>
/// The shape DEVELOPERS.md and the design's architecture page ask for, checked on the sources: the library
/// does no console I/O, its namespaces depend only downward, the checker shares nothing with src/, and
/// what library users do not need stays internal. (Common practice: architecture rules as tests.)
/// </summary>
public partial class ArchitectureTests
{
    // Lower layers first; a folder may use its own layer and those below. Folders of one layer do not
    // use each other unless listed in a lower layer. A new top-level folder must be placed here.
    private static readonly string[][] Layers =
    [
        ["Algebra"],
        ["Graphs"],
        ["Flows"],
        ["Certificates"],
        ["Schedules"],
        ["Simulation", "Drawing", "Noise"],
        ["Circuits"], // takes measurement angles from Simulation
        ["Demo"],
    ];

    private static string Root => CorpusTests.RepositoryRoot();

    private static IEnumerable<(string Folder, string File)> LibrarySources()
    {
        var src = Path.Combine(Root, "src", "FlowCert");
        foreach (var file in Directory.EnumerateFiles(src, "*.cs", SearchOption.AllDirectories))
        {
            var parts = Path.GetRelativePath(src, file).Replace('\\', '/').Split('/');
            if (parts[0] is "bin" or "obj") continue;
            yield return (parts.Length > 1 ? parts[0] : "", file);
        }
    }

    private static int LayerOf(string folder)
    {
        for (int k = 0; k < Layers.Length; k++) if (Layers[k].Contains(folder)) return k;
        return -1;
    }

    // A use of another top-level folder's namespace: "FlowCert.X" anywhere (using directives too), or "X." at the start of a
    // qualified name (inside namespace FlowCert.Y, "Algebra.Rational" means FlowCert.Algebra.Rational).
    [GeneratedRegex(@"(?<![\w.])(?:FlowCert\.(Algebra|Graphs|Flows|Certificates|Schedules|Simulation|Drawing|Noise|Circuits|Demo)\b|(Algebra|Graphs|Flows|Certificates|Schedules|Simulation|Drawing|Noise|Circuits|Demo)\.[A-Z])")]
    private static partial Regex NamespaceUse();

    [GeneratedRegex(@"^\s*//.*$|///.*$", RegexOptions.Multiline)]
    private static partial Regex Comments();

    [Fact]
    public void EveryLibraryFolderHasALayer()
    {
        var folders = LibrarySources().Select(s => s.Folder).Where(f => f != "").Distinct().ToList();
        Assert.Contains("Algebra", folders);
        Assert.All(folders, f => Assert.True(LayerOf(f) >= 0, $"src/FlowCert/{f}/ is in no layer of ArchitectureTests.Layers"));
    }

    [Fact]
    public void LibraryNamespacesDependOnlyDownward()
    {
        var problems = new List<string>();
        foreach (var (folder, file) in LibrarySources())
        {
            int own = LayerOf(folder);
            if (own < 0) continue;
            var code = Comments().Replace(File.ReadAllText(file), "");
            foreach (Match m in NamespaceUse().Matches(code))
            {
                var used = m.Groups[1].Success ? m.Groups[1].Value : m.Groups[2].Value;
                if (used == folder) continue;
                if (LayerOf(used) >= own)
                    problems.Add($"{Path.GetRelativePath(Root, file)}: {folder} uses {used}");
            }
        }
        Assert.True(problems.Count == 0, "upward or sideways dependencies:\n" + string.Join("\n", problems.Distinct()));
    }

    [Fact]
    public void TheLibraryNeverWritesToTheConsole()
    {
        var found = LibrarySources()
            .Where(s => Regex.IsMatch(Comments().Replace(File.ReadAllText(s.File), ""), @"\bConsole\s*\."))
            .Select(s => Path.GetRelativePath(Root, s.File)).ToList();
        Assert.True(found.Count == 0, "console I/O in the library: " + string.Join(", ", found));
        // The compiled library has no reference to System.Console either.
        Assert.DoesNotContain(typeof(FlowCert.Flows.FlowSolver).Assembly.GetReferencedAssemblies(), a => a.Name == "System.Console");
    }

    [Fact]
    public void TheCheckerSharesNothingWithTheSolver()
    {
        var checker = Path.Combine(Root, "checker", "FlowCheck");
        var project = File.ReadAllText(Path.Combine(checker, "FlowCheck.csproj"));
        Assert.DoesNotContain("ProjectReference", project);
        var uses = Directory.EnumerateFiles(checker, "*.cs", SearchOption.AllDirectories)
            .Where(f => !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}") && !f.Contains($"{Path.DirectorySeparatorChar}bin{Path.DirectorySeparatorChar}"))
            .Where(f => Regex.IsMatch(File.ReadAllText(f), @"\bFlowCert\."))
            .ToList();
        Assert.True(uses.Count == 0, "the checker names the solver's namespaces: " + string.Join(", ", uses));
    }

    [Fact]
    public void EliminationAndItsHelpersAreInternal()
    {
        var library = typeof(FlowCert.Flows.FlowSolver).Assembly;
        string[] internalTypes =
        [
            "FlowCert.Algebra.SparseElimination`2", "FlowCert.Algebra.SparseVector`1", "FlowCert.Algebra.IEliminationResult`1",
            "FlowCert.Algebra.Elimination", "FlowCert.Algebra.BitElimination", "FlowCert.Algebra.Primality",
            "FlowCert.Flows.FieldGraph`2", "FlowCert.Schedules.CorrectionSystem`2",
        ];
        foreach (var name in internalTypes)
        {
            var type = library.GetType(name);
            Assert.True(type is not null, $"{name} not found (renamed? update this list)");
            Assert.False(type!.IsPublic, $"{name} is public: library users do not need it");
        }
        Assert.True(library.GetType("FlowCert.Flows.NodeVector")!.IsPublic);
    }
}
