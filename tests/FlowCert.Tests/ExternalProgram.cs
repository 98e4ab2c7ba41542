using System.Diagnostics;

namespace FlowCert.Tests;

/// <summary>
/// Runs a general-purpose program installed from a Debian package (sha256sum, factor, ...) by name.
/// A missing program fails the test with the package to install; it never passes silently.
/// </summary>
public static class ExternalProgram
{
    /// <summary>The result of one run: exit code and the whole of stdout and stderr.</summary>
    public sealed record Outcome(int ExitCode, string Stdout, string Stderr);

    /// <summary>Runs <paramref name="program"/> with the arguments; fails naming <paramref name="debianPackage"/> when it is missing.</summary>
    public static Outcome Run(string program, string debianPackage, IEnumerable<string> arguments, string? workingDirectory = null)
    {
        var info = new ProcessStartInfo(program)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        if (workingDirectory is not null) info.WorkingDirectory = workingDirectory;
        foreach (var a in arguments) info.ArgumentList.Add(a);
        Process process;
        try
        {
            if (DebianTools.IsHidden(program)) throw new System.ComponentModel.Win32Exception($"hidden by FLOWCERT_TEST_HIDE_PROGRAMS");
            process = Process.Start(info) ?? throw new InvalidOperationException($"could not start {program}");
        }
        catch (System.ComponentModel.Win32Exception e)
        {
            Assert.Fail($"the program '{program}' is needed by this test and could not be started ({e.Message}): install the Debian package '{debianPackage}' (apt-get install {debianPackage})");
            throw; // unreachable
        }
        using (process)
        {
            var stderrTask = process.StandardError.ReadToEndAsync();
            var stdout = process.StandardOutput.ReadToEnd();
            var stderr = stderrTask.Result;
            process.WaitForExit();
            return new Outcome(process.ExitCode, stdout, stderr);
        }
    }
}
