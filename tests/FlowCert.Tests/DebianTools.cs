using System.Runtime.CompilerServices;

namespace FlowCert.Tests;

/// <summary>
/// The Debian programs some tests call (z3, nauty's programs, Graphviz's dot, rsvg-convert): whether one
/// is on PATH, the package that provides it, and whether a test that needs it runs or is skipped.
/// Outside CI a missing program skips the test with the apt-get line that enables it; with CI=true the
/// test runs and fails naming the package (.ci/run then fails the run on any skipped test too).
/// FLOWCERT_TEST_HIDE_PROGRAMS=z3,dot (a comma-separated list) makes the named programs count as
/// missing, to try both behaviours on a machine that has them.
/// </summary>
public static class DebianTools
{
    private static readonly Dictionary<string, string> Packages = new()
    {
        ["z3"] = "z3",
        ["dot"] = "graphviz",
        ["rsvg-convert"] = "librsvg2-bin",
    };

    /// <summary>The Debian package that provides <paramref name="program"/> (nauty's programs are nauty-NAME).</summary>
    public static string PackageOf(string program)
        => Packages.TryGetValue(program, out var p) ? p : program.StartsWith("nauty-", StringComparison.Ordinal) ? "nauty" : program;

    /// <summary>True when CI=true: a missing program must fail the test, not skip it.</summary>
    public static bool InCi => Environment.GetEnvironmentVariable("CI") == "true";

    /// <summary>True when FLOWCERT_TEST_HIDE_PROGRAMS names the program: the runners then fail as if it were not installed.</summary>
    public static bool IsHidden(string program)
        => (Environment.GetEnvironmentVariable("FLOWCERT_TEST_HIDE_PROGRAMS") ?? "").Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).Contains(program);

    /// <summary>True when the program counts as hidden (FLOWCERT_TEST_HIDE_PROGRAMS) or no PATH folder holds an executable of that name.</summary>
    public static bool IsMissing(string program)
    {
        if (IsHidden(program)) return true;
        if (Path.IsPathRooted(program)) return !File.Exists(program);
        foreach (var dir in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries))
        {
            var candidate = Path.Combine(dir, program);
            if (File.Exists(candidate) && (OperatingSystem.IsWindows() || (File.GetUnixFileMode(candidate) & (UnixFileMode.UserExecute | UnixFileMode.GroupExecute | UnixFileMode.OtherExecute)) != 0))
                return false;
        }
        return true;
    }

    /// <summary>
    /// Null when the test should run (every program present, or CI=true); otherwise the skip reason,
    /// naming the missing programs and the apt-get line that installs them.
    /// </summary>
    public static string? SkipReason(IEnumerable<string> programs)
    {
        if (InCi) return null;
        var missing = programs.Where(IsMissing).ToList();
        if (missing.Count == 0) return null;
        var packages = missing.Select(PackageOf).Distinct().Order(StringComparer.Ordinal);
        return $"needs {string.Join(", ", missing)}, not installed: sudo apt-get install {string.Join(' ', packages)} (with CI=true this test fails instead)";
    }
}

/// <summary>A fact that needs Debian programs: skipped with the apt-get line outside CI when one is missing (see <see cref="DebianTools"/>).</summary>
[AttributeUsage(AttributeTargets.Method)]
public sealed class ToolFactAttribute : FactAttribute
{
    /// <summary>
    /// Names the programs the test runs, separated by spaces, as on PATH ("z3", "nauty-geng nauty-showg",
    /// "dot", "rsvg-convert"). A skipped test also carries the reason in its display name, so the default
    /// `dotnet test` output shows the apt-get line.
    /// </summary>
    public ToolFactAttribute(string programs, [CallerMemberName] string test = "")
    {
        if (DebianTools.SkipReason(programs.Split(' ', StringSplitOptions.RemoveEmptyEntries)) is { } reason)
        {
            Skip = reason;
            DisplayName = $"{test} [{reason}]";
        }
    }
}

/// <summary>A theory that needs Debian programs: skipped with the apt-get line outside CI when one is missing (see <see cref="DebianTools"/>).</summary>
[AttributeUsage(AttributeTargets.Method)]
public sealed class ToolTheoryAttribute : TheoryAttribute
{
    /// <summary>
    /// Names the programs the test runs, separated by spaces, as on PATH ("z3", "nauty-geng nauty-showg",
    /// "dot", "rsvg-convert"). A skipped test also carries the reason in its display name, so the default
    /// `dotnet test` output shows the apt-get line.
    /// </summary>
    public ToolTheoryAttribute(string programs, [CallerMemberName] string test = "")
    {
        if (DebianTools.SkipReason(programs.Split(' ', StringSplitOptions.RemoveEmptyEntries)) is { } reason)
        {
            Skip = reason;
            DisplayName = $"{test} [{reason}]";
        }
    }
}
